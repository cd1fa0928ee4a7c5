#!/usr/bin/env bash
# For developers: `bash infra/services.sh` starts a long-lived set of local services for
# running suites by hand (vitest in apps/api, playwright) on their own ports, and writes
# the matching environment to .run/services.env (`source .run/services.env`).
# `bash infra/services.sh stop` stops them.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$REPO"
# Ports can be moved (SERVICES_PG_PORT …) to run two checkouts side by side.
PG_PORT=${SERVICES_PG_PORT:-54349} S3_PORT=${SERVICES_S3_PORT:-4589}
SMTP_PORT=${SERVICES_SMTP_PORT:-1045} MAIL_WEB_PORT=${SERVICES_MAIL_WEB_PORT:-1100}
DATA="$REPO/.data/services"

if [ "${1:-}" = stop ]; then
  for f in .run/s3-$S3_PORT.pid .run/mail-$SMTP_PORT.pid; do
    [ -f "$f" ] && { kill -- -"$(cat "$f")" 2>/dev/null || true; rm -f "$f"; }
  done
  root=$(pg_root services)
  as_pg "$PGBIN/pg_ctl" -D "$root/data" -m fast -w stop >/dev/null 2>&1 || true
  log "Stopped."
  exit 0
fi

mkdir -p "$DATA" .run
# Hand-run report tests print with Chromium and read the PDFs back with poppler-utils.
apt_install chromium fonts-dejavu-core poppler-utils
start_postgres services "$PG_PORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off"
create_database "$PG_PORT" porestack_test
create_database "$PG_PORT" porestack_e2e
create_database "$PG_PORT" porestack
start_s3 "$DATA" "$S3_PORT"
start_mail "$DATA" "$SMTP_PORT" "$MAIL_WEB_PORT"
# Started for good: forget them so nothing stops them on exit.
STARTED_PG=(); STARTED_PIDS=()
cat >.run/services.env <<ENV
export DATABASE_URL=postgres://app@127.0.0.1:$PG_PORT/porestack_test
export TEST_DATABASE_URL=postgres://app@127.0.0.1:$PG_PORT/porestack_test
export E2E_DATABASE_URL=postgres://app@127.0.0.1:$PG_PORT/porestack_e2e
export S3_ENDPOINT=http://127.0.0.1:$S3_PORT S3_ACCESS_KEY=S3RVER S3_SECRET_KEY=S3RVER S3_BUCKET=porestack-test
export SMTP_URL=smtp://127.0.0.1:$SMTP_PORT MAIL_INBOX_URL=http://127.0.0.1:$MAIL_WEB_PORT
export JWT_SECRET=dev-secret-not-for-production-0123456789abcdef
export PUBLIC_URL=http://127.0.0.1:3999
ENV
log "Environment written to .run/services.env"
