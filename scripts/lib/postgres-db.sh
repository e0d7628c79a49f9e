# shellcheck shell=bash
# Roles and databases inside the project's cluster, administered as the
# cluster's superuser over the unix socket in the data folder.

pg_admin_sql() {
  as_pg "$PG_BIN/psql" -h "$PGDATA_TAULINE" -p "$PGPORT_TAULINE" -U postgres -d postgres \
    -X -q -t -A -v ON_ERROR_STOP=1 -c "$1"
}

# Database names go into SQL unquoted-safe only when they are plain.
check_db_name() {
  [[ "$1" =~ ^[a-z][a-z0-9_]*$ ]] || die "database name '$1' must match ^[a-z][a-z0-9_]*\$"
}

# The application role: may log in and create databases, not a superuser.
ensure_app_role() {
  pg_admin_sql "DO \$\$ BEGIN
    IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = '$TAULINE_DB_ROLE') THEN
      CREATE ROLE $TAULINE_DB_ROLE LOGIN CREATEDB;
    END IF;
  END \$\$;"
}

ensure_database() {
  local name="$1"
  check_db_name "$name"
  if [ -z "$(pg_admin_sql "SELECT 1 FROM pg_database WHERE datname = '$name'")" ]; then
    say "creating database $name"
    pg_admin_sql "CREATE DATABASE $name OWNER $TAULINE_DB_ROLE"
  fi
}

# FORCE ends leftover sessions (a test pool that did not close) first.
drop_database() {
  local name="$1"
  check_db_name "$name"
  pg_admin_sql "DROP DATABASE IF EXISTS $name WITH (FORCE)"
}

database_url() {
  echo "postgres://$TAULINE_DB_ROLE@127.0.0.1:$PGPORT_TAULINE/$1"
}
