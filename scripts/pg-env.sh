# Sourced by the PostgreSQL scripts: works out the cluster's name, port and data directory.
# CLUSTER=dev (npm start, durable) or CLUSTER=test (npm test, fsync off).
ROOT_DIR=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
CLUSTER=${CLUSTER:-dev}
if [ "$CLUSTER" = test ]; then
  PGPORT=${TEST_PGPORT:-54339}
else
  PGPORT=${PGPORT:-54329}
fi
# The postgres user must be able to reach the data directory; a checkout under a 0700 parent
# (such as /root) is not reachable, so the cluster then lives under /var/lib/cyclewright.
pick_data_dir() {
  local inside="$ROOT_DIR/.data/pg-$CLUSTER"
  if id postgres >/dev/null 2>&1 && runuser -u postgres -- test -x "$ROOT_DIR" 2>/dev/null; then
    echo "$inside"
  else
    local tag
    tag=$(printf '%s' "$ROOT_DIR" | sha1sum | cut -c1-10)
    echo "/var/lib/cyclewright/$tag-$CLUSTER"
  fi
}
PGDATA_DIR=${PGDATA_DIR:-$(pick_data_dir)}
pick_pgbin() {
  if [ -f "$PGDATA_DIR/PG_VERSION" ] && [ -x "/usr/lib/postgresql/$(cat "$PGDATA_DIR/PG_VERSION")/bin/pg_ctl" ]; then
    echo "/usr/lib/postgresql/$(cat "$PGDATA_DIR/PG_VERSION")/bin"
  else
    ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1
  fi
}
