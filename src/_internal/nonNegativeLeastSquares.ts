/**
 * Private: non-negative least squares, min ‖A x − b‖ subject to x ≥ 0, by the active-set method
 * of Lawson and Hanson. Used to tell whether a product set can hold a feed's elements at all
 * (some n ≥ 0 with Σ a_ij n_j = b_i) before and after an equilibrium solve fails.
 *
 * Reference: C. L. Lawson, R. J. Hanson, Solving Least Squares Problems, Prentice-Hall 1974, ch. 23.
 *
 * @module
 * @internal
 */
import { solveDense } from "./gibbsMinimizer.js";

/**
 * The non-negative least-squares solution of A x ≈ b (A: m × n, row-major) and the largest
 * relative residual max_i |(A x − b)_i| / |b_i| (absolute where b_i = 0).
 */
export function nonNegativeLeastSquares(a: Float64Array, m: number, n: number, b: Float64Array): { x: Float64Array; residual: number } {
  const x = new Float64Array(n);
  const passive = new Uint8Array(n);
  const w = new Float64Array(n);
  let bNorm = 0;
  for (let i = 0; i < m; i++) bNorm = Math.max(bNorm, Math.abs(b[i]!));
  const tol = 1e-12 * Math.max(bNorm, 1e-300) * Math.max(m, n);
  const gradient = (): void => {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let i = 0; i < m; i++) {
        let ax = 0;
        for (let k = 0; k < n; k++) ax += a[i * n + k]! * x[k]!;
        s += a[i * n + j]! * (b[i]! - ax);
      }
      w[j] = s;
    }
  };
  const s = new Float64Array(n);
  for (let outer = 0; outer < 3 * n + 10; outer++) {
    gradient();
    let t = -1;
    let best = tol;
    for (let j = 0; j < n; j++) {
      if (!passive[j] && w[j]! > best) {
        best = w[j]!;
        t = j;
      }
    }
    if (t < 0) break;
    passive[t] = 1;
    for (let inner = 0; inner < 3 * n + 10; inner++) {
      if (!leastSquaresOnPassive(a, m, n, b, passive, s)) break;
      let allPositive = true;
      for (let j = 0; j < n; j++) if (passive[j] && s[j]! <= 0) allPositive = false;
      if (allPositive) {
        x.set(s);
        break;
      }
      let alpha = Infinity;
      for (let j = 0; j < n; j++) {
        if (passive[j] && s[j]! <= 0) {
          const r = x[j]! / (x[j]! - s[j]!);
          if (r < alpha) alpha = r;
        }
      }
      for (let j = 0; j < n; j++) {
        x[j] = x[j]! + alpha * (s[j]! - x[j]!);
        if (passive[j] && x[j]! <= 1e-15 * Math.max(bNorm, 1e-300)) {
          passive[j] = 0;
          x[j] = 0;
        }
      }
    }
  }
  let residual = 0;
  for (let i = 0; i < m; i++) {
    let ax = 0;
    for (let k = 0; k < n; k++) ax += a[i * n + k]! * x[k]!;
    const bi = Math.abs(b[i]!);
    residual = Math.max(residual, Math.abs(ax - b[i]!) / (bi > 0 ? bi : 1));
  }
  return { x, residual };
}

/** Unconstrained least squares over the passive columns (normal equations, tiny ridge); others 0. */
function leastSquaresOnPassive(a: Float64Array, m: number, n: number, b: Float64Array, passive: Uint8Array, out: Float64Array): boolean {
  const cols: number[] = [];
  for (let j = 0; j < n; j++) if (passive[j]) cols.push(j);
  const k = cols.length;
  const M = new Float64Array(k * k);
  const r = new Float64Array(k);
  let trace = 0;
  for (let p = 0; p < k; p++) {
    for (let q = 0; q < k; q++) {
      let sum = 0;
      for (let i = 0; i < m; i++) sum += a[i * n + cols[p]!]! * a[i * n + cols[q]!]!;
      M[p * k + q] = sum;
    }
    let rb = 0;
    for (let i = 0; i < m; i++) rb += a[i * n + cols[p]!]! * b[i]!;
    r[p] = rb;
    trace += M[p * k + p]!;
  }
  for (let p = 0; p < k; p++) M[p * k + p] = M[p * k + p]! + 1e-13 * trace;
  if (!solveDense(M, r, k)) return false;
  out.fill(0);
  for (let p = 0; p < k; p++) out[cols[p]!] = r[p]!;
  return true;
}
