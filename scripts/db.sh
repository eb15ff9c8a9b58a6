#!/usr/bin/env bash
# Project-local MariaDB for development, tests and CI.
#
#   bash scripts/db.sh start        install if needed, init .data/mariadb, start, provision
#   bash scripts/db.sh stop         clean shutdown
#   bash scripts/db.sh status       exit 0 if running, 1 if not
#   bash scripts/db.sh sql [db] ... mariadb client as admin over the project socket
#   bash scripts/db.sh reset-test   drop and recreate presswright_test
#   bash scripts/db.sh reset-scale  drop and recreate presswright_scale (npm run seed:scale)
#
# Environment: DB_PORT (default 3407), DB_APP_PASSWORD, DB_MIGRATE_PASSWORD,
# DB_START_TIMEOUT (seconds, default 60), DB_DATA_DIR (default <project>/.data: another
# directory runs a separate server), DB_PROVISION=0 (start only: skip creating databases and
# re-granting users, e.g. to restart a provisioned server under load without the moment between
# REVOKE and GRANT in which the app user may read nothing).
#
# The server runs from <project>/.data with its own generated option file on a
# non-default port, so it never collides with a system MariaDB/MySQL.
set -euo pipefail
# my.cnf must not be world-writable or mariadbd silently ignores it.
umask 022

# shellcheck source=scripts/lib/db-common.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib/db-common.sh"

DB_APP_USER="presswright_app"
DB_MIGRATE_USER="presswright_migrate"
DB_APP_PASSWORD="${DB_APP_PASSWORD:-presswright-dev-only}"
DB_MIGRATE_PASSWORD="${DB_MIGRATE_PASSWORD:-presswright-migrate-dev-only}"
DB_START_TIMEOUT="${DB_START_TIMEOUT:-60}"
# Least privilege for the running app: data access only, no DDL.
APP_PRIVILEGES="SELECT, INSERT, UPDATE, DELETE, EXECUTE, CREATE TEMPORARY TABLES"

usage() {
  cat >&2 <<'EOF'
usage: bash scripts/db.sh <command>
  start        install MariaDB if missing, initialise .data/mariadb, start the
               server and create databases/users (idempotent)
  stop         shut the server down cleanly
  status       print whether the server is running (exit 0 running, 1 not)
  sql [db] ... open a mariadb client as the admin user over the project socket
  reset-test   drop and recreate the presswright_test database
  reset-scale  drop and recreate the presswright_scale database (scale data)
EOF
}

# ---------------------------------------------------------------- install ---

have_mariadb() {
  local tool
  for tool in mariadbd mariadb-install-db mariadb mariadb-admin mariadb-dump; do
    command -v "$tool" >/dev/null 2>&1 || return 1
  done
}

POLICY_RC_CREATED=""
cleanup_policy_rc() {
  if [[ -n "$POLICY_RC_CREATED" ]]; then
    "${SUDO[@]}" rm -f /usr/sbin/policy-rc.d || true
    POLICY_RC_CREATED=""
  fi
}

install_mariadb() {
  have_mariadb && return 0
  command -v apt-get >/dev/null 2>&1 \
    || die "MariaDB is not installed and apt-get is unavailable. Install mariadb-server and mariadb-client (10.11+) with your package manager, then re-run."

  SUDO=()
  if [[ $EUID -ne 0 ]]; then
    command -v sudo >/dev/null 2>&1 \
      || die "MariaDB is not installed and you are not root. Install sudo or run: apt-get install mariadb-server mariadb-client"
    SUDO=(sudo)
  fi

  note "MariaDB not found; installing mariadb-server and mariadb-client with apt-get..."
  # The package's postinst would start the system MariaDB service; we only
  # want the binaries. policy-rc.d exit 101 is Debian's "don't start services".
  if [[ ! -e /usr/sbin/policy-rc.d ]]; then
    trap cleanup_policy_rc EXIT
    printf '#!/bin/sh\nexit 101\n' | "${SUDO[@]}" tee /usr/sbin/policy-rc.d >/dev/null
    "${SUDO[@]}" chmod 755 /usr/sbin/policy-rc.d
    POLICY_RC_CREATED=1
  fi

  local -a apt_install=("${SUDO[@]}" env DEBIAN_FRONTEND=noninteractive
    apt-get install -y --no-install-recommends mariadb-server mariadb-client)
  # Fresh images often have empty package lists; a stale list gives 404s.
  if ! compgen -G '/var/lib/apt/lists/*_Packages*' >/dev/null; then
    "${SUDO[@]}" apt-get update
  fi
  if ! "${apt_install[@]}"; then
    note "install failed; refreshing package lists and retrying..."
    "${SUDO[@]}" apt-get update
    "${apt_install[@]}" || die "apt-get could not install mariadb-server/mariadb-client (see output above)."
  fi
  cleanup_policy_rc
  hash -r
  have_mariadb || die "MariaDB packages installed but mariadbd/mariadb-install-db are still not on PATH."
}

