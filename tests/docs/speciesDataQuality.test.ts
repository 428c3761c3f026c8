import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { renderSpeciesDataQuality } from "../../docs/data-quality/speciesDataQuality.js";

describe("docs/species-data-quality.md", () => {
  it("is up to date with the built-in data (regenerate with `npm run data-quality`)", () => {
    const committed = readFileSync(new URL("../../docs/species-data-quality.md", import.meta.url), "utf8");
    expect(committed).toBe(renderSpeciesDataQuality());
  });

  it("lists every built-in species once, with its worst measured deviation from NIST-JANAF", () => {
    const page = renderSpeciesDataQuality();
    const rows = page.split("\n").filter((l) => l.startsWith("| ") && !l.startsWith("| species"));
    expect(rows.length).toBe(95);
    // NIST-JANAF Fe-003 (janaf-extended.json): Cp 54.434 J/(mol·K) at 1000 K, beside the Curie point
    expect(page).toMatch(/Worst measured Cp deviation: Fe\(cr\), -3\.29 % at 1000 K\./);
  });
});
