/**
 * Private exact-rational helpers for the extent module (BigInt numerator / denominator).
 * Not re-exported. Kept here (not in numeric/) so the extent module owns its hot path.
 *
 * @module
 * @internal
 */

/** An exact rational n/d with d > 0 and gcd(|n|, d) = 1. */
export interface Q {
  readonly n: bigint;
  readonly d: bigint;
}

export const Q0: Q = { n: 0n, d: 1n };
export const Q1: Q = { n: 1n, d: 1n };

function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/** Build a normalised rational. */
export function q(n: bigint, d: bigint = 1n): Q {
  if (d === 0n) throw new RangeError("rational with zero denominator");
  if (d < 0n) {
    n = -n;
    d = -d;
  }
  if (d === 1n) return { n, d };
  const g = gcd(n, d);
  return g === 1n ? { n, d } : { n: n / g, d: d / g };
}

const DECIMAL_RE = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

/**
 * Exact value of a decimal text such as "0.1", "-2.5e-3", "13/2" or "7".
 * Returns null when the text is not a decimal or a fraction of two decimals.
 */
export function qFromText(text: string): Q | null {
  const slash = text.indexOf("/");
  if (slash >= 0) {
    const a = qFromText(text.slice(0, slash).trim());
    const b = qFromText(text.slice(slash + 1).trim());
    if (a === null || b === null || b.n === 0n) return null;
    return qDiv(a, b);
  }
  const m = DECIMAL_RE.exec(text.trim());
  if (m === null) return null;
  const intPart = m[2] ?? "";
  const frac = m[3] ?? "";
  if (intPart === "" && frac === "") return null;
  let exp = m[4] === undefined ? 0 : Number(m[4]);
  exp -= frac.length;
  let n = BigInt((intPart + frac) || "0");
  if (m[1] === "-") n = -n;
  if (exp >= 0) return q(n * 10n ** BigInt(exp), 1n);
  return q(n, 10n ** BigInt(-exp));
}

/**
 * Exact value of the shortest decimal text of a finite double (so 0.1 reads as 1/10, the
 * decimal the user wrote, not the binary neighbour). Caller checks finiteness first.
 */
export function qFromNumber(x: number): Q {
  if (Number.isInteger(x) && Math.abs(x) <= Number.MAX_SAFE_INTEGER) return { n: BigInt(x), d: 1n };
  const r = qFromText(String(x));
  if (r === null) throw new RangeError(`not a finite number: ${x}`);
  return r;
}

export function qAdd(a: Q, b: Q): Q {
  if (a.d === 1n && b.d === 1n) return { n: a.n + b.n, d: 1n };
  if (a.d === b.d) return q(a.n + b.n, a.d);
  return q(a.n * b.d + b.n * a.d, a.d * b.d);
}
export function qSub(a: Q, b: Q): Q {
  return qAdd(a, { n: -b.n, d: b.d });
}
export function qMul(a: Q, b: Q): Q {
  if (a.n === 0n || b.n === 0n) return Q0;
  if (a.d === 1n && b.d === 1n) return { n: a.n * b.n, d: 1n };
  return q(a.n * b.n, a.d * b.d);
}
export function qDiv(a: Q, b: Q): Q {
  if (b.n === 0n) throw new RangeError("rational division by zero");
  return q(a.n * b.d, a.d * b.n);
}
export function qNeg(a: Q): Q {
  return { n: -a.n, d: a.d };
}
export function qIsZero(a: Q): boolean {
  return a.n === 0n;
}
export function qSign(a: Q): number {
  return a.n > 0n ? 1 : a.n < 0n ? -1 : 0;
}
export function qCmp(a: Q, b: Q): number {
  return qSign(qSub(a, b));
}

