#!/usr/bin/env bash
# The local UploadThing fake, run in the background for the start and test commands.
#
#   bash scripts/fake-uploadthing/start.sh [start]   start detached, or reuse one already answering
#   bash scripts/fake-uploadthing/start.sh stop      stop the one this script started
#   bash scripts/fake-uploadthing/start.sh status    exit 0 if answering, 1 if not
#
# Environment: FAKE_UT_PORT (default 4010), FAKE_UT_DIR (default .data/uploads),
# FAKE_UT_CALLBACK_TIMEOUT_MS, UPLOADTHING_TOKEN (default: the local development token).
# Log: .data/fake-uploadthing.log, pid file: .data/fake-uploadthing.pid.
set -euo pipefail
HERE="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")" && pwd -P)"
SERVICE=fake-uploadthing
SERVER_JS="$HERE/server.mjs"
PORT="${FAKE_UT_PORT:-4010}"
SERVER_ENV=(FAKE_UT_PORT="$PORT")
BUSY_HINT="Stop it or choose another, e.g. FAKE_UT_PORT=4011."
probe() { node "$HERE/probe.mjs" "$PORT" "${1:-0}"; }
# shellcheck source=scripts/lib/background-service.sh
source "$HERE/../lib/background-service.sh"
bg_service_main "$@"
