#!/usr/bin/env bash
# What the paper's CI runs: check the computation (every claim must hold), check that results.tex is
# the export of computation.wedge as it is now, and that every \ww... macro paper.tex uses is defined.
# Exit status 0 when all is in sync; 1 with file:line:col problems otherwise (refresh with
#   wedgework export --tex results.tex computation.wedge
# and commit results.tex); 2 on a usage error.
#
# WEDGEWORK names the command (default: `wedgework` on the PATH, else this repository's bin/wedgework.cjs).
set -euo pipefail
cd "$(dirname "$0")"
if [[ -n "${WEDGEWORK:-}" ]]; then
  read -r -a run <<<"$WEDGEWORK"
elif command -v wedgework >/dev/null 2>&1; then
  run=(wedgework)
else
  run=(node ../../bin/wedgework.cjs)
fi
"${run[@]}" check --tex results.tex --paper paper.tex computation.wedge
