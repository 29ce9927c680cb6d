#!/usr/bin/env bash
# Stops the project's PostgreSQL cluster (CLUSTER=dev by default, or test).
set -euo pipefail
source "$(dirname "$0")/pg-env.sh"
PGBIN=$(pick_pgbin)
if [ -n "$PGBIN" ] && [ -f "$PGDATA_DIR/PG_VERSION" ]; then
  (cd / && runuser -u postgres -- "$PGBIN/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null 2>&1) || true
  echo "PostgreSQL ($CLUSTER) stopped"
fi
