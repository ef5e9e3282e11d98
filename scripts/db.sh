#!/usr/bin/env bash
# Runs a private MariaDB server for Throwline on loopback: no systemd, no /etc/mysql, its own data
# directory, socket and pid file, so the app's and the tests' instances never touch each other.
#   scripts/db.sh start|stop|status|drop
# Configuration (all from the environment, defaults in .env.example):
#   DB_DIR (data + socket + pid), DATABASE_PORT, DATABASE_NAME, DATABASE_USER, DATABASE_PASSWORD
set -euo pipefail

cmd=${1:-status}
DB_DIR=${DB_DIR:-.data/mariadb}
mkdir -p "$DB_DIR"
DB_DIR=$(cd "$DB_DIR" && pwd)
PORT=${DATABASE_PORT:-3307}
NAME=${DATABASE_NAME:-throwline}
USER_NAME=${DATABASE_USER:-throwline}
PASSWORD=${DATABASE_PASSWORD:-throwline-local}
CNF="$DB_DIR/my.cnf"
SOCK="$DB_DIR/mariadb.sock"
PIDFILE="$DB_DIR/mariadb.pid"

log() { echo "[db] $*"; }

ensure_installed() {
	command -v mariadbd >/dev/null 2>&1 && return 0
	if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
		log "mariadb-server is not installed; installing it from Debian's packages"
		apt-get update -qq
		DEBIAN_FRONTEND=noninteractive apt-get install -y -qq mariadb-server >/dev/null
		return 0
	fi
	echo "MariaDB is not installed and this script cannot install it (needs root and apt-get)." >&2
	echo "Install it with:  sudo apt-get update && sudo apt-get install -y mariadb-server" >&2
	exit 1
}

write_config() {
	local as_root=""
	[ "$(id -u)" = 0 ] && as_root="user=root"
	cat >"$CNF" <<CNF
[mariadbd]
$as_root
datadir=$DB_DIR/data
socket=$SOCK
pid-file=$PIDFILE
port=$PORT
bind-address=127.0.0.1
skip-name-resolve
performance_schema=OFF
innodb_buffer_pool_size=64M
innodb_log_file_size=32M
max_connections=200
# Uploaded files (spec sheets up to 10 MB) are stored in the database: room for one in a packet.
max_allowed_packet=64M
character-set-server=utf8mb4
collation-server=utf8mb4_unicode_ci
log-error=$DB_DIR/error.log
[client]
socket=$SOCK
user=root
[mysql]
max_allowed_packet=64M
[mysqldump]
max_allowed_packet=64M
CNF
}

ping() { mariadb-admin --defaults-file="$CNF" --connect-timeout=1 ping >/dev/null 2>&1; }

start() {
	ensure_installed
	write_config
	if [ ! -d "$DB_DIR/data/mysql" ]; then
		log "initialising data directory $DB_DIR/data"
		mariadb-install-db --defaults-file="$CNF" --auth-root-authentication-method=normal \
			--skip-test-db --skip-name-resolve >"$DB_DIR/install.log" 2>&1
	fi
	if ping; then
		log "already running on 127.0.0.1:$PORT"
	else
		log "starting mariadbd on 127.0.0.1:$PORT"
		setsid mariadbd --defaults-file="$CNF" >/dev/null 2>&1 < /dev/null &
		for _ in $(seq 1 150); do
			ping && break
			sleep 0.2
		done
		ping || { echo "MariaDB did not start; see $DB_DIR/error.log" >&2; tail -20 "$DB_DIR/error.log" >&2; exit 1; }
	fi
	mariadb --defaults-file="$CNF" <<SQL
CREATE DATABASE IF NOT EXISTS \`$NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$USER_NAME'@'127.0.0.1' IDENTIFIED BY '$PASSWORD';
ALTER USER '$USER_NAME'@'127.0.0.1' IDENTIFIED BY '$PASSWORD';
GRANT ALL PRIVILEGES ON \`$NAME\`.* TO '$USER_NAME'@'127.0.0.1';
FLUSH PRIVILEGES;
SQL
	log "database '$NAME' ready for user '$USER_NAME'"
}

stop() {
	[ -f "$CNF" ] || { log "not configured"; return 0; }
	if ping; then
		mariadb-admin --defaults-file="$CNF" shutdown
		log "stopped"
	else
		log "not running"
	fi
}

drop() {
	# Used by the tests to begin from an empty schema.
	mariadb --defaults-file="$CNF" -e "DROP DATABASE IF EXISTS \`$NAME\`"
	start
}

case "$cmd" in
start) start ;;
stop) stop ;;
drop) drop ;;
status) if ping; then log "running on 127.0.0.1:$PORT"; else log "not running"; exit 1; fi ;;
*) echo "usage: $0 start|stop|status|drop" >&2; exit 2 ;;
esac
