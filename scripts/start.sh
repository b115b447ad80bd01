#!/usr/bin/env bash
# npm start: set everything up, build, and serve on http://127.0.0.1:3000 with demo data.
# npm run dev: the same with hot reload. Ctrl-C stops what this script started.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
MODE="prod"; [ "${1:-}" = "--dev" ] && MODE="dev"
load_env
PORT="$(node -e "console.log(new URL(process.argv[1]).port || 3000)" "$APP_URL")"

DB_WAS_RUNNING=0; bash scripts/db.sh status >/dev/null 2>&1 && DB_WAS_RUNNING=1
SERVER_PID=""
cleanup() {
  trap - INT TERM EXIT
  echo; echo "[start] stopping"
  if [ -n "$SERVER_PID" ]; then kill "$SERVER_PID" 2>/dev/null || true; wait "$SERVER_PID" 2>/dev/null || true; fi
  bash scripts/services.sh stop || true
  if [ "$DB_WAS_RUNNING" = 0 ]; then bash scripts/db.sh stop || true; fi
}
trap cleanup INT TERM EXIT

assert_port_free "$PORT"
bash scripts/setup.sh
if [ "$MODE" = "prod" ]; then
  echo "[start] building (next build)"
  node node_modules/next/dist/bin/next build
  node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$PORT" &
else
  node node_modules/next/dist/bin/next dev -H 127.0.0.1 -p "$PORT" &
fi
SERVER_PID=$!
wait_for_url "http://127.0.0.1:$PORT/api/v1/health" "$SERVER_PID"

cat <<MSG

  Sinkwise is running at $APP_URL

  Demo accounts (password: $DEMO_PASSWORD)
    maker@sinkwise.test       maker: builds retrofits, checks budgets, asks for reviews, logs bench runs
    reviewer@sinkwise.test    reviewer: reviews shared builds, records verdicts
    instructor@sinkwise.test  instructor: runs the class, publishes worked examples
    admin@sinkwise.test       admin: users, roles and the verified catalogue
    student1@sinkwise.test    student in the evening course: hand-in with feedback
    student2@sinkwise.test    student in the evening course: a late hand-in

  E-mail inbox (sign-up and password reset mails land here): $MAIL_INBOX_URL
  Press Ctrl-C to stop.

MSG
wait "$SERVER_PID"
