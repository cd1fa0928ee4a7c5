#!/usr/bin/env bash
# npm test: the same set-up as npm start, on separate throw-away test services, then the
# type check (tsc -b over every package and app, tests included) and the lint (ESLint), then every
# suite: unit (geo-core, types, web), API integration (real PostgreSQL, S3 fake, mail fake,
# job worker) and browser end-to-end (Playwright driving Debian's Chromium).
# Every step runs even when an earlier one fails; the exit code is non-zero if any failed.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$REPO"

PG_PORT=${TEST_PG_PORT:-54339}
S3_PORT=${TEST_S3_PORT:-4579}
SMTP_PORT=${TEST_SMTP_PORT:-1035}
MAIL_WEB_PORT=${TEST_MAIL_WEB_PORT:-1090}
E2E_PORT=${TEST_E2E_PORT:-3100}
DATA="$REPO/.data/test"

trap stop_started EXIT
trap 'exit 130' INT TERM

ensure_node_deps
# chromium: the browser tests, and the worker printing reports to PDF (fonts-dejavu-core for its
# page margins and fallback glyphs); poppler-utils: the report tests read the PDFs back (pdftotext, pdfinfo).
apt_install chromium fonts-dejavu-core poppler-utils

# Test data is thrown away on every run, so every run starts clean.
rm -rf "$DATA" "$(pg_root test)"
mkdir -p "$DATA" .run
if [ -z "${DATABASE_URL:-}" ]; then
  start_postgres test "$PG_PORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off"
  PG_BASE="postgres://app@127.0.0.1:$PG_PORT"
  create_database "$PG_PORT" porestack_test
  create_database "$PG_PORT" porestack_e2e
  export TEST_DATABASE_URL="$PG_BASE/porestack_test" E2E_DATABASE_URL="$PG_BASE/porestack_e2e"
else
  export TEST_DATABASE_URL="$DATABASE_URL" E2E_DATABASE_URL="$DATABASE_URL"
fi
start_s3 "$DATA" "$S3_PORT"
start_mail "$DATA" "$SMTP_PORT" "$MAIL_WEB_PORT"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_ACCESS_KEY=S3RVER S3_SECRET_KEY=S3RVER
export SMTP_URL="smtp://127.0.0.1:$SMTP_PORT" MAIL_INBOX_URL="http://127.0.0.1:$MAIL_WEB_PORT"
export JWT_SECRET=test-secret-not-for-production-0123456789abcdef
unset DATABASE_URL

build_packages

failed=()
suite() {
  local name=$1; shift
  local started=$SECONDS
  log "── $name"
  if "$@"; then log "$name: passed ($((SECONDS - started)) s)"; else log "$name: FAILED ($((SECONDS - started)) s)"; failed+=("$name"); fi
}

# vitest strips types without checking them, so the compiler and the lint run first.
suite "type check (tsc -b)" pnpm run --silent typecheck
suite "lint (ESLint)" pnpm run --silent lint

suite "geo-core unit tests" pnpm --filter @porestack/geo-core run test
suite "types unit tests" pnpm --filter @porestack/types run test
suite "web component tests" pnpm --filter @porestack/web run test
suite "API integration tests" env DATABASE_URL="$TEST_DATABASE_URL" S3_BUCKET=porestack-test \
  PUBLIC_URL=http://127.0.0.1:3999 pnpm --filter @porestack/api run test

e2e() {
  pnpm --filter @porestack/web run build >/dev/null || return 1
  # As in production: compiled JavaScript run with node.
  pnpm --filter @porestack/api run build >/dev/null || return 1
  # Every browser test signs people up from this one machine: lift the per-client limits.
  export DATABASE_URL="$E2E_DATABASE_URL" S3_BUCKET=porestack-e2e PORT="$E2E_PORT" \
    PUBLIC_URL="http://127.0.0.1:$E2E_PORT" NODE_ENV=production \
    SIGN_UP_CLIENT_RATE_LIMIT=10000 SIGN_IN_CLIENT_RATE_LIMIT=10000 RESET_CLIENT_RATE_LIMIT=10000
  pnpm --filter @porestack/api run --silent migrate >/dev/null || return 1
  pnpm --filter @porestack/api run --silent seed >/dev/null || return 1
  start_bg "$REPO/.run/e2e-worker.pid" "$REPO/.run/e2e-worker.log" node apps/api/dist/src/worker.js
  start_bg "$REPO/.run/e2e-api.pid" "$REPO/.run/e2e-api.log" node apps/api/dist/src/server.js
  wait_port "$E2E_PORT" "The portal (e2e)"
  E2E_BASE_URL="http://127.0.0.1:$E2E_PORT" pnpm --filter @porestack/web run e2e
}
suite "browser end-to-end tests" e2e

if [ ${#failed[@]} -gt 0 ]; then
  log "Failed suites: ${failed[*]}"
  exit 1
fi
log "All suites passed."
