#!/usr/bin/env bash
# `npm start`: the local demo on http://127.0.0.1:3000.
# Installs what is missing, starts the demo MariaDB (127.0.0.1:3307, .data/mariadb), migrates,
# seeds, starts the fake mail server (2525), builds, serves, prints the demo sign-ins and waits.
# Ctrl-C stops what this script started, by PID; a MariaDB that was already running is left alone.
set -euo pipefail

project_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$project_root"
# shellcheck source=db/scripts/lib.sh
source "$project_root/db/scripts/lib.sh"

export NEXT_TELEMETRY_DISABLED=1

ketbook_require_node
ketbook_ensure_mariadb
ketbook_ensure_node_modules

mkdir -p .data
export KETBOOK_DB_HOST="${KETBOOK_DB_HOST:-127.0.0.1}"
export KETBOOK_DB_PORT="${KETBOOK_DB_PORT:-3307}"
export KETBOOK_DB_NAME="${KETBOOK_DB_NAME:-ketbook}"
export KETBOOK_DB_USER="${KETBOOK_DB_USER:-ketbook}"
export KETBOOK_DB_PASSWORD="${KETBOOK_DB_PASSWORD:-$(ketbook_secret .data/db-password)}"
export KETBOOK_SESSION_SECRET="${KETBOOK_SESSION_SECRET:-$(ketbook_secret .data/session-secret)}"
export KETBOOK_SMTP_PORT="${KETBOOK_SMTP_PORT:-2525}"
export PORT="${PORT:-3000}"
export KETBOOK_PUBLIC_URL="${KETBOOK_PUBLIC_URL:-http://127.0.0.1:$PORT}"
export KETBOOK_DIST_DIR="${KETBOOK_DIST_DIR:-.next}"
[ "${#KETBOOK_SESSION_SECRET}" -ge 32 ] || ketbook_fail "KETBOOK_SESSION_SECRET must be at least 32 characters"

started_db=0
mail_pid=""
next_pid=""

cleanup() {
  trap - EXIT INT TERM
  ketbook_stop_pid "$next_pid" "the web server"
  ketbook_stop_pid "$mail_pid" "the fake mail server"
  if [ "$started_db" -eq 1 ]; then
    bash db/scripts/mariadb.sh stop demo >/dev/null && ketbook_log "stopped MariaDB"
  fi
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ketbook_port_in_use "$PORT" && ketbook_fail "port $PORT is already in use (is another 'npm start' running?)"
ketbook_port_in_use "$KETBOOK_SMTP_PORT" && ketbook_fail "port $KETBOOK_SMTP_PORT (mail) is already in use (is another 'npm start' running?)"

db_state="$(bash db/scripts/mariadb.sh start demo)"
[ "$db_state" = "started" ] && started_db=1
ketbook_log "MariaDB on 127.0.0.1:$KETBOOK_DB_PORT ($db_state)"

node_modules/.bin/tsx db/migrate.ts up
node_modules/.bin/tsx db/seed.ts

node --import tsx db/scripts/fake-mail-server.ts >>.data/fake-mail-server.log 2>&1 &
mail_pid=$!
ketbook_log "fake mail server on 127.0.0.1:$KETBOOK_SMTP_PORT (pid $mail_pid, log .data/fake-mail-server.log)"

# Rebuild unless the last build is of this very commit with a clean tree.
build_stamp_file=".data/build-stamp$(echo "$KETBOOK_DIST_DIR" | tr '/.' '__')"
current_stamp=""
if command -v git >/dev/null 2>&1 && git rev-parse HEAD >/dev/null 2>&1 && [ -z "$(git status --porcelain 2>/dev/null)" ]; then
  current_stamp="$(git rev-parse HEAD)"
fi
if [ -n "$current_stamp" ] && [ -f "$KETBOOK_DIST_DIR/BUILD_ID" ] && [ "$(cat "$build_stamp_file" 2>/dev/null)" = "$current_stamp" ]; then
  ketbook_log "build of $current_stamp is current; not rebuilding"
else
  ketbook_log "building (next build)"
  rm -f "$build_stamp_file"
  node_modules/.bin/next build
  [ -n "$current_stamp" ] && echo "$current_stamp" >"$build_stamp_file"
fi

# Started directly (not through npx) so that $! is the server's own PID.
node_modules/.bin/next start -H 127.0.0.1 -p "$PORT" &
next_pid=$!
ketbook_wait_healthy "http://127.0.0.1:$PORT/api/health" 60 "$next_pid"

cat <<EOF2

  Ketbook is running at $KETBOOK_PUBLIC_URL

  Demo sign-ins (local demo only; invented people):
$(node_modules/.bin/tsx db/seed.ts sign-ins)

  Mail the app sends lands in the admin's Outbox ($KETBOOK_PUBLIC_URL/admin/outbox).
  Press Ctrl-C to stop.

EOF2

wait "$next_pid" || true
next_pid=""
ketbook_log "the web server exited"
