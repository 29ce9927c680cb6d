#!/usr/bin/env bash
# Debian's Chromium for the browser tests (playwright-core drives it; it never downloads a browser).
set -euo pipefail
if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Debian's chromium…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium fonts-liberation >/dev/null
fi
