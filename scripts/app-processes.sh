#!/usr/bin/env bash
# Several app processes from one build, one per loopback port, for the reverse proxy to balance
# (scripts/nginx.sh). Each reads the same environment, so they share the database and AUTH_SECRET.
#   scripts/app-processes.sh start|stop
# Configuration from the environment: APP_PORTS (e.g. "3001 3002"), BUILD_DIR (default build),
# RUN_DIR (pids and logs, default .data/run); ORIGIN stays the proxy's public address.
set -euo pipefail

cmd=${1:-start}
RUN_DIR=${RUN_DIR:-.data/run}
BUILD_DIR=${BUILD_DIR:-build}
mkdir -p "$RUN_DIR"

start() {
	local port
	for port in ${APP_PORTS:?APP_PORTS is not set}; do
		stop_one "$port"
		# Behind the proxy the client's address is the last X-Forwarded-For hop nginx added.
		PORT=$port HOST=127.0.0.1 ADDRESS_HEADER=X-Forwarded-For XFF_DEPTH=1 \
			setsid node "$BUILD_DIR" >"$RUN_DIR/app-$port.log" 2>&1 </dev/null &
		echo $! >"$RUN_DIR/app-$port.pid"
	done
	for port in $APP_PORTS; do
		for _ in $(seq 1 150); do
			curl -fs "http://127.0.0.1:$port/api/health" >/dev/null 2>&1 && break
			sleep 0.2
		done
		if ! curl -fs "http://127.0.0.1:$port/api/health" >/dev/null 2>&1; then
			echo "[app] the process on port $port did not start:" >&2
			tail -30 "$RUN_DIR/app-$port.log" >&2
			return 1
		fi
		echo "[app] process $(cat "$RUN_DIR/app-$port.pid") on 127.0.0.1:$port"
	done
}

stop_one() {
	local pidfile="$RUN_DIR/app-$1.pid" pid
	if [ -f "$pidfile" ]; then
		pid=$(cat "$pidfile")
		if kill "$pid" 2>/dev/null; then
			# adapter-node closes its connections (up to its 30 s timeout); then it must be gone.
			for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
			kill -KILL "$pid" 2>/dev/null && echo "[app] process on port $1 did not stop in 20 s; killed"
			echo "[app] process on port $1 stopped"
		fi
		rm -f "$pidfile"
	fi
	return 0
}

stop() {
	local pidfile
	for pidfile in "$RUN_DIR"/app-*.pid; do
		[ -e "$pidfile" ] || continue
		stop_one "$(basename "$pidfile" .pid | sed 's/^app-//')"
	done
}

case "$cmd" in
start) start ;;
stop) stop ;;
*) echo "usage: $0 start|stop" >&2; exit 2 ;;
esac
