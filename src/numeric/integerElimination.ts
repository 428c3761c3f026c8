/**
 * Fraction-free Gauss–Jordan elimination on integer matrices (private engine behind
 * src/numeric/linearAlgebra.ts and the reaction balancer).
 *
 * Rows stay integer: eliminating row i with pivot row r is `row_i ← (p/g)·row_i − (a/g)·row_r`
 * with `g = gcd(p, a)`, and every changed row is divided by the gcd of its entries, which keeps
 * the numbers as small as the exact answer allows. The work first runs in float64 integers
 * (exact while every product and sum stays a safe integer, which is checked at each step) and
 * falls back to BigInt on the first overflow, so small chemistry matrices never touch BigInt.
 */

import { divideByGcd, lcmBigInt } from "./rational.js";

/** Result of {@link integerGaussJordan}. */
export interface IntegerEchelon {
  /** All rows after elimination, pivot rows first (row i has its pivot at `pivots[i]`). */
  readonly rows: bigint[][];
  /** Pivot column of each leading row; `pivots.length` is the rank over the pivot columns. */
  readonly pivots: number[];
}

/**
 * Reduce `matrix` (not mutated) to integer reduced row echelon form, choosing pivots only in
 * columns `0 .. pivotCols-1` (later columns, such as a right-hand side, are carried along).
 * Each pivot entry is positive and every other row is zero in that pivot column.
 */
export function integerGaussJordan(matrix: readonly (readonly bigint[])[], pivotCols: number): IntegerEchelon {
  const small = toSmall(matrix);
  if (small) {
    const pivots = gaussJordanNumber(small, pivotCols);
    if (pivots) return { rows: small.map((row) => row.map((v) => BigInt(v))), pivots };
  }
  const rows = matrix.map((row) => row.slice());
  return { rows, pivots: gaussJordanBigInt(rows, pivotCols) };
}

/** Same as {@link integerGaussJordan} for a matrix already in safe-integer numbers; null on overflow. */
export function integerGaussJordanNumber(matrix: readonly (readonly number[])[], pivotCols: number): { rows: number[][]; pivots: number[] } | null {
  const rows = matrix.map((row) => row.slice());
  const pivots = gaussJordanNumber(rows, pivotCols);
  return pivots ? { rows, pivots } : null;
}

/**
 * Integer null-space basis from an integer RREF (rows, pivots): vector for free column f has
 * L in column f and −L·row[f]/row[pc] in each pivot column, L = lcm of the pivots involved,
 * then divided by its gcd.
 */
export function integerNullSpaceFromEchelon(rows: readonly (readonly bigint[])[], pivots: readonly number[], cols: number): bigint[][] {
  return complement(pivots, cols).map((f) => {
    let l = 1n;
    pivots.forEach((pc, r) => {
      const row = rows[r] as readonly bigint[];
      if (row[f] !== 0n) l = lcmBigInt(l, row[pc] as bigint);
    });
    const x: bigint[] = new Array<bigint>(cols).fill(0n);
    x[f] = l;
    pivots.forEach((pc, r) => {
      const row = rows[r] as readonly bigint[];
      x[pc] = (-(row[f] as bigint) * l) / (row[pc] as bigint);
    });
    return divideByGcd(x);
  });
}

/**
 * Float64-integer version of {@link integerNullSpaceFromEchelon}; null when a value would leave
 * the safe-integer range (the caller then falls back to BigInt).
 */
export function integerNullSpaceNumber(rows: readonly (readonly number[])[], pivots: readonly number[], cols: number): number[][] | null {
  const out: number[][] = [];
  for (const f of complement(pivots, cols)) {
    let l = 1;
    for (let r = 0; r < pivots.length; r++) {
      const row = rows[r] as readonly number[];
      if (row[f] !== 0) {
        const d = row[pivots[r] as number] as number;
        l = (l / gcdNum(l, d)) * d;
        if (!Number.isSafeInteger(l)) return null;
      }
    }
    const x: number[] = new Array<number>(cols).fill(0);
    x[f] = l;
    for (let r = 0; r < pivots.length; r++) {
      const row = rows[r] as readonly number[];
      const pc = pivots[r] as number;
      const v = (-(row[f] as number) * l) / (row[pc] as number);
      if (!Number.isSafeInteger(v)) return null;
      x[pc] = v || 0;
    }
    reduceRowNumber(x);
    out.push(x);
  }
  return out;
}

/** One null-space vector held sparsely: its non-zero columns (ascending) and their values. */
export interface SparseIntegerVector {
  readonly columns: number[];
  readonly values: number[];
}

/**
 * Sparse float64-integer version of {@link integerNullSpaceNumber}: the vector of free column f
 * is non-zero only at f and at the pivot columns of rows with a non-zero entry in column f, so
 * each vector costs O(rank) instead of O(cols) and a whole basis is linear in the column count
 * for a fixed number of rows. Null when a value would leave the safe-integer range.
 */
