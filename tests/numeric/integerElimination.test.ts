import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import {
  integerGaussJordanNumber,
  integerNullSpaceNumber,
  integerNullSpaceSparseNumber,
  integerNullVectorNumber,
} from "../../src/numeric/integerElimination.js";
import { gcdBigInt, rational, rationalDiv, rationalMul, rationalSub } from "../../src/numeric/rational.js";

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

/**
 * Oracle: the integer reduced row echelon form from exact BigInt rationals — Gauss–Jordan on
 * fractions, then each pivot row scaled to coprime integers with a positive pivot.
 */
function rrefOracle(m: readonly (readonly number[])[], pivotCols: number): { rows: bigint[][]; pivots: number[] } {
  const a = m.map((row) => row.map((v) => rational(BigInt(v))));
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < pivotCols && r < a.length; c++) {
    const p = a.findIndex((row, i) => i >= r && row[c]!.num !== 0n);
    if (p < 0) continue;
    [a[p], a[r]] = [a[r]!, a[p]!];
    const pv = a[r]![c]!;
    a[r] = a[r]!.map((v) => rationalDiv(v, pv));
    for (let i = 0; i < a.length; i++) {
      if (i === r || a[i]![c]!.num === 0n) continue;
      const f = a[i]![c]!;
      a[i] = a[i]!.map((v, j) => rationalSub(v, rationalMul(f, a[r]![j]!)));
    }
    pivots.push(c);
    r++;
  }
  const rows = a.map((row) => {
    let l = 1n;
    for (const v of row) l = (l * v.den) / gcdBigInt(l, v.den);
    const ints = row.map((v) => (v.num * l) / v.den);
    const g = ints.reduce((x, y) => gcdBigInt(x, y), 0n);
    return g > 1n ? ints.map((v) => v / g) : ints;
  });
  return { rows, pivots };
}

/**
 * The elimination as it was written before the per-row exactness bound: every product and
 * difference checked to be a safe integer. The fast version must give the same rows, or null
 * exactly when this one does.
 */
function checkedElimination(matrix: readonly (readonly number[])[], pivotCols: number): { rows: number[][]; pivots: number[] } | null {
  const m = matrix.map((row) => row.slice());
  const gcd = (a: number, b: number): number => {
    a = Math.abs(a);
    b = Math.abs(b);
    while (b !== 0) [a, b] = [b, a % b];
    return a;
  };
  const reduce = (row: number[]) => {
    const g = row.reduce((x, v) => (v === 0 ? x : gcd(x, v)), 0);
    if (g > 1) for (let j = 0; j < row.length; j++) row[j] = row[j]! / g;
  };
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < pivotCols && r < m.length; c++) {
    let p = -1;
    let best = Infinity;
    for (let i = r; i < m.length; i++) {
      const a = Math.abs(m[i]![c]!);
      if (a !== 0 && a < best) [best, p] = [a, i];
    }
    if (p < 0) continue;
    const pr = m[p]!;
    m[p] = m[r]!;
    m[r] = pr;
    if (pr[c]! < 0) for (let j = 0; j < pr.length; j++) pr[j] = -pr[j]! || 0;
    reduce(pr);
    const pv = pr[c]!;
    for (let i = 0; i < m.length; i++) {
      const row = m[i]!;
      if (i === r || row[c] === 0) continue;
      const g = gcd(row[c]!, pv);
      const fa = pv / g;
      const fb = row[c]! / g;
      for (let j = 0; j < row.length; j++) {
        const x = row[j]! * fa;
        const y = pr[j]! * fb;
        if (!Number.isSafeInteger(x) || !Number.isSafeInteger(y) || !Number.isSafeInteger(x - y)) return null;
        row[j] = x - y || 0;
      }
      reduce(row);
    }
    pivots.push(c);
    r++;
  }
  return { rows: m, pivots };
}

describe("integerGaussJordanNumber against a BigInt rational oracle", () => {
  const wide = fc
    .tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 1, max: 13 }), fc.constantFrom(9, 60, 2 ** 20, 2 ** 40))
    .chain(([r, c, big]) =>
      fc.array(fc.array(fc.oneof(fc.constant(0), fc.integer({ min: -9, max: 9 }), fc.integer({ min: -big, max: big })), { minLength: c, maxLength: c }), {
        minLength: r,
        maxLength: r,
      }),
    );
  test.prop([wide, fc.boolean()], { numRuns: 300 })(
    "gives the unique integer RREF (rows coprime, pivots positive), or null only when a value outgrew 2^53",
    (m, carried) => {
      const cols = m[0]!.length;
      // with a carried column (a right-hand side) the form is not unique: the pivots and the zero rows are checked
      const pivotCols = carried && cols > 1 ? cols - 1 : cols;
      const got = integerGaussJordanNumber(m, pivotCols);
      const want = rrefOracle(m, pivotCols);
      // the same rows (all of them, in the same order) and the same overflow verdict as an elimination checking every entry
      const reference = checkedElimination(m, pivotCols);
      expect(got === null ? null : got.rows).toEqual(reference === null ? null : reference.rows);
      if (got === null) return;
      const rank = want.pivots.length;
      expect(got.pivots).toEqual(want.pivots);
      for (const row of got.rows.slice(rank)) expect(row.slice(0, pivotCols).every((v) => v === 0)).toBe(true);
      if (pivotCols === cols) expect(got.rows.map((row) => row.map((v) => BigInt(v)))).toEqual(want.rows);
      expect(got.rows.every((row) => row.every((v) => !Object.is(v, -0)))).toBe(true);
    },
  );

  it("a small chemistry matrix never leaves float64 (the 9-species redox)", () => {
    // K4Fe(CN)6 + KMnO4 + H2SO4 -> KHSO4 + Fe2(SO4)3 + MnSO4 + HNO3 + CO2 + H2O over K, Fe, C, N, Mn, O, H, S
    const m = [
      [-4, -1, 0, 1, 0, 0, 0, 0, 0], [-1, 0, 0, 0, 2, 0, 0, 0, 0], [-6, 0, 0, 0, 0, 0, 0, 1, 0], [-6, 0, 0, 0, 0, 0, 1, 0, 0],
      [0, -1, 0, 0, 0, 1, 0, 0, 0], [0, -4, -4, 4, 12, 4, 3, 2, 1], [0, 0, -2, 1, 0, 0, 1, 0, 2], [0, 0, -1, 1, 3, 1, 0, 0, 0],
    ];
    const got = integerGaussJordanNumber(m, 9)!;
    expect(got.rows.map((row) => row.map((v) => BigInt(v)))).toEqual(rrefOracle(m, 9).rows);
    expect(integerNullSpaceNumber(got.rows, got.pivots, 9)).toEqual([[10, 122, 299, 162, 5, 122, 60, 60, 188]]);
  });
});

