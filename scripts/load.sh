#!/usr/bin/env bash
# npm run load: the app under load, on loopback only, bounded in time. Sets up its own
# database (sinkwise_load, seeded with the demo), builds when there is no production build,
# serves on LOAD_APP_PORT (default 3190) and prints the figures of scripts/load.ts.
set -uo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
PORT="${LOAD_APP_PORT:-3190}"
export DATABASE_NAME="sinkwise_load"
export APP_URL="http://127.0.0.1:$PORT"
export SMTP_PORT="${LOAD_SMTP_PORT:-1029}"
SERVER_PID=""
DB_WAS_RUNNING=0
cleanup() {
  if [ -n "$SERVER_PID" ]; then kill "$SERVER_PID" 2>/dev/null; wait "$SERVER_PID" 2>/dev/null; fi
  if [ "$DB_WAS_RUNNING" = 0 ]; then bash scripts/db.sh stop >/dev/null 2>&1; fi
}
trap cleanup EXIT
ensure_node_modules || exit 1
load_env
bash scripts/db.sh status >/dev/null 2>&1 && DB_WAS_RUNNING=1
bash scripts/db.sh start || exit 1
bash scripts/db.sh drop-db "$DATABASE_NAME" && bash scripts/db.sh create-db "$DATABASE_NAME" || exit 1
node_modules/.bin/tsx --conditions=react-server scripts/migrate.ts || exit 1
node_modules/.bin/tsx --conditions=react-server scripts/seed.ts || exit 1
if [ ! -f .next/BUILD_ID ] || [ "${LOAD_REBUILD:-0}" = 1 ]; then
  echo "[load] building"
  node node_modules/next/dist/bin/next build >.data/logs/load-build.log 2>&1 || { tail -n 30 .data/logs/load-build.log; exit 1; }
fi
assert_port_free "$PORT" || exit 1
mkdir -p .data/logs
# The preload lets the load script ask for a full garbage collection before it reads memory.
node --require ./scripts/load-gc-hook.cjs node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$PORT" >.data/logs/load-server.log 2>&1 &
SERVER_PID=$!
wait_for_url "http://127.0.0.1:$PORT/api/v1/health" "$SERVER_PID" || exit 1
LOAD_URL="http://127.0.0.1:$PORT" LOAD_SERVER_PID="$SERVER_PID" node_modules/.bin/tsx scripts/load.ts
