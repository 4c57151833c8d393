#!/usr/bin/env bash
# npm start: install, database, migrations, demo seed, build, services, then serve on :3000.
source "$(dirname "$0")/common.sh"
prepare_app
if (exec 3<>/dev/tcp/127.0.0.1/"$PORT") 2>/dev/null; then
  fail "Port $PORT is taken, so the app cannot start." "Stop the other program or run: PORT=3001 npm start"
fi
build_if_stale
if [ "$DEMO_SIGN_IN" = true ]; then npx tsx scripts/print-demo.ts; fi
if [ "$BIND_HOST" = 127.0.0.1 ]; then step "Listening on 127.0.0.1 only, as demo sign-in or the caught-mail page is on"; fi
node_modules/.bin/next start -p "$PORT" -H "$BIND_HOST"
