#!/usr/bin/env bash
# npm run db:restore -- FILE [DATABASE]: loads a backup made by db:backup into an empty
# database (DATABASE, default the app's own). It refuses a database that has tables, so a
# restore never mixes with live data: restore into a new name, check it, then point the app
# at it (DATABASE_NAME) — or drop the old one first (scripts/db.sh drop-db NAME).
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
load_env
FILE="${1:?usage: npm run db:restore -- FILE [DATABASE]}"
TARGET="${2:-$DATABASE_NAME}"
[ -f "$FILE" ] || { echo "[restore] no such file: $FILE" >&2; exit 1; }
gzip -t "$FILE" 2>/dev/null || { echo "[restore] $FILE is not a gzip file from db:backup" >&2; exit 1; }
bash scripts/db.sh create-db "$TARGET" >/dev/null
sql() { mariadb --no-defaults --host="$DATABASE_HOST" --port="$DATABASE_PORT" --user="$DATABASE_USER" --password="$DATABASE_PASSWORD" "$@"; }
TABLES=$(sql -N -e "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$TARGET'")
if [ "$TABLES" != "0" ]; then echo "[restore] $TARGET has $TABLES tables; restore into an empty database" >&2; exit 1; fi
gzip -dc "$FILE" | sql --default-character-set=utf8mb4 "$TARGET"
echo "[restore] $FILE → $TARGET ($(sql -N -e "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$TARGET'") tables)"
