#!/usr/bin/env bash
# `npm stop`: stops the cluster's proxy and app processes (when `npm run start:cluster` started
# them), the local fakes and the app's MariaDB.
set -uo pipefail
cd "$(dirname "$0")/.."
. scripts/env.sh
NGINX_DIR=.data/nginx bash scripts/nginx.sh stop
RUN_DIR=.data/run bash scripts/app-processes.sh stop
bash scripts/fakes.sh stop
bash scripts/db.sh stop
