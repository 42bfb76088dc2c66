#!/usr/bin/env bash
# npm run demo — everything on loopback with embedded defaults: PostgreSQL, the SMTP stand-in, the app.
# Safe to run again: it stops the previous servers and seeds only what is missing.
export MITERWISE_PG_CLUSTER=demo
source "$(dirname "$0")/lib.sh"

APP_PORT="${PORT:-3000}"
SMTP_PORT="${SMTP_PORT:-2525}"
UPLOAD_STAND_IN_PORT="${UPLOAD_STAND_IN_PORT:-3900}"
ensure_node_modules
pg_up
ensure_database miterwise

export DATABASE_URL="$(db_url miterwise)"
export NEXTAUTH_URL="http://127.0.0.1:$APP_PORT"
export NEXTAUTH_SECRET="$(secret_file "$DATA/auth-secret")"
export SMTP_PORT OUTBOX_DIR="$DATA/outbox" MITERWISE_DATA_DIR="$DATA"
export UPLOAD_STAND_IN_PORT UPLOAD_STAND_IN_DIR="$DATA/uploads"

stop_service app
stop_service smtp
stop_service uploads
cd "$ROOT"
start_service uploads npx tsx scripts/upload-stand-in.ts # the seed stores the demo plan set through it
wait_for_port "$UPLOAD_STAND_IN_PORT" 30 || { tail -n 20 "$DATA/logs/uploads.log"; die "the upload stand-in did not start"; }
say "migrating"; npx tsx scripts/migrate.ts >/dev/null
say "seeding the demo organisations"; npx tsx scripts/seed-demo.ts

# Rebuild only when a source file is newer than the last build.
if [ ! -f .next/BUILD_ID ] || [ -n "$(find app components lib db takeoff public package-lock.json next.config.mjs -newer .next/BUILD_ID -print -quit)" ]; then
  say "building the app (production build)"; npx next build >"$DATA/logs/build.log" 2>&1 || { tail -n 30 "$DATA/logs/build.log"; die "build failed"; }
fi

start_service smtp npx tsx scripts/smtp-stand-in.ts
start_service app node scripts/serve.mjs -H 127.0.0.1 -p "$APP_PORT"
wait_for_http "$NEXTAUTH_URL/sign-in" 60 || { tail -n 30 "$DATA/logs/app.log"; die "the app did not start"; }

cat <<MSG

  Miterwise is running at  $NEXTAUTH_URL
  Demo outbox (mail sent): $NEXTAUTH_URL/demo/outbox
  Sign in with any of these (password: miterwise-demo):
$(npx tsx scripts/seed-demo.ts --list)

  Stop it with: npm run demo:stop     Logs: .data/logs/
MSG
