# Shared helpers for the project's shell scripts (sourced, not run).
log() { printf '\033[2m[trayline]\033[0m %s\n' "$*" >&2; }
die() { printf '[trayline] error: %s\n' "$*" >&2; exit 1; }

# npm ci when node_modules is missing or older than package-lock.json
ensure_node_modules() {
  local root="$1"
  if [ ! -d "$root/node_modules" ] || [ "$root/package-lock.json" -nt "$root/node_modules/.package-lock.json" ]; then
    log "installing npm packages (npm ci)"
    (cd "$root" && npm ci --include=dev --no-audit --no-fund --loglevel=error) || die "npm ci failed"
  fi
}

# Debian's chromium for browser tests: never a browser download.
ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return 0; fi
  if [ "$(id -u)" = "0" ]; then
    log "installing Debian's chromium for browser tests"
    apt-get update -qq >/dev/null 2>&1 || true
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null || die "apt-get install chromium failed"
  else
    die "/usr/bin/chromium is missing: install Debian's chromium package"
  fi
}

# pdftoppm and friends are optional helpers for looking at PDFs; not needed by tests.
