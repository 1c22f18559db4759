#!/usr/bin/env bash
# npm test: the same provisioning as npm start against a separate test database and ports,
# then every test (server, shared, components, browser). Ends with "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")/.."
export DB_NAME="${TEST_DB_NAME:-sightline_test}"
export PORT="${TEST_PORT:-8091}"
export SMTP_PORT="${TEST_SMTP_PORT:-2526}"
export MAILBOX_URL="http://127.0.0.1:${TEST_MAILBOX_PORT:-2581}"
export S3_ENDPOINT="http://127.0.0.1:${TEST_S3_PORT:-4570}"
export S3_BUCKET="sightline-test-files"
export NODE_ENV=test
export MAILBOX_OPEN=false  # tests check the production rule: admins only
source scripts/env.sh
source scripts/provision.sh
set -e

trap cleanup EXIT INT TERM

ensure_node_modules
ensure_mariadb_installed
ensure_chromium_installed
ensure_haproxy_installed
ensure_poppler_installed
start_mariadb
# A fresh test database every run, so no test depends on what an earlier run left.
db_root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; DROP DATABASE IF EXISTS \`${DB_NAME}_migrations\`;"
create_database "$DB_NAME"
create_database "${DB_NAME}_migrations"
rm -rf "$DATA_DIR/mail/$SMTP_PORT" "$DATA_DIR/s3/${S3_ENDPOINT##*:}"
# The fakes start first: the demo seed stores files in object storage.
start_fakes
migrate_and_seed
build_web_if_stale

OUTBOX_INTERVAL_MS=1000 node --import tsx server/index.ts >"$DATA_DIR/log/test-server.log" 2>&1 &
SERVER_PID=$!
wait_for_port "$PORT" "Sightline (test)"

set +e
mkdir -p tests/e2e/artifacts
npx jest --runInBand --json --outputFile="$DATA_DIR/jest-results.json" "$@"
status=$?
summary=$(node -e '
  const r = require(process.argv[1]);
  const skipped = r.numPendingTests + r.numTodoTests;
  const failedSuites = r.numRuntimeErrorTestSuites;
  if (failedSuites) console.log(failedSuites + " test file(s) failed to run");
  console.log(`${r.numPassedTests} passed, ${r.numFailedTests + failedSuites} failed` + (skipped ? `, ${skipped} skipped` : ""));
' "$DATA_DIR/jest-results.json" 2>/dev/null || echo "0 passed, 1 failed")
# Stop the services first, so the summary is the last line (CI reads it).
cleanup
echo "$summary"
exit $status
