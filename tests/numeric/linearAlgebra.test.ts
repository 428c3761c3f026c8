import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import {
  integerNullSpace,
  matrixRank,
  nullSpace,
  reducedRowEchelon,
  solveLinearSystem,
} from "../../src/numeric/linearAlgebra.js";
import { rational, rationalAdd, rationalMul, rationalToString, type Rational } from "../../src/numeric/rational.js";
import { caught } from "../_helpers/caught.js";

const str = (v: Rational[]) => v.map(rationalToString);
function apply(a: readonly (readonly number[])[] | bigint[][], x: readonly Rational[]): Rational[] {
  return a.map((row) => row.reduce<Rational>((s, v, j) => rationalAdd(s, rationalMul(rational(BigInt(v)), x[j] as Rational)), rational(0n)));
}

const arbSmallMatrix = fc
  .tuple(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 6 }))
  .chain(([m, n]) => fc.array(fc.array(fc.integer({ min: -4, max: 4 }), { minLength: n, maxLength: n }), { minLength: m, maxLength: m }));

describe("reducedRowEchelon", () => {
  it("documented example and a hand-checkable RREF (row reduction by hand, common practice)", () => {
    expect(reducedRowEchelon([[1, 2, 3], [2, 4, 7]]).pivotColumns).toEqual([0, 2]);
    const r = reducedRowEchelon([[2, 4, 6], [1, 3, 5]]);
    expect(r.rref.map(str)).toEqual([["1", "0", "-1"], ["0", "1", "2"]]);
    expect(r.freeColumns).toEqual([2]);
    expect(r.rank).toBe(2);
  });
  it("accepts rational text, decimals and bigints exactly", () => {
    const r = reducedRowEchelon([["1/2", 0.25], [3n, "1.5"]]);
    expect(r.rank).toBe(1);
    expect(r.rref.map(str)).toEqual([["1", "1/2"], ["0", "0"]]);
  });
  it("rejects a ragged matrix with INVALID_ARGUMENT", () => {
    const e = caught(() => reducedRowEchelon([[1, 2], [3]]));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ row: 1, expected: 2, got: 1 });
    expect(caught(() => reducedRowEchelon([[Number.NaN]])).code).toBe("INVALID_ARGUMENT");
  });
  test.prop([arbSmallMatrix])("the RREF is reduced: pivots 1, zero elsewhere in pivot columns, rank = pivots", (a) => {
    const r = reducedRowEchelon(a);
    r.pivotColumns.forEach((pc, i) => {
      r.rref.forEach((row, k) => expect(rationalToString(row[pc] as Rational)).toBe(k === i ? "1" : "0"));
    });
    for (let k = r.rank; k < r.rref.length; k++) expect((r.rref[k] as Rational[]).every((v) => v.num === 0n)).toBe(true);
    expect(r.pivotColumns.length + r.freeColumns.length).toBe((a[0] as number[]).length);
  });
});

describe("matrixRank", () => {
  it("documented example: third row = first + second (arithmetic)", () => {
    expect(matrixRank([[1, 0, 1], [0, 1, 1], [1, 1, 2]])).toBe(2);
    expect(matrixRank([])).toBe(0);
    // C, H, O rows for CH4, H2O, CO, CO2, H2: rank 3 (steam reforming has 2 independent reactions — common practice)
    expect(matrixRank([[1, 0, 1, 1, 0], [4, 2, 0, 0, 2], [0, 1, 1, 2, 0]])).toBe(3);
  });
  it("a 12×12 Hilbert-like matrix of fractions 1/(i+j+1) has full rank 12 (the Hilbert matrix is non-singular — Hilbert 1894)", () => {
    const h = Array.from({ length: 12 }, (_, i) => Array.from({ length: 12 }, (_, j) => `1/${i + j + 1}`));
    expect(matrixRank(h)).toBe(12);
  });
  test.prop([arbSmallMatrix])("rank(A) = rank(Aᵀ) and rank + nullity = columns", (a) => {
    const t = (a[0] as number[]).map((_, j) => a.map((row) => row[j] as number));
    expect(matrixRank(a)).toBe(matrixRank(t));
    expect(matrixRank(a) + nullSpace(a).length).toBe((a[0] as number[]).length);
  });
});

