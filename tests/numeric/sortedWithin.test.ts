import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { sortedWithin } from "../../src/numeric/sortedWithin.js";

/** The definition, written out: every value in [lo, hi] and each one ≥ the one before. */
function naive(v: Float64Array, lo: number, hi: number): boolean {
  for (let i = 0; i < v.length; i++) {
    if (!(v[i]! >= lo && v[i]! <= hi)) return false;
    if (i > 0 && !(v[i - 1]! <= v[i]!)) return false;
  }
  return true;
}

describe("sortedWithin", () => {
  it("accepts a sorted array inside the bounds (ends included) and an empty one", () => {
    expect(sortedWithin(Float64Array.from([300, 300, 400, 500]), 300, 500)).toBe(true);
    expect(sortedWithin(new Float64Array(0), 300, 500)).toBe(true);
    expect(sortedWithin(Float64Array.from([400]), 300, 500)).toBe(true);
  });

  it("rejects a value out of order, out of bounds, or NaN, wherever it is (unrolled body and tail)", () => {
    for (const n of [1, 2, 8, 9, 16, 17, 23]) {
      const base = Float64Array.from({ length: n }, (_, i) => 300 + i);
      expect(sortedWithin(base, 300, 300 + n)).toBe(true);
      for (let i = 0; i < n; i++) {
        for (const bad of [Number.NaN, 299, 300 + n + 1, i > 0 ? base[i - 1]! - 0.5 : 250]) {
          const v = Float64Array.from(base);
          v[i] = bad;
          expect(sortedWithin(v, 300, 300 + n), `n=${n} i=${i} ${bad}`).toBe(naive(v, 300, 300 + n));
        }
      }
    }
  });

  test.prop([fc.array(fc.double({ min: 0, max: 100 }), { maxLength: 40 }), fc.boolean()])("agrees with the definition (sorted or not, NaN included)", (xs, sort) => {
    const v = Float64Array.from(xs);
    if (sort) v.sort();
    expect(sortedWithin(v, 10, 90)).toBe(naive(v, 10, 90));
  });
});
