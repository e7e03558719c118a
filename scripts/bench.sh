#!/usr/bin/env bash
# Benchmarks on its own PostgreSQL cluster and build: a signed-in trivial read (/api/me/units)
# against the bare /api/ping, then the install board with 500 invented projects,
# GET /api/projects against the constant GET /api/ping, the query count per board read, then the
# cycle evaluation benchmark. Prints figures; enforces none.
#   BENCH_SECONDS=10 BENCH_CONNECTIONS=4 npm run bench      BENCH_SKIP_BUILD=1 reuses .next-bench
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

PORT=${BENCH_PORT:-3199}
PG_PORT=54349
DIST=.next-bench

cleanup() {
  stop_children
  pg_down
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
echo "== database"
pg_up bench "$PG_PORT" fast
pg_createdb "$PG_PORT" tankwright_bench fresh
export DATABASE_URL=postgres://tankwright@127.0.0.1:$PG_PORT/tankwright_bench
export NEXTAUTH_SECRET=bench-secret-for-the-bench-only
export APP_URL=http://127.0.0.1:$PORT NEXTAUTH_URL=http://127.0.0.1:$PORT BENCH_URL=http://127.0.0.1:$PORT
"${TSX[@]}" scripts/migrate.ts
"${TSX[@]}" scripts/bench-seed.ts

if [ -z "${BENCH_SKIP_BUILD:-}" ] || [ ! -f "$DIST/BUILD_ID" ]; then
  echo "== build ($DIST)"
  node scripts/build-sw.mjs
  NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next build >.data/bench-build.log 2>&1 || {
    tail -40 .data/bench-build.log
    exit 1
  }
fi

echo "== app on port $PORT"
NODE_ENV=production NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next start -p "$PORT" >.data/bench-server.log 2>&1 &
CHILD_PIDS+=($!)
wait_http "http://127.0.0.1:$PORT/api/health" 60

echo "== signed-in trivial read against ping"
"${TSX[@]}" scripts/bench-session.ts

echo
echo "== board against ping"
"${TSX[@]}" scripts/bench-board.ts

echo
echo "== cycle evaluation"
"${TSX[@]}" scripts/bench-cycle.ts
