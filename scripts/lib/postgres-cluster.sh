# shellcheck shell=bash
# Create, configure, start and stop the project's cluster (see postgres.sh for
# where it lives and who runs it).

# A cluster made by another major version needs that version's binaries.
match_pg_bin_to_cluster() {
  [ -f "$PGDATA_TAULINE/PG_VERSION" ] || return 0
  local version
  version="$(cat "$PGDATA_TAULINE/PG_VERSION")"
  if [ -x "/usr/lib/postgresql/$version/bin/pg_ctl" ]; then
    PG_BIN="/usr/lib/postgresql/$version/bin"
  elif ! "$PG_BIN/pg_ctl" --version | grep -q " $version"; then
    die "cluster $PGDATA_TAULINE is PostgreSQL $version but only $("$PG_BIN/pg_ctl" --version) is installed; remove that folder to start afresh"
  fi
}

init_pg_cluster() {
  [ -f "$PGDATA_TAULINE/PG_VERSION" ] && return 0
  say "creating a PostgreSQL cluster in $PGDATA_TAULINE"
  mkdir -p "$PGDATA_TAULINE"
  if is_root; then chown postgres:postgres "$PGDATA_TAULINE"; fi
  chmod 0700 "$PGDATA_TAULINE"
  # Locale C: identical sorting on every machine, no dependency on which
  # locales the OS happens to have generated.
  as_pg "$PG_BIN/initdb" -D "$PGDATA_TAULINE" -U postgres -E UTF8 --locale=C \
    --auth-local=trust --auth-host=reject --no-instructions >/dev/null
  # Development/test cluster only, so trust is acceptable here: the server
  # listens on 127.0.0.1 only; the socket lives in the 0700 data folder, which
  # only the cluster's OS user (and root) can enter; over TCP only the
  # non-superuser role `tauline` is let in, without a password.
  as_pg tee "$PGDATA_TAULINE/pg_hba.conf" >/dev/null <<HBA
# Written by scripts/lib/postgres-cluster.sh (development/test cluster).
local all all              trust
host  all $TAULINE_DB_ROLE 127.0.0.1/32 trust
HBA
  echo "include_if_exists = 'tauline.conf'" | as_pg tee -a "$PGDATA_TAULINE/postgresql.conf" >/dev/null
}

# Rewritten before every start so a changed PGPORT_TAULINE takes effect.
write_pg_settings() {
  as_pg tee "$PGDATA_TAULINE/tauline.conf" >/dev/null <<CONF
# Written by scripts/lib/postgres-cluster.sh before each start.
listen_addresses = '127.0.0.1'
port = $PGPORT_TAULINE
unix_socket_directories = '$PGDATA_TAULINE'
# Development/test speed: a crash may lose the last few commits, never
# corrupts the cluster (unlike fsync = off).
synchronous_commit = off
CONF
}

# The port a running cluster really listens on (line 4 of postmaster.pid).
running_pg_port() {
  as_pg sed -n 4p "$PGDATA_TAULINE/postmaster.pid"
}

# Starts the cluster unless it runs. Sets PG_STARTED_HERE=1 when it started it.
# shellcheck disable=SC2034  # PG_STARTED_HERE is read by run-cleanup.sh
ensure_pg_running() {
  PG_STARTED_HERE=0
  match_pg_bin_to_cluster
  init_pg_cluster
  if pg_is_running; then
    local port
    port="$(running_pg_port)"
    [ "$port" = "$PGPORT_TAULINE" ] ||
      die "the cluster in $PGDATA_TAULINE runs on port $port, not $PGPORT_TAULINE: run npm stop first"
    return 0
  fi
  port_in_use "$PGPORT_TAULINE" &&
    die "port $PGPORT_TAULINE is taken by another program: set PGPORT_TAULINE to a free port"
  write_pg_settings
  say "starting PostgreSQL on 127.0.0.1:$PGPORT_TAULINE (log: $PGDATA_TAULINE/server.log)"
  # setsid: the server must not receive the terminal's Ctrl-C meant for us.
  if ! as_pg setsid -w "$PG_BIN/pg_ctl" start -D "$PGDATA_TAULINE" \
    -l "$PGDATA_TAULINE/server.log" -w -t 60 -s 8>&- 9>&-; then
    show_log_tail "$PGDATA_TAULINE/server.log"
    die "PostgreSQL did not start"
  fi
  PG_STARTED_HERE=1
}

stop_pg() {
  if pg_is_running; then
    say "stopping PostgreSQL ($PGDATA_TAULINE)"
    as_pg "$PG_BIN/pg_ctl" stop -D "$PGDATA_TAULINE" -m fast -w -t 60 -s
  fi
}