/** Nearest double to an exact rational (correctly rounded when both parts fit in 2^53). */
export function qToNumber(a: Q): number {
  if (a.n === 0n) return 0; // never -0
  const LIM = 9007199254740992n;
  const an = a.n < 0n ? -a.n : a.n;
  if (an <= LIM && a.d <= LIM) return Number(a.n) / Number(a.d);
  // scale so the integer quotient carries ~ 64 significant bits, then divide by a power of two
  const shift = BigInt(a.d.toString(2).length - an.toString(2).length + 64);
  const scaled = shift >= 0n ? (an << shift) / a.d : an / (a.d << -shift);
  const v = Number(scaled) * Math.pow(2, -Number(shift));
  return a.n < 0n ? -v : v;
}

/**
 * Result of an exact Gauss–Jordan elimination of rows [A | b].
 * `x` is the solution when the system is square and non-singular. For singular systems
 * `dependentRows` lists each original row that reduced to zero together with the original
 * rows it is a combination of, and whether its right-hand side conflicts.
 */
export interface ExactSolve {
  x: Q[] | null;
  rank: number;
  dependentRows: { row: number; combination: number[]; conflicting: boolean }[];
}

/**
 * Solve A x = b exactly (A is m × n). Rows are tracked through the elimination so a row that
 * reduces to zero can be traced back to the original rows it depends on.
 */
export function solveExact(A: Q[][], b: Q[], track = false): ExactSolve {
  const m = A.length;
  const n = m === 0 ? 0 : (A[0] as Q[]).length;
  // working rows: [coeffs (n) | rhs | tracking (m, only when asked)]
  const rows: Q[][] = A.map((r, i) => {
    if (!track) return [...r, b[i] as Q];
    const t: Q[] = new Array<Q>(m).fill(Q0);
    t[i] = Q1;
    return [...r, b[i] as Q, ...t];
  });
  const width = n + 1 + (track ? m : 0);
  const pivotCol: number[] = [];
  let r = 0;
  for (let c = 0; c < n && r < m; c++) {
    let p = -1;
    for (let i = r; i < m; i++) {
      if (!qIsZero((rows[i] as Q[])[c] as Q)) {
        p = i;
        break;
      }
    }
    if (p < 0) continue;
    if (p !== r) {
      const tmp = rows[p] as Q[];
      rows[p] = rows[r] as Q[];
      rows[r] = tmp;
    }
    const pr = rows[r] as Q[];
    const pv = pr[c] as Q;
    if (!(pv.n === 1n && pv.d === 1n)) {
      for (let k = c; k < width; k++) pr[k] = qDiv(pr[k] as Q, pv);
    }
    for (let i = 0; i < m; i++) {
      if (i === r) continue;
      const ri = rows[i] as Q[];
      const f = ri[c] as Q;
      if (qIsZero(f)) continue;
      for (let k = c; k < width; k++) {
        const pk = pr[k] as Q;
        if (!qIsZero(pk)) ri[k] = qSub(ri[k] as Q, qMul(f, pk));
      }
    }
    pivotCol.push(c);
    r++;
  }
  const rank = r;
  const dependentRows: ExactSolve["dependentRows"] = [];
  for (let i = rank; i < m && track; i++) {
    const ri = rows[i] as Q[];
    const track = ri.slice(n + 1);
    const involved: number[] = [];
    track.forEach((t, j) => {
      if (!qIsZero(t)) involved.push(j);
    });
    // the original row with the highest index among the involved ones is the "dependent" one
    const row = involved.length > 0 ? (involved[involved.length - 1] as number) : i;
    dependentRows.push({
      row,
      combination: involved.filter((j) => j !== row),
      conflicting: !qIsZero(ri[n] as Q),
    });
  }
  if (rank < n || m !== n) return { x: null, rank, dependentRows };
  const x: Q[] = new Array<Q>(n).fill(Q0);
  for (let i = 0; i < rank; i++) x[pivotCol[i] as number] = (rows[i] as Q[])[n] as Q;
  return { x, rank, dependentRows };
}

/** Exact rank of a matrix of rationals. */
export function rankExact(A: Q[][]): number {
  if (A.length === 0) return 0;
  const zeros = A.map(() => Q0);
  return solveExact(A, zeros).rank;
}
