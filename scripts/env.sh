# Sourced by the start and test scripts: loads .env (creating it from .env.example on first run).
if [ ! -f .env ]; then
	secret=$(node -e "console.log(require('node:crypto').randomBytes(32).toString('base64url'))")
	sed "s|^AUTH_SECRET=.*|AUTH_SECRET=$secret|" .env.example >.env
	echo "[env] created .env from .env.example with a fresh AUTH_SECRET"
fi
set -a
# shellcheck disable=SC1091
. ./.env
set +a
export ORIGIN=${ORIGIN:-http://${HOST:-127.0.0.1}:${PORT:-3000}}
