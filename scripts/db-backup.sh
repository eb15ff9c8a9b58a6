#!/usr/bin/env bash
# Dump one database from the project server to
# .data/backups/<db>-<UTC timestamp>.sql.gz
#
#   bash scripts/db-backup.sh [db]      (default: presswright)
#
# The dump has no CREATE DATABASE/USE statements, so it can be restored into
# any database name (scripts/db-restore-drill.sh relies on that).
set -euo pipefail
# Dumps contain application data: keep them private to the OS user.
umask 077

# shellcheck source=scripts/lib/db-common.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib/db-common.sh"

db="${1:-$DB_NAME}"
check_db_name "$db"
require_running
command -v mariadb-dump >/dev/null 2>&1 || die "'mariadb-dump' not found; install mariadb-client."
command -v gzip >/dev/null 2>&1 || die "'gzip' not found; install gzip."

exists="$(db_client --batch --skip-column-names \
  -e "SELECT COUNT(*) FROM information_schema.schemata WHERE schema_name = $(sql_string "$db")")"
[[ "$exists" == 1 ]] || die "database '$db' does not exist on the project server."

mkdir -p "$DB_BACKUP_DIR"
# Fixed-width UTC timestamp: lexical order == chronological order.
stamp="$(date -u +%Y%m%dT%H%M%SZ)"
out="$DB_BACKUP_DIR/$db-$stamp.sql.gz"
if [[ -e "$out" ]]; then
  die "$out already exists (two backups in the same second); wait a second and re-run."
fi

# Write to a temp name and rename, so a failed dump never looks like the
# newest backup to the restore drill.
tmp="$out.partial.$$"
trap 'rm -f "$tmp"' EXIT

# --single-transaction: consistent InnoDB snapshot without locking writers.
# --events as well as routines/triggers so the dump is the whole schema.
mariadb-dump --no-defaults --socket="$DB_SOCKET" --user="$DB_ADMIN_USER" \
  --default-character-set=utf8mb4 \
  --single-transaction --routines --triggers --events \
  --hex-blob --skip-dump-date \
  "$db" | gzip -6 >"$tmp" \
  || die "mariadb-dump of '$db' failed (see error above)."
gzip -t "$tmp" || die "the compressed dump failed its integrity check."
mv "$tmp" "$out"
trap - EXIT

note "backup written: $out ($(du -h "$out" | cut -f1))"
