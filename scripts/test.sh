#!/usr/bin/env bash
# `npm test`: starts its own MariaDB and fakes, migrates a fresh test database, then runs the type
# check, the unit and database tests, the browser tests against the built app, the same app as two
# processes behind nginx (cluster tests), and the fault tests in a world of their own.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/test-env.sh
trap 'bash scripts/test-world.sh down' EXIT

step() { echo; echo "== $*"; }

step "services"
bash scripts/test-world.sh services

step "type check"
npx svelte-kit sync
npx svelte-check --tsconfig ./tsconfig.json --fail-on-warnings --output human

step "unit and database tests"
npx vitest run

step "build and start the app"
bash scripts/test-world.sh app

step "browser tests"
npx vitest run --config tests/e2e/vitest.config.ts

step "cluster tests (two app processes behind nginx)"
CLUSTER_SKIP_BUILD=1 bash scripts/test-cluster.sh up
npx vitest run --config tests/cluster/vitest.config.ts
bash scripts/test-cluster.sh down

step "fault tests (own world)"
npx vitest run --config tests/faults/vitest.config.ts
