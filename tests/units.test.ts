import { describe, expect, it } from "vitest";
import { CELSIUS_SLIP_BELOW_K, celsiusSlipHint, fromKelvin, slipHintDetails, toJoule, toKelvin, toMol, toPascal, withSlipHint } from "../src/units.js";
import { isRxthermError } from "../src/errors.js";

// Conversion factors: NIST SP 811 (2008) Appendix B; 0 °C = 273.15 K by definition of the Celsius scale.
describe("units", () => {
  it("toKelvin / fromKelvin", () => {
    expect(toKelvin(25, "C")).toBe(298.15);
    expect(toKelvin(32, "F")).toBeCloseTo(273.15, 12);
    expect(toKelvin(491.67, "R")).toBeCloseTo(273.15, 12);
    expect(fromKelvin(373.15, "C")).toBe(100);
    expect(fromKelvin(373.15, "F")).toBe(212);
  });
  it("rejects a negative absolute temperature and non-finite input", () => {
    expect(() => toKelvin(-300, "C")).toThrow(/negative absolute/);
    try { toKelvin(Number.NaN, "K"); } catch (e) { expect(isRxthermError(e, "INVALID_ARGUMENT")).toBe(true); }
  });
  it("pressure, energy and amount factors (NIST SP 811)", () => {
    expect(toPascal(1, "atm")).toBe(101325);
    expect(toPascal(1, "bar")).toBe(100000);
    expect(toPascal(1, "psi")).toBeCloseTo(6894.757, 3);
    expect(toJoule(1, "kcal")).toBe(4184);
    expect(toJoule(1, "Btu")).toBeCloseTo(1055.056, 3);
    expect(toMol(1, "lbmol")).toBe(453.59237);
  });
});

describe("celsiusSlipHint", () => {
  it("celsiusSlipHint gives the documented example values", () => {
    expect(CELSIUS_SLIP_BELOW_K).toBe(200); // @example
    expect(celsiusSlipHint(25)).toBe("was °C meant? 25 °C is 298.15 K"); // @example
    expect(withSlipHint(25)).toBe("; was °C meant? 25 °C is 298.15 K"); // @example
    expect(slipHintDetails(25).hint).toBe("was °C meant? 25 °C is 298.15 K"); // @example
  });
  it("gives no hint at 200 K and above, at 0 K or below, or for non-numbers", () => {
    for (const T of [200, 298.15, 0, -5, Number.NaN]) expect(celsiusSlipHint(T)).toBeUndefined();
    expect(withSlipHint(300)).toBe("");
    expect(slipHintDetails(300)).toEqual({});
  });
  it("a species, a flame and an energy balance at 25 K ask whether °C was meant", async () => {
    const { species } = await import("../src/species/species.js");
    const { adiabaticFlameTemperature } = await import("../src/flame/adiabaticFlameTemperature.js");
    const { heatDuty } = await import("../src/energy/heatDuty.js");
    const { equilibriumComposition } = await import("../src/flame/equilibriumComposition.js");
    const { caught } = await import("./_helpers/caught.js");
    for (const f of [
      () => species("CO2(g)").enthalpy(25),
      () => adiabaticFlameTemperature({ fuel: "CH4(g)", T: 25 }),
      () => heatDuty({ inlet: { T: 25, flows: { "N2(g)": 1 } }, outlet: { T: 400, flows: { "N2(g)": 1 } } }),
      () => equilibriumComposition({ feed: { "CO(g)": 1, "H2O(g)": 2 }, species: ["CO(g)", "H2O(g)", "CO2(g)", "H2(g)"], T: 25, P: 1e5 }),
    ]) {
      const e = caught(f);
      expect(e.code).toBe("OUT_OF_RANGE");
      expect(e.message).toContain("was °C meant? 25 °C is 298.15 K");
      expect(e.details.hint).toBe("was °C meant? 25 °C is 298.15 K");
    }
  });
});
