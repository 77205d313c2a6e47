#!/usr/bin/env bash
# Starts a throwaway PostgreSQL cluster on loopback for the API tests and prints its URL.
#   scripts/pg-cluster.sh start [DIR] [PORT]   -> prints postgresql://... on stdout
#   scripts/pg-cluster.sh stop  [DIR]
# Needs Debian's postgresql package. Runs the server as the `postgres` user when root.
set -euo pipefail
cmd=${1:-start}
dir=${2:-/tmp/gaugeproof-pg}
port=${3:-55432}
bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
[ -n "$bin" ] || { echo "PostgreSQL is not installed (apt-get install -y postgresql)" >&2; exit 1; }
as_pg() { if [ "$(id -u)" = 0 ]; then su postgres -s /bin/bash -c "$*"; else bash -c "$*"; fi; }
case "$cmd" in
  start)
    if [ ! -f "$dir/PG_VERSION" ]; then
      mkdir -p "$dir"
      [ "$(id -u)" = 0 ] && chown postgres "$dir"
      as_pg "$bin/initdb -D '$dir' -U gaugeproof --auth=trust -E UTF8 --no-locale" > /dev/null
    fi
    as_pg "$bin/pg_ctl -D '$dir' -l '$dir/server.log' -w -o \"-k /tmp -p $port -c listen_addresses=127.0.0.1 -c fsync=off\" start" > /dev/null
    echo "postgresql://gaugeproof@127.0.0.1:$port/postgres"
    ;;
  stop)
    as_pg "$bin/pg_ctl -D '$dir' -m fast stop" > /dev/null || true
    ;;
  *) echo "usage: $0 start|stop [DIR] [PORT]" >&2; exit 2 ;;
esac
