#!/usr/bin/env bash
# Cairn's own PostgreSQL on 127.0.0.1:$CAIRN_DB_PORT, with its data in .cairn/pgdata.
# Usage: scripts/db.sh start|stop|reset|status
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

PGDATA_DIR="$CAIRN_STATE/pgdata"
PGLOG="$CAIRN_STATE/postgres.log"
DEMO_DB="${CAIRN_DB_NAME:-cairn}"

find_pg_bin() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [ -n "$dir" ] && [ -x "$dir/pg_ctl" ] && echo "$dir"
}

PGBIN=$(find_pg_bin || true)
if [ -z "$PGBIN" ]; then
  apt_install postgresql
  PGBIN=$(find_pg_bin || true)
  [ -n "$PGBIN" ] || die "PostgreSQL's server programs are still missing under /usr/lib/postgresql after installing the postgresql package"
fi

# PostgreSQL refuses to run as root: as root, the cluster belongs to the postgres user.
if [ "$(id -u)" -eq 0 ]; then
  id postgres >/dev/null 2>&1 || die "the postgres system user is missing; reinstall the postgresql package"
  as_pg() { runuser -u postgres -- "$@"; }
  PG_OWNER=postgres
else
  as_pg() { "$@"; }
  PG_OWNER=$(id -un)
fi

mkdir -p "$CAIRN_STATE"
if [ "$PG_OWNER" = postgres ] && ! runuser -u postgres -- test -x "$CAIRN_STATE"; then
  # A parent folder of the checkout is closed to the postgres user: keep the cluster outside it.
  PGDATA_DIR="/var/tmp/cairn-$(printf '%s' "$CAIRN_ROOT" | sha1sum | cut -c1-12)/pgdata"
  say "the postgres user cannot reach $CAIRN_STATE; keeping the database in $PGDATA_DIR"
fi
SOCKDIR="$CAIRN_STATE/pgsock"
if [ ${#SOCKDIR} -gt 90 ] || { [ "$PG_OWNER" = postgres ] && ! runuser -u postgres -- test -x "$CAIRN_STATE"; }; then
  SOCKDIR="/tmp/cairn-pg-$CAIRN_DB_PORT"
fi

pg_ctl_() { as_pg "$PGBIN/pg_ctl" -D "$PGDATA_DIR" "$@"; }
psql_() { "$PGBIN/psql" -X -q -h 127.0.0.1 -p "$CAIRN_DB_PORT" -U "$CAIRN_DB_USER" -v ON_ERROR_STOP=1 "$@"; }

running_port() { sed -n 4p "$PGDATA_DIR/postmaster.pid" 2>/dev/null || true; }

# Running means: a postmaster.pid whose process is a live postgres serving this data directory.
cluster_running() {
  [ -f "$PGDATA_DIR/postmaster.pid" ] || return 1
  local pid
  pid=$(head -n 1 "$PGDATA_DIR/postmaster.pid")
  [ -n "$pid" ] && [ -r "/proc/$pid/cmdline" ] && tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q "postgres"
}

ensure_database() {
  local name=$1
  if [ -z "$(psql_ -d postgres -tAc "SELECT 1 FROM pg_database WHERE datname = '$name'")" ]; then
    psql_ -d postgres -c "CREATE DATABASE \"$name\"" >/dev/null
    say "created database $name"
  fi
}

start() {
  if cluster_running; then
    local port
    port=$(running_port)
    if [ "$port" != "$CAIRN_DB_PORT" ]; then
      die "this checkout's PostgreSQL is already running on port $port, not $CAIRN_DB_PORT; stop it (pnpm db:stop) or set CAIRN_DB_PORT=$port"
    fi
    say "PostgreSQL is already running on 127.0.0.1:$CAIRN_DB_PORT (nothing to do)"
    ensure_database "$DEMO_DB"
    return
  fi
  if [ -f "$PGDATA_DIR/postmaster.pid" ]; then
    say "removing a stale postmaster.pid left by a PostgreSQL that is no longer running"
    rm -f "$PGDATA_DIR/postmaster.pid"
  fi
  if port_in_use "$CAIRN_DB_PORT"; then
    die "port $CAIRN_DB_PORT on 127.0.0.1 is taken by another program; set CAIRN_DB_PORT to choose another"
  fi
  if [ ! -f "$PGDATA_DIR/PG_VERSION" ]; then
    say "creating a PostgreSQL cluster in ${PGDATA_DIR#"$CAIRN_ROOT"/}"
    mkdir -p "$PGDATA_DIR"
    [ "$PG_OWNER" = postgres ] && chown postgres:postgres "$PGDATA_DIR"
    chmod 700 "$PGDATA_DIR"
    as_pg "$PGBIN/initdb" -D "$PGDATA_DIR" -U "$CAIRN_DB_USER" -N --auth=trust -E UTF8 --locale=C.UTF-8 >"$CAIRN_STATE/initdb.log" 2>&1 \
      || { cat "$CAIRN_STATE/initdb.log" >&2; die "initdb failed (log above)"; }
  fi
  mkdir -p "$SOCKDIR"
  [ "$PG_OWNER" = postgres ] && chown postgres:postgres "$SOCKDIR"
  touch "$PGLOG"
  [ "$PG_OWNER" = postgres ] && chown postgres:postgres "$PGLOG"
  if ! pg_ctl_ -l "$PGLOG" -w -t 60 -o "-c listen_addresses=127.0.0.1 -p $CAIRN_DB_PORT -k $SOCKDIR" start >/dev/null; then
    tail -n 20 "$PGLOG" >&2
    die "PostgreSQL did not start on 127.0.0.1:$CAIRN_DB_PORT (its log is above, in full in .cairn/postgres.log)"
  fi
  say "PostgreSQL is running on 127.0.0.1:$CAIRN_DB_PORT"
  ensure_database "$DEMO_DB"
}

stop() {
  if cluster_running; then
    pg_ctl_ -m fast -w stop >/dev/null
    say "PostgreSQL stopped"
  else
    say "PostgreSQL is not running (nothing to do)"
  fi
}

status() {
  if cluster_running; then
    say "PostgreSQL is running on 127.0.0.1:$(running_port), data in ${PGDATA_DIR#"$CAIRN_ROOT"/}"
  else
    say "PostgreSQL is not running"
    return 3
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  reset)
    stop
    rm -rf "$PGDATA_DIR"
    say "removed ${PGDATA_DIR#"$CAIRN_ROOT"/}; starting afresh"
    start
    ;;
  status) status ;;
  *) die "usage: scripts/db.sh start|stop|reset|status" ;;
esac
