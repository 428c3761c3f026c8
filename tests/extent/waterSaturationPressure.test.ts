import { describe, expect, it } from "vitest";
import { RxthermError } from "../../src/errors.js";
import { fc, test } from "../_helpers/property.js";
import { waterSaturationPressure, waterSaturationTemperature } from "../../src/extent/waterSaturationPressure.js";
import { caught } from "../_helpers/caught.js";

describe("waterSaturationPressure", () => {
  it("reproduces the IAPWS-IF97 check values (IAPWS R7-97(2012), table 35 — values from memory)", () => {
    expect(waterSaturationPressure(300) / 1e6).toBeCloseTo(0.353658941e-2, 11);
    expect(waterSaturationPressure(500) / 1e6).toBeCloseTo(0.263889776e1, 8);
    expect(waterSaturationPressure(600) / 1e6).toBeCloseTo(0.123443146e2, 7);
  });
  it("boils near 373.12 K at one standard atmosphere (ITS-90 normal boiling point 373.124 K, from memory)", () => {
    expect(waterSaturationPressure(373.124)).toBeCloseTo(101325, -1);
  });
  it("rejects temperatures outside 273.15–647.096 K", () => {
    try {
      waterSaturationPressure(250);
      throw new Error("no throw");
    } catch (e) {
      expect(e).toBeInstanceOf(RxthermError);
      expect((e as RxthermError).code).toBe("OUT_OF_RANGE");
      expect((e as RxthermError).details.range).toEqual([273.15, 647.096]);
    }
  });
});

describe("waterSaturationTemperature", () => {
  it("reproduces the IAPWS-IF97 check values of the saturation-temperature equation (IAPWS R7-97(2012), table 35 — values from memory)", () => {
    expect(waterSaturationTemperature(0.1e6)).toBeCloseTo(0.372755919e3, 6);
    expect(waterSaturationTemperature(1e6)).toBeCloseTo(0.453035632e3, 6);
    expect(waterSaturationTemperature(10e6)).toBeCloseTo(0.584149488e3, 6);
  });
  it("waterSaturationTemperature gives the documented example (normal boiling point, ITS-90 373.124 K — from memory)", () => {
    expect(waterSaturationTemperature(101325)).toBeCloseTo(373.1243, 4);
  });
  test.prop([fc.double({ min: 273.16, max: 647, noNaN: true })])("inverts waterSaturationPressure to 1e-6 K", (T) => {
    expect(Math.abs(waterSaturationTemperature(waterSaturationPressure(T)) - T)).toBeLessThan(1e-6);
  });
  it("rejects pressures off the saturation line", () => {
    expect(caught(() => waterSaturationTemperature(100)).code).toBe("OUT_OF_RANGE");
    expect(caught(() => waterSaturationTemperature(3e7)).details.range).toEqual([611.213, 22.064e6]);
  });
  it("waterSaturationPressure below 273.15 K asks whether °C was meant", () => {
    const e = caught(() => waterSaturationPressure(60));
    expect(e.message).toContain("was °C meant? 60 °C is 333.15 K");
  });

  it("waterSaturationTemperature and waterSaturationPressure describe a non-number argument safely", () => {
    for (const v of [Object.assign(Object.create(null), { H: 1 }) as never, Symbol("x"), 10n, null]) {
      expect(caught(() => waterSaturationTemperature(v as never)).code).toBe("OUT_OF_RANGE");
      expect(caught(() => waterSaturationPressure(v as never)).code).toBe("OUT_OF_RANGE");
    }
    expect(caught(() => waterSaturationTemperature(Object.assign(Object.create(null), { H: 1 }) as never)).details.path).toBe("pressurePa");
  });
});
