# Shared set-up steps for scripts/start.sh and scripts/test.sh. Sourced, not run.
# Every step says what went wrong and how to fix it, and exits non-zero.
set -euo pipefail
export NEXT_TELEMETRY_DISABLED=1
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
mkdir -p .run
[ -f .env ] && set -a && . ./.env && set +a

PGBIN="${PGBIN:-/usr/lib/postgresql/15/bin}"
export PGPORT="${PGPORT:-54329}"
export PGHOST=127.0.0.1
export PGUSER="${PGUSER:-app}"

step() { printf '\033[38;5;130m▸\033[0m %s\n' "$*"; }
fail() { printf '\n\033[31m✗ %s\033[0m\n' "$1" >&2; shift; for l in "$@"; do printf '  %s\n' "$l" >&2; done; exit 1; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; elif sudo -n true 2>/dev/null; then sudo -n "$@"; else return 99; fi; }

apt_install() {
  step "Installing from Debian's packages: $*"
  if ! as_root true 2>/dev/null; then
    fail "Cannot install $* : this user has no apt rights." \
      "Install it once as root:  sudo apt-get update && sudo apt-get install -y $*" "then run this command again."
  fi
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null || fail "apt-get update failed." "Check the package mirror is reachable, then retry."
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >.run/apt.log 2>&1 \
    || fail "apt-get install $* failed (log: .run/apt.log)." "Fix the problem shown in the log, then retry."
}

ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    step "Installing dependencies (npm ci from the committed lock)"
    npm ci --no-audit --no-fund --loglevel=error || fail "npm ci failed." "Check the npm registry is reachable and package-lock.json is committed."
  fi
}

