# shellcheck shell=bash
# Clean-up shared by the throwaway runs (npm test, npm run bench, npm run load):
# stop the app and the SMTP fake this run started, drop its database, and stop
# the cluster only when this run started it (or `npm stop` asked while it ran)
# and neither `npm start` nor another run still uses it.

# True while a database of another test, bench or load run lives in the cluster
# (that run joined the cluster; stopping it would pull it from under it).
# other_run_uses_cluster OWN_DB
other_run_uses_cluster() {
  [ -n "$(pg_admin_sql "SELECT 1 FROM pg_database WHERE datname ~ '^tauline_(test|bench|load)_' AND datname <> '$1' LIMIT 1")" ]
}

# stop_run_services LABEL WEB_PID_FILE SMTP_PID_FILE DB DB_CREATED
stop_run_services() {
  local label="$1" web_pid="$2" smtp_pid="$3" db="$4" created="$5"
  stop_by_pid_file "$web_pid" next "$label web server"
  stop_by_pid_file "$smtp_pid" smtp-fake "$label SMTP fake"
  [ -n "${PGDATA_TAULINE:-}" ] || return 0
  hold_lock cluster 8
  if [ "$created" = 1 ]; then
    say "dropping $db"
    drop_database "$db" >/dev/null
  fi
  stop_pg_after_run "$db"
  release_lock 8
}

# stop_pg_after_run OWN_DB
stop_pg_after_run() {
  local requested="$RUN_DIR/pg.stop-requested"
  if [ "${PG_STARTED_HERE:-0}" != 1 ] && [ ! -f "$requested" ]; then
    return 0
  fi
  if read_live_pid "$RUN_DIR/web.pid" next >/dev/null; then
    say "leaving PostgreSQL running for the server that npm start runs"
    return 0
  fi
  if other_run_uses_cluster "$1"; then
    say "leaving PostgreSQL running for another test, bench or load run"
    return 0
  fi
  rm -f "$requested"
  stop_pg
}

# The EXIT trap of scripts/test.sh. Reads the variables test.sh sets:
# web_pid_file, smtp_pid_file, test_db, db_created, test_mail_dir, vitest_status.
# shellcheck disable=SC2154  # assigned in scripts/test.sh
clean_up_test_run() {
  local status=$?
  trap - EXIT INT TERM
  set +e
  stop_run_services test "$web_pid_file" "$smtp_pid_file" "$test_db" "$db_created"
  # The mail of a failed run helps to see why; otherwise it is thrown away.
  if [ "$vitest_status" != 0 ] && [ -n "$(ls -A "$test_mail_dir" 2>/dev/null)" ]; then
    say "kept the mail of this failed run in $test_mail_dir"
  else
    rm -rf "$test_mail_dir"
  fi
  exit "$status"
}
