#!/usr/bin/env bash
# The README's start command: from a fresh Debian machine with Node.js to the app with demo data
# at http://127.0.0.1:3000. Safe to run again: the database is reused and the demo seeded once.
set -euo pipefail
ROOT="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")/.." && pwd -P)"
cd "$ROOT"
# shellcheck source=scripts/ensure-deps.sh
source scripts/ensure-deps.sh
# shellcheck source=scripts/local-env.sh
source scripts/local-env.sh

PORT="${PORT:-3000}"
assert_port_free "$PORT"
ensure_node_modules "$ROOT"
bash scripts/db.sh start
if [[ "${UPLOADTHING_LOCAL_FAKE:-}" == 1 ]]; then bash scripts/fake-uploadthing/start.sh; fi
# No SMTP server named: mail goes to the local SMTP fake (read it at /dev/outbox under npm run dev,
# or from its messages API on SMTP_API_PORT).
if [[ -z "${SMTP_HOST:-}" ]]; then bash scripts/fake-smtp/start.sh; fi
# The reminder job's secret: generated per start unless the environment sets one.
export JOBS_SECRET="${JOBS_SECRET:-$(node -e 'process.stdout.write(require("crypto").randomBytes(24).toString("hex"))')}"
npx tsx scripts/migrate.ts
npx tsx db/seed.ts --quiet
export NEXT_TELEMETRY_DISABLED=1
echo "Building the production app…"
npx next build
# Plain HTTP on loopback: the session cookie cannot be __Host-/Secure here (see lib/auth/cookie.ts).
export NODE_ENV=production INSECURE_COOKIES="${INSECURE_COOKIES:-1}" PORT
node scripts/server.mjs &
SERVER_PID=$!
node scripts/reminder-loop.mjs "http://127.0.0.1:$PORT" &
REMINDER_PID=$!
trap 'kill "$SERVER_PID" "$REMINDER_PID" 2>/dev/null || true' INT TERM EXIT
node scripts/wait-for-health.mjs "http://127.0.0.1:$PORT/api/health" 90 || { kill "$SERVER_PID" 2>/dev/null; exit 1; }
kill -0 "$SERVER_PID" 2>/dev/null || { echo "The app server stopped; see the messages above." >&2; exit 1; }
npx tsx db/seed.ts --print-only
echo
echo "Presswright is running at http://127.0.0.1:$PORT  (Ctrl+C to stop; the database keeps running — npm run db:stop)"
wait "$SERVER_PID"
