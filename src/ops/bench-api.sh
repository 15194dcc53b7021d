#!/usr/bin/env bash
# `npm run bench:api`: the HTTP API under load (src/bench/api.ts).
# With HETEROLANE_BENCH_URL set, runs against that app (a production build
# holding the demo seed, e.g. `npm run demo`). Otherwise starts its own:
# a throwaway PostgreSQL cluster on a free loopback port (migrated and
# seeded with the demo data), the production build (`next build` when the
# sources are newer than it) served by `next start` on a free port, runs the
# bench and removes it all. HETEROLANE_BENCH_DIST=<folder> serves that build
# folder instead, as it is (e.g. a copy of an earlier build, to measure the
# code before and after a change alternately on a shared machine).
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
if [ -n "${HETEROLANE_BENCH_URL:-}" ]; then
  exec node_modules/.bin/tsx src/bench/api.ts
fi
ensure_postgres
free_port() { node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"; }
PG_PORT="$(free_port)"
APP_PORT="$(free_port)"
DIR="$(cluster_dir "bench-api-$$")"
APP_PID=""
cleanup() {
  trap - INT TERM EXIT
  if [ -n "$APP_PID" ]; then kill -TERM -- "-$APP_PID" 2>/dev/null || kill -TERM "$APP_PID" 2>/dev/null || true; fi
  wait 2>/dev/null
  stop_cluster "$DIR"
  rm -rf "$DIR"
}
trap cleanup INT TERM EXIT
start_cluster "$DIR" "$PG_PORT"
ensure_database "$PG_PORT" heterolane_bench
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/heterolane_bench"
export BETTER_AUTH_SECRET="bench-secret-$(node -e "console.log(require('crypto').randomBytes(16).toString('hex'))")"
export BETTER_AUTH_URL="http://localhost:$APP_PORT"
# Nothing is mailed: the demo people are verified by the seed. The address only has to be well formed.
export SMTP_URL="smtp://127.0.0.1:9"
export MAIL_FROM="Heterolane bench <no-reply@heterolane.local>"
# The bench signs in eight sessions in a few seconds; the sign-in limits are not what it measures.
export HETEROLANE_AUTH_RATE_LIMIT=off
node_modules/.bin/tsx db/migrate.ts >/dev/null
node_modules/.bin/tsx src/server/seed/run.ts >/dev/null
if [ -n "${HETEROLANE_BENCH_DIST:-}" ]; then
  [ -f "$HETEROLANE_BENCH_DIST/BUILD_ID" ] || { log "no build in $HETEROLANE_BENCH_DIST"; exit 1; }
  export NEXT_DIST_DIR="$HETEROLANE_BENCH_DIST"
  log "serving the build in $HETEROLANE_BENCH_DIST"
else
  ensure_build
fi
set -m
node_modules/.bin/next start -p "$APP_PORT" >"$DIR/app.log" 2>&1 &
APP_PID=$!
set +m
if ! wait_http "http://127.0.0.1:$APP_PORT/api/health" 90; then
  log "the app did not start:"; tail -n 40 "$DIR/app.log" >&2; exit 1
fi
HETEROLANE_BENCH_URL="http://localhost:$APP_PORT" node_modules/.bin/tsx src/bench/api.ts
