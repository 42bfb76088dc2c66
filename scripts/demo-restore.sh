#!/usr/bin/env bash
# npm run demo:restore FILE — replaces the demo database and stored plan files with a backup from demo:backup.
# Stops the demo's app and upload stand-in first; start them again with `npm run demo`.
# MITERWISE_PG_CLUSTER, MITERWISE_DB and UPLOAD_STAND_IN_DIR choose another cluster, database or file folder
# (a cluster that does not exist yet is created, so a backup can be restored on a fresh machine).
export MITERWISE_PG_CLUSTER="${MITERWISE_PG_CLUSTER:-demo}"
source "$(dirname "$0")/lib.sh"
FILE="${1:-}"
[ -n "$FILE" ] && [ -f "$FILE" ] || die "usage: npm run demo:restore FILE (a file written by npm run demo:backup)"
DB="${MITERWISE_DB:-miterwise}"
UPLOADS="${UPLOAD_STAND_IN_DIR:-$DATA/uploads}"
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
tar -C "$work" -xf "$FILE" MANIFEST database.dump uploads.tar 2>/dev/null || die "$FILE is not a Miterwise backup"
grep -q '^miterwise backup$' "$work/MANIFEST" || die "$FILE is not a Miterwise backup"
if [ "$PG_CLUSTER" = demo ]; then stop_service app; stop_service uploads; fi
pg_up
recreate_database "$DB" >/dev/null
"$(pg_bin)/pg_restore" --no-owner --exit-on-error --dbname="$DB" "$work/database.dump"
rm -rf "$UPLOADS.restoring"; mkdir -p "$UPLOADS.restoring"
tar -C "$UPLOADS.restoring" -xf "$work/uploads.tar"
rm -rf "$UPLOADS"; mv "$UPLOADS.restoring" "$UPLOADS"
say "restored $FILE into database $DB and $UPLOADS"
