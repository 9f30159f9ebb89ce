#!/usr/bin/env bash
# The README test command: the same set-up as the start command (plus Chromium), then every test:
# type checks, each package's unit tests, integration tests against the real PostgreSQL and end-to-end
# tests in Chromium. Exits non-zero on any failure. Stops PostgreSQL afterwards if it started it.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$CAIRN_ROOT"

ensure_tools
ensure_chromium

db_was_running=0
bash scripts/db.sh status >/dev/null 2>&1 && db_was_running=1
bash scripts/db.sh start
stop_db() {
  if [ "$db_was_running" = 0 ] && [ "${CAIRN_KEEP_DB:-0}" != 1 ]; then bash scripts/db.sh stop || true; fi
}
trap stop_db EXIT

say "type checks"
pnpm -s typecheck
say "building"
pnpm -s build >"$CAIRN_STATE/build.log" 2>&1 || { tail -n 40 "$CAIRN_STATE/build.log" >&2; die "the build failed (log above, in full in .cairn/build.log)"; }

results="$CAIRN_STATE/test-results"
rm -rf "$results"
mkdir -p "$results"
# The tests' own database, never the demo one; the tests drop and re-create it.
export CAIRN_TEST_DB_NAME=cairn_test

failed=0
for dir in packages/schema packages/engine packages/cli apps/server apps/web bench tests; do
  name=$(basename "$dir")
  say "tests in $dir"
  (cd "$dir" && pnpm -s run test --reporter=default --reporter=json --outputFile="$results/$name.json") || failed=1
done

node scripts/summarize-tests.mjs "$results" || failed=1
exit "$failed"
