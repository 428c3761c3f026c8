/**
 * Exact integer arithmetic in floating-point expansions (private engine of the extent module's
 * wide exact lane; not re-exported).
 *
 * An expansion holds a number exactly as an unevaluated sum of doubles whose bits do not overlap,
 * smallest magnitude first, with no zero components (zero is the empty list). Sums and products of
 * doubles are exact in this form (two-sum, two-product), so integers far beyond 2^53 are added and
 * multiplied without BigInt and without rounding (J. R. Shewchuk, "Adaptive precision
 * floating-point arithmetic and fast robust geometric predicates", Discrete Comput. Geom. 18 (1997),
 * 305–363: GROW-EXPANSION, SCALE-EXPANSION, COMPRESS). A quotient of two expansions is rounded once,
 * correctly, by {@link expansionQuotient}.
 *
 * The algorithms are exact while nothing overflows or underflows. Callers hold integers (every
 * component is then an integer: the rounding errors of sums and products of integers are integers)
 * with magnitudes below {@link EXPANSION_LIMIT}, far from both ends of the double range.
 *
 * @module
 * @internal
 */
import { rationalToNumber, type Rational } from "./rational.js";

/** Largest magnitude of a component the callers keep (2^900): products and splits stay finite. */
export const EXPANSION_LIMIT = 2 ** 900;

/** Veltkamp's splitter, 2^27 + 1: splits a double into two halves of at most 26 significant bits. */
const SPLITTER = 134217729;

/** x + y = a + b exactly, x = fl(a + b) (Knuth's two-sum); returns y. */
function twoSumTail(a: number, b: number, x: number): number {
  const bv = x - a;
  const av = x - bv;
  return a - av + (b - bv);
}

/** x·y = a·b exactly, x = fl(a·b) (Dekker's two-product with Veltkamp's split); returns y. */
function twoProductTail(a: number, b: number, x: number): number {
  let c = SPLITTER * a;
  const ahi = c - (c - a);
  const alo = a - ahi;
  c = SPLITTER * b;
  const bhi = c - (c - b);
  const blo = b - bhi;
  return alo * blo - (x - ahi * bhi - alo * bhi - ahi * blo);
}

/** The expansion of one double (0 gives the empty expansion). */
export function expansionOf(x: number): number[] {
  return x === 0 ? [] : [x];
}

/** e + b, exact (GROW-EXPANSION with zero elimination). */
export function growExpansion(e: readonly number[], b: number): number[] {
  const h: number[] = [];
  let q = b;
  for (let i = 0; i < e.length; i++) {
    const enow = e[i] as number;
    const sum = q + enow;
    const hh = twoSumTail(q, enow, sum);
    if (hh !== 0) h.push(hh);
    q = sum;
  }
  if (q !== 0) h.push(q);
  return h;
}

/** e + f, exact (each component of the shorter one grown into the other). */
export function addExpansions(e: readonly number[], f: readonly number[]): number[] {
  if (e.length < f.length) [e, f] = [f, e];
  if (f.length === 0) return e.slice();
  let h = growExpansion(e, f[0] as number);
  for (let i = 1; i < f.length; i++) h = growExpansion(h, f[i] as number);
  return h;
}

/** −e. */
export function negateExpansion(e: readonly number[]): number[] {
  const h = new Array<number>(e.length);
  for (let i = 0; i < e.length; i++) h[i] = -(e[i] as number);
  return h;
}

/** e·b for a double b, exact (SCALE-EXPANSION with zero elimination). */
export function scaleExpansion(e: readonly number[], b: number): number[] {
  const h: number[] = [];
  if (e.length === 0 || b === 0) return h;
  const e0 = e[0] as number;
  let q = e0 * b;
  let hh = twoProductTail(e0, b, q);
  if (hh !== 0) h.push(hh);
  for (let i = 1; i < e.length; i++) {
    const enow = e[i] as number;
    const p1 = enow * b;
    const p0 = twoProductTail(enow, b, p1);
    const sum = q + p0;
    hh = twoSumTail(q, p0, sum);
    if (hh !== 0) h.push(hh);
    q = p1 + sum; // fast two-sum: |p1| ≥ |sum|
    hh = sum - (q - p1);
    if (hh !== 0) h.push(hh);
  }
  if (q !== 0) h.push(q);
  return h;
}

