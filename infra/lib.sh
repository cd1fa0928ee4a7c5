# Shared shell functions for start.sh and test.sh: install what is missing,
# start the three local services on loopback, stop only what we started.
# Sourced, not run.

REPO=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
PNPM_VERSION=12.4.2
PGBIN=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)

log() { printf '\033[1;34m[porestack]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[porestack] %s\033[0m\n' "$*" >&2; exit 1; }

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"
  elif command -v sudo >/dev/null 2>&1; then sudo "$@"
  else die "Need root to run: $* (install it by hand, or run as root)."
  fi
}

APT_UPDATED=
apt_install() {
  # apt_install <package>...: installs the Debian packages that are not installed yet.
  local missing=()
  for p in "$@"; do dpkg -s "$p" >/dev/null 2>&1 || missing+=("$p"); done
  [ ${#missing[@]} -eq 0 ] && return 0
  log "Installing Debian packages: ${missing[*]}"
  if [ -z "$APT_UPDATED" ]; then as_root apt-get update -qq >/dev/null; APT_UPDATED=1; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null \
    || die "apt-get could not install ${missing[*]}."
}

ensure_node_deps() {
  if [ "$(pnpm --version 2>/dev/null)" != "$PNPM_VERSION" ]; then
    log "Installing pnpm $PNPM_VERSION"
    npm install -g "pnpm@$PNPM_VERSION" >/dev/null 2>&1 || as_root npm install -g "pnpm@$PNPM_VERSION" >/dev/null \
      || die "npm could not install pnpm@$PNPM_VERSION."
  fi
  log "Installing dependencies (pnpm install)"
  (cd "$REPO" && pnpm install --frozen-lockfile --reporter=silent) || die "pnpm install failed."
}

build_packages() {
  log "Building shared packages"
  (cd "$REPO" && pnpm --filter @porestack/types --filter @porestack/geo-core run build) || die "Building the shared packages failed."
}

build_api() {
  # The portal runs compiled JavaScript with node (apps/api/dist), not the TypeScript sources.
  log "Building the API"
  (cd "$REPO" && pnpm --filter @porestack/api run build >/dev/null) || die "Building the API failed: run 'pnpm --filter @porestack/api run build' to see why."
}

# ── PostgreSQL ────────────────────────────────────────────────────────────────
# pg_root <name>: where a cluster lives. PostgreSQL runs as the postgres user, which
# must be able to traverse every parent folder; fall back to /tmp when it cannot.
pg_root() {
  local name=$1 root="$REPO/.data/$1-pg"
  if [ "$(id -u)" = 0 ] && ! runuser -u postgres -- test -x "$REPO" 2>/dev/null; then
    root="/tmp/porestack-$(printf '%s' "$REPO" | md5sum | cut -c1-10)/$name"
  fi
  printf '%s' "$root"
}

as_pg() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }

# start_postgres <name> <port> <extra -o options>: starts (or reuses) a cluster; prints nothing.
start_postgres() {
  local name=$1 port=$2 extra=${3:-}
  [ -n "$PGBIN" ] && [ -x "$PGBIN/postgres" ] || { apt_install postgresql; PGBIN=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1); }
  # Debian's package starts its own cluster on 5432; we use our own on a private port.
  local root; root=$(pg_root "$name")
  PG_ROOT=$root; PGDATA="$root/data"; PGSOCK="$root/sock"
  mkdir -p "$PGDATA" "$PGSOCK"
  if [ "$(id -u)" = 0 ]; then chown -R postgres:postgres "$root"; fi
  chmod 700 "$PGDATA"
  if [ ! -s "$PGDATA/PG_VERSION" ]; then
    as_pg "$PGBIN/initdb" -D "$PGDATA" -U app --auth=trust -E UTF8 --locale=C.UTF-8 >"$root/initdb.log" 2>&1 \
      || die "initdb failed: see $root/initdb.log"
  fi
  if as_pg "$PGBIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1; then
    log "PostgreSQL ($name) already running on 127.0.0.1:$port"
    return 0
  fi
  as_pg "$PGBIN/pg_ctl" -D "$PGDATA" -l "$root/server.log" -w -t 30 start \
    -o "-p $port -k $PGSOCK -c listen_addresses=127.0.0.1 $extra" >/dev/null \
    || die "PostgreSQL did not start: see $root/server.log"
  STARTED_PG+=("$PGDATA")
  log "PostgreSQL ($name) started on 127.0.0.1:$port"
}

