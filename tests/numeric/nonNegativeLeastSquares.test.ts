import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { nonNegativeLeastSquares } from "../../src/numeric/nonNegativeLeastSquares.js";

describe("nonNegativeLeastSquares", () => {
  it("nonNegativeLeastSquares finds an exact non-negative solution when one exists", () => {
    // C and O held by CO2, CO: b = (1 C, 1.5 O) → CO2 0.5, CO 0.5 (hand solution, common practice)
    const { x, residual } = nonNegativeLeastSquares(new Float64Array([1, 1, 2, 1]), 2, 2, new Float64Array([1, 1.5]));
    expect(residual).toBeLessThan(1e-10);
    expect(x[0]).toBeCloseTo(0.5, 10);
    expect(x[1]).toBeCloseTo(0.5, 10);
  });
  it("nonNegativeLeastSquares reports a residual when only negative amounts would do", () => {
    // b = (1 C, 3 O) with CO2 and CO: the exact solution needs CO = −1
    const { x, residual } = nonNegativeLeastSquares(new Float64Array([1, 1, 2, 1]), 2, 2, new Float64Array([1, 3]));
    expect(residual).toBeGreaterThan(0.05);
    for (const v of x) expect(v).toBeGreaterThanOrEqual(0);
  });
  const amount = fc.oneof(fc.constant(0), fc.double({ min: 1e-9, max: 5, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }));
  test.prop([fc.array(amount, { minLength: 4, maxLength: 4 })], { numRuns: 300 })(
    "nonNegativeLeastSquares recovers any b built from non-negative amounts (residual below the 1e-6 the engine uses)",
    (n) => {
      // rows C, H, O; columns CH4, CO2, H2O, O2
      const a = new Float64Array([1, 1, 0, 0, 4, 0, 2, 0, 0, 2, 1, 2]);
      const b = new Float64Array(3);
      for (let i = 0; i < 3; i++) for (let j = 0; j < 4; j++) b[i] = b[i]! + a[i * 4 + j]! * n[j]!;
      if (b.every((v) => v === 0)) return;
      const { residual } = nonNegativeLeastSquares(a, 3, 4, b);
      expect(residual).toBeLessThan(1e-6);
    },
  );
});

describe("nonNegativeLeastSquares at round-off", () => {
  it("a column whose entry does not improve the fit at round-off is set aside, not turned into 0/0 (NaN)", () => {
    // rows C, H, O; columns H2O, O2, CH4, O, H2 and −(CH4 + O2); b = −O: O(g) beside CH4 + 2 O
    // (the support test of the equilibrium engine; before the fix the step ratio was 0/0 and x NaN)
    const a = new Float64Array([
      0, 0, 1, 0, 0, -1,
      2, 0, 4, 0, 2, -4,
      1, 2, 0, 1, 0, -2,
    ]);
    const { x, residual } = nonNegativeLeastSquares(a, 3, 6, new Float64Array([0, 0, -1]));
    expect(residual).toBeLessThan(1e-12);
    for (const v of x) expect(Number.isFinite(v) && v >= 0).toBe(true);
  });
});