# ------------------------------------------------------------ server files ---

# Serialise start/stop so parallel CI steps don't both initialise or launch.
take_lock() {
  mkdir -p "$DATA_DIR"
  if command -v flock >/dev/null 2>&1; then
    exec 9>"$DATA_DIR/db.lock"
    flock -w 180 9 || die "timed out waiting for another scripts/db.sh run (lock $DATA_DIR/db.lock)."
  fi
}

init_datadir() {
  [[ -d "$DB_DATADIR/mysql" ]] && return 0
  if [[ -e "$DB_DATADIR" ]] && [[ -n "$(ls -A "$DB_DATADIR" 2>/dev/null)" ]]; then
    die "$DB_DATADIR exists but is not an initialised MariaDB data directory. Move it away or delete it (rm -rf '$DB_DATADIR' — destroys local DB data), then re-run."
  fi

  note "initialising data directory $DB_DATADIR ..."
  # Initialise into a temp dir and rename, so an interrupted run never leaves
  # a half-built datadir that later runs would mistake for a real one.
  rm -rf "$DATA_DIR"/mariadb.init.*
  local tmp="$DATA_DIR/mariadb.init.$$"
  local log="$DATA_DIR/mariadb-install.log"
  # No --user: with it, mariadb-install-db chowns the system's
  # auth_pam_tool_dir. --auth-root-socket-user gives the same result (the OS
  # user running this gets a passwordless unix_socket admin account).
  if ! mariadb-install-db --no-defaults --datadir="$tmp" \
      --auth-root-authentication-method=socket \
      --auth-root-socket-user="$DB_ADMIN_USER" \
      --skip-test-db --skip-name-resolve >"$log" 2>&1; then
    tail -n 30 "$log" >&2 || true
    rm -rf "$tmp"
    die "mariadb-install-db failed (full log: $log)."
  fi
  rmdir "$DB_DATADIR" 2>/dev/null || true
  mv "$tmp" "$DB_DATADIR"
}

# Regenerated on every start so setting changes (e.g. DB_PORT) take effect.
write_cnf() {
  local tmp="$DB_CNF.tmp.$$"
  {
    echo "# Generated by scripts/db.sh on every start. Do not edit or commit."
    echo "[mariadbd]"
    # mariadbd refuses to run as root unless told to explicitly.
    if [[ $EUID -eq 0 ]]; then echo "user=root"; fi
    cat <<EOF
datadir=$DB_DATADIR
socket=$DB_SOCKET
pid-file=$DB_PIDFILE
log-error=$DB_ERRLOG
port=$DB_PORT
bind-address=127.0.0.1
skip-name-resolve
local-infile=0

character-set-server=utf8mb4
collation-server=utf8mb4_unicode_ci
default-time-zone=+00:00

# Durability: flush the redo log on every commit.
innodb_flush_log_at_trx_commit=1

# Sized for a small (2-core) dev/CI machine.
innodb_buffer_pool_size=256M
innodb_log_buffer_size=16M
key_buffer_size=16M
tmp_table_size=32M
max_heap_table_size=32M
max_allowed_packet=64M
max_connections=100
table_open_cache=400
thread_cache_size=16
performance_schema=OFF
EOF
  } >"$tmp"
  mv "$tmp" "$DB_CNF"
}

pid_from_file() {
  local pid=""
  if [[ -r "$DB_PIDFILE" ]]; then read -r pid <"$DB_PIDFILE" || true; fi
  [[ "$pid" =~ ^[0-9]+$ ]] && printf '%s' "$pid"
}

# True if $1 is a live mariadbd started with our option file (guards against
# a recycled pid belonging to something else).
is_our_mariadbd() {
  local pid="$1"
  [[ -n "$pid" && -r "/proc/$pid/cmdline" ]] || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "--defaults-file=$DB_CNF"
}

errlog_since() {
  local offset="$1"
  if [[ -f "$DB_ERRLOG" ]]; then
    tail -c "+$((offset + 1))" "$DB_ERRLOG" | tail -n 40 >&2
  fi
}

