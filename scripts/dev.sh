#!/usr/bin/env bash
# npm run dev: API with reload on :8080 and Vite with its proxy on :5173.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
source scripts/lib.sh
ensure_node_modules "$here"
bash scripts/db.sh start
bash scripts/db.sh createdb trayline
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/db.sh url trayline)}"
node_modules/.bin/tsx scripts/migrate.ts up
node_modules/.bin/tsx scripts/seed.ts
export SERVE_CLIENT=0
trap 'kill 0' INT TERM EXIT
[ -f scripts/mail-catcher.ts ] && node_modules/.bin/tsx scripts/mail-catcher.ts &
node_modules/.bin/tsx watch server/main.ts &
node_modules/.bin/vite
