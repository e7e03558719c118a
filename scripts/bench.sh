#!/usr/bin/env bash
# Benchmarks on its own PostgreSQL cluster and build (app on port 3199, PostgreSQL on 54349, the
# phone check's demo app on 3198: clear of the test slots' 3100+N and 54339+N): bare /api/ping, a
# signed-in trivial read, the board at 500 active projects and again with 2,000 tanks in service,
# where a board read's time goes, the queries per read; then the first load of /board, install day
# and the portal on a throttled phone (LCP, JavaScript shipped); then the cycle evaluation.
# Prints figures; enforces none.
#   BENCH_SECONDS=10 BENCH_CONNECTIONS=4 npm run bench      BENCH_SKIP_BUILD=1 reuses .next-bench
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

PORT=${BENCH_PORT:-3199}
PG_PORT=54349
DEMO_PORT=${BENCH_DEMO_PORT:-3198}
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
BENCH_TIMING=1 NODE_ENV=production NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next start -p "$PORT" >.data/bench-server.log 2>&1 &
CHILD_PIDS+=($!)
wait_http "http://127.0.0.1:$PORT/api/health" 60

echo "== ping, signed-in read and the board"
"${TSX[@]}" scripts/bench-board.ts

# The phone check reads the demo: its own database on the same cluster and a second app on the
# same build. Demo photos are skipped (no object store here), which the pages handle.
echo
echo "== first load on a slow phone (demo data, app on port $DEMO_PORT)"
stop_children
pg_createdb "$PG_PORT" tankwright_demo fresh
DEMO_DB=postgres://tankwright@127.0.0.1:$PG_PORT/tankwright_demo
DATABASE_URL=$DEMO_DB "${TSX[@]}" scripts/migrate.ts >/dev/null
DATABASE_URL=$DEMO_DB S3_ENDPOINT=http://127.0.0.1:9 S3_FORCE_PATH_STYLE=1 "${TSX[@]}" scripts/seed.ts 2>&1 | grep -v "demo photo skipped" || true
DATABASE_URL=$DEMO_DB APP_URL=http://127.0.0.1:$DEMO_PORT NEXTAUTH_URL=http://127.0.0.1:$DEMO_PORT S3_ENDPOINT=http://127.0.0.1:9 \
  NODE_ENV=production NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next start -p "$DEMO_PORT" >.data/bench-demo-server.log 2>&1 &
CHILD_PIDS+=($!)
wait_http "http://127.0.0.1:$DEMO_PORT/api/health" 60
DATABASE_URL=$DEMO_DB BENCH_DEMO_URL=http://127.0.0.1:$DEMO_PORT "${TSX[@]}" scripts/bench-phone.ts
stop_children

echo
echo "== cycle evaluation"
"${TSX[@]}" scripts/bench-cycle.ts