launch_server() {
  local pid offset waited=0
  touch "$DB_ERRLOG"
  offset="$(wc -c <"$DB_ERRLOG")"

  # setsid + nohup: own session, survives the caller's shell/terminal exiting.
  # stdin/stdout/stderr are redirected (and the lock fd closed) so a wrapping
  # $(...) or CI pipe isn't held open by the daemon.
  local -a detach=(nohup)
  if command -v setsid >/dev/null 2>&1; then detach=(setsid nohup); fi
  "${detach[@]}" mariadbd --defaults-file="$DB_CNF" \
    </dev/null >>"$DB_ERRLOG" 2>&1 9>&- &
  pid=$!

  note "starting mariadbd (pid $pid) on 127.0.0.1:$DB_PORT ..."
  until db_alive; do
    if ! kill -0 "$pid" 2>/dev/null; then
      echo "--- $DB_ERRLOG (tail) ---" >&2
      errlog_since "$offset"
      if tail -c "+$((offset + 1))" "$DB_ERRLOG" | grep -q 'Address already in use'; then
        die "port $DB_PORT is already in use by another process. Stop it or choose another port, e.g. DB_PORT=3408 bash scripts/db.sh start"
      fi
      die "mariadbd exited during startup (see log above, full log: $DB_ERRLOG)."
    fi
    if (( waited >= DB_START_TIMEOUT * 2 )); then
      echo "--- $DB_ERRLOG (tail) ---" >&2
      errlog_since "$offset"
      die "mariadbd (pid $pid) did not answer on $DB_SOCKET within ${DB_START_TIMEOUT}s. Check $DB_ERRLOG; stop it with 'bash scripts/db.sh stop'."
    fi
    sleep 0.5
    waited=$((waited + 1))
  done
}

# --------------------------------------------------------------- provision ---

provision() {
  local app_pw migrate_pw db host
  app_pw="$(sql_string "$DB_APP_PASSWORD")"
  migrate_pw="$(sql_string "$DB_MIGRATE_PASSWORD")"
  # Fed on stdin, not argv, so passwords don't show up in `ps`.
  {
    echo "SET SESSION sql_log_off=1;"
    # mariadb-install-db adds a root@<hostname> proxy grant that
    # skip-name-resolve ignores with a warning on every start; it grants nothing.
    echo "DELETE FROM mysql.proxies_priv WHERE User IN ('root', $(sql_string "$DB_ADMIN_USER")) AND Host = @@hostname AND Host <> 'localhost';"
    echo "FLUSH PRIVILEGES;"
    for db in "$DB_NAME" "$DB_TEST_NAME" "$DB_SCALE_NAME"; do
      echo "CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
    done
    # Both hosts: with skip-name-resolve, TCP clients match '127.0.0.1' and
    # socket clients match 'localhost'.
    for host in 127.0.0.1 localhost; do
      # IF NOT EXISTS + ALTER so a changed password env var is applied.
      # REVOKE ALL first so privileges are exactly what's granted below.
      echo "CREATE USER IF NOT EXISTS '$DB_APP_USER'@'$host' IDENTIFIED BY $app_pw;"
      echo "ALTER USER '$DB_APP_USER'@'$host' IDENTIFIED BY $app_pw;"
      echo "REVOKE ALL PRIVILEGES, GRANT OPTION FROM '$DB_APP_USER'@'$host';"
      echo "CREATE USER IF NOT EXISTS '$DB_MIGRATE_USER'@'$host' IDENTIFIED BY $migrate_pw;"
      echo "ALTER USER '$DB_MIGRATE_USER'@'$host' IDENTIFIED BY $migrate_pw;"
      echo "REVOKE ALL PRIVILEGES, GRANT OPTION FROM '$DB_MIGRATE_USER'@'$host';"
      for db in "$DB_NAME" "$DB_TEST_NAME" "$DB_SCALE_NAME" "$DB_SCALE_TEST_NAME"; do
        echo "GRANT $APP_PRIVILEGES ON \`$db\`.* TO '$DB_APP_USER'@'$host';"
        # ALL at database level includes CREATE/DROP/ALTER, INDEX,
        # REFERENCES, TRIGGER, CREATE ROUTINE, etc. — what migrations need.
        echo "GRANT ALL PRIVILEGES ON \`$db\`.* TO '$DB_MIGRATE_USER'@'$host';"
      done
    done
  } | db_client --batch \
    || die "provisioning databases/users failed. Is $DB_SOCKET served by this project's server? Try 'bash scripts/db.sh stop' then 'start'."
}

