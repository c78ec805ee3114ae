#!/usr/bin/env bash
# Runs the browser tests (node:test + playwright-core) against the built app.
set -uo pipefail
cd "$(dirname "$0")/.."
scripts/ensure-chromium.sh
status=$?
if [ "$status" = "3" ]; then exit 0; fi
[ "$status" = "0" ] || exit "$status"
exec node --import tsx --test --test-concurrency=1 --test-reporter=spec test/browser/*.test.ts
