#!/usr/bin/env bash
# npm run load: CI clients posting submissions and signed-in readers at the same
# time against a production build (issue 6), then a database check that every
# acknowledged run, and nothing else, was stored. Bootstraps like npm test: a
# throwaway database on the project's cluster, the SMTP fake, a build of its own
# and ports of its own, so it can run beside npm start, npm test and npm run
# bench. Everything it starts is stopped and the database dropped on exit.
# Arguments go to scripts/load/main.ts (npm run load -- --duration 5).
# Exit code 0 only when there were no errors and the database check passed.
set -euo pipefail
: "${TAULINE_LOAD_PORT:=3500}"
# The bench's PostgreSQL port when the cluster has to be started: a clean
# clone's npm test elsewhere on this machine may hold 54329.
: "${PGPORT_TAULINE:=54339}"
: "${TAULINE_LOAD_SMTP_PORT:=2529}"
# shellcheck source=scripts/lib/load.sh
source "$(dirname "${BASH_SOURCE[0]}")/lib/load.sh"
cd "$TAULINE_ROOT"
# Usage needs no database, build or server.
case " $* " in
  *" --help "*) exec ./node_modules/.bin/tsx --conditions=react-server scripts/load/main.ts --help ;;
esac

ensure_data_dirs
# One load run at a time per checkout (they share the ports and the build).
hold_lock load 9
ensure_node_modules
ensure_pg_bin

load_db="tauline_load_$$"
load_mail_dir="$DATA_DIR/load-mail-$$"
web_pid_file="$RUN_DIR/load-web.pid"
smtp_pid_file="$RUN_DIR/load-smtp.pid"
db_created=0
PG_STARTED_HERE=0

# shellcheck source=scripts/lib/run-cleanup.sh
source "$TAULINE_ROOT/scripts/lib/run-cleanup.sh"
clean_up_load() {
  local status=$?
  trap - EXIT INT TERM
  set +e
  stop_run_services load "$web_pid_file" "$smtp_pid_file" "$load_db" "$db_created"
  rm -rf "$load_mail_dir"
  exit "$status"
}
trap clean_up_load EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

hold_lock cluster 8
resolve_pg_data
ensure_pg_bin
# Join the cluster on whatever port it already runs on (npm test starts it on
# 54329, npm run bench on 54339) instead of refusing to run beside them.
if pg_is_running; then
  match_pg_bin_to_cluster
  PGPORT_TAULINE="$(running_pg_port)"
fi
export PGPORT_TAULINE
ensure_pg_running
ensure_app_role
ensure_database "$load_db"
db_created=1
release_lock 8

export_app_env "$TAULINE_LOAD_PORT" "$TAULINE_LOAD_SMTP_PORT" "$load_db" "$load_mail_dir"
# A build folder of its own, inside .data (git-ignored).
export NEXT_DIST_DIR="${TAULINE_LOAD_DIST_DIR:-.data/next-load}"

migrate_seed_and_serve load "$smtp_pid_file" "$web_pid_file"

# For the server's peak memory in the report.
export LOAD_WEB_PID
LOAD_WEB_PID="$(cat "$web_pid_file")"
say "running the load against $APP_URL (server log: $RUN_DIR/load-web.log)"
./node_modules/.bin/tsx --conditions=react-server scripts/load/main.ts "$@"
