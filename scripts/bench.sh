#!/usr/bin/env bash
# npm run bench: starts its own database and server, warms up, prints ratios to GET /api/health measured in one run.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
source scripts/lib.sh
ensure_node_modules "$here"
started_db=0
if [ -z "${BENCH_DATABASE_URL:-}" ]; then
  if ! bash scripts/db.sh status >/dev/null 2>&1; then started_db=1; fi
  bash scripts/db.sh start
  export BENCH_DATABASE_URL="$(bash scripts/db.sh url trayline_bench)"
fi
trap '[ "$started_db" = 1 ] && bash scripts/db.sh stop >/dev/null 2>&1 || true' EXIT
node_modules/.bin/vite build --logLevel error
LOG_LEVEL=silent LOGIN_RATE_LIMIT=100000 node_modules/.bin/tsx tests/bench/bench.ts "$@"
