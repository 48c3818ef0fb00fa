#!/usr/bin/env bash
# Shared set-up steps behind `npm start` and `npm test`: dependencies, PostgreSQL, fakes.
set -euo pipefail

ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
export ROOT
export TMPDIR="$ROOT/.tmp"
# The pinned AWS SDK runs on Node 20; its notice about future releases needing Node 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
mkdir -p "$TMPDIR" "$ROOT/.data"

log() { printf '\033[1m[feltwire]\033[0m %s\n' "$*" >&2; }

# npm ci when node_modules is absent or older than the lock file.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [ ! -d "$ROOT/node_modules" ] || [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
    log "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    touch "$stamp"
  fi
}

apt_install() {
  if [ "$(id -u)" != 0 ]; then
    log "missing system packages ($*); install them with: sudo apt-get install -y $*"
    return 1
  fi
  log "installing $* from Debian's packages"
  DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

pg_bindir() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  if [ -z "$dir" ] || [ ! -x "$dir/initdb" ]; then
    apt_install postgresql postgresql-contrib
    dir=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)
  fi
  echo "$dir"
}

# As root, PostgreSQL runs as the postgres user; elsewhere as the current user.
as_pg() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# A data directory the server's user can reach: under the project when it can, else /var/tmp.
pg_datadir() {
  local name=$1 dir="$ROOT/.data/$1"
  if [ "$(id -u)" = 0 ] && ! runuser -u postgres -- test -x "$ROOT/.data" 2>/dev/null; then
    dir="/var/tmp/feltwire-$(printf '%s' "$ROOT" | sha1sum | cut -c1-10)/$name"
  fi
  echo "$dir"
}

# start_postgres NAME PORT [test]: initialise on first use, start when not running.
start_postgres() {
  local name=$1 port=$2 mode=${3:-dev} bin dir sock
  bin=$(pg_bindir)
  dir=$(pg_datadir "$name")
  sock="$dir/sock"
  mkdir -p "$dir"
  if [ "$(id -u)" = 0 ]; then chown postgres:postgres "$dir"; chmod 700 "$dir"; fi
  if [ ! -f "$dir/db/PG_VERSION" ]; then
    log "creating a PostgreSQL cluster in $dir"
    as_pg "$bin/initdb" -D "$dir/db" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    as_pg mkdir -p "$sock"
    {
      echo "listen_addresses = '127.0.0.1'"
      echo "port = $port"
      echo "unix_socket_directories = '$sock'"
      echo "max_connections = 200"
      if [ "$mode" = test ]; then echo "fsync = off"; echo "synchronous_commit = off"; echo "full_page_writes = off"; fi
    } | as_pg tee -a "$dir/db/postgresql.conf" >/dev/null
  fi
  # A cluster left running on another port (an earlier run with other settings) is restarted on this one.
  if as_pg "$bin/pg_ctl" -D "$dir/db" status >/dev/null 2>&1 && [ "$(sed -n 4p "$dir/db/postmaster.pid" 2>/dev/null)" != "$port" ]; then
    as_pg "$bin/pg_ctl" -D "$dir/db" -m fast -w stop >/dev/null
  fi
  if ! as_pg "$bin/pg_ctl" -D "$dir/db" status >/dev/null 2>&1; then
    log "starting PostgreSQL on 127.0.0.1:$port"
    # The port is given at each start too: a cluster made for one port is reused for another.
    as_pg "$bin/pg_ctl" -D "$dir/db" -l "$dir/server.log" -o "-p $port" -w -t 60 start >/dev/null
  fi
  PG_CTL_STOP=("$bin/pg_ctl" -D "$dir/db" -m fast -w stop)
}

stop_postgres() {
  if [ -n "${PG_CTL_STOP+x}" ]; then as_pg "${PG_CTL_STOP[@]}" >/dev/null 2>&1 || true; fi
}

# psql against the local cluster as the postgres superuser.
pg_psql() {
  local port=$1; shift
  "$(pg_bindir)/psql" -h 127.0.0.1 -p "$port" -U postgres -v ON_ERROR_STOP=1 -qAt "$@"
}

ensure_database() {
  local port=$1 db=$2
  if [ -z "$(pg_psql "$port" -d postgres -c "select 1 from pg_database where datname = '$db'")" ]; then
    log "creating database $db"
    pg_psql "$port" -d postgres -c "create database \"$db\" template template0 encoding 'UTF8'"
  fi
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then apt_install chromium fonts-dejavu-core; fi
}

# wait_for_port PORT SECONDS
wait_for_port() {
  local port=$1 secs=${2:-30} i=0
  while ! (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; do
    i=$((i + 1)); [ $i -gt $((secs * 10)) ] && { log "nothing answered on port $port"; return 1; }
    sleep 0.1
  done
}

# Build the web app when its sources changed since the last build.
build_web_if_changed() {
  local hash stamp="$ROOT/dist/.source-hash"
  hash=$(cd "$ROOT" && find app modules app.json package-lock.json tsconfig.json metro.config.js scripts/metro scripts/build-web.sh scripts/build-fonts.ts scripts/finish-web.ts -type f ! -path '*/server/*' -print0 | sort -z | xargs -0 sha1sum | sha1sum | cut -c1-40)
  if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$hash" ] && [ -f "$ROOT/dist/index.html" ]; then
    log "web app is up to date"
    return 0
  fi
  log "building the web app (expo export)"
  bash "$ROOT/scripts/build-web.sh"
  echo "$hash" > "$stamp"
}
