#!/usr/bin/env bash
# Everything the app needs before it can serve: packages, secrets, MariaDB, the local
# service fakes, migrations and the demo data. Idempotent; used by start.sh and test.sh.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/lib.sh
ensure_node_modules
load_env
bash scripts/db.sh start
bash scripts/services.sh start
node_modules/.bin/tsx --conditions=react-server scripts/migrate.ts
node_modules/.bin/tsx --conditions=react-server scripts/seed.ts
