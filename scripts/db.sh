#!/usr/bin/env bash
# Private PostgreSQL cluster owned by the project's scripts.
#   scripts/db.sh init|start|stop|status|url|createdb NAME
# Listens on 127.0.0.1:$PGPORT only (default 54329), socket inside the data folder.
# When DATABASE_URL is set, the app uses that server and this script is not needed.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
source "$here/scripts/lib.sh"

PGPORT="${PGPORT:-54329}"
PGUSER_APP="${PGUSER_APP:-trayline}"
PGBIN="${PGBIN:-}"

find_pgbin() {
  if [ -n "$PGBIN" ] && [ -x "$PGBIN/initdb" ]; then return; fi
  for v in 17 16 15 14 13; do
    if [ -x "/usr/lib/postgresql/$v/bin/initdb" ]; then PGBIN="/usr/lib/postgresql/$v/bin"; return; fi
  done
  if [ "$(id -u)" = "0" ]; then
    log "PostgreSQL binaries missing: installing Debian's postgresql with apt-get"
    apt-get update -qq >/dev/null 2>&1 || true
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    for v in 17 16 15 14 13; do
      if [ -x "/usr/lib/postgresql/$v/bin/initdb" ]; then PGBIN="/usr/lib/postgresql/$v/bin"; return; fi
    done
  fi
  die "PostgreSQL binaries not found (install Debian's postgresql package, or set DATABASE_URL)"
}

# Where the cluster lives: .data/pg under the project, unless the cluster's user cannot reach it.
data_dir() {
  local d="${PGDATA_DIR:-$here/.data/pg}"
  if [ "$(id -u)" = "0" ] && [ -z "${PGDATA_DIR:-}" ]; then
    if ! runuser -u postgres -- test -x "$here" 2>/dev/null; then
      local tag; tag="$(printf '%s' "$here" | md5sum | cut -c1-10)"
      d="/var/tmp/trayline-$tag/pg"
    fi
  fi
  printf '%s' "$d"
}

as_owner() {
  if [ "$(id -u)" = "0" ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

PGDATA="$(data_dir)"

cmd_init() {
  find_pgbin
  if [ -f "$PGDATA/PG_VERSION" ]; then return 0; fi
  if [ "$PGDATA" != "$here/.data/pg" ]; then log "cluster folder: $PGDATA (the checkout is not reachable by the postgres user)"; fi
  mkdir -p "$PGDATA"
  if [ "$(id -u)" = "0" ]; then chown postgres:postgres "$PGDATA"; chown postgres:postgres "$(dirname "$PGDATA")" 2>/dev/null || true; fi
  chmod 700 "$PGDATA"
  local pw; pw="$(mktemp)"; printf '%s\n' "${PGPASSWORD_APP:-trayline}" >"$pw"; chmod 644 "$pw"
  as_owner "$PGBIN/initdb" -D "$PGDATA" -U "$PGUSER_APP" --pwfile="$pw" --auth-local=trust --auth-host=scram-sha-256 \
    -E UTF8 --locale=C.UTF-8 >/dev/null
  rm -f "$pw"
  as_owner bash -c "cat >> '$PGDATA/postgresql.conf'" <<CONF
listen_addresses = '127.0.0.1'
port = $PGPORT
unix_socket_directories = '$PGDATA'
max_connections = 200
CONF
  log "initialised PostgreSQL cluster in $PGDATA"
}

cmd_status() {
  find_pgbin
  [ -f "$PGDATA/PG_VERSION" ] || return 3
  as_owner "$PGBIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1
}

cmd_start() {
  cmd_init
  if cmd_status; then return 0; fi
  as_owner "$PGBIN/pg_ctl" -D "$PGDATA" -l "$PGDATA/server.log" -w -t 60 -o "-p $PGPORT" start >/dev/null \
    || { tail -20 "$PGDATA/server.log" >&2; die "PostgreSQL did not start"; }
  log "PostgreSQL listening on 127.0.0.1:$PGPORT"
}

cmd_stop() {
  find_pgbin
  if cmd_status; then as_owner "$PGBIN/pg_ctl" -D "$PGDATA" -m fast -w stop >/dev/null; log "PostgreSQL stopped"; fi
}

cmd_createdb() {
  local name="$1"
  find_pgbin
  if ! as_owner "$PGBIN/psql" -h "$PGDATA" -p "$PGPORT" -U "$PGUSER_APP" -d postgres -tAc \
      "select 1 from pg_database where datname='$name'" | grep -q 1; then
    as_owner "$PGBIN/createdb" -h "$PGDATA" -p "$PGPORT" -U "$PGUSER_APP" "$name"
  fi
}

cmd_url() {
  printf 'postgres://%s:%s@127.0.0.1:%s/%s\n' "$PGUSER_APP" "${PGPASSWORD_APP:-trayline}" "$PGPORT" "${1:-trayline}"
}

case "${1:-}" in
  init) cmd_init ;;
  start) cmd_start ;;
  stop) cmd_stop ;;
  status) if cmd_status; then echo "running ($PGDATA, port $PGPORT)"; else echo "stopped"; exit 3; fi ;;
  createdb) cmd_createdb "${2:?database name}" ;;
  url) cmd_url "${2:-trayline}" ;;
  *) echo "usage: scripts/db.sh init|start|stop|status|createdb NAME|url [NAME]" >&2; exit 2 ;;
esac
