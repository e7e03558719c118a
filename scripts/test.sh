#!/usr/bin/env bash
# Runs every test: types, unit, integration (real PostgreSQL) and browser (Debian's Chromium),
# on a fresh database in a test-only cluster that never touches the demo data.
#
#   npm test                                  everything
#   npm test -- --unit                        types and unit tests only (no services)
#   npm test -- --integration [files…]        integration tests (all, or the files named)
#   npm test -- --e2e [files…]                browser tests (all, or the files named)
#   npm test -- --screens                     screenshots of the main screens into docs/screens
# Environment: TEST_SLOT=N runs on its own ports, cluster and build folder, so several runs can
# share a machine; SKIP_BUILD=1 reuses the last build of that slot; SKIP_TYPES=1 skips tsc;
# SKIP_LINT=1 skips ESLint (which runs with the unit tests).
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

want_unit=1 want_int=1 want_e2e=1 want_screens=0
int_files=() e2e_files=()
if [ $# -gt 0 ]; then
  want_unit=0 want_int=0 want_e2e=0
  target=""
  for arg in "$@"; do
    case "$arg" in
      --unit) want_unit=1; target="" ;;
      --integration) want_int=1; target=int ;;
      --e2e) want_e2e=1; target=e2e ;;
      --screens) want_screens=1; target="" ;;
      *) if [ "$target" = int ]; then int_files+=("$arg"); elif [ "$target" = e2e ]; then e2e_files+=("$arg"); else echo "Unknown argument: $arg" >&2; exit 2; fi ;;
    esac
  done
fi

slot=${TEST_SLOT:-0}
PORT=$((3100 + slot))
PG_PORT=$((54339 + slot))
SMTP_P=$((2525 + slot * 10)) MAILAPI_P=$((2580 + slot * 10)) S3_P=$((4579 + slot * 10)) PAY_P=$((4575 + slot * 10))
DIST=.next-test$([ "$slot" = 0 ] || echo "-$slot")

cleanup() {
  stop_children
  pg_down
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules

if [ -z "${SKIP_TYPES:-}" ]; then
  echo "== types"
  node node_modules/typescript/bin/tsc --noEmit
  node node_modules/typescript/bin/tsc --noEmit -p sw/tsconfig.json
fi

if [ "$want_unit" = 1 ] && [ -z "${SKIP_LINT:-}" ]; then
  echo "== lint"
  # Only errors are printed, and they fail the run (`npm run lint` shows warnings too). The cache
  # keeps a re-run to the files that changed.
  node node_modules/eslint/bin/eslint.js --cache --cache-location .data/eslint-cache --quiet .
fi

if [ "$want_unit" = 1 ]; then
  echo "== unit"
  node node_modules/vitest/vitest.mjs run --project unit
fi

[ "$want_int" = 1 ] || [ "$want_e2e" = 1 ] || [ "$want_screens" = 1 ] || { echo "All tests passed."; exit 0; }

if { [ "$want_e2e" = 1 ] || [ "$want_screens" = 1 ]; } && [ ! -x /usr/bin/chromium ]; then
  echo "== installing Debian's Chromium for browser tests"
  sudo=""
  [ "$(id -u)" -eq 0 ] || sudo=sudo
  $sudo apt-get update -qq && DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq chromium >/dev/null
fi

echo "== services"
pg_up "test-$slot" "$PG_PORT" fast
pg_createdb "$PG_PORT" tankwright_test fresh
export DATABASE_URL=postgres://tankwright@127.0.0.1:$PG_PORT/tankwright_test
export NEXTAUTH_SECRET=test-secret-for-the-test-run-only
# Notices leave at once in tests unless a test sets the company's own delay.
export NOTICE_DELAY_SECONDS=0
export APP_URL=http://127.0.0.1:$PORT NEXTAUTH_URL=http://127.0.0.1:$PORT TEST_APP_URL=http://127.0.0.1:$PORT
rm -rf ".data/s3-test-$slot"
start_fakes "$SMTP_P" "$MAILAPI_P" "$S3_P" "$PROJECT_ROOT/.data/s3-test-$slot" "$PAY_P"
export TEST_PAYMENTS_URL=$PAYMENTS_API_URL
"${TSX[@]}" scripts/migrate.ts
"${TSX[@]}" scripts/seed.ts

if [ -z "${SKIP_BUILD:-}" ] || [ ! -f "$DIST/BUILD_ID" ]; then
  echo "== build"
  node scripts/build-sw.mjs
  NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next build >".data/test-build-$slot.log" 2>&1 || {
    tail -50 ".data/test-build-$slot.log"
    exit 1
  }
fi

NEXT_DIST_DIR=$DIST node node_modules/next/dist/bin/next start -p "$PORT" >".data/test-server-$slot.log" 2>&1 &
CHILD_PIDS+=($!)
"${TSX[@]}" scripts/worker.ts >".data/test-worker-$slot.log" 2>&1 &
CHILD_PIDS+=($!)
wait_http "http://127.0.0.1:$PORT/api/health" 60

# Screens first, while the database holds only the demo.
if [ "$want_screens" = 1 ]; then
  echo "== screens"
  node node_modules/@playwright/test/cli.js test -c playwright.screens.config.ts
fi
if [ "$want_int" = 1 ]; then
  echo "== integration"
  node node_modules/vitest/vitest.mjs run --project integration "${int_files[@]}"
fi
if [ "$want_e2e" = 1 ]; then
  echo "== browser"
  node node_modules/@playwright/test/cli.js test "${e2e_files[@]}"
fi
echo "All tests passed."
