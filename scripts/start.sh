#!/usr/bin/env bash
# npm start: bring up everything the app needs on this machine, then serve it
# at http://127.0.0.1:$PORT in the background and return. Idempotent: what
# already runs is kept. `npm stop` stops all of it.
set -euo pipefail
# shellcheck source=scripts/lib/load.sh
source "$(dirname "${BASH_SOURCE[0]}")/lib/load.sh"
cd "$TAULINE_ROOT"

ensure_data_dirs
hold_lock start 9
ensure_node_modules
ensure_pg_bin

hold_lock cluster 8
resolve_pg_data
ensure_pg_running
ensure_app_role
ensure_database "$TAULINE_DB_NAME"
release_lock 8

export_app_env "$PORT" "$SMTP_PORT" "$TAULINE_DB_NAME" "$DATA_DIR/mail"
say "migrating $TAULINE_DB_NAME"
npm run --silent db:migrate
say "seeding $TAULINE_DB_NAME (only what is missing)"
npm run --silent db:seed

start_smtp_fake "$RUN_DIR/smtp.pid" "$RUN_DIR/smtp.log"

# A server that runs on an up-to-date build is kept; otherwise it is stopped
# before the build, because `next build` rewrites the folder it serves from.
web_pid_file="$RUN_DIR/web.pid"
if web_pid="$(read_live_pid "$web_pid_file" next)" && build_is_fresh; then
  say "web server already running (pid $web_pid) on an up-to-date build"
else
  stop_by_pid_file "$web_pid_file" next "web server"
  build_web
  : >"$RUN_DIR/web.log"
  start_web "$web_pid_file" "$RUN_DIR/web.log"
fi

print_welcome
