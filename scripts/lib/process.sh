# shellcheck shell=bash
# Background services with pid files. Each service runs in a session of its
# own (setsid) so that it outlives the script that started it and so that
# stopping it can signal its whole process group and nothing else.

# The pid stored in $1 when that process is alive and its command line still
# contains $2 (guards against a recycled pid after a reboot or crash).
read_live_pid() {
  local pid_file="$1" marker="$2" pid
  [ -f "$pid_file" ] || return 1
  pid="$(cat "$pid_file" 2>/dev/null)"
  [[ "$pid" =~ ^[0-9]+$ ]] || return 1
  kill -0 "$pid" 2>/dev/null || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" 2>/dev/null | grep -q -- "$marker" || return 1
  echo "$pid"
}

# start_detached PID_FILE LOG_FILE COMMAND...: runs COMMAND from the project
# root, detached from this shell, stdin closed, output appended to LOG_FILE.
# The inner shell writes its own pid and then execs, so the pid file holds the
# service's pid even when setsid has to fork.
start_detached() {
  local pid_file="$1" log_file="$2"
  shift 2
  rm -f "$pid_file"
  # The subshell execs setsid, so no shell lingers holding our stdout (a pipe
  # reader would wait for it) or the lock descriptors 8 and 9.
  (
    cd "$TAULINE_ROOT" || exit 1
    # shellcheck disable=SC2016  # $$, $0 and $@ belong to the inner shell
    exec setsid bash -c 'echo $$ >"$0"; exec "$@"' "$pid_file" "$@" \
      </dev/null >>"$log_file" 2>&1 8>&- 9>&-
  ) &
  local waited=0
  while [ ! -s "$pid_file" ] && [ "$waited" -lt 50 ]; do
    sleep 0.1
    waited=$((waited + 1))
  done
  [ -s "$pid_file" ] || die "could not start: $*"
}

# stop_by_pid_file PID_FILE MARKER NAME: TERM to the service's process group,
# then KILL after 15 s if it is still there.
stop_by_pid_file() {
  local pid_file="$1" marker="$2" name="$3" pid
  if ! pid="$(read_live_pid "$pid_file" "$marker")"; then
    rm -f "$pid_file"
    return 0
  fi
  say "stopping $name (pid $pid)"
  kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || true
  local waited=0
  while kill -0 "$pid" 2>/dev/null && [ "$waited" -lt 150 ]; do
    sleep 0.1
    waited=$((waited + 1))
  done
  if kill -0 "$pid" 2>/dev/null; then
    warn "$name did not stop after 15 s: sending KILL"
    kill -KILL -- "-$pid" 2>/dev/null || kill -KILL "$pid" 2>/dev/null || true
  fi
  rm -f "$pid_file"
}
