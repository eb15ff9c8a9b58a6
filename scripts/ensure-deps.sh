# shellcheck shell=bash
# Sourced by serve.sh and test.sh: installs npm dependencies from the lock file when they are
# missing or older than the lock, so a fresh clone needs nothing but Node.js.
ensure_node_modules() {
  local root="$1"
  if [[ ! -f "$root/node_modules/.package-lock.json" || "$root/package-lock.json" -nt "$root/node_modules/.package-lock.json" ]]; then
    echo "Installing npm dependencies (npm ci)…"
    (cd "$root" && npm ci --no-audit --no-fund)
  fi
}
