#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, the S3 fake and the mail fake on
# loopback, migrate, seed the demo organisation, build the web app and serve the portal.
# A second run reuses the data folder and keeps the data.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$REPO"

PORT=${PORT:-3000}
PG_PORT=${PG_PORT:-54329}
S3_PORT=${S3_PORT:-4569}
SMTP_PORT=${SMTP_PORT:-1025}
MAIL_WEB_PORT=${MAIL_WEB_PORT:-1080}
DATA="$REPO/.data/dev"
mkdir -p "$DATA" .run

# Ctrl-C stops what this script started and ends with a plain "Stopped." (no failure trace).
stopping() { log "Stopping"; stop_started; log "Stopped."; }
trap stopping EXIT
trap 'exit 0' INT TERM

ensure_node_deps
# The job worker prints the issued reports to PDF with Debian's Chromium (CHROMIUM_PATH to use another).
[ -n "${CHROMIUM_PATH:-}" ] || apt_install chromium fonts-dejavu-core

if [ -z "${DATABASE_URL:-}" ]; then
  # Durable settings here: this cluster holds the data a person works with.
  start_postgres dev "$PG_PORT"
  create_database "$PG_PORT" porestack
  export DATABASE_URL="postgres://app@127.0.0.1:$PG_PORT/porestack"
fi
if [ -z "${S3_ENDPOINT:-}" ]; then
  start_s3 "$DATA" "$S3_PORT"
  export S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_ACCESS_KEY=S3RVER S3_SECRET_KEY=S3RVER
fi
if [ -z "${SMTP_URL:-}" ]; then
  start_mail "$DATA" "$SMTP_PORT" "$MAIL_WEB_PORT"
  export SMTP_URL="smtp://127.0.0.1:$SMTP_PORT" MAIL_INBOX_URL="http://127.0.0.1:$MAIL_WEB_PORT"
fi
export S3_BUCKET=${S3_BUCKET:-porestack}
export PUBLIC_URL=${PUBLIC_URL:-http://127.0.0.1:$PORT}
export PORT NODE_ENV=production
if [ -z "${JWT_SECRET:-}" ]; then
  [ -s "$DATA/jwt-secret" ] || node -e "process.stdout.write(require('crypto').randomBytes(48).toString('hex'))" >"$DATA/jwt-secret"
  JWT_SECRET=$(cat "$DATA/jwt-secret"); export JWT_SECRET
fi

build_packages
log "Building the web app"
pnpm --filter @porestack/web run build >/dev/null || die "The web build failed: run 'pnpm --filter @porestack/web run build' to see why."

log "Running migrations"
pnpm --filter @porestack/api run --silent migrate >.run/migrate.log 2>&1 || die "Migrations failed: see .run/migrate.log"
log "Seeding the demo organisation (kept if already there)"
pnpm --filter @porestack/api run --silent seed >.run/seed.txt || die "Seeding failed."
build_api

start_bg "$REPO/.run/worker.pid" "$REPO/.run/worker.log" node apps/api/dist/src/worker.js
log "Job worker started (log: .run/worker.log)"
start_bg "$REPO/.run/api.pid" "$REPO/.run/api.log" node apps/api/dist/src/server.js
wait_port "$PORT" "The portal"

cat <<INFO

  Porestack is serving on   ${PUBLIC_URL}
  Mail inbox (fake SMTP):   ${MAIL_INBOX_URL:-your SMTP server}
  Logs, one line a request: .run/api.log and .run/worker.log
$(cat .run/seed.txt)
  Press Ctrl-C to stop.

INFO
# Wait on the portal; if it stops by itself, say so and where to look.
api_pid=$(cat "$REPO/.run/api.pid")
while kill -0 "$api_pid" 2>/dev/null; do sleep 1; done
die "The portal stopped: see .run/api.log"