/** Scratch of {@link linearCombination} (grown on demand; the function never re-enters). */
let ACC = /* @__PURE__ */ new Float64Array(64);

/** Grow the expansion ACC[0 … n) by b in place (GROW-EXPANSION writes behind where it reads); returns the new length. */
function growInPlace(n: number, b: number): number {
  if (n + 1 > ACC.length) {
    const bigger = new Float64Array(2 * ACC.length);
    bigger.set(ACC);
    ACC = bigger;
  }
  const h = ACC;
  let q = b;
  let w = 0;
  for (let i = 0; i < n; i++) {
    const enow = h[i] as number;
    const sum = q + enow;
    const hh = twoSumTail(q, enow, sum);
    if (hh !== 0) h[w++] = hh;
    q = sum;
  }
  if (q !== 0) h[w++] = q;
  return w;
}

/**
 * Σᵢ cᵢ·eᵢ[ᵢ] exactly (a linear combination of expansions with double coefficients), compressed.
 * `pick` selects which expansions the coefficients go with (`es[pick[i]]`; null: `es[i]`); every product
 * component is grown into one running expansion kept in a scratch buffer, so only the result is
 * allocated. `extra`, when given, is added as it is.
 */
export function linearCombination(
  es: readonly (readonly number[])[],
  pick: readonly number[] | null,
  cs: readonly number[],
  extra: readonly number[] | null = null,
): number[] {
  let n = 0;
  if (extra !== null) for (let i = 0; i < extra.length; i++) n = growInPlace(n, extra[i] as number);
  const count = pick === null ? es.length : pick.length;
  for (let k = 0; k < count; k++) {
    const e = es[pick === null ? k : (pick[k] as number)] as readonly number[];
    const c = cs[k] as number;
    if (c === 0) continue;
    n = growScaled(n, e, c);
    if (n > 24) n = compressInPlace(n);
  }
  LAST_LENGTH = n;
  return compressRange(ACC, n);
}

/**
 * Both Σᵢ cᵢ·eᵢ (as {@link linearCombination}, without `extra`) and that sum plus c·e, exactly and
 * compressed, from one pass: the second result continues the first in the scratch buffer.
 */
export function linearCombinationAndMore(
  es: readonly (readonly number[])[],
  pick: readonly number[] | null,
  cs: readonly number[],
  e: readonly number[],
  c: number,
): [number[], number[]] {
  const sum = linearCombination(es, pick, cs);
  const n = growScaled(LAST_LENGTH, e, c);
  return [sum, compressRange(ACC, n)];
}

/** Add c·e exactly to the first n components of the scratch buffer; returns the new length. */
function growScaled(n: number, e: readonly number[], c: number): number {
  for (let i = 0; i < e.length; i++) {
    const x = e[i] as number;
    const p = x * c;
    const t = twoProductTail(x, c, p);
    if (t !== 0) n = growInPlace(n, t);
    n = growInPlace(n, p);
  }
  return n;
}

/** Length of the running expansion the last {@link linearCombination} left in the scratch buffer. */
let LAST_LENGTH = 0;

/** COMPRESS of ACC[0 … n) back into ACC; returns the new length. */
function compressInPlace(n: number): number {
  const c = compressRange(ACC, n);
  ACC.set(c);
  return c.length;
}

