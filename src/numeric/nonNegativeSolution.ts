/**
 * Private: a non-negative solution of a small linear system, A x = b with x ≥ 0, by phase I of the
 * simplex method (artificial variables, Bland's smallest-index rule, so it cannot cycle). Meant for
 * small integer data — element counts of species — where the answer is exact up to round-off: the
 * equilibrium engine uses it to find the product species no composition of the feed can hold.
 *
 * Reference: G. B. Dantzig, Linear Programming and Extensions, Princeton University Press 1963
 * (phase I); R. G. Bland, "New finite pivoting rules for the simplex method", Math. Oper. Res. 2
 * (1977) 103–107 (the smallest-index rule).
 *
 * @module
 * @internal
 */

/**
 * Some x ≥ 0 with A x = b (A: m × n, row-major), or null when there is none. A pivot or reduced cost
 * below `tolerance` (relative to the largest |A| entry) counts as zero, and the system counts as
 * solved when the artificial variables sum to at most `tolerance` times Σ|b|.
 */
export function nonNegativeSolution(a: Float64Array, m: number, n: number, b: Float64Array, tolerance = 1e-9): Float64Array | null {
  const w = n + m + 1; // original columns, one artificial per row, right-hand side
  const t = new Float64Array(m * w);
  let big = 0;
  let bSum = 0;
  for (let i = 0; i < m; i++) {
    const s = b[i]! < 0 ? -1 : 1; // rows with b_i ≥ 0, so the artificial start is feasible
    for (let j = 0; j < n; j++) {
      const v = s * a[i * n + j]!;
      t[i * w + j] = v;
      big = Math.max(big, Math.abs(v));
    }
    t[i * w + n + i] = 1;
    t[i * w + w - 1] = s * b[i]!;
    bSum += Math.abs(b[i]!);
  }
  if (!Number.isFinite(big) || !Number.isFinite(bSum)) return null;
  const eps = tolerance * Math.max(big, 1);
  const basis = Int32Array.from({ length: m }, (_, i) => n + i);
  const cost = new Float64Array(w); // reduced costs of min Σ artificials; cost[w − 1] = −objective
  const refreshCost = (): void => {
    cost.fill(0);
    for (let i = 0; i < m; i++) {
      if (basis[i]! < n) continue;
      for (let k = 0; k < w; k++) cost[k] = cost[k]! - t[i * w + k]!;
    }
    for (let i = 0; i < m; i++) cost[basis[i]!] = 0;
  };
  refreshCost();
  const maxPivots = 50 * (n + m) + 100;
  for (let pivots = 0; pivots < maxPivots; pivots++) {
    // entering: the smallest index with a negative reduced cost (Bland)
    let enter = -1;
    for (let k = 0; k < n + m; k++) {
      if (cost[k]! < -eps) {
        enter = k;
        break;
      }
    }
    if (enter < 0) break;
    // leaving: the minimum ratio, ties to the smallest basic index (Bland)
    let leave = -1;
    let ratio = Infinity;
    for (let i = 0; i < m; i++) {
      const p = t[i * w + enter]!;
      if (!(p > eps)) continue;
      const r = t[i * w + w - 1]! / p;
      const tie = leave >= 0 && Math.abs(r - ratio) <= 1e-12 * Math.max(Math.abs(r), Math.abs(ratio));
      if (tie ? basis[i]! < basis[leave]! : r < ratio) {
        ratio = r;
        leave = i;
      }
    }
    if (leave < 0) break; // unbounded direction: cannot happen in phase I (the objective is ≥ 0)
    const p = t[leave * w + enter]!;
    for (let k = 0; k < w; k++) t[leave * w + k] = t[leave * w + k]! / p;
    for (let i = 0; i < m; i++) {
      if (i === leave) continue;
      const f = t[i * w + enter]!;
      if (f === 0) continue;
      for (let k = 0; k < w; k++) t[i * w + k] = t[i * w + k]! - f * t[leave * w + k]!;
      if (t[i * w + w - 1]! < 0 && t[i * w + w - 1]! > -eps * bSum) t[i * w + w - 1] = 0;
    }
    basis[leave] = enter;
    refreshCost();
  }
  let artificial = 0;
  for (let i = 0; i < m; i++) if (basis[i]! >= n) artificial += Math.abs(t[i * w + w - 1]!);
  if (!(artificial <= tolerance * Math.max(bSum, 1e-300))) return null;
  const x = new Float64Array(n);
  for (let i = 0; i < m; i++) if (basis[i]! < n) x[basis[i]!] = Math.max(0, t[i * w + w - 1]!);
  return x;
}
