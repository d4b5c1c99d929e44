#!/usr/bin/env bash
# Starts a throwaway PostgreSQL server from Debian's packages on 127.0.0.1 for the server-mode
# tests, and prints its URL. Usage: eval "$(scripts/pg-test-server.sh start)"; scripts/pg-test-server.sh stop
set -euo pipefail
PORT="${PG_TEST_PORT:-54329}"
DIR="${PG_TEST_DIR:-/tmp/baywright-pg}"
BIN="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)"
[ -n "$BIN" ] || { echo "PostgreSQL is not installed: apt-get install -y postgresql" >&2; exit 1; }
as_pg() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }

case "${1:-start}" in
  start)
    if [ ! -f "$DIR/PG_VERSION" ]; then
      rm -rf "$DIR"; mkdir -p "$DIR"
      [ "$(id -u)" = 0 ] && chown postgres:postgres "$DIR"
      as_pg "$BIN/initdb" -D "$DIR" -U postgres --auth=trust -E UTF8 >/dev/null
    fi
    as_pg "$BIN/pg_ctl" -D "$DIR" -l "$DIR/server.log" -o "-h 127.0.0.1 -p $PORT -k $DIR -c fsync=off" -w start >/dev/null
    echo "export TEST_DATABASE_URL=postgres://postgres@127.0.0.1:$PORT/postgres"
    ;;
  stop)
    as_pg "$BIN/pg_ctl" -D "$DIR" -m fast -w stop >/dev/null || true
    ;;
esac
