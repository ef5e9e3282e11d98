# Sourced by the start and stop scripts: loads .env, creating it from .env.example on first run
# and adding any setting that .env.example gained since (so an older .env keeps working).
if [ ! -f .env ]; then
	secret=$(node -e "console.log(require('node:crypto').randomBytes(32).toString('base64url'))")
	sed "s|^AUTH_SECRET=.*|AUTH_SECRET=$secret|" .env.example >.env
	echo "[env] created .env from .env.example with a fresh AUTH_SECRET"
else
	while IFS= read -r line; do
		key=${line%%=*}
		if ! grep -q "^$key=" .env; then
			echo "$line" >>.env
			echo "[env] added $key to .env from .env.example"
		fi
	done < <(grep -E '^[A-Z_]+=' .env.example)
fi
set -a
# shellcheck disable=SC1091
. ./.env
set +a
export ORIGIN=${ORIGIN:-http://${HOST:-127.0.0.1}:${PORT:-3000}}
