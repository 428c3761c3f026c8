import { describe, expect, it } from "vitest";
import { fc, test } from "../_helpers/property.js";
import { DEFAULT_SO3_FRACTION, flueGasDewPoint } from "../../src/energy/flueGasDewPoint.js";
import { waterSaturationPressure } from "../../src/extent/waterSaturationPressure.js";
import { caught } from "../_helpers/caught.js";

describe("flueGasDewPoint", () => {
  it("flueGasDewPoint gives the documented example values", () => {
    const d = flueGasDewPoint({ composition: { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 }, P: 101325 });
    expect(d.waterK).toBeCloseTo(319.2, 1); // @example
    expect(d.acidK).toBeCloseTo(410.45, 2); // @example
    expect(d.acidWithinRange).toBe(true);
  });

  it("the acid dew point matches a hand computation from the Verhoff–Banchero correlation", () => {
    // Hand computation (calculator) from Verhoff & Banchero, Chem. Eng. Prog. 70 (8) (1974) 71, coefficients from memory:
    // p_w = 0.10 atm = 76 mmHg, p_SO3 = 10 ppm of 1 atm = 0.0076 mmHg; ln p_w = 4.33073, ln p_SO3 = −4.87961;
    // 1000/T = 2.276 − 0.0294·4.33073 + 0.0858·4.87961 − 0.0062·4.33073·4.87961 = 2.43633 → T = 410.45 K (137.3 °C)
    const d = flueGasDewPoint({ composition: { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 }, P: 101325 });
    expect(d.acidK).toBeCloseTo(410.45, 2);
    // second hand computation: 15 % water, 30 ppm SO3 at 1 atm → 1000/T = 2.35011 → 425.51 K (152.4 °C)
    const e = flueGasDewPoint({ composition: { "H2O(g)": 0.15, "SO3(g)": 30e-6, "N2(g)": 0.85 - 30e-6 }, P: 101325 });
    expect(e.acidK).toBeCloseTo(425.51, 2);
  });

  it("the water dew point is the IAPWS-IF97 saturation temperature at the water partial pressure", () => {
    const d = flueGasDewPoint({ composition: { "H2O(g)": 2, "CO2(g)": 1, "N2(g)": 7.52 }, P: 101325 });
    // round trip through the independent forward equation (IAPWS R7-97 eq. 30)
    expect(waterSaturationPressure(d.waterK)).toBeCloseTo((2 / 10.52) * 101325, 3);
    expect(d.acidK).toBeUndefined();
    expect(d.so3Pa).toBe(0);
  });

  it("SO2 counts through so3Fraction: the default 2 % (common practice) or the caller's share", () => {
    const gas = { "H2O(g)": 0.12, "SO2(g)": 0.001, "N2(g)": 0.879 };
    const d = flueGasDewPoint({ composition: gas, P: 101325 });
    expect(DEFAULT_SO3_FRACTION).toBe(0.02);
    expect(d.so3Pa).toBeCloseTo(0.02 * 0.001 * 101325, 9);
    const none = flueGasDewPoint({ composition: gas, P: 101325, so3Fraction: 0 });
    expect(none.acidK).toBeUndefined();
    const more = flueGasDewPoint({ composition: gas, P: 101325, so3Fraction: 0.05 });
    expect(more.acidK).toBeGreaterThan(d.acidK!);
    // SO3 listed: its own share is used
    const listed = flueGasDewPoint({ composition: { ...gas, "SO3(g)": 0.0001 }, P: 101325 });
    expect(listed.so3Pa).toBeCloseTo(0.0001 * 101325 / 1.0001, 9);
  });

  test.prop([fc.double({ min: 0.02, max: 0.3, noNaN: true }), fc.double({ min: 2e-6, max: 5e-4, noNaN: true })])(
    "the acid dew point rises with water and with SO3 and lies above the water dew point",
    (w, s) => {
      const d = flueGasDewPoint({ composition: { "H2O(g)": w, "SO3(g)": s, "N2(g)": 1 - w - s }, P: 101325 });
      const moreWater = flueGasDewPoint({ composition: { "H2O(g)": w * 1.1, "SO3(g)": s, "N2(g)": 1 - w - s }, P: 101325 });
      const moreSO3 = flueGasDewPoint({ composition: { "H2O(g)": w, "SO3(g)": s * 1.1, "N2(g)": 1 - w - s }, P: 101325 });
      expect(moreWater.acidK!).toBeGreaterThan(d.acidK!);
      expect(moreSO3.acidK!).toBeGreaterThan(d.acidK!);
      expect(d.acidK!).toBeGreaterThan(d.waterK);
    },
  );

  it("rejects a gas without water and bad input with coded errors", () => {
    expect(caught(() => flueGasDewPoint({ composition: { "N2(g)": 1, "CO2(g)": 0.1 }, P: 101325 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(g)": 0.1, "N2(g)": 0.9 }, P: 0 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(g)": 0.1, "SO2(g)": 0.01 }, P: 101325, so3Fraction: 2 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(l)": 0.1, "N2(g)": 0.9 }, P: 101325 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(g)": 1e-4, "N2(g)": 1 }, P: 101325 })).code).toBe("OUT_OF_RANGE");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(g)": -1, "N2(g)": 1 }, P: 101325 })).code).toBe("INVALID_ARGUMENT");
  });

  it("reads names through the library", () => {
    const d = flueGasDewPoint({ composition: { "H2O(g)": 0.1, nitrogen: 0.9 }, P: 101325 });
    expect(d.waterPa).toBeCloseTo(10132.5, 6);
  });

  it("flueGasDewPoint rejects non-number amounts and pressures with INVALID_ARGUMENT naming the field", () => {
    const composition = { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 };
    expect(caught(() => flueGasDewPoint({ composition, P: Object.assign(Object.create(null), { H: 1 }) as never })).details.path).toBe("input.P");
    for (const key of Object.keys(composition)) {
      const e = caught(() => flueGasDewPoint({ composition: { ...composition, [key]: Object.assign(Object.create(null), { H: 1 }) as never }, P: 101325 }));
      expect(e.code, key).toBe("INVALID_ARGUMENT");
      expect(e.details.path, key).toBe(`input.composition.${key}`);
    }
    expect(caught(() => flueGasDewPoint({ composition, P: 101325, so3Fraction: Symbol("x") as never })).details.path).toBe("input.so3Fraction");
    expect(caught(() => flueGasDewPoint({ composition: new Map() as never, P: 101325 })).details.path).toBe("input.composition");
    expect(caught(() => flueGasDewPoint({ composition: { "H2O(g)": 1e308, "N2(g)": 1e308 }, P: 101325 })).code).toBe("INVALID_ARGUMENT");
  });
});
