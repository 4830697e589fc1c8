#!/usr/bin/env bash
# Installs pdflatex from Debian's TeX Live packages for the LaTeX export test. Idempotent and
# quiet: does nothing when pdflatex and longtable are already there; otherwise one apt-get
# update and the two packages, without recommended extras.
set -euo pipefail
if command -v pdflatex >/dev/null 2>&1 && kpsewhich longtable.sty >/dev/null 2>&1; then
  exit 0
fi
SUDO=''
if [ "$(id -u)" -ne 0 ]; then SUDO='sudo'; fi
export DEBIAN_FRONTEND=noninteractive
$SUDO apt-get update -qq >/dev/null
$SUDO apt-get install -y -qq --no-install-recommends texlive-latex-base texlive-latex-recommended >/dev/null
command -v pdflatex >/dev/null
