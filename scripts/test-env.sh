# Source this to get the test environment in your shell (PostgreSQL up, variables exported):
#   source scripts/test-env.sh && npx vitest run --project integration
# `npm test` sources it too, so one suite run by hand sees exactly what the full run sees.
export MITERWISE_PG_CLUSTER=test # its own cluster and data folder; only it runs with fsync off
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
pg_up
TEST_DB="${MITERWISE_TEST_DB:-miterwise_test}" # a second name lets two people test side by side
ensure_database "$TEST_DB"

OFF="$(checkout_offset)"
export DATABASE_URL="$(db_url "$TEST_DB")"
export APP_PORT="$((31000 + OFF))" SMTP_PORT="$((32000 + OFF))" UPLOAD_STAND_IN_PORT="$((33000 + OFF))"
export NEXTAUTH_URL="http://127.0.0.1:$APP_PORT"
export NEXTAUTH_SECRET="$(secret_file "$DATA/test-auth-secret")" # per checkout, never a published constant
export MITERWISE_DATA_DIR="$DATA/test" OUTBOX_DIR="$DATA/test/outbox" UPLOAD_STAND_IN_DIR="$DATA/test/uploads" BCRYPT_ROUNDS=4
export NEXT_DIST_DIR=".next-test" # the demo's build in .next stays untouched
mkdir -p "$MITERWISE_DATA_DIR/results"
