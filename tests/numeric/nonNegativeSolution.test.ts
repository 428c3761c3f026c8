import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { nonNegativeSolution } from "../../src/numeric/nonNegativeSolution.js";

/** max_i |(A x − b)_i| */
function miss(a: Float64Array, m: number, n: number, x: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < m; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += a[i * n + j]! * x[j]!;
    worst = Math.max(worst, Math.abs(s - b[i]!));
  }
  return worst;
}

describe("nonNegativeSolution", () => {
  it("finds x ≥ 0 with A x = b when one exists", () => {
    // C and O held by CO2, CO: b = (1 C, 1.5 O) → CO2 0.5, CO 0.5 (hand solution, common practice)
    const a = new Float64Array([1, 1, 2, 1]);
    const b = new Float64Array([1, 1.5]);
    const x = nonNegativeSolution(a, 2, 2, b)!;
    expect(x[0]).toBeCloseTo(0.5, 12);
    expect(x[1]).toBeCloseTo(0.5, 12);
  });

  it("returns null when only negative amounts would do, and for non-finite data", () => {
    // b = (1 C, 3 O) with CO2 and CO: CO = −1
    expect(nonNegativeSolution(new Float64Array([1, 1, 2, 1]), 2, 2, new Float64Array([1, 3]))).toBeNull();
    // CH4 over CH4, HCl, He: H − Cl = 0 leaves CH4 no room; asking for CH4 = 1 fails
    // rows C, H, Cl; columns CH4, HCl and −(HCl): A y − t·(HCl) = −CH4
    const a = new Float64Array([1, 0, 0, 4, 1, -1, 0, 1, -1]);
    expect(nonNegativeSolution(a, 3, 3, new Float64Array([-1, -4, 0]))).toBeNull();
    expect(nonNegativeSolution(new Float64Array([Number.NaN]), 1, 1, new Float64Array([1]))).toBeNull();
  });

  it("handles negative right-hand sides and degenerate (tied) pivots", () => {
    // O(g) beside CH4 + 2 O: rows C, H, O; columns H2O, O2, CH4, O, H2, −(CH4 + O2); b = −O
    const a = new Float64Array([
      0, 0, 1, 0, 0, -1,
      2, 0, 4, 0, 2, -4,
      1, 2, 0, 1, 0, -2,
    ]);
    const b = new Float64Array([0, 0, -1]);
    const x = nonNegativeSolution(a, 3, 6, b)!;
    expect(x).not.toBeNull();
    expect(miss(a, 3, 6, x, b)).toBeLessThan(1e-12);
    for (const v of x) expect(v).toBeGreaterThanOrEqual(0);
  });

  const count = fc.integer({ min: 0, max: 6 });
  test.prop([fc.array(count, { minLength: 15, maxLength: 15 }), fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 5, maxLength: 5 })], { numRuns: 300 })(
    "recovers any b built from non-negative integer amounts of small integer columns",
    (entries, amounts) => {
      const a = Float64Array.from(entries); // 3 × 5
      const b = new Float64Array(3);
      for (let i = 0; i < 3; i++) for (let j = 0; j < 5; j++) b[i] = b[i]! + a[i * 5 + j]! * amounts[j]!;
      const x = nonNegativeSolution(a, 3, 5, b);
      expect(x).not.toBeNull();
      expect(miss(a, 3, 5, x!, b)).toBeLessThan(1e-9 * Math.max(1, ...b));
      for (const v of x!) expect(v).toBeGreaterThanOrEqual(0);
    },
  );
});
