import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { createHeatCapacity, type HeatCapacity } from "../../src/heat-capacity/createHeatCapacity.js";
import { heatCapacitySum } from "../../src/heat-capacity/heatCapacitySum.js";
import { nasa7Ranges, shomateRanges } from "./fixtures.js";

// Shomate sets: NIST Chemistry WebBook SRD 69; NASA-7 sets: GRI-Mech 3.0 (tests/fixtures/heat-capacity-*.json)
const N2 = createHeatCapacity(shomateRanges("N2"));
const CO2 = createHeatCapacity(shomateRanges("CO2"));
const H2O = createHeatCapacity(shomateRanges("H2O"));
const O2 = createHeatCapacity(shomateRanges("O2"));
const CH4 = createHeatCapacity(nasa7Ranges("CH4"));
const models: HeatCapacity[] = [N2, CO2, H2O, O2, CH4];
// invented constants (J/mol), as ΔfH° would be
const constants = [0, -393522, -241826, 0, -74873];

/** Σ wᵢ·(cᵢ + Hᵢ(T)) and Σ wᵢ·Cpᵢ(T), each model on its own. */
function direct(w: readonly number[], T: number): { h: number; cp: number; magnitude: number } {
  let h = 0, cp = 0, magnitude = 0;
  models.forEach((m, i) => {
    const hi = constants[i]! + m.sensibleEnthalpy(T, { extrapolate: true });
    h += w[i]! * hi;
    cp += w[i]! * m.cp(T, { extrapolate: true });
    magnitude += Math.abs(w[i]! * hi);
  });
  return { h, cp, magnitude };
}

describe("heatCapacitySum (private: the fixed products of a flame as one polynomial)", () => {
  const sum = heatCapacitySum(models)!;
  const weight = fc.double({ min: 0, max: 20, noNaN: true });

  test.prop([fc.tuple(weight, weight, weight, weight, weight), fc.array(fc.double({ min: 150, max: 7000, noNaN: true }), { minLength: 1, maxLength: 8 })])(
    "equals the sum of the models at every T, across their boundaries and beyond their data", (w, Ts) => {
      sum.setWeights(w, constants);
      for (const T of Ts) {
        const d = direct(w, T);
        const h = sum.enthalpy(T);
        // rounding only: single polynomial terms are 10–100 times the value (far beyond the data, T⁴ of
        // NASA-7 at 7000 K), and the two sides round them in a different order
        expect(Math.abs(h - d.h)).toBeLessThan(1e-11 * (d.magnitude + 1e6));
        expect(Math.abs(sum.cp - d.cp)).toBeLessThan(1e-11 * (Math.abs(d.cp) + 100));
        // the magnitude adds the same terms in the same order: identical
        expect(sum.magnitude(T)).toBe(d.magnitude);
      }
    });

  it("uses the lower segment of each model at a shared boundary", () => {
    const w = [1, 2, 3, 0.5, 0.25];
    sum.setWeights(w, constants);
    for (const T of [500, 700, 1000, 1200, 1700, 2000, 6000]) {
      expect(Math.abs(sum.enthalpy(T) - direct(w, T).h)).toBeLessThan(1e-6);
      expect(Math.abs(sum.cp - direct(w, T).cp)).toBeLessThan(1e-9);
    }
  });

  test.prop([fc.tuple(weight, weight, weight, weight, weight), fc.tuple(weight, weight, weight, weight, weight), fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 250, max: 5000, noNaN: true })])(
    "weights w + u·v (a parameter u, as the oxidizer amount of a flame) give the sum at the weights w + u·v", (w, v, u, T) => {
      sum.setWeights(w, constants, v);
      sum.enthalpy(T); // intervals formed at u = 0, then u changes
      sum.setParameter(u);
      const eff = w.map((x, i) => x + u * v[i]!);
      const d = direct(eff, T);
      expect(Math.abs(sum.enthalpy(T) - d.h)).toBeLessThan(1e-11 * (d.magnitude + 1e6));
      expect(Math.abs(sum.cp - d.cp)).toBeLessThan(1e-11 * (Math.abs(d.cp) + 100));
      expect(Math.abs(sum.magnitude(T) - d.magnitude)).toBeLessThan(1e-12 * (d.magnitude + 1));
    });

  it("forgets the summed intervals when the weights change", () => {
    sum.setWeights([1, 0, 0, 0, 0], constants);
    const a = sum.enthalpy(1500);
    sum.setWeights([0, 1, 0, 0, 0], constants);
    expect(sum.enthalpy(1500)).not.toBe(a);
    expect(Math.abs(sum.enthalpy(1500) - direct([0, 1, 0, 0, 0], 1500).h)).toBeLessThan(1e-6);
  });

  it("is null for an object not made by createHeatCapacity, or for more than 64 segment boundaries", () => {
    const fake = { ...N2 } as HeatCapacity;
    expect(heatCapacitySum([N2, fake])).toBeNull();
    const ts = Array.from({ length: 70 }, (_, i) => 300 + 10 * i);
    const table = createHeatCapacity([{ TminK: 300, TmaxK: ts[ts.length - 1]!, cp: { form: "tabulated", temperaturesK: ts, cpJPerMolK: ts.map((t) => 29 + t / 1000) } }]);
    expect(heatCapacitySum([N2, table])).toBeNull();
    expect(heatCapacitySum([])!.enthalpy(1000)).toBe(0);
  });
});
