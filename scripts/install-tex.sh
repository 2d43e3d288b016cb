#!/usr/bin/env bash
# Installs what the LaTeX tests (test/latex/) compile with, when it is missing: Debian's
# texlive-latex-base (pdflatex, with amsmath and amssymb) and poppler-utils (pdftotext).
# Quiet and quick when both are there. Run as root, or with passwordless sudo; otherwise it says
# which command to run, and the LaTeX tests fail with the same instruction.
set -euo pipefail
if command -v pdflatex >/dev/null 2>&1 && command -v pdftotext >/dev/null 2>&1; then
  exit 0
fi
packages=(texlive-latex-base poppler-utils)
command_line="apt-get install -y --no-install-recommends ${packages[*]}"
if ! command -v apt-get >/dev/null 2>&1; then
  echo "install-tex: pdflatex or pdftotext is missing and apt-get is not available; install a TeX distribution with pdflatex (amsmath, amssymb) and poppler's pdftotext" >&2
  exit 0
fi
if [[ $(id -u) -eq 0 ]]; then
  as_root=()
elif command -v sudo >/dev/null 2>&1 && sudo -n true 2>/dev/null; then
  as_root=(sudo -n)
else
  echo "install-tex: pdflatex or pdftotext is missing; install them with: sudo $command_line" >&2
  exit 0
fi
echo "install-tex: installing ${packages[*]} (about a minute, once)" >&2
started=$SECONDS
"${as_root[@]}" env DEBIAN_FRONTEND=noninteractive apt-get update -qq
"${as_root[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${packages[@]}" >/dev/null
echo "install-tex: done in $((SECONDS - started)) s" >&2
