#!/usr/bin/env bash
# npm run bench [-- --quick]: its own database (sightline_bench) on the project's MariaDB,
# migrated, then scripts/bench/index.ts. The web app is built first if stale, so the first
# load is measured on the real bundle.
set -uo pipefail
cd "$(dirname "$0")/../.."
export DB_NAME="${BENCH_DB_NAME:-sightline_bench}"
source scripts/env.sh
source scripts/provision.sh
set -e
trap cleanup EXIT INT TERM

ensure_node_modules
ensure_mariadb_installed
ensure_chromium_installed
start_mariadb
create_database "$DB_NAME"
log "migrating $DB_NAME"
npm run -s db:migrate >/dev/null
build_web_if_stale
node --import tsx scripts/bench/index.ts "$@"
