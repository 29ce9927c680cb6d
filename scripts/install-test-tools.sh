#!/usr/bin/env bash
# The test bootstrap's Debian packages: Chromium for the browser tests (playwright-core drives it; it never
# downloads a browser), poppler-utils and pdfLaTeX for the export tests.
set -euo pipefail
if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Debian's chromium…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium fonts-liberation >/dev/null
fi
# Debian's poppler-utils: pdftotext and pdffonts read the PDF worksheets back in the export tests.
if ! command -v pdftotext >/dev/null || ! command -v pdffonts >/dev/null; then
  echo "Installing Debian's poppler-utils…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends poppler-utils >/dev/null
fi
# Debian's pdfLaTeX with mhchem (texlive-science): the export tests compile the LaTeX exports.
if ! command -v pdflatex >/dev/null || ! kpsewhich mhchem.sty >/dev/null 2>&1; then
  echo "Installing Debian's texlive-latex-base and texlive-science…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends texlive-latex-base texlive-science >/dev/null
fi
