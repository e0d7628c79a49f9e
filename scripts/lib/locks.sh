# shellcheck shell=bash
# Advisory locks (flock) so that several bootstraps in one checkout (two
# terminals, or `npm start` while `npm test` runs) do not initialise or stop
# the cluster under each other. File descriptor 8 guards the cluster, 9 a
# whole test run. Background services are started with both closed, so a
# lock ends with the script that took it.

# hold_lock NAME FD: blocks until this shell holds .data/run/NAME.lock on FD.
hold_lock() {
  local name="$1" fd="$2"
  command -v flock >/dev/null || return 0
  eval "exec $fd>\"\$RUN_DIR/\$name.lock\""
  if ! flock -n "$fd"; then
    say "waiting for another run that holds the $name lock"
    flock "$fd"
  fi
}

release_lock() {
  command -v flock >/dev/null || return 0
  flock -u "$1"
}

# True while some other process holds .data/run/NAME.lock.
lock_is_busy() {
  command -v flock >/dev/null || return 1
  [ -f "$RUN_DIR/$1.lock" ] || return 1
  ! flock -n "$RUN_DIR/$1.lock" true
}
