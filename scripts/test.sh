#!/usr/bin/env bash
# `npm test`: starts its own MariaDB and fakes, migrates a fresh test database, then runs the type
# check, the unit and database tests, and the browser tests against the built app.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/test-env.sh

APP_PID=""
cleanup() {
	[ -n "$APP_PID" ] && kill "$APP_PID" 2>/dev/null
	bash scripts/fakes.sh stop >/dev/null
	bash scripts/db.sh stop >/dev/null
}
trap cleanup EXIT

step() { echo; echo "== $*"; }

step "services"
mkdir -p "$RUN_DIR"
bash scripts/fakes.sh stop >/dev/null # fakes left from an earlier run would keep its state
rm -rf "$MAIL_DIR" "$UPLOAD_DIR" "$RUN_DIR/stripe-state.json"
bash scripts/db.sh start
bash scripts/db.sh drop >/dev/null
node --import tsx scripts/migrate.ts up
node --import tsx scripts/migrate.ts seed
bash scripts/fakes.sh start

step "type check"
npx svelte-kit sync
npx svelte-check --tsconfig ./tsconfig.json --fail-on-warnings --output human

step "unit and database tests"
npx vitest run

step "build"
# Builds share .svelte-kit/output: the lock keeps a concurrent npm start build from mixing in.
mkdir -p .data && flock .data/build.lock node node_modules/vite/bin/vite.js build --logLevel error

step "browser tests"
node "$BUILD_DIR" >"$RUN_DIR/app.log" 2>&1 &
APP_PID=$!
for _ in $(seq 1 100); do
	curl -fs "$ORIGIN/api/health" >/dev/null 2>&1 && break
	sleep 0.2
done
curl -fs "$ORIGIN/api/health" >/dev/null || { echo "app did not start:"; tail -30 "$RUN_DIR/app.log"; exit 1; }
npx vitest run --config tests/e2e/vitest.config.ts
