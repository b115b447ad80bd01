#!/usr/bin/env bash
# npm test: the same set-up as npm start, on a fresh test database and other ports, then
# every test: Vitest unit + integration (against the real server and MariaDB) and the
# Playwright end-to-end tests in Debian's chromium. Ends with "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh

# Other ports than npm start's, so both can run at once; TEST_* variables move them again.
PORT="${TEST_APP_PORT:-3100}"
export DATABASE_NAME="sinkwise_test"
export SMTP_PORT="${TEST_SMTP_PORT:-1026}"
export MAIL_INBOX_URL="http://127.0.0.1:${TEST_INBOX_PORT:-1081}"
export APP_URL="http://127.0.0.1:$PORT"
export S3_ENDPOINT="http://127.0.0.1:${TEST_S3_PORT:-4570}"
export S3_BUCKET="sinkwise-test"
export SINKWISE_TEST_URL="$APP_URL"
# The tests stand in for a reverse proxy on loopback: each test client tells its own address
# in X-Forwarded-For, the way nginx would (tests/support/http.ts).
export TRUSTED_PROXY="127.0.0.1"
mkdir -p .data test-results

# Several checkouts on one machine share its cores: at most two full runs at a time, the
# others wait their turn (a run squeezed among many times out in its browser tests).
if command -v flock >/dev/null 2>&1; then
  waited=0
  until { exec 8>/tmp/sinkwise-test-slot-1.lock && flock -n 8; } || { exec 8>/tmp/sinkwise-test-slot-2.lock && flock -n 8; }; do
    [ "$waited" = 0 ] && echo "[test] another test run is using this machine: waiting for its turn"
    waited=1; sleep 2
  done
fi

ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return; fi
  echo "[test] chromium is missing: installing it from Debian's packages"
  export DEBIAN_FRONTEND=noninteractive
  apt-get -o DPkg::Lock::Timeout=300 update -qq
  apt-get -o DPkg::Lock::Timeout=300 install -y -qq chromium >/dev/null
}

SERVER_PID=""
DB_WAS_RUNNING=0
cleanup() {
  if [ -n "$SERVER_PID" ]; then kill "$SERVER_PID" 2>/dev/null; wait "$SERVER_PID" 2>/dev/null; fi
  bash scripts/services.sh stop >/dev/null 2>&1
  if [ "$DB_WAS_RUNNING" = 0 ]; then bash scripts/db.sh stop >/dev/null 2>&1; fi
}
trap cleanup EXIT

fail_setup() { echo "[test] set-up failed: $1"; echo "0 passed, 1 failed"; exit 1; }

ensure_node_modules || fail_setup "npm ci"
load_env
ensure_chromium || fail_setup "chromium install"
bash scripts/db.sh status >/dev/null 2>&1 && DB_WAS_RUNNING=1
bash scripts/db.sh start 8>&- || fail_setup "MariaDB"
bash scripts/db.sh drop-db "$DATABASE_NAME" && bash scripts/db.sh create-db "$DATABASE_NAME" || fail_setup "test database"
bash scripts/services.sh start 8>&- || fail_setup "local service fakes"
node_modules/.bin/tsx --conditions=react-server scripts/migrate.ts || fail_setup "migrations"
node_modules/.bin/tsx --conditions=react-server scripts/seed.ts || fail_setup "seed"

echo "[test] building"
node node_modules/next/dist/bin/next build >.data/logs/test-build.log 2>&1 || { tail -n 40 .data/logs/test-build.log; fail_setup "next build"; }
assert_port_free "$PORT" || fail_setup "port $PORT"
node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$PORT" >.data/logs/test-server.log 2>&1 8>&- &
SERVER_PID=$!
wait_for_url "http://127.0.0.1:$PORT/api/v1/health" "$SERVER_PID" || { tail -n 40 .data/logs/test-server.log; fail_setup "server"; }

status=0
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile=.data/vitest-unit.json || status=1
node_modules/.bin/vitest run --config vitest.e2e.config.ts --reporter=default --reporter=json --outputFile=.data/vitest-e2e.json || status=1

node -e '
const fs = require("fs");
let passed = 0, failed = 0;
for (const f of [".data/vitest-unit.json", ".data/vitest-e2e.json"]) {
  if (!fs.existsSync(f)) { failed += 1; continue; }
  const r = JSON.parse(fs.readFileSync(f, "utf8"));
  passed += r.numPassedTests; failed += r.numFailedTests;
  if (r.numTotalTests === 0 || (!r.success && r.numFailedTests === 0)) failed += 1;
}
console.log(`${passed} passed, ${failed} failed`);
'
exit $status
