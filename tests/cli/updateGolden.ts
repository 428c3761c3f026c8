/**
 * Rewrite every golden file under tests/cli/golden/ from the current command line:
 * `npm run golden:update`, then review `git diff tests/cli/golden` before committing.
 */
import { readdirSync, unlinkSync, writeFileSync } from "node:fs";
import { GOLDEN_CASES, goldenFile, runGolden } from "./goldenCases.js";

const dir = new URL("./golden/", import.meta.url);
for (const f of readdirSync(dir)) if (f.endsWith(".txt")) unlinkSync(new URL(f, dir));
for (const c of GOLDEN_CASES) writeFileSync(goldenFile(c), await runGolden(c));
console.log(`wrote ${GOLDEN_CASES.length} golden files to tests/cli/golden/`);
