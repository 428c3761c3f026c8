import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { boundaryJumps } from "../../src/heat-capacity/boundaryJumps.js";
import { createHeatCapacity } from "../../src/heat-capacity/createHeatCapacity.js";
import { nasa7Ranges, shomateRanges } from "./fixtures.js";

describe("boundaryJumps", () => {
  it("gives the values of its @example (O2, WebBook Shomate sets meeting at 700 K)", () => {
    const o2 = createHeatCapacity([
      { TminK: 100, TmaxK: 700, cp: { form: "shomate", A: 31.32234, B: -20.23531, C: 57.86644, D: -36.50624, E: -0.007374, F: -8.903471, G: 246.7945 } },
      { TminK: 700, TmaxK: 2000, cp: { form: "shomate", A: 30.03235, B: 8.772972, C: -3.988133, D: 0.788313, E: -0.741599, F: -11.32468, G: 236.1663 } },
    ]);
    const [j] = boundaryJumps(o2);
    expect(j!.TK).toBe(700);
    expect(j!.cpJumpJPerMolK).toBeCloseTo(0.00068, 5);
    expect(j!.enthalpyJumpJPerMol).toBeCloseTo(-1.71, 2);
  });

  it("finds the published sets joined closely: Cp within 0.5 %, H within 50 J/mol, S within 0.05 J/(mol·K)", () => {
    // NIST Chemistry WebBook SRD 69 Shomate sets and GRI-Mech 3.0 NASA-7 sets (tests/fixtures/heat-capacity-*.json);
    // bounds: common practice for published piecewise fits
    for (const s of ["N2", "O2", "H2", "H2O", "CO2"]) {
      for (const m of [createHeatCapacity(shomateRanges(s)), createHeatCapacity(nasa7Ranges(s))]) {
        const jumps = boundaryJumps(m);
        expect(jumps).toHaveLength(m.ranges.length - 1);
        for (const j of jumps) {
          expect(Math.abs(j.cpRelativeJump)).toBeLessThan(0.005);
          expect(Math.abs(j.enthalpyJumpJPerMol!)).toBeLessThan(50);
          expect(Math.abs(j.entropyJumpJPerMolK!)).toBeLessThan(0.05);
        }
      }
    }
  });

  it("equals the step of the model's own absolute values across the boundary", () => {
    const m = createHeatCapacity(shomateRanges("N2"));
    for (const j of boundaryJumps(m)) {
      const above = j.TK * (1 + 1e-12);
      // the model uses the lower form at TK and the upper form just above it
      expect(m.absoluteEnthalpy(above) - m.absoluteEnthalpy(j.TK)).toBeCloseTo(j.enthalpyJumpJPerMol!, 6);
      expect(m.absoluteEntropy(above) - m.absoluteEntropy(j.TK)).toBeCloseTo(j.entropyJumpJPerMolK!, 8);
      expect(m.cp(above) - m.cp(j.TK)).toBeCloseTo(j.cpJumpJPerMolK, 8);
      // while the sensible enthalpy is continuous there
      expect(m.sensibleEnthalpy(above) - m.sensibleEnthalpy(j.TK)).toBeCloseTo(0, 6);
    }
  });

  it("reports a deliberate transcription error and null H/S jumps for forms without constants", () => {
    const ranges = shomateRanges("N2");
    const bad = { ...ranges[1]!, cp: { ...(ranges[1]!.cp as object), A: 29.50583 } } as (typeof ranges)[number];
    const [j] = boundaryJumps(createHeatCapacity([ranges[0]!, bad]));
    expect(j!.cpJumpJPerMolK).toBeCloseTo(10, 2); // A enters Cp with coefficient 1
    const mixed = createHeatCapacity([
      { TminK: 200, TmaxK: 500, cp: { form: "tabulated", temperaturesK: [200, 500], cpJPerMolK: [29, 30] } },
      { TminK: 500, TmaxK: 900, cp: { form: "constant", cpJPerMolK: 31 } },
    ]);
    expect(boundaryJumps(mixed)).toEqual([{ TK: 500, lowerRange: 0, cpJumpJPerMolK: 1, cpRelativeJump: 1 / 30, enthalpyJumpJPerMol: null, entropyJumpJPerMolK: null }]);
    expect(boundaryJumps(createHeatCapacity([ranges[0]!]))).toEqual([]);
  });

  test.prop([fc.double({ min: 10, max: 60, noNaN: true }), fc.double({ min: 10, max: 60, noNaN: true })])(
    "constant forms jump by the difference of the constants",
    (c1, c2) => {
      const m = createHeatCapacity([
        { TminK: 300, TmaxK: 600, cp: { form: "constant", cpJPerMolK: c1 } },
        { TminK: 600, TmaxK: 900, cp: { form: "constant", cpJPerMolK: c2 } },
      ]);
      expect(boundaryJumps(m)[0]!.cpJumpJPerMolK).toBe(c2 - c1);
    },
  );
});
