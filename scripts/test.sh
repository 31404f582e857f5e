#!/usr/bin/env bash
# Runs the whole suite against its own services on their own ports, then stops them.
# Ends with one line "N passed, N failed".
set -euo pipefail
source "$(dirname "$0")/services/common.sh"
cd "$ROOT"

DATA_DIR="${TEST_DATA_DIR:-$ROOT/.test-data}"
APP_PORT="${TEST_APP_PORT:-3100}" PG_PORT="${TEST_PG_PORT:-54339}" S3_PORT="${TEST_S3_PORT:-4579}"
SMTP_PORT="${TEST_SMTP_PORT:-2535}" MAIL_HTTP_PORT="${TEST_MAIL_HTTP_PORT:-8035}"
PG_USER=tearline PG_PASSWORD=tearline-test PG_DB=tearline_test PG_FSYNC=off PG_PURPOSE=test

cleanup() {
  trap "" INT TERM
  stop_all
  remove_postgres
  rm -rf "$DATA_DIR"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

# Every run starts from nothing: fresh cluster, empty bucket, empty mailbox.
if [ -d "$DATA_DIR" ]; then
  remove_postgres
  rm -rf "$DATA_DIR"
fi
mkdir -p "$DATA_DIR/logs"

ensure_node_modules
ensure_apt chromium chromium
ensure_apt pdftotext poppler-utils
export_env
export TEARLINE_TEST=1 MAIL_RETRY_MS=2000
export CHROMIUM_PATH="${CHROMIUM_PATH:-$(command -v chromium)}"
start_services

node_modules/.bin/tsx scripts/migrate.ts >"$DATA_DIR/logs/migrate.log" 2>&1 || { cat "$DATA_DIR/logs/migrate.log"; fail "migrations failed"; }
node_modules/.bin/tsx --conditions=react-server scripts/seed-demo.ts --quiet >"$DATA_DIR/logs/seed.log" 2>&1 || { tail -30 "$DATA_DIR/logs/seed.log"; fail "demo seed failed"; }

say "Building the app for the browser and API tests…"
# REUSE_BUILD=1 skips the build when the dist folder exists (quick reruns while working on tests only).
build_and_start_app "${TEST_DIST_DIR:-.next-test}"

set +e
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json="$DATA_DIR/results.json" "$@"
status=$?
set -e
node -e '
  const r = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
  const failed = r.numFailedTests + (r.numFailedTestSuites > 0 && r.numFailedTests === 0 ? r.numFailedTestSuites : 0);
  console.log(`${r.numPassedTests} passed, ${failed} failed` + (r.numPendingTests ? `, ${r.numPendingTests} skipped` : ""));
' "$DATA_DIR/results.json" || echo "0 passed, 1 failed"
exit $status
