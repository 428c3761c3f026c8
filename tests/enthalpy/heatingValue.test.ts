import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { heatingValue, NORMAL_MOLAR_VOLUME_M3_PER_MOL } from "../../src/enthalpy/heatingValue.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { caught } from "./_helpers.js";

describe("heatingValue", () => {
  it("heatingValue(CH4) is the documented example (higher heating value per mol)", () => {
    expect(heatingValue("CH4(g)")).toBe(890310.1);
  });

  it("heatingValue reproduces published standard heats of combustion of 8 fuels (0.5 kJ/mol or 0.1 %)", () => {
    const published: [string, number, string][] = [
      ["H2(g)", 285.83, "CODATA Key Values 1989: ΔfH°(H2O, l) = −285.830 ± 0.040 kJ/mol (from memory)"],
      ["CO(g)", 282.98, "CODATA Key Values 1989: CO2 −393.51, CO −110.53 kJ/mol (from memory)"],
      ["CH4(g)", 890.7, "NIST Chemistry WebBook, methane ΔcH°gas −890.7 kJ/mol (from memory)"],
      ["C2H6(g)", 1560.7, "CRC Handbook of Chemistry and Physics, heat of combustion table (from memory)"],
      ["C3H8(g)", 2219.2, "CRC Handbook of Chemistry and Physics, heat of combustion table (from memory)"],
      ["C2H4(g)", 1411.2, "CRC Handbook of Chemistry and Physics, heat of combustion table (from memory)"],
      ["NH3(g)", 382.8, "CRC Handbook of Chemistry and Physics, heat of combustion table (from memory)"],
      ["H2S(g)", 562.0, "from CODATA Key Values 1989 ΔfH°: SO2(g) −296.81, H2S(g) −20.6, H2O(l) −285.830 kJ/mol (from memory)"],
    ];
    for (const [key, kJ, source] of published) {
      const v = heatingValue(key) / 1000;
      expect(Math.abs(v - kJ), `${key}: ${source}`).toBeLessThanOrEqual(Math.max(0.5, 1e-3 * kJ));
    }
  });

  it("heatingValue of methane per kg and per Nm³ (higher and lower)", () => {
    // common practice: methane HHV ≈ 55.5 MJ/kg, LHV ≈ 50.0 MJ/kg; HHV ≈ 39.8 MJ/Nm³ at 0 °C, 101.325 kPa
    expect(heatingValue("CH4(g)", { per: "kg" }) / 1e6).toBeCloseTo(55.5, 1);
    expect(heatingValue("CH4(g)", { basis: "lower", per: "kg" }) / 1e6).toBeCloseTo(50.0, 1);
    expect(Math.abs(heatingValue("CH4(g)", { per: "Nm3" }) / 1e6 - 39.8)).toBeLessThan(0.15);
  });

  it("heatingValue per Nm³ uses the ideal-gas molar volume at 0 °C and 101.325 kPa", () => {
    // CODATA 2018: molar volume of an ideal gas at 273.15 K, 101.325 kPa = 22.413 969 54 L/mol (from memory)
    expect(NORMAL_MOLAR_VOLUME_M3_PER_MOL * 1000).toBeCloseTo(22.41396954, 7);
    expect(heatingValue("H2(g)", { per: "Nm3" })).toBeCloseTo(heatingValue("H2(g)") / NORMAL_MOLAR_VOLUME_M3_PER_MOL, 6);
  });

  it("heatingValue: HHV − LHV is the latent heat of the water formed", () => {
    const latent = reactionEnthalpy("H2O(l) -> H2O(g)").value;
    expect(heatingValue("C3H8(g)") - heatingValue("C3H8(g)", { basis: "lower" })).toBeCloseTo(4 * latent, 6);
  });

  test.prop([fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })])(
    "heatingValue of a mixture is the mole-fraction-weighted sum; inerts count zero",
    (a, b) => {
      fc.pre(a + b > 1e-6);
      const mix = { "CH4(g)": a, "H2(g)": b, "N2(g)": 0.3, "CO2(g)": 0.1 };
      const total = a + b + 0.4;
      const expected = (a * heatingValue("CH4(g)") + b * heatingValue("H2(g)")) / total;
      expect(heatingValue(mix)).toBeCloseTo(expected, 6);
    },
  );

  it("heatingValue rejects negative and empty mixtures, non-gases per Nm3, foreign elements and bad options", () => {
    const e = caught(() => heatingValue({ "CH4(g)": -1 }));
    expect(e.code).toBe("NEGATIVE_FLOW");
    expect(e.details).toMatchObject({ species: "CH4(g)", amount: -1 });
    expect(caught(() => heatingValue({})).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => heatingValue("CH3OH(l)", { per: "Nm3" })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => heatingValue("HCl(g)")).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => heatingValue("CH4(g)", { basis: "gross" as never })).code).toBe("INVALID_ARGUMENT");
  });
});
