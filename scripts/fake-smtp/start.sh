#!/usr/bin/env bash
# The local SMTP fake, run in the background for the start and test commands.
#
#   bash scripts/fake-smtp/start.sh [start]   start detached, or reuse one already answering
#   bash scripts/fake-smtp/start.sh stop      stop the one this script started
#   bash scripts/fake-smtp/start.sh status    exit 0 if answering, 1 if not
#
# Environment: SMTP_PORT (default 2525), SMTP_API_PORT (default SMTP_PORT + 1000),
# FAKE_SMTP_DIR (default .data/mail). Log: .data/fake-smtp.log, pid file: .data/fake-smtp.pid.
set -euo pipefail
HERE="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")" && pwd -P)"
SERVICE=fake-smtp
SERVER_JS="$HERE/server.mjs"
PORT="${SMTP_PORT:-2525}"
SERVER_ENV=(SMTP_PORT="$PORT")
BUSY_HINT="Stop it or choose another, e.g. SMTP_PORT=2526 (its messages API is SMTP_API_PORT, default SMTP_PORT + 1000)."
probe() { SMTP_PORT="$PORT" node "$HERE/probe.mjs" "${1:-0}"; }
# shellcheck source=scripts/lib/background-service.sh
source "$HERE/../lib/background-service.sh"
bg_service_main "$@"
