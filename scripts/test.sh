#!/usr/bin/env bash
# npm test: the same bootstrap as npm start, but on a throwaway database, its
# own ports and mail folder, and a build of its own (NEXT_DIST_DIR), then the
# whole vitest suite (unit, integration, browser). Everything this run starts
# is stopped and the database dropped on exit, whatever happens; the exit code
# is vitest's. Extra arguments go to vitest (e.g. npm test -- tests/unit).
set -euo pipefail
# shellcheck source=scripts/lib/load.sh
source "$(dirname "${BASH_SOURCE[0]}")/lib/load.sh"
cd "$TAULINE_ROOT"

ensure_data_dirs
# One test run at a time per checkout: they share ports and the test build.
hold_lock test 9
ensure_node_modules
ensure_chromium
ensure_pg_bin

test_db="tauline_test_$$"
test_mail_dir="$DATA_DIR/test-mail-$$"
web_pid_file="$RUN_DIR/test-web.pid"
smtp_pid_file="$RUN_DIR/test-smtp.pid"
db_created=0
vitest_status=1

# shellcheck source=scripts/lib/run-cleanup.sh
source "$TAULINE_ROOT/scripts/lib/run-cleanup.sh"
trap clean_up_test_run EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

hold_lock cluster 8
resolve_pg_data
ensure_pg_running
ensure_app_role
ensure_database "$test_db"
db_created=1
release_lock 8

export_app_env "$TAULINE_TEST_PORT" "$TAULINE_TEST_SMTP_PORT" "$test_db" "$test_mail_dir"
# A separate build folder: building into .next would pull the files from
# under a server that `npm start` runs. Inside .data, which git ignores.
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.data/next-test}"

# The mail tests stop and restart the fake (tests/helpers/smtp-fake.ts) and
# write the new pid here, so the clean-up above still stops it.
export TAULINE_SMTP_PID_FILE="$smtp_pid_file"
migrate_seed_and_serve test "$smtp_pid_file" "$web_pid_file"

export TAULINE_TEST_URL="$APP_URL"
say "running vitest against $TAULINE_TEST_URL"
set +e
./node_modules/.bin/vitest run "$@"
vitest_status=$?
set -e
exit "$vitest_status"
