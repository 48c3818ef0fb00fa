#!/usr/bin/env bash
# `npm run bench`: seeds (or reuses) the benchmark databases on a cluster of its own, builds the web
# app when it changed, and measures; its ports never meet those of `npm start` or `npm test`.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

PG_PORT=${BENCH_PG_PORT:-55502}
S3_PORT=${BENCH_S3_PORT:-4650}
CHILDREN=()
STORE="$TMPDIR/bench-storage-$$"

cleanup() {
  local rc=$?
  trap - EXIT INT TERM
  for pid in "${CHILDREN[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  stop_postgres
  rm -rf "$STORE"
  exit $rc
}
trap cleanup EXIT INT TERM

ensure_node_modules
ensure_chromium
start_postgres bench "$PG_PORT" test
mkdir -p "$STORE"
node_modules/.bin/tsx storage-fake/main.ts "$S3_PORT" "$STORE" feltwire-photos >/dev/null &
CHILDREN+=($!)
wait_for_port "$S3_PORT" 30
build_web_if_changed

BENCH_PG_URL="postgres://postgres@127.0.0.1:$PG_PORT" BENCH_S3_ENDPOINT="http://127.0.0.1:$S3_PORT" \
  node_modules/.bin/tsx bench/main.ts
