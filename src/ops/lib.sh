#!/usr/bin/env bash
# Shared helpers for the start (demo) and test commands. Sourced, not run.
# Everything a fresh Debian machine lacks is installed here: npm packages,
# PostgreSQL from Debian's packages, and (for tests) Debian's Chromium.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
export PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1
export NEXT_TELEMETRY_DISABLED=1

log() { printf '\033[1m[heterolane]\033[0m %s\n' "$*" >&2; }

as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi
}

apt_updated=0
apt_install() {
  if [ "$apt_updated" -eq 0 ]; then
    log "apt-get update"
    as_root apt-get update -qq >/dev/null
    apt_updated=1
  fi
  log "installing Debian packages: $*"
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
    log "installing npm dependencies (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  fi
}

pg_bindir() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [ -n "$d" ] && [ -x "$d/initdb" ] && echo "$d"
}

ensure_postgres() {
  if [ -z "$(pg_bindir)" ]; then
    apt_install postgresql
  fi
  PGBIN="$(pg_bindir)"
  if [ -z "$PGBIN" ]; then
    log "PostgreSQL binaries not found after install"; exit 1
  fi
  export PGBIN
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    apt_install chromium
  fi
}

# Runs a command as the postgres user when we are root (PostgreSQL refuses to
# run as root), as ourselves otherwise.
pg_run() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# The cluster lives in the project (git-ignored .data/). When the postgres
# user cannot reach the project folder (a checkout under a private home, say)
# it falls back to a folder under /var/tmp named after the project path.
cluster_dir() {
  local name="$1"
  local dir="$ROOT/.data/$name"
  mkdir -p "$ROOT/.data"
  if [ "$(id -u)" -eq 0 ] && ! runuser -u postgres -- test -x "$ROOT/.data"; then
    dir="/var/tmp/heterolane-$(echo "$ROOT" | md5sum | cut -c1-8)/$name"
    log "postgres cannot enter $ROOT; keeping the cluster in $dir"
  fi
  echo "$dir"
}

# start_cluster DIR PORT: initialise (first time) and start a cluster that
# listens on 127.0.0.1:PORT only, with its socket inside DIR.
start_cluster() {
  local dir="$1" port="$2"
  mkdir -p "$dir"
  if [ "$(id -u)" -eq 0 ]; then chown postgres:postgres "$dir"; fi
  chmod 700 "$dir"
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    log "initialising PostgreSQL cluster in $dir"
    pg_run mkdir -p "$dir/data" "$dir/sock"
    pg_run chmod 700 "$dir/data"
    pg_run "$PGBIN/initdb" -D "$dir/data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  pg_run mkdir -p "$dir/sock"
  if pg_run "$PGBIN/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then
    log "PostgreSQL already running in $dir"
  else
    log "starting PostgreSQL on 127.0.0.1:$port"
    pg_run "$PGBIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" \
      -o "-p $port -k $dir/sock -c listen_addresses=127.0.0.1" -w -t 60 start >/dev/null
  fi
}

stop_cluster() {
  local dir="$1"
  if [ -f "$dir/data/postmaster.pid" ]; then
    pg_run "$PGBIN/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
  fi
}

# ensure_database PORT NAME
ensure_database() {
  local port="$1" name="$2"
  if ! psql_cmd "$port" postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    psql_cmd "$port" postgres -c "create database \"$name\"" >/dev/null
  fi
}

psql_cmd() {
  local port="$1" dbname="$2"; shift 2
  "$PGBIN/psql" -h 127.0.0.1 -p "$port" -U postgres -d "$dbname" -v ON_ERROR_STOP=1 "$@"
}

# wait_http URL SECONDS
# (Node's fetch rather than curl: a fresh machine need not have curl.)
wait_http() {
  node -e '
    const [url, secs] = [process.argv[1], Number(process.argv[2])];
    const until = Date.now() + secs * 1000;
    (async function poll() {
      try { const r = await fetch(url); if (r.ok) process.exit(0); } catch {}
      if (Date.now() > until) process.exit(1);
      setTimeout(poll, 250);
    })();' "$1" "$2"
}

# Builds the app unless a build newer than every source file exists.
ensure_build() {
  local id="$ROOT/.next/BUILD_ID"
  if [ -f "$id" ] && [ -z "$(cd "$ROOT" && find app src db public next.config.mjs tailwind.config.ts package-lock.json -newer "$id" -type f -print -quit 2>/dev/null)" ]; then
    log "production build is up to date"
  else
    log "building the app (next build)"
    (cd "$ROOT" && node_modules/.bin/next build >"$ROOT/.data/build.log" 2>&1) || { tail -n 60 "$ROOT/.data/build.log" >&2; return 1; }
  fi
}

# export_test_app_env DATABASE_URL SECRET APP_PORT SMTP_PORT: the environment of
# an app under development or test: its database, auth secret and address, the
# mail catcher, the development routes, no auth rate limit, and one trusted proxy
# (the test client names client addresses in X-Forwarded-For).
export_test_app_env() {
  export DATABASE_URL="$1"
  export BETTER_AUTH_SECRET="$2"
  export BETTER_AUTH_URL="http://localhost:$3"
  export SMTP_URL="smtp://127.0.0.1:$4"
  export MAIL_FROM="Heterolane <no-reply@heterolane.local>"
  export HETEROLANE_DEV_ROUTES=1
  export HETEROLANE_AUTH_RATE_LIMIT=off
  export HETEROLANE_TRUSTED_PROXY_HOPS=1
}
