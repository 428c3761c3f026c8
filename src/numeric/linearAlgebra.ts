/**
 * Exact linear algebra over the rationals: reduced row echelon form, rank, null space and the
 * solution of linear systems, with no rounding anywhere.
 *
 * Chemistry needs exact answers here: the rank of an element matrix decides how many
 * independent reactions exist, a null-space vector is a set of stoichiometric coefficients,
 * and a Hess combination must be exactly in the span or not at all. Floating-point elimination
 * with a tolerance can call a rank-deficient matrix full rank (or the reverse); these routines
 * cannot.
 *
 * Method: each row is scaled to integers (lcm of its denominators), then fraction-free
 * Gauss–Jordan elimination runs with gcd reduction of every changed row, first in float64
 * integers (checked to stay exact) and in BigInt on overflow. Cost O(m·n·min(m, n)) integer
 * operations for an m×n matrix.
 *
 * Matrices are arrays of rows; entries may be {@link Rational}s, bigints, numbers (read from
 * their shortest decimal text) or rational text such as `"13/2"` (see {@link RationalLike}).
 *
 * @module
 */
import { RxthermError, requireArray } from "../errors.js";
import { complement, integerGaussJordan, integerNullSpaceFromEchelon } from "./integerElimination.js";
import {
  lcmBigInt,
  rational,
  rationalFrom,
  type Rational,
  type RationalLike,
} from "./rational.js";

/** A matrix as an array of rows of exact-convertible entries. @category Numeric */
export type MatrixLike = readonly (readonly RationalLike[])[];

/**
 * Result of {@link reducedRowEchelon}.
 *
 * @category Numeric
 */
export interface RowEchelonResult {
  /** The reduced row echelon form: pivot rows first (pivot entry 1), then zero rows. */
  readonly rref: Rational[][];
  /** Column of the pivot of each non-zero row, ascending; its length is the rank. */
  readonly pivotColumns: number[];
  /** Columns without a pivot (the free variables), ascending. */
  readonly freeColumns: number[];
  /** Rank of the matrix. */
  readonly rank: number;
}

/**
 * Result of {@link solveLinearSystem}: the unique solution, or why there is none, or the whole
 * family of solutions.
 *
 * - `unique`: exactly one solution.
 * - `inconsistent`: no solution; `rows` are the equations (row indices of A) whose
 *   combination gives `0 = non-zero`, i.e. the equations that contradict each other.
 * - `underdetermined`: infinitely many solutions `particular + Σ tᵢ·nullSpace[i]`;
 *   `freeColumns` are the unknowns left free (set to 0 in `particular`).
 *
 * @category Numeric
 */
export type LinearSolution =
  | { readonly kind: "unique"; readonly solution: Rational[]; readonly rank: number }
  | { readonly kind: "inconsistent"; readonly rows: number[]; readonly rank: number }
  | {
      readonly kind: "underdetermined";
      readonly particular: Rational[];
      readonly freeColumns: number[];
      readonly nullSpace: Rational[][];
      readonly rank: number;
    };

/**
 * Exact reduced row echelon form (Gauss–Jordan) of a rational matrix.
 *
 * @param matrix - m×n matrix as rows (not mutated)
 * @returns the RREF with pivot entries 1, the pivot and free columns, and the rank
 * @throws RxthermError `INVALID_ARGUMENT` when rows differ in length or an entry is not an
 *   exact-convertible number (details: `row`, `expected`, `got` or the entry's text)
 * @example
 * reducedRowEchelon([[1, 2, 3], [2, 4, 7]]).pivotColumns // => [0, 2]
 * @category Numeric
 * @see G. Strang, Linear Algebra and Its Applications, 4th ed. (2006), §2.2 (reduced row echelon form)
 */
export function reducedRowEchelon(matrix: MatrixLike): RowEchelonResult {
  const { ints, cols } = toIntegerRows(matrix, "reducedRowEchelon");
  const { rows, pivots } = integerGaussJordan(ints, cols);
  const rref: Rational[][] = rows.map((row, i) => {
    const pc = pivots[i];
    if (pc === undefined) return row.map(() => ZERO);
    const d = row[pc] as bigint;
    return row.map((v) => rational(v, d));
  });
  return { rref, pivotColumns: pivots, freeColumns: complement(pivots, cols), rank: pivots.length };
}

