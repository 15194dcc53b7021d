#!/usr/bin/env bash
# Stops or starts the PostgreSQL cluster of the fault test
# (tests/integration/fault-database.test.ts), which src/ops/test-all.sh
# creates for it alone: `bash src/ops/fault-db.sh stop|start DIR PORT`.
# `stop` is an immediate shutdown (as a crash: connections drop mid-query).
source "$(dirname "$0")/lib.sh"
ACTION="${1:?stop|start}"; DIR="${2:?cluster dir}"; PORT="${3:?port}"
ensure_postgres
case "$ACTION" in
  stop) pg_run "$PGBIN/pg_ctl" -D "$DIR/data" -m immediate -w -t 60 stop >/dev/null ;;
  start) start_cluster "$DIR" "$PORT" ;;
  *) log "unknown action $ACTION"; exit 2 ;;
esac
