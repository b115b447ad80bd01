# Shared by the project's scripts (sourced, not run).
export NEXT_TELEMETRY_DISABLED=1
PATH="$PATH:/usr/sbin:/usr/bin"

# Exports each variable of .env.local that the caller has not set already, so a script
# (e.g. the test runner) can point everything at other ports and another database.
load_env() {
  bash scripts/env.sh >/dev/null
  local k v
  while IFS= read -r line || [ -n "$line" ]; do
    [[ "$line" =~ ^([A-Z0-9_]+)=(.*)$ ]] || continue
    k="${BASH_REMATCH[1]}"; v="${BASH_REMATCH[2]}"
    v="${v%\"}"; v="${v#\"}"
    if [ -z "${!k+x}" ]; then export "$k=$v"; fi
  done < .env.local
}

# Installs the Node packages when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "[setup] installing Node packages (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

# Polls a URL until it answers (no fixed sleeps); gives up when process $2 (if given) dies.
wait_for_url() {
  local url="$1" pid="${2:-}" tries="${3:-600}"
  for _ in $(seq 1 "$tries"); do
    if [ -n "$pid" ] && ! kill -0 "$pid" 2>/dev/null; then echo "[setup] the server exited" >&2; return 1; fi
    if node -e "fetch(process.argv[1]).then(r=>process.exit(r.status<500?0:1),()=>process.exit(1))" "$url" 2>/dev/null; then return 0; fi
    sleep 0.2
  done
  echo "[setup] $url did not answer" >&2
  return 1
}

# Fails with a clear message when something already listens on 127.0.0.1:$1.
assert_port_free() {
  if node -e "const s=require('net').connect($1,'127.0.0.1');s.on('connect',()=>process.exit(0));s.on('error',()=>process.exit(1))"; then
    echo "[setup] port $1 on 127.0.0.1 is already in use (another Sinkwise still running?). Stop it first." >&2
    return 1
  fi
}
