#!/usr/bin/env bash
# npm stop: stop what `npm start` started: the web server and the SMTP fake by
# their pid files, PostgreSQL with pg_ctl as the cluster's OS user.
set -euo pipefail
# shellcheck source=scripts/lib/load.sh
source "$(dirname "${BASH_SOURCE[0]}")/lib/load.sh"
cd "$TAULINE_ROOT"
ensure_data_dirs

stop_by_pid_file "$RUN_DIR/web.pid" next "web server"
stop_by_pid_file "$RUN_DIR/smtp.pid" smtp-fake "SMTP fake"

if ! find_pg_bin; then
  say "PostgreSQL is not installed: nothing more to stop"
  exit 0
fi
hold_lock cluster 8
resolve_pg_data
match_pg_bin_to_cluster
if lock_is_busy test; then
  # A test run uses the cluster right now; it stops the cluster when it ends.
  touch "$RUN_DIR/pg.stop-requested"
  say "npm test is running: PostgreSQL stops when that run ends"
else
  stop_pg
fi
say "stopped"