# PostgreSQL 15 from Debian, in a cluster of our own inside the project (or /tmp when the
# postgres user cannot enter the project folder), on 127.0.0.1:$PGPORT.
pg_paths() {
  PGDATA_DIR="$ROOT/.pgdata"; PGSOCK_DIR="$ROOT/.pgsock"
  if [ -f .run/pg-fallback ] || [ ${#PGSOCK_DIR} -gt 90 ]; then
    local base="/tmp/loopwright-pg-$(printf '%s' "$ROOT" | cksum | cut -d' ' -f1)"
    PGDATA_DIR="$base/data"; PGSOCK_DIR="$base/sock"
  fi
}

pg_run() { # run a PostgreSQL binary as a user it accepts
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

ensure_postgres() {
  [ -x "$PGBIN/initdb" ] || apt_install postgresql-15 postgresql-contrib
  [ -x "$PGBIN/initdb" ] || fail "PostgreSQL binaries not found in $PGBIN after install." "Set PGBIN to the folder holding initdb and pg_ctl."
  if [ "$(id -u)" = 0 ] && ! id postgres >/dev/null 2>&1; then useradd --system --home /var/lib/postgresql --shell /bin/bash postgres; fi
  pg_paths
  mkdir -p "$PGDATA_DIR" "$PGSOCK_DIR"
  if [ "$(id -u)" = 0 ]; then
    chown postgres "$PGDATA_DIR" "$PGSOCK_DIR"; chmod 700 "$PGDATA_DIR"
    if ! runuser -u postgres -- test -w "$PGDATA_DIR"; then
      touch .run/pg-fallback; pg_paths; mkdir -p "$PGDATA_DIR" "$PGSOCK_DIR"; chown postgres "$PGDATA_DIR" "$PGSOCK_DIR"; chmod 700 "$PGDATA_DIR"
    fi
  fi
  if [ ! -f "$PGDATA_DIR/PG_VERSION" ]; then
    step "Creating a PostgreSQL cluster in $PGDATA_DIR"
    pg_run "$PGBIN/initdb" -D "$PGDATA_DIR" -U "$PGUSER" --auth=trust -E UTF8 --no-locale >.run/initdb.log 2>&1 \
      || fail "initdb failed (log: .run/initdb.log)." "Delete $PGDATA_DIR and retry."
  fi
  if pg_run "$PGBIN/pg_ctl" -D "$PGDATA_DIR" status >/dev/null 2>&1; then
    step "PostgreSQL already running on 127.0.0.1:$PGPORT"
  else
    if (exec 3<>/dev/tcp/127.0.0.1/"$PGPORT") 2>/dev/null; then
      fail "Port $PGPORT on 127.0.0.1 is taken by another program, so Loopwright's PostgreSQL cannot start." \
        "Stop that program, or choose a free port: echo PGPORT=54339 >> .env (and update DATABASE_URL there too)."
    fi
    step "Starting PostgreSQL on 127.0.0.1:$PGPORT"
    pg_run "$PGBIN/pg_ctl" -D "$PGDATA_DIR" -l "$PGDATA_DIR/server.log" -w -t 30 \
      -o "-p $PGPORT -k $PGSOCK_DIR -c listen_addresses=127.0.0.1" start >/dev/null \
      || fail "PostgreSQL did not start (log: $PGDATA_DIR/server.log)." "Read the log; a stale postmaster.pid can be removed when no postgres runs."
    PG_STARTED_HERE=1
  fi
}

ensure_database() { # $1 = database name
  if ! pg_run "$PGBIN/psql" -h 127.0.0.1 -p "$PGPORT" -U "$PGUSER" -d postgres -tAc "select 1 from pg_database where datname='$1'" | grep -q 1; then
    pg_run "$PGBIN/createdb" -h 127.0.0.1 -p "$PGPORT" -U "$PGUSER" "$1" || fail "Could not create database $1."
  fi
}

recreate_database() { # $1 = database name (tests start from a clean one)
  pg_run "$PGBIN/dropdb" --if-exists --force -h 127.0.0.1 -p "$PGPORT" -U "$PGUSER" "$1" >/dev/null
  ensure_database "$1"
}

migrate_and_seed() {
  step "Migrating and seeding $DATABASE_URL"
  npx tsx scripts/db-migrate.ts || fail "A database migration failed (see the message above)." \
    "Fix the migration in db/migrations, or for a throw-away local database: rm -rf .pgdata and start again."
  if [ "${DEMO_SIGN_IN:-}" = true ]; then
    npx tsx scripts/db-seed.ts || fail "Seeding the demo data failed (see the message above)."
  else
    step "Demo people and projects not seeded (DEMO_SIGN_IN is not true): their passwords are published in the README"
  fi
}

# Demo sign-in and the caught-mail page hand out accounts and reset links: local use only.
# npm start / npm test / npm run dev turn them on unless .env says otherwise, and refuse to
# run with them on when APP_URL is not on this machine.
is_loopback_url() {
  local host
  host="$(printf '%s' "$1" | sed -E 's#^[A-Za-z][A-Za-z0-9+.-]*://([^@/]*@)?(\[[^]]*\]|[^/:?#]*).*$#\2#' | tr 'A-Z' 'a-z')"
  case "$host" in
    localhost|*.localhost|"[::1]") return 0 ;;
  esac
  [[ "$host" =~ ^127\.[0-9]+\.[0-9]+\.[0-9]+$ ]]
}

demo_features() {
  export DEMO_SIGN_IN="${DEMO_SIGN_IN:-true}" MAIL_VIEWER="${MAIL_VIEWER:-true}"
  if { [ "$DEMO_SIGN_IN" = true ] || [ "$MAIL_VIEWER" = true ]; } && ! is_loopback_url "$APP_URL"; then
    fail "Refusing to start: demo sign-in (DEMO_SIGN_IN=$DEMO_SIGN_IN) or the caught-mail page (MAIL_VIEWER=$MAIL_VIEWER) is on, and APP_URL=$APP_URL is not on this machine." \
      "Anyone who can reach that address could sign in as the demo owner or read password-reset links." \
      "For a server others reach, put these two lines in .env:  DEMO_SIGN_IN=false  and  MAIL_VIEWER=false" \
      "For local use, serve on loopback instead, e.g. APP_URL=http://localhost:${PORT:-3000}"
  fi
  # with either on, listen on loopback only, so the machine's other addresses do not serve them
  if [ "$DEMO_SIGN_IN" = true ] || [ "$MAIL_VIEWER" = true ]; then BIND_HOST=127.0.0.1; else BIND_HOST=0.0.0.0; fi
  export BIND_HOST
}

# Local stand-ins for hosted services: an SMTP catcher and a fake S3.
start_service() { # name port command...
  local name=$1 port=$2; shift 2
  if (exec 3<>/dev/tcp/127.0.0.1/"$port") 2>/dev/null; then return 0; fi
  nohup "$@" >".run/$name.log" 2>&1 &
  echo $! >".run/$name.pid"
  STARTED_PIDS+=("$!")
  for _ in $(seq 1 50); do (exec 3<>/dev/tcp/127.0.0.1/"$port") 2>/dev/null && return 0; sleep 0.2; done
  fail "$name did not start on port $port (log: .run/$name.log)." "Is the port taken? Set its port in .env."
}

start_services() {
  STARTED_PIDS=()
  mkdir -p .run/mail .run/s3
  start_service mail "$SMTP_PORT" node_modules/.bin/maildev --smtp "$SMTP_PORT" --web "$MAIL_WEB_PORT" --ip 127.0.0.1 --web-ip 127.0.0.1 --mail-directory .run/mail
  start_service s3 "$S3_PORT" node_modules/.bin/s3rver -d .run/s3 -a 127.0.0.1 -p "$S3_PORT" --silent --configure-bucket "${S3_BUCKET:-loopwright-uploads}" scripts/s3-cors.xml
}

stop_started() {
  for pid in "${STARTED_PIDS[@]:-}"; do [ -n "$pid" ] && kill "$pid" 2>/dev/null || true; done
}

build_if_stale() {
  if [ -f .next/BUILD_ID ] && [ -z "$(find app components lib db public proxy.ts package-lock.json next.config.mjs tailwind.config.ts -newer .next/BUILD_ID -print -quit 2>/dev/null)" ]; then
    step "Build is up to date"
  else
    step "Building the app (next build)"
    npx next build >.run/build.log 2>&1 || { tail -40 .run/build.log >&2; fail "next build failed (full log: .run/build.log)."; }
  fi
}

# The app's own environment and every set-up step before serving (npm start, npm run dev).
prepare_app() {
  export PORT="${PORT:-3000}"
  export DATABASE_URL="${DATABASE_URL:-postgres://$PGUSER@127.0.0.1:$PGPORT/loopwright}"
  export SMTP_PORT="${SMTP_PORT:-1025}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}" S3_PORT="${S3_PORT:-4569}"
  export MAIL_WEB_URL="${MAIL_WEB_URL:-http://127.0.0.1:$MAIL_WEB_PORT}" S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$S3_PORT}"
  export APP_URL="${APP_URL:-http://localhost:$PORT}"
  demo_features
  ensure_node_modules
  ensure_postgres
  ensure_database loopwright
  migrate_and_seed
  start_services
  trap stop_started EXIT
}
