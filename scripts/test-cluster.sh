#!/usr/bin/env bash
# The test world with two app processes behind nginx: the proxy listens on $ORIGIN (where the single
# app of scripts/test-world.sh would), the processes on two ports beside it; same database and fakes.
#   bash scripts/test-world.sh services && bash scripts/test-cluster.sh up
#   . scripts/test-env.sh && npx vitest run --config tests/cluster/vitest.config.ts
#   bash scripts/test-cluster.sh down
# CLUSTER_SKIP_BUILD=1 reuses the test build (npm test has just made it).
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/test-env.sh
export APP_PORTS="$CLUSTER_APP_PORTS" NGINX_DIR=.data/test/nginx
# Retry mail often, so the test of two retry timers racing for one outbox finishes quickly.
export MAIL_RETRY_MS=500

up() {
	[ "${CLUSTER_SKIP_BUILD:-}" = 1 ] || bash scripts/test-world.sh build
	# The single test app holds the proxy's port: stop it.
	[ -f "$RUN_DIR/app.pid" ] && kill "$(cat "$RUN_DIR/app.pid")" 2>/dev/null
	rm -f "$RUN_DIR/app.pid"
	for _ in $(seq 1 50); do curl -fs "$ORIGIN/api/health" >/dev/null 2>&1 || break; sleep 0.1; done
	bash scripts/app-processes.sh start
	PROXY_HOST=127.0.0.1 PROXY_PORT=$PORT PROXY_DEBUG_HEADER=1 bash scripts/nginx.sh start
}

down() {
	bash scripts/nginx.sh stop
	bash scripts/app-processes.sh stop
}

case "${1:-up}" in
up) up ;;
down) down ;;
*) echo "usage: $0 up|down" >&2; exit 2 ;;
esac
