import { describe, expect, it } from "vitest";
import {
  ATOMIC_WEIGHTS, ATOMIC_WEIGHTS_EDITION, HYDROGEN_ISOTOPES, elementData,
} from "../../src/formula/atomicWeights.js";
import { RxthermError } from "../../src/errors.js";

describe("ATOMIC_WEIGHTS", () => {
  it("lists the 118 elements in order of atomic number with unique symbols", () => {
    expect(ATOMIC_WEIGHTS).toHaveLength(118);
    ATOMIC_WEIGHTS.forEach((row, i) => expect(row.Z).toBe(i + 1));
    expect(new Set(ATOMIC_WEIGHTS.map((r) => r.symbol)).size).toBe(118);
    for (const r of ATOMIC_WEIGHTS) {
      expect(r.symbol).toMatch(/^[A-Z][a-z]?$/);
      expect(r.atomicWeight).toBeGreaterThan(0);
    }
  });

  it("has at most six decimals in every weight (molarMass sums them exactly in micro-units)", () => {
    for (const r of [...ATOMIC_WEIGHTS, ...HYDROGEN_ISOTOPES]) {
      expect(Math.round(r.atomicWeight * 1e6) / 1e6, r.symbol).toBe(r.atomicWeight);
    }
  });

  it("ATOMIC_WEIGHTS[5] is carbon (the documented example)", () => {
    // IUPAC 2013 (Meija et al., Pure Appl. Chem. 88 (2016) 265), Table 3 conventional value for C: 12.011
    expect(ATOMIC_WEIGHTS[5]).toEqual({ Z: 6, symbol: "C", name: "carbon", atomicWeight: 12.011, kind: "standard" });
  });

  it("carries the IUPAC 2013 abridged/conventional values", () => {
    const w = (s: string) => elementData(s).atomicWeight;
    // IUPAC 2013 (Meija et al. 2016), Table 3 conventional values
    expect(w("H")).toBe(1.008);
    expect(w("C")).toBe(12.011);
    expect(w("N")).toBe(14.007);
    expect(w("O")).toBe(15.999);
    expect(w("S")).toBe(32.06);
    expect(w("Cl")).toBe(35.45);
    // IUPAC 2013 (Meija et al. 2016), Table 2 abridged values (five significant figures)
    expect(w("Na")).toBe(22.99);
    expect(w("Fe")).toBe(55.845);
    expect(w("Cu")).toBe(63.546);
    expect(w("U")).toBe(238.03);
    expect(w("Pb")).toBe(207.2);
  });

  it("applies the CIAAW 2017 revision for argon and marks it", () => {
    // CIAAW 2017 revision: conventional atomic weight of Ar 39.95 (from memory; IUPAC 2013 abridged was 39.948)
    const ar = elementData("Ar");
    expect(ar.atomicWeight).toBe(39.95);
    expect(ar.revision).toContain("CIAAW 2017");
    expect(ATOMIC_WEIGHTS.filter((r) => r.revision !== undefined).map((r) => r.symbol)).toEqual(["Ar"]);
    expect(ATOMIC_WEIGHTS_EDITION).toBe(
      "IUPAC 2013 abridged/conventional standard atomic weights, with the CIAAW 2017 conventional value for Ar",
    );
  });

  it("marks exactly the elements without a standard atomic weight and gives them integer mass numbers", () => {
    // IUPAC 2013 (Meija et al. 2016): no standard atomic weight for Tc, Pm, Po–Ac and Z >= 93
    const expected = ["Tc", "Pm", "Po", "At", "Rn", "Fr", "Ra", "Ac", ...ATOMIC_WEIGHTS.filter((r) => r.Z >= 93).map((r) => r.symbol)];
    const marked = ATOMIC_WEIGHTS.filter((r) => r.kind === "massNumber").map((r) => r.symbol);
    expect(marked).toEqual(expected);
    for (const r of ATOMIC_WEIGHTS) {
      if (r.kind === "massNumber") expect(Number.isInteger(r.atomicWeight)).toBe(true);
      else expect(r.kind).toBe("standard");
    }
    // IUPAC 2013 (Meija et al. 2016), Table 2: Th, Pa, U keep standard atomic weights
    expect(elementData("Th").kind).toBe("standard");
    expect(elementData("Pa").name).toBe("protactinium");
    // NIST periodic table convention (from memory): technetium 97 (mass number of a long-lived isotope)
    expect(elementData("Tc").atomicWeight).toBe(97);
  });

  it("uses the 2016 IUPAC names and symbols for elements 113, 115, 117, 118", () => {
    // IUPAC announcement 2016 (from memory): nihonium Nh, moscovium Mc, tennessine Ts, oganesson Og
    expect([113, 115, 117, 118].map((z) => ATOMIC_WEIGHTS[z - 1]?.symbol)).toEqual(["Nh", "Mc", "Ts", "Og"]);
  });
});

describe("HYDROGEN_ISOTOPES", () => {
  it("gives D and T their isotopic masses (the documented example)", () => {
    // Atomic Mass Evaluation, 2H = 2.014101778 u and 3H = 3.01604928 u (from memory), rounded to 7 figures
    expect(HYDROGEN_ISOTOPES[0]?.atomicWeight).toBe(2.014102);
    expect(HYDROGEN_ISOTOPES[1]?.atomicWeight).toBe(3.016049);
    expect(HYDROGEN_ISOTOPES.map((r) => r.kind)).toEqual(["isotope", "isotope"]);
  });
});

describe("elementData", () => {
  it("elementData(symbol) finds elements, D and T, case-sensitively (the documented example)", () => {
    // IUPAC 2013 (Meija et al. 2016), Table 2: Fe 55.845
    expect(elementData("Fe").atomicWeight).toBe(55.845);
    expect(elementData("D").name).toBe("deuterium");
    expect(elementData("Co").name).toBe("cobalt");
  });

  it("elementData(unknown) throws UNKNOWN_ELEMENT, with a suggestion when a case change fixes it", () => {
    const err = (s: string) => {
      try {
        elementData(s);
      } catch (e) {
        return e as RxthermError;
      }
      throw new Error("no error");
    };
    const a = err("co");
    expect(a).toBeInstanceOf(RxthermError);
    expect(a.code).toBe("UNKNOWN_ELEMENT");
    expect(a.details).toEqual({ symbol: "co", suggestion: "Co" });
    expect(a.message).toContain('did you mean "Co"');
    expect(err("Xy").details).toEqual({ symbol: "Xy" });
    expect(err("CO").details).toEqual({ symbol: "CO", suggestion: "Co" });
    expect(err("").code).toBe("UNKNOWN_ELEMENT");
  });
});
