#!/usr/bin/env bash
# The API's e2e suites a second time, on PostgreSQL: each file gets a fresh database on the server that
# HOMEGROUND_TEST_PG_URL names (a role allowed to create databases; scripts/postgres-test-server.sh at the
# project root starts a throwaway one, as .ci/run does).
set -euo pipefail
cd "$(dirname "$0")/.."
if [ -z "${HOMEGROUND_TEST_PG_URL:-}" ]; then
  if [ -n "${CI:-}" ]; then
    echo "PostgreSQL e2e run: HOMEGROUND_TEST_PG_URL is not set, and CI must run it (.ci/run starts a server)" >&2
    exit 1
  fi
  echo "PostgreSQL e2e run skipped: HOMEGROUND_TEST_PG_URL is not set (eval \"\$(bash scripts/postgres-test-server.sh start)\" from the project root starts a throwaway server)"
  exit 0
fi
# Left out, with the reason printed: the SQLite schema check, the online-backup test and the crash test are
# about SQLite files only (the crash test starts the built API on a file of its own). Each file migrates and
# loads the catalogue into its own new database over the network, so set-up hooks get longer.
echo "PostgreSQL e2e run: every suite, the plant share's included, except sqlite-schema, backup, crash-recovery .e2e-spec.ts (SQLite files only)"
exec env NODE_OPTIONS="--experimental-vm-modules --disable-warning=ExperimentalWarning" \
  npx jest test/ --testTimeout=240000 --testPathIgnorePatterns '/test/sqlite-schema\.e2e-spec\.ts$' \
  '/test/backup\.e2e-spec\.ts$' '/test/crash-recovery\.e2e-spec\.ts$' "$@"
