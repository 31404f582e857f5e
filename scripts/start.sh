#!/usr/bin/env bash
# Starts Tearline with its demo data and every local service; Ctrl-C stops everything.
set -euo pipefail
source "$(dirname "$0")/services/common.sh"
cd "$ROOT"

source "$ROOT/scripts/services/demo-env.sh"
mkdir -p "$DATA_DIR/logs"

# A second signal (npm passes Ctrl-C on as TERM) must not cut the clean-up short.
trap 'trap "" INT TERM; say "Stopping…"; stop_all; say "Stopped."' EXIT
trap 'exit 130' INT TERM

require_free_port "$APP_PORT" "Tearline web app" APP_PORT
ensure_node_modules
export_env
start_services
say "Database on 127.0.0.1:$PG_PORT, object store on :$S3_PORT, mail fake on :$SMTP_PORT (read at $MAIL_FAKE_URL/messages)"

node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx --conditions=react-server scripts/seed-demo.ts ${TEARLINE_RESEED:+--reset}

say "Building the production app…"
export NEXT_DIST_DIR=.next
node_modules/.bin/next build >"$DATA_DIR/logs/build.log" 2>&1 || { tail -40 "$DATA_DIR/logs/build.log"; fail "next build failed; full log in $DATA_DIR/logs/build.log"; }

say "Tearline is at http://127.0.0.1:$APP_PORT  (demo sign-ins are in the README; Ctrl-C stops everything)"
node_modules/.bin/next start -H 127.0.0.1 -p "$APP_PORT" &
PIDS+=($!)
wait "${PIDS[-1]}"
