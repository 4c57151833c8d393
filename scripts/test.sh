#!/usr/bin/env bash
# npm test: the same set-up as npm start against a separate test database, then every
# suite (vitest unit + integration, Playwright in Debian's chromium), then one closing line.
source "$(dirname "$0")/common.sh"
export DATABASE_URL="postgres://$PGUSER@127.0.0.1:$PGPORT/loopwright_test"
export SMTP_PORT="${TEST_SMTP_PORT:-1026}" MAIL_WEB_PORT="${TEST_MAIL_WEB_PORT:-1081}" S3_PORT="${TEST_S3_PORT:-4570}"
export MAIL_WEB_URL="http://127.0.0.1:$MAIL_WEB_PORT" S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
export E2E_PORT="${E2E_PORT:-3100}" APP_URL="http://localhost:${E2E_PORT:-3100}"
export CHROMIUM_PATH="${CHROMIUM_PATH:-/usr/bin/chromium}"
# the browser tests use the demo sign-ins; the caught-mail page is tested too (both loopback only)
demo_features

ensure_node_modules
[ -x "$CHROMIUM_PATH" ] || apt_install chromium
ensure_postgres
recreate_database loopwright_test
migrate_and_seed
start_services
cleanup() { stop_started; if [ "${PG_STARTED_HERE:-}" = 1 ]; then pg_run "$PGBIN/pg_ctl" -D "$PGDATA_DIR" stop -m fast >/dev/null 2>&1 || true; fi; }
trap cleanup EXIT
build_if_stale
rm -f .run/vitest.json .run/playwright.json

step "Unit and integration tests (vitest)"
npx vitest run --reporter=default --reporter=json --outputFile.json=.run/vitest.json || true
step "Browser tests (Playwright, Debian chromium)"
npx playwright test || true
npx tsx scripts/test-totals.ts --expect-vitest --expect-playwright
