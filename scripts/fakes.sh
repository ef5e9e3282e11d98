#!/usr/bin/env bash
# Starts or stops the local stand-ins for outside services (SMTP sink; the payment fake when added),
# each a small Node process on 127.0.0.1 with its pid under .data/run.
set -uo pipefail
cmd=${1:-start}
RUN_DIR=${RUN_DIR:-.data/run}
mkdir -p "$RUN_DIR"

FAKES=()
for f in tests/fakes/*.server.ts; do [ -e "$f" ] && FAKES+=("$f"); done

start_one() {
	local file=$1 name pidfile
	name=$(basename "$file" .server.ts)
	pidfile="$RUN_DIR/$name.pid"
	if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then
		echo "[fakes] $name already running"
		return
	fi
	setsid node --import tsx "$file" >"$RUN_DIR/$name.log" 2>&1 </dev/null &
	echo $! >"$pidfile"
	echo "[fakes] $name started (log $RUN_DIR/$name.log)"
}

stop_one() {
	local name pidfile
	name=$(basename "$1" .server.ts)
	pidfile="$RUN_DIR/$name.pid"
	[ -f "$pidfile" ] && kill "$(cat "$pidfile")" 2>/dev/null && echo "[fakes] $name stopped"
	rm -f "$pidfile"
}

for f in "${FAKES[@]}"; do
	case "$cmd" in
	start) start_one "$f" ;;
	stop) stop_one "$f" ;;
	esac
done
exit 0
