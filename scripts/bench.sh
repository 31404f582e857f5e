#!/usr/bin/env bash
# Runs every scripts/bench/*.ts (or those whose name contains an argument) against fresh local
# services on their own ports, prints each bench's lines, then stops everything.
#   npm run bench            all benches
#   npm run bench -- photo   only scripts/bench/*photo*.ts
set -euo pipefail
source "$(dirname "$0")/services/common.sh"
cd "$ROOT"

DATA_DIR="${BENCH_DATA_DIR:-$ROOT/.bench-data}"
APP_PORT="${BENCH_APP_PORT:-3200}" PG_PORT="${BENCH_PG_PORT:-54349}" S3_PORT="${BENCH_S3_PORT:-4589}"
SMTP_PORT="${BENCH_SMTP_PORT:-2545}" MAIL_HTTP_PORT="${BENCH_MAIL_HTTP_PORT:-8045}"
PG_USER=tearline PG_PASSWORD=tearline-bench PG_DB=tearline_bench PG_FSYNC=on

benches=()
for f in scripts/bench/*.ts; do
  if [ $# -eq 0 ]; then benches+=("$f"); continue; fi
  for want in "$@"; do [[ "$(basename "$f")" == *"$want"* ]] && benches+=("$f") && break; done
done
[ ${#benches[@]} -gt 0 ] || fail "no bench in scripts/bench/ matches: $*"

cleanup() {
  trap "" INT TERM
  stop_all
  rm -rf "$DATA_DIR"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

rm -rf "$DATA_DIR"
mkdir -p "$DATA_DIR/logs"
ensure_node_modules
export_env
start_services
node_modules/.bin/tsx scripts/migrate.ts >"$DATA_DIR/logs/migrate.log" 2>&1 || { cat "$DATA_DIR/logs/migrate.log"; fail "migrations failed"; }
node_modules/.bin/tsx --conditions=react-server scripts/seed-demo.ts --quiet >"$DATA_DIR/logs/seed.log" 2>&1 || { tail -30 "$DATA_DIR/logs/seed.log"; fail "demo seed failed"; }

failed=0
for f in "${benches[@]}"; do
  say "bench: $(basename "$f" .ts)"
  # react-server lets scripts import the server-only modules the app uses.
  node_modules/.bin/tsx --conditions=react-server "$f" || { failed=$((failed + 1)); printf '\033[31m[tearline] %s failed\033[0m\n' "$f"; }
done
[ "$failed" -eq 0 ] || fail "$failed bench(es) failed"
