import { test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { elementMassFractions } from "../../src/formula/elementMassFractions.js";
import { errorOf, generatedFormula } from "./helpers.js";

describe("elementMassFractions", () => {
  it("elementMassFractions(text) gives the documented example", () => {
    // IUPAC-derived: 2 × 1.008 / 18.015
    expect(elementMassFractions("H2O").H).toBe(0.11190674437968359);
  });

  it("gives the carbon fraction of methane", () => {
    // IUPAC-derived: 12.011 / 16.043 = 0.74867...
    expect(elementMassFractions("CH4").C).toBeCloseTo(12.011 / 16.043, 15);
    expect(Object.keys(elementMassFractions("CH4"))).toEqual(["C", "H"]);
  });

  it("refuses the electron", () => {
    expect(errorOf(() => elementMassFractions("e-")).code).toBe("INVALID_ARGUMENT");
    expect(errorOf(() => elementMassFractions({ text: "", elements: { H: 0 }, charge: 0, phase: null })).code).toBe("INVALID_COUNT");
  });

  test.prop([generatedFormula], { numRuns: 300 })("fractions are in (0, 1] and sum to 1", (g) => {
    const w = Object.values(elementMassFractions(g.text));
    for (const x of w) {
      expect(x).toBeGreaterThan(0);
      expect(x).toBeLessThanOrEqual(1 + 1e-15);
    }
    expect(w.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });
});
