#!/usr/bin/env bash
# `npm run start:cluster`: like `npm start`, but two app processes on two loopback ports behind
# nginx on $HOST:$PORT (127.0.0.1:3000), balancing between them. Both read the same .env, so they
# share the database and AUTH_SECRET; migrations and seeding run once, under a database lock.
# Runs in the background; `npm stop` stops it all. CLUSTER_APP_PORTS overrides "3001 3002".
set -euo pipefail
cd "$(dirname "$0")/.."
. scripts/start-prepare.sh

export RUN_DIR=.data/run APP_PORTS=${CLUSTER_APP_PORTS:-"3001 3002"}
bash scripts/app-processes.sh start
PROXY_HOST=${HOST:-127.0.0.1} PROXY_PORT=${PORT:-3000} NGINX_DIR=.data/nginx bash scripts/nginx.sh start
echo "[start] Throwline on $ORIGIN through nginx, app processes on ports $APP_PORTS ('npm stop' stops it all)"
