#!/usr/bin/env bash
# `npm test` (and `.ci/run`): everything from a fresh machine to one "N passed, N failed" line.
# Uses its own MariaDB instance (127.0.0.1:3308, .data/mariadb-test), database ketbook_test
# (recreated each run), fake mail server on 2526, build folder .next-test and server port 3100,
# so the demo is never touched. Stops only what it started, by PID.
set -uo pipefail

project_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$project_root"
# shellcheck source=db/scripts/lib.sh
source "$project_root/db/scripts/lib.sh"

results_dir="$project_root/.data/test-results"
passed=0
failed=0
broken_step=""
started_db=0
mail_pid=""
next_pid=""

finish() {
  local code=$?
  trap - EXIT INT TERM
  ketbook_stop_pid "$next_pid" "the test web server"
  ketbook_stop_pid "$mail_pid" "the test mail server"
  if [ "$started_db" -eq 1 ]; then
    bash db/scripts/mariadb.sh stop test >/dev/null && ketbook_log "stopped the test MariaDB"
  fi
  if [ -n "$broken_step" ]; then
    echo "[ketbook] step failed: $broken_step" >&2
    failed=$((failed + 1))
  fi
  [ "$failed" -gt 0 ] && code=1
  echo "$passed passed, $failed failed"
  exit "$code"
}
trap finish EXIT
trap 'broken_step="${broken_step:-interrupted}"; exit 130' INT TERM

# step <name> <command...>: runs a set-up step; a failure ends the run (and counts as a failure).
step() {
  local name="$1"; shift
  if ! "$@"; then
    broken_step="$name"
    exit 1
  fi
}

export NEXT_TELEMETRY_DISABLED=1
step "node check" ketbook_require_node
step "install mariadb-server" ketbook_ensure_mariadb
step "install chromium" ketbook_ensure_chromium
step "npm ci" ketbook_ensure_node_modules

mkdir -p .data "$results_dir"
# Test settings are fixed, whatever the caller's environment says about the demo.
export KETBOOK_DB_HOST=127.0.0.1
export KETBOOK_DB_PORT=3308
export KETBOOK_DB_NAME=ketbook_test
export KETBOOK_DB_USER=ketbook
export KETBOOK_DB_PASSWORD="$(ketbook_secret .data/db-password)"
export KETBOOK_SESSION_SECRET="$(ketbook_secret .data/session-secret-test)"
export KETBOOK_SMTP_PORT=2526
export KETBOOK_PUBLIC_URL=http://127.0.0.1:3100
export KETBOOK_TRUST_PROXY=1
export KETBOOK_DIST_DIR=.next-test
export PORT=3100
export KETBOOK_TEST_BASE_URL=http://127.0.0.1:3100

port_free() { ! ketbook_port_in_use "$1" || { echo "[ketbook] port $1 is already in use (a previous test run still going?)" >&2; return 1; }; }
step "port 3100 free" port_free 3100
step "port 2526 free" port_free 2526

start_db() {
  local state
  state="$(bash db/scripts/mariadb.sh start test)" || return 1
  [ "$state" = "started" ] && started_db=1
  ketbook_log "test MariaDB on 127.0.0.1:3308 ($state)"
}
step "start the test MariaDB" start_db

fresh_database() {
  # Also drops scratch databases a crashed database test may have left behind.
  local scratch sql
  scratch="$(mariadb_root -N -e "SELECT schema_name FROM information_schema.schemata WHERE schema_name LIKE 'ketbook\\_scratch\\_%'")" || return 1
  sql="DROP DATABASE IF EXISTS ketbook_test; CREATE DATABASE ketbook_test CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  for db in $scratch; do sql+="DROP DATABASE IF EXISTS \`$db\`;"; done
  printf '%s\n' "$sql" | mariadb_root
}
mariadb_root() { "$(command -v mariadb || echo /usr/bin/mariadb)" --defaults-file=.data/mariadb-test.cnf "$@"; }
step "recreate ketbook_test" fresh_database
step "migrate" node_modules/.bin/tsx db/migrate.ts up
step "seed" node_modules/.bin/tsx db/seed.ts

node --import tsx db/scripts/fake-mail-server.ts >"$results_dir/fake-mail-server.log" 2>&1 &
mail_pid=$!

step "build into .next-test" node_modules/.bin/next build

node_modules/.bin/next start -H 127.0.0.1 -p 3100 >"$results_dir/next-server.log" 2>&1 &
next_pid=$!
step "server health" ketbook_wait_healthy "http://127.0.0.1:3100/api/health" 60 "$next_pid"
kill -0 "$mail_pid" 2>/dev/null || { cat "$results_dir/fake-mail-server.log" >&2; broken_step="fake mail server"; exit 1; }

# count <json file> <kind>: prints "passed failed" from a reporter's JSON file.
count() {
  node -e '
    const fs = require("fs");
    const [file, kind] = process.argv.slice(1);
    let r; try { r = JSON.parse(fs.readFileSync(file, "utf8")); } catch { console.log("0 0"); process.exit(0); }
    if (kind === "vitest") console.log(`${r.numPassedTests ?? 0} ${(r.numFailedTests ?? 0)}`);
    else { const s = r.stats ?? {}; console.log(`${(s.expected ?? 0) + (s.flaky ?? 0)} ${s.unexpected ?? 0}`); }' "$1" "$2"
}

# tally <kind> <exit code> <json file>: adds a runner's counts; a failing exit with no failed test counts as one.
tally() {
  local kind="$1" code="$2" file="$3" p f
  read -r p f < <(count "$file" "$kind")
  if [ "$code" -ne 0 ] && [ "$f" -eq 0 ]; then
    echo "[ketbook] $kind exited with $code without a failing test (a file failed to load?)" >&2
    f=1
  fi
  passed=$((passed + p))
  failed=$((failed + f))
}

# For contributors only (CI sets neither): KETBOOK_TEST_VITEST / KETBOOK_TEST_PLAYWRIGHT hold
# file filters for one runner, or "skip"; unset means everything.
read -r -a vitest_filter <<<"${KETBOOK_TEST_VITEST:-}"
read -r -a playwright_filter <<<"${KETBOOK_TEST_PLAYWRIGHT:-}"

rm -f "$results_dir/vitest.json" "$results_dir/playwright.json"
if [ "${KETBOOK_TEST_VITEST:-}" != "skip" ]; then
  ketbook_log "vitest"
  node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile="$results_dir/vitest.json" "${vitest_filter[@]}"
  tally vitest $? "$results_dir/vitest.json"
fi

if [ "${KETBOOK_TEST_PLAYWRIGHT:-}" != "skip" ]; then
  ketbook_log "playwright"
  PLAYWRIGHT_JSON_OUTPUT_FILE="$results_dir/playwright.json" PLAYWRIGHT_JSON_OUTPUT_NAME="$results_dir/playwright.json" \
    node_modules/.bin/playwright test --reporter=list,json "${playwright_filter[@]}"
  tally playwright $? "$results_dir/playwright.json"
fi
