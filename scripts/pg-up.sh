#!/usr/bin/env bash
# Installs PostgreSQL from Debian's packages if missing, then starts a project-owned cluster on
# 127.0.0.1 and creates the app role and database. Idempotent: a second run only checks.
set -euo pipefail
source "$(dirname "$0")/pg-env.sh"
DB_NAME=${DB_NAME:-app}

if ! ls /usr/lib/postgresql/*/bin/pg_ctl >/dev/null 2>&1; then
  echo "Installing PostgreSQL from Debian's packages…"
  mkdir -p /etc/postgresql-common/createcluster.d
  echo 'create_main_cluster = false' > /etc/postgresql-common/createcluster.d/50-no-main.conf
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends postgresql >/dev/null
fi
PGBIN=$(pick_pgbin)

if [ ! -f "$PGDATA_DIR/PG_VERSION" ]; then
  mkdir -p "$PGDATA_DIR"
  chown postgres:postgres "$PGDATA_DIR"
  chmod 700 "$PGDATA_DIR"
  (cd / && runuser -u postgres -- "$PGBIN/initdb" -D "$PGDATA_DIR" -U postgres -E UTF8 \
    --locale=C.UTF-8 --auth-local=trust --auth-host=scram-sha-256 >/dev/null)
  echo "include_if_exists = 'project.conf'" >> "$PGDATA_DIR/postgresql.conf"
fi

{
  echo "listen_addresses = '127.0.0.1'"
  echo "port = $PGPORT"
  echo "unix_socket_directories = '$PGDATA_DIR'"
  if [ "$CLUSTER" = test ]; then
    # Throw-away test data only: the dev cluster keeps PostgreSQL's durable defaults.
    echo "fsync = off"; echo "synchronous_commit = off"; echo "full_page_writes = off"
  fi
} > "$PGDATA_DIR/project.conf"
chown postgres:postgres "$PGDATA_DIR/project.conf"

if ! (cd / && runuser -u postgres -- "$PGBIN/pg_ctl" -D "$PGDATA_DIR" status >/dev/null 2>&1); then
  if "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$PGPORT"; then
    echo "Port $PGPORT is taken by another PostgreSQL; set PGPORT (or TEST_PGPORT) to a free port." >&2
    exit 1
  fi
  (cd / && runuser -u postgres -- "$PGBIN/pg_ctl" -D "$PGDATA_DIR" -l "$PGDATA_DIR/server.log" -w -t 60 start >/dev/null)
fi

psql_admin() { (cd / && runuser -u postgres -- psql -h "$PGDATA_DIR" -p "$PGPORT" -U postgres -v ON_ERROR_STOP=1 -qtA "$@"); }
if [ -z "$(psql_admin -c "select 1 from pg_roles where rolname='app'")" ]; then
  psql_admin -c "create role app login password 'app' createdb"
fi
if [ -z "$(psql_admin -c "select 1 from pg_database where datname='$DB_NAME'")" ]; then
  psql_admin -c "create database \"$DB_NAME\" owner app"
fi
echo "PostgreSQL ($CLUSTER) on 127.0.0.1:$PGPORT, database $DB_NAME, data in $PGDATA_DIR"
