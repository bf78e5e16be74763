#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the mail catcher, migrate, seed, serve on $PORT.
# Ctrl-C stops everything this script started; the data stays for the next start.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
source scripts/lib.sh

export PORT="${PORT:-8080}"
export NODE_ENV="${NODE_ENV:-production}"
export PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}"
ensure_node_modules "$here"

pids=()
started_db=0
cleanup() {
  trap - INT TERM EXIT
  for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done
  wait 2>/dev/null || true
  if [ "$started_db" = 1 ]; then bash scripts/db.sh stop || true; fi
  log "stopped"
}
trap cleanup INT TERM EXIT

if [ -z "${DATABASE_URL:-}" ]; then
  if ! bash scripts/db.sh status >/dev/null 2>&1; then started_db=1; fi
  bash scripts/db.sh start
  bash scripts/db.sh createdb trayline
  export DATABASE_URL="$(bash scripts/db.sh url trayline)"
fi

log "building the client"
node_modules/.bin/vite build --logLevel error

log "migrating"
node_modules/.bin/tsx scripts/migrate.ts up
node_modules/.bin/tsx scripts/seed.ts

if [ -z "${SMTP_HOST:-}" ] || [ "${SMTP_HOST:-}" = "127.0.0.1" ]; then
  if [ -f scripts/mail-catcher.ts ]; then
    node_modules/.bin/tsx scripts/mail-catcher.ts &
    pids+=($!)
  fi
fi

node_modules/.bin/tsx server/main.ts &
pids+=($!)

for _ in $(seq 1 100); do
  if curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; then break; fi
  sleep 0.2
done
cat <<MSG

  Trayline is running: http://127.0.0.1:$PORT

  Demo sign-ins (password: trayline-demo)
    coach       coach@trayline.test
    assistant   assistant@trayline.test
    clients     client1@trayline.test … client8@trayline.test

  Ctrl-C stops the app$( [ "$started_db" = 1 ] && echo ", the mail catcher and PostgreSQL" ).

MSG
wait -n "${pids[@]}"
