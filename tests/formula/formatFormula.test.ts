import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { formatFormula } from "../../src/formula/formatFormula.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import type { Formula } from "../../src/formula/types.js";
import { chargeSuffix, errorOf, generatedFormula, phaseSuffix } from "./helpers.js";

describe("formatFormula", () => {
  it("formatFormula(formula) gives the documented examples", () => {
    // Hill order: C, H, then alphabetical; without C, all alphabetical (Hill, J. Am. Chem. Soc. 22 (1900) 478)
    expect(formatFormula(parseFormula("CH3COOH"))).toBe("C2H4O2");
    expect(formatFormula(parseFormula("CuSO4·5H2O"))).toBe("CuH10O9S");
    expect(formatFormula(parseFormula("SO4--(aq)"))).toBe("O4S^2-(aq)");
    expect(formatFormula(parseFormula("CH3COOH"), { order: "input" })).toBe("C2H4O2");
    expect(formatFormula(parseFormula("NaOH"), { order: "input" })).toBe("NaOH");
  });

  it("formatFormula(formula) writes Hill order", () => {
    // Hill order (Hill 1900): ethanol C2H6O, chloroform CHCl3, sodium hydroxide HNaO, sulfuric acid H2O4S
    expect(formatFormula(parseFormula("CH3CH2OH"))).toBe("C2H6O");
    expect(formatFormula(parseFormula("CHCl3"))).toBe("CHCl3");
    expect(formatFormula(parseFormula("NaOH"))).toBe("HNaO");
    expect(formatFormula(parseFormula("H2SO4"))).toBe("H2O4S");
    expect(formatFormula(parseFormula("CCl4"))).toBe("CCl4");
    expect(formatFormula(parseFormula("CH3OD"))).toBe("CH3DO");
    expect(formatFormula(parseFormula("K4[Fe(CN)6]"))).toBe("C6FeK4N6");
  });

  it("formatFormula(formula) writes one canonical charge notation, decimals and the electron", () => {
    expect(formatFormula(parseFormula("Na+"))).toBe("Na^+");
    expect(formatFormula(parseFormula("Fe3+(aq)"))).toBe("Fe^3+(aq)");
    expect(formatFormula(parseFormula("O2^-"))).toBe("O2^-");
    expect(formatFormula(parseFormula("e-"))).toBe("e-");
    expect(formatFormula(parseFormula("(Fe0.947O)3"))).toBe("Fe2.841O3");
    expect(formatFormula(parseFormula("SO4^2-(aq)"), { charge: false, phase: false })).toBe("O4S");
  });

  it("formatFormula(formula) does not mutate the formula", () => {
    const f = parseFormula("CuSO4·5H2O(s)");
    const copy = structuredClone(f);
    Object.freeze(f.elements);
    formatFormula(Object.freeze(f));
    expect(f).toEqual(copy);
  });

  it("formatFormula(bad) throws the documented codes", () => {
    const f = (elements: Record<string, number>, charge = 0, phase: unknown = null) =>
      ({ text: "", elements, charge, phase }) as Formula;
    expect(errorOf(() => formatFormula(f({ Xx: 1 }))).code).toBe("UNKNOWN_ELEMENT");
    expect(errorOf(() => formatFormula(f({ H: 0 }))).code).toBe("INVALID_COUNT");
    expect(errorOf(() => formatFormula(f({ H: NaN }))).details).toMatchObject({ symbol: "H" });
    expect(errorOf(() => formatFormula(f({ H: 2e9 }))).code).toBe("COUNT_TOO_LARGE");
    expect(errorOf(() => formatFormula(f({ H: 1 }, 0.5))).code).toBe("INVALID_CHARGE");
    expect(errorOf(() => formatFormula(f({ H: 1 }, 0, "gas"))).code).toBe("INVALID_PHASE");
    expect(errorOf(() => formatFormula(f({}, 0))).code).toBe("INVALID_ARGUMENT");
    expect(errorOf(() => formatFormula(null as unknown as Formula)).code).toBe("INVALID_ARGUMENT");
    expect(errorOf(() => formatFormula(f({ H: 1 }), { order: "weird" as "hill" })).code).toBe("INVALID_ARGUMENT");
  });

  test.prop([generatedFormula, chargeSuffix, phaseSuffix, fc.constantFrom("hill" as const, "input" as const)], { numRuns: 400 })(
    "parseFormula(formatFormula(f)) gives back f's elements, charge and phase",
    (g, q, p, order) => {
      const f = parseFormula(g.text + q + p);
      const text = formatFormula(f, { order });
      const back = parseFormula(text);
      expect(back.elements).toEqual(f.elements);
      expect(back.charge).toBe(f.charge);
      expect(back.phase).toBe(f.phase);
      if (order === "input") expect(Object.keys(back.elements)).toEqual(Object.keys(f.elements));
    },
  );

  test.prop([generatedFormula])("Hill formatting is idempotent", (g) => {
    const once = formatFormula(parseFormula(g.text));
    expect(formatFormula(parseFormula(once))).toBe(once);
  });
});
