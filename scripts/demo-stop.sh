#!/usr/bin/env bash
# npm run demo:stop — stops the app, the SMTP stand-in and PostgreSQL. Data stays in .data/.
export MITERWISE_PG_CLUSTER=demo
source "$(dirname "$0")/lib.sh"
stop_service app
stop_service smtp
stop_service uploads
pg_down
say "stopped"