export function integerNullSpaceSparseNumber(rows: readonly (readonly number[])[], pivots: readonly number[], cols: number): SparseIntegerVector[] | null {
  const out: SparseIntegerVector[] = [];
  const free = complement(pivots, cols);
  for (let q = 0; q < free.length; q++) {
    const f = free[q]!;
    let l = 1;
    for (let r = 0; r < pivots.length; r++) {
      if (rows[r]![f] !== 0) {
        const d = rows[r]![pivots[r]!]!;
        l = (l / gcdNum(l, d)) * d;
        if (!Number.isSafeInteger(l)) return null;
      }
    }
    const columns: number[] = [];
    const values: number[] = [];
    let placed = false;
    let g = 0;
    for (let r = 0; r < pivots.length; r++) {
      const pc = pivots[r]!;
      if (!placed && f < pc) {
        columns.push(f);
        values.push(l);
        g = gcdNum(g, l);
        placed = true;
      }
      const a = rows[r]![f]!;
      if (a === 0) continue;
      const v = (-a * l) / rows[r]![pc]!;
      if (!Number.isSafeInteger(v)) return null;
      columns.push(pc);
      values.push(v);
      g = gcdNum(g, v);
    }
    if (!placed) {
      columns.push(f);
      values.push(l);
      g = gcdNum(g, l);
    }
    if (g > 1) for (let k = 0; k < values.length; k++) values[k] = values[k]! / g;
    out.push({ columns, values });
  }
  return out;
}

/** Columns 0..cols-1 that are not pivots, ascending. */
export function complement(pivots: readonly number[], cols: number): number[] {
  const isPivot = new Array<boolean>(cols).fill(false);
  for (const p of pivots) isPivot[p] = true;
  const out: number[] = [];
  for (let c = 0; c < cols; c++) if (!isPivot[c]) out.push(c);
  return out;
}

const SMALL = 2 ** 40;

function toSmall(matrix: readonly (readonly bigint[])[]): number[][] | null {
  const out: number[][] = [];
  for (const row of matrix) {
    const r: number[] = [];
    for (const v of row) {
      const n = Number(v);
      if (n > SMALL || n < -SMALL) return null;
      r.push(n);
    }
    out.push(r);
  }
  return out;
}

function gcdNum(a: number, b: number): number {
  a = Math.abs(a);
  b = Math.abs(b);
  while (b !== 0) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

function reduceRowNumber(row: number[]): void {
  let g = 0;
  for (const v of row) {
    if (v !== 0) {
      g = gcdNum(g, v);
      if (g === 1) return;
    }
  }
  if (g > 1) for (let j = 0; j < row.length; j++) row[j] = (row[j] as number) / g;
}

/** In-place elimination in float64 integers; returns the pivots, or null when a value overflowed. */
function gaussJordanNumber(m: number[][], pivotCols: number): number[] | null {
  const nRows = m.length;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < pivotCols && r < nRows; c++) {
    // choose the non-zero entry of smallest magnitude as pivot: keeps numbers small
    let p = -1;
    let best = Infinity;
    for (let i = r; i < nRows; i++) {
      const a = Math.abs((m[i] as number[])[c] as number);
      if (a !== 0 && a < best) {
        best = a;
        p = i;
      }
    }
    if (p < 0) continue;
    const tmp = m[p] as number[];
    m[p] = m[r] as number[];
    m[r] = tmp;
    const pr = tmp;
    if ((pr[c] as number) < 0) for (let j = 0; j < pr.length; j++) pr[j] = -(pr[j] as number) || 0;
    reduceRowNumber(pr);
    const pv = pr[c] as number;
    for (let i = 0; i < nRows; i++) {
      if (i === r) continue;
      const row = m[i] as number[];
      const a = row[c] as number;
      if (a === 0) continue;
      const g = gcdNum(a, pv);
      const fa = pv / g;
      const fb = a / g;
      for (let j = 0; j < row.length; j++) {
        const x = (row[j] as number) * fa;
        const y = (pr[j] as number) * fb;
        const v = x - y;
        if (!Number.isSafeInteger(x) || !Number.isSafeInteger(y) || !Number.isSafeInteger(v)) return null;
        row[j] = v || 0;
      }
      reduceRowNumber(row);
    }
    pivots.push(c);
    r++;
  }
  return pivots;
}

function reduceRowBigInt(row: bigint[]): void {
  let g = 0n;
  for (const v of row) {
    if (v !== 0n) {
      let a = g;
      let b = v < 0n ? -v : v;
      while (b !== 0n) {
        const t = a % b;
        a = b;
        b = t;
      }
      g = a;
      if (g === 1n) return;
    }
  }
  if (g > 1n) for (let j = 0; j < row.length; j++) row[j] = (row[j] as bigint) / g;
}

function gaussJordanBigInt(m: bigint[][], pivotCols: number): number[] {
  const nRows = m.length;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < pivotCols && r < nRows; c++) {
    let p = -1;
    let best = -1n;
    for (let i = r; i < nRows; i++) {
      let a = (m[i] as bigint[])[c] as bigint;
      if (a < 0n) a = -a;
      if (a !== 0n && (best < 0n || a < best)) {
        best = a;
        p = i;
      }
    }
    if (p < 0) continue;
    const pr = m[p] as bigint[];
    m[p] = m[r] as bigint[];
    m[r] = pr;
    if ((pr[c] as bigint) < 0n) for (let j = 0; j < pr.length; j++) pr[j] = -(pr[j] as bigint);
    reduceRowBigInt(pr);
    const pv = pr[c] as bigint;
    for (let i = 0; i < nRows; i++) {
      if (i === r) continue;
      const row = m[i] as bigint[];
      const a = row[c] as bigint;
      if (a === 0n) continue;
      let g = pv;
      let b = a < 0n ? -a : a;
      while (b !== 0n) {
        const t = g % b;
        g = b;
        b = t;
      }
      const fa = pv / g;
      const fb = a / g;
      for (let j = 0; j < row.length; j++) row[j] = (row[j] as bigint) * fa - (pr[j] as bigint) * fb;
      reduceRowBigInt(row);
    }
    pivots.push(c);
    r++;
  }
  return pivots;
}
