import { describe, expect, it } from "vitest";
import { fc, test } from "../_helpers/property.js";
import { availableHeat } from "../../src/energy/availableHeat.js";
import { species } from "../../src/species/species.js";
import { caught } from "../_helpers/caught.js";

const H = (key: string, T: number): number => species(key).enthalpy(T);
const N2_PER_O2 = 0.79 / 0.21; // 21/79 air (common practice), the library's default air

/**
 * Independent balance for a fuel burnt completely in 21/79 air, written out element by element here
 * and summed from species().enthalpy: fuel + (1 + e)·O2stoich·(O2 + 3.762 N2) → CO2 + H2O(g) + SO2 + N2 + e·O2stoich O2.
 */
function handBalance(fuel: Record<string, number>, e: number, T: { fuel: number; air: number; flue: number }) {
  let C = 0, Hy = 0, O = 0, S = 0, N = 0, total = 0;
  for (const [k, n] of Object.entries(fuel)) total += n;
  let hFuel = 0;
  for (const [k, n] of Object.entries(fuel)) {
    const x = n / total;
    const el = species(k).formula.elements;
    C += x * (el.C ?? 0); Hy += x * (el.H ?? 0); O += x * (el.O ?? 0); S += x * (el.S ?? 0); N += x * (el.N ?? 0);
    hFuel += x * H(k, T.fuel);
  }
  const o2 = C + Hy / 4 + S - O / 2;
  const o2Fed = (1 + e) * o2;
  const hAir = o2Fed * (H("O2(g)", T.air) + N2_PER_O2 * H("N2(g)", T.air));
  const flue: Record<string, number> = { "CO2(g)": C, "H2O(g)": Hy / 2, "SO2(g)": S, "N2(g)": N / 2 + o2Fed * N2_PER_O2, "O2(g)": e * o2 };
  let hFlue = 0;
  for (const [k, n] of Object.entries(flue)) if (n > 0) hFlue += n * H(k, T.flue);
  // heating values at 298.15 K from the same species enthalpies (Hess's law)
  const products = (water: string) =>
    C * H("CO2(g)", 298.15) + (Hy / 2) * H(water, 298.15) + S * H("SO2(g)", 298.15);
  let hFuel298 = 0;
  for (const [k, n] of Object.entries(fuel)) hFuel298 += (n / total) * H(k, 298.15);
  const lhv = hFuel298 - products("H2O(g)");
  const hhv = hFuel298 - products("H2O(l)");
  return { q: hFuel + hAir - hFlue, lhv, hhv, flue };
}

// Refinery fuel gas of our own invention (mole fractions): hydrogen-rich, with olefins, inerts and H2S.
const REFINERY_GAS = {
  "H2(g)": 0.3, "CH4(g)": 0.4, "C2H6(g)": 0.15, "C3H8(g)": 0.08, "C2H4(g)": 0.03, "N2(g)": 0.03, "H2S(g)": 0.01,
};

