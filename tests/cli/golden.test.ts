/**
 * Golden-output tests of the command line: each case's stdout, stderr and exit code must equal its file
 * under tests/cli/golden/ byte for byte. These are regression snapshots of our own output (layout,
 * units, messages); the physics behind the numbers is checked against published values in the
 * library's tests and in runCli.test.ts. Regenerate with `npm run golden:update`.
 */
import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { GOLDEN_CASES, goldenFile, runGolden } from "./goldenCases.js";

describe("rxtherm golden output", () => {
  it("has one golden file per case and no stale file", () => {
    const files = readdirSync(new URL("./golden/", import.meta.url)).filter((f) => f.endsWith(".txt")).sort();
    expect(files).toEqual(GOLDEN_CASES.map((c) => `${c.name}.txt`).sort());
  });
  for (const c of GOLDEN_CASES) {
    it(`rxtherm ${c.args.join(" ")}`, async () => {
      expect(await runGolden(c)).toBe(readFileSync(goldenFile(c), "utf8"));
    });
  }
});
