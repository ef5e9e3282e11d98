#!/usr/bin/env bash
# `npm start`: MariaDB, migrations, demo data, the local fakes and the built app, all on loopback.
# Safe to run again: migrations and seeders skip what is done, services already running are reused.
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/start-prepare.sh

echo "[start] Throwline on $ORIGIN (stop with Ctrl-C; 'npm stop' also stops MariaDB and the fakes)"
exec node build
