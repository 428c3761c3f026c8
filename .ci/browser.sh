#!/usr/bin/env bash
# The browser page check: headless Chromium (Debian package) loads docs/browser/index.html from a static
# server on 127.0.0.1; the page imports dist/browser/rxtherm.min.js, balances an equation, computes a flame
# temperature and draws a chart, and tests/browser/page.test.mjs reads the DOM (playwright-core drives it).
set -euo pipefail
cd "$(dirname "$0")/.."
start=$SECONDS
if ! dpkg -s chromium >/dev/null 2>&1; then
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium >/dev/null
fi
[ -x node_modules/.bin/tsup ] || npm ci --no-audit --no-fund
[ -f dist/browser/rxtherm.min.js ] || npm run build
node --test tests/browser/
echo "browser check: $((SECONDS - start)) s"
