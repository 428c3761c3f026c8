import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import {
  integerGaussJordanNumber,
  integerNullSpaceNumber,
  integerNullSpaceSparseNumber,
} from "../../src/numeric/integerElimination.js";

const matrix = fc
  .tuple(fc.integer({ min: 1, max: 6 }), fc.integer({ min: 1, max: 12 }))
  .chain(([r, c]) => fc.array(fc.array(fc.integer({ min: -9, max: 9 }), { minLength: c, maxLength: c }), { minLength: r, maxLength: r }));

describe("integerNullSpaceSparseNumber", () => {
  test.prop([matrix])("holds the same vectors as the dense null space, non-zero entries only, columns ascending", (m) => {
    const cols = m[0]!.length;
    const ech = integerGaussJordanNumber(m, cols)!;
    const dense = integerNullSpaceNumber(ech.rows, ech.pivots, cols)!;
    const sparse = integerNullSpaceSparseNumber(ech.rows, ech.pivots, cols)!;
    expect(sparse.length).toBe(dense.length);
    sparse.forEach((v, k) => {
      const expanded = new Array<number>(cols).fill(0);
      v.columns.forEach((c, i) => (expanded[c] = v.values[i]!));
      expect(expanded).toEqual(dense[k]);
      expect(v.values.every((x) => x !== 0)).toBe(true);
      expect([...v.columns].sort((a, b) => a - b)).toEqual(v.columns);
      // every vector lies in the null space: M·x = 0 (exact integers)
      for (const row of m) expect(v.columns.reduce((s, c, i) => s + row[c]! * v.values[i]!, 0)).toBe(0);
    });
  });

  it("keeps the free column and the pivot columns it touches: CO, H2, H2O, CO2 over C, H, O", () => {
    // element matrix rows C, H, O; columns CO, H2, H2O, CO2 (common practice: water-gas shift)
    const m = [[1, 0, 0, 1], [0, 2, 2, 0], [1, 0, 1, 2]];
    const ech = integerGaussJordanNumber(m, 4)!;
    const [v] = integerNullSpaceSparseNumber(ech.rows, ech.pivots, 4)!;
    // CO + H2O -> H2 + CO2, up to sign
    const sign = Math.sign(v!.values[v!.columns.indexOf(3)]!);
    expect(v!.columns).toEqual([0, 1, 2, 3]);
    expect(v!.values.map((x) => x * sign)).toEqual([-1, 1, -1, 1]);
  });
});
