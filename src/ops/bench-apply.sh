#!/usr/bin/env bash
# `npm run bench:apply`: the channel-list apply benchmark (src/bench/apply.ts).
# Uses DATABASE_URL when set (migrated; the bench adds its own team and
# mission, named as bench data); otherwise starts a throwaway PostgreSQL
# cluster on a free loopback port, migrates it, runs the bench and removes it.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
# The server modules validate their environment on load; the bench sends no mail and signs no one in.
export BETTER_AUTH_SECRET="${BETTER_AUTH_SECRET:-bench-secret-0123456789abcdef0123456789abcdef}"
export BETTER_AUTH_URL="${BETTER_AUTH_URL:-http://localhost:3000}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:2525}"
export MAIL_FROM="${MAIL_FROM:-Heterolane bench <no-reply@heterolane.local>}"
if [ -n "${DATABASE_URL:-}" ]; then
  exec node_modules/.bin/tsx src/bench/apply.ts
fi
ensure_postgres
PORT="$(node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")"
DIR="$(cluster_dir "bench-apply-$$")"
cleanup() { stop_cluster "$DIR"; rm -rf "$DIR"; }
trap cleanup INT TERM EXIT
start_cluster "$DIR" "$PORT"
ensure_database "$PORT" heterolane_bench
export DATABASE_URL="postgres://postgres@127.0.0.1:$PORT/heterolane_bench"
node_modules/.bin/tsx db/migrate.ts >/dev/null
node_modules/.bin/tsx src/bench/apply.ts
