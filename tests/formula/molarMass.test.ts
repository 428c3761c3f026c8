import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { ELECTRON_MOLAR_MASS_G_PER_MOL, molarMass } from "../../src/formula/molarMass.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import type { Formula } from "../../src/formula/types.js";
import { errorOf, generatedFormula } from "./helpers.js";

describe("molarMass", () => {
  it("molarMass(text) gives the documented examples", () => {
    // IUPAC-derived (IUPAC 2013 table): 2 × 1.008 + 15.999 = 18.015
    expect(molarMass("H2O")).toBe(18.015);
    // IUPAC-derived: 63.546 + 32.06 + 9 × 15.999 + 10 × 1.008 = 249.677
    expect(molarMass("CuSO4·5H2O")).toBe(249.677);
    // IUPAC-derived: 22.99 − 0.000548579909 (CODATA 2018 electron relative atomic mass, from memory)
    expect(molarMass("Na+", { electronMass: true })).toBe(22.989451420091);
    expect(ELECTRON_MOLAR_MASS_G_PER_MOL).toBe(0.000548579909);
  });

  // Each value is the exact sum of IUPAC 2013 abridged/conventional atomic weights (IUPAC-derived),
  // computed by hand as shown; the function must return the double nearest to that exact sum.
  const published: [string, number, string][] = [
    ["CO2", 44.009, "IUPAC-derived: 12.011 + 2 × 15.999"],
    ["CH4", 16.043, "IUPAC-derived: 12.011 + 4 × 1.008"],
    ["O2", 31.998, "IUPAC-derived: 2 × 15.999"],
    ["N2", 28.014, "IUPAC-derived: 2 × 14.007"],
    ["NH3", 17.031, "IUPAC-derived: 14.007 + 3 × 1.008"],
    ["NaCl", 58.44, "IUPAC-derived: 22.99 + 35.45"],
    ["CaCO3", 100.086, "IUPAC-derived: 40.078 + 12.011 + 3 × 15.999"],
    ["C6H12O6", 180.156, "IUPAC-derived: 6 × 12.011 + 12 × 1.008 + 6 × 15.999"],
    ["H2SO4", 98.072, "IUPAC-derived: 2 × 1.008 + 32.06 + 4 × 15.999"],
    ["C2H5OH", 46.069, "IUPAC-derived: 2 × 12.011 + 6 × 1.008 + 15.999"],
    ["Fe2O3", 159.687, "IUPAC-derived: 2 × 55.845 + 3 × 15.999"],
    ["C8H18", 114.232, "IUPAC-derived: 8 × 12.011 + 18 × 1.008"],
    ["Ca(OH)2", 74.092, "IUPAC-derived: 40.078 + 2 × 15.999 + 2 × 1.008"],
    ["K4[Fe(CN)6]", 368.345, "IUPAC-derived: 4 × 39.098 + 55.845 + 6 × 12.011 + 6 × 14.007"],
    ["D2O", 20.027204, "2 × 2.014102 (AME, from memory) + 15.999 (IUPAC 2013)"],
    ["Ar", 39.95, "CIAAW 2017 conventional value (from memory)"],
    ["Fe0.947O", 68.884215, "IUPAC-derived: 0.947 × 55.845 + 15.999"],
    ["SO4^2-", 96.056, "IUPAC-derived: 32.06 + 4 × 15.999 (electron mass neglected)"],
    ["UF6", 352.018, "IUPAC-derived: 238.03 + 6 × 18.998"],
  ];
  for (const [text, value, source] of published) {
    it(`molarMass("${text}") = ${value} g/mol (${source})`, () => {
      expect(molarMass(text)).toBe(value);
    });
  }

  it("molarMass agrees with handbook molar masses to the precision of the atomic weights", () => {
    // CRC Handbook of Chemistry and Physics, physical constants of inorganic/organic compounds (from memory):
    // water 18.015, carbon dioxide 44.009, methane 16.043, sucrose 342.30 g/mol
    expect(molarMass("H2O")).toBeCloseTo(18.015, 3);
    expect(molarMass("CO2")).toBeCloseTo(44.009, 3);
    expect(molarMass("CH4")).toBeCloseTo(16.043, 3);
    expect(molarMass("C12H22O11")).toBeCloseTo(342.3, 1);
  });

  it("molarMass(formula) accepts a Formula object and gives the same as its text", () => {
    expect(molarMass(parseFormula("CaSO4·0.5H2O"))).toBe(molarMass("CaSO4·0.5H2O"));
    // IUPAC-derived: 40.078 + 32.06 + 4.5 × 15.999 + 1.008 = 145.1415
    expect(molarMass("CaSO4·0.5H2O")).toBe(145.1415);
  });

  it("molarMass(ion, { electronMass: true }) subtracts charge × electron mass", () => {
    // IUPAC-derived 96.056 + 2 × 0.000548579909 (CODATA 2018 electron mass, from memory)
    expect(molarMass("SO4^2-", { electronMass: true })).toBe(96.057097159818);
    expect(molarMass("e-")).toBe(0);
    expect(molarMass("e-", { electronMass: true })).toBe(0.000548579909);
    expect(molarMass("H2O", { electronMass: true })).toBe(18.015);
  });

  it("molarMass(bad) throws the parser's or the checker's codes", () => {
    expect(errorOf(() => molarMass("Xy")).code).toBe("UNKNOWN_ELEMENT");
    expect(errorOf(() => molarMass({ text: "", elements: { H: -1 }, charge: 0, phase: null })).code).toBe("INVALID_COUNT");
    expect(errorOf(() => molarMass({ text: "", elements: { Qq: 1 }, charge: 0, phase: null })).code).toBe("UNKNOWN_ELEMENT");
    expect(errorOf(() => molarMass(42 as unknown as string)).code).toBe("INVALID_ARGUMENT");
    expect(errorOf(() => molarMass("H2", { electronMass: "yes" as unknown as boolean })).code).toBe("INVALID_ARGUMENT");
  });

  test.prop([generatedFormula], { numRuns: 300 })("is additive over adduct parts: M(A·B) = M(A) + M(B)", (g) => {
    const a = parseFormula(g.text);
    const both = molarMass(`${g.text}·H2O`);
    // the exact sums differ by exactly 18.015; compare within one rounding of the larger value
    expect(Math.abs(both - (molarMass(a) + 18.015))).toBeLessThanOrEqual(4 * Number.EPSILON * both);
  });

  test.prop([fc.constantFrom("CH4", "H2O", "CO2", "NaCl", "C6H12O6"), fc.integer({ min: 1, max: 50 })])(
    "scales with a group multiplier: M((X)n) = n · M(X)",
    (x, n) => {
      expect(molarMass(`(${x})${n}`)).toBeCloseTo(n * molarMass(x), 9);
    },
  );

  it("does not mutate a Formula object", () => {
    const f: Formula = Object.freeze({ text: "H2O", elements: Object.freeze({ H: 2, O: 1 }), charge: 0, phase: null });
    expect(molarMass(f)).toBe(18.015);
  });
});
