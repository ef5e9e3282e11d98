#!/usr/bin/env bash
# The tests' own world (scripts/test-env.sh): a fresh MariaDB database, the fakes, and optionally
# the built app on $ORIGIN. Used by `npm test`, and by hand to run one browser test file:
#   bash scripts/test-world.sh up && . scripts/test-env.sh && npx vitest run --config tests/e2e/vitest.config.ts tests/e2e/x.e2e.ts
#   bash scripts/test-world.sh down
#   scripts/test-world.sh services | build | app | up | down
# (scripts/test-cluster.sh puts two app processes behind nginx on $ORIGIN instead of the one app.)
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/test-env.sh

services() {
	mkdir -p "$RUN_DIR"
	stop_app # an app left running would take the payment stand-in's webhooks meant for the unit tests
	bash scripts/fakes.sh stop >/dev/null # fakes left from an earlier run would keep its state
	rm -rf "$MAIL_DIR" "$UPLOAD_DIR" "$RUN_DIR/stripe-state.json"
	bash scripts/db.sh start
	bash scripts/db.sh drop >/dev/null
	node --import tsx scripts/migrate.ts up
	node --import tsx scripts/migrate.ts seed
	bash scripts/fakes.sh start
}

build() {
	# Builds share .svelte-kit/output: the lock keeps a concurrent npm start build from mixing in.
	mkdir -p .data "$RUN_DIR"
	if ! flock .data/build.lock node node_modules/vite/bin/vite.js build --logLevel warn >"$RUN_DIR/build.log" 2>&1; then
		tail -40 "$RUN_DIR/build.log" >&2
		return 1
	fi
}

app() {
	build
	stop_app
	setsid node "$BUILD_DIR" >"$RUN_DIR/app.log" 2>&1 </dev/null &
	echo $! >"$RUN_DIR/app.pid"
	for _ in $(seq 1 100); do
		curl -fs "$ORIGIN/api/health" >/dev/null 2>&1 && return 0
		sleep 0.2
	done
	echo "app did not start:" >&2
	tail -30 "$RUN_DIR/app.log" >&2
	return 1
}

stop_app() {
	[ -f "$RUN_DIR/app.pid" ] && kill "$(cat "$RUN_DIR/app.pid")" 2>/dev/null
	rm -f "$RUN_DIR/app.pid"
	return 0
}

down() {
	bash scripts/test-cluster.sh down >/dev/null
	stop_app
	bash scripts/fakes.sh stop >/dev/null
	bash scripts/db.sh stop >/dev/null
}

case "${1:-up}" in
services) services ;;
build) build ;;
app) app ;;
up) services && app ;;
down) down ;;
*) echo "usage: $0 services|app|up|down" >&2; exit 2 ;;
esac
