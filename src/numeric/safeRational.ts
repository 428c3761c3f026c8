/**
 * Exact rationals held in float64 safe integers: the fast lane of the extent module's exact
 * path. Not a second rational type for the library — the exact values are the same as those of
 * src/numeric/rational.ts; this lane only avoids BigInt while every numerator and denominator
 * stays within ±(2^53 − 1), where float64 integer arithmetic is exact.
 *
 * Every operation checks that each intermediate product and sum is a safe integer (a result
 * outside that range cannot round back inside it, so the check is sound) and otherwise throws
 * {@link SafeOverflow}; the caller then redoes the whole job with BigInt rationals. Values are
 * kept reduced (gcd 1, denominator > 0), so the converted double `n / d` is the correctly
 * rounded value of the exact rational — the same double `rationalToNumber` gives.
 * Not re-exported.
 *
 * @module
 * @internal
 */
import type { Rational } from "./rational.js";

/** An exact rational n/d in safe integers, reduced, d > 0. */
export interface SafeQ {
  readonly n: number;
  readonly d: number;
}

/** Thrown when a value leaves the safe-integer range; the caller falls back to BigInt. */
export class SafeOverflow extends Error {
  constructor() {
    super("safe-integer range exceeded");
  }
}
const OVERFLOW = /* @__PURE__ */ new SafeOverflow();

export const S0: SafeQ = { n: 0, d: 1 };
export const S1: SafeQ = { n: 1, d: 1 };

export function gcdNumber(a: number, b: number): number {
  if (a < 0) a = -a;
  if (b < 0) b = -b;
  if (a <= 0x7fffffff && b <= 0x7fffffff) {
    // int32 remainders are much cheaper than float64 ones
    let x = a | 0;
    let y = b | 0;
    while (y !== 0) {
      const t = x % y;
      x = y;
      y = t;
    }
    return x;
  }
  while (b !== 0) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

function checked(v: number): number {
  if (!Number.isSafeInteger(v)) throw OVERFLOW;
  return v;
}

/** n/d reduced (d ≠ 0; both safe integers). */
export function sq(n: number, d: number): SafeQ {
  if (n === 0) return S0;
  if (d < 0) {
    n = -n;
    d = -d;
  }
  if (d === 1) return { n, d };
  const g = gcdNumber(n, d);
  return g === 1 ? { n, d } : { n: n / g, d: d / g };
}

const DEC_RE = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/;
const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/** The exact value of the shortest decimal text of a finite double (as `rationalFromNumber`). */
export function sqFromNumber(x: number): SafeQ {
  if (Number.isInteger(x)) return x === 0 ? S0 : { n: checked(x), d: 1 };
  // Fast route without String(x): the decimal c·10^-k with the fewest fraction digits k that
  // rounds to x. With |c| < 10^15 (≤ 15 significant digits) such a decimal is the only one of
  // ≤ 15 digits that rounds to x (DBL_DIG = 15), so it is the shortest text String(x) gives;
  // and x·10^k is within 1/4 of c, so Math.round finds it.
  for (let k = 1; k < POW10.length; k++) {
    const p = POW10[k] as number;
    const c = Math.round(x * p);
    if (c >= 1e15 || c <= -1e15) break;
    if (c / p === x) return sq(c, p);
  }
  const m = DEC_RE.exec(String(x));
  if (m === null) throw OVERFLOW;
  const frac = m[3] ?? "";
  const digits = checked(Number((m[2] as string) + frac));
  const scale = (m[4] === undefined ? 0 : Number(m[4])) - frac.length;
  const signed = m[1] === "-" ? -digits : digits;
  if (scale >= 0) {
    if (scale >= POW10.length) throw OVERFLOW;
    return { n: checked(signed * (POW10[scale] as number)), d: 1 };
  }
  if (-scale >= POW10.length) throw OVERFLOW;
  return sq(signed, POW10[-scale] as number);
}

/** A BigInt rational in the safe lane. */
export function sqFromRational(r: Rational): SafeQ {
  const n = Number(r.num);
  const d = Number(r.den);
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d)) throw OVERFLOW;
  return n === 0 ? S0 : { n, d };
}

export function sqAdd(a: SafeQ, b: SafeQ): SafeQ {
  if (a.n === 0) return b;
  if (b.n === 0) return a;
  if (a.d === 1 && b.d === 1) return sq(checked(a.n + b.n), 1);
  const g = gcdNumber(a.d, b.d);
  const bd = b.d / g;
  const ad = a.d / g;
  return sq(checked(checked(a.n * bd) + checked(b.n * ad)), checked(a.d * bd));
}

export function sqNeg(a: SafeQ): SafeQ {
  return a.n === 0 ? S0 : { n: -a.n, d: a.d };
}

export function sqSub(a: SafeQ, b: SafeQ): SafeQ {
  return sqAdd(a, sqNeg(b));
}

export function sqMul(a: SafeQ, b: SafeQ): SafeQ {
  if (a.n === 0 || b.n === 0) return S0;
  if (a.d === 1 && b.d === 1) return { n: checked(a.n * b.n), d: 1 };
  const g1 = gcdNumber(a.n, b.d);
  const g2 = gcdNumber(b.n, a.d);
  return { n: checked((a.n / g1) * (b.n / g2)), d: checked((a.d / g2) * (b.d / g1)) };
}

/** a / b for b ≠ 0. */
export function sqDiv(a: SafeQ, b: SafeQ): SafeQ {
  if (b.n === 0) throw new RangeError("division by zero");
  return sqMul(a, b.n < 0 ? { n: -b.d, d: -b.n } : { n: b.d, d: b.n });
}

/** Correctly rounded double (both parts are exact doubles, so one division rounds once). */
export function sqToNumber(a: SafeQ): number {
  return a.n === 0 ? 0 : a.n / a.d;
}
