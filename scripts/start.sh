#!/usr/bin/env bash
# `npm start`: everything the product needs, then the product, on http://127.0.0.1:${PORT:-8080}.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

PG_PORT=${FELTWIRE_PG_PORT:-55432}
S3_PORT=${FELTWIRE_S3_PORT:-4569}
PAY_PORT=${FELTWIRE_PAY_PORT:-12111}
export PORT=${PORT:-8080}
DB_NAME=${FELTWIRE_DB:-feltwire}
CHILDREN=()

cleanup() {
  trap - EXIT INT TERM
  log "stopping"
  for pid in "${CHILDREN[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  stop_postgres
}
trap cleanup EXIT INT TERM

ensure_node_modules
start_postgres dev "$PG_PORT"
ensure_database "$PG_PORT" "$DB_NAME"

# A secret of this checkout's own, made once and kept out of git.
[ -f .data/jwt-secret ] || (umask 077 && head -c 48 /dev/urandom | base64 | tr -d '\n' > .data/jwt-secret)
[ -f .data/payment-webhook-secret ] || (umask 077 && printf 'whsec_%s' "$(head -c 24 /dev/urandom | od -An -tx1 | tr -d ' \n')" > .data/payment-webhook-secret)
export STRIPE_WEBHOOK_SECRET=${STRIPE_WEBHOOK_SECRET:-$(cat .data/payment-webhook-secret)}

mkdir -p .data/storage
node_modules/.bin/tsx storage-fake/main.ts "$S3_PORT" "$ROOT/.data/storage" feltwire-photos &
CHILDREN+=($!)
wait_for_port "$S3_PORT" 30

node_modules/.bin/tsx stripe-fake/main.ts "$PAY_PORT" "http://127.0.0.1:$PORT/api/webhooks/payments" "$STRIPE_WEBHOOK_SECRET" &
CHILDREN+=($!)
wait_for_port "$PAY_PORT" 30
export STRIPE_API_URL="http://127.0.0.1:$PAY_PORT"

build_web_if_changed

export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/$DB_NAME"
export JWT_SECRET=${JWT_SECRET:-$(cat .data/jwt-secret)}
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
node_modules/.bin/tsx server/main.ts &
CHILDREN+=($!)
wait "${CHILDREN[-1]}"
