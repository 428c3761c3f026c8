import { describe, expect, it } from "vitest";
import {
  fromJoule, fromJoulePerMol, fromKelvin, fromMolPerSecond, fromPascal, fromWatt, toJoule, toKelvin, toMol, toMolPerSecond, toPascal, toWatt,
  CELSIUS_SLIP_BELOW_K, celsiusSlipHint, slipHintDetails, withSlipHint,
} from "../src/units.js";
import { caught } from "./_helpers/caught.js";
import { fc, test as fcTest } from "./_helpers/property.js";
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

describe("flow, power and specific-energy units", () => {
  it("toMolPerSecond(flow) reads molar, mass and normal-volume flows", () => {
    expect(toMolPerSecond({ value: 36, unit: "kmol/h" })).toBeCloseTo(10, 12); // 1 h = 3600 s, common practice
    // 1 lbmol = 453.59237 mol exactly (NIST SP 811 Appendix B)
    expect(toMolPerSecond({ value: 1, unit: "lbmol/h" })).toBeCloseTo(0.12599788055555556, 15);
    expect(toMolPerSecond({ value: 57.753, unit: "kg/h", molarMassGPerMol: 16.0425 })).toBeCloseTo(1, 12);
    // 1 lb = 0.45359237 kg exactly (NIST SP 811 Appendix B)
    expect(toMolPerSecond({ value: 3600, unit: "lb/h", molarMassGPerMol: 453.59237 })).toBeCloseTo(1, 12);
    // molar volume of an ideal gas at 273.15 K, 101.325 kPa: 22.413 969 54 L/mol (CODATA 2018)
    expect(toMolPerSecond({ value: 3600 * 0.02241396954, unit: "Nm3/h" })).toBeCloseTo(1, 9);
    expect(toMolPerSecond({ value: 3600 * 0.02241396954, unit: "Nm³/h" })).toBeCloseTo(1, 9);
  });
  it("fromMolPerSecond(value, unit) is the inverse of toMolPerSecond", () => {
    expect(fromMolPerSecond(10, "kmol/h")).toBe(36);
    expect(fromMolPerSecond(1, "Nm3/h")).toBeCloseTo(80.6902903606, 9);
    for (const unit of ["mol/h", "kmol/s", "lbmol/h", "kg/s", "t/h", "g/s", "lb/h"] as const) {
      const back = toMolPerSecond({ value: fromMolPerSecond(2.5, unit, { molarMassGPerMol: 44.0095 }), unit, molarMassGPerMol: 44.0095 });
      expect(back).toBeCloseTo(2.5, 10);
    }
  });
  it("a mass unit without a molar mass is an INVALID_ARGUMENT naming the function", () => {
    const e = caught(() => toMolPerSecond({ value: 1, unit: "kg/h" }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.message).toMatch(/toMolPerSecond requires a positive molarMassGPerMol for the mass unit kg\/h/);
    expect(caught(() => fromJoulePerMol(1, "kJ/kg", { molarMassGPerMol: -2 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => toMolPerSecond({ value: 1, unit: "gal/min" as never })).message).toMatch(/does not know the unit gal\/min/);
    expect(caught(() => fromWatt(Number.NaN, "kW")).code).toBe("INVALID_ARGUMENT");
  });
  it("toWatt / fromWatt (NIST SP 811 Appendix B: 1 Btu_IT/h = 0.293 071 1 W)", () => {
    expect(toWatt(1, "Btu/h")).toBeCloseTo(0.2930711, 7);
    expect(toWatt(1, "MMBtu/h")).toBeCloseTo(293071.0701722222, 6);
    expect(fromWatt(-521756.75, "kW")).toBe(-521.75675);
    expect(fromWatt(2.5e6, "MW")).toBe(2.5);
    expect(fromWatt(4184, "kcal/h")).toBe(3600); // thermochemical calorie = 4.184 J (NIST SP 811)
  });
  it("fromJoulePerMol(value, unit) per amount, per mass and per Nm³", () => {
    expect(fromJoulePerMol(-890310.1, "kJ/mol")).toBe(-890.3101);
    expect(fromJoulePerMol(4184, "kcal/mol")).toBe(1);
    // 1 Btu_IT/lb = 2.326 kJ/kg exactly (NIST SP 811 Appendix B)
    expect(fromJoulePerMol(2326 * 16, "Btu/lb", { molarMassGPerMol: 16 })).toBe(1000);
    expect(fromJoulePerMol(890310.1, "MJ/kg", { molarMassGPerMol: 16.0425 })).toBeCloseTo(55.497, 3);
    expect(fromJoulePerMol(1000, "kJ/kmol")).toBe(1000);
    expect(fromJoulePerMol(1, "Btu/lbmol")).toBeCloseTo(453.59237 / 1055.05585262, 12);
    // 1 mol per 22.413 969 54 L (CODATA 2018) → kJ/Nm³
    expect(fromJoulePerMol(22413.96954, "kJ/Nm3")).toBeCloseTo(1000, 6);
    expect(fromJoulePerMol(22413.96954, "MJ/Nm³")).toBeCloseTo(1, 9);
  });
  it("fromPascal and fromJoule invert toPascal and toJoule", () => {
    expect(fromPascal(250000, "bar")).toBe(2.5);
    expect(fromPascal(101325, "atm")).toBe(1);
    expect(fromJoule(1055.05585262, "Btu")).toBe(1);
    expect(fromJoule(toJoule(3.7, "kcal"), "kcal")).toBe(3.7);
    expect(caught(() => fromPascal(1, "torr" as never)).code).toBe("INVALID_ARGUMENT");
  });
});

describe("docs/units.md: one example per function family (invented demo scenarios; values printed in the guide)", () => {
  it("prints the values the guide shows", async () => {
    const rx = await import("../src/index.js");
    const { molarMass } = rx;
    expect(toMolPerSecond({ value: 250, unit: "kg/h", molarMassGPerMol: molarMass("CH4") })).toBeCloseTo(4.3286, 4);
    const r = rx.balanceReaction("C3H8 + O2 -> CO2 + H2O");
    const o2 = toMolPerSecond({ value: 50, unit: "kg/h", molarMassGPerMol: molarMass("C3H8") }) * r.reactants[1]!.coefficient;
    expect(fromMolPerSecond(o2, "kg/h", { molarMassGPerMol: molarMass("O2") })).toBeCloseTo(181.41, 2);
    expect(fromMolPerSecond(o2, "Nm3/h")).toBeCloseTo(127.07, 2);
    const ex = rx.solveExtents({
      feed: { CH4: toMolPerSecond({ value: 36, unit: "kmol/h" }), H2O: toMolPerSecond({ value: 108, unit: "kmol/h" }) },
      reactions: ["CH4 + H2O -> CO + 3 H2"], specs: [{ of: "CH4", conversion: 0.8 }],
    });
    expect(fromMolPerSecond(ex.outlet["H2"]!, "kmol/h")).toBeCloseTo(86.4, 9);
    expect(fromMolPerSecond(ex.outlet["H2"]!, "Nm3/h")).toBeCloseTo(1936.6, 1);
    const co2 = rx.species("CO2(g)");
    const dH = co2.enthalpy(toKelvin(500, "C")) - co2.enthalpy(toKelvin(25, "C"));
    // NIST-JANAF 4th ed. 1998: CO2 H°−H°298 at 800 K is 22.806 kJ/mol, at 700 K 17.754 — 773.15 K lies between
    expect(dH).toBeGreaterThan(17754);
    expect(dH).toBeLessThan(22806);
    expect(fromJoulePerMol(dH, "kJ/kg", { molarMassGPerMol: molarMass("CO2") })).toBeCloseTo(487.07, 2);
    expect(fromJoulePerMol(dH, "Btu/lb", { molarMassGPerMol: molarMass("CO2") })).toBeCloseTo(209.40, 2);
    const dHr = rx.reactionEnthalpy("CO(g) + 2 H2(g) -> CH3OH(g)", { T: toKelvin(250, "C") }).value;
    expect(fromJoulePerMol(dHr, "kJ/mol")).toBeCloseTo(-98.613, 3);
    expect(fromJoulePerMol(dHr, "Btu/lbmol")).toBeCloseTo(-42396, 0);
    expect(fromJoulePerMol(rx.heatingValue("C3H8(g)"), "Btu/lb", { molarMassGPerMol: molarMass("C3H8") })).toBeCloseTo(21644, 0);
    expect(fromJoulePerMol(rx.heatingValue("C3H8(g)", { basis: "lower" }), "MJ/Nm3")).toBeCloseTo(91.194, 3);
    const n2 = toMolPerSecond({ value: 500, unit: "Nm3/h" });
    const q = rx.heatDuty({ inlet: { T: toKelvin(25, "C"), flows: { "N2(g)": n2 } }, outlet: { T: toKelvin(350, "C"), flows: { "N2(g)": n2 } } });
    expect(fromWatt(q.duty, "kW")).toBeCloseTo(59.435, 3);
    expect(fromWatt(q.duty, "Btu/h")).toBeCloseTo(202802, -1);
    const f = rx.adiabaticFlameTemperature({ fuel: "CH4(g)", excessAir: 0.15, oxidizerT: toKelvin(200, "C"), P: toPascal(2, "bar") });
    expect(fromKelvin(f.T, "C")).toBeCloseTo(1924.0, 1);
    expect(fromKelvin(f.T, "F")).toBeCloseTo(3495.2, 1);
  });

  it("the @examples of the converters", () => {
    expect(toWatt(1, "MMBtu/h")).toBe(293071.0701722222);
    expect(toMolPerSecond({ value: 57.753, unit: "kg/h", molarMassGPerMol: 16.0425 })).toBeCloseTo(1, 12);
    expect(fromMolPerSecond(1, "Nm3/h")).toBeCloseTo(80.6903, 4);
    expect(fromJoulePerMol(890310.1, "MJ/kg", { molarMassGPerMol: 16.0425 })).toBeCloseTo(55.497, 3);
  });
});

describe("unknown units", () => {
  it("a name inherited from Object.prototype is not a unit", () => {
    expect(caught(() => toPascal(1, "toString" as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => toMolPerSecond({ value: 1, unit: "constructor" as never })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => toMol(1, "hasOwnProperty" as never)).code).toBe("INVALID_ARGUMENT");
  });
});

describe("converter invariants (fast-check)", () => {
  const FLOWS = ["mol/s", "mol/h", "kmol/s", "kmol/h", "lbmol/h", "g/s", "kg/s", "kg/h", "t/h", "lb/h", "Nm3/h", "Nm³/h"] as const;
  const POWERS = ["W", "kW", "MW", "kcal/h", "Btu/h", "MMBtu/h"] as const;
  const ENERGIES = ["J/mol", "kJ/mol", "kJ/kmol", "kcal/mol", "Btu/lbmol", "J/g", "kJ/kg", "MJ/kg", "Btu/lb", "kJ/Nm3", "MJ/Nm3"] as const;
  const value = fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true });
  const molar = fc.double({ min: 1, max: 1000, noNaN: true });

  fcTest.prop([value, fc.constantFrom(...FLOWS), molar])("fromMolPerSecond(toMolPerSecond(x)) = x to 1e-11 relative", (x, unit, M) => {
    const back = fromMolPerSecond(toMolPerSecond({ value: x, unit, molarMassGPerMol: M }), unit, { molarMassGPerMol: M });
    expect(Math.abs(back - x)).toBeLessThanOrEqual(1e-11 * Math.abs(x) + 1e-300);
  });
  fcTest.prop([value, fc.constantFrom(...POWERS)])("fromWatt(toWatt(x)) = x to 1e-11 relative", (x, unit) => {
    expect(Math.abs(fromWatt(toWatt(x, unit), unit) - x)).toBeLessThanOrEqual(1e-11 * Math.abs(x) + 1e-300);
  });
  fcTest.prop([value, value, fc.constantFrom(...ENERGIES), molar])("fromJoulePerMol is linear: f(a + b) = f(a) + f(b)", (a, b, unit, M) => {
    const f = (x: number) => fromJoulePerMol(x, unit, { molarMassGPerMol: M });
    expect(Math.abs(f(a + b) - f(a) - f(b))).toBeLessThanOrEqual(1e-9 * (Math.abs(f(a)) + Math.abs(f(b))) + 1e-9);
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

  it("results beyond float64 and tiny molar masses are INVALID_ARGUMENT, not ±Infinity", () => {
    // hostile-input findings: 1e308 W-multiples and 5e-324 g/mol divisors overflow float64
    for (const f of [
      () => toWatt(1e308, "MMBtu/h"),
      () => toWatt(-1e308, "kW"),
      () => fromMolPerSecond(1e308, "Nm3/h"),
      () => fromMolPerSecond(1, "kg/h", { molarMassGPerMol: 1e308 }),
      () => toMolPerSecond({ value: 1, unit: "kg/h", molarMassGPerMol: 5e-324 }),
      () => fromJoulePerMol(1, "kJ/kg", { molarMassGPerMol: 5e-324 }),
    ]) {
      const e = caught(f);
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.message).toMatch(/cannot represent its result/);
    }
    const m = caught(() => fromJoulePerMol(1, "kJ/kg", { molarMassGPerMol: Number.POSITIVE_INFINITY }));
    expect(m.details.path).toBe("options.molarMassGPerMol");
    expect(caught(() => toMolPerSecond({ value: 1, unit: "kg/h", molarMassGPerMol: Number.NaN })).details.path).toBe("flow.molarMassGPerMol");
  });
  it("options of fromMolPerSecond and fromJoulePerMol must be an object when given", () => {
    for (const f of [() => fromMolPerSecond(1, "kg/h", null as never), () => fromJoulePerMol(1, "kJ/mol", 5 as never)]) {
      const e = caught(f);
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details.path).toBe("options");
    }
    expect(fromMolPerSecond(10, "kmol/h", undefined)).toBe(36);
  });
});
