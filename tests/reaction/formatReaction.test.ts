import { describe, expect, it } from "vitest";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { errorOf } from "./helpers.js";

describe("formatReaction", () => {
  it("documented examples (ethane combustion, C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O — common practice)", () => {
    expect(formatReaction(parseReaction("C2H6 + 3.5 O2 -> 2 CO2 + 3 H2O"))).toBe("C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O");
    expect(formatReaction(parseReaction("C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O"), { coefficients: "decimal", arrow: "→" })).toBe("C2H6 + 3.5 O2 → 2 CO2 + 3 H2O");
  });
  it("omits coefficient 1 and keeps species text (charges, phases) as written", () => {
    expect(formatReaction(parseReaction("1 Na+(aq) + 1.0 Cl-(aq)=NaCl(s)"))).toBe("Na+(aq) + Cl-(aq) -> NaCl(s)");
  });
  it("rejects a non-reaction", () => {
    expect(errorOf(() => formatReaction(null as never)).code).toBe("INVALID_ARGUMENT");
  });
});
