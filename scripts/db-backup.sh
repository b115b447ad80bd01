#!/usr/bin/env bash
# npm run db:backup [-- FILE]: one consistent dump of the app's database per run
# (mariadb-dump --single-transaction: InnoDB tables are read in one snapshot while the app
# keeps writing), gzipped into .data/backups/<database>-<UTC time>.sql.gz unless FILE is given.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
load_env
OUT="${1:-}"
if [ -z "$OUT" ]; then
  mkdir -p .data/backups
  OUT=".data/backups/${DATABASE_NAME}-$(date -u +%Y%m%dT%H%M%S%3NZ).sql.gz"
fi
if [ -e "$OUT" ]; then echo "[backup] $OUT exists already; a backup never overwrites one" >&2; exit 1; fi
TMP="$OUT.partial"
trap 'rm -f "$TMP"' EXIT
mariadb-dump --no-defaults --host="$DATABASE_HOST" --port="$DATABASE_PORT" --user="$DATABASE_USER" --password="$DATABASE_PASSWORD" \
  --single-transaction --quick --triggers --hex-blob --no-tablespaces \
  --default-character-set=utf8mb4 "$DATABASE_NAME" | gzip -6 >"$TMP"
# Only a complete dump gets the file's name (mariadb-dump writes this line last).
gzip -dc "$TMP" | tail -n 1 | grep -q '^-- Dump completed' || { echo "[backup] the dump is incomplete" >&2; exit 1; }
mv "$TMP" "$OUT"
echo "[backup] $DATABASE_NAME → $OUT ($(wc -c <"$OUT") bytes)"
