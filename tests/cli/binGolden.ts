/**
 * Run the golden cases through a built `rxtherm` executable (the one npm installs from the packed
 * tarball) and compare with tests/cli/golden/. Used by .ci/cli.sh:
 *   npx tsx tests/cli/binGolden.ts /path/to/node_modules/.bin/rxtherm
 * Exits 1 and prints the first differing lines when an output differs.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { GOLDEN_CASES, HOST_DEPENDENT, goldenFile, goldenText } from "./goldenCases.js";

const bin = process.argv[2];
if (bin === undefined) {
  console.error("usage: tsx tests/cli/binGolden.ts <path to the rxtherm executable>");
  process.exit(2);
}
const root = fileURLToPath(new URL("../../", import.meta.url));
let failed = 0;
let checked = 0;
for (const c of GOLDEN_CASES) {
  if (HOST_DEPENDENT.has(c.name)) continue;
  const r = spawnSync(bin, [...c.args], { cwd: root, encoding: "utf8" });
  const got = goldenText(c.args, r.status ?? -1, r.stdout, r.stderr);
  const want = readFileSync(goldenFile(c), "utf8");
  checked++;
  if (got !== want) {
    failed++;
    const g = got.split("\n"), w = want.split("\n");
    const i = g.findIndex((line, k) => line !== w[k]);
    console.error(`✗ ${c.name}: first difference at line ${i + 1}\n  want: ${w[i]}\n  got:  ${g[i]}`);
  }
}
console.log(`${checked - failed}/${checked} golden cases match the built command ${bin}`);
process.exit(failed === 0 ? 0 : 1);
