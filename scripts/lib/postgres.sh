# shellcheck shell=bash
# A PostgreSQL cluster of the project's own: data folder inside the project
# (or under /tmp when the `postgres` OS user cannot reach it), listening on
# 127.0.0.1:$PGPORT_TAULINE only, unix socket inside the data folder.

# Sets PG_BIN to a folder holding initdb, pg_ctl and psql of one version;
# installs Debian's postgresql package when none is found.
find_pg_bin() {
  local candidate installed
  # Newest Debian-packaged version first.
  installed="$(printf '%s\n' /usr/lib/postgresql/*/bin/pg_ctl | sort -V -r)"
  for candidate in "$(command -v pg_ctl 2>/dev/null)" $installed; do
    [ -e "$candidate" ] || continue
    candidate="$(dirname "$(readlink -f "$candidate")")"
    if [ -x "$candidate/initdb" ] && [ -x "$candidate/pg_ctl" ] && [ -x "$candidate/psql" ]; then
      PG_BIN="$candidate"
      return 0
    fi
  done
  return 1
}

ensure_pg_bin() {
  find_pg_bin && return 0
  say "PostgreSQL (initdb/pg_ctl) not found"
  apt_install postgresql
  find_pg_bin || die "postgresql was installed but initdb/pg_ctl are still not found"
}

# The OS user that owns and runs the cluster: PostgreSQL refuses to run as
# root, so root hands it to `postgres`; anyone else runs it as themselves.
pg_os_user() {
  if is_root; then echo postgres; else id -un; fi
}

# Run a command as the cluster's OS user, from / (the project folder may be
# closed to that user, and PostgreSQL tools complain about an unreadable cwd).
as_pg() {
  if is_root; then
    (cd / && runuser -u postgres -- "$@")
  else
    (cd / && "$@")
  fi
}

# True when the cluster's OS user can enter folder $1 (and so every parent).
pg_user_can_enter() {
  if is_root; then
    # shellcheck disable=SC2016  # $1 expands in the inner shell
    runuser -u postgres -- /bin/sh -c 'test -x "$1"' sh "$1" 2>/dev/null
  else
    test -x "$1"
  fi
}

# Sets PGDATA_TAULINE. Prefers .data/pg; falls back to /tmp/tauline-<hash of
# the project path>/pg when the OS user cannot get there (a clone under
# /root, for example) or when the socket path would be too long (a unix socket
# path is limited to 107 bytes).
resolve_pg_data() {
  ensure_data_dirs
  local preferred="$DATA_DIR/pg" socket_len
  socket_len=$(( ${#preferred} + ${#PGPORT_TAULINE} + 10 ))
  if [ "$socket_len" -lt 100 ] && pg_user_can_enter "$DATA_DIR"; then
    PGDATA_TAULINE="$preferred"
    return 0
  fi
  local hash
  hash="$(printf '%s' "$TAULINE_ROOT" | sha256sum | cut -c1-12)"
  PGDATA_TAULINE="/tmp/tauline-$hash/pg"
  if [ ! -d "$PGDATA_TAULINE" ]; then
    say "the $(pg_os_user) user cannot use $preferred: cluster goes to $PGDATA_TAULINE"
  fi
  mkdir -p "/tmp/tauline-$hash"
  chmod 0755 "/tmp/tauline-$hash"
  printf '%s\n' "$TAULINE_ROOT" >"/tmp/tauline-$hash/project-path"
}

pg_is_running() {
  [ -f "$PGDATA_TAULINE/PG_VERSION" ] && as_pg "$PG_BIN/pg_ctl" status -D "$PGDATA_TAULINE" >/dev/null 2>&1
}
