#!/usr/bin/env bash
# A throw-away PostgreSQL server for the server-side tests: data and socket under /tmp, loopback only.
#   source scripts/test-postgres.sh start   # exports TEST_DATABASE_URL
#   bash scripts/test-postgres.sh stop
# Needs Debian's `postgresql` package and root (the server runs as the postgres user).
set -u
PG_PORT="${TEST_PG_PORT:-55432}"
PG_DIR="${TEST_PG_DIR:-/tmp/sidewise-test-pg}"
PG_BIN="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)"

case "${1:-}" in
  start)
    if [ -z "$PG_BIN" ]; then echo "PostgreSQL is not installed: apt-get install -y postgresql" >&2; return 1 2>/dev/null || exit 1; fi
    rm -rf "$PG_DIR" && mkdir -p "$PG_DIR" && chown postgres:postgres "$PG_DIR"
    runuser -u postgres -- "$PG_BIN/initdb" -D "$PG_DIR/data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    runuser -u postgres -- "$PG_BIN/pg_ctl" -D "$PG_DIR/data" -l "$PG_DIR/server.log" -w \
      -o "-c listen_addresses=127.0.0.1 -p $PG_PORT -k $PG_DIR -c fsync=off -c synchronous_commit=off" start >/dev/null
    export TEST_DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/postgres"
    echo "PostgreSQL $("$PG_BIN/postgres" --version | awk '{print $3}') test server on 127.0.0.1:$PG_PORT"
    ;;
  stop)
    [ -n "$PG_BIN" ] && [ -d "$PG_DIR/data" ] && runuser -u postgres -- "$PG_BIN/pg_ctl" -D "$PG_DIR/data" -m fast -w stop >/dev/null
    rm -rf "$PG_DIR"
    ;;
  *)
    echo "usage: scripts/test-postgres.sh start|stop" >&2
    ;;
esac
