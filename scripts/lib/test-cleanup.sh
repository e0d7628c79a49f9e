# shellcheck shell=bash
# The EXIT trap of scripts/test.sh. Reads the variables test.sh sets:
# web_pid_file, smtp_pid_file, test_db, db_created, test_mail_dir,
# vitest_status, PG_STARTED_HERE.
# shellcheck disable=SC2154  # assigned in scripts/test.sh

clean_up_test_run() {
  local status=$?
  trap - EXIT INT TERM
  set +e
  stop_by_pid_file "$web_pid_file" next "test web server"
  stop_by_pid_file "$smtp_pid_file" smtp-fake "test SMTP fake"
  if [ -n "${PGDATA_TAULINE:-}" ]; then
    hold_lock cluster 8
    if [ "$db_created" = 1 ]; then
      say "dropping $test_db"
      drop_database "$test_db" >/dev/null
    fi
    stop_pg_after_test
    release_lock 8
  fi
  # The mail of a failed run helps to see why; otherwise it is thrown away.
  if [ "$vitest_status" != 0 ] && [ -n "$(ls -A "$test_mail_dir" 2>/dev/null)" ]; then
    say "kept the mail of this failed run in $test_mail_dir"
  else
    rm -rf "$test_mail_dir"
  fi
  exit "$status"
}

# Stop the cluster when this run started it or `npm stop` asked for it while
# we ran, but never under a running `npm start`.
stop_pg_after_test() {
  local requested="$RUN_DIR/pg.stop-requested"
  if [ "${PG_STARTED_HERE:-0}" != 1 ] && [ ! -f "$requested" ]; then
    return 0
  fi
  rm -f "$requested"
  if read_live_pid "$RUN_DIR/web.pid" next >/dev/null; then
    say "leaving PostgreSQL running for the server that npm start runs"
    return 0
  fi
  stop_pg
}