describe("nullSpace / integerNullSpace", () => {
  it("documented example: H2 + O2 -> H2O element matrix (2 H2 + O2 -> 2 H2O, common practice)", () => {
    expect(nullSpace([[2, 0, 2], [0, 2, 1]]).map(str)).toEqual([["-1", "-1/2", "1"]]);
    expect(integerNullSpace([[2, 0, 2], [0, 2, 1]])).toEqual([[-2n, -1n, 2n]]);
  });
  it("works past float64 range (entries 10^30 force the BigInt path)", () => {
    const big = 10n ** 30n;
    const a = [[big, big + 1n, 1n], [1n, 2n, big]].map((r) => r.map((v) => v));
    const ns = integerNullSpace(a);
    expect(ns.length).toBe(1);
    const v = ns[0] as bigint[];
    for (const row of a) expect(row.reduce((s, x, j) => s + x * (v[j] as bigint), 0n)).toBe(0n);
  });
  test.prop([arbSmallMatrix])("differential: the float64 fast path and the BigInt path (forced by scaling a row by 10^20) agree", (a) => {
    const scaled = a.map((row, i) => row.map((v) => (i === 0 ? BigInt(v) * 10n ** 20n : BigInt(v))));
    expect(integerNullSpace(scaled)).toEqual(integerNullSpace(a));
    expect(reducedRowEchelon(scaled).rref).toEqual(reducedRowEchelon(a).rref.map((row) => row));
  });
  test.prop([arbSmallMatrix])("every basis vector satisfies A·x = 0 exactly and the integer basis is coprime", (a) => {
    for (const x of nullSpace(a)) expect(apply(a, x).every((v) => v.num === 0n)).toBe(true);
    for (const v of integerNullSpace(a)) {
      expect(a.every((row) => row.reduce((s, x, j) => s + BigInt(x) * (v[j] as bigint), 0n) === 0n)).toBe(true);
      let g = 0n;
      for (const x of v) {
        let p = g;
        let q = x < 0n ? -x : x;
        while (q !== 0n) [p, q] = [q, p % q];
        g = p;
      }
      expect(g).toBe(1n);
    }
  });
});

describe("solveLinearSystem", () => {
  it("documented example: x + y = 3, x − y = 1 → (2, 1)", () => {
    const s = solveLinearSystem([[1, 1], [1, -1]], [3, 1]);
    expect(s.kind).toBe("unique");
    if (s.kind === "unique") expect(str(s.solution)).toEqual(["2", "1"]);
  });
  it("names the contradicting equations of an inconsistent system", () => {
    // rows 0 and 2 contradict (x + y = 1 and 2x + 2y = 3); row 1 is independent
    const s = solveLinearSystem([[1, 1, 0], [0, 0, 1], [2, 2, 0]], [1, 5, 3]);
    expect(s.kind).toBe("inconsistent");
    if (s.kind === "inconsistent") expect(s.rows).toEqual([0, 2]);
  });
  it("returns a particular solution, the free columns and a null space when underdetermined", () => {
    const s = solveLinearSystem([[1, 1, 1]], ["1/2"]);
    expect(s.kind).toBe("underdetermined");
    if (s.kind === "underdetermined") {
      expect(str(s.particular)).toEqual(["1/2", "0", "0"]);
      expect(s.freeColumns).toEqual([1, 2]);
      expect(s.nullSpace.map(str)).toEqual([["-1", "1", "0"], ["-1", "0", "1"]]);
    }
  });
  it("rejects b of the wrong length", () => {
    const e = caught(() => solveLinearSystem([[1, 2]], [1, 2]));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ rows: 1, rhsLength: 2 });
    expect(caught(() => solveLinearSystem([[1, 2], [1]], [1, 2])).details).toEqual({ row: 1, expected: 2, got: 1 });
  });
  test.prop([arbSmallMatrix, fc.array(fc.integer({ min: -5, max: 5 }), { minLength: 6, maxLength: 6 })])(
    "b = A·x₀ is always solvable and every returned solution satisfies A·x = b",
    (a, x0) => {
      const x = x0.slice(0, (a[0] as number[]).length).map((v) => rational(BigInt(v)));
      const b = apply(a, x);
      const s = solveLinearSystem(a, b);
      expect(s.kind).not.toBe("inconsistent");
      const sol = s.kind === "unique" ? s.solution : s.kind === "underdetermined" ? s.particular : [];
      expect(str(apply(a, sol))).toEqual(str(b));
    },
  );
});
