#!/usr/bin/env bash
# Starts or stops the private PostgreSQL alone: bash scripts/services/pg.sh start|stop|remove
# Reads TEARLINE_DATA_DIR (default .data), PG_PORT, PG_PURPOSE, PG_USER, PG_PASSWORD and PG_DB.
set -euo pipefail
source "$(dirname "$0")/common.sh"

DATA_DIR="${TEARLINE_DATA_DIR:-$ROOT/.data}"
PG_PORT="${PG_PORT:-54329}" PG_PURPOSE="${PG_PURPOSE:-demo}"
PG_USER="${PG_USER:-tearline}" PG_PASSWORD="${PG_PASSWORD:-tearline-local}" PG_DB="${PG_DB:-tearline}"

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
