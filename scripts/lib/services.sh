# shellcheck shell=bash
# The SMTP fake and the Next.js server as background services.
# Both read the environment exported by export_app_env.

# start_smtp_fake PID_FILE LOG_FILE
start_smtp_fake() {
  local pid_file="$1" log_file="$2" pid
  if pid="$(read_live_pid "$pid_file" smtp-fake)"; then
    say "SMTP fake already running (pid $pid) on 127.0.0.1:$SMTP_PORT"
    return 0
  fi
  port_in_use "$SMTP_PORT" && die "port $SMTP_PORT is taken by another program: set SMTP_PORT to a free port"
  mkdir -p "$MAIL_DIR"
  # `node --import tsx` keeps the fake in one process (the tsx CLI would add a
  # parent process in front of it).
  start_detached "$pid_file" "$log_file" node --import tsx scripts/smtp-fake.ts
  wait_for_port "$SMTP_PORT" 20 "$pid_file" "$log_file" "SMTP fake"
  say "SMTP fake listening on 127.0.0.1:$SMTP_PORT, writing to $MAIL_DIR"
}

# wait_for_port PORT SECONDS PID_FILE LOG_FILE NAME
wait_for_port() {
  local port="$1" limit=$(($2 * 10)) pid_file="$3" log_file="$4" name="$5" waited=0
  until port_in_use "$port"; do
    if ! kill -0 "$(cat "$pid_file")" 2>/dev/null; then
      show_log_tail "$log_file"
      die "$name exited before listening on port $port"
    fi
    [ "$waited" -lt "$limit" ] || { show_log_tail "$log_file"; die "$name did not listen on port $port in $2 s"; }
    sleep 0.1
    waited=$((waited + 1))
  done
}

# True when the build in $NEXT_DIST_DIR (default .next) is newer than every
# file that goes into it. Tests, data and dependencies' own folders are left
# out; package-lock.json stands for the dependencies.
build_is_fresh() {
  local dist="${NEXT_DIST_DIR:-.next}"
  local build_id="$TAULINE_ROOT/$dist/BUILD_ID"
  [ -f "$build_id" ] || return 1
  local newer
  newer="$(cd "$TAULINE_ROOT" && find . \
    \( -path ./node_modules -o -path ./.git -o -path ./.data -o -path "./.next*" \
       -o -path ./tests -o -path ./test-results -o -path ./scripts -o -path ./.ci \) -prune \
    -o -type f -newer "$build_id" -print -quit)"
  [ -z "$newer" ]
}

build_web() {
  if build_is_fresh; then
    say "Next.js build in ${NEXT_DIST_DIR:-.next} is newer than every source file: not rebuilding"
    return 0
  fi
  say "building the app (next build${NEXT_DIST_DIR:+, into $NEXT_DIST_DIR})"
  (cd "$TAULINE_ROOT" && ./node_modules/.bin/next build)
}

# shellcheck disable=SC2153  # PORT comes from export_app_env
# start_web PID_FILE LOG_FILE: next start on 127.0.0.1:$PORT, then waits for
# /api/health to answer 200.
start_web() {
  local pid_file="$1" log_file="$2"
  port_in_use "$PORT" && die "port $PORT is taken by another program: set PORT to a free port"
  say "starting the web server on $APP_URL (log: $log_file)"
  start_detached "$pid_file" "$log_file" env NODE_OPTIONS="${NODE_OPTIONS:+$NODE_OPTIONS }$TAULINE_SERVER_NODE_OPTIONS" \
    ./node_modules/.bin/next start -H 127.0.0.1 -p "$PORT"
  wait_for_health "$pid_file" "$log_file"
}

# HTTP status of a GET, "000" when nothing answers. Node's fetch stands in
# where curl is not installed.
http_status() {
  if command -v curl >/dev/null; then
    curl -s -o /dev/null -w '%{http_code}' --max-time 5 "$1" || true
  else
    node -e 'fetch(process.argv[1], { signal: AbortSignal.timeout(5000) })
      .then((r) => console.log(r.status), () => console.log("000"))' "$1"
  fi
}

wait_for_health() {
  local pid_file="$1" log_file="$2" waited=0 code
  while :; do
    code="$(http_status "$APP_URL/api/health")"
    [ "$code" = 200 ] && return 0
    if ! kill -0 "$(cat "$pid_file")" 2>/dev/null; then
      show_log_tail "$log_file"
      die "the web server exited before $APP_URL/api/health answered"
    fi
    if [ "$waited" -ge "$TAULINE_HEALTH_TIMEOUT" ]; then
      show_log_tail "$log_file"
      die "$APP_URL/api/health did not answer 200 in $TAULINE_HEALTH_TIMEOUT s (last status: $code)"
    fi
    sleep 1
    waited=$((waited + 1))
  done
}

# The common tail of the throwaway runs (npm test, bench, load), once their
# database exists and export_app_env has run: migrate and seed it, start the
# SMTP fake, build if needed and serve. Logs go to $RUN_DIR/LABEL-{smtp,web}.log.
# migrate_seed_and_serve LABEL SMTP_PID_FILE WEB_PID_FILE
migrate_seed_and_serve() {
  local label="$1" smtp_pid_file="$2" web_pid_file="$3"
  say "migrating and seeding ${DATABASE_URL##*/}"
  npm run --silent db:migrate
  npm run --silent db:seed
  : >"$RUN_DIR/$label-smtp.log"
  start_smtp_fake "$smtp_pid_file" "$RUN_DIR/$label-smtp.log"
  build_web
  : >"$RUN_DIR/$label-web.log"
  start_web "$web_pid_file" "$RUN_DIR/$label-web.log"
}
