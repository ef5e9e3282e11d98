#!/usr/bin/env bash
# `npm test`: starts its own MariaDB and fakes, migrates a fresh test database, then runs the type
# check, the unit and database tests, and the browser tests against the built app.
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

step "fault tests (own world)"
npx vitest run --config tests/faults/vitest.config.ts
