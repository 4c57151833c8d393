#!/usr/bin/env bash
# npm run dev: the same set-up as npm start, then the hot-reloading dev server.
source "$(dirname "$0")/common.sh"
prepare_app
node_modules/.bin/next dev -p "$PORT" -H "$BIND_HOST"
