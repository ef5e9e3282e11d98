#!/usr/bin/env bash
# `npm run restore FILE [--yes]`: replaces the app's database with a dump made by `npm run backup`.
# Only into a stopped app (nothing answers at $ORIGIN) or a fresh, empty database; asks you to type
# the database's name first, unless --yes (for scripts).
#   Settings come from the environment when DATABASE_NAME is set (tests), else from .env.
set -euo pipefail
cd "$(dirname "$0")/.."
if [ -z "${DATABASE_NAME:-}" ]; then . scripts/env.sh; fi

file=""
yes=no
for arg in "$@"; do
	case "$arg" in
	--yes) yes=yes ;;
	-*) echo "unknown option $arg" >&2; exit 2 ;;
	*) file=$arg ;;
	esac
done
[ -n "$file" ] && [ -f "$file" ] || { echo "usage: npm run restore -- FILE.sql.gz [--yes]" >&2; exit 2; }
gzip -t "$file" || { echo "[restore] $file is not a complete gzip file" >&2; exit 1; }

export MYSQL_PWD=$DATABASE_PASSWORD
client=(mariadb --host="${DATABASE_HOST:-127.0.0.1}" --port="${DATABASE_PORT:-3307}" --user="$DATABASE_USER" --max-allowed-packet=64M)
tables=$("${client[@]}" -N -e "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$DATABASE_NAME'")
if [ "$tables" != 0 ] && [ -n "${ORIGIN:-}" ] && curl -fs --max-time 2 "$ORIGIN/api/health" >/dev/null 2>&1; then
	echo "[restore] the app answers at $ORIGIN and '$DATABASE_NAME' holds data: stop it first (npm stop)." >&2
	exit 1
fi
if [ "$yes" != yes ]; then
	echo "This replaces everything in database '$DATABASE_NAME' ($tables tables) with $file."
	read -r -p "Type the database name to go on: " answer
	[ "$answer" = "$DATABASE_NAME" ] || { echo "[restore] not confirmed; nothing changed."; exit 1; }
fi

"${client[@]}" -e "DROP DATABASE IF EXISTS \`$DATABASE_NAME\`; CREATE DATABASE \`$DATABASE_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"
gunzip -c "$file" | "${client[@]}" "$DATABASE_NAME"
echo "[restore] '$DATABASE_NAME' restored from $file"
