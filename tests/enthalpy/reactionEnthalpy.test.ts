import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { scaleReaction, reverseReaction } from "../../src/reaction/scaleReaction.js";
import { species } from "../../src/species/species.js";
import { caught, codataLibrary, janafRow } from "./_helpers.js";

const kJ = 1000;

describe("reactionEnthalpy", () => {
  it("reactionEnthalpy(CH4 combustion) is the documented example, an exact Hess sum", () => {
    const r = reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)");
    expect(r.value).toBe(-890310.1); // the @example value
    expect(r.exact).toBe("-890310.1");
    expect(r.T).toBe(298.15);
    expect(r.terms.map((t) => [t.species, t.coefficient])).toEqual([["CH4(g)", -1], ["O2(g)", -2], ["CO2(g)", 1], ["H2O(l)", 2]]);
  });

  it("reactionEnthalpy matches published standard reaction enthalpies (within 0.5 kJ/mol or 0.1 %)", () => {
    const cases: [string, number, string][] = [
      // NIST-JANAF 4th ed. 1998, table H-064: ΔfH°(H2O, g, 298.15 K) = −241.826 kJ/mol
      ["H2(g) + 0.5 O2(g) -> H2O(g)", janafRow("H2O(g)", 298.15).dfH! * kJ, "JANAF H-064"],
      // CODATA Key Values 1989 (from memory): ΔvapH°(H2O, 298.15 K) = −241.826 + 285.830 = 44.004 kJ/mol
      ["H2O(l) -> H2O(g)", 44.004 * kJ, "CODATA 1989"],
      // CODATA Key Values 1989 (from memory): ΔfH°(NH3, g) = −45.94 ± 0.35 kJ/mol → ammonia synthesis −91.88 kJ/mol
      ["N2(g) + 3 H2(g) -> 2 NH3(g)", -91.88 * kJ, "CODATA 1989"],
      // CODATA Key Values 1989 (from memory): CO2 −393.51, CO −110.53, H2O(g) −241.826 → water-gas shift −41.154 kJ/mol
      ["CO(g) + H2O(g) -> CO2(g) + H2(g)", -41.154 * kJ, "CODATA 1989"],
      // CODATA Key Values 1989 (from memory) with ΔfH°(CH4, g) = −74.87 kJ/mol (NIST WebBook): steam reforming +206.17 kJ/mol
      ["CH4(g) + H2O(g) -> CO(g) + 3 H2(g)", 206.17 * kJ, "CODATA 1989"],
      // NIST Chemistry WebBook (from memory): ΔfH° SO2(g) −296.84, SO3(g) −395.77 kJ/mol → 2 SO2 + O2 −197.86 kJ/mol
      ["2 SO2(g) + O2(g) -> 2 SO3(g)", -197.86 * kJ, "NIST WebBook"],
      // CODATA Key Values 1989 (from memory): ΔfH°(CO, g) = −110.53 kJ/mol (graphite burning to CO)
      ["C(cr) + 0.5 O2(g) -> CO(g)", -110.53 * kJ, "CODATA 1989"],
    ];
    for (const [text, published, source] of cases) {
      const v = reactionEnthalpy(text).value;
      const tol = Math.max(0.5 * kJ, 1e-3 * Math.abs(published));
      expect(Math.abs(v - published), `${text} vs ${source}`).toBeLessThanOrEqual(tol);
    }
  });

  it("reactionEnthalpy(r, { T }) follows Kirchhoff: equals the difference of species enthalpies at T", () => {
    const text = "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)";
    for (const T of [400, 1000, 1800]) {
      const expected = species("CO2(g)").enthalpy(T) + 2 * species("H2O(g)").enthalpy(T)
        - species("CH4(g)").enthalpy(T) - 2 * species("O2(g)").enthalpy(T);
      expect(reactionEnthalpy(text, { T }).value).toBeCloseTo(expected, 6);
    }
  });

  it("reactionEnthalpy of H2 + ½O2 at 1000 K matches NIST-JANAF ΔfH°(H2O, g, 1000 K)", () => {
    // NIST-JANAF 4th ed. 1998, table H-064: ΔfH°(1000 K) = −247.857 kJ/mol (Shomate fits reproduce the table to ~0.05 kJ/mol, common practice)
    const v = reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: 1000 }).value;
    expect(Math.abs(v - janafRow("H2O(g)", 1000).dfH! * kJ)).toBeLessThan(0.1 * kJ);
  });

  it("reactionEnthalpy keeps phases apart: liquid water product gives a larger heat of combustion", () => {
    const liquid = reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(l)").value;
    const gas = reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)").value;
    // NIST-JANAF 1998 / CODATA 1989: the difference is ΔvapH° at 298.15 K, 44.004 kJ/mol (from memory)
    expect(gas - liquid).toBeCloseTo(44004, -1);
  });

  it("reactionEnthalpy(r, { per }) divides by |ν| of that species, exactly", () => {
    const whole = reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)");
    const perO2 = reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", { per: "O2(g)" });
    expect(perO2.value).toBe(whole.value / 2);
    expect(perO2.exact).toBe("-445155.05");
    expect(perO2.per).toBe("O2(g)");
    const third = reactionEnthalpy("3 H2(g) + 1.5 O2(g) -> 3 H2O(g)", { per: "H2(g)" });
    expect(third.value).toBe(reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)").value);
  });

  it("reactionEnthalpy propagates ΔfH° uncertainties as a root-sum-square", () => {
    const lib = codataLibrary();
    const r = reactionEnthalpy("CO(g) + 0.5 O2(g) -> CO2(g)", { library: lib });
    // CODATA Key Values 1989 (from memory): −393.51 ± 0.13 and −110.53 ± 0.17 kJ/mol
    expect(r.value).toBe(-282980);
    expect(r.uncertainty).toBeCloseTo(Math.hypot(130, 170), 9);
    // species without an uncertainty and a non-zero ΔfH° → no uncertainty reported
    expect(reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)").uncertainty).toBeUndefined();
  });

  test.prop([fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 7 })])(
    "reactionEnthalpy(k·R) = k·ΔH(R) and ΔH(reverse R) = −ΔH(R), exactly at 298.15 K",
    (num, den) => {
      const base = parseReaction("C2H4(g) + 3 O2(g) -> 2 CO2(g) + 2 H2O(l)");
      const h = reactionEnthalpy(base).value;
      const scaled = reactionEnthalpy(scaleReaction(base, `${num}/${den}`)).value;
      expect(scaled).toBeCloseTo((h * num) / den, 6);
      expect(reactionEnthalpy(reverseReaction(base)).value).toBe(-h);
    },
  );

  test.prop([fc.double({ min: 300, max: 3000, noNaN: true })])(
    "reactionEnthalpy at T: ΔH(T) − ΔH(298.15) equals Σν·(H(T) − H(298.15)) for any T in range",
    (T) => {
      const text = "CO(g) + H2O(g) -> CO2(g) + H2(g)";
      const dh = reactionEnthalpy(text, { T }).value - reactionEnthalpy(text).value;
      const sensible = (k: string) => species(k).enthalpy(T) - species(k).hf298;
      const expected = sensible("CO2(g)") + sensible("H2(g)") - sensible("CO(g)") - sensible("H2O(g)");
      expect(Math.abs(dh - expected)).toBeLessThan(1e-6 * (1 + Math.abs(expected)));
    },
  );

  test.prop([fc.constantFrom(
    "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)",
    "N2(g) + 3 H2(g) -> 2 NH3(g)",
    "4 NH3(g) + 5 O2(g) -> 4 NO(g) + 6 H2O(g)",
    "C3H8(g) + 5 O2(g) -> 3 CO2(g) + 4 H2O(g)",
    "2 SO2(g) + O2(g) -> 2 SO3(g)",
  ), fc.double({ min: -1e-6, max: 1e-6, noNaN: true })])(
    "reactionEnthalpy: the exact decimal path at 298.15 K and the float Kirchhoff path next to it agree",
    (text, dT) => {
      fc.pre(dT !== 0);
      const exact = reactionEnthalpy(text).value;
      const float = reactionEnthalpy(text, { T: 298.15 + dT, extrapolate: true }).value;
      // |ΔCp·dT| < 1e-3 J/mol for |dT| ≤ 1e-6 K; float round-off of Σν·H is ~1e-10 relative
      expect(Math.abs(float - exact)).toBeLessThan(1e-3 + 1e-9 * Math.abs(exact));
    },
  );

  it("reactionEnthalpy does not mutate a frozen reaction and caches per reaction object", () => {
    const r = Object.freeze(parseReaction("CO(g) + 0.5 O2(g) -> CO2(g)"));
    const a = reactionEnthalpy(r, { T: 900 }).value;
    const b = reactionEnthalpy(r, { T: 900 }).value;
    expect(a).toBe(b);
  });

  it("reactionEnthalpy throws UNBALANCED_REACTION with the residuals", () => {
    const e = caught(() => reactionEnthalpy("CH4(g) + O2(g) -> CO2(g) + H2O(l)"));
    expect(e.code).toBe("UNBALANCED_REACTION");
    expect(e.details).toMatchObject({ residuals: { H: -2, O: 1 } });
  });

  it("reactionEnthalpy names the missing species", () => {
    const e = caught(() => reactionEnthalpy("Xe(g) + 3 F2(g) -> XeF6(g)"));
    expect(["UNKNOWN_SPECIES", "AMBIGUOUS_PHASE"]).toContain(e.code);
    expect(e.message).toMatch(/reactionEnthalpy needs the data of/);
    expect(typeof e.details.species).toBe("string");
  });

  it("reactionEnthalpy rejects a bad T, a foreign per and out-of-range T", () => {
    expect(caught(() => reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: -5 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: Number.NaN })).code).toBe("INVALID_ARGUMENT");
    const e = caught(() => reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { per: "CO2(g)" }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toMatchObject({ per: "CO2(g)" });
    expect(caught(() => reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(l)", { T: 900 })).code).toBe("OUT_OF_RANGE");
    const x = reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(l)", { T: 600, extrapolate: true });
    // NIST WebBook liquid-water Shomate range ends at 500 K: only H2O(l) is listed
    expect(x.extrapolated).toEqual([{ species: "H2O(l)", T: 600, range: [273.16, 500] }]);
    expect(reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: 600, extrapolate: true }).extrapolated).toEqual([]);
  });
});