/** e·f, exact and compressed. */
export function multiplyExpansions(e: readonly number[], f: readonly number[]): number[] {
  if (e.length < f.length) [e, f] = [f, e];
  if (f.length === 0) return [];
  let h = scaleExpansion(e, f[0] as number);
  for (let i = 1; i < f.length; i++) h = addExpansions(h, scaleExpansion(e, f[i] as number));
  return compressExpansion(h);
}

/**
 * The same value in as few components as COMPRESS gives (Shewchuk): nonadjacent components,
 * the largest within an ulp of the whole, and a short list (a value below 2^106 that a pair of
 * doubles can hold usually ends in two components or fewer).
 */
export function compressExpansion(e: readonly number[]): number[] {
  return compressRange(e, e.length);
}

/** {@link compressExpansion} of the first n components of an array-like. */
function compressRange(e: ArrayLike<number>, n: number): number[] {
  if (n <= 1) return n === 0 ? [] : [e[0] as number];
  const g = new Array<number>(n);
  let bottom = n - 1;
  let q = e[bottom] as number;
  for (let i = n - 2; i >= 0; i--) {
    const enow = e[i] as number;
    const qnew = q + enow; // fast two-sum: |q| ≥ |enow| holds along a nonoverlapping expansion
    const qq = enow - (qnew - q);
    if (qq !== 0) {
      g[bottom--] = qnew;
      q = qq;
    } else q = qnew;
  }
  const h: number[] = [];
  for (let i = bottom + 1; i < n; i++) {
    const hnow = g[i] as number;
    const qnew = hnow + q;
    const qq = q - (qnew - hnow);
    if (qq !== 0) h.push(qq);
    q = qnew;
  }
  if (q !== 0) h.push(q);
  return h;
}

/** Sign of an expansion: the sign of its largest component (−1, 0 or 1). */
export function expansionSign(e: readonly number[]): number {
  return e.length === 0 ? 0 : (e[e.length - 1] as number) < 0 ? -1 : 1;
}

/** The exact integer an expansion of integer components holds. */
export function expansionToBigInt(e: readonly number[]): bigint {
  let s = 0n;
  for (let i = 0; i < e.length; i++) s += BigInt(e[i] as number);
  return s;
}

/** The integer given as decimal digits (ASCII, no sign), exactly. */
export function expansionFromDigits(digits: string): number[] {
  let h: number[] = [];
  let i = 0;
  while (i < digits.length) {
    const take = Math.min(15, digits.length - i);
    const chunk = Number(digits.slice(i, i + take));
    h = h.length === 0 ? expansionOf(chunk) : growExpansion(scaleExpansion(h, POW10[take] as number), chunk);
    i += take;
  }
  return compressExpansion(h);
}

/** 10^k for k = 0 … 22, each exact as a double. */
const POW10: readonly number[] = /* @__PURE__ */ Array.from({ length: 23 }, (_, k) => 10 ** k);

/**
 * e·10^k for k ≥ 0, exact: by powers of 5 (exact doubles up to 5^22) and one power of two. For
 * k = 0 the result is e itself (expansions are never written to once built).
 */
export function scaleByPowerOfTen(e: readonly number[], k: number): number[] {
  if (k === 0 || e.length === 0) return e as number[];
  let h = e as number[];
  let left = k;
  while (left > 0) {
    const step = Math.min(22, left);
    h = scaleExpansion(h, 5 ** step);
    left -= step;
  }
  const two = 2 ** k;
  const out = new Array<number>(h.length);
  for (let i = 0; i < h.length; i++) out[i] = (h[i] as number) * two;
  return compressExpansion(out);
}

/**
 * The value of a finite double's shortest decimal text (what `String(x)` prints, and what
 * `rationalFromNumber` reads) as `digits · 10^−exponent` with an integer expansion `digits` and
 * `exponent ≥ 0`. Null when the exponent would exceed `maxExponent` or the digits the expansion limit.
 * `places`, when the caller already has it, is {@link shortDecimalPlaces}(x).
 */
