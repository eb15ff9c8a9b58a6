#!/usr/bin/env bash
# Restore drill: proves the newest backup actually restores and matches.
#
#   bash scripts/db-restore-drill.sh [db] [dump.sql.gz]   (default db: presswright)
#
# Restores the newest .data/backups/<db>-*.sql.gz (or the given file) into the
# scratch database presswright_restore_drill, compares CHECKSUM TABLE for every
# table between <db> and the scratch copy, prints the match percentage, then
# drops the scratch database. Exits non-zero on any mismatch.
#
# Compares against the live database, so run it right after a backup: writes
# made after the dump show up as mismatches.
set -euo pipefail

# shellcheck source=scripts/lib/db-common.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib/db-common.sh"

SCRATCH_DB="presswright_restore_drill"

db="${1:-$DB_NAME}"
dump="${2:-}"
check_db_name "$db"
[[ "$db" != "$SCRATCH_DB" ]] || die "cannot drill against the scratch database itself."
require_running
dump="$(pick_dump "$db" "$dump")"

q() { db_client --batch --skip-column-names -e "$1"; }

drop_scratch() {
  q "DROP DATABASE IF EXISTS $(sql_ident "$SCRATCH_DB")" \
    || printf 'db: warning: could not drop %s; drop it by hand.\n' "$SCRATCH_DB" >&2
}
trap drop_scratch EXIT

note "restoring $dump into $SCRATCH_DB ..."
q "DROP DATABASE IF EXISTS $(sql_ident "$SCRATCH_DB");
   CREATE DATABASE $(sql_ident "$SCRATCH_DB") CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
gzip -dc "$dump" | db_client --batch --database="$SCRATCH_DB" \
  || die "restoring '$dump' failed (see error above)."

base_tables() {
  q "SELECT table_name FROM information_schema.tables
     WHERE table_schema = $(sql_string "$1") AND table_type = 'BASE TABLE'"
}

# Union of both sides, so a table missing from either counts as a mismatch.
mapfile -t tables < <({ base_tables "$db"; base_tables "$SCRATCH_DB"; } | LC_ALL=C sort -u)

checksum() {
  # Output: "<db>.<table>\t<checksum>"; checksum is NULL if the table is missing.
  q "CHECKSUM TABLE $(sql_ident "$1").$(sql_ident "$2")" 2>/dev/null | cut -f2
}

total=${#tables[@]}
matched=0
for t in "${tables[@]}"; do
  src="$(checksum "$db" "$t")"
  dst="$(checksum "$SCRATCH_DB" "$t")"
  if [[ -n "$src" && "$src" != NULL && "$src" == "$dst" ]]; then
    matched=$((matched + 1))
  else
    printf 'db: MISMATCH %s: source=%s restored=%s\n' "$t" "${src:-missing}" "${dst:-missing}"
  fi
done

# Routines, triggers, views and events carry no checksum; compare counts.
object_counts() {
  local s
  s="$(sql_string "$1")"
  q "SELECT
       (SELECT COUNT(*) FROM information_schema.routines WHERE routine_schema = $s),
       (SELECT COUNT(*) FROM information_schema.triggers WHERE trigger_schema = $s),
       (SELECT COUNT(*) FROM information_schema.views WHERE table_schema = $s),
       (SELECT COUNT(*) FROM information_schema.events WHERE event_schema = $s)"
}
src_objects="$(object_counts "$db")"
dst_objects="$(object_counts "$SCRATCH_DB")"
objects_ok=1
if [[ "$src_objects" != "$dst_objects" ]]; then
  objects_ok=0
  printf 'db: MISMATCH routines/triggers/views/events counts: source=%s restored=%s\n' \
    "${src_objects//$'\t'/\/}" "${dst_objects//$'\t'/\/}"
fi

if (( total == 0 )); then
  note "restore drill: '$db' has no tables; nothing to checksum (dump restored cleanly)."
else
  pct="$(awk -v m="$matched" -v t="$total" 'BEGIN { printf "%.1f", 100 * m / t }')"
  note "restore drill: $matched/$total tables match (${pct}%) for $db vs $(basename -- "$dump")"
fi

if (( matched != total || objects_ok == 0 )); then
  die "restore drill FAILED. If '$db' changed after the dump, take a fresh backup (bash scripts/db-backup.sh $db) and re-run."
fi
note "restore drill passed"
