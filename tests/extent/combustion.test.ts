import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { AIR_21_79, DRY_AIR, combustion } from "../../src/extent/combustion.js";
import type { Flows } from "../../src/extent/types.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { caught } from "../_helpers/caught.js";

function atoms(flows: Flows): Record<string, number> {
  const t: Record<string, number> = {};
  for (const [k, n] of Object.entries(flows)) {
    for (const [el, c] of Object.entries(parseFormula(k).elements)) t[el] = (t[el] ?? 0) + n * c;
  }
  return t;
}

describe("combustion", () => {
  it("combustion(CH4 in 21/79 air) gives the documented example", () => {
    const r = combustion({ fuel: { "CH4(g)": 1 }, oxidizer: AIR_21_79 });
    expect(r.theoreticalO2).toBe(2);
    // 2/0.21 mol air per mol CH4: derived from the 21/79 air convention (common practice)
    expect(r.air).toBeCloseTo(2 / 0.21, 12);
    // dry CO2 at stoichiometric = 1/(1 + 2·79/21) = 11.73 %: derived from the 21/79 convention;
    // the familiar "11.7 % maximum CO2 of methane" of combustion handbooks (from memory)
    expect(r.dry["CO2(g)"]).toBeCloseTo(1 / (1 + (2 * 0.79) / 0.21), 12);
    expect(r.dry["CO2(g)"]).toBeCloseTo(0.117, 3);
    expect(r.wet["H2O(g)"]).toBeCloseTo(2 / (1 + 2 + (2 * 0.79) / 0.21), 12);
    expect(r.flueGas["O2(g)"]).toBe(0);
  });

  it("the default DRY_AIR sums to 1 and holds the U.S. Standard Atmosphere 1976 O2 and Ar fractions", () => {
    // U.S. Standard Atmosphere 1976, table 3: O2 0.209476, Ar 0.00934 (mole fractions of dry air) — from memory
    expect(DRY_AIR["O2(g)"]).toBe(0.209476);
    expect(DRY_AIR["Ar(g)"]).toBe(0.00934);
    const sum = Object.values(DRY_AIR).reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(1, 14);
    expect(AIR_21_79["N2(g)"]).toBe(0.79);
  });

  describe("theoretical air per kg of fuel against combustion-handbook values", () => {
    // Handbook values (kg dry air per kg fuel, rounded to 0.1) as tabulated in combustion handbooks —
    // from memory; toBeCloseTo(v, 1) checks agreement within the table's rounding (± 0.05). Those tables
    // use real dry air (O2 0.2095, M 28.96 g/mol), so the checks pass DRY_AIR rather than the default
    // 21/79 air (which gives 17.1 kg/kg for methane: 0.24 % more air by mole but a lighter air).
    it("methane 17.2 kg/kg (from memory)", () => {
      expect(combustion({ fuel: { "CH4(g)": 1 }, oxidizer: DRY_AIR }).theoreticalAirToFuelMass).toBeCloseTo(17.2, 1);
    });
    it("propane 15.7 kg/kg (from memory)", () => {
      expect(combustion({ fuel: { "C3H8(g)": 1 }, oxidizer: DRY_AIR }).theoreticalAirToFuelMass).toBeCloseTo(15.7, 1);
    });
    it("hydrogen 34.3 kg/kg (from memory)", () => {
      expect(combustion({ fuel: { "H2(g)": 1 }, oxidizer: DRY_AIR }).theoreticalAirToFuelMass).toBeCloseTo(34.3, 1);
    });
    it("carbon 11.5 kg/kg (from memory)", () => {
      expect(combustion({ fuel: { "C(s)": 1 }, oxidizer: DRY_AIR }).theoreticalAirToFuelMass).toBeCloseTo(11.5, 1);
    });
    it("a coal by ultimate analysis: 11.5 C + 34.3 (H − O/8) + 4.3 S kg/kg (common practice; coefficients from memory)", () => {
      // invented coal, as-fired mass fractions
      const u = { C: 0.7, H: 0.05, O: 0.08, N: 0.015, S: 0.01, moisture: 0.08, ash: 0.065 };
      const r = combustion({ fuel: { ultimate: u }, oxidizer: DRY_AIR });
      const formula = 11.5 * u.C + 34.3 * (u.H - u.O / 8) + 4.3 * u.S;
      // the three-significant-figure coefficients carry about 0.2 % rounding
      expect(Math.abs(r.theoreticalAirToFuelMass / formula - 1)).toBeLessThan(0.002);
      expect(r.ashKg).toBeCloseTo(0.065, 15);
      expect(r.fuelMassKg).toBe(1);
      // moisture leaves as vapour: 80 g / 18.015 g/mol plus 50 g H / 1.008 g/mol / 2 (IUPAC atomic weights)
      expect(r.flueGas["H2O(g)"]).toBeCloseTo(80 / 18.015 + 50 / 1.008 / 2, 9);
      expect(r.flueGas["SO2(g)"]).toBeCloseTo(10 / 32.06, 9);
    });
  });

  it("excess air and equivalence ratio are two views of one number", () => {
    const a = combustion({ fuel: { CH4: 1 }, excessAir: 0.25 });
    const b = combustion({ fuel: { CH4: 1 }, equivalenceRatio: 0.8 });
    expect(b.excessAir).toBeCloseTo(0.25, 14);
    expect(a.equivalenceRatio).toBe(0.8);
    expect(a.dryAir).toBeCloseTo(1.25 * a.theoreticalAir, 12);
    // excess O2 leaves unburnt: 0.25 · 2 mol
    expect(a.flueGas["O2(g)"]).toBeCloseTo(0.5, 12);
  });

  it("humid air adds its water to the air and the flue gas; pure oxygen leaves no nitrogen", () => {
    const dry = combustion({ fuel: { CH4: 1 } });
    const wet = combustion({ fuel: { CH4: 1 }, humidity: { waterMoleFraction: 0.02 } });
    expect(wet.air - wet.dryAir).toBeCloseTo((dry.dryAir * 0.02) / 0.98, 12);
    expect(wet.flueGas["H2O(g)"]! - dry.flueGas["H2O(g)"]!).toBeCloseTo((dry.dryAir * 0.02) / 0.98, 12);
    expect(wet.dry).toEqual(dry.dry);
    const rh = combustion({ fuel: { CH4: 1 }, humidity: { relativeHumidity: 0.5, temperatureK: 300, pressurePa: 101325 } });
    // IAPWS-IF97 check value p_sat(300 K) = 3536.589 Pa (IAPWS R7-97, table 35 — check value from memory)
    expect((rh.air - rh.dryAir) / rh.air).toBeCloseTo((0.5 * 3536.58941) / 101325, 8);
    const ox = combustion({ fuel: { CH4: 1 }, oxygenEnrichment: 1 });
    expect(ox.dry).toEqual({ "CO2(g)": 1, "N2(g)": 0, "O2(g)": 0 });
    const enriched = combustion({ fuel: { CH4: 1 }, oxygenEnrichment: 0.3 });
    expect(enriched.theoreticalAir).toBeCloseTo(2 / 0.3, 12);
  });

  it("a fraction of carbon to CO keeps its unused oxygen in the flue gas", () => {
    const r = combustion({ fuel: { CH4: 1 }, excessAir: 0.1, carbonToCO: 0.01 });
    expect(r.flueGas["CO(g)"]).toBeCloseTo(0.01, 15);
    expect(r.airFlows["CO2(g)"]).toBeUndefined(); // the default 21/79 air carries no CO2
    expect(r.flueGas["CO2(g)"]).toBeCloseTo(0.99, 12);
    expect(r.flueGas["O2(g)"]).toBeCloseTo(0.2 + 0.005, 12);
  });

  it("combustion gives the README example values (21/79 air, the default everywhere)", () => {
    const gas = { "CH4(g)": 0.9, "C2H6(g)": 0.06, "N2(g)": 0.04 }; // invented natural gas
    const fire = combustion({ fuel: gas, excessAir: 0.15 });
    // hand: O2 = 0.9·2 + 0.06·3.5 = 2.01 mol; air = 1.15·2.01/0.21 = 11.00714 mol (21/79 air, common practice)
    expect(fire.air).toBeCloseTo(1.15 * 2.01 / 0.21, 12);
    expect(fire.air).toBeCloseTo(11.007, 3);
    expect(fire.dry["CO2(g)"]).toBeCloseTo(0.1014, 4);
  });

  it("one default air: omitted, \"air\" and AIR_21_79 give the same flue gas; \"oxygen\" is pure O2", () => {
    const a = combustion({ fuel: { "CH4(g)": 1 }, excessAir: 0.1 });
    const b = combustion({ fuel: { "CH4(g)": 1 }, excessAir: 0.1, oxidizer: "air" });
    const c = combustion({ fuel: { "CH4(g)": 1 }, excessAir: 0.1, oxidizer: AIR_21_79 });
    expect(a.flueGas).toEqual(b.flueGas);
    expect(a.flueGas).toEqual(c.flueGas);
    expect(a.flueGas["Ar(g)"]).toBeUndefined();
    const o = combustion({ fuel: { "CH4(g)": 1 }, oxidizer: "oxygen" });
    expect(o.air).toBe(2);
    expect(caught(() => combustion({ fuel: { "CH4(g)": 1 }, oxidizer: "ozone" as "air" })).code).toBe("INVALID_ARGUMENT");
  });

  it("fuel names resolve through a library as in the flame functions, and without one through the same names", async () => {
    const { builtInLibrary } = await import("../../src/species/builtInLibrary.js");
    const byName = combustion({ fuel: { methane: 1, "n-C4H10(g)": 0.5 }, library: builtInLibrary() });
    expect(byName.theoreticalO2).toBeCloseTo(2 + 0.5 * 6.5, 12);
    // the documented example: propane needs 5 O2 (C3H8 + 5 O2 -> 3 CO2 + 4 H2O)
    expect(combustion({ fuel: { propane: 1 } }).theoreticalO2).toBe(5);
    expect(combustion({ fuel: { methane: 1, "n-butane": 0.5 } })).toEqual(byName);
    expect(caught(() => combustion({ fuel: { unobtainium: 1 }, library: builtInLibrary() })).code).toBe("UNKNOWN_SPECIES");
  });

  it("a fuel name means the same species without a library as with builtInLibrary(): every built-in name and alias", async () => {
    const { builtInLibrary } = await import("../../src/species/builtInLibrary.js");
    const { SPECIES_NAMES } = await import("../../src/formula/speciesNames.js");
    const outcome = (fuel: Flows, library?: ReturnType<typeof builtInLibrary>): unknown => {
      try {
        return combustion({ fuel, excessAir: 0.1, ...(library !== undefined ? { library } : {}) });
      } catch (e) {
        return (e as { code: string }).code;
      }
    };
    let names = 0;
    for (const row of SPECIES_NAMES) {
      for (const n of [row.name, ...row.aliases, row.name.toUpperCase(), `${row.name}(${row.phase})`]) {
        expect(outcome({ [n]: 1 }), n).toEqual(outcome({ [n]: 1 }, builtInLibrary()));
        names++;
      }
    }
    expect(names).toBeGreaterThan(300);
  });

  it("same name, same result: combustion, availableHeat and the flame functions read methane, propane, hydrogen alike", async () => {
    const { availableHeat } = await import("../../src/energy/availableHeat.js");
    const { adiabaticFlameTemperature } = await import("../../src/flame/adiabaticFlameTemperature.js");
    const cases: [string, string][] = [["methane", "CH4(g)"], ["propane", "C3H8(g)"], ["hydrogen", "H2(g)"], ["n-butane", "n-C4H10(g)"], ["carbon monoxide", "CO(g)"]];
    for (const [name, key] of cases) {
      const c = combustion({ fuel: { [name]: 1 }, excessAir: 0.15 });
      expect(c, name).toEqual(combustion({ fuel: { [key]: 1 }, excessAir: 0.15 }));
      const h = availableHeat({ fuel: name, excessAir: 0.15, flueT: 450 });
      expect(h, name).toEqual(availableHeat({ fuel: key, excessAir: 0.15, flueT: 450 }));
      const f = adiabaticFlameTemperature({ fuel: name, excessAir: 0.15 });
      expect(f.T, name).toBe(adiabaticFlameTemperature({ fuel: key, excessAir: 0.15 }).T);
      // the air of the flame is the air of combustion (same default air, same theoretical O2)
      expect(f.oxidizer["O2(g)"]!, name).toBeCloseTo(c.o2Supplied, 12);
      expect(f.oxidizer["N2(g)"]!, name).toBeCloseTo(c.airFlows["N2(g)"]!, 12);
    }
    for (const call of [
      () => combustion({ fuel: { "natural gas": 1 } }),
      () => availableHeat({ fuel: "natural gas", flueT: 450 }),
      () => adiabaticFlameTemperature({ fuel: "natural gas" }),
    ]) {
      const e = caught(call);
      expect(e.code).toBe("UNKNOWN_SPECIES");
      expect(e.message).toContain("findSpecies");
    }
  });

  it("a name is not a mixture: natural gas is UNKNOWN_SPECIES pointing to findSpecies; a name of two phases asks for the phase", () => {
    const e = caught(() => combustion({ fuel: { "natural gas": 1 } }));
    expect(e.code).toBe("UNKNOWN_SPECIES");
    expect(e.message).toContain("findSpecies");
    expect(e.message).toContain("species amounts");
    expect(e.details.species).toBe("natural gas");
    const w = caught(() => combustion({ fuel: { ethanol: 1 } }));
    expect(w.code).toBe("AMBIGUOUS_PHASE");
    expect(w.details.choices).toEqual(["C2H5OH(g)", "C2H5OH(l)"]);
    expect(combustion({ fuel: { "ethanol(l)": 1 } }).theoreticalO2).toBe(3);
    // formula-like text keeps the formula's own error
    expect(caught(() => combustion({ fuel: { Xx2: 1 } })).code).toBe("UNKNOWN_ELEMENT");
  });

  it("a biogas with CO2, N2 and H2S burns by its elements", () => {
    // invented biogas
    const r = combustion({ fuel: { "CH4(g)": 0.6, "CO2(g)": 0.37, "N2(g)": 0.02, "H2S(g)": 0.01 }, excessAir: 0.15 });
    expect(r.theoreticalO2).toBeCloseTo(0.6 * 2 + 0.01 * 1.5, 12);
    expect(r.flueGas["SO2(g)"]).toBeCloseTo(0.01, 15);
  });

  test.prop([
    fc.record({
      CH4: fc.integer({ min: 0, max: 100 }),
      C2H6: fc.integer({ min: 0, max: 100 }),
      H2: fc.integer({ min: 0, max: 100 }),
      CO: fc.integer({ min: 0, max: 100 }),
      CO2: fc.integer({ min: 0, max: 100 }),
      N2: fc.integer({ min: 0, max: 100 }),
      H2S: fc.integer({ min: 0, max: 10 }),
      NH3: fc.integer({ min: 0, max: 10 }),
      CH3OH: fc.integer({ min: 0, max: 100 }),
      Ar: fc.integer({ min: 0, max: 10 }),
    }),
    fc.double({ min: 0, max: 3, noNaN: true }),
    fc.double({ min: 0, max: 0.05, noNaN: true }),
  ])("combustion conserves every element from fuel + air to flue gas", (gas, excessAir, water) => {
    const fuel: Flows = Object.fromEntries(Object.entries(gas).map(([k, v]) => [k, v / 10]));
    fuel.CH4 = (fuel.CH4 ?? 0) + 0.1; // always something to burn
    const r = combustion({ fuel, excessAir, humidity: { waterMoleFraction: water } });
    const tin = atoms({ ...fuel });
    for (const [el, v] of Object.entries(atoms(r.airFlows))) tin[el] = (tin[el] ?? 0) + v;
    const tout = atoms(r.flueGas);
    for (const el of Object.keys(tin)) expect(tout[el] ?? 0).toBeCloseTo(tin[el] as number, 9);
    expect(Object.values(r.wet).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(Object.values(r.dry).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });

  it("does not mutate frozen inputs", () => {
    const input = Object.freeze({ fuel: Object.freeze({ "CH4(g)": 1 }), oxidizer: AIR_21_79, excessAir: 0.1 });
    expect(combustion(input).excessAir).toBe(0.1);
    expect(Object.isFrozen(DRY_AIR)).toBe(true);
  });

  describe("errors", () => {
    it("rich mixtures are rejected with the oxygen deficit", () => {
      const e = caught(() => combustion({ fuel: { CH4: 1 }, equivalenceRatio: 1.25 }));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details.oxygenDeficit).toBeCloseTo(0.4, 12);
      expect(caught(() => combustion({ fuel: { CH4: 1 }, excessAir: -0.1 })).code).toBe("INVALID_ARGUMENT");
      expect(caught(() => combustion({ fuel: { CH4: 1 }, excessAir: 0.1, equivalenceRatio: 0.9 })).code).toBe("INVALID_ARGUMENT");
    });
    it("NOTHING_TO_BURN, NO_OXIDIZER, ELEMENTS_NOT_COVERED, NEGATIVE_FLOW, bad keys", () => {
      expect(caught(() => combustion({ fuel: { CO2: 1, H2O: 1 } })).code).toBe("NOTHING_TO_BURN");
      expect(caught(() => combustion({ fuel: { CH4: 1 }, oxidizer: { N2: 1 } })).code).toBe("NO_OXIDIZER");
      const c = caught(() => combustion({ fuel: { CH3Cl: 1 } }));
      expect(c.code).toBe("ELEMENTS_NOT_COVERED");
      expect(c.details.elements).toEqual(["Cl"]);
      const d = caught(() => combustion({ fuel: { CH4: -1 } }));
      expect(d.code).toBe("NEGATIVE_FLOW");
      expect(d.details.species).toBe("CH4");
      expect(caught(() => combustion({ fuel: { Zz: 1 } })).code).toBe("UNKNOWN_ELEMENT");
      expect(caught(() => combustion({ fuel: { CH4: 1 }, oxidizer: { O2: 1, CH4: 1 } })).code).toBe("INVALID_ARGUMENT");
    });
    it("an ultimate analysis must sum to 1 and be given as fractions", () => {
      const e = caught(() => combustion({ fuel: { ultimate: { C: 70, H: 5, O: 25 } } }));
      expect(e.code).toBe("INVALID_ARGUMENT");
      const f = caught(() => combustion({ fuel: { ultimate: { C: 0.7, H: 0.05 } } }));
      expect(f.code).toBe("INVALID_ARGUMENT");
      expect(f.details.sum).toBeCloseTo(0.75, 12);
    });
  });
});
