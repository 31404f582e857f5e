#!/usr/bin/env bash
# Starts or stops the private PostgreSQL alone: bash scripts/services/pg.sh start|stop|remove
# Reads TEARLINE_DATA_DIR (default .data), PG_PORT, PG_PURPOSE, PG_PASSWORD and PG_DB (scripts/services/demo-env.sh).
set -euo pipefail
source "$(dirname "$0")/common.sh"

source "$ROOT/scripts/services/demo-env.sh"

case "${1:-}" in
  start)
    mkdir -p "$DATA_DIR/logs"
    ensure_postgres
    start_postgres
    say "PostgreSQL on 127.0.0.1:$PG_PORT, cluster in $PG_DIR"
    ;;
  stop)
    ensure_postgres
    pg_locate
    PG_STARTED=1
    stop_postgres
    ;;
  remove) # stop and delete the cluster wherever it lives, and $DATA_DIR with it
    remove_postgres
    rm -rf "$DATA_DIR"
    ;;
  *) fail "usage: bash scripts/services/pg.sh start|stop|remove" ;;
esac
