import { describe, expect, it } from "vitest";
import { EQUIVALENCE_RATIO_LIMITS, MAX_EXCESS_AIR, checkMixtureLimits } from "../../src/extent/mixtureLimits.js";
import { combustion } from "../../src/extent/combustion.js";
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import { flameTemperatureSweep } from "../../src/flame/flameTemperatureSweep.js";
import { caught } from "../_helpers/caught.js";

describe("checkMixtureLimits", () => {
  it("checkMixtureLimits gives the documented example values", () => {
    expect(MAX_EXCESS_AIR).toBe(3); // @example
    expect(EQUIVALENCE_RATIO_LIMITS).toEqual([0.05, 20]); // @example
    expect(checkMixtureLimits("combustion", { excessAir: 0.15 }, false)).toBeUndefined(); // @example
  });

  it("excessAir: 12 (12 % typed as a number) is an error with a hint in every function, unless allowExtremeMixture", () => {
    for (const f of [
      () => combustion({ fuel: { "CH4(g)": 1 }, excessAir: 12 }),
      () => adiabaticFlameTemperature({ fuel: "CH4(g)", excessAir: 12 }),
      () => flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "excessAir", values: [0.1, 12] }),
    ]) {
      const e = caught(f);
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.message).toContain("allowExtremeMixture");
      expect(e.details.hint).toBe("was 12 % meant? excessAir: 0.12");
    }
    expect(combustion({ fuel: { "CH4(g)": 1 }, excessAir: 12, allowExtremeMixture: true }).excessAir).toBe(12);
    expect(adiabaticFlameTemperature({ fuel: "CH4(g)", excessAir: 12, allowExtremeMixture: true, mode: "complete" }).T).toBeLessThan(600);
    expect(combustion({ fuel: { "CH4(g)": 1 }, excessAir: 3 }).excessAir).toBe(3);
  });

  it("equivalence ratios outside 0.05–20 are errors unless allowExtremeMixture", () => {
    expect(caught(() => adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 25 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 0.04 })).details.limit).toEqual([0.05, 20]);
    expect(caught(() => combustion({ fuel: { "CH4(g)": 1 }, equivalenceRatio: 0.01 })).code).toBe("INVALID_ARGUMENT");
    expect(combustion({ fuel: { "CH4(g)": 1 }, equivalenceRatio: 0.01, allowExtremeMixture: true }).excessAir).toBeCloseTo(99, 12);
    expect(() => adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 0.05, mode: "complete" })).not.toThrow();
  });

  it("checkMixtureLimits requires the values as an object", () => {
    for (const v of [null, undefined, 12]) {
      const e = caught(() => checkMixtureLimits("combustion", v as never, false));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details.path).toBe("values");
    }
    expect(checkMixtureLimits("combustion", null as never, true)).toBeUndefined();
    expect(caught(() => checkMixtureLimits(Symbol("f") as never, { excessAir: 12 }, false)).details.path).toBe("values.excessAir");
  });
});
