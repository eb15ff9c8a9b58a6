#!/usr/bin/env bash
# The local SMTP fake, run in the background for the start and test commands.
#
#   bash scripts/fake-smtp/start.sh [start]   start detached, or reuse one already answering
#   bash scripts/fake-smtp/start.sh stop      stop the one this script started
#   bash scripts/fake-smtp/start.sh status    exit 0 if answering, 1 if not
#
# Environment: SMTP_PORT (default 2525), SMTP_API_PORT (default SMTP_PORT + 1000),
# FAKE_SMTP_DIR (default .data/mail).
# Log: .data/fake-smtp.log, pid file: .data/fake-smtp.pid.
set -euo pipefail
HERE="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")" && pwd -P)"
DATA_DIR="$(cd -- "$HERE/../.." && pwd -P)/.data"
PORT="${SMTP_PORT:-2525}"
LOG="$DATA_DIR/fake-smtp.log"
PIDFILE="$DATA_DIR/fake-smtp.pid"

note() { printf 'fake-smtp: %s\n' "$*" >&2; }
die() { note "error: $*"; exit 1; }

[[ "$PORT" =~ ^[0-9]{1,5}$ ]] && ((10#$PORT >= 1 && 10#$PORT <= 65535)) || die "SMTP_PORT must be a port number 1-65535 (got '$PORT')."

probe() { SMTP_PORT="$PORT" node "$HERE/probe.mjs" "${1:-0}"; }

# The pid from the pid file, only if it is still our server (guards against a recycled pid).
our_pid() {
  local pid=""
  [[ -r "$PIDFILE" ]] && read -r pid <"$PIDFILE" || true
  [[ "$pid" =~ ^[0-9]+$ && -r "/proc/$pid/cmdline" ]] || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "$HERE/server.mjs" || return 1
  printf '%s' "$pid"
}

cmd_start() {
  local status=0
  probe || status=$?
  if ((status == 0)); then
    note "reusing the fake already answering on 127.0.0.1:$PORT"
    return 0
  fi
  ((status == 1)) || die "port $PORT is in use by another program. Stop it or choose another, e.g. SMTP_PORT=2526 (its messages API is SMTP_API_PORT, default SMTP_PORT + 1000)."
  mkdir -p "$DATA_DIR"
  local offset pid
  touch "$LOG"
  offset="$(wc -c <"$LOG")"
  # Own session and no inherited terminal, so it outlives the calling shell and pipes.
  local -a detach=(nohup)
  command -v setsid >/dev/null 2>&1 && detach=(setsid nohup)
  SMTP_PORT="$PORT" "${detach[@]}" node "$HERE/server.mjs" </dev/null >>"$LOG" 2>&1 &
  pid=$!
  echo "$pid" >"$PIDFILE"
  status=0
  probe 15 || status=$?
  if ((status != 0)) || ! kill -0 "$pid" 2>/dev/null; then
    tail -c "+$((offset + 1))" "$LOG" | tail -n 20 >&2
    kill "$pid" 2>/dev/null || true
    rm -f "$PIDFILE"
    die "did not start (full log: $LOG)."
  fi
  note "ready: SMTP on 127.0.0.1:$PORT, messages API on port ${SMTP_API_PORT:-$((PORT + 1000))} (pid $pid, log $LOG)"
}

cmd_stop() {
  local pid waited=0
  if ! pid="$(our_pid)"; then
    rm -f "$PIDFILE"
    if probe; then note "a fake answers on port $PORT but was not started by this script; leaving it"; else note "not running"; fi
    return 0
  fi
  kill -TERM "$pid"
  while kill -0 "$pid" 2>/dev/null; do
    ((waited++ < 50)) || die "pid $pid still running after 10 s."
    sleep 0.2
  done
  rm -f "$PIDFILE"
  note "stopped"
}

cmd_status() {
  if probe; then note "running on 127.0.0.1:$PORT"; return 0; fi
  note "not running"
  return 1
}

case "${1:-start}" in
  start) cmd_start ;;
  stop) cmd_stop ;;
  status) cmd_status ;;
  *) note "usage: bash scripts/fake-smtp/start.sh [start|stop|status]"; exit 2 ;;
esac
