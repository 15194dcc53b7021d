#!/usr/bin/env bash
# A private development stack: `bash src/ops/dev-stack.sh NAME APP_PORT PG_PORT SMTP_PORT [build]`
# starts its own PostgreSQL cluster (.data/NAME), applies migrations, starts
# the mail catcher and `next dev` (or, with `build`, a production build and
# `next start`) with its own build folder (.next-NAME). Prints the env to use
# for tests against it. Ctrl-C / SIGTERM stops it all.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
NAME="${1:?name}"; APP_PORT="${2:?app port}"; PG_PORT="${3:?pg port}"; SMTP_PORT="${4:?smtp port}"; MODE="${5:-dev}"
ensure_node_modules
ensure_postgres
PG_DIR="$(cluster_dir "$NAME")"
start_cluster "$PG_DIR" "$PG_PORT"
ensure_database "$PG_PORT" heterolane
# As in the test command (src/ops/lib.sh).
export_test_app_env "postgres://postgres@127.0.0.1:$PG_PORT/heterolane" \
  "dev-secret-$NAME-0123456789abcdef0123456789" "$APP_PORT" "$SMTP_PORT"
export NEXT_DIST_DIR=".next-$NAME"
node_modules/.bin/tsx db/migrate.ts
pids=()
cleanup() { trap - INT TERM EXIT; for p in "${pids[@]}"; do kill -TERM -- "-$p" 2>/dev/null || kill -TERM "$p" 2>/dev/null || true; done; wait 2>/dev/null; stop_cluster "$PG_DIR"; }
trap cleanup INT TERM EXIT
set -m
node_modules/.bin/tsx src/ops/fake-smtp.ts --port "$SMTP_PORT" &
pids+=($!)
if [ "$MODE" = build ]; then
  node_modules/.bin/next build && node_modules/.bin/next start -p "$APP_PORT" &
else
  node_modules/.bin/next dev -p "$APP_PORT" &
fi
pids+=($!)
set +m
cat <<TXT
[dev-stack $NAME] for tests against this stack:
  export DATABASE_URL=$DATABASE_URL HETEROLANE_TEST_URL=http://localhost:$APP_PORT
TXT
wait