describe("availableHeat", () => {
  it("availableHeat gives the documented example values", () => {
    const r = availableHeat({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 });
    expect(r.efficiencyLHV).toBeCloseTo(0.92993, 5); // @example
    expect(r.efficiencyHHV).toBeCloseTo(0.838, 5); // @example
    expect(r.stackLoss).toBeCloseTo(56220.4, 1); // @example
    expect(r.waterDewPointK).toBeCloseTo(329.7, 1); // README and docs/fired-equipment.md
  });

  for (const [label, fuel] of [["methane", { "CH4(g)": 1 }], ["a refinery fuel gas (invented)", REFINERY_GAS]] as const) {
    for (const [e, flueT] of [[0.1, 420], [0.25, 600], [0, 1100]] as const) {
      it(`availableHeat(${label}, ${e * 100} % excess air, flue ${flueT} K) equals an independent sum of species enthalpies on the LHV and HHV bases`, () => {
        const hand = handBalance(fuel, e, { fuel: 298.15, air: 298.15, flue: flueT });
        const r = availableHeat({ fuel, excessAir: e, flueT });
        expect(Math.abs(r.availableHeat / hand.q - 1)).toBeLessThan(1e-9);
        expect(Math.abs(r.lhv / hand.lhv - 1)).toBeLessThan(1e-9);
        expect(Math.abs(r.hhv / hand.hhv - 1)).toBeLessThan(1e-9);
        expect(r.efficiencyLHV).toBeCloseTo(hand.q / hand.lhv, 9);
        expect(r.efficiencyHHV).toBeCloseTo(hand.q / hand.hhv, 9);
        for (const [k, n] of Object.entries(hand.flue)) if (n > 0) expect(r.flueGas[k]).toBeCloseTo(n, 12);
      });
    }
  }

  it("availableHeat(CH4) LHV and HHV are the NIST-JANAF heats of combustion", () => {
    const r = availableHeat({ fuel: "CH4(g)", flueT: 500 });
    // ΔcH° of CH4: −802.3 kJ/mol (H2O gas) and −890.3 kJ/mol (H2O liquid), NIST-JANAF 4th ed. 1998 formation enthalpies
    expect(r.lhv / 1000).toBeCloseTo(802.3, 1);
    expect(r.hhv / 1000).toBeCloseTo(890.3, 1);
  });

  it("the preheat effect equals the air's sensible heat", () => {
    const base = { fuel: REFINERY_GAS, excessAir: 0.15, flueT: 450 };
    const cold = availableHeat(base);
    const hot = availableHeat({ ...base, airT: 600 });
    const hand = handBalance(REFINERY_GAS, 0.15, { fuel: 298.15, air: 298.15, flue: 450 });
    const o2Fed = (hand.flue["O2(g)"]! / 0.15) * 1.15;
    const airSensible = o2Fed * (H("O2(g)", 600) - H("O2(g)", 298.15) + N2_PER_O2 * (H("N2(g)", 600) - H("N2(g)", 298.15)));
    expect(hot.availableHeat - cold.availableHeat).toBeCloseTo(airSensible, 6);
    expect(hot.sensibleAir).toBeCloseTo(airSensible, 6);
    expect(cold.sensibleAir).toBe(0);
  });

  it("availableHeat with a sulfur-bearing fuel reports the acid and water dew points", () => {
    const r = availableHeat({ fuel: REFINERY_GAS, excessAir: 0.15, flueT: 450 });
    expect(r.acidDewPointK).toBeGreaterThan(r.waterDewPointK!);
    expect(r.flueGas["SO2(g)"]).toBeCloseTo(0.01, 12);
    const low = availableHeat({ fuel: REFINERY_GAS, excessAir: 0.15, flueT: r.acidDewPointK! - 10 });
    expect(low.warnings.some((w) => w.includes("acid dew point"))).toBe(true);
  });

  it("unburned CO from a dry ppm reading costs its heating value", () => {
    const r = availableHeat({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450, coPpm: 200 });
    const clean = availableHeat({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 });
    expect(r.dry["CO(g)"]).toBeCloseTo(200e-6, 12);
    const nCO = r.flueGas["CO(g)"]!;
    // CO + ½ O2 → CO2: 282.98 kJ/mol, from the NIST-JANAF 4th ed. 1998 ΔfH° of CO (−110.53) and CO2 (−393.51 kJ/mol)
    expect(r.losses.unburnedCO / nCO / 1000).toBeCloseTo(283.0, 0);
    // the flue gas changes too (less CO2, more O2), so compare through the balance identity
    expect(r.availableHeat + r.stackLoss + r.losses.unburnedCO).toBeCloseTo(r.heatInputLHV, 5);
    expect(r.availableHeat).toBeLessThan(clean.availableHeat);
  });

  it("unburned carbon in ash costs 393.5 kJ per mol of carbon", () => {
    const byShare = availableHeat({ fuel: { "C(gr)": 1 }, excessAir: 0.3, flueT: 450, unburnedCarbon: { fractionOfFuelCarbon: 0.02 } });
    // −ΔfH°(CO2, g) = 393.52 kJ/mol, NIST-JANAF 4th ed. 1998
    expect(byShare.losses.unburnedCarbon / 0.02 / 1000).toBeCloseTo(393.52, 1);
    expect(byShare.flueGas["CO2(g)"]).toBeCloseTo(0.98, 12);
    // a reading of 10 % carbon in 0.2 kg ash per kg carbon: 0.2·0.1/0.9 kg C per kg fuel = 1/45 of the carbon
    const byAsh = availableHeat({ fuel: { "C(gr)": 1 }, excessAir: 0.3, flueT: 450, unburnedCarbon: { ashPerFuelMass: 0.2, carbonInAsh: 0.1 } });
    expect(byAsh.flueGas["CO2(g)"]).toBeCloseTo(1 - 0.2 * 0.1 / 0.9, 12);
  });

  it("condensing: the latent heat of the condensed water is recovered below the dew point", () => {
    const dry = availableHeat({ fuel: "CH4(g)", excessAir: 0.1, flueT: 330 });
    expect(dry.condensedWater).toBe(0);
    const wet = availableHeat({ fuel: "CH4(g)", excessAir: 0.1, flueT: 320, condensing: true });
    expect(wet.condensedWater).toBeGreaterThan(0);
    // the gas leaving is saturated: y_w·P = p_sat(320 K) = 10.55 kPa (steam tables at 46.85 °C — from memory)
    expect(wet.wet["H2O(g)"]! * 101325).toBeCloseTo(10550, -2);
    // latent heat at 298.15 K: 44.0 kJ/mol (NIST-JANAF 4th ed. 1998, ΔfH° H2O g − l)
    expect(wet.latentRecovered / wet.condensedWater / 1000).toBeCloseTo(44.0, 1);
    expect(wet.efficiencyHHV).toBeGreaterThan(0.9);
    expect(caught(() => availableHeat({ fuel: "CH4(g)", flueT: 290 })).code).toBe("INVALID_ARGUMENT");
  });

  it("liquid water fed with the fuel costs its latent heat (fuelMoisture) and the balance still closes", () => {
    const r = availableHeat({ fuel: { "CH4(g)": 0.9, "H2O(l)": 0.1 }, excessAir: 0.1, flueT: 450 });
    // 0.1 mol × 44.0 kJ/mol, the latent heat at 298.15 K from NIST-JANAF 4th ed. 1998 ΔfH° (H2O g − l)
    expect(r.losses.fuelMoisture / 1000).toBeCloseTo(4.40, 2);
    expect(r.lhv).toBeCloseTo(0.9 * availableHeat({ fuel: "CH4(g)", flueT: 450 }).lhv, 6); // the water is inert in the heating value
    expect(r.availableHeat + r.stackLoss + r.losses.fuelMoisture).toBeCloseTo(r.heatInputLHV, 5);
  });

  it("per kg and per Nm3 scale the energies by the fuel's molar mass and normal molar volume", () => {
    const mol = availableHeat({ fuel: "CH4(g)", excessAir: 0.1, flueT: 450 });
    const kg = availableHeat({ fuel: "CH4(g)", excessAir: 0.1, flueT: 450, per: "kg" });
    const nm3 = availableHeat({ fuel: "CH4(g)", excessAir: 0.1, flueT: 450, per: "Nm3" });
    expect(kg.availableHeat).toBeCloseTo(mol.availableHeat / 0.016043, 0); // M(CH4) 16.043 g/mol, IUPAC atomic weights
    expect(nm3.availableHeat).toBeCloseTo(mol.availableHeat / 0.0224139695, 0); // 0 °C, 101.325 kPa (CODATA 2018)
    expect(kg.efficiencyLHV).toBe(mol.efficiencyLHV);
  });

  it("names resolve through the species library, as in the flame functions", () => {
    expect(availableHeat({ fuel: "methane", flueT: 450 }).availableHeat).toBe(availableHeat({ fuel: "CH4(g)", flueT: 450 }).availableHeat);
  });

  it("rejects unit slips and bad input with coded errors", () => {
    const e = caught(() => availableHeat({ fuel: "CH4(g)", excessAir: 15, flueT: 450 }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.message).toContain("allowExtremeMixture");
    expect(availableHeat({ fuel: "CH4(g)", excessAir: 15, flueT: 450, allowExtremeMixture: true }).excessAir).toBe(15);
    const c = caught(() => availableHeat({ fuel: "CH4(g)", flueT: 180 }));
    expect(c.message).toContain("was °C meant?");
    expect(c.details.hint).toBe("was °C meant? 180 °C is 453.15 K");
    expect(caught(() => availableHeat({ fuel: "CH4(g)", equivalenceRatio: 1.2, flueT: 450 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => availableHeat({ fuel: "N2(g)", flueT: 450 })).code).toBe("NOTHING_TO_BURN");
    expect(caught(() => availableHeat({ fuel: "CH4(g)", flueT: 7000 })).code).toBe("OUT_OF_RANGE");
    expect(caught(() => availableHeat({ fuel: "CH4(g)", flueT: 450, coPpm: -1 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => availableHeat({ fuel: "H2(g)", flueT: 450, coPpm: 10 })).code).toBe("INVALID_ARGUMENT");
  });

  it("extrapolates only when asked, and says where", () => {
    const r = availableHeat({ fuel: "CH4(g)", flueT: 450, fuelT: 280, extrapolate: true });
    expect(r.extrapolated).toEqual([{ species: "CH4(g)", T: 280, range: [298, 6000] }]); // NIST WebBook Shomate CH4(g): 298–6000 K
    expect(availableHeat({ fuel: "CH4(g)", flueT: 450 }).extrapolated).toEqual([]);
  });

  it("does not mutate its input", () => {
    const input = Object.freeze({ fuel: Object.freeze({ ...REFINERY_GAS }), excessAir: 0.1, flueT: 450 });
    expect(() => availableHeat(input)).not.toThrow();
  });

  test.prop([
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 300, max: 1500, noNaN: true }),
    fc.double({ min: 1, max: 300, noNaN: true }),
  ])("efficiency falls as the flue temperature rises (fixed excess air)", (e, T, dT) => {
    const a = availableHeat({ fuel: REFINERY_GAS, excessAir: e, flueT: T });
    const b = availableHeat({ fuel: REFINERY_GAS, excessAir: e, flueT: T + dT });
    expect(b.efficiencyLHV).toBeLessThan(a.efficiencyLHV);
    expect(b.efficiencyHHV).toBeLessThan(a.efficiencyHHV);
  });

  test.prop([
    fc.double({ min: 0, max: 2, noNaN: true }),
    fc.double({ min: 0.01, max: 1, noNaN: true }),
    fc.double({ min: 310, max: 1500, noNaN: true }),
  ])("efficiency falls as excess air rises (fixed flue temperature above the air's)", (e, de, T) => {
    const a = availableHeat({ fuel: "CH4(g)", excessAir: e, flueT: T });
    const b = availableHeat({ fuel: "CH4(g)", excessAir: e + de, flueT: T });
    expect(b.efficiencyLHV).toBeLessThan(a.efficiencyLHV);
  });

  test.prop([
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 300, max: 1200, noNaN: true }),
    fc.double({ min: 298.15, max: 700, noNaN: true }),
    fc.double({ min: 0, max: 2000, noNaN: true }),
    fc.double({ min: 0, max: 0.1, noNaN: true }),
    fc.boolean(),
  ])("available heat + stack loss + losses = heat input (LHV and HHV bases)", (e, T, airT, coPpm, unburned, condensing) => {
    const r = availableHeat({
      fuel: { "CH4(g)": 0.6, "C2H6(g)": 0.1, "H2(g)": 0.2, "CO2(g)": 0.05, "H2S(g)": 0.05 },
      excessAir: e, flueT: T, airT, coPpm, unburnedCarbon: { fractionOfFuelCarbon: unburned }, condensing,
    });
    const losses = r.losses.unburnedCO + r.losses.unburnedCarbon + r.losses.fuelMoisture;
    const scale = r.heatInputHHV;
    expect(Math.abs(r.availableHeat + r.stackLoss + losses - r.heatInputLHV - r.latentRecovered) / scale).toBeLessThan(1e-9);
    expect(Math.abs(r.availableHeat + r.stackLoss + r.latentLossHHV + losses - r.heatInputHHV) / scale).toBeLessThan(1e-9);
  });

  it("availableHeat rejects a non-number setting with INVALID_ARGUMENT naming the field (no TypeError from the message)", () => {
    const base = { fuel: "CH4(g)", excessAir: 0.15, flueT: 450 };
    for (const field of ["excessAir", "equivalenceRatio", "fuelT", "airT", "flueT", "P", "coPpm", "per"] as const) {
      const e = caught(() => availableHeat({ ...base, ...(field === "equivalenceRatio" ? { excessAir: undefined } : {}), [field]: Object.assign(Object.create(null), { H: 1 }) as never }));
      expect(e.code, field).toBe("INVALID_ARGUMENT");
      expect(e.details.path, field).toBe(`input.${field}`);
      expect(e.message, field).toContain("an object");
    }
    expect(caught(() => availableHeat(null as never)).details.path).toBe("input");
    expect(caught(() => availableHeat({ ...base, unburnedCarbon: [] as never })).details.path).toBe("input.unburnedCarbon");
    expect(caught(() => availableHeat({ ...base, unburnedCarbon: { fractionOfFuelCarbon: 10n as never } })).details.path).toBe("input.unburnedCarbon.fractionOfFuelCarbon");
    expect(caught(() => availableHeat({ ...base, excessAir: 12 })).details.path).toBe("input.excessAir");
  });
});
