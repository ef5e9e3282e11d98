#!/usr/bin/env bash
# `npm run backup`: one consistent dump of the app's database (stored files included: they live in
# the database) to .data/backups/<UTC timestamp>.sql.gz. --single-transaction reads one snapshot
# without locking, so the app keeps running while it is taken.
#   Settings come from the environment when DATABASE_NAME is set (tests), else from .env.
#   BACKUP_DIR overrides the folder.
set -euo pipefail
cd "$(dirname "$0")/.."
if [ -z "${DATABASE_NAME:-}" ]; then . scripts/env.sh; fi

dir=${BACKUP_DIR:-.data/backups}
mkdir -p "$dir"
file="$dir/$(date -u +%Y%m%dT%H%M%SZ).sql.gz"
partial="$file.partial"

# The password goes by the environment, never on the command line where `ps` would show it.
MYSQL_PWD=$DATABASE_PASSWORD mariadb-dump \
	--host="${DATABASE_HOST:-127.0.0.1}" --port="${DATABASE_PORT:-3307}" --user="$DATABASE_USER" \
	--single-transaction --quick --hex-blob --no-tablespaces --routines --triggers \
	--max-allowed-packet=64M "$DATABASE_NAME" | gzip -6 >"$partial"
# Only a complete dump gets the final name (pipefail stops a failed one above).
mv "$partial" "$file"
echo "[backup] $file ($(du -h "$file" | cut -f1))"
