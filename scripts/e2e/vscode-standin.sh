#!/usr/bin/env bash
# Stands in for a desktop VS Code executable where none can be installed: @vscode/test-electron's
# runTests starts this with the arguments it would give VS Code (see vscode-standin.ts).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
exec node --import "$root/node_modules/tsx/dist/loader.mjs" "$here/vscode-standin.ts" "$@"
