# Shared helpers for Cairn's scripts; sourced, never run on its own.
# Everything a fresh machine lacks (pnpm, dependencies, PostgreSQL, Chromium) is installed here.

CAIRN_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
CAIRN_STATE="$CAIRN_ROOT/.cairn"
PNPM_VERSION="10.34.9"
export CAIRN_DB_PORT="${CAIRN_DB_PORT:-54780}"
export CAIRN_PORT="${CAIRN_PORT:-4780}"
export CAIRN_DEV_PORT="${CAIRN_DEV_PORT:-4781}"
export CAIRN_SMTP_PORT="${CAIRN_SMTP_PORT:-4782}"
export CAIRN_DB_USER="${CAIRN_DB_USER:-cairn}"

say() { printf 'cairn: %s\n' "$*"; }
die() { printf 'cairn: %s\n' "$*" >&2; exit 1; }

# True when something accepts connections on 127.0.0.1:$1.
port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# Installs Debian packages: as root directly, otherwise through sudo; says exactly what failed.
apt_install() {
  local runner=()
  if [ "$(id -u)" -ne 0 ]; then
    command -v sudo >/dev/null 2>&1 || die "need the Debian package(s) '$*' and cannot install them without root or sudo; run: apt-get install -y $*"
    runner=(sudo)
  fi
  say "installing $* from Debian's packages"
  export DEBIAN_FRONTEND=noninteractive
  "${runner[@]}" apt-get update -qq >/dev/null || die "apt-get update failed; install by hand: apt-get install -y $*"
  "${runner[@]}" apt-get install -y -qq "$@" >/dev/null || die "apt-get install -y $* failed (see the lines above)"
}

# pnpm 10 (pnpm 11 needs Node 22): the one on PATH if it is a 10.x, else a project-local copy.
ensure_pnpm() {
  if command -v pnpm >/dev/null 2>&1 && [[ "$(pnpm --version 2>/dev/null)" == 10.* ]]; then return; fi
  local tools="$CAIRN_STATE/tools"
  if [ ! -x "$tools/node_modules/.bin/pnpm" ]; then
    command -v npm >/dev/null 2>&1 || die "Node.js 20 with npm is needed first (https is not used here: install it from Debian or your usual source)"
    say "installing pnpm $PNPM_VERSION into .cairn/tools"
    mkdir -p "$tools"
    npm install --prefix "$tools" --no-save --no-audit --no-fund --loglevel=error "pnpm@$PNPM_VERSION" >/dev/null || die "could not install pnpm $PNPM_VERSION with npm"
  fi
  export PATH="$tools/node_modules/.bin:$PATH"
}

ensure_node() {
  command -v node >/dev/null 2>&1 || die "Node.js 20.19 or newer is needed; it is not on PATH"
  node -e 'const [a,b]=process.versions.node.split(".").map(Number); process.exit(a>20||(a===20&&b>=19)?0:1)' \
    || die "Node.js 20.19 or newer is needed; this is $(node --version)"
}

ensure_dependencies() {
  (cd "$CAIRN_ROOT" && pnpm install --frozen-lockfile --prefer-offline --reporter=silent) || die "pnpm install failed (see above)"
}

ensure_chromium() {
  if [ -n "${CAIRN_CHROMIUM:-}" ]; then
    [ -x "$CAIRN_CHROMIUM" ] || die "CAIRN_CHROMIUM is set to $CAIRN_CHROMIUM, which is not an executable"
    return
  fi
  [ -x /usr/bin/chromium ] || apt_install --no-install-recommends chromium
  [ -x /usr/bin/chromium ] || die "Chromium is still missing at /usr/bin/chromium after installing it"
}

ensure_tools() {
  ensure_node
  ensure_pnpm
  ensure_dependencies
}
