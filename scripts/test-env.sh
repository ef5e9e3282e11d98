# Sourced by scripts/test.sh: a separate world for the tests (own MariaDB, database, ports and files),
# so `npm test` never touches the demo data of `npm start`, and both can run at once.
export NODE_ENV=production
# TEST_PORT_OFFSET shifts every port, so two checkouts on one machine can run their tests at once.
o=${TEST_PORT_OFFSET:-0}
export DB_DIR=.data/test/mariadb
export DATABASE_HOST=127.0.0.1
export DATABASE_PORT=$((3317 + o))
export DATABASE_NAME=throwline_test
export DATABASE_USER=throwline_test
export DATABASE_PASSWORD=throwline-test-only
export AUTH_SECRET=test-only-secret-not-used-anywhere-else-0123456789
export AUTH_TRUST_HOST=true
export DEMO_PASSWORD=throwline-demo
export HOST=127.0.0.1
export PORT=$((3100 + o))
export ORIGIN=http://127.0.0.1:$PORT
export SMTP_HOST=127.0.0.1
export SMTP_PORT=$((2626 + o))
export MAIL_FROM="Kestrel Yard Audio <hire@kestrel-yard.test>"
export MAIL_DIR=.data/test/mail
export SMTP_HTTP_PORT=$((2680 + o))
export STRIPE_SECRET_KEY=sk_test_throwline_test_only
export STRIPE_API_HOST=127.0.0.1
export STRIPE_API_PORT=$((12211 + o))
export STRIPE_WEBHOOK_SECRET=whsec_throwline_test_only
export STRIPE_WEBHOOK_URL=http://127.0.0.1:$PORT/api/webhooks/stripe
export STRIPE_ACCOUNT_NAME="Throwline test hire company"
export UPLOAD_DIR=.data/test/uploads
export RUN_DIR=.data/test/run
export BUILD_DIR=.data/test/build
export BODY_SIZE_LIMIT=11M
# The cluster test world (scripts/test-cluster.sh): two app processes behind nginx on $PORT.
export CLUSTER_APP_PORTS="$((3150 + o)) $((3151 + o))"
