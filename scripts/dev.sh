#!/usr/bin/env bash
# npm run dev: the same set-up as npm start, then the hot-reloading dev server.
source "$(dirname "$0")/common.sh"
export PORT="${PORT:-3000}"
export DATABASE_URL="${DATABASE_URL:-postgres://$PGUSER@127.0.0.1:$PGPORT/loopwright}"
export SMTP_PORT="${SMTP_PORT:-1025}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}" S3_PORT="${S3_PORT:-4569}"
ensure_node_modules
ensure_postgres
ensure_database loopwright
migrate_and_seed
start_services
trap stop_started EXIT
node_modules/.bin/next dev -p "$PORT"