server_port() {
  db_client --batch --skip-column-names -e 'SELECT @@port' 2>/dev/null || true
}

# ---------------------------------------------------------------- commands ---

cmd_start() {
  if ! [[ "$DB_PORT" =~ ^[0-9]{1,5}$ ]] || (( 10#$DB_PORT < 1 || 10#$DB_PORT > 65535 )); then
    die "DB_PORT must be a port number 1-65535 (got '$DB_PORT')."
  fi
  [[ "$DB_START_TIMEOUT" =~ ^[0-9]+$ ]] || die "DB_START_TIMEOUT must be a whole number of seconds."
  check_socket_path
  install_mariadb
  take_lock

  local port
  if db_alive; then
    note "reusing the server already running on $DB_SOCKET"
  else
    init_datadir
    write_cnf
    launch_server
  fi

  [[ "${DB_PROVISION:-1}" == 0 ]] || provision
  port="$(server_port)"
  if [[ -n "$port" && "$port" != "$DB_PORT" ]]; then
    note "warning: the running server listens on port $port, not DB_PORT=$DB_PORT. Run 'bash scripts/db.sh stop' and start again to change it."
  fi
  note "ready: MariaDB on 127.0.0.1:${port:-$DB_PORT} (socket $DB_SOCKET), databases: $DB_NAME, $DB_TEST_NAME, $DB_SCALE_NAME"
}

cmd_stop() {
  require_client_tools
  if [[ ! -d "$DATA_DIR" ]]; then
    note "not running (no $DATA_DIR)"
    return 0
  fi
  take_lock

  local pid waited=0
  pid="$(pid_from_file || true)"
  if db_alive; then
    note "shutting down mariadbd${pid:+ (pid $pid)} ..."
    db_admin shutdown \
      || die "'mariadb-admin shutdown' failed; the admin account '$DB_ADMIN_USER' may lack access. Run this as the OS user that started the server."
  elif is_our_mariadbd "$pid"; then
    # Alive but not answering (still starting or wedged): SIGTERM is
    # mariadbd's clean-shutdown signal.
    note "mariadbd (pid $pid) is not answering on the socket; sending SIGTERM for a clean shutdown ..."
    kill -TERM "$pid"
  else
    note "not running"
    return 0
  fi

  if [[ -n "$pid" ]]; then
    while kill -0 "$pid" 2>/dev/null; do
      if (( waited >= 240 )); then
        die "mariadbd (pid $pid) is still running after 120s. Check $DB_ERRLOG."
      fi
      sleep 0.5
      waited=$((waited + 1))
    done
  fi
  note "stopped"
}

cmd_status() {
  require_client_tools
  if db_alive; then
    local pid port
    pid="$(pid_from_file || true)"
    port="$(server_port)"
    note "running (pid ${pid:-?}, port ${port:-?}, socket $DB_SOCKET)"
    return 0
  fi
  note "not running"
  return 1
}

cmd_sql() {
  local -a args=()
  if [[ $# -gt 0 && "$1" != -* ]]; then
    args+=("--database=$1")
    shift
  fi
  require_running
  exec mariadb --no-defaults --socket="$DB_SOCKET" --user="$DB_ADMIN_USER" \
    --default-character-set=utf8mb4 "${args[@]}" "$@"
}

# Database-level grants live in mysql.db and survive DROP DATABASE.
reset_database() {
  require_running
  db_client --batch -e "DROP DATABASE IF EXISTS \`$1\`;
    CREATE DATABASE \`$1\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;" \
    || die "could not reset $1."
  note "reset $1"
}

cmd_reset_test() { reset_database "$DB_TEST_NAME"; }
cmd_reset_scale() { reset_database "$DB_SCALE_NAME"; }

main() {
  local cmd="${1:-}"
  [[ $# -gt 0 ]] && shift
  case "$cmd" in
    start) cmd_start "$@" ;;
    stop) cmd_stop "$@" ;;
    status) cmd_status "$@" ;;
    sql) cmd_sql "$@" ;;
    reset-test) cmd_reset_test "$@" ;;
    reset-scale) cmd_reset_scale "$@" ;;
    -h | --help | help) usage ;;
    "") usage; exit 2 ;;
    *) printf 'db: unknown command: %s\n' "$cmd" >&2; usage; exit 2 ;;
  esac
}

main "$@"
