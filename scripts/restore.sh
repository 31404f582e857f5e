#!/usr/bin/env bash
# npm run restore -- FOLDER: loads a backup into a fresh data folder (its own database and bucket),
# checks it against the manifest, and stops. Then npm run start:demo serves the restored copy.
set -euo pipefail
source "$(dirname "$0")/services/common.sh"
source "$ROOT/scripts/services/demo-env.sh"
[ -n "${1:-}" ] || fail "usage: npm run restore -- FOLDER (a folder written by npm run backup)"
from="$(realpath -m "$1")"
[ -f "$from/manifest.json" ] || fail "$from has no manifest.json; give a folder written by npm run backup"
cd "$ROOT"

port_in_use "$PG_PORT" && fail "Something is running on 127.0.0.1:$PG_PORT; stop Tearline before a restore."
[ -e "$DATA_DIR/pg" ] || [ -e "$DATA_DIR/pg-elsewhere" ] \
  && fail "$DATA_DIR already holds a database; move it aside or delete it (start over) and run the restore again."

trap 'trap "" INT TERM; stop_all' EXIT
trap 'exit 130' INT TERM
ensure_node_modules
mkdir -p "$DATA_DIR/logs"
export_env
start_services
node_modules/.bin/tsx --conditions=react-server scripts/backup/restore.ts "$from"
