#!/usr/bin/env bash
# `npm start`: MariaDB, migrations, demo data, the local fakes and the built app, all on loopback.
# Safe to run again: migrations and seeders skip what is done, services already running are reused.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/env.sh

mkdir -p .data/run
bash scripts/db.sh start
node --import tsx scripts/migrate.ts up
node --import tsx scripts/migrate.ts seed
bash scripts/fakes.sh start

# Build only when the sources changed since the last build.
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

echo "[start] Throwline on $ORIGIN (stop with Ctrl-C; 'npm stop' also stops MariaDB and the fakes)"
exec node build
