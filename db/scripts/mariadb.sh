#!/usr/bin/env bash
# A project-local MariaDB server on loopback, one per instance name.
#
#   bash db/scripts/mariadb.sh start|stop|status [demo|test]
#
# Every program gets --defaults-file pointing at an option file this script writes under
# .data/, so nothing is read from the system configuration and no system instance is touched.
# The socket and pid file live in a short directory under the temp dir: a socket path must stay
# under 108 bytes, and a socket inside the project crashes Turbopack builds.
#
# `start` prints "started" when it launched the server and "already-running" when it found one;
# callers use that to stop only what they started. It always (re)applies the idempotent SQL that
# creates the databases and the application user.
set -euo pipefail

action="${1:-}"
instance="${2:-demo}"

project_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
data_root="$project_root/.data"

case "$instance" in
  demo) default_port=3307; data_dir="$data_root/mariadb"; databases=("ketbook") ;;
  test) default_port=3308; data_dir="$data_root/mariadb-test"; databases=("ketbook_test") ;;
  *) echo "mariadb.sh: unknown instance '$instance' (expected demo or test)" >&2; exit 2 ;;
esac
# The port may be overridden, but only by the variable meant for it.
port="${KETBOOK_DB_PORT:-$default_port}"
db_user="${KETBOOK_DB_USER:-ketbook}"

find_binary() {
  local name="$1"
  if command -v "$name" >/dev/null 2>&1; then command -v "$name"; return 0; fi
  for dir in /usr/sbin /usr/bin /usr/local/sbin /usr/local/bin; do
    if [ -x "$dir/$name" ]; then echo "$dir/$name"; return 0; fi
  done
  return 1
}

# Short per-checkout, per-instance run directory: /tmp/ketbook-<hash>/
short_run_dir() {
  local hash base
  hash="$(printf '%s' "$project_root" | sha256sum | cut -c1-10)"
  base="${TMPDIR:-/tmp}"
  # A long TMPDIR would defeat the purpose; fall back to /tmp.
  if [ "${#base}" -gt 60 ]; then base=/tmp; fi
  echo "${base%/}/ketbook-$hash"
}

run_dir="$(short_run_dir)"
socket="$run_dir/$instance.sock"
pid_file="$run_dir/$instance.pid"
option_file="$data_root/mariadb-$instance.cnf"
log_file="$data_root/mariadb-$instance.log"
password_file="$data_root/db-password"

if [ "${#socket}" -gt 107 ]; then
  echo "mariadb.sh: socket path too long (${#socket} > 107 bytes): $socket" >&2
  exit 1
fi

write_option_file() {
  mkdir -p "$data_root" "$run_dir"
  chmod 700 "$run_dir"
  cat >"$option_file" <<EOF
# Written by db/scripts/mariadb.sh for the '$instance' instance; regenerated on every start.
[mariadbd]
user=$(id -un)
datadir=$data_dir
socket=$socket
pid-file=$pid_file
log-error=$log_file
port=$port
bind-address=127.0.0.1
skip-name-resolve
innodb_buffer_pool_size=64M
innodb_log_file_size=16M
max_allowed_packet=64M
character-set-server=utf8mb4
collation-server=utf8mb4_unicode_ci

[client]
socket=$socket
user=root

# Only the command-line client knows this one; mariadb-admin would refuse it under [client].
[mysql]
max_allowed_packet=64M
EOF
}

admin() { "$(find_binary mariadb-admin)" --defaults-file="$option_file" "$@"; }
client() { "$(find_binary mariadb)" --defaults-file="$option_file" "$@"; }

is_up() {
  [ -S "$socket" ] && admin --connect-timeout=2 ping >/dev/null 2>&1
}

# Alive and not a zombie (an unreaped zombie still answers kill -0 after a kill -9).
process_alive() {
  local pid="$1" state
  kill -0 "$pid" 2>/dev/null || return 1
  if [ -r "/proc/$pid/stat" ]; then
    state="$(sed 's/^.*) //' "/proc/$pid/stat" | cut -d' ' -f1)"
    [ "$state" != "Z" ] || return 1
  fi
  return 0
}

server_pid() {
  if [ -f "$pid_file" ]; then
    local pid
    pid="$(tr -dc '0-9' <"$pid_file")"
    if [ -n "$pid" ] && process_alive "$pid"; then echo "$pid"; return 0; fi
  fi
  return 1
}

