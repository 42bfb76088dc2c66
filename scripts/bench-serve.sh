#!/usr/bin/env bash
# Runs a benchmark script against a production build: `bash scripts/bench-serve.sh NAME PORT_OFFSET SCRIPT.ts`.
# Own database, build folder and ports, so it can run beside a demo. Prints figures; asserts nothing.
source "$(dirname "$0")/lib.sh"
name="$1" offset="$2" script="$3"
ensure_chromium
ensure_node_modules
export MITERWISE_TEST_DB="miterwise_${name}_test"
source "$ROOT/scripts/test-env.sh"
recreate_database "$TEST_DB" >/dev/null
export NEXT_DIST_DIR=".next-bench" APP_PORT=$((APP_PORT + offset)) UPLOAD_STAND_IN_PORT=$((UPLOAD_STAND_IN_PORT + offset))
export NEXTAUTH_URL="http://127.0.0.1:$APP_PORT" UPLOAD_STAND_IN_DIR="$DATA/bench-$name/uploads"
cd "$ROOT"
npx tsx scripts/migrate.ts >/dev/null
if [ ! -f .next-bench/BUILD_ID ] || [ -n "$(find app components lib db takeoff public package-lock.json next.config.mjs -newer .next-bench/BUILD_ID -print -quit)" ]; then
  say "building (production)"; npx next build >"$DATA/logs/bench-build.log" 2>&1 || { tail -n 30 "$DATA/logs/bench-build.log"; die "build failed"; }
fi
start_service "bench-$name-uploads" npx tsx scripts/upload-stand-in.ts
start_service "bench-$name-app" node scripts/serve.mjs -H 127.0.0.1 -p "$APP_PORT"
trap 'stop_service "bench-$name-app"; stop_service "bench-$name-uploads"' EXIT
wait_for_port "$UPLOAD_STAND_IN_PORT" 30 || die "upload stand-in did not start"
wait_for_http "$NEXTAUTH_URL/api/health" 90 || die "the app did not start"
npx tsx "$script"
