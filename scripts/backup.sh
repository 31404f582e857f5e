#!/usr/bin/env bash
# npm run backup [-- FOLDER]: copies the running Tearline's database and photos into one folder
# (default backups/tearline-<time>) with a manifest of row counts and SHA-256 per object.
set -euo pipefail
source "$(dirname "$0")/services/common.sh"
source "$ROOT/scripts/services/demo-env.sh"
out="${1:-}"; [ -n "$out" ] && out="$(realpath -m "$out")"
cd "$ROOT"

ensure_node_modules
ensure_postgres
port_in_use "$PG_PORT" || fail "Tearline's database is not running on 127.0.0.1:$PG_PORT; start it (npm run start:demo) before a backup."
port_in_use "$S3_PORT" || fail "Tearline's object store is not running on 127.0.0.1:$S3_PORT; start it (npm run start:demo) before a backup."
mkdir -p "$DATA_DIR/logs"
export_env
exec node_modules/.bin/tsx --conditions=react-server scripts/backup/backup.ts ${out:+"$out"}
