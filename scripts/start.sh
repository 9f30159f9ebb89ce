#!/usr/bin/env bash
# The README start command: install what is missing, build, start PostgreSQL, migrate, load the demo
# data and serve Cairn (API, web app, local sign-in provider, mail catcher) until Ctrl-C.
# Ctrl-C stops PostgreSQL too when this command started it; CAIRN_KEEP_DB=1 leaves it running.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$CAIRN_ROOT"

PIDFILE="$CAIRN_STATE/server.pid"
URL="http://127.0.0.1:$CAIRN_PORT"

if [ -f "$PIDFILE" ]; then
  if kill -0 "$(cat "$PIDFILE")" 2>/dev/null && port_in_use "$CAIRN_PORT"; then
    say "Cairn is already running at $URL (pid $(cat "$PIDFILE")); stop it with Ctrl-C where it runs"
    exit 0
  fi
  rm -f "$PIDFILE" # left by a start that did not end cleanly
fi
for pair in "CAIRN_PORT:$CAIRN_PORT" "CAIRN_DEV_PORT:$CAIRN_DEV_PORT" "CAIRN_SMTP_PORT:$CAIRN_SMTP_PORT"; do
  port_in_use "${pair#*:}" && die "port ${pair#*:} on 127.0.0.1 is taken; set ${pair%%:*} to choose another"
done

ensure_tools
say "building"
pnpm -s build >"$CAIRN_STATE/build.log" 2>&1 || { tail -n 40 "$CAIRN_STATE/build.log" >&2; die "the build failed (log above, in full in .cairn/build.log)"; }

db_was_running=0
bash scripts/db.sh status >/dev/null 2>&1 && db_was_running=1
bash scripts/db.sh start
export CAIRN_DB_NAME="${CAIRN_DB_NAME:-cairn}"
node apps/server/dist/migrate.js
node apps/server/dist/seed.js

server_pid=""
cleanup() {
  trap - INT TERM EXIT
  if [ -n "$server_pid" ] && kill -0 "$server_pid" 2>/dev/null; then
    kill -TERM "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
  fi
  rm -f "$PIDFILE"
  if [ "$db_was_running" = 0 ] && [ "${CAIRN_KEEP_DB:-0}" != 1 ]; then
    bash scripts/db.sh stop || true
  else
    say "PostgreSQL left running on 127.0.0.1:$CAIRN_DB_PORT (pnpm db:stop stops it)"
  fi
}
trap cleanup INT TERM EXIT

node apps/server/dist/main.js &
server_pid=$!
echo "$server_pid" >"$PIDFILE"
status=0
wait "$server_pid" || status=$?
server_pid=""
exit "$status"
