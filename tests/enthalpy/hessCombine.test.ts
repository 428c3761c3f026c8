import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { hessCombine } from "../../src/enthalpy/hessCombine.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { caught } from "./_helpers.js";

describe("hessCombine", () => {
  it("hessCombine builds C + ½O2 → CO from the two combustion reactions (the documented example)", () => {
    // CODATA Key Values 1989 (from memory): ΔcH°(graphite) = −393.51, ΔcH°(CO) = −282.98 → ΔfH°(CO) = −110.53 kJ/mol
    const r = hessCombine("C(cr) + 0.5 O2(g) -> CO(g)", [
      { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: -393510 },
      { reaction: "CO(g) + 0.5 O2(g) -> CO2(g)", enthalpy: -282980 },
    ]);
    expect(r.multipliers).toEqual([1, -1]);
    expect(r.exactMultipliers).toEqual(["1", "-1"]);
    expect(r.enthalpy).toBe(-110530);
    expect(r.unique).toBe(true);
  });

  it("hessCombine finds fractional multipliers exactly", () => {
    // ΔfH°(C2H6) from combustion reactions; enthalpies are CRC/CODATA heats of combustion (from memory):
    // graphite −393.51, H2 −285.83, ethane −1560.7 kJ/mol
    const r = hessCombine("2 C(cr) + 3 H2(g) -> C2H6(g)", [
      { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: "-393510" },
      { reaction: "H2(g) + 0.5 O2(g) -> H2O(l)", enthalpy: "-285830" },
      { reaction: "2 C2H6(g) + 7 O2(g) -> 4 CO2(g) + 6 H2O(l)", enthalpy: "-3121400" },
    ]);
    expect(r.exactMultipliers).toEqual(["2", "3", "-1/2"]);
    expect(r.exact).toBe("-83810"); // 2(−393510) + 3(−285830) − ½(−3121400), exact decimal
  });

  test.prop([fc.constantFrom(
    "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)",
    "CO(g) + H2O(g) -> CO2(g) + H2(g)",
    "N2(g) + 3 H2(g) -> 2 NH3(g)",
    "2 SO2(g) + O2(g) -> 2 SO3(g)",
    "C2H4(g) + H2(g) -> C2H6(g)",
  )])("hessCombine of formation reactions reproduces Hess's law from formation enthalpies", (text) => {
    const formation: Record<string, { reaction: string; enthalpy: number }> = {
      "CH4(g)": { reaction: "C(cr) + 2 H2(g) -> CH4(g)", enthalpy: 0 },
      "CO2(g)": { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: 0 },
      "H2O(l)": { reaction: "H2(g) + 0.5 O2(g) -> H2O(l)", enthalpy: 0 },
      "H2O(g)": { reaction: "H2(g) + 0.5 O2(g) -> H2O(g)", enthalpy: 0 },
      "CO(g)": { reaction: "C(cr) + 0.5 O2(g) -> CO(g)", enthalpy: 0 },
      "NH3(g)": { reaction: "0.5 N2(g) + 1.5 H2(g) -> NH3(g)", enthalpy: 0 },
      "SO2(g)": { reaction: "S(cr) + O2(g) -> SO2(g)", enthalpy: 0 },
      "SO3(g)": { reaction: "S(cr) + 1.5 O2(g) -> SO3(g)", enthalpy: 0 },
      "C2H4(g)": { reaction: "2 C(cr) + 2 H2(g) -> C2H4(g)", enthalpy: 0 },
      "C2H6(g)": { reaction: "2 C(cr) + 3 H2(g) -> C2H6(g)", enthalpy: 0 },
    };
    const known = Object.values(formation).map((f) => ({ reaction: f.reaction, enthalpy: reactionEnthalpy(f.reaction).exact! }));
    const r = hessCombine(text, known);
    expect(r.enthalpy).toBeCloseTo(reactionEnthalpy(text).value, 6);
  });

  it("hessCombine throws NOT_IN_SPAN naming the species that cannot be reached", () => {
    const e = caught(() => hessCombine("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", [
      { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: -393510 },
      { reaction: "H2(g) + 0.5 O2(g) -> H2O(l)", enthalpy: -285830 },
    ]));
    expect(e.code).toBe("NOT_IN_SPAN");
    expect(e.details).toMatchObject({ absent: ["CH4(g)"] });
    expect((e.details.unreachable as string[])).toContain("CH4(g)");
  });

  it("hessCombine throws NOT_IN_SPAN when the species all appear but no combination fits", () => {
    const e = caught(() => hessCombine("C(cr) + O2(g) -> CO2(g)", [
      { reaction: "C(cr) + 0.5 O2(g) -> CO(g)", enthalpy: -110530 },
    ]));
    expect(e.code).toBe("NOT_IN_SPAN");
    expect(Object.keys(e.details.residual as object).length).toBeGreaterThan(0);
  });

  it("hessCombine rejects an empty list and a non-finite enthalpy", () => {
    expect(caught(() => hessCombine("H2(g) + 0.5 O2(g) -> H2O(l)", [])).code).toBe("INVALID_ARGUMENT");
    const e = caught(() => hessCombine("H2(g) + 0.5 O2(g) -> H2O(l)", [{ reaction: "H2(g) + 0.5 O2(g) -> H2O(l)", enthalpy: Number.NaN }]));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toMatchObject({ index: 0 });
  });
});
