#!/usr/bin/env bash
# `npm test`: the same set-up against throwaway databases on ports of its own, then every check.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

PG_PORT=${FELTWIRE_TEST_PG_PORT:-55442}
S3_PORT=${FELTWIRE_TEST_S3_PORT:-4579}
APP_PORT=${FELTWIRE_TEST_APP_PORT:-8089}
PAY_PORT=${FELTWIRE_TEST_PAY_PORT:-12121}
RUN_ID="t$$_$(date +%s)"
CHILDREN=()
STORE="$TMPDIR/storage-$RUN_ID"

cleanup() {
  local rc=$?
  trap - EXIT INT TERM
  for pid in "${CHILDREN[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  if [ -n "${PG_CTL_STOP+x}" ]; then
    for db in $(pg_psql "$PG_PORT" -d postgres -c "select datname from pg_database where datname like 'fw_${RUN_ID}%'" 2>/dev/null); do
      pg_psql "$PG_PORT" -d postgres -c "drop database if exists \"$db\" with (force)" >/dev/null 2>&1 || true
    done
  fi
  stop_postgres
  rm -rf "$STORE"
  exit $rc
}
trap cleanup EXIT INT TERM

step() { log "== $*"; }

ensure_node_modules
ensure_chromium

step "client types (stale when the schema or a screen's document changed: npm run codegen)"
node_modules/.bin/tsx scripts/codegen.ts --check

step "typecheck"
node_modules/.bin/tsc --noEmit

step "lint"
node_modules/.bin/eslint --max-warnings=0 .

step "database and fakes"
start_postgres test "$PG_PORT" test
export TEST_PG_URL="postgres://postgres@127.0.0.1:$PG_PORT"
export TEST_DB_TEMPLATE="fw_${RUN_ID}_template"
export TEST_RUN_ID="$RUN_ID"
pg_psql "$PG_PORT" -d postgres -c "create database \"$TEST_DB_TEMPLATE\" template template0 encoding 'UTF8'"
node_modules/.bin/tsx scripts/db.ts migrate "$TEST_PG_URL/$TEST_DB_TEMPLATE"
mkdir -p "$STORE"
node_modules/.bin/tsx storage-fake/main.ts "$S3_PORT" "$STORE" >/dev/null &
CHILDREN+=($!)
wait_for_port "$S3_PORT" 30
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
export BCRYPT_COST=4

step "jest: unit and API tests"
node_modules/.bin/jest --ci "$@"

step "web export"
build_web_if_changed

step "browser journeys"
E2E_DB="fw_${RUN_ID}_e2e"
pg_psql "$PG_PORT" -d postgres -c "create database \"$E2E_DB\" template \"$TEST_DB_TEMPLATE\""
E2E_WEBHOOK_SECRET="whsec_e2e_$(head -c 12 /dev/urandom | od -An -tx1 | tr -d ' \n')"
node_modules/.bin/tsx stripe-fake/main.ts "$PAY_PORT" "http://127.0.0.1:$APP_PORT/api/webhooks/payments" "$E2E_WEBHOOK_SECRET" >/dev/null &
CHILDREN+=($!)
wait_for_port "$PAY_PORT" 30
STRIPE_API_URL="http://127.0.0.1:$PAY_PORT" STRIPE_WEBHOOK_SECRET="$E2E_WEBHOOK_SECRET" MAIL_FAKE_PORT=${FELTWIRE_TEST_MAIL_PORT:-2535} DATABASE_URL="$TEST_PG_URL/$E2E_DB" JWT_SECRET="e2e-secret-$(head -c 24 /dev/urandom | base64)" PORT=$APP_PORT SEED_DEMO=1 \
  node_modules/.bin/tsx server/main.ts > "$TMPDIR/e2e-server-$RUN_ID.log" 2>&1 &
CHILDREN+=($!)
wait_for_port "$APP_PORT" 60 || { cat "$TMPDIR/e2e-server-$RUN_ID.log"; exit 1; }
E2E_BASE_URL="http://127.0.0.1:$APP_PORT" E2E_PAY_URL="http://127.0.0.1:$PAY_PORT" node_modules/.bin/jest --ci --config tests/e2e/jest.config.js --runInBand
log "all checks passed"
