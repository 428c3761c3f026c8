import { describe, expect, it } from "vitest";
import { RxthermError } from "../../src/errors.js";
import { waterSaturationPressure } from "../../src/extent/waterSaturationPressure.js";

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
