#!/usr/bin/env bash
# Probity's private MariaDB: one mariadbd on 127.0.0.1, its own data directory, port
# and socket. Never the system service.
#
#   db/mariadb.sh start            install if missing, initialise, start (or reuse ours), wait
#   db/mariadb.sh stop             stop our server (if running)
#   db/mariadb.sh status           say whether ours is running
#   db/mariadb.sh create-db NAME   create database NAME (if missing) and grant the app user
#   db/mariadb.sh reset-db NAME    drop and re-create database NAME (tests)
#
# Settings (environment): PROBITY_DB_DIR (.data/mariadb), PROBITY_DB_PORT (3307),
# PROBITY_DB_SOCKET ($PROBITY_DB_DIR/mysqld.sock), PROBITY_DB_USER (probity),
# PROBITY_DB_PASSWORD (probity-local).
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DIR="${PROBITY_DB_DIR:-$ROOT/.data/mariadb}"
PORT="${PROBITY_DB_PORT:-3307}"
SOCK="${PROBITY_DB_SOCKET:-$DIR/mysqld.sock}"
APP_USER="${PROBITY_DB_USER:-probity}"
APP_PASSWORD="${PROBITY_DB_PASSWORD:-probity-local}"
PIDFILE="$DIR/mariadb.pid"

say() { printf '[mariadb] %s\n' "$*"; }
die() { printf '[mariadb] ERROR: %s\n' "$*" >&2; exit 1; }

find_bin() { command -v "$1" 2>/dev/null || { [ -x "/usr/sbin/$1" ] && echo "/usr/sbin/$1"; } || true; }

ensure_installed() {
  if [ -n "$(find_bin mariadbd)" ] && [ -n "$(find_bin mariadb-install-db)" ]; then return; fi
  say "mariadbd not found; installing Debian's mariadb-server with apt-get"
  if [ "$(id -u)" != 0 ]; then
    die "mariadb-server is not installed and this is not root. Install it first: sudo apt-get install -y mariadb-server"
  fi
  command -v apt-get >/dev/null || die "mariadb-server is not installed and apt-get is missing. Install MariaDB 10.11+ by hand."
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq || die "apt-get update failed (is the Debian archive reachable?)"
  apt-get install -y -qq mariadb-server mariadb-client >/dev/null || die "apt-get install mariadb-server failed"
  [ -n "$(find_bin mariadbd)" ] || die "mariadb-server installed but mariadbd is still not on PATH"
}

our_pid() {
  [ -f "$PIDFILE" ] || return 1
  local pid; pid="$(cat "$PIDFILE" 2>/dev/null || true)"
  [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null && grep -q mariadbd "/proc/$pid/cmdline" 2>/dev/null && echo "$pid"
}

root_sql() { "$(find_bin mariadb)" --no-defaults --socket="$SOCK" -uroot "$@"; }
ping_ours() { "$(find_bin mariadb-admin)" --no-defaults --socket="$SOCK" -uroot ping --silent >/dev/null 2>&1; }

port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null
}

start() {
  ensure_installed
  if pid="$(our_pid)"; then
    ping_ours && { say "reusing our running server (pid $pid, port $PORT)"; return; }
  fi
  if port_in_use; then
    die "port $PORT on 127.0.0.1 is held by another program. Stop it or choose another port: PROBITY_DB_PORT=3317 npm start"
  fi
  mkdir -p "$DIR"
  if [ ! -d "$DIR/mysql" ]; then
    say "initialising data directory $DIR"
    "$(find_bin mariadb-install-db)" --no-defaults --user="$(id -un)" --datadir="$DIR" \
      --auth-root-authentication-method=normal --skip-test-db >"$DIR/install.log" 2>&1 \
      || die "mariadb-install-db failed; see $DIR/install.log"
  fi
  rm -f "$SOCK" "$PIDFILE"
  say "starting mariadbd on 127.0.0.1:$PORT"
  setsid "$(find_bin mariadbd)" --no-defaults --user="$(id -un)" --datadir="$DIR" --socket="$SOCK" \
    --port="$PORT" --bind-address=127.0.0.1 --pid-file="$PIDFILE" --log-error="$DIR/error.log" \
    --skip-name-resolve --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    </dev/null >/dev/null 2>&1 &
  local child=$!
  for _ in $(seq 1 100); do
    if ping_ours; then say "ready (pid $(cat "$PIDFILE" 2>/dev/null || echo "$child"))"; return; fi
    if ! kill -0 "$child" 2>/dev/null; then
      grep -q "error 98\|Address already in use" "$DIR/error.log" 2>/dev/null \
        && die "port $PORT is in use by another program (see $DIR/error.log)"
      die "mariadbd exited during start; last lines of $DIR/error.log:
$(tail -n 15 "$DIR/error.log" 2>/dev/null)"
    fi
    sleep 0.2
  done
  die "mariadbd did not answer within 20 s; see $DIR/error.log"
}

stop() {
  local pid
  if ! pid="$(our_pid)"; then say "not running"; return; fi
  say "stopping (pid $pid)"
  kill -TERM "$pid"
  for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || { say "stopped"; return; }; sleep 0.1; done
  die "mariadbd (pid $pid) did not stop within 10 s"
}

check_name() { [[ "$1" =~ ^[a-z][a-z0-9_]{0,40}$ ]] || die "bad database name '$1' (lower-case letters, digits, _)"; }

create_db() {
  check_name "$1"
  ping_ours || die "our server is not running; run: db/mariadb.sh start"
  root_sql -e "CREATE DATABASE IF NOT EXISTS \`$1\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$APP_USER'@'127.0.0.1' IDENTIFIED BY '$APP_PASSWORD';
    ALTER USER '$APP_USER'@'127.0.0.1' IDENTIFIED BY '$APP_PASSWORD';
    GRANT ALL PRIVILEGES ON \`$1\`.* TO '$APP_USER'@'127.0.0.1'; FLUSH PRIVILEGES;"
  say "database $1 ready for user $APP_USER"
}

reset_db() {
  check_name "$1"
  ping_ours || die "our server is not running; run: db/mariadb.sh start"
  root_sql -e "DROP DATABASE IF EXISTS \`$1\`;"
  create_db "$1"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) if pid="$(our_pid)" && ping_ours; then say "running (pid $pid, 127.0.0.1:$PORT)"; else say "not running"; exit 3; fi ;;
  create-db) create_db "${2:?database name}" ;;
  reset-db) reset_db "${2:?database name}" ;;
  *) echo "usage: db/mariadb.sh start|stop|status|create-db NAME|reset-db NAME" >&2; exit 2 ;;
esac
