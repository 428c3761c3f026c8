#!/usr/bin/env bash
# The command line as a new user gets it: pack the package, install the tarball into an empty folder,
# and run `npx rxtherm` there — its --help and every golden case must match tests/cli/golden/.
set -euo pipefail
cd "$(dirname "$0")/.."
start=$(date +%s)
[ -d node_modules ] || npm ci --no-audit --no-fund
[ -f dist/cli.js ] || npm run build
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
tarball=$(npm pack --silent --pack-destination "$work" | tail -n 1)
( cd "$work" && npm init -y > /dev/null && npm install --no-audit --no-fund --silent "./$tarball" )
# what a new user types
( cd "$work" && npx --no-install rxtherm --help ) > "$work/help.txt"
sed -n '/^--- stdout$/,/^--- stderr$/p' tests/cli/golden/help.txt | sed '1d;$d' > "$work/help.want"
diff -u "$work/help.want" "$work/help.txt"
( cd "$work" && npx --no-install rxtherm --version ) | grep -qx "rxtherm $(node -p 'require("./package.json").version')"
test -f "$work/node_modules/rxtherm/docs/case-file.schema.json"
npx tsx tests/cli/binGolden.ts "$work/node_modules/.bin/rxtherm"
echo "CLI checks: $(( $(date +%s) - start )) s"
