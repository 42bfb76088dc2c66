#!/usr/bin/env bash
# npm run bench:plans — rendering and upload figures in headless Chromium against a production build.
# Prints figures; asserts nothing. Uses its own database, build folder and ports, so it can run beside a demo.
source "$(dirname "$0")/lib.sh"
ensure_chromium
ensure_node_modules
export MITERWISE_TEST_DB=miterwise_bench_test
source "$ROOT/scripts/test-env.sh"
recreate_database "$TEST_DB" >/dev/null
export NEXT_DIST_DIR=".next-bench" APP_PORT=$((APP_PORT + 20)) UPLOAD_STAND_IN_PORT=$((UPLOAD_STAND_IN_PORT + 20))
export NEXTAUTH_URL="http://127.0.0.1:$APP_PORT" UPLOAD_STAND_IN_DIR="$DATA/bench/uploads"
cd "$ROOT"
npx tsx scripts/migrate.ts >/dev/null
if [ ! -f .next-bench/BUILD_ID ] || [ -n "$(find app components lib db takeoff public package-lock.json next.config.mjs -newer .next-bench/BUILD_ID -print -quit)" ]; then
  say "building (production)"; npx next build >"$DATA/logs/bench-build.log" 2>&1 || { tail -n 30 "$DATA/logs/bench-build.log"; die "build failed"; }
fi
start_service bench-uploads npx tsx scripts/upload-stand-in.ts
start_service bench-app npx next start -H 127.0.0.1 -p "$APP_PORT"
trap 'stop_service bench-app; stop_service bench-uploads' EXIT
wait_for_port "$UPLOAD_STAND_IN_PORT" 30 || die "upload stand-in did not start"
wait_for_http "$NEXTAUTH_URL/sign-in" 90 || die "the app did not start"
npx tsx scripts/bench-plans.ts
