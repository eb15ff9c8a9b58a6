#!/usr/bin/env bash
# The README's test command: from a fresh Debian machine with Node.js, sets everything up against
# the test database, then runs typecheck, lint, unit, integration (real MariaDB) and browser tests
# (Debian's Chromium) against a production build. Exits non-zero when anything fails.
set -euo pipefail
ROOT="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")/.." && pwd -P)"
cd "$ROOT"
# shellcheck source=scripts/ensure-deps.sh
source scripts/ensure-deps.sh
# shellcheck source=scripts/local-env.sh
source scripts/local-env.sh

DB_PORT="${DB_PORT:-3407}"
TEST_PORT="${TEST_PORT:-3100}"
export DATABASE_URL="mysql://presswright_app:${DB_APP_PASSWORD:-presswright-dev-only}@127.0.0.1:${DB_PORT}/presswright_test"
export MIGRATE_DATABASE_URL="mysql://presswright_migrate:${DB_MIGRATE_PASSWORD:-presswright-migrate-dev-only}@127.0.0.1:${DB_PORT}/presswright_test"
export NEXT_DIST_DIR=".next-test" NEXT_TELEMETRY_DISABLED=1
RESULTS="$ROOT/.data/test-results"
FAILED=()

as_root() { if [[ $EUID -eq 0 ]]; then "$@"; else sudo "$@"; fi; }

ensure_chromium() {
  if ! command -v chromium >/dev/null 2>&1; then
    echo "Installing Debian's chromium for the browser tests…"
    as_root apt-get update -q
    DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -q --no-install-recommends chromium fonts-liberation
  fi
}

fresh_test_database() {
  bash scripts/db.sh reset-test
  npx tsx scripts/migrate.ts
}

# Runs a named check; a failure is recorded and the remaining checks still run.
check() {
  local name="$1"
  shift
  echo
  echo "=== $name"
  if "$@"; then echo "--- $name: ok"; else echo "--- $name: FAILED"; FAILED+=("$name"); fi
}

vitest_project() {
  npx vitest run --project "$1" --reporter=default --reporter=json --outputFile.json="$RESULTS/$1.json"
}

SERVER_PID=""
stop_server() { if [[ -n "$SERVER_PID" ]]; then kill "$SERVER_PID" 2>/dev/null || true; wait "$SERVER_PID" 2>/dev/null || true; fi; }
# The drill, fault and instance tests run their own MariaDB servers (tests/scratch-mariadb.ts) and
# stop them themselves; this catches any a crashed or interrupted test left running.
stop_scratch_servers() {
  local dir
  for dir in "$ROOT"/.data/scratch-*/; do
    [[ -d "$dir" ]] && DB_DATA_DIR="${dir%/}" bash scripts/db.sh stop >/dev/null 2>&1 || true
  done
}
cleanup() { stop_server; stop_scratch_servers; }
trap cleanup EXIT

browser_tests() {
  fresh_test_database
  npx tsx db/seed.ts --quiet
  assert_port_free "$TEST_PORT" || return 1
  # Short photo links, so the browser test can watch one expire (lib/photos/file-urls.ts).
  NODE_ENV=production INSECURE_COOKIES=1 PHOTO_URL_TTL_S=20 PORT="$TEST_PORT" node scripts/server.mjs >"$RESULTS/server.log" 2>&1 &
  SERVER_PID=$!
  node scripts/wait-for-health.mjs "http://127.0.0.1:$TEST_PORT/api/health" 90 || { cat "$RESULTS/server.log"; return 1; }
  kill -0 "$SERVER_PID" 2>/dev/null || { cat "$RESULTS/server.log"; return 1; }
  E2E_BASE_URL="http://127.0.0.1:$TEST_PORT" vitest_project e2e
}

ensure_node_modules "$ROOT"
ensure_chromium
mkdir -p "$RESULTS"
rm -f "$RESULTS"/*.json
bash scripts/db.sh start
FAKE_UT_DIR="$ROOT/.data/uploads-test" bash scripts/fake-uploadthing/start.sh
FAKE_SMTP_DIR="$ROOT/.data/mail-test" bash scripts/fake-smtp/start.sh
fresh_test_database

check "typecheck" npx tsc --noEmit
check "lint" npx eslint --max-warnings=0 .
check "unit tests" vitest_project unit
check "integration tests" vitest_project integration
check "production build" npx next build
if [[ " ${FAILED[*]} " != *" production build "* ]]; then
  check "browser tests" browser_tests
fi

node scripts/test-summary.mjs "$RESULTS" "${#FAILED[@]}"
if ((${#FAILED[@]})); then
  echo "Failed: ${FAILED[*]}"
  exit 1
fi
