#!/usr/bin/env bash
# Runs Tankwright with its demo data: PostgreSQL, migrations, seed, local fakes, worker and app.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

mode=prod
[ "${1:-}" = "--dev" ] && mode=dev
PORT=${PORT:-3000}

cleanup() {
  stop_children
  pg_down
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
if [ -z "${DATABASE_URL:-}" ]; then
  pg_up dev 54329
  pg_createdb 54329 tankwright
  export DATABASE_URL=postgres://tankwright@127.0.0.1:54329/tankwright
fi
ensure_secret
export APP_URL=${APP_URL:-http://localhost:$PORT}
export NEXTAUTH_URL=${NEXTAUTH_URL:-$APP_URL}
if [ -z "${SMTP_HOST:-}" ] && [ -z "${S3_ENDPOINT:-}" ]; then
  start_fakes 1025 1080 4569 "$PROJECT_ROOT/.data/s3" 4566
  export TANKWRIGHT_DEV_TOOLS=1
fi

"${TSX[@]}" scripts/migrate.ts
"${TSX[@]}" scripts/seed.ts
"${TSX[@]}" scripts/worker.ts &
CHILD_PIDS+=($!)

if [ "$mode" = dev ]; then
  node node_modules/next/dist/bin/next dev -p "$PORT" &
else
  node scripts/build-sw.mjs
  node node_modules/next/dist/bin/next build
  node node_modules/next/dist/bin/next start -p "$PORT" &
fi
CHILD_PIDS+=($!)
echo "Tankwright: $APP_URL (demo sign-ins are listed in README.md)"
wait "${CHILD_PIDS[-1]}"
