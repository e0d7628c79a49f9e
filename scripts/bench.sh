#!/usr/bin/env bash
# npm run bench: measures ingest, trend, build view and the analysis kernels
# against their floors (issue 5). Bootstraps like npm test: a throwaway
# database, the test build, the app on its own port; prints a table and writes
# bench-results/latest.json. Everything it starts is stopped and the database
# dropped on exit. Measurement only: no target is asserted here.
set -euo pipefail
# The bench uses its own ports so it can run beside `npm start`; a PostgreSQL
# port of its own too, because a clone elsewhere (CI check) may hold 54329.
: "${PGPORT_TAULINE:=54339}"
: "${TAULINE_BENCH_PORT:=3200}"
: "${TAULINE_BENCH_SMTP_PORT:=2527}"
export PGPORT_TAULINE
# shellcheck source=scripts/lib/load.sh
source "$(dirname "${BASH_SOURCE[0]}")/lib/load.sh"
cd "$TAULINE_ROOT"

ensure_data_dirs
# The bench reuses the test build (.data/next-test): building into a folder of
# its own would make next rewrite tsconfig.json. So it holds the test lock and
# never runs beside npm test in the same checkout.
hold_lock test 9
ensure_node_modules
ensure_pg_bin

bench_db="tauline_bench_$$"
bench_mail_dir="$DATA_DIR/bench-mail-$$"
web_pid_file="$RUN_DIR/bench-web.pid"
smtp_pid_file="$RUN_DIR/bench-smtp.pid"
db_created=0
PG_STARTED_HERE=0

# shellcheck source=scripts/lib/run-cleanup.sh
source "$TAULINE_ROOT/scripts/lib/run-cleanup.sh"
clean_up_bench() {
  local status=$?
  trap - EXIT INT TERM
  set +e
  stop_run_services bench "$web_pid_file" "$smtp_pid_file" "$bench_db" "$db_created"
  rm -rf "$bench_mail_dir"
  exit "$status"
}
trap clean_up_bench EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

hold_lock cluster 8
resolve_pg_data
ensure_pg_running
ensure_app_role
ensure_database "$bench_db"
db_created=1
release_lock 8

export_app_env "$TAULINE_BENCH_PORT" "$TAULINE_BENCH_SMTP_PORT" "$bench_db" "$bench_mail_dir"
export NEXT_DIST_DIR=.data/next-test

migrate_seed_and_serve bench "$smtp_pid_file" "$web_pid_file"

# What the bench program needs beyond the app's environment: the server's pid
# (for its peak RSS) and a superuser connection over the cluster's socket
# (statement logging for the build-view count is a superuser setting).
export BENCH_WEB_PID
BENCH_WEB_PID="$(cat "$web_pid_file")"
export BENCH_ADMIN_DATABASE_URL="postgres://postgres@localhost/$bench_db?host=$PGDATA_TAULINE&port=$PGPORT_TAULINE"
export BENCH_PG_LOG="$PGDATA_TAULINE/server.log"
say "running the bench against $APP_URL"
./node_modules/.bin/tsx --conditions=react-server scripts/bench/main.ts "$@"
