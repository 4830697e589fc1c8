#!/usr/bin/env bash
# Installs pdflatex from Debian's TeX Live packages for the LaTeX export test
# (test/export/latex-compile.test.ts). Idempotent and quiet: nothing happens when pdflatex and
# longtable are already there; otherwise one apt-get update, then the two packages without
# recommended extras. apt's output is shown only when it fails.
set -euo pipefail
if command -v pdflatex >/dev/null 2>&1 && kpsewhich longtable.sty >/dev/null 2>&1; then
  exit 0
fi
SUDO=''
if [ "$(id -u)" -ne 0 ]; then SUDO='sudo'; fi
log="$(mktemp)"
trap 'rm -f "$log"' EXIT
export DEBIAN_FRONTEND=noninteractive
if ! { $SUDO apt-get update -qq && $SUDO apt-get install -y -qq --no-install-recommends texlive-latex-base texlive-latex-recommended; } >"$log" 2>&1; then
  cat "$log" >&2
  echo "install-tex: apt-get failed" >&2
  exit 1
fi
command -v pdflatex >/dev/null
kpsewhich longtable.sty >/dev/null
