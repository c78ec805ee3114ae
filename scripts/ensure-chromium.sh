#!/usr/bin/env bash
# The browser tests drive Debian's Chromium (never a downloaded browser). Installs it when it is
# missing and we may (root with apt-get); otherwise explains, and fails only in CI.
set -euo pipefail
bin="${CHROMIUM_PATH:-/usr/bin/chromium}"
[ -x "$bin" ] && exit 0
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing Debian's chromium for the browser tests (apt-get)..."
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium fonts-liberation >/dev/null
  exit 0
fi
msg="Browser tests need Chromium at $bin: run 'sudo apt-get install chromium' (or set CHROMIUM_PATH)."
if [ -n "${CI:-}" ]; then echo "$msg" >&2; exit 1; fi
echo "SKIP browser tests: $msg"
exit 3
