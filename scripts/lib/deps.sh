# shellcheck shell=bash
# npm dependencies and the browser the smoke test drives.

# `npm ci` when node_modules is missing or older than package-lock.json.
# npm records the installed tree in node_modules/.package-lock.json, so its
# mtime is the moment of the last install.
ensure_node_modules() {
  local marker="$TAULINE_ROOT/node_modules/.package-lock.json"
  if [ ! -d "$TAULINE_ROOT/node_modules" ] || [ ! -f "$marker" ]; then
    say "node_modules is missing: running npm ci"
  elif [ "$TAULINE_ROOT/package-lock.json" -nt "$marker" ]; then
    say "package-lock.json is newer than node_modules: running npm ci"
  else
    return 0
  fi
  # npm 11 warns that esbuild's install script is not approved; tsx and vite
  # still work with the esbuild binary from its platform package.
  (cd "$TAULINE_ROOT" && npm ci --no-audit --no-fund)
}

# Debian's Chromium for playwright-core (the browser tests launch this path).
ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then
    return 0
  fi
  say "/usr/bin/chromium is missing"
  apt_install chromium
  [ -x /usr/bin/chromium ] || die "chromium was installed but /usr/bin/chromium is still missing"
}
