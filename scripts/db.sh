#!/usr/bin/env bash
# Private MariaDB instance for Sinkwise: installs Debian's mariadb-server when missing,
# keeps its data under .data/mariadb and listens on 127.0.0.1 only, on its own port.
#   scripts/db.sh start|stop|status|reset|create-db NAME
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT="$PWD"
DATA="$ROOT/.data"
DATADIR="$DATA/mariadb"
SOCK="$DATA/mariadb.sock"
PIDFILE="$DATA/mariadb.pid"
ERRLOG="$DATA/mariadb.err"

. scripts/lib.sh
load_env
PORT="${DATABASE_PORT:-3307}"

log() { echo "[db] $*"; }

ensure_installed() {
  if command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; then return; fi
  log "mariadb-server is missing: installing it from Debian's packages"
  export DEBIAN_FRONTEND=noninteractive
  apt-get -o DPkg::Lock::Timeout=300 update -qq
  apt-get -o DPkg::Lock::Timeout=300 install -y -qq mariadb-server >/dev/null
}

running() {
  [ -f "$PIDFILE" ] && kill -0 "$(cat "$PIDFILE")" 2>/dev/null
}

root_sql() {
  mariadb --no-defaults --socket="$SOCK" -uroot -p"$DATABASE_ROOT_PASSWORD" "$@"
}

wait_ready() {
  for _ in $(seq 1 300); do
    if mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; then return 0; fi
    if [ -n "${SERVER_PID:-}" ] && ! kill -0 "$SERVER_PID" 2>/dev/null; then break; fi
    sleep 0.1
  done
  log "MariaDB did not come up; see $ERRLOG"; tail -n 20 "$ERRLOG" >&2 || true
  return 1
}

create_db() {
  local name="$1"
  root_sql -e "CREATE DATABASE IF NOT EXISTS \`$name\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    GRANT ALL PRIVILEGES ON \`$name\`.* TO '$DATABASE_USER'@'127.0.0.1';
    FLUSH PRIVILEGES;"
}

start() {
  ensure_installed
  mkdir -p "$DATA"
  local fresh=0
  if [ ! -d "$DATADIR/mysql" ]; then
    log "initialising a private data directory in .data/mariadb"
    mariadb-install-db --no-defaults --user=root --datadir="$DATADIR" \
      --auth-root-authentication-method=normal --skip-test-db >/dev/null
    fresh=1
  fi
  if running; then
    log "already running on 127.0.0.1:$PORT"
  else
    setsid mariadbd --no-defaults --user=root --datadir="$DATADIR" --socket="$SOCK" \
      --port="$PORT" --bind-address=127.0.0.1 --skip-name-resolve \
      --innodb-flush-log-at-trx-commit=1 --character-set-server=utf8mb4 \
      --collation-server=utf8mb4_unicode_ci --max-connections=300 \
      --pid-file="$PIDFILE" --log-error="$ERRLOG" </dev/null >/dev/null 2>&1 &
    SERVER_PID=$!
    wait_ready
    log "started on 127.0.0.1:$PORT"
  fi
  if [ "$fresh" = 1 ]; then
    # A fresh data directory has a root without a password: set ours and the app user.
    mariadb --no-defaults --socket="$SOCK" -uroot -e "
      ALTER USER 'root'@'localhost' IDENTIFIED BY '$DATABASE_ROOT_PASSWORD';
      CREATE USER IF NOT EXISTS '$DATABASE_USER'@'127.0.0.1' IDENTIFIED BY '$DATABASE_PASSWORD';
      FLUSH PRIVILEGES;"
  fi
  create_db "$DATABASE_NAME"
}

stop() {
  if running; then
    mariadb-admin --no-defaults --socket="$SOCK" -uroot -p"$DATABASE_ROOT_PASSWORD" shutdown 2>/dev/null \
      || kill "$(cat "$PIDFILE")"
    for _ in $(seq 1 100); do running || break; sleep 0.1; done
    log "stopped"
  else
    log "not running"
  fi
}

case "${1:-status}" in
  start) start ;;
  stop) stop ;;
  status) if running; then log "running on 127.0.0.1:$PORT (pid $(cat "$PIDFILE"))"; else log "not running"; exit 1; fi ;;
  reset) stop; rm -rf "$DATADIR"; start ;;
  create-db) create_db "${2:?database name}" ;;
  drop-db) root_sql -e "DROP DATABASE IF EXISTS \`${2:?database name}\`;" ;;
  *) echo "usage: scripts/db.sh start|stop|status|reset|create-db NAME|drop-db NAME" >&2; exit 2 ;;
esac
