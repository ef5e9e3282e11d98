# Sourced by start.sh and start-cluster.sh (from the project's folder): the environment, then
# MariaDB, migrations, demo data, the local fakes and the build, each safe to run again.
. scripts/env.sh

mkdir -p .data/run
bash scripts/db.sh start
node --import tsx scripts/migrate.ts up
node --import tsx scripts/migrate.ts seed
bash scripts/fakes.sh start
bash scripts/build.sh