/**
 * Exact rank of a rational matrix (the number of linearly independent rows).
 *
 * For an element-by-species matrix the number of independent reactions is
 * `species − rank`.
 *
 * @param matrix - m×n matrix as rows (not mutated)
 * @returns the rank (0 … min(m, n))
 * @throws RxthermError `INVALID_ARGUMENT` for a ragged matrix or a bad entry
 * @example
 * matrixRank([[1, 0, 1], [0, 1, 1], [1, 1, 2]]) // => 2
 * @category Numeric
 * @see G. Strang, Linear Algebra and Its Applications, 4th ed. (2006), §2.4 (rank)
 */
export function matrixRank(matrix: MatrixLike): number {
  const { ints, cols } = toIntegerRows(matrix, "matrixRank");
  return integerGaussJordan(ints, cols).pivots.length;
}

/**
 * Basis of the null space {x : A·x = 0} over the rationals, one vector per free column.
 *
 * Vector k has 1 in free column `freeColumns[k]`, 0 in the other free columns, and the
 * values the RREF forces in the pivot columns — the standard, deterministic basis.
 *
 * @param matrix - m×n matrix as rows (not mutated)
 * @returns n − rank vectors of length n (an empty array for full column rank)
 * @throws RxthermError `INVALID_ARGUMENT` for a ragged matrix or a bad entry
 * @example
 * // H2, O2, H2O with rows H and O: one balanced direction
 * nullSpace([[2, 0, 2], [0, 2, 1]]).map((v) => v.map(rationalToString)) // => [["-1", "-1/2", "1"]]
 * @category Numeric
 * @see G. Strang, Linear Algebra and Its Applications, 4th ed. (2006), §2.2 (special solutions)
 */
export function nullSpace(matrix: MatrixLike): Rational[][] {
  const { ints, cols } = toIntegerRows(matrix, "nullSpace");
  const { rows, pivots } = integerGaussJordan(ints, cols);
  return complement(pivots, cols).map((f) => {
    const x: Rational[] = new Array<Rational>(cols).fill(ZERO);
    x[f] = ONE;
    pivots.forEach((pc, r) => {
      const row = rows[r] as bigint[];
      x[pc] = rational(-(row[f] as bigint), row[pc] as bigint);
    });
    return x;
  });
}

/**
 * Null-space basis as integer vectors: the {@link nullSpace} basis with each vector scaled to
 * coprime integers (its free-column entry positive). For an element matrix these are whole-
 * number reactions in signed form (negative = consumed, positive = formed).
 *
 * @param matrix - m×n matrix as rows (not mutated)
 * @returns n − rank integer vectors of length n, each with gcd 1
 * @throws RxthermError `INVALID_ARGUMENT` for a ragged matrix or a bad entry
 * @example
 * integerNullSpace([[2, 0, 2], [0, 2, 1]]) // => [[-2n, -1n, 2n]]
 * @category Numeric
 */
export function integerNullSpace(matrix: MatrixLike): bigint[][] {
  const { ints, cols } = toIntegerRows(matrix, "integerNullSpace");
  const { rows, pivots } = integerGaussJordan(ints, cols);
  return integerNullSpaceFromEchelon(rows, pivots, cols);
}

/**
 * Solve the exact linear system A·x = b and say which case it is: a unique solution, an
 * inconsistent system (naming the equations that contradict each other), or an
 * underdetermined one (a particular solution, the free unknowns and a null-space basis).
 *
 * @param a - m×n coefficient matrix as rows (not mutated)
 * @param b - right-hand side, length m
 * @returns a {@link LinearSolution}
 * @throws RxthermError `INVALID_ARGUMENT` for a ragged matrix, a bad entry, or `b` whose length
 *   differs from the number of rows (details: `rows`, `rhsLength`)
 * @example
 * const s = solveLinearSystem([[1, 1], [1, -1]], [3, 1]);
 * s.kind === "unique" && s.solution.map(rationalToString) // => ["2", "1"]
 * @category Numeric
 * @see G. Strang, Linear Algebra and Its Applications, 4th ed. (2006), §2.2 (the complete solution to Ax = b)
 */
