#!/usr/bin/env bash
# npm start: install, database, migrations, demo seed, build, services, then serve on :3000.
source "$(dirname "$0")/common.sh"
export PORT="${PORT:-3000}"
export DATABASE_URL="${DATABASE_URL:-postgres://$PGUSER@127.0.0.1:$PGPORT/loopwright}"
export SMTP_PORT="${SMTP_PORT:-1025}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}" S3_PORT="${S3_PORT:-4569}"
export MAIL_WEB_URL="${MAIL_WEB_URL:-http://127.0.0.1:$MAIL_WEB_PORT}" S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$S3_PORT}"
export APP_URL="${APP_URL:-http://localhost:$PORT}"

ensure_node_modules
ensure_postgres
ensure_database loopwright
migrate_and_seed
start_services
trap stop_started EXIT
build_if_stale
if (exec 3<>/dev/tcp/127.0.0.1/"$PORT") 2>/dev/null; then
  fail "Port $PORT is taken, so the app cannot start." "Stop the other program or run: PORT=3001 npm start"
fi
npx tsx scripts/print-demo.ts
node_modules/.bin/next start -p "$PORT" -H 0.0.0.0