# Reads KETBOOK_DB_PASSWORD, else the persisted dev password, else generates and persists one.
db_password() {
  if [ -n "${KETBOOK_DB_PASSWORD:-}" ]; then printf '%s' "$KETBOOK_DB_PASSWORD"; return; fi
  if [ ! -s "$password_file" ]; then
    mkdir -p "$data_root"
    (umask 077; head -c 24 /dev/urandom | od -An -tx1 | tr -d ' \n' >"$password_file")
  fi
  tr -d '\n' <"$password_file"
}

sql_quote() { printf '%s' "$1" | sed "s/\\\\/\\\\\\\\/g; s/'/\\\\'/g"; }

apply_grants() {
  local password quoted_password quoted_user sql
  password="$(db_password)"
  quoted_password="$(sql_quote "$password")"
  quoted_user="$(sql_quote "$db_user")"
  sql=""
  for db in "${databases[@]}"; do
    sql+="CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  done
  for host in 127.0.0.1 localhost; do
    sql+="CREATE USER IF NOT EXISTS '$quoted_user'@'$host' IDENTIFIED BY '$quoted_password';"
    sql+="ALTER USER '$quoted_user'@'$host' IDENTIFIED BY '$quoted_password';"
    # The pattern also covers the scratch databases the database tests create and drop.
    sql+="GRANT ALL PRIVILEGES ON \`ketbook%\`.* TO '$quoted_user'@'$host';"
  done
  sql+="FLUSH PRIVILEGES;"
  # Through stdin, so the password never shows in the process list.
  printf '%s\n' "$sql" | client
}

start() {
  local mariadbd install_db launched_pid=""
  write_option_file
  if is_up; then
    apply_grants
    echo "already-running"
    return 0
  fi
  if server_pid >/dev/null; then
    # A server is alive but not answering yet (still starting): wait for it below.
    :
  else
    # Stale socket or pid file left behind by a kill -9 or a crash.
    rm -f "$socket" "$pid_file" "$socket.lock"
    mariadbd="$(find_binary mariadbd)" || { echo "mariadb.sh: mariadbd not found; install mariadb-server" >&2; exit 1; }
    if [ ! -d "$data_dir/mysql" ]; then
      install_db="$(find_binary mariadb-install-db)"
      mkdir -p "$data_dir"
      "$install_db" --defaults-file="$option_file" --user="$(id -un)" --datadir="$data_dir" \
        --auth-root-authentication-method=socket --skip-test-db --skip-name-resolve >>"$log_file" 2>&1 || {
          echo "mariadb.sh: mariadb-install-db failed; see $log_file" >&2; tail -n 20 "$log_file" >&2; exit 1; }
    fi
    # setsid: its own session, so a Ctrl-C in the caller's terminal does not reach it directly;
    # callers stop it with `mariadb.sh stop`.
    setsid nohup "$mariadbd" --defaults-file="$option_file" >>"$log_file" 2>&1 </dev/null &
    launched_pid=$!
  fi
  local tries=0
  until is_up; do
    tries=$((tries + 1))
    if [ -n "$launched_pid" ] && ! process_alive "$launched_pid"; then
      echo "mariadb.sh: $instance server exited during start-up; last log lines:" >&2
      tail -n 20 "$log_file" >&2
      exit 1
    fi
    if [ "$tries" -gt 60 ]; then
      echo "mariadb.sh: $instance server did not answer within 30 s; last log lines:" >&2
      tail -n 20 "$log_file" >&2
      exit 1
    fi
    sleep 0.5
  done
  apply_grants
  echo "started"
}

stop() {
  write_option_file
  local pid=""
  pid="$(server_pid || true)"
  if is_up; then
    admin shutdown
  elif [ -n "$pid" ]; then
    kill -TERM "$pid" 2>/dev/null || true
  fi
  if [ -n "$pid" ]; then
    for _ in $(seq 1 60); do process_alive "$pid" || break; sleep 0.5; done
  fi
  rm -f "$socket" "$socket.lock"
  echo "stopped"
}

status() {
  write_option_file
  if is_up; then
    echo "running (port $port, socket $socket)"
    return 0
  fi
  echo "not running"
  return 1
}

case "$action" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  socket) echo "$socket" ;;
  *) echo "usage: bash db/scripts/mariadb.sh start|stop|status [demo|test]" >&2; exit 2 ;;
esac
