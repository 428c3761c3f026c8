import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { equilibriumConstant } from "../../src/enthalpy/equilibriumConstant.js";
import { reactionGibbs } from "../../src/enthalpy/reactionGibbs.js";
import { GAS_CONSTANT_J_PER_MOL_K as R } from "../../src/units.js";
import { caught, janafRow } from "./_helpers.js";

const WGS = "CO(g) + H2O(g) -> CO2(g) + H2(g)";

describe("equilibriumConstant", () => {
  it("equilibriumConstant(water-gas shift, 1000 K) is the documented example", () => {
    expect(Math.round(equilibriumConstant(WGS, 1000) * 100) / 100).toBe(1.44);
  });

  it("equilibriumConstant(water-gas shift, 1000 K) matches K from NIST-JANAF Gibbs-energy functions", () => {
    // NIST-JANAF 4th ed. 1998: −[G°−H°298]/T at 1000 K = 235.901 (CO2, C-095), 145.536 (H2, H-050),
    // 212.848 (CO, C-093), 206.738 (H2O, H-064) J/(mol·K); ΔH°298 from CODATA Key Values 1989 (from memory):
    // CO2 −393.51, CO −110.53, H2O(g) −241.826 kJ/mol. ΔG°(T) = ΔH°298 − T·Δ(−[G°−H°298]/T).
    const T = 1000;
    const gef = (s: string) => janafRow(s, T).minus_G_minus_H298_over_T!;
    const dgef = gef("CO2") + gef("H2") - gef("CO") - gef("H2O(g)");
    const dh298 = (-393.51 + 110.53 + 241.826) * 1000;
    const dgPublished = dh298 - T * dgef;
    const kPublished = Math.exp(-dgPublished / (R * T));
    const k = equilibriumConstant(WGS, T);
    // tolerance: 50 J/mol on ΔG° (K within 0.6 %), below the 0.21 kJ/mol uncertainty of the CODATA ΔfH° inputs
    expect(Math.abs(-R * T * Math.log(k) - dgPublished)).toBeLessThan(50);
    expect(Math.abs(k / kPublished - 1)).toBeLessThan(0.006);
  });

  it("equilibriumConstant(H2 + ½O2 → H2O(g)) matches NIST-JANAF log Kf at 1000 K and 2000 K", () => {
    // NIST-JANAF 4th ed. 1998, table H-064: log Kf = 10.060 (1000 K), 3.540 (2000 K)
    for (const T of [1000, 2000]) {
      const logK = Math.log10(equilibriumConstant("H2(g) + 0.5 O2(g) -> H2O(g)", T));
      expect(Math.abs(logK - janafRow("H2O(g)", T).logKf!)).toBeLessThan(0.003);
    }
  });

  it("equilibriumConstant van 't Hoff shortcut equals the full value at 298.15 K and drifts at high T", () => {
    const full298 = equilibriumConstant(WGS, 298.15);
    const vh298 = equilibriumConstant(WGS, 298.15, { method: "van-t-hoff" });
    expect(vh298 / full298).toBeCloseTo(1, 12);
    const full = equilibriumConstant(WGS, 1000);
    const vh = equilibriumConstant(WGS, 1000, { method: "van-t-hoff" });
    expect(Math.abs(vh / full - 1)).toBeGreaterThan(0.05); // ΔCp of the shift is not negligible over 700 K
  });

  test.prop([fc.double({ min: 300, max: 2500, noNaN: true })])("equilibriumConstant = exp(−ΔG°/RT)", (T) => {
    const k = equilibriumConstant(WGS, T);
    expect(Math.log(k)).toBeCloseTo(-reactionGibbs(WGS, { T }) / (R * T), 9);
  });

  it("equilibriumConstant rejects a bad T and an unknown method", () => {
    expect(caught(() => equilibriumConstant(WGS, 0)).code).toBe("INVALID_ARGUMENT");
    const e = caught(() => equilibriumConstant(WGS, 1000, { method: "guess" as never }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toMatchObject({ method: "guess" });
  });
});
