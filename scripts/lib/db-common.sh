# shellcheck shell=bash
# shellcheck disable=SC2034  # variables are used by the sourcing scripts
# Shared settings for scripts/db.sh, scripts/db-backup.sh and
# scripts/db-restore-drill.sh. Sourced, not executed.
#
# Everything lives under <project>/.data so the project works from any clone
# location and never touches the system MariaDB (/var/lib/mysql,
# /run/mysqld).

# Project root from this file's location (scripts/lib/ -> ../..), so the
# scripts work from any clone path and any working directory.
PROJECT_ROOT="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")/../.." && pwd -P)"
# DB_DATA_DIR runs a second, separate server (own data, socket, pid and log), e.g. the scratch
# instance the fault test stops and starts: DB_DATA_DIR=.data/scratch DB_PORT=3499 bash scripts/db.sh start
DATA_DIR="${DB_DATA_DIR:-$PROJECT_ROOT/.data}"
[[ "$DATA_DIR" == /* ]] || DATA_DIR="$PROJECT_ROOT/$DATA_DIR"
DB_DATADIR="$DATA_DIR/mariadb"
DB_CNF="$DATA_DIR/my.cnf"
DB_SOCKET="$DATA_DIR/mariadb.sock"
DB_PIDFILE="$DATA_DIR/mariadb.pid"
DB_ERRLOG="$DATA_DIR/mariadb.err"
DB_BACKUP_DIR="$DATA_DIR/backups"
DB_PORT="${DB_PORT:-3407}"

DB_NAME="presswright"
DB_TEST_NAME="presswright_test"
# Scale data (npm run seed:scale / npm run bench) and the scale seed's own integration test.
DB_SCALE_NAME="presswright_scale"
DB_SCALE_TEST_NAME="presswright_scale_test"

# mariadbd lives in /usr/sbin on Debian, which is not on a non-root PATH.
PATH="$PATH:/usr/local/sbin:/usr/sbin:/sbin"
export PATH

# The data directory is initialised with unix_socket auth for the OS user
# that ran it, so the admin account is whoever runs these scripts.
if [[ $EUID -eq 0 ]]; then
  DB_ADMIN_USER="root"
else
  DB_ADMIN_USER="$(id -un)"
fi

die() {
  printf 'db: error: %s\n' "$*" >&2
  exit 1
}

note() {
  printf 'db: %s\n' "$*"
}

# Unix socket paths are limited to 107 bytes; a deep clone path would make
# mariadbd fail with an obscure error, so fail early with a clear one.
check_socket_path() {
  if (( ${#DB_SOCKET} > 107 )); then
    die "socket path is ${#DB_SOCKET} bytes (max 107): $DB_SOCKET — clone the project into a shorter path."
  fi
}

require_client_tools() {
  local tool
  for tool in mariadb mariadb-admin; do
    command -v "$tool" >/dev/null 2>&1 \
      || die "'$tool' not found. Run 'bash scripts/db.sh start' once to install MariaDB, or install mariadb-client."
  done
}

# --no-defaults: ignore /etc/mysql/*.cnf and ~/.my.cnf, which point at the
# system server's socket and may carry credentials.
db_client() {
  mariadb --no-defaults --socket="$DB_SOCKET" --user="$DB_ADMIN_USER" \
    --default-character-set=utf8mb4 "$@"
}

db_admin() {
  mariadb-admin --no-defaults --socket="$DB_SOCKET" --user="$DB_ADMIN_USER" "$@"
}

# True when a server answers on the project socket. ping exits 0 even on
# "access denied", which is what we want: something is serving the socket.
db_alive() {
  [[ -S "$DB_SOCKET" ]] || return 1
  db_admin --connect-timeout=2 ping >/dev/null 2>&1
}

require_running() {
  require_client_tools
  db_alive || die "the project database is not running (no answer on $DB_SOCKET). Start it with 'bash scripts/db.sh start'."
}

# Quote a string as an SQL string literal (NO_BACKSLASH_ESCAPES is off by
# default, so both backslash and quote must be escaped).
sql_string() {
  local s="$1"
  s="${s//\\/\\\\}"
  s="${s//\'/\\\'}"
  printf "'%s'" "$s"
}

# Quote an identifier with backticks.
sql_ident() {
  local s="$1"
  printf '%s%s%s' '`' "${s//\`/\`\`}" '`'
}

# Database names are interpolated into SQL and file names; keep them simple.
check_db_name() {
  [[ "$1" =~ ^[A-Za-z0-9_]{1,64}$ ]] \
    || die "invalid database name '$1' (use letters, digits and underscores only)."
}

# The dump to restore: the given file, or the newest .data/backups/<db>-*.sql.gz; checked readable
# and intact. Prints its path.
pick_dump() {
  local db="$1" dump="${2:-}"
  command -v gzip >/dev/null 2>&1 || die "'gzip' not found; install gzip."
  if [[ -z "$dump" ]]; then
    # Names end in a fixed-width UTC timestamp, so the last in glob order is newest.
    local -a dumps
    shopt -s nullglob
    dumps=("$DB_BACKUP_DIR/$db"-[0-9]*T[0-9]*Z.sql.gz)
    shopt -u nullglob
    (( ${#dumps[@]} > 0 )) \
      || die "no backups of '$db' in $DB_BACKUP_DIR. Create one with: npm run db:backup -- $db (or name a dump file)."
    dump="${dumps[-1]}"
  fi
  [[ -r "$dump" ]] || die "cannot read dump file '$dump'."
  gzip -t "$dump" || die "dump '$dump' is corrupt (gzip integrity check failed)."
  printf '%s' "$dump"
}
