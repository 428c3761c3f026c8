import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { flameTemperatureSweep } from "../../src/flame/flameTemperatureSweep.js";
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import { caught } from "../_helpers/caught.js";

describe("flameTemperatureSweep", () => {
  it("flameTemperatureSweep gives the documented example values", () => {
    const s = flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [0.8, 1, 1.2] });
    expect(s.T.map((t) => Math.round(t))).toEqual([1995, 2225, 2136]); // @example
  });

  it("flameTemperatureSweep gives the README and docs/flame.md example values (propane)", () => {
    const s = flameTemperatureSweep({ fuel: "C3H8(g)" }, { parameter: "equivalenceRatio", values: [0.8, 0.9, 1.0, 1.1, 1.2] });
    expect(s.T.map((t) => Math.round(t))).toEqual([2041, 2179, 2266, 2265, 2200]);
  });

  it("flameTemperatureSweep(φ) peaks slightly rich of stoichiometric (equilibrium)", () => {
    // the maximum equilibrium flame temperature of hydrocarbon–air lies at φ ≈ 1.03–1.1
    // (common practice: dissociation shifts the peak to the rich side)
    const values = Array.from({ length: 41 }, (_, i) => 0.8 + i * 0.01);
    for (const fuel of ["CH4(g)", "C3H8(g)"]) {
      const s = flameTemperatureSweep({ fuel }, { parameter: "equivalenceRatio", values });
      const best = s.T.indexOf(Math.max(...s.T));
      expect(values[best]).toBeGreaterThan(1.0);
      expect(values[best]).toBeLessThan(1.1);
    }
  });

  it("flameTemperatureSweep(φ, complete) peaks at stoichiometric or slightly rich", () => {
    const values = Array.from({ length: 21 }, (_, i) => 0.9 + i * 0.01);
    const s = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values });
    const best = values[s.T.indexOf(Math.max(...s.T))]!;
    expect(best).toBeGreaterThanOrEqual(1.0);
    expect(best).toBeLessThanOrEqual(1.05);
  });

  it("flameTemperatureSweep equals point-by-point solves (warm starts change nothing)", () => {
    const values = [0.6, 0.9, 1.0, 1.3, 1.6];
    const s = flameTemperatureSweep({ fuel: "C3H8(g)", oxidizerT: 500 }, { parameter: "equivalenceRatio", values });
    values.forEach((phi, i) => {
      const r = adiabaticFlameTemperature({ fuel: "C3H8(g)", oxidizerT: 500, equivalenceRatio: phi });
      expect(s.T[i]).toBeCloseTo(r.T, 5);
      expect(s.products["CO(g)"]![i]).toBeCloseTo(r.products["CO(g)"]!, 9);
    });
  });

  it("flameTemperatureSweep(excessAir) and sweeps of temperatures and pressure run", () => {
    const ea = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "excessAir", values: [0, 0.5, 1] });
    expect(ea.equivalenceRatio).toEqual([1, 1 / 1.5, 0.5]);
    expect(ea.T[0]).toBeGreaterThan(ea.T[1]!);
    const pre = flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "oxidizerT", values: [300, 500, 700] });
    expect(pre.T[2]).toBeGreaterThan(pre.T[1]!);
    const p = flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "P", values: [1e5, 1e6, 1e7] });
    // higher pressure suppresses dissociation (Le Chatelier; common practice)
    expect(p.T[2]).toBeGreaterThan(p.T[1]!);
    expect(p.T[1]).toBeGreaterThan(p.T[0]!);
  });

  test.prop([fc.array(fc.double({ min: 0.5, max: 1.5, noNaN: true }), { minLength: 2, maxLength: 8 })], { numRuns: 10 })(
    "flameTemperatureSweep returns one entry per value in every array",
    (values) => {
      const s = flameTemperatureSweep({ fuel: "H2(g)" }, { parameter: "equivalenceRatio", values });
      expect(s.T).toHaveLength(values.length);
      for (const arr of Object.values(s.products)) expect(arr).toHaveLength(values.length);
      for (const r of s.residual) expect(Number.isFinite(r)).toBe(true);
    },
  );

  it("flameTemperatureSweep rejects bad sweeps and names the failing point", () => {
    expect(caught(() => flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [] })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "colour" as never, values: [1] })).code).toBe("INVALID_ARGUMENT");
    const e = caught(() => flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [1, 0.8, -2] }));
    expect(e).toMatchObject({ code: "INVALID_ARGUMENT", details: { index: 2, value: -2 } });
    expect(caught(() => flameTemperatureSweep({ fuel: "N2(g)" }, { parameter: "T", values: [300] })).code).toBe("NOTHING_TO_BURN");
  });
});

describe("flameTemperatureSweep: extrapolation per point", () => {
  it("flameTemperatureSweep gives each point its own extrapolation list (empty inside the data)", () => {
    const s = flameTemperatureSweep({ fuel: "C3H8(g)", fuelT: 250 }, { parameter: "equivalenceRatio", values: [0.9, 1] }, { extrapolate: true });
    // GRI-Mech 3.0 propane starts at 300 K (read down to 298.15 K): the 250 K fuel is listed at both points
    expect(s.extrapolated).toEqual([
      [{ species: "C3H8(g)", T: 250, range: [298.15, 5000] }],
      [{ species: "C3H8(g)", T: 250, range: [298.15, 5000] }],
    ]);
    expect(flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [1] }).extrapolated).toEqual([[]]);
  });
});
