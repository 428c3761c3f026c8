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
import { gcdNumber } from "./safeRational.js";

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

/**
 * Same as {@link integerGaussJordan} for a matrix already in safe-integer numbers; null on overflow.
 * With `inPlace` the caller's rows are reduced (and reordered) in place instead of copies.
 */
export function integerGaussJordanNumber(matrix: readonly (readonly number[])[], pivotCols: number, inPlace = false): { rows: number[][]; pivots: number[] } | null {
  const rows = inPlace ? (matrix as number[][]) : matrix.map((row) => row.slice());
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
        l = (l / gcdNumber(l, d)) * d;
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

/** Scratch of {@link integerNullVectorNumber}: row offsets, row maxima, pivot columns (grown on demand). */
let ROW_AT = /* @__PURE__ */ new Int32Array(32);
let ROW_MAX = /* @__PURE__ */ new Float64Array(32);
let PIVOT_COL = /* @__PURE__ */ new Int32Array(32);

/**
 * The integer vector spanning the null space of a matrix whose null space is one-dimensional, by
 * fraction-free forward elimination and back substitution in float64 integers (a balancing fast
 * path: no reduced echelon form, no per-row gcd while the numbers stay below 2^26).
 *
 * Exact: before each row update and each step of the back substitution a bound on every product and
 * sum (largest magnitudes times the multipliers, computed in float64, which can only round it
 * upward past the limit) is checked to stay a safe integer; otherwise the function gives up.
 *
 * @param a - the matrix, row-major (`rows × cols` entries, safe integers); overwritten
 * @param rows - number of rows
 * @param cols - number of columns
 * @returns the vector with coprime entries (its sign arbitrary), or null when the null space is not
 *   one-dimensional or a value would leave the safe-integer range (the caller then decides in BigInt)
 */
export function integerNullVectorNumber(a: Float64Array, rows: number, cols: number): number[] | null {
  if (ROW_AT.length < rows) {
    ROW_AT = new Int32Array(rows);
    ROW_MAX = new Float64Array(rows);
    PIVOT_COL = new Int32Array(rows);
  }
  const at = ROW_AT;
  const rmax = ROW_MAX;
  for (let i = 0; i < rows; i++) {
    const o = i * cols;
    at[i] = o;
    let m = 0;
    for (let j = 0; j < cols; j++) {
      const v = Math.abs(a[o + j] as number);
      if (v > m) m = v;
    }
    rmax[i] = m;
  }
  let r = 0;
  let free = -1;
  for (let c = 0; c < cols; c++) {
    if (r === rows) {
      // no rows left: every remaining column is free
      if (free >= 0 || c < cols - 1) return null;
      free = c;
      break;
    }
    let p = -1;
    let best = Infinity;
    for (let i = r; i < rows; i++) {
      const v = Math.abs(a[(at[i] as number) + c] as number);
      if (v !== 0 && v < best) {
        best = v;
        p = i;
      }
    }
    if (p < 0) {
      if (free >= 0) return null;
      free = c;
      continue;
    }
    const po = at[p] as number;
    at[p] = at[r] as number;
    at[r] = po;
    const mp = rmax[p] as number;
    rmax[p] = rmax[r] as number;
    rmax[r] = mp;
    const pv = a[po + c] as number;
    for (let i = r + 1; i < rows; i++) {
      const o = at[i] as number;
      const x = a[o + c] as number;
      if (x === 0) continue;
      const g = gcdNumber(x, pv);
      const fa = pv / g;
      const fb = x / g;
      if ((rmax[i] as number) * Math.abs(fa) + mp * Math.abs(fb) > MAX_SAFE) return null;
      a[o + c] = 0;
      let m = 0;
      for (let j = c + 1; j < cols; j++) {
        const v = (a[o + j] as number) * fa - (a[po + j] as number) * fb;
        a[o + j] = v;
        const av = Math.abs(v);
        if (av > m) m = av;
      }
      if (m > GROWTH) {
        let rg = 0;
        for (let j = c + 1; j < cols && rg !== 1; j++) if (a[o + j] !== 0) rg = gcdNumber(rg, a[o + j] as number);
        if (rg > 1) {
          for (let j = c + 1; j < cols; j++) a[o + j] = (a[o + j] as number) / rg;
          m /= rg;
        }
      }
      rmax[i] = m;
    }
    PIVOT_COL[r] = c;
    r++;
  }
  if (free < 0) return null;
  // back substitution from the last pivot row up, with the free entry 1, keeping the vector integer
  const x = new Array<number>(cols).fill(0);
  x[free] = 1;
  let sumAbs = 1;
  let xMax = 1;
  for (let k = r - 1; k >= 0; k--) {
    const o = at[k] as number;
    const pc = PIVOT_COL[k] as number;
    if ((rmax[k] as number) * sumAbs > MAX_SAFE) return null;
    let s = 0;
    for (let j = pc + 1; j < cols; j++) {
      const xj = x[j] as number;
      if (xj !== 0) s += (a[o + j] as number) * xj;
    }
    if (s === 0) continue;
    const u = a[o + pc] as number;
    const g = gcdNumber(s, u);
    const m = Math.abs(u) / g;
    if (m !== 1) {
      if (xMax * m > MAX_SAFE) return null;
      for (let j = 0; j < cols; j++) x[j] = (x[j] as number) * m;
      sumAbs *= m;
      xMax *= m;
    }
    const xp = u < 0 ? s / g : -s / g;
    x[pc] = xp;
    const axp = Math.abs(xp);
    sumAbs += axp;
    if (axp > xMax) xMax = axp;
  }
  reduceRowNumber(x);
  return x;
}

/** Row magnitude above which {@link integerNullVectorNumber} divides a row by the gcd of its entries. */
const GROWTH = 2 ** 26;

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
        l = (l / gcdNumber(l, d)) * d;
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
        g = gcdNumber(g, l);
        placed = true;
      }
      const a = rows[r]![f]!;
      if (a === 0) continue;
      const v = (-a * l) / rows[r]![pc]!;
      if (!Number.isSafeInteger(v)) return null;
      columns.push(pc);
      values.push(v);
      g = gcdNumber(g, v);
    }
    if (!placed) {
      columns.push(f);
      values.push(l);
      g = gcdNumber(g, l);
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


function reduceRowNumber(row: number[]): void {
  let g = 0;
  for (const v of row) {
    if (v !== 0) {
      g = gcdNumber(g, v);
      if (g === 1) return;
    }
  }
  if (g > 1) for (let j = 0; j < row.length; j++) row[j] = (row[j] as number) / g;
}

/** Largest safe integer: every product and sum of integers whose exact value stays within it is exact in float64. */
const MAX_SAFE = 9007199254740991;

/** Largest |entry| of a row. */
function maxAbs(row: readonly number[]): number {
  let m = 0;
  for (let j = 0; j < row.length; j++) {
    const a = Math.abs(row[j] as number);
    if (a > m) m = a;
  }
  return m;
}

/**
 * In-place elimination in float64 integers; returns the pivots, or null when a value overflowed.
 *
 * Exactness is checked per row, not per entry: with m_i and m_p the largest magnitudes of the row
 * and of the pivot row, every entry of `fa·row − fb·pivotRow` is bounded by `fa·m_i + fb·m_p`; when
 * that bound (computed in float64, which can only round it upward past the limit, never below it)
 * is a safe integer, every product and difference of the row is exact. Otherwise the row is
 * eliminated with a check on each entry, as before. The result is the unique integer reduced row
 * echelon form (rows primitive, pivots positive), whichever way it is reached.
 */
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
    const pr = m[p] as number[];
    m[p] = m[r] as number[];
    m[r] = pr;
    const width = pr.length;
    if ((pr[c] as number) < 0) for (let j = 0; j < width; j++) pr[j] = -(pr[j] as number) || 0;
    reduceRowNumber(pr);
    const pv = pr[c] as number;
    const mp = maxAbs(pr);
    for (let i = 0; i < nRows; i++) {
      if (i === r) continue;
      const row = m[i] as number[];
      const a = row[c] as number;
      if (a === 0) continue;
      const g = gcdNumber(a, pv);
      const fa = pv / g;
      const fb = a / g;
      if (maxAbs(row) * fa + mp * Math.abs(fb) <= MAX_SAFE) {
        // every value below is exact; track the row's gcd on the way
        let rg = 0;
        for (let j = 0; j < width; j++) {
          const v = (row[j] as number) * fa - (pr[j] as number) * fb || 0;
          row[j] = v;
          if (v !== 0 && rg !== 1) rg = gcdNumber(rg, v);
        }
        if (rg > 1) for (let j = 0; j < width; j++) row[j] = (row[j] as number) / rg;
      } else {
        for (let j = 0; j < width; j++) {
          const x = (row[j] as number) * fa;
          const y = (pr[j] as number) * fb;
          const v = x - y;
          if (!Number.isSafeInteger(x) || !Number.isSafeInteger(y) || !Number.isSafeInteger(v)) return null;
          row[j] = v || 0;
        }
        reduceRowNumber(row);
      }
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
