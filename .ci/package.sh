#!/usr/bin/env bash
# Packaging check: what `npm pack` publishes (tests/package/checkPackage.ts), then the packed tarball installed
# into a scratch project the way a user installs it, and used from Node (ESM and CommonJS, main entry and
# rxtherm/browser) and from Deno (bare "rxtherm" and "npm:rxtherm", both resolved from the local install).
set -euo pipefail
cd "$(dirname "$0")/.."
repo=$PWD
start=$SECONDS
[ -x node_modules/.bin/tsup ] || npm ci --no-audit --no-fund
{ [ -f dist/index.js ] && [ -f dist/browser/rxtherm.min.js ]; } || npm run build
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
tarball=$(npm pack --ignore-scripts --silent --pack-destination "$work" | tail -1)
npx tsx tests/package/checkPackage.ts "$work/$tarball"

mkdir "$work/app"
cd "$work/app"
printf '{ "name": "rxtherm-consumer", "private": true, "type": "module" }\n' > package.json
npm install --no-audit --no-fund --silent "../$tarball"
cp "$repo/tests/package/checks.mjs" "$repo/tests/package/consumer.mjs" "$repo/tests/package/consumer.cjs" \
   "$repo/tests/deno/consumer.ts" "$repo/tests/deno/consumer-npm.ts" "$repo/tests/deno/consumer-typed.ts" .
node consumer.mjs
node consumer.cjs
deno="$repo/node_modules/.bin/deno"
"$deno" run consumer.ts
"$deno" run consumer-npm.ts
"$deno" check consumer-typed.ts   # the package's .d.ts, as Deno reads it
echo "package check: $((SECONDS - start)) s"