export function decimalOfNumber(
  x: number,
  maxExponent: number,
  places?: number,
): { readonly digits: number[]; readonly exponent: number } | null {
  if (Number.isSafeInteger(x)) return { digits: expansionOf(x === 0 ? 0 : x), exponent: 0 };
  // a typed decimal (few places) without the text; anything else from the text, which decides every case
  const k = places ?? shortDecimalPlaces(x, 8);
  if (k > 0) return k <= maxExponent ? { digits: expansionOf(Math.round(x * (POW10[k] as number))), exponent: k } : null;
  return decimalOfText(String(x), maxExponent);
}

/**
 * The number of decimal places k (1 … 15) of a double whose shortest decimal has at most 15
 * significant digits and is not an integer; 0 otherwise. Such a decimal c·10^−k (|c| < 10^15) is the
 * only one of at most 15 significant digits that rounds to x (DBL_DIG = 15), so it is the text
 * String(x) gives; the one with the fewest places is found as the first k with
 * fl(round(x·10^k)/10^k) = x, since x·10^k is within 1/4 of c (the reasoning of sqFromNumber in
 * safeRational.ts). Values with float round-off (0.30000000000000004) give 0, and so does a decimal
 * with more than `maxPlaces` places.
 */
export function shortDecimalPlaces(x: number, maxPlaces = 15): number {
  for (let k = 1; k <= maxPlaces; k++) {
    const p = POW10[k] as number;
    const c = Math.round(x * p);
    if (c >= 1e15 || c <= -1e15) return 0;
    if (c / p === x) return k;
  }
  return 0;
}

/** {@link decimalOfNumber} from the number's text: digits read in two exact chunks, no intermediate strings. */
function decimalOfText(text: string, maxExponent: number): { readonly digits: number[]; readonly exponent: number } | null {
  let i = 0;
  const negative = text.charCodeAt(0) === 45;
  if (negative) i++;
  let hi = 0; // the first 15 significant digits
  let lo = 0; // the next ones (at most 15)
  let loDigits = 0;
  let significant = 0;
  let fraction = 0;
  let seenPoint = false;
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 46) {
      seenPoint = true;
      continue;
    }
    if (c < 48 || c > 57) break;
    if (seenPoint) fraction++;
    if (significant === 0 && c === 48) continue; // a leading zero
    if (significant < 15) hi = hi * 10 + (c - 48);
    else if (significant < 30) {
      lo = lo * 10 + (c - 48);
      loDigits++;
    } else return null;
    significant++;
  }
  let exponent = fraction;
  if (i < text.length) {
    // "e+21", "e-7"
    const e = Number(text.slice(i + 1));
    if (!Number.isInteger(e)) return null;
    exponent -= e;
  }
  let d: number[];
  if (loDigits === 0) d = expansionOf(hi);
  else {
    // hi·10^m + lo: the product exactly as p + t, then lo grown in
    const m = POW10[loDigits] as number;
    const p = hi * m;
    const t = twoProductTail(hi, m, p);
    d = growExpansion(t === 0 ? [p] : [t, p], lo);
  }
  if (exponent < 0) {
    if (-exponent > 300) return null;
    d = scaleByPowerOfTen(d, -exponent);
    exponent = 0;
  }
  if (exponent > maxExponent) return null;
  if (d.length > 0 && Math.abs(d[d.length - 1] as number) > EXPANSION_LIMIT) return null;
  return { digits: negative ? negateExpansion(d) : d, exponent };
}

