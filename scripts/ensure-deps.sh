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

# Fails with a clear message when something already listens on 127.0.0.1:PORT — it would answer
# the health check in place of the server we are about to start.
assert_port_free() {
  local port="$1"
  if node -e "require('net').connect(${port},'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))"; then
    echo "Port $port is already in use — is Presswright already running? Stop it or choose another port (PORT / TEST_PORT)." >&2
    return 1
  fi
}
