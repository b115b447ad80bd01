#!/usr/bin/env bash
# Local stand-ins for hosted services, each a real process on loopback:
#   mail  — maildev: SMTP on $SMTP_PORT, web inbox on the port in $MAIL_INBOX_URL
#   s3    — s3rver: S3 API on the port in $S3_ENDPOINT (started once attachments exist)
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

alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

wait_http() {
  for _ in $(seq 1 200); do
    if node -e "fetch(process.argv[1]).then(r=>process.exit(r.ok?0:1),()=>process.exit(1))" "$1"; then return 0; fi
    sleep 0.1
  done
  echo "[services] $1 did not answer" >&2; return 1
}

start_mail() {
  local pidf="$RUN/maildev-$TAG.pid"
  if alive "$pidf"; then echo "[services] mail inbox already running on $MAIL_INBOX_URL"; return; fi
  mkdir -p ".data/mail-$TAG"
  setsid node node_modules/maildev/dist/bin/maildev.js --ip 127.0.0.1 --web-ip 127.0.0.1 \
    --smtp "$SMTP_PORT" --web "$INBOX_PORT" --mail-directory ".data/mail-$TAG" \
    </dev/null >".data/logs/maildev-$TAG.log" 2>&1 &
  echo $! >"$pidf"
  wait_http "http://127.0.0.1:$INBOX_PORT/api/healthz"
  echo "[services] mail: SMTP 127.0.0.1:$SMTP_PORT, inbox $MAIL_INBOX_URL"
}

stop_one() {
  local pidf="$1"
  if alive "$pidf"; then kill "$(cat "$pidf")" 2>/dev/null || true; fi
  rm -f "$pidf"
}

case "$ACTION" in
  start) start_mail ;;
  stop) stop_one "$RUN/maildev-$TAG.pid"; echo "[services] stopped" ;;
  *) echo "usage: scripts/services.sh start|stop" >&2; exit 2 ;;
esac