/**
 * n/d correctly rounded to the nearest double (ties to even), for integer expansions n and d ≠ 0.
 *
 * Fast route, for n and d held in at most two components each (≈ 106 bits) with a quotient far
 * from both ends of the double range: q = fl(n₁/d₁) from the leading components, then the exact
 * residual n − q·d as a short sum of doubles — n₁ − fl(q·d₁) is exact (Sterbenz), the products'
 * rounding errors are exact (two-product) — summed in float64 with an error below 2⁻⁹⁸·q after
 * the division by d₁. The quotient lies within half an ulp of q exactly when that residual over d
 * lies between the half-ulps below and above q; a residual outside moves q by one ulp and is
 * recomputed. A residual within 2⁻⁹⁰·q of a half-ulp (a near tie) cannot be decided this way and
 * goes to the BigInt route, as does every longer or out-of-range case: exact, correctly rounded
 * BigInt division (`rationalToNumber`).
 */
export function expansionQuotient(n: readonly number[], d: readonly number[]): number {
  const sn = expansionSign(n);
  if (sn === 0) return 0;
  const sd = expansionSign(d);
  if (n.length <= 2 && d.length <= 2 && sd !== 0) {
    const fast = quotientOfPairs(n, d, sn, sd);
    if (fast !== null) return fast;
  }
  return slowQuotient(n, d);
}

/** The BigInt route of {@link expansionQuotient}. */
function slowQuotient(n: readonly number[], d: readonly number[]): number {
  let num = expansionToBigInt(n);
  let den = expansionToBigInt(d);
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  return rationalToNumber({ num, den } as Rational);
}

/** A double and its two 32-bit words (for the exponent of a quotient without a logarithm). */
const BITS = /* @__PURE__ */ new Float64Array(1);
const WORDS = /* @__PURE__ */ new Uint32Array(BITS.buffer);
/** Index of the word holding sign and exponent: 1 on little-endian platforms. */
const HIGH = /* @__PURE__ */ highWordIndex();

function highWordIndex(): number {
  const f = new Float64Array([1]);
  return new Uint32Array(f.buffer)[1] === 0x3ff00000 ? 1 : 0;
}

/** Smallest and largest quotient magnitude of the fast route: normal doubles with room for every product. */
const FAST_MIN = 2 ** -800;
const FAST_MAX = 2 ** 800;
/** Relative margin around a half-ulp inside which the fast route gives up. */
const TIE_MARGIN = 2 ** -90;

function quotientOfPairs(n: readonly number[], d: readonly number[], sn: number, sd: number): number | null {
  // |n| = nh + nl and |d| = dh + dl with nh, dh > 0 (the smaller components may have either sign)
  const nh = sn * (n[n.length - 1] as number);
  const nl = n.length === 2 ? sn * (n[0] as number) : 0;
  const dh = sd * (d[d.length - 1] as number);
  const dl = d.length === 2 ? sd * (d[0] as number) : 0;
  const negative = sn !== sd;
  if (!(nh <= FAST_MAX && dh <= FAST_MAX)) return null;
  let q = nh / dh;
  for (let round = 0; round < 4; round++) {
    if (!(q >= FAST_MIN && q <= FAST_MAX)) return null;
    // ulps above and below q, from its exponent bits
    BITS[0] = q;
    const high = WORDS[HIGH] as number;
    const biased = (high >>> 20) & 0x7ff;
    WORDS[HIGH] = (biased - 52) << 20;
    WORDS[1 - HIGH] = 0;
    const up = BITS[0] as number;
    BITS[0] = q;
    const down = (high & 0xfffff) === 0 && WORDS[1 - HIGH] === 0 ? up / 2 : up;
    // residual n − q·d from exact pieces
    const p1 = q * dh;
    const e1 = twoProductTail(q, dh, p1);
    const p2 = q * dl;
    const e2 = twoProductTail(q, dl, p2);
    const r = nh - p1 - e1 + (nl - p2) - e2;
    const rho = r / dh; // (n − q·d)/d within 2^-98·q
    const margin = TIE_MARGIN * q;
    if (rho > up / 2 + margin) q += up;
    else if (rho < -down / 2 - margin) q -= down;
    else if (rho < up / 2 - margin && rho > -down / 2 + margin) return negative ? -q : q;
    else return null; // a near tie
  }
  return null;
}
