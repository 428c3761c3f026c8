/**
 * Private dense linear least squares by Householder QR with column scaling.
 *
 * Each column of the design matrix is divided by its Euclidean norm before factorisation (so that,
 * e.g., columns 1 and T⁴ of a Cp fit are of comparable size), the scaled system is reduced by
 * Householder reflections, and R·y = Qᵀ·b is solved by back substitution; the solution is unscaled
 * at the end. This avoids forming the normal equations AᵀA, whose condition number is the square
 * of A's. Reference: G. H. Golub, C. F. Van Loan, Matrix Computations, 4th ed. (2013), §5.2–5.3.
 */

/** Result of {@link leastSquares}: the solution, or null when the columns are (numerically) dependent. */
export interface LeastSquaresResult {
  readonly x: Float64Array | null;
  /** |R_kk| of the scaled system, smallest over largest (a rank indicator). */
  readonly rcond: number;
}

/**
 * Minimise ‖A·x − b‖₂. `a` is row-major with `m` rows and `n` columns (m ≥ n); `a` and `b` are not mutated.
 */
export function leastSquares(a: Float64Array, b: Float64Array, m: number, n: number): LeastSquaresResult {
  const A = Float64Array.from(a);
  const y = Float64Array.from(b);
  const scale = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = 0; i < m; i++) s = Math.hypot(s, A[i * n + j]!);
    scale[j] = s === 0 ? 1 : s;
    for (let i = 0; i < m; i++) A[i * n + j]! /= scale[j]!;
  }
  const diag = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    // Householder vector for column k, rows k..m−1
    let norm = 0;
    for (let i = k; i < m; i++) norm = Math.hypot(norm, A[i * n + k]!);
    if (norm === 0) { diag[k] = 0; continue; }
    const akk = A[k * n + k]!;
    const alpha = akk > 0 ? -norm : norm;
    const v0 = akk - alpha;
    A[k * n + k] = v0;
    // v = (v0, A[k+1..m−1][k]); vᵀv = v0² + Σ rest² = 2·norm·(norm + |akk|) = −2·alpha·v0
    const vtv = -alpha * v0 * 2;
    if (vtv !== 0) {
      for (let j = k + 1; j < n; j++) {
        let dot = 0;
        for (let i = k; i < m; i++) dot += A[i * n + k]! * A[i * n + j]!;
        const f = (2 * dot) / vtv;
        for (let i = k; i < m; i++) A[i * n + j]! -= f * A[i * n + k]!;
      }
      let dot = 0;
      for (let i = k; i < m; i++) dot += A[i * n + k]! * y[i]!;
      const f = (2 * dot) / vtv;
      for (let i = k; i < m; i++) y[i]! -= f * A[i * n + k]!;
    }
    diag[k] = alpha;
  }
  let dmax = 0, dmin = Infinity;
  for (let k = 0; k < n; k++) {
    const d = Math.abs(diag[k]!);
    dmax = Math.max(dmax, d);
    dmin = Math.min(dmin, d);
  }
  const rcond = dmax === 0 ? 0 : dmin / dmax;
  if (!(rcond > 1e-13)) return { x: null, rcond };
  const x = new Float64Array(n);
  for (let k = n - 1; k >= 0; k--) {
    let s = y[k]!;
    for (let j = k + 1; j < n; j++) s -= A[k * n + j]! * x[j]!;
    x[k] = s / diag[k]!;
  }
  for (let j = 0; j < n; j++) x[j]! /= scale[j]!;
  return { x, rcond };
}
