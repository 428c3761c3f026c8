import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { generateSpeciesDatabase, readSource } from "../../scripts/species-database/generate.js";

const root = new URL("../../", import.meta.url);
const read = (path: string): string => readFileSync(new URL(path, root), "utf8");

describe("the generated species database is current (npm run generate:database)", () => {
  const out = generateSpeciesDatabase(readSource(read("data/burcat-ruscic-2005.json")));

  it("src/database/data/burcatRuscic2005.ts is what the generator writes from data/burcat-ruscic-2005.json", () => {
    expect(read("src/database/data/burcatRuscic2005.ts") === out.moduleText).toBe(true);
  });

  it("docs/species-database.md is what the generator writes", () => {
    expect(read("docs/species-database.md")).toBe(out.docsText);
  });

  it("accounts for every record of the edition: used + skipped = 1364 (Burcat–Ruscic 2005, ANL-05/20)", () => {
    const used = Number(/\| records used \| (\d+) \|/.exec(out.docsText)![1]);
    const skipped = Number(/\| records skipped \| (\d+) \|/.exec(out.docsText)![1]);
    expect(used + skipped).toBe(1364);
    expect(out.records.length).toBe(1306);
  });
});
