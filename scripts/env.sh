# Shared settings for the start and test scripts. Every value can be overridden from the
# environment; the test script sets its own ports and database so it never touches demo data.
export HOST="${HOST:-127.0.0.1}"
export PORT="${PORT:-8080}"
export DB_HOST="${DB_HOST:-127.0.0.1}"
export DB_PORT="${DB_PORT:-3407}"
export DB_NAME="${DB_NAME:-sightline}"
export DB_USER="${DB_USER:-sightline}"
export DB_PASSWORD="${DB_PASSWORD:-sightline-local}"
export SMTP_HOST="${SMTP_HOST:-127.0.0.1}"
export SMTP_PORT="${SMTP_PORT:-2525}"
export MAILBOX_URL="${MAILBOX_URL:-http://127.0.0.1:2580}"
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:4569}"
export S3_BUCKET="${S3_BUCKET:-sightline-files}"
export MAILBOX_OPEN="${MAILBOX_OPEN:-true}"  # development: every role may read the fake mailbox
export APP_URL="${APP_URL:-http://$HOST:$PORT}"
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1
export DATA_DIR="${DATA_DIR:-$PWD/.data}"
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true  # the S3 client warns about Node 20 on every start
