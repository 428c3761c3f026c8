#!/usr/bin/env bash
# Dead-link check of the docs: the Markdown guides' relative links and every local link and anchor of the
# generated site (docs/api/). Builds the site first when it is missing.
set -euo pipefail
cd "$(dirname "$0")/.."
start=$SECONDS
[ -x node_modules/.bin/typedoc ] || npm ci --no-audit --no-fund
[ -f docs/api/index.html ] || npm run docs
npx tsx docs/site/checkLinks.ts
echo "docs link check: $((SECONDS - start)) s"
