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

/**
 * The non-negative least-squares solution of A x ≈ b (A: m × n, row-major; each row with b_i ≠ 0
 * weighted by 1/|b_i|) and the largest relative residual max_i |(A x − b)_i| / |b_i| (relative to
 * max |b| where b_i = 0).
 */
export function nonNegativeLeastSquares(a0: Float64Array, m: number, n: number, b0: Float64Array): { x: Float64Array; residual: number } {
  // rows with b_i ≠ 0 are divided by |b_i|, so the fit weighs every element's relative balance
  // alike; rows with b_i = 0 must come out zero and get the weight of a 1e-9·max|b| target
  let bMax = 0;
  for (let i = 0; i < m; i++) bMax = Math.max(bMax, Math.abs(b0[i]!));
  const a = new Float64Array(m * n);
  const b = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const f = b0[i]! !== 0 ? 1 / Math.abs(b0[i]!) : 1 / (1e-9 * (bMax > 0 ? bMax : 1));
    b[i] = b0[i]! * f;
    for (let j = 0; j < n; j++) a[i * n + j] = a0[i * n + j]! * f;
  }
  const x = new Float64Array(n);
  const passive = new Uint8Array(n);
  const w = new Float64Array(n);
  let bNorm = 0;
  for (let i = 0; i < m; i++) bNorm = Math.max(bNorm, Math.abs(b[i]!));
  // a column enters only if its gradient is significant relative to its own size
  const colTol = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    let c = 0;
    for (let i = 0; i < m; i++) c += a[i * n + j]! ** 2;
    colTol[j] = 1e-13 * Math.sqrt(c) * Math.max(bNorm, 1e-300) * Math.sqrt(m);
  }
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
  // columns whose entry did not improve the fit at the current x (round-off); cleared when x moves
  const blocked = new Uint8Array(n);
  for (let outer = 0; outer < 3 * n + 10; outer++) {
    gradient();
    let t = -1;
    let best = 0;
    for (let j = 0; j < n; j++) {
      if (!passive[j] && !blocked[j] && w[j]! > colTol[j]! && w[j]! / colTol[j]! > best) {
        best = w[j]! / colTol[j]!;
        t = j;
      }
    }
    if (t < 0) break;
    passive[t] = 1;
    for (let inner = 0; inner < 3 * n + 10; inner++) {
      if (!leastSquaresOnPassive(a, m, n, b, passive, s)) break;
      if (inner === 0 && !(s[t]! > 0)) {
        // in exact arithmetic the column that entered (positive gradient) comes out positive; at
        // round-off it may not (then the step below was 0/0): leave it out until x moves, try the next
        passive[t] = 0;
        blocked[t] = 1;
        break;
      }
      blocked.fill(0);
      let allPositive = true;
      for (let j = 0; j < n; j++) if (passive[j] && s[j]! <= 0) allPositive = false;
      if (allPositive) {
        x.set(s);
        break;
      }
      let alpha = Infinity;
      for (let j = 0; j < n; j++) {
        if (passive[j] && s[j]! <= 0) {
          const d = x[j]! - s[j]!; // ≥ 0; 0 only for x_j = s_j = 0, a step of 0
          const r = d > 0 ? x[j]! / d : 0;
          if (r < alpha) alpha = r;
        }
      }
      for (let j = 0; j < n; j++) {
        x[j] = x[j]! + alpha * (s[j]! - x[j]!);
        if (passive[j] && x[j]! <= 0) {
          passive[j] = 0;
          x[j] = 0;
        }
      }
    }
  }
  let residual = 0;
  for (let i = 0; i < m; i++) {
    let ax = 0;
    for (let k = 0; k < n; k++) ax += a0[i * n + k]! * x[k]!;
    const bi = Math.abs(b0[i]!);
    residual = Math.max(residual, Math.abs(ax - b0[i]!) / (bi > 0 ? bi : bMax > 0 ? bMax : 1));
  }
  return { x, residual };
}

/**
 * Unconstrained least squares over the passive columns by Householder QR (no normal equations,
 * so the conditioning is not squared); the other entries of `out` are 0. False when the passive
 * columns are rank-deficient or outnumber the rows.
 */
function leastSquaresOnPassive(a: Float64Array, m: number, n: number, b: Float64Array, passive: Uint8Array, out: Float64Array): boolean {
  const cols: number[] = [];
  for (let j = 0; j < n; j++) if (passive[j]) cols.push(j);
  const k = cols.length;
  if (k > m) return false;
  const q = new Float64Array(m * k);
  const y = Float64Array.from(b.subarray(0, m));
  let norm = 0;
  for (let i = 0; i < m; i++) {
    for (let p = 0; p < k; p++) {
      q[i * k + p] = a[i * n + cols[p]!]!;
      norm = Math.max(norm, Math.abs(q[i * k + p]!));
    }
  }
  for (let p = 0; p < k; p++) {
    let alpha = 0;
    for (let i = p; i < m; i++) alpha += q[i * k + p]! ** 2;
    alpha = Math.sqrt(alpha);
    if (!(alpha > 1e-13 * norm)) return false;
    if (q[p * k + p]! > 0) alpha = -alpha;
    // v = x − alpha e1 stored in place; H = I − 2 v vᵀ / (vᵀ v)
    q[p * k + p] = q[p * k + p]! - alpha;
    let vv = 0;
    for (let i = p; i < m; i++) vv += q[i * k + p]! ** 2;
    for (let c = p + 1; c < k; c++) {
      let dot = 0;
      for (let i = p; i < m; i++) dot += q[i * k + p]! * q[i * k + c]!;
      const f = (2 * dot) / vv;
      for (let i = p; i < m; i++) q[i * k + c] = q[i * k + c]! - f * q[i * k + p]!;
    }
    let dot = 0;
    for (let i = p; i < m; i++) dot += q[i * k + p]! * y[i]!;
    const f = (2 * dot) / vv;
    for (let i = p; i < m; i++) y[i] = y[i]! - f * q[i * k + p]!;
    // R diagonal
    for (let i = p + 1; i < m; i++) q[i * k + p] = 0;
    q[p * k + p] = alpha;
  }
  out.fill(0);
  const sol = new Float64Array(k);
  for (let p = k - 1; p >= 0; p--) {
    let sum = y[p]!;
    for (let c = p + 1; c < k; c++) sum -= q[p * k + c]! * sol[c]!;
    sol[p] = sum / q[p * k + p]!;
  }
  for (let p = 0; p < k; p++) out[cols[p]!] = sol[p]!;
  return true;
}
