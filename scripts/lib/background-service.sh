# shellcheck shell=bash
# Start / stop / status of a local fake service run in the background (the upload and SMTP fakes).
# Sourced by scripts/fake-*/start.sh after they set:
#   SERVICE     name used in messages, the log (.data/$SERVICE.log) and the pid file
#   SERVER_JS   the Node server to run
#   PORT        its main port;  SERVER_ENV  array of VAR=value for the server
#   BUSY_HINT   what to tell when the port is taken by another program
#   probe [timeout_s]  exit 0 if our fake answers, 1 if nothing listens, 2 if something else does
# then call: bg_service_main "$@"
DATA_DIR="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")/../.." && pwd -P)/.data"
LOG="$DATA_DIR/$SERVICE.log"
PIDFILE="$DATA_DIR/$SERVICE.pid"

note() { printf '%s: %s\n' "$SERVICE" "$*" >&2; }
die() { note "error: $*"; exit 1; }

[[ "$PORT" =~ ^[0-9]{1,5}$ ]] && ((10#$PORT >= 1 && 10#$PORT <= 65535)) || die "the port must be a number 1-65535 (got '$PORT')."

# The pid from the pid file, only if it is still our server (guards against a recycled pid).
our_pid() {
  local pid=""
  [[ -r "$PIDFILE" ]] && read -r pid <"$PIDFILE" || true
  [[ "$pid" =~ ^[0-9]+$ && -r "/proc/$pid/cmdline" ]] || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "$SERVER_JS" || return 1
  printf '%s' "$pid"
}

cmd_start() {
  local status=0
  probe || status=$?
  if ((status == 0)); then
    note "reusing the one already answering on 127.0.0.1:$PORT"
    return 0
  fi
  ((status == 1)) || die "port $PORT is in use by another program. $BUSY_HINT"
  mkdir -p "$DATA_DIR"
  local offset pid
  touch "$LOG"
  offset="$(wc -c <"$LOG")"
  # Own session and no inherited terminal, so it outlives the calling shell and pipes.
  local -a detach=(nohup)
  command -v setsid >/dev/null 2>&1 && detach=(setsid nohup)
  env "${SERVER_ENV[@]}" "${detach[@]}" node "$SERVER_JS" </dev/null >>"$LOG" 2>&1 &
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
  note "ready on 127.0.0.1:$PORT (pid $pid, log $LOG)"
}

cmd_stop() {
  local pid waited=0
  if ! pid="$(our_pid)"; then
    rm -f "$PIDFILE"
    if probe; then note "one answers on port $PORT but was not started by this script; leaving it"; else note "not running"; fi
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

bg_service_main() {
  case "${1:-start}" in
    start) cmd_start ;;
    stop) cmd_stop ;;
    status) cmd_status ;;
    *) note "usage: bash $0 [start|stop|status]"; exit 2 ;;
  esac
}
