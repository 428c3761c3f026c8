import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { AIR_21_79, DRY_AIR, combustion } from "../../src/extent/combustion.js";
import { excessAirFromFlueCO2, excessAirFromFlueO2 } from "../../src/extent/excessAirFromFlueO2.js";
import { caught } from "../_helpers/caught.js";

describe("excessAirFromFlueO2", () => {
  it("excessAirFromFlueO2 for carbon is O2/(y_O2 − O2) exactly (the documented example)", () => {
    // derived: burning C to CO2 leaves the dry gas volume unchanged, so x = e·y/(1 + e); y = 0.21 in the
    // default 21/79 air (common practice), 0.209476 in DRY_AIR (U.S. Standard Atmosphere 1976, from memory)
    expect(excessAirFromFlueO2({ fuel: { C: 1 }, dryO2: 0.03 })).toBeCloseTo(0.03 / (0.21 - 0.03), 14);
    expect(excessAirFromFlueO2({ fuel: { C: 1 }, dryO2: 0.03, oxidizer: DRY_AIR })).toBeCloseTo(0.03 / (0.209476 - 0.03), 14);
  });
  it("matches the analyser rule of thumb excess ≈ O2%/(20.9 − O2%) for carbon (common practice)", () => {
    for (const o2 of [1, 2, 3, 5, 8]) {
      expect(excessAirFromFlueO2({ fuel: { C: 1 }, dryO2: o2 / 100 })).toBeCloseTo(o2 / (20.9 - o2), 2);
    }
  });
  it("for methane the rule of thumb overstates excess air (dry flue gas is smaller than the air)", () => {
    const exact = excessAirFromFlueO2({ fuel: { CH4: 1 }, dryO2: 0.03 });
    expect(exact).toBeLessThan(3 / (20.9 - 3));
    expect(exact).toBeGreaterThan(0.13);
  });
  test.prop([fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 0.03, noNaN: true })])(
    "excessAirFromFlueO2 inverts combustion (round trip)",
    (excessAir, water) => {
      const fuel = { "CH4(g)": 0.9, "C2H6(g)": 0.05, "N2(g)": 0.05 };
      const r = combustion({ fuel, excessAir, humidity: { waterMoleFraction: water } });
      const back = excessAirFromFlueO2({ fuel, humidity: { waterMoleFraction: water }, dryO2: r.dry["O2(g)"] as number });
      expect(back).toBeCloseTo(excessAir, 9);
    },
  );
  it("rejects impossible readings and percentages", () => {
    const a = caught(() => excessAirFromFlueO2({ fuel: { CH4: 1 }, dryO2: 0.25 }));
    expect(a.code).toBe("INVALID_ARGUMENT");
    expect(a.details.range).toBeDefined();
    const b = caught(() => excessAirFromFlueO2({ fuel: { CH4: 1 }, dryO2: 3 }));
    expect(b.code).toBe("INVALID_ARGUMENT");
    expect(b.message).toContain("not %");
  });
});

describe("excessAirFromFlueCO2", () => {
  it("excessAirFromFlueCO2 gives the documented example (hand solution 1/(8.5238 + 9.5238 e) = 0.1)", () => {
    expect(excessAirFromFlueCO2({ fuel: { "CH4(g)": 1 }, oxidizer: AIR_21_79, dryCO2: 0.1 })).toBeCloseTo(0.155, 12);
  });
  it("the stoichiometric dry CO2 gives zero excess air; a higher reading is rejected", () => {
    const stoich = combustion({ fuel: { CH4: 1 } }).dry["CO2(g)"] as number;
    expect(excessAirFromFlueCO2({ fuel: { CH4: 1 }, dryCO2: stoich })).toBe(0);
    expect(caught(() => excessAirFromFlueCO2({ fuel: { CH4: 1 }, dryCO2: stoich + 0.01 })).code).toBe("INVALID_ARGUMENT");
  });
});