create_database() {
  # create_database <port> <db>: creates the database when missing.
  local port=$1 db=$2
  as_pg "$PGBIN/psql" -h 127.0.0.1 -p "$port" -U app -d postgres -tAc "SELECT 1 FROM pg_database WHERE datname='$db'" | grep -q 1 \
    || as_pg "$PGBIN/createdb" -h 127.0.0.1 -p "$port" -U app "$db"
}

drop_database() {
  local port=$1 db=$2
  as_pg "$PGBIN/dropdb" -h 127.0.0.1 -p "$port" -U app --if-exists --force "$db"
}

# ── S3 fake and mail fake ─────────────────────────────────────────────────────
port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# The portal took over 10 s to open its port on two cores shared by several test runs;
# waiting longer costs nothing when it starts sooner.
wait_port() {
  # wait_port <port> <what> [seconds, 60 by default]
  local port=$1 what=$2 seconds=${3:-60} i
  for i in $(seq 1 $((seconds * 10))); do port_open "$port" && return 0; sleep 0.1; done
  die "$what did not open 127.0.0.1:$port in $seconds s."
}

# start_bg <pidfile> <logfile> <command...>: runs a command in its own process group.
start_bg() {
  local pidfile=$1 logfile=$2; shift 2
  setsid "$@" >"$logfile" 2>&1 </dev/null &
  echo $! >"$pidfile"
  STARTED_PIDS+=("$pidfile")
}

start_s3() {
  local dir=$1 port=$2
  if port_open "$port"; then log "S3 fake already answering on 127.0.0.1:$port"; return 0; fi
  mkdir -p "$dir/s3" "$REPO/.run"
  start_bg "$REPO/.run/s3-$port.pid" "$REPO/.run/s3-$port.log" \
    "$REPO/node_modules/.bin/s3rver" -d "$dir/s3" -a 127.0.0.1 -p "$port" --no-vhost-buckets --silent
  wait_port "$port" "The S3 fake"
  log "S3 fake started on 127.0.0.1:$port"
}

start_mail() {
  local dir=$1 smtp=$2 web=$3
  if port_open "$smtp"; then log "Mail fake already answering on 127.0.0.1:$smtp"; return 0; fi
  mkdir -p "$dir/mail" "$REPO/.run"
  start_bg "$REPO/.run/mail-$smtp.pid" "$REPO/.run/mail-$smtp.log" \
    "$REPO/node_modules/.bin/maildev" --smtp "$smtp" --ip 127.0.0.1 --web "$web" --web-ip 127.0.0.1 \
    --mail-directory "$dir/mail" --silent
  wait_port "$smtp" "The mail fake (SMTP)"
  wait_port "$web" "The mail fake (web inbox)"
  log "Mail fake started: SMTP 127.0.0.1:$smtp, inbox http://127.0.0.1:$web"
}

STARTED_PG=()
STARTED_PIDS=()
stop_started() {
  # Stops only what this script started, by PID (process groups) and by data folder.
  local f pid d
  for f in "${STARTED_PIDS[@]}"; do
    pid=$(cat "$f" 2>/dev/null) || continue
    kill -- -"$pid" 2>/dev/null || kill "$pid" 2>/dev/null || true
    rm -f "$f"
  done
  for d in "${STARTED_PG[@]}"; do
    as_pg "$PGBIN/pg_ctl" -D "$d" -m fast -w stop >/dev/null 2>&1 || true
  done
  STARTED_PIDS=(); STARTED_PG=()
}
