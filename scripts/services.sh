#!/usr/bin/env bash
# Local stand-ins for hosted services, each a real process on loopback:
#   mail  — maildev: SMTP on $SMTP_PORT, web inbox on the port in $MAIL_INBOX_URL
#   s3    — s3rver: S3 API on the port in $S3_ENDPOINT (scripts/s3-fake.mjs), data in .data/s3-<port>
#   scripts/services.sh start|stop
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
load_env
ACTION="${1:-start}"

RUN=".data/run"; mkdir -p "$RUN" .data/logs
port_of() { node -e "console.log(new URL(process.argv[1]).port)" "$1"; }
INBOX_PORT="$(port_of "${MAIL_INBOX_URL:-http://127.0.0.1:1080}")"
TAG="${SMTP_PORT}"
S3_PORT="$(port_of "${S3_ENDPOINT:-http://127.0.0.1:4569}")"

alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

start_mail() {
  local pidf="$RUN/maildev-$TAG.pid"
  if alive "$pidf"; then echo "[services] mail inbox already running on $MAIL_INBOX_URL"; return; fi
  mkdir -p ".data/mail-$TAG"
  setsid node node_modules/maildev/dist/bin/maildev.js --ip 127.0.0.1 --web-ip 127.0.0.1 \
    --smtp "$SMTP_PORT" --web "$INBOX_PORT" --mail-directory ".data/mail-$TAG" \
    </dev/null >".data/logs/maildev-$TAG.log" 2>&1 &
  echo $! >"$pidf"
  wait_for_url "http://127.0.0.1:$INBOX_PORT/api/healthz" "$(cat "$pidf")"
  echo "[services] mail: SMTP 127.0.0.1:$SMTP_PORT, inbox $MAIL_INBOX_URL"
}

start_s3() {
  local pidf="$RUN/s3rver-$S3_PORT.pid"
  if alive "$pidf"; then echo "[services] S3 fake already running on $S3_ENDPOINT"; return; fi
  setsid node scripts/s3-fake.mjs </dev/null >".data/logs/s3rver-$S3_PORT.log" 2>&1 &
  echo $! >"$pidf"
  # Any HTTP answer means s3rver is up (an unsigned request gets an S3 error document).
  wait_for_url "http://127.0.0.1:$S3_PORT/" "$(cat "$pidf")"
  echo "[services] S3: $S3_ENDPOINT, bucket $S3_BUCKET"
}

stop_one() {
  local pidf="$1"
  if alive "$pidf"; then kill "$(cat "$pidf")" 2>/dev/null || true; fi
  rm -f "$pidf"
}

case "$ACTION" in
  start) start_mail; start_s3 ;;
  stop) stop_one "$RUN/maildev-$TAG.pid"; stop_one "$RUN/s3rver-$S3_PORT.pid"; echo "[services] stopped" ;;
  *) echo "usage: scripts/services.sh start|stop" >&2; exit 2 ;;
esac
