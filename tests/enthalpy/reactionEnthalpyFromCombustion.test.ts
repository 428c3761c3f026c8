import { describe, expect, it } from "vitest";
import { reactionEnthalpyFromCombustion, COMBUSTION_REFERENCE_SPECIES } from "../../src/enthalpy/reactionEnthalpyFromCombustion.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { heatingValue } from "../../src/enthalpy/heatingValue.js";
import { caught } from "./_helpers.js";

describe("reactionEnthalpyFromCombustion", () => {
  it("reactionEnthalpyFromCombustion(ethylene hydrogenation) is the documented example", () => {
    // CRC Handbook of Chemistry and Physics, heats of combustion (from memory): C2H4 −1411.2, C2H6 −1560.7 kJ/mol;
    // CODATA Key Values 1989: H2 (= ΔfH° H2O(l)) −285.83 kJ/mol
    const r = reactionEnthalpyFromCombustion("C2H4(g) + H2(g) -> C2H6(g)", {
      "C2H4(g)": -1411200, "H2(g)": -285830, "C2H6(g)": -1560700,
    });
    expect(r.value).toBe(-136330);
    expect(r.exact).toBe("-136330");
  });

  it("reactionEnthalpyFromCombustion agrees with Hess's law from formation data when fed consistent ΔcH°", () => {
    const text = "CO(g) + 3 H2(g) -> CH4(g) + H2O(l)";
    const dc = (k: string) => -heatingValue(k);
    const r = reactionEnthalpyFromCombustion(text, { "CO(g)": dc("CO(g)"), "H2(g)": dc("H2(g)"), "CH4(g)": dc("CH4(g)") });
    expect(r.value).toBeCloseTo(reactionEnthalpy(text).value, 6);
  });

  it("reactionEnthalpyFromCombustion throws MISSING_DATA naming species without ΔcH°", () => {
    const e = caught(() => reactionEnthalpyFromCombustion("C2H4(g) + H2(g) -> C2H6(g)", { "C2H4(g)": -1411200 }));
    expect(e.code).toBe("MISSING_DATA");
    expect(e.details).toMatchObject({ missing: ["H2(g)", "C2H6(g)"] });
  });

  it("reactionEnthalpyFromCombustion throws UNBALANCED_REACTION and rejects bad numbers", () => {
    expect(caught(() => reactionEnthalpyFromCombustion("C2H4(g) -> C2H6(g)", {})).code).toBe("UNBALANCED_REACTION");
    expect(caught(() => reactionEnthalpyFromCombustion("C2H4(g) + H2(g) -> C2H6(g)", { "C2H4(g)": "abc", "H2(g)": 1, "C2H6(g)": 1 })).code).toBe("INVALID_ARGUMENT");
  });
});

describe("COMBUSTION_REFERENCE_SPECIES", () => {
  it("holds the standard combustion products (the documented example)", () => {
    expect(COMBUSTION_REFERENCE_SPECIES.includes("H2O(l)")).toBe(true);
    expect(COMBUSTION_REFERENCE_SPECIES.includes("H2O(g)")).toBe(false); // common practice: ΔcH° refers to liquid water
  });
});
