#!/usr/bin/env bash
# A throwaway PostgreSQL server on loopback, for trying the shared database and for the PostgreSQL half of the tests.
#
#   scripts/test-server.sh start    # initdb a new cluster, start it, create a role and a database
#   scripts/test-server.sh stop     # stop it and delete its folder
#   source "$(scripts/test-server.sh env)"   # point the tests (and a shell) at it
#
# It uses Debian's postgresql package (`apt-get install postgresql`; the script does not install it). initdb refuses to
# run as root, so as root the cluster runs as the `postgres` user the package creates. The role's password is random,
# kept in a .pgpass file of the cluster's folder (PGPASSFILE points at it): it never appears on a command line.
#
# Settings (environment): TRIPTESTLOG_PG_DIR (default /tmp/triptestlog-pg), TRIPTESTLOG_PG_PORT (default 55432),
# TRIPTESTLOG_PG_FSYNC (default off: a throwaway server need not survive a power cut; on for the benchmark).
set -euo pipefail

dir=${TRIPTESTLOG_PG_DIR:-/tmp/triptestlog-pg}
port=${TRIPTESTLOG_PG_PORT:-55432}
role=triptestlog
database=triptestlog

bin_dir() {
  if command -v pg_config >/dev/null 2>&1 && [ -x "$(pg_config --bindir)/initdb" ]; then
    pg_config --bindir
    return
  fi
  local newest
  newest=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  if [ -z "$newest" ] || [ ! -x "$newest/initdb" ]; then
    echo "error: PostgreSQL's server programs are not installed (apt-get install postgresql)" >&2
    exit 1
  fi
  echo "$newest"
}

# Runs a server program as a non-root user: initdb and postgres refuse root.
as_owner() {
  if [ "$(id -u)" -eq 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

start() {
  local bin
  bin=$(bin_dir)
  if [ -f "$dir/data/postmaster.pid" ]; then
    echo "a test server is already running in $dir (scripts/test-server.sh stop ends it)" >&2
    exit 1
  fi
  rm -rf "$dir"
  mkdir -p "$dir/socket"
  local superuser_password role_password
  superuser_password=$(head -c 24 /dev/urandom | od -An -tx1 | tr -d ' \n')
  role_password=$(head -c 24 /dev/urandom | od -An -tx1 | tr -d ' \n')
  printf '%s\n' "$superuser_password" >"$dir/superuser-password"
  chmod 600 "$dir/superuser-password"
  [ "$(id -u)" -eq 0 ] && chown -R postgres "$dir"

  as_owner "$bin/initdb" -D "$dir/data" -U postgres -E UTF8 --locale=C.UTF-8 \
    --auth-local=trust --auth-host=scram-sha-256 --pwfile="$dir/superuser-password" >"$dir/initdb.log"
  as_owner "$bin/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
    -o "-p $port -k $dir/socket -c listen_addresses=127.0.0.1 -c max_connections=200 -c fsync=${TRIPTESTLOG_PG_FSYNC:-off}" start >/dev/null

  # Over the Unix socket (trust, the cluster owner only): a role and its database. The password goes in on stdin.
  as_owner "$bin/psql" -q -v ON_ERROR_STOP=1 -h "$dir/socket" -p "$port" -U postgres -d postgres >/dev/null <<SQL
CREATE ROLE $role LOGIN CREATEDB CREATEROLE PASSWORD '$role_password';
CREATE DATABASE $database OWNER $role;
SQL

  umask 077
  printf '127.0.0.1:%s:*:%s:%s\n' "$port" "$role" "$role_password" >"$dir/pgpass"
  [ "$(id -u)" -eq 0 ] && chown "$(id -un)" "$dir/pgpass"
  cat >"$dir/env" <<ENV
export PGPASSFILE='$dir/pgpass'
export TRIPTESTLOG_TEST_PG='Host=127.0.0.1;Port=$port;Username=$role;Database=$database'
ENV
  chmod 644 "$dir/env"
  echo "PostgreSQL $("$bin/postgres" --version | awk '{print $3}') on 127.0.0.1:$port, database $database, role $role"
  echo "point a shell at it: source $dir/env"
}

stop() {
  local bin
  bin=$(bin_dir)
  if [ -f "$dir/data/postmaster.pid" ]; then
    as_owner "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null || true
  fi
  rm -rf "$dir"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  env) echo "$dir/env" ;;
  *) echo "usage: scripts/test-server.sh start|stop|env" >&2; exit 2 ;;
esac
