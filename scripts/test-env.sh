# Sourced by scripts/test.sh: a separate world for the tests (own MariaDB, database, ports and files),
# so `npm test` never touches the demo data of `npm start`, and both can run at once.
export NODE_ENV=production
export DB_DIR=.data/test/mariadb
export DATABASE_HOST=127.0.0.1
export DATABASE_PORT=3317
export DATABASE_NAME=throwline_test
export DATABASE_USER=throwline_test
export DATABASE_PASSWORD=throwline-test-only
export AUTH_SECRET=test-only-secret-not-used-anywhere-else-0123456789
export AUTH_TRUST_HOST=true
export DEMO_PASSWORD=throwline-demo
export HOST=127.0.0.1
export PORT=3100
export ORIGIN=http://127.0.0.1:3100
export SMTP_HOST=127.0.0.1
export SMTP_PORT=2626
export MAIL_FROM="Kestrel Yard Audio <hire@kestrel-yard.test>"
export MAIL_DIR=.data/test/mail
export UPLOAD_DIR=.data/test/uploads
export RUN_DIR=.data/test/run
export BUILD_DIR=.data/test/build
