#!/usr/bin/env bash
# `npm run bench:apply`: the channel-list apply benchmark (src/bench/apply.ts).
# Uses DATABASE_URL when set (migrated; the bench adds its own team and
# mission, named as bench data); otherwise starts a throwaway PostgreSQL
# cluster on a free loopback port, migrates it, runs the bench and removes it.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
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
