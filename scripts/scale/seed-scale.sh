#!/usr/bin/env bash
# npm run seed:scale — a fresh presswright_scale database (scripts/db.sh reset-scale), migrated,
# then filled by scripts/scale/cli.ts. Flags (environment): SCALE_SEED, SCALE_FACTOR, SCALE_ANCHOR,
# SCALE_VERIFY, DB_PORT.
set -euo pipefail
ROOT="$(cd -- "$(dirname -- "${BASH_SOURCE[0]}")/../.." && pwd -P)"
cd "$ROOT"
DB_PORT="${DB_PORT:-3407}"
export MIGRATE_DATABASE_URL="mysql://presswright_migrate:${DB_MIGRATE_PASSWORD:-presswright-migrate-dev-only}@127.0.0.1:${DB_PORT}/presswright_scale"
bash scripts/db.sh start >/dev/null
bash scripts/db.sh reset-scale
npx tsx scripts/migrate.ts
npx tsx --conditions=react-server scripts/scale/cli.ts
