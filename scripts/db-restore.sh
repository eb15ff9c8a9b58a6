#!/usr/bin/env bash
# Restore a backup made by scripts/db-backup.sh into a named database on the project server.
#
#   bash scripts/db-restore.sh [--force] [--from SOURCE_DB] TARGET_DB [dump.sql.gz]
#
# Without a dump file, restores the newest .data/backups/<SOURCE_DB>-*.sql.gz (SOURCE_DB defaults
# to TARGET_DB). Creates TARGET_DB when missing. Refuses a TARGET_DB that already holds tables
# unless --force is given; --force drops and recreates it first, so no stale table survives.
# The restore runs as the admin account (the app user has rows-only grants); the dump's triggers
# (signed inspections are read-only) come back with it. Database-level grants live in mysql.db and
# survive the drop, so the app user keeps its access to a restored presswright.
set -euo pipefail

# shellcheck source=scripts/lib/db-common.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib/db-common.sh"

usage() {
  echo "usage: bash scripts/db-restore.sh [--force] [--from SOURCE_DB] TARGET_DB [dump.sql.gz]" >&2
  exit 2
}

force=0
source_db=""
positional=()
while (($#)); do
  case "$1" in
    --force) force=1 ;;
    --from) [[ $# -ge 2 ]] || usage; source_db="$2"; shift ;;
    -h | --help) usage ;;
    -*) printf 'db: unknown option %s\n' "$1" >&2; usage ;;
    *) positional+=("$1") ;;
  esac
  shift
done
((${#positional[@]} >= 1 && ${#positional[@]} <= 2)) || usage
target="${positional[0]}"
dump="${positional[1]:-}"
source_db="${source_db:-$target}"
check_db_name "$target"
check_db_name "$source_db"
[[ "$target" != mysql && "$target" != information_schema && "$target" != performance_schema && "$target" != sys ]] \
  || die "refusing to restore into the system database '$target'."
require_running
dump="$(pick_dump "$source_db" "$dump")"

q() { db_client --batch --skip-column-names -e "$1"; }

tables="$(q "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = $(sql_string "$target")")"
if ((tables > 0)); then
  ((force)) || die "database '$target' is not empty ($tables tables). Restoring would overwrite it; pass --force to drop and replace it."
  note "--force: dropping '$target' ($tables tables) before the restore ..."
fi

note "restoring $dump into $target ..."
q "DROP DATABASE IF EXISTS $(sql_ident "$target");
   CREATE DATABASE $(sql_ident "$target") CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
gzip -dc "$dump" | db_client --batch --database="$target" \
  || die "restoring '$dump' into '$target' failed (see error above); '$target' may be incomplete."
restored="$(q "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = $(sql_string "$target")")"
note "restored $restored tables into $target from $(basename -- "$dump")"
