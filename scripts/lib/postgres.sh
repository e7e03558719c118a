# PostgreSQL helpers, sourced by the start and test scripts.
# A project-local cluster on 127.0.0.1, run as the postgres system user when the caller is root
# (PostgreSQL refuses to run as root). DATABASE_URL, when set, bypasses all of this.

pg_bin_dir() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)
  if [ -z "$d" ] || [ ! -x "$d/initdb" ]; then
    echo "PostgreSQL is not installed; installing Debian's package…" >&2
    local sudo=""
    [ "$(id -u)" -eq 0 ] || sudo="sudo"
    $sudo apt-get update -qq >&2 && DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq postgresql >&2 || {
      echo "Could not install PostgreSQL. Install the 'postgresql' package, or set DATABASE_URL." >&2
      return 1
    }
    d=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)
  fi
  echo "$d"
}

# as_pg CMD...: run a command as the cluster's owner.
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

# pg_data_dir NAME: the cluster's folder. Inside the project when the owner can reach it, else in /tmp.
pg_data_dir() {
  local name=$1
  local dir="$PROJECT_ROOT/.data/pg-$name"
  mkdir -p "$PROJECT_ROOT/.data"
  if [ "$(id -u)" -eq 0 ] && ! runuser -u postgres -- test -x "$PROJECT_ROOT/.data"; then
    dir="/tmp/tankwright-$(echo "$PROJECT_ROOT" | md5sum | cut -c1-8)-$name"
  fi
  echo "$dir"
}

# pg_up NAME PORT [fast]: init (first time) and start a cluster; sets PG_STARTED_DIR when this call started it.
pg_up() {
  local name=$1 port=$2 mode=${3:-}
  local bin dir
  bin=$(pg_bin_dir) || return 1
  dir=$(pg_data_dir "$name")
  PG_BIN=$bin
  if [ ! -f "$dir/PG_VERSION" ]; then
    mkdir -p "$dir"
    [ "$(id -u)" -eq 0 ] && chown postgres: "$dir"
    chmod 700 "$dir"
    as_pg "$bin/initdb" -D "$dir" -U tankwright --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null || return 1
    {
      echo "listen_addresses = '127.0.0.1'"
      echo "unix_socket_directories = ''"
      echo "max_connections = 200"
      if [ "$mode" = fast ]; then
        echo "fsync = off"
        echo "synchronous_commit = off"
        echo "full_page_writes = off"
      fi
    } | as_pg tee -a "$dir/postgresql.conf" >/dev/null
  fi
  if as_pg "$bin/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    echo "PostgreSQL ($name) is already running on port $port." >&2
  else
    as_pg "$bin/pg_ctl" -D "$dir" -o "-p $port" -l "$dir/server.log" -w -t 60 start >/dev/null || {
      echo "PostgreSQL did not start; see $dir/server.log" >&2
      return 1
    }
    PG_STARTED_DIR=$dir
  fi
  local i
  for i in $(seq 1 60); do
    "$bin/pg_isready" -h 127.0.0.1 -p "$port" -q && return 0
    sleep 0.5
  done
  echo "PostgreSQL did not become ready on port $port." >&2
  return 1
}

pg_down() {
  if [ -n "${PG_STARTED_DIR:-}" ]; then
    as_pg "$PG_BIN/pg_ctl" -D "$PG_STARTED_DIR" -m fast -w stop >/dev/null 2>&1 || true
    PG_STARTED_DIR=""
  fi
}

# pg_createdb PORT NAME [fresh]: create a database, dropping it first when asked.
pg_createdb() {
  local port=$1 name=$2 fresh=${3:-}
  local url="postgres://tankwright@127.0.0.1:$port/postgres"
  if [ "$fresh" = fresh ]; then
    "$PG_BIN/psql" -q "$url" -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)" >/dev/null || return 1
  fi
  "$PG_BIN/psql" -qtA "$url" -c "SELECT 1 FROM pg_database WHERE datname = '$name'" | grep -q 1 ||
    "$PG_BIN/psql" -q "$url" -c "CREATE DATABASE \"$name\"" >/dev/null
}
