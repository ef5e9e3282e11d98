#!/usr/bin/env bash
# nginx from Debian's packages as the reverse proxy in front of several app processes, with its own
# config, pid, logs and temp folders under NGINX_DIR (no /etc/nginx, no systemd).
#   scripts/nginx.sh start|stop|status
# Configuration from the environment:
#   NGINX_DIR (default .data/nginx), PROXY_HOST/PROXY_PORT (where it listens, default 127.0.0.1:3000),
#   APP_PORTS (space-separated loopback ports of the app processes), PROXY_DEBUG_HEADER=1 to answer
#   which app process served a request (tests only).
set -euo pipefail

cmd=${1:-status}
NGINX_DIR=${NGINX_DIR:-.data/nginx}
mkdir -p "$NGINX_DIR"
NGINX_DIR=$(cd "$NGINX_DIR" && pwd)
CONF="$NGINX_DIR/nginx.conf"
PIDFILE="$NGINX_DIR/nginx.pid"

log() { echo "[nginx] $*"; }

ensure_installed() {
	command -v nginx >/dev/null 2>&1 && return 0
	[ -x /usr/sbin/nginx ] && return 0
	if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
		log "nginx is not installed; installing it from Debian's packages"
		apt-get update -qq
		DEBIAN_FRONTEND=noninteractive apt-get install -y -qq nginx-light >/dev/null 2>&1 ||
			DEBIAN_FRONTEND=noninteractive apt-get install -y -qq nginx >/dev/null
		return 0
	fi
	echo "nginx is not installed and this script cannot install it (needs root and apt-get)." >&2
	echo "Install it with:  sudo apt-get update && sudo apt-get install -y nginx" >&2
	exit 1
}

nginx_bin() { command -v nginx 2>/dev/null || echo /usr/sbin/nginx; }

write_config() {
	local servers="" port as_root="" debug=""
	for port in ${APP_PORTS:?APP_PORTS is not set}; do
		servers+="		server 127.0.0.1:$port max_fails=1 fail_timeout=2s;"$'\n'
	done
	[ "$(id -u)" = 0 ] && as_root="user root;"
	[ "${PROXY_DEBUG_HEADER:-}" = 1 ] && debug='add_header X-Throwline-Upstream $upstream_addr always;'
	mkdir -p "$NGINX_DIR/temp" "$NGINX_DIR/logs"
	cat >"$CONF" <<CONF
# Written by scripts/nginx.sh; changes here are lost on the next start.
$as_root
worker_processes 1;
pid $PIDFILE;
error_log $NGINX_DIR/logs/error.log warn;
events { worker_connections 1024; }
http {
	access_log off;
	client_body_temp_path $NGINX_DIR/temp/body;
	proxy_temp_path $NGINX_DIR/temp/proxy;
	fastcgi_temp_path $NGINX_DIR/temp/fastcgi;
	uwsgi_temp_path $NGINX_DIR/temp/uwsgi;
	scgi_temp_path $NGINX_DIR/temp/scgi;
	# The app answers too-large bodies itself (413 in its JSON envelope): let them through to it.
	client_max_body_size 32m;
	upstream throwline {
$servers		keepalive 32;
	}
	server {
		listen ${PROXY_HOST:-127.0.0.1}:${PROXY_PORT:-3000};
		location / {
			proxy_pass http://throwline;
			proxy_http_version 1.1;
			proxy_set_header Connection "";
			proxy_set_header Host \$http_host;
			proxy_set_header X-Forwarded-For \$proxy_add_x_forwarded_for;
			proxy_set_header X-Forwarded-Proto \$scheme;
			# A process that is down is skipped; a POST is never sent twice (nginx's default).
			proxy_next_upstream error timeout http_502 http_503;
			proxy_read_timeout 60s;
			proxy_buffering off;
			$debug
		}
	}
}
CONF
}

running() { [ -f "$PIDFILE" ] && kill -0 "$(cat "$PIDFILE" 2>/dev/null)" 2>/dev/null; }

start() {
	ensure_installed
	write_config
	"$(nginx_bin)" -t -q -p "$NGINX_DIR" -c "$CONF" -e "$NGINX_DIR/logs/error.log"
	if running; then
		"$(nginx_bin)" -p "$NGINX_DIR" -c "$CONF" -e "$NGINX_DIR/logs/error.log" -s reload
		log "reloaded on ${PROXY_HOST:-127.0.0.1}:${PROXY_PORT:-3000} → $APP_PORTS"
	else
		"$(nginx_bin)" -p "$NGINX_DIR" -c "$CONF" -e "$NGINX_DIR/logs/error.log"
		log "listening on ${PROXY_HOST:-127.0.0.1}:${PROXY_PORT:-3000} → app processes on $APP_PORTS"
	fi
}

stop() {
	if running; then
		kill -QUIT "$(cat "$PIDFILE")"
		for _ in $(seq 1 50); do running || break; sleep 0.1; done
		log "stopped"
	fi
	rm -f "$PIDFILE"
}

case "$cmd" in
start) start ;;
stop) stop ;;
status) if running; then log "running"; else log "not running"; exit 1; fi ;;
*) echo "usage: $0 start|stop|status" >&2; exit 2 ;;
esac
