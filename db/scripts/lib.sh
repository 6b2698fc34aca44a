# Shared helpers for db/scripts/start.sh and tests/run-all.sh (sourced, not run).
# Expects `project_root` to be set by the caller.

ketbook_log() { printf '[ketbook] %s\n' "$*"; }
ketbook_fail() { printf '[ketbook] error: %s\n' "$*" >&2; exit 1; }

# Node from the user's own install (never Debian's nodejs package), at least 20.9.
ketbook_require_node() {
  command -v node >/dev/null 2>&1 || ketbook_fail "Node.js 20.9 or newer is required and 'node' is not on PATH (install it from nodejs.org or with a version manager)."
  local version major minor
  version="$(node -p 'process.versions.node')"
  major="${version%%.*}"; minor="${version#*.}"; minor="${minor%%.*}"
  if [ "$major" -lt 20 ] || { [ "$major" -eq 20 ] && [ "$minor" -lt 9 ]; }; then
    ketbook_fail "Node.js $version is too old; Ketbook needs 20.9 or newer."
  fi
  command -v npm >/dev/null 2>&1 || ketbook_fail "npm is not on PATH (it ships with Node.js)."
}

ketbook_apt_updated=0
# ketbook_apt_install <package>...: installs Debian packages, running apt-get update once per script.
ketbook_apt_install() {
  command -v apt-get >/dev/null 2>&1 || ketbook_fail "cannot install $* automatically: no apt-get here; install them by hand."
  local sudo=""
  if [ "$(id -u)" -ne 0 ]; then
    command -v sudo >/dev/null 2>&1 || ketbook_fail "installing $* needs root (or sudo)."
    sudo="sudo"
  fi
  if [ "$ketbook_apt_updated" -eq 0 ]; then
    ketbook_log "apt-get update"
    $sudo apt-get update -q >/dev/null
    ketbook_apt_updated=1
  fi
  ketbook_log "installing $* with apt-get (first run only)"
  $sudo env DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends "$@" >/dev/null
}

ketbook_have_mariadb() { command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; }

ketbook_ensure_mariadb() {
  ketbook_have_mariadb || ketbook_apt_install mariadb-server
  ketbook_have_mariadb || ketbook_fail "mariadb-server did not install mariadbd"
}

ketbook_ensure_chromium() {
  [ -x /usr/bin/chromium ] || ketbook_apt_install chromium
  [ -x /usr/bin/chromium ] || ketbook_fail "chromium did not install /usr/bin/chromium"
}

# npm ci from the committed lock when node_modules is missing (a fresh clone).
ketbook_ensure_node_modules() {
  if [ ! -d "$project_root/node_modules" ] || [ ! -x "$project_root/node_modules/.bin/next" ]; then
    ketbook_log "installing npm packages (npm ci)"
    (cd "$project_root" && npm ci --no-audit --no-fund)
  fi
}

# ketbook_secret <file>: prints the secret in <file>, creating it (64 hex characters) on first use.
ketbook_secret() {
  local file="$1"
  if [ ! -s "$file" ]; then
    mkdir -p "$(dirname "$file")"
    (umask 077; node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("hex"))' >"$file")
  fi
  tr -d '\n' <"$file"
}

# True when something accepts TCP connections on 127.0.0.1:<port>.
ketbook_port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# ketbook_wait_healthy <url> <seconds> <pid>: waits for {"database":"up"}; fails early if <pid> dies.
ketbook_wait_healthy() {
  local url="$1" seconds="$2" pid="$3"
  node -e '
    const [url, seconds, pid] = process.argv.slice(1);
    const deadline = Date.now() + Number(seconds) * 1000;
    const alive = () => { try { process.kill(Number(pid), 0); return true; } catch { return false; } };
    (async () => {
      while (Date.now() < deadline) {
        if (!alive()) { console.error("[ketbook] the server exited during start-up"); process.exit(1); }
        try {
          const r = await fetch(url, { signal: AbortSignal.timeout(2000) });
          const body = await r.json().catch(() => ({}));
          if (r.ok && body.database === "up") process.exit(0);
        } catch {}
        await new Promise((res) => setTimeout(res, 500));
      }
      console.error("[ketbook] no healthy answer from " + url + " within " + seconds + " s");
      process.exit(1);
    })();' "$url" "$seconds" "$pid"
}

# ketbook_stop_pid <pid> <name>: SIGTERM, then up to 10 s, then SIGKILL. Only ever a PID we started.
ketbook_stop_pid() {
  local pid="$1" name="$2"
  [ -n "$pid" ] || return 0
  kill -0 "$pid" 2>/dev/null || return 0
  kill -TERM "$pid" 2>/dev/null || true
  for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || { wait "$pid" 2>/dev/null || true; ketbook_log "stopped $name"; return 0; }; sleep 0.25; done
  kill -KILL "$pid" 2>/dev/null || true
  wait "$pid" 2>/dev/null || true
  ketbook_log "stopped $name (forced)"
}
