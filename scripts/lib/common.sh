# Shared by the start, test and bench scripts.
PROJECT_ROOT=${PROJECT_ROOT:-$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)}
cd "$PROJECT_ROOT"
# shellcheck source=postgres.sh
source "$PROJECT_ROOT/scripts/lib/postgres.sh"

export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
export NEXT_TELEMETRY_DISABLED=1

# Scripts import modules marked server-only; the react-server condition lets them load outside Next.
TSX=(node --conditions=react-server --import tsx)

CHILD_PIDS=()
stop_children() {
  local pid
  for pid in "${CHILD_PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null || true
  done
  for pid in "${CHILD_PIDS[@]:-}"; do
    [ -n "$pid" ] && wait "$pid" 2>/dev/null || true
  done
  CHILD_PIDS=()
}

ensure_node_modules() {
  if [ ! -d node_modules/.bin ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "Installing npm packages…"
    npm ci --no-audit --no-fund
  fi
}

# wait_http URL SECONDS
wait_http() {
  local url=$1 limit=${2:-60} i
  for i in $(seq 1 $((limit * 4))); do
    curl -fsS -o /dev/null "$url" 2>/dev/null && return 0
    sleep 0.25
  done
  echo "Timed out waiting for $url" >&2
  return 1
}

ensure_secret() {
  if [ -z "${NEXTAUTH_SECRET:-}" ]; then
    mkdir -p .data
    [ -s .data/dev-secret ] || head -c 32 /dev/urandom | base64 | tr -d '\n=' > .data/dev-secret
    NEXTAUTH_SECRET=$(cat .data/dev-secret)
    export NEXTAUTH_SECRET
  fi
}

# start_fakes SMTP_PORT MAIL_HTTP_PORT S3_PORT S3_DIR PAY_PORT: the local mail catcher, object store and
# card payment service (which sends its webhooks to $APP_URL, so export APP_URL first).
start_fakes() {
  FAKE_SMTP_PORT=$1 FAKE_MAIL_HTTP_PORT=$2 FAKE_S3_PORT=$3 FAKE_S3_DIR=$4 FAKE_PAY_PORT=$5 "${TSX[@]}" scripts/fakes.ts &
  CHILD_PIDS+=($!)
  export SMTP_HOST=127.0.0.1 SMTP_PORT=$1 MAIL_CATCHER_URL="http://127.0.0.1:$2"
  export S3_ENDPOINT="http://127.0.0.1:$3" S3_FORCE_PATH_STYLE=1 S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER
  export PAYMENTS_API_URL="http://127.0.0.1:$5"
  wait_http "http://127.0.0.1:$2/api/health" 30
  wait_http "http://127.0.0.1:$5/api/health" 30
}
