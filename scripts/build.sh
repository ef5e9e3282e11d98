#!/usr/bin/env bash
# Builds the app into build/ only when the sources changed since the last build (used by
# `npm start` and `npm run start:cluster`).
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p .data/run
if [ ! -f build/index.js ] || [ -n "$(find src static svelte.config.js vite.config.ts tailwind.config.js package-lock.json -newer build/index.js -print -quit)" ]; then
	echo "[start] building the app"
	# Builds share .svelte-kit/output: the lock keeps a concurrent test build from mixing in.
	# The build log (dependencies print many harmless warnings) goes to a file; shown when it fails.
	if ! flock .data/build.lock node node_modules/vite/bin/vite.js build --logLevel warn >.data/run/build.log 2>&1; then
		tail -40 .data/run/build.log
		echo "[start] the build failed; the whole log is in .data/run/build.log" >&2
		exit 1
	fi
fi
