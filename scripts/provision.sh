# Provisioning shared by `npm start` and `npm test`: dependencies, MariaDB, schema, demo data.
# Sourced, not run: the caller owns the cleanup trap.

log() { printf '\033[1m[sightline]\033[0m %s\n' "$*"; }

apt_updated=0
apt_install() {
  if [ "$apt_updated" = 0 ]; then apt-get update -qq >/dev/null; apt_updated=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  # Re-install only when the lock file changed since the last install.
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm dependencies"
    npm ci --no-audit --no-fund
  fi
}

ensure_mariadb_installed() {
  if ! command -v mariadbd >/dev/null 2>&1; then
    log "installing MariaDB from Debian's packages"
    apt_install mariadb-server
  fi
}

ensure_chromium_installed() {
  if [ ! -x /usr/bin/chromium ]; then
    log "installing Chromium from Debian's packages (browser tests)"
    apt_install chromium
  fi
}

ensure_poppler_installed() {
  if ! command -v pdftotext >/dev/null 2>&1; then
    log "installing poppler-utils from Debian's packages (summary PDF tests)"
    apt_install poppler-utils
  fi
}

ensure_haproxy_installed() {
  if ! command -v haproxy >/dev/null 2>&1 && [ ! -x /usr/sbin/haproxy ]; then
    log "installing HAProxy from Debian's packages (two-instance tests)"
    apt_install haproxy
  fi
}

DB_DIR="$DATA_DIR/mariadb"
DB_SOCKET="$DB_DIR/run/mariadb.sock"
DB_STARTED_HERE=0

db_root() { mariadb --no-defaults --socket="$DB_SOCKET" -uroot "$@"; }

start_mariadb() {
  mkdir -p "$DB_DIR/run" "$DB_DIR/tmp" "$DB_DIR/log"
  if [ ! -d "$DB_DIR/data/mysql" ]; then
    log "initialising a private MariaDB data folder in $DB_DIR"
    mariadb-install-db --no-defaults --user=root --datadir="$DB_DIR/data" \
      --auth-root-authentication-method=socket --skip-test-db >"$DB_DIR/log/install.log" 2>&1
  fi
  if mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot ping >/dev/null 2>&1; then
    log "MariaDB already running on $DB_HOST:$DB_PORT"
    return
  fi
  log "starting MariaDB on $DB_HOST:$DB_PORT"
  mariadbd --no-defaults --user=root --datadir="$DB_DIR/data" --bind-address="$DB_HOST" --port="$DB_PORT" \
    --socket="$DB_SOCKET" --pid-file="$DB_DIR/run/mariadb.pid" --tmpdir="$DB_DIR/tmp" \
    --log-error="$DB_DIR/log/error.log" --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci &
  DB_STARTED_HERE=1
  for _ in $(seq 1 150); do
    mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot ping >/dev/null 2>&1 && return
    sleep 0.2
  done
  log "MariaDB did not start; see $DB_DIR/log/error.log"; exit 1
}

stop_mariadb() {
  if [ "$DB_STARTED_HERE" = 1 ]; then
    log "stopping MariaDB"
    mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot shutdown >/dev/null 2>&1 || true
  fi
}

create_database() {
  db_root -e "CREATE DATABASE IF NOT EXISTS \`$1\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
    GRANT ALL PRIVILEGES ON \`$1\`.* TO '$DB_USER'@'127.0.0.1';"
}

migrate_and_seed() {
  log "migrating $DB_NAME"
  npm run -s db:migrate >/dev/null
  log "seeding demo data into $DB_NAME"
  npm run -s db:seed >/dev/null
}

build_web_if_stale() {
  # Rebuild only when a client source is newer than the last build.
  local stamp=dist/index.html
  if [ ! -f "$stamp" ] || [ -n "$(find app components shared assets app.json package-lock.json -newer "$stamp" -print -quit 2>/dev/null)" ]; then
    log "building the web app"
    npm run -s build:web >"$DATA_DIR/expo-export.log" 2>&1 || { cat "$DATA_DIR/expo-export.log"; exit 1; }
  fi
}

FAKE_PIDS=()
start_fakes() {
  # Local stand-ins for hosted services, each speaking the real protocol on loopback.
  mkdir -p "$DATA_DIR/log"
  node --import tsx scripts/fakes/smtp.ts >"$DATA_DIR/log/smtp-$SMTP_PORT.log" 2>&1 &
  FAKE_PIDS+=($!)
  node --import tsx scripts/fakes/s3.ts >"$DATA_DIR/log/s3-${S3_ENDPOINT##*:}.log" 2>&1 &
  FAKE_PIDS+=($!)
  wait_for_port "$SMTP_PORT" "fake SMTP"
  wait_for_port "${MAILBOX_URL##*:}" "fake mailbox"
  wait_for_port "${S3_ENDPOINT##*:}" "fake S3"
}

stop_fakes() {
  for pid in "${FAKE_PIDS[@]:-}"; do [ -n "$pid" ] && kill "$pid" 2>/dev/null; done
  FAKE_PIDS=()
}

wait_for_port() {
  for _ in $(seq 1 150); do
    (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null && return
    sleep 0.2
  done
  log "$2 did not open port $1; see $DATA_DIR/log"; exit 1
}

# Stops what this script started (the app server, the fakes, MariaDB), once.
SERVER_PID=""
cleanup() {
  trap - EXIT INT TERM
  set +e  # a failing stop must not skip the rest of the clean-up
  [ -n "$SERVER_PID" ] && kill "$SERVER_PID" 2>/dev/null && wait "$SERVER_PID" 2>/dev/null
  stop_fakes
  stop_mariadb
}
