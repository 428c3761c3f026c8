import { describe, expect, it } from "vitest";
import { wobbeIndex, AIR_MOLAR_MASS_G_PER_MOL } from "../../src/enthalpy/wobbeIndex.js";
import { heatingValue } from "../../src/enthalpy/heatingValue.js";
import { molarMass } from "../../src/formula/molarMass.js";
import { caught } from "./_helpers.js";

describe("wobbeIndex", () => {
  it("wobbeIndex(CH4) is the documented example", () => {
    expect(Math.round(wobbeIndex("CH4(g)") / 1e4) / 100).toBe(53.37);
  });

  it("wobbeIndex(CH4) is near the published value for methane", () => {
    // ISO 6976:1995 (from memory): methane superior Wobbe index ≈ 53.45 MJ/m³ at 0 °C (real gas);
    // ideal-gas volumes (no compression factor) shift it by about 0.2 %
    expect(Math.abs(wobbeIndex("CH4(g)") / 1e6 / 53.45 - 1)).toBeLessThan(0.005);
  });

  it("wobbeIndex of a mixture is HV per Nm³ over √(M/M_air)", () => {
    const gas = { "CH4(g)": 0.9, "C2H6(g)": 0.05, "N2(g)": 0.05 };
    const m = 0.9 * molarMass("CH4") + 0.05 * molarMass("C2H6") + 0.05 * molarMass("N2");
    expect(wobbeIndex(gas)).toBeCloseTo(heatingValue(gas, { per: "Nm3" }) / Math.sqrt(m / AIR_MOLAR_MASS_G_PER_MOL), 3);
  });

  it("wobbeIndex rejects a liquid", () => {
    expect(caught(() => wobbeIndex("CH3OH(l)")).code).toBe("INVALID_ARGUMENT");
  });
});

describe("AIR_MOLAR_MASS_G_PER_MOL", () => {
  it("is the U.S. Standard Atmosphere 1976 sea-level value (the documented example)", () => {
    // U.S. Standard Atmosphere 1976: M0 = 28.9644 kg/kmol (from memory)
    expect(AIR_MOLAR_MASS_G_PER_MOL).toBe(28.9644);
  });
});