export function solveLinearSystem(a: MatrixLike, b: readonly RationalLike[]): LinearSolution {
  requireArray(a, "solveLinearSystem", "a");
  requireArray(b, "solveLinearSystem", "b");
  a.forEach((row, i) => requireArray(row, "solveLinearSystem", `a[${i}]`));
  const m = a.length;
  if (b.length !== m) {
    throw new RxthermError("INVALID_ARGUMENT", `solveLinearSystem requires b to have one entry per row of a (${m}), got ${b.length}`, {
      rows: m,
      rhsLength: b.length,
    });
  }
  const augmented: RationalLike[][] = a.map((row, i) => {
    const r: RationalLike[] = [...row, b[i] as RationalLike];
    for (let k = 0; k < m; k++) r.push(k === i ? 1n : 0n);
    return r;
  });
  // A ragged `a` shows up as a ragged augmented matrix; report it against `a`'s widths.
  const n = m === 0 ? 0 : (a[0] as readonly RationalLike[]).length;
  a.forEach((row, i) => {
    if (row.length !== n) {
      throw new RxthermError("INVALID_ARGUMENT", `solveLinearSystem requires every row of a to have ${n} entries, row ${i} has ${row.length}`, {
        row: i,
        expected: n,
        got: row.length,
      });
    }
  });
  const { ints } = toIntegerRows(augmented, "solveLinearSystem");
  const { rows, pivots } = integerGaussJordan(ints, n);
  const rank = pivots.length;
  for (let r = rank; r < m; r++) {
    const row = rows[r] as bigint[];
    if (row[n] !== 0n) {
      const involved: number[] = [];
      for (let k = 0; k < m; k++) if (row[n + 1 + k] !== 0n) involved.push(k);
      return { kind: "inconsistent", rows: involved, rank };
    }
  }
  const particular: Rational[] = new Array<Rational>(n).fill(ZERO);
  pivots.forEach((pc, r) => {
    const row = rows[r] as bigint[];
    particular[pc] = rational(row[n] as bigint, row[pc] as bigint);
  });
  if (rank === n) return { kind: "unique", solution: particular, rank };
  const freeColumns = complement(pivots, n);
  const basis = freeColumns.map((f) => {
    const x: Rational[] = new Array<Rational>(n).fill(ZERO);
    x[f] = ONE;
    pivots.forEach((pc, r) => {
      const row = rows[r] as bigint[];
      x[pc] = rational(-(row[f] as bigint), row[pc] as bigint);
    });
    return x;
  });
  return { kind: "underdetermined", particular, freeColumns, nullSpace: basis, rank };
}

// ── private helpers ──────────────────────────────────────────────────────────

const ZERO: Rational = /* @__PURE__ */ rational(0n, 1n);
const ONE: Rational = /* @__PURE__ */ rational(1n, 1n);

function toIntegerRows(matrix: MatrixLike, fn: string): { ints: bigint[][]; cols: number } {
  requireArray(matrix, fn, "matrix");
  matrix.forEach((row, i) => requireArray(row, fn, `matrix[${i}]`));
  const cols = matrix.length === 0 ? 0 : (matrix[0] as readonly RationalLike[]).length;
  const ints = matrix.map((row, i) => {
    if (row.length !== cols) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every row to have ${cols} entries, row ${i} has ${row.length}`, {
        row: i,
        expected: cols,
        got: row.length,
      });
    }
    const rs = row.map(rationalFrom);
    let l = 1n;
    for (const r of rs) if (r.den !== 1n) l = lcmBigInt(l, r.den);
    return rs.map((r) => (r.num * l) / r.den);
  });
  return { ints, cols };
}
