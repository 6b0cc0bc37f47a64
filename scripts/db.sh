#!/usr/bin/env bash
# The project's own MariaDB: installed from Debian's packages when missing, data inside the
# project, bound to loopback on its own port, stopped only through its own pid file / socket.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="${KW_DB_DATA:-$ROOT/.data/mariadb}"
RUN_DIR="${KW_DB_RUN:-$ROOT/.run}"
PORT="${DB_PORT:-3407}"
SOCKET="$RUN_DIR/mariadb.sock"
PID_FILE="$RUN_DIR/mariadb.pid"
LOG_FILE="$RUN_DIR/mariadb.log"
APP_DB="${DB_NAME:-knitwright}"
TEST_DB="${DB_TEST_NAME:-knitwright_test}"
APP_USER="${DB_USER:-knitwright}"
APP_PASSWORD="${DB_PASSWORD:-knitwright-local}"

log() { printf '[db] %s\n' "$*" >&2; }

ensure_installed() {
  if command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; then return; fi
  log "mariadbd not found: installing mariadb-server from Debian's packages"
  if [ "$(id -u)" -ne 0 ]; then
    log "need root to install mariadb-server (run: sudo apt-get install mariadb-server)"; exit 1
  fi
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  # policy-rc.d keeps the package from starting a system-wide server of its own.
  local policy=/usr/sbin/policy-rc.d created_policy=0
  if [ ! -e "$policy" ]; then printf '#!/bin/sh\nexit 101\n' >"$policy"; chmod +x "$policy"; created_policy=1; fi
  apt-get install -y -qq mariadb-server mariadb-client >/dev/null
  if [ "$created_policy" = 1 ]; then rm -f "$policy"; fi
}

mariadbd_bin() { command -v mariadbd 2>/dev/null || echo /usr/sbin/mariadbd; }

is_running() {
  [ -f "$PID_FILE" ] || return 1
  local pid; pid="$(cat "$PID_FILE" 2>/dev/null || true)"
  [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null && [ -S "$SOCKET" ]
}

ping_db() { mariadb-admin --no-defaults --socket="$SOCKET" --user=root ping >/dev/null 2>&1; }

initialise() {
  if [ -d "$DATA_DIR/mysql" ]; then return; fi
  log "initialising a private data folder in ${DATA_DIR#$ROOT/}"
  mkdir -p "$DATA_DIR"
  local user_args=(); [ "$(id -u)" -eq 0 ] && user_args=(--user=root)
  # Initialise into a temporary folder first so an interrupted run never leaves half a data dir.
  local tmp="$DATA_DIR.init.$$"; rm -rf "$tmp"; mkdir -p "$tmp"
  mariadb-install-db --no-defaults "${user_args[@]}" --datadir="$tmp" --auth-root-authentication-method=socket \
    --skip-test-db >"$RUN_DIR/install-db.log" 2>&1 || { log "mariadb-install-db failed: see $RUN_DIR/install-db.log"; rm -rf "$tmp"; exit 1; }
  rmdir "$DATA_DIR" 2>/dev/null || true
  mv "$tmp" "$DATA_DIR"
}

start() {
  ensure_installed
  mkdir -p "$RUN_DIR"
  if [ "${#SOCKET}" -ge 107 ]; then log "socket path too long (${#SOCKET} bytes): $SOCKET"; exit 1; fi
  if is_running && ping_db; then log "already running on 127.0.0.1:$PORT"; create_databases; return; fi
  if [ -f "$PID_FILE" ] && ! is_running; then log "removing a stale pid file from an earlier crash"; rm -f "$PID_FILE" "$SOCKET"; fi
  initialise
  local user_args=(); [ "$(id -u)" -eq 0 ] && user_args=(--user=root)
  log "starting mariadbd on 127.0.0.1:$PORT"
  nohup "$(mariadbd_bin)" --no-defaults "${user_args[@]}" --datadir="$DATA_DIR" --bind-address=127.0.0.1 \
    --port="$PORT" --socket="$SOCKET" --pid-file="$PID_FILE" --log-error="$LOG_FILE" \
    --skip-name-resolve --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --innodb-buffer-pool-size=128M --max-connections=200 --skip-log-bin >/dev/null 2>&1 &
  for _ in $(seq 1 120); do
    if ping_db; then break; fi
    sleep 0.5
  done
  if ! ping_db; then log "mariadbd did not answer; last lines of its log:"; tail -n 20 "$LOG_FILE" >&2 || true; exit 1; fi
  create_databases
  log "ready on 127.0.0.1:$PORT"
}

create_databases() {
  mariadb --no-defaults --socket="$SOCKET" --user=root <<SQL
CREATE DATABASE IF NOT EXISTS \`$APP_DB\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE DATABASE IF NOT EXISTS \`$TEST_DB\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$APP_USER'@'127.0.0.1' IDENTIFIED BY '$APP_PASSWORD';
CREATE USER IF NOT EXISTS '$APP_USER'@'localhost' IDENTIFIED BY '$APP_PASSWORD';
GRANT ALL PRIVILEGES ON \`$APP_DB\`.* TO '$APP_USER'@'127.0.0.1', '$APP_USER'@'localhost';
GRANT ALL PRIVILEGES ON \`$TEST_DB\`.* TO '$APP_USER'@'127.0.0.1', '$APP_USER'@'localhost';
FLUSH PRIVILEGES;
SQL
}

stop() {
  if ! [ -f "$PID_FILE" ]; then log "not running"; return; fi
  local pid; pid="$(cat "$PID_FILE")"
  if ping_db; then
    mariadb-admin --no-defaults --socket="$SOCKET" --user=root shutdown || true
  elif kill -0 "$pid" 2>/dev/null; then
    kill -TERM "$pid"
  fi
  for _ in $(seq 1 60); do kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
  rm -f "$PID_FILE"
  log "stopped"
}

status() {
  if is_running && ping_db; then echo "running on 127.0.0.1:$PORT (pid $(cat "$PID_FILE"))"; else echo "stopped"; return 3; fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  *) echo "usage: scripts/db.sh start|stop|status" >&2; exit 2 ;;
esac
