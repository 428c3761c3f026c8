/**
 * The guide and the README show what `rxtherm --help` prints; they must not drift from it.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { GOLDEN_CASES, runGolden } from "./goldenCases.js";

const read = (path: string) => readFileSync(new URL(`../../${path}`, import.meta.url), "utf8");

describe("command-line docs", () => {
  it("docs/cli.md and README.md contain the current rxtherm --help output", async () => {
    const text = await runGolden(GOLDEN_CASES.find((c) => c.name === "help")!);
    const help = text.split("--- stdout\n")[1]!.split("--- stderr")[0]!.trimEnd();
    expect(help.length).toBeGreaterThan(200);
    expect(read("docs/cli.md")).toContain(help);
    expect(read("README.md")).toContain(help);
  });

  it("docs/cli.md lists every exit code the command line uses", async () => {
    const { CLI_EXIT_CODES } = await import("../../src/cli/runCli.js");
    const doc = read("docs/cli.md");
    for (const code of Object.values(CLI_EXIT_CODES)) expect(doc).toMatch(new RegExp(`^\\| ${code} \\|`, "m"));
  });
});