describe("integerNullVectorNumber against a BigInt rational oracle", () => {
  /** The null space from the oracle's reduced form: one primitive integer vector per free column. */
  function nullSpaceOracle(m: readonly (readonly number[])[], cols: number): bigint[][] {
    const { rows, pivots } = rrefOracle(m, cols);
    const free = [...Array(cols).keys()].filter((c) => !pivots.includes(c));
    return free.map((f) => {
      // x_f = L, x_pc = −L·row[f]/row[pc] with L the lcm of the pivots involved
      let l = 1n;
      pivots.forEach((pc, r) => {
        if (rows[r]![f] !== 0n) l = (l * rows[r]![pc]!) / gcdBigInt(l, rows[r]![pc]!);
      });
      const x = new Array<bigint>(cols).fill(0n);
      x[f] = l;
      pivots.forEach((pc, r) => (x[pc] = (-rows[r]![f]! * l) / rows[r]![pc]!));
      const g = x.reduce((a, b) => gcdBigInt(a, b), 0n);
      return x.map((v) => v / g);
    });
  }
  const flat = (m: readonly (readonly number[])[]) => Float64Array.from(m.flat());
  const sparse = fc
    .tuple(fc.integer({ min: 1, max: 10 }), fc.integer({ min: 1, max: 12 }), fc.constantFrom(4, 12, 1000, 2 ** 30))
    .chain(([r, c, big]) =>
      fc.array(
        fc.array(fc.oneof({ weight: 3, arbitrary: fc.constant(0) }, { weight: 2, arbitrary: fc.integer({ min: -big, max: big }) }), { minLength: c, maxLength: c }),
        { minLength: r, maxLength: r },
      ),
    );
  test.prop([sparse], { numRuns: 400 })("gives ± the primitive null vector when the null space is one-dimensional (or null on overflow), else null", (m) => {
    const cols = m[0]!.length;
    const want = nullSpaceOracle(m, cols);
    const got = integerNullVectorNumber(flat(m), m.length, cols);
    if (want.length !== 1) {
      expect(got).toBeNull();
      return;
    }
    if (got === null) return; // allowed: the numbers outgrew 2^53 on the way (the caller then works in BigInt)
    const v = got.map((x) => BigInt(x));
    const w = want[0]!;
    const sign = v.find((x) => x !== 0n)! * w.find((x) => x !== 0n)! > 0n ? 1n : -1n;
    expect(v.map((x) => x * sign)).toEqual(w);
    expect(got.every((x) => Number.isSafeInteger(x) && !Object.is(x, -0))).toBe(true);
  });

  it("the 9-species redox: 10 K4Fe(CN)6 + 122 KMnO4 + 299 H2SO4 -> 162 KHSO4 + 5 Fe2(SO4)3 + 122 MnSO4 + 60 HNO3 + 60 CO2 + 188 H2O", () => {
    // element rows K, Fe, C, N, Mn, O, H, S with reactant columns negated (coefficients: KNOWN in tests/reaction)
    const m = [
      [-4, -1, 0, 1, 0, 0, 0, 0, 0], [-1, 0, 0, 0, 2, 0, 0, 0, 0], [-6, 0, 0, 0, 0, 0, 0, 1, 0], [-6, 0, 0, 0, 0, 0, 1, 0, 0],
      [0, -1, 0, 0, 0, 1, 0, 0, 0], [0, -4, -4, 4, 12, 4, 3, 2, 1], [0, 0, -2, 1, 0, 0, 1, 0, 2], [0, 0, -1, 1, 3, 1, 0, 0, 0],
    ];
    expect(integerNullVectorNumber(flat(m), 8, 9)).toEqual([10, 122, 299, 162, 5, 122, 60, 60, 188]);
    // a second independent balance (H2 + O2 -> H2O + H2O2 over H, O): not one-dimensional
    expect(integerNullVectorNumber(flat([[-2, 0, 2, 2], [0, -2, 1, 2]]), 2, 4)).toBeNull();
    // no balance at all
    expect(integerNullVectorNumber(flat([[-1, 2], [0, 1]]), 2, 2)).toBeNull();
  });
});
