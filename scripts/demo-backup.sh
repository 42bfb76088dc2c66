#!/usr/bin/env bash
# npm run demo:backup [FILE] — one file with the demo database (pg_dump, custom format) and the stored plan files.
# Default FILE: .data/backups/miterwise-<UTC time>.tar. Safe while the demo runs (pg_dump reads one snapshot).
# MITERWISE_PG_CLUSTER, MITERWISE_DB and UPLOAD_STAND_IN_DIR choose another cluster, database or file folder.
export MITERWISE_PG_CLUSTER="${MITERWISE_PG_CLUSTER:-demo}"
source "$(dirname "$0")/lib.sh"
DB="${MITERWISE_DB:-miterwise}"
UPLOADS="${UPLOAD_STAND_IN_DIR:-$DATA/uploads}"
FILE="${1:-$DATA/backups/miterwise-$(date -u +%Y%m%dT%H%M%SZ).tar}"
pg_up
mkdir -p "$(dirname "$FILE")" "$UPLOADS"
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
"$(pg_bin)/pg_dump" --format=custom --no-owner --file="$work/database.dump" "$DB"
tar -C "$UPLOADS" -cf "$work/uploads.tar" .
printf 'miterwise backup\ndatabase: %s\ntaken: %s\n' "$DB" "$(date -u +%FT%TZ)" >"$work/MANIFEST"
(umask 077; tar -C "$work" -cf "$FILE" MANIFEST database.dump uploads.tar)
say "backup written to $FILE"
