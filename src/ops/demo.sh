#!/usr/bin/env bash
# The start command (`npm run demo`): PostgreSQL on loopback, migrations,
# demo data, the local mail catcher and the production app on port 3000.
# Ctrl-C stops everything it started; the data stays in .data/ for next time.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

APP_PORT="${PORT:-3000}"
PG_PORT="${HETEROLANE_PG_PORT:-54329}"
SMTP_PORT="${HETEROLANE_SMTP_PORT:-2525}"

ensure_node_modules
ensure_postgres
PG_DIR="$(cluster_dir pg)"
start_cluster "$PG_DIR" "$PG_PORT"

pids=()
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  for p in "${pids[@]}"; do kill -TERM -- "-$p" 2>/dev/null || kill -TERM "$p" 2>/dev/null || true; done
  wait 2>/dev/null || true
  stop_cluster "$PG_DIR"
  log "stopped (data kept in $PG_DIR)"
}
trap cleanup INT TERM EXIT

ensure_database "$PG_PORT" heterolane
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/heterolane"
if [ ! -f .data/auth-secret ]; then
  node -e "console.log(require('crypto').randomBytes(32).toString('base64url'))" > .data/auth-secret
fi
export BETTER_AUTH_SECRET="${BETTER_AUTH_SECRET:-$(cat .data/auth-secret)}"
export BETTER_AUTH_URL="${BETTER_AUTH_URL:-http://localhost:$APP_PORT}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:$SMTP_PORT}"
export MAIL_FROM="${MAIL_FROM:-Heterolane <no-reply@heterolane.local>}"
export HETEROLANE_DEV_ROUTES="${HETEROLANE_DEV_ROUTES:-${HETEROLANE_DEV_MAIL:-1}}"

node_modules/.bin/tsx db/migrate.ts
# The mail catcher first: the seed submits a demo revision for review, which mails the reviewers.
set -m
node_modules/.bin/tsx src/ops/fake-smtp.ts --port "$SMTP_PORT" &
pids+=($!)
set +m
for _ in $(seq 1 50); do (exec 3<>"/dev/tcp/127.0.0.1/$SMTP_PORT") 2>/dev/null && break; sleep 0.2; done
node_modules/.bin/tsx src/server/seed/run.ts
ensure_build

set -m
node_modules/.bin/next start -p "$APP_PORT" &
pids+=($!)
set +m

if wait_http "http://127.0.0.1:$APP_PORT/api/health" 60; then
  cat <<TXT

  Heterolane is running (demo data) at http://localhost:$APP_PORT
  Captured e-mail (dev only):          http://localhost:$APP_PORT/dev/mail
  PostgreSQL:                          127.0.0.1:$PG_PORT (database heterolane, data in $PG_DIR)
  Local mail catcher (SMTP):           127.0.0.1:$SMTP_PORT

  Demo accounts (password for all: demo-password-2026)
    owner     olga.owner@demo.heterolane.local
    lead      liam.lead@demo.heterolane.local
    engineer  erin.engineer@demo.heterolane.local
    viewer    victor.viewer@demo.heterolane.local

  Press Ctrl-C to stop.
TXT
else
  log "the app did not answer on port $APP_PORT; see the output above"
fi
wait -n "${pids[@]}" || true
