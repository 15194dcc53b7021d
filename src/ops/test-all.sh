#!/usr/bin/env bash
# The test command (`npm test`): installs what is missing, starts a throwaway
# PostgreSQL cluster, then runs typecheck, lint, unit and property tests, a
# production build, integration tests over HTTP against the real database and
# end-to-end tests in Debian's Chromium. Prints `N passed, N failed` last.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
set +e

OUT="$ROOT/test-output"
rm -rf "$OUT"; mkdir -p "$OUT"
export HETEROLANE_TEST_OUTPUT="$OUT"

ensure_node_modules || exit 1
ensure_postgres || exit 1
ensure_chromium || exit 1

free_port() { node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"; }
PG_PORT="${HETEROLANE_TEST_PG_PORT:-$(free_port)}"
APP_PORT="${HETEROLANE_TEST_APP_PORT:-$(free_port)}"
SMTP_PORT="${HETEROLANE_TEST_SMTP_PORT:-$(free_port)}"
PG_DIR="$(cluster_dir "test-pg-$$")"

pids=()
FAULT_PG_DIR="$(cluster_dir "test-fault-pg-$$")"
cleanup() {
  trap - INT TERM EXIT
  for p in "${pids[@]}"; do kill -TERM -- "-$p" 2>/dev/null || kill -TERM "$p" 2>/dev/null || true; done
  wait 2>/dev/null
  stop_cluster "$PG_DIR"
  rm -rf "$PG_DIR"
  stop_cluster "$FAULT_PG_DIR"
  rm -rf "$FAULT_PG_DIR"
}
trap cleanup INT TERM EXIT

set -e
start_cluster "$PG_DIR" "$PG_PORT"
ensure_database "$PG_PORT" heterolane_test
set +e

# The test client plays the part of one reverse proxy: the app believes the
# last X-Forwarded-For entry (tests name client addresses that way); one
# process below runs without a trusted proxy (HETEROLANE_RATE_LIMIT_DIRECT_URL).
export_test_app_env "postgres://postgres@127.0.0.1:$PG_PORT/heterolane_test" \
  "test-secret-$(node -e "console.log(require('crypto').randomBytes(16).toString('hex'))")" "$APP_PORT" "$SMTP_PORT"
export HETEROLANE_TEST_URL="http://localhost:$APP_PORT"

passed=0; failed=0; skipped=0
declare -a summary

step() { # step NAME COMMAND...: a check that counts as one test
  local name="$1"; shift
  log "== $name"
  if "$@" >"$OUT/$name.log" 2>&1; then
    passed=$((passed + 1)); summary+=("ok    $name")
  else
    failed=$((failed + 1)); summary+=("FAIL  $name (see test-output/$name.log)")
    tail -n 40 "$OUT/$name.log" >&2
  fi
}

suite() { # suite PROJECT: a vitest project, counted test by test
  local project="$1" json="$OUT/vitest-$1.json"
  log "== vitest --project $project"
  node_modules/.bin/vitest run --project "$project" --reporter=default --reporter=json --outputFile.json="$json" 2>&1 | tee "$OUT/vitest-$project.log" | grep -E '✓|×|FAIL|Test Files|Tests ' | grep -v '✓' || true
  local counts
  counts=$(node -e "
    try { const r = require('$json');
      console.log(r.numPassedTests, r.numFailedTests + (r.numTotalTestSuites && !r.success && r.numFailedTests === 0 ? 1 : 0), r.numPendingTests + r.numTodoTests);
    } catch { console.log('0 1 0'); }")
  read -r p f s <<<"$counts"
  passed=$((passed + p)); failed=$((failed + f)); skipped=$((skipped + s))
  summary+=("$( [ "$f" -eq 0 ] && echo 'ok  ' || echo 'FAIL') vitest:$project $p passed, $f failed")
}

step migrate node_modules/.bin/tsx db/migrate.ts
step typecheck node_modules/.bin/tsc --noEmit
step lint node_modules/.bin/eslint --max-warnings=0 .
step format node_modules/.bin/prettier --check .
suite unit
step build ensure_build

if [ -f .next/BUILD_ID ]; then
  set -m
  node_modules/.bin/tsx src/ops/fake-smtp.ts --port "$SMTP_PORT" >"$OUT/smtp.log" 2>&1 &
  pids+=($!)
  node_modules/.bin/next start -p "$APP_PORT" >"$OUT/app.log" 2>&1 &
  pids+=($!)
  # Two more app processes on the same database with rate limiting on, as if
  # behind one trusted proxy (X-Forwarded-For plays the proxy's entry): the
  # limits are kept in PostgreSQL, so they hold across processes (tested in
  # tests/integration/auth-rate-limit.test.ts and hardening-rate-limit.test.ts).
  RL_PORT_A="$(free_port)"; RL_PORT_B="$(free_port)"; RL_PORT_C="$(free_port)"
  for port in "$RL_PORT_A" "$RL_PORT_B"; do
    HETEROLANE_AUTH_RATE_LIMIT=on HETEROLANE_TRUSTED_PROXY_HOPS=1 BETTER_AUTH_URL="http://localhost:$RL_PORT_A" \
      node_modules/.bin/next start -p "$port" >"$OUT/app-rate-limit-$port.log" 2>&1 &
    pids+=($!)
  done
  # And one with rate limiting on and no trusted proxy: the client is the socket address.
  HETEROLANE_AUTH_RATE_LIMIT=on HETEROLANE_TRUSTED_PROXY_HOPS=0 BETTER_AUTH_URL="http://localhost:$RL_PORT_C" \
    node_modules/.bin/next start -p "$RL_PORT_C" >"$OUT/app-rate-limit-$RL_PORT_C.log" 2>&1 &
  pids+=($!)
  export HETEROLANE_RATE_LIMIT_URLS="http://localhost:$RL_PORT_A,http://localhost:$RL_PORT_B"
  export HETEROLANE_RATE_LIMIT_ORIGIN="http://localhost:$RL_PORT_A"
  export HETEROLANE_RATE_LIMIT_DIRECT_URL="http://localhost:$RL_PORT_C"
  # The fault test's own cluster and app process: the test stops and starts
  # this cluster (src/ops/fault-db.sh) while it loads the app, so no other
  # test sees the outage (tests/integration/fault-database.test.ts).
  FAULT_PG_PORT="$(free_port)"; FAULT_APP_PORT="$(free_port)"
  if start_cluster "$FAULT_PG_DIR" "$FAULT_PG_PORT" && ensure_database "$FAULT_PG_PORT" heterolane_fault &&
    DATABASE_URL="postgres://postgres@127.0.0.1:$FAULT_PG_PORT/heterolane_fault" node_modules/.bin/tsx db/migrate.ts >"$OUT/fault-migrate.log" 2>&1; then
    DATABASE_URL="postgres://postgres@127.0.0.1:$FAULT_PG_PORT/heterolane_fault" DATABASE_POOL_MAX=4 \
      BETTER_AUTH_URL="http://localhost:$FAULT_APP_PORT" \
      node_modules/.bin/next start -p "$FAULT_APP_PORT" >"$OUT/app-fault.log" 2>&1 &
    pids+=($!)
    export HETEROLANE_FAULT_URL="http://localhost:$FAULT_APP_PORT"
    export HETEROLANE_FAULT_DATABASE_URL="postgres://postgres@127.0.0.1:$FAULT_PG_PORT/heterolane_fault"
    export HETEROLANE_FAULT_PG_DIR="$FAULT_PG_DIR" HETEROLANE_FAULT_PG_PORT="$FAULT_PG_PORT"
  else
    log "the fault test's cluster did not start; the fault test is skipped (see test-output/fault-migrate.log)"
  fi
  set +m
  for port in "$RL_PORT_A" "$RL_PORT_B" "$RL_PORT_C" ${FAULT_APP_PORT:+"$FAULT_APP_PORT"}; do
    wait_http "http://127.0.0.1:$port/api/health" 90 ||
      log "a rate-limited app process did not start; see test-output/app-rate-limit-$port.log"
  done
  if wait_http "http://127.0.0.1:$APP_PORT/api/health" 90; then
    suite integration
    suite e2e
  else
    log "the app did not start; see test-output/app.log"
    tail -n 40 "$OUT/app.log" >&2
    failed=$((failed + 2)); summary+=("FAIL  app did not start: integration and e2e not run")
  fi
fi

echo
printf '%s\n' "${summary[@]}"
echo
if [ "$skipped" -gt 0 ]; then
  echo "$passed passed, $failed failed, $skipped skipped"
else
  echo "$passed passed, $failed failed"
fi
[ "$failed" -eq 0 ]
