#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB and the local fakes, migrate, seed, serve.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/env.sh
source scripts/provision.sh

trap cleanup EXIT INT TERM

ensure_node_modules
ensure_mariadb_installed
start_mariadb
create_database "$DB_NAME"
# The fakes start first: the demo seed stores files in object storage.
start_fakes
migrate_and_seed
build_web_if_stale

node --import tsx server/index.ts &
SERVER_PID=$!
wait_for_port "$PORT" "Sightline"
cat <<TXT

  Sightline is running at $APP_URL   (Ctrl-C stops the app, the fakes and MariaDB)

  Demo sign-ins (Orrinvale Site Imaging, an invented demo firm; password for every account: sightline-demo)
    technician  tess.okafor@orrinvale.test
    reviewer    ravi.lindqvist@orrinvale.test
    manager     mara.delacroix@orrinvale.test
    admin       alex.brandt@orrinvale.test

TXT
wait "$SERVER_PID"
