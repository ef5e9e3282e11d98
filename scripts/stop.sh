#!/usr/bin/env bash
# `npm stop`: stops the local fakes and the app's MariaDB.
set -uo pipefail
cd "$(dirname "$0")/.."
. scripts/env.sh
bash scripts/fakes.sh stop
bash scripts/db.sh stop
