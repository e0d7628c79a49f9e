# shellcheck shell=bash
# Shared helpers for the bootstrap scripts: project paths, logging, and the
# small amount of process bookkeeping that start/stop/test need.

TAULINE_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd -P)"
DATA_DIR="$TAULINE_ROOT/.data"
RUN_DIR="$DATA_DIR/run"

say() { printf '\033[1m[tauline]\033[0m %s\n' "$*"; }
warn() { printf '\033[1;33m[tauline]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[1;31m[tauline]\033[0m %s\n' "$*" >&2; exit 1; }

is_root() { [ "$(id -u)" -eq 0 ]; }

# .data holds the cluster (or its pointer), pid files, logs and the secret.
# 0755 so the `postgres` OS user can pass through it to its own 0700 folder.
ensure_data_dirs() {
  mkdir -p "$DATA_DIR" "$RUN_DIR"
  chmod 0755 "$DATA_DIR"
}

# True when something accepts TCP connections on 127.0.0.1:$1.
port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

# Print the last lines of a log file to help explain a failure.
show_log_tail() {
  local file="$1"
  [ -f "$file" ] || return 0
  warn "last lines of $file:"
  tail -n 30 "$file" >&2
}

# apt-get as root, non-interactive, waiting for another apt run's lock
# instead of failing (a parallel install may hold it on a fresh machine).
apt_install() {
  is_root || die "need root to install $* with apt-get; install it yourself and re-run"
  say "installing with apt-get: $*"
  export DEBIAN_FRONTEND=noninteractive
  apt-get -o DPkg::Lock::Timeout=900 update -qq
  apt-get -o DPkg::Lock::Timeout=900 install -y -qq "$@"
}
