/**
 * Exact rational numbers on BigInt, and integer-vector helpers.
 *
 * Stoichiometric coefficients, element counts such as 0.947 in `Fe0.947O` and Hess
 * multipliers must stay exact: 1/3 + 1/3 + 1/3 is 1, not 0.9999999999999999. A
 * {@link Rational} is a frozen pair of BigInts `num/den`, always normalised (den > 0,
 * gcd(num, den) = 1, zero is 0/1), so two equal values have equal fields.
 *
 * Numbers are turned into rationals from their shortest decimal text (`String(x)`), never
 * from the binary double: `rationalFromNumber(0.1)` is exactly 1/10.
 *
 * Every rational built by these functions is JSON-safe: `JSON.stringify` writes it as its
 * text (`"25/2"`, `"-3"`) through a `toJSON` method on its prototype (not an own property,
 * so `Object.keys` still gives `num`, `den`). Plain BigInts (from {@link gcdBigInt},
 * {@link scaleToCoprimeIntegers}...) are JSON-safe through {@link jsonReplacer}.
 *
 * @module
 */
import { RxthermError, describeValue, requireArray } from "../errors.js";

/**
 * An exact rational number `num/den`, normalised: `den > 0n`, `gcd(|num|, den) = 1n`, and
 * zero is `0n/1n`. Build one with {@link rational}, {@link rationalFromInteger},
 * {@link rationalFromDecimalString} or {@link rationalFromNumber}; never build the object by hand
 * unless it is already normalised.
 *
 * @category Numeric
 */
export interface Rational {
  /** Numerator (carries the sign). */
  readonly num: bigint;
  /** Denominator, always positive. */
  readonly den: bigint;
}

/**
 * Values that {@link rationalFrom} accepts. A rational may also come back from JSON with plain
 * numbers or integer text for its parts (`{ num: 25, den: 2 }`, `{ num: "25", den: "2" }`): the
 * parts are converted exactly when they are integers, otherwise the value is rejected.
 *
 * @category Numeric
 */
export type RationalLike =
  | Rational
  | { readonly num: bigint | number | string; readonly den: bigint | number | string }
  | bigint
  | number
  | string;

/**
 * Greatest common divisor of two BigInts (always ≥ 0; gcd(0, 0) = 0).
 *
 * Euclid's algorithm; cost O(log min(|a|, |b|)) divisions.
 *
 * @param a - an integer
 * @param b - an integer
 * @returns gcd(|a|, |b|)
 * @example
 * gcdBigInt(12n, -18n) // => 6n
 * @category Numeric
 * @see Euclid, Elements VII.2 (the Euclidean algorithm)
 */
export function gcdBigInt(a: bigint, b: bigint): bigint {
  // The one guard against the endless loop of a number or undefined reaching Euclid's loop
  // (0 % 0 is NaN, and NaN !== 0n for ever): only BigInts go in.
  if (typeof a !== "bigint" || typeof b !== "bigint") {
    throw new RxthermError("INVALID_ARGUMENT", "gcdBigInt requires two bigint integers", {
      a: describeValue(a),
      b: describeValue(b),
    });
  }
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/**
 * Least common multiple of two BigInts (always ≥ 0; lcm with 0 is 0).
 *
 * @param a - an integer
 * @param b - an integer
 * @returns lcm(|a|, |b|) = |a·b| / gcd(a, b)
 * @example
 * lcmBigInt(4n, 6n) // => 12n
 * @category Numeric
 */
export function lcmBigInt(a: bigint, b: bigint): bigint {
  if (a === 0n || b === 0n) return 0n;
  const g = gcdBigInt(a, b);
  const r = (a / g) * b;
  return r < 0n ? -r : r;
}

/**
 * Build a normalised rational `num/den`.
 *
 * @param num - numerator (an integer: bigint, or a safe-integer number)
 * @param den - denominator (non-zero integer)
 * @returns the reduced fraction with a positive denominator
 * @throws RxthermError `INVALID_ARGUMENT` when `den` is 0 or an argument is not an integer
 *   (details: `num`, `den`)
 * @example
 * rational(6n, -4n) // => { num: -3n, den: 2n }
 * @category Numeric
 */
export function rational(num: bigint | number, den: bigint | number = 1n): Rational {
  const n = toBigIntStrict(num, "num");
  const d = toBigIntStrict(den, "den");
  if (d === 0n) {
    throw new RxthermError("INVALID_ARGUMENT", "rational requires a non-zero denominator", { num: String(num), den: String(den) });
  }
  return normalise(n, d);
}

/**
 * An integer as a rational (`n/1`).
 *
 * @param n - an integer (bigint or safe-integer number)
 * @returns `n/1`
 * @throws RxthermError `INVALID_ARGUMENT` when `n` is not an integer (details: `value`)
 * @example
 * rationalFromInteger(7) // => { num: 7n, den: 1n }
 * @category Numeric
 */
export function rationalFromInteger(n: bigint | number): Rational {
  return Object.freeze(new ExactRational(toBigIntStrict(n, "value"), 1n));
}

/**
 * Read a rational exactly from text: an integer (`"-3"`), a fraction (`"13/2"`), a decimal
 * (`"6.5"`, `"-0.947"`, `".5"`) or exponent notation (`"1e-3"`, `"2.5E+2"`).
 *
 * Decimal text is read digit by digit, so `"0.1"` is exactly 1/10. Surrounding whitespace is
 * ignored; a fraction may carry a sign only on its numerator.
 *
 * @param text - the number as text
 * @returns the exact, normalised value
 * @throws RxthermError `INVALID_ARGUMENT` when the text is not a number of one of these forms,
 *   or a fraction has a zero denominator (details: `text`)
 * @example
 * rationalToString(rationalFromDecimalString("6.5")) // => "13/2"
 * @category Numeric
 */
export function rationalFromDecimalString(text: string): Rational {
  if (typeof text !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `rationalFromDecimalString requires text, got ${describeValue(text)}`, { text: describeValue(text) });
  }
  const t = text.trim();
  const frac = FRACTION_RE.exec(t);
  if (frac) {
    const num = BigInt(frac[1] as string);
    const den = BigInt(frac[2] as string);
    if (den === 0n) {
      throw new RxthermError("INVALID_ARGUMENT", `rationalFromDecimalString requires a non-zero denominator, got "${text}"`, { text });
    }
    return normalise(num, den);
  }
  const dec = DECIMAL_RE.exec(t);
  if (!dec || (dec[2] ?? "") + (dec[3] ?? "") === "") {
    throw new RxthermError("INVALID_ARGUMENT", `rationalFromDecimalString requires an integer, fraction or decimal, got "${text}"`, { text });
  }
  const sign = dec[1] === "-" ? -1n : 1n;
  const intPart = dec[2] ?? "";
  const fracPart = dec[3] ?? "";
  const exp = dec[4] === undefined ? 0 : Number(dec[4]);
  if (!Number.isSafeInteger(exp) || Math.abs(exp) > MAX_EXPONENT) {
    throw new RxthermError("INVALID_ARGUMENT", `rationalFromDecimalString requires an exponent within ±${MAX_EXPONENT}, got "${text}"`, { text });
  }
  const digits = BigInt((intPart + fracPart) || "0");
  const scale = exp - fracPart.length;
  if (scale >= 0) return normalise(sign * digits * 10n ** BigInt(scale), 1n);
  return normalise(sign * digits, 10n ** BigInt(-scale));
}

/**
 * A finite double as a rational, read from its shortest decimal text (`String(x)`), so the
 * result is the decimal a person typed: `0.947` becomes 947/1000, not the binary double's
 * 0.94699999999999995292...
 *
 * @param x - a finite number
 * @returns the exact rational of `String(x)`
 * @throws RxthermError `INVALID_ARGUMENT` when `x` is NaN or infinite (details: `value`)
 * @example
 * rationalToString(rationalFromNumber(0.947)) // => "947/1000"
 * @category Numeric
 */
export function rationalFromNumber(x: number): Rational {
  if (typeof x !== "number" || !Number.isFinite(x)) {
    throw new RxthermError("INVALID_ARGUMENT", `rationalFromNumber requires a finite number, got ${describeValue(x)}`, { value: typeof x === "number" ? x : describeValue(x) });
  }
  if (Number.isSafeInteger(x)) return Object.freeze(new ExactRational(BigInt(x), 1n));
  return rationalFromDecimalString(String(x));
}

/**
 * Convert a {@link RationalLike} (rational, bigint, number or text) to a {@link Rational}.
 *
 * @param value - a rational, an integer bigint, a finite number (read from its shortest
 *   decimal text) or text accepted by {@link rationalFromDecimalString}
 * @returns the exact value
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite number or malformed text
 * @example
 * rationalToString(rationalFrom("13/2")) // => "13/2"
 * @category Numeric
 */
export function rationalFrom(value: RationalLike): Rational {
  if (typeof value === "bigint") return Object.freeze(new ExactRational(value, 1n));
  if (typeof value === "number") return rationalFromNumber(value);
  if (typeof value === "string") return rationalFromDecimalString(value);
  if (typeof value === "object" && value !== null) {
    const num = integerPart(value.num, "num");
    const den = integerPart(value.den, "den");
    if (den === 0n) {
      throw new RxthermError("INVALID_ARGUMENT", "rationalFrom requires a non-zero denominator", { num: String(num), den: "0" });
    }
    return normalise(num, den);
  }
  throw new RxthermError("INVALID_ARGUMENT", `rationalFrom requires a rational, bigint, number or text, got ${describeValue(value)}`, {
    value: describeValue(value),
  });
}

/**
 * Sum `a + b`, exact.
 *
 * @param a - first term
 * @param b - second term
 * @returns the normalised sum
 * @example
 * rationalToString(rationalAdd(rational(1n, 3n), rational(1n, 6n))) // => "1/2"
 * @category Numeric
 */
export function rationalAdd(a: Rational, b: Rational): Rational {
  checkRational(a, "rationalAdd", "a");
  checkRational(b, "rationalAdd", "b");
  if (a.den === 1n && b.den === 1n) return Object.freeze(new ExactRational(a.num + b.num, 1n));
  return normalise(a.num * b.den + b.num * a.den, a.den * b.den);
}

/**
 * Difference `a − b`, exact.
 *
 * @param a - minuend
 * @param b - subtrahend
 * @returns the normalised difference
 * @example
 * rationalToString(rationalSub(rational(1n, 2n), rational(1n, 3n))) // => "1/6"
 * @category Numeric
 */
export function rationalSub(a: Rational, b: Rational): Rational {
  checkRational(a, "rationalSub", "a");
  checkRational(b, "rationalSub", "b");
  if (a.den === 1n && b.den === 1n) return Object.freeze(new ExactRational(a.num - b.num, 1n));
  return normalise(a.num * b.den - b.num * a.den, a.den * b.den);
}

/**
 * Product `a · b`, exact.
 *
 * @param a - first factor
 * @param b - second factor
 * @returns the normalised product
 * @example
 * rationalToString(rationalMul(rational(2n, 3n), rational(9n, 4n))) // => "3/2"
 * @category Numeric
 */
export function rationalMul(a: Rational, b: Rational): Rational {
  checkRational(a, "rationalMul", "a");
  checkRational(b, "rationalMul", "b");
  if (a.den === 1n && b.den === 1n) return Object.freeze(new ExactRational(a.num * b.num, 1n));
  return normalise(a.num * b.num, a.den * b.den);
}

/**
 * Quotient `a / b`, exact.
 *
 * @param a - dividend
 * @param b - divisor (non-zero)
 * @returns the normalised quotient
 * @throws RxthermError `INVALID_ARGUMENT` when `b` is zero (details: `dividend`)
 * @example
 * rationalToString(rationalDiv(rational(3n), rational(4n))) // => "3/4"
 * @category Numeric
 */
export function rationalDiv(a: Rational, b: Rational): Rational {
  checkRational(a, "rationalDiv", "a");
  checkRational(b, "rationalDiv", "b");
  if (b.num === 0n) {
    throw new RxthermError("INVALID_ARGUMENT", "rationalDiv requires a non-zero divisor", { dividend: rationalToString(a) });
  }
  return normalise(a.num * b.den, a.den * b.num);
}

/**
 * Negation `−a`.
 *
 * @param a - a rational
 * @returns `−a`
 * @example
 * rationalToString(rationalNeg(rational(13n, 2n))) // => "-13/2"
 * @category Numeric
 */
export function rationalNeg(a: Rational): Rational {
  checkRational(a, "rationalNeg", "a");
  return Object.freeze(new ExactRational(a.num === 0n ? 0n : -a.num, a.den));
}

/**
 * Three-way comparison of two rationals, usable as an `Array.prototype.sort` comparator.
 *
 * @param a - left value
 * @param b - right value
 * @returns −1 when a < b, 0 when equal, 1 when a > b
 * @example
 * rationalCompare(rational(1n, 3n), rational(1n, 2n)) // => -1
 * @category Numeric
 */
export function rationalCompare(a: Rational, b: Rational): -1 | 0 | 1 {
  checkRational(a, "rationalCompare", "a");
  checkRational(b, "rationalCompare", "b");
  const l = a.num * b.den;
  const r = b.num * a.den;
  return l < r ? -1 : l > r ? 1 : 0;
}

/**
 * True when the value is exactly zero.
 *
 * @param a - a normalised rational
 * @returns `a === 0`
 * @example
 * rationalIsZero(rationalSub(rational(1n, 3n), rational(2n, 6n))) // => true
 * @category Numeric
 */
export function rationalIsZero(a: Rational): boolean {
  checkRational(a, "rationalIsZero", "a");
  return a.num === 0n;
}

/**
 * The nearest double to the rational (correctly rounded for numerator and denominator up to
 * 2^53; larger values are scaled first so no precision is lost to overflow).
 *
 * @param a - a rational
 * @returns the value as a number (−0 is returned as 0)
 * @example
 * rationalToNumber(rational(13n, 2n)) // => 6.5
 * @category Numeric
 */
export function rationalToNumber(a: Rational): number {
  checkRational(a, "rationalToNumber", "a");
  const { num, den } = a;
  if (num === 0n) return 0;
  if (den === 1n) return Number(num);
  const an = num < 0n ? -num : num;
  if (an <= SAFE && den <= SAFE) return Number(num) / Number(den);
  return num < 0n ? -roundedQuotient(an, den) : roundedQuotient(an, den);
}

/**
 * Text of a rational: `"13/2"`, `"-3"`, `"0"` (no denominator when it is 1).
 *
 * @param a - a rational
 * @returns `num/den`, or `num` for an integer
 * @example
 * rationalToString(rational(-26n, 4n)) // => "-13/2"
 * @category Numeric
 */
export function rationalToString(a: Rational): string {
  checkRational(a, "rationalToString", "a");
  return a.den === 1n ? a.num.toString() : `${a.num}/${a.den}`;
}

/**
 * Scale a vector of rationals to the smallest integer vector with the same direction:
 * multiply by the lcm of the denominators, then divide by the gcd of the numerators. The
 * signs are kept; a zero vector stays zero.
 *
 * This is how a null-space vector becomes the smallest whole-number stoichiometric
 * coefficients (e.g. 1, 25/2, 8, 9 → 2, 25, 16, 18).
 *
 * @param values - rationals (or anything {@link rationalFrom} accepts)
 * @returns coprime integers (gcd of the entries is 1 unless all are 0)
 * @example
 * scaleToCoprimeIntegers(["1", "25/2", "8", "9"]) // => [2n, 25n, 16n, 18n]
 * @category Numeric
 */
export function scaleToCoprimeIntegers(values: readonly RationalLike[]): bigint[] {
  requireArray(values, "scaleToCoprimeIntegers", "values");
  const rs = values.map(rationalFrom);
  let l = 1n;
  for (const r of rs) l = lcmBigInt(l, r.den);
  const ints = rs.map((r) => (r.num * l) / r.den);
  return divideByGcd(ints);
}

/**
 * Divide an integer vector by the gcd of its entries, so the entries become coprime
 * (`[4n, -6n, 8n]` → `[2n, -3n, 4n]`). A zero vector is returned unchanged (as a copy).
 *
 * @param values - integers
 * @returns a new array with gcd 1 (or all zeros)
 * @example
 * divideByGcd([4n, -6n, 8n]) // => [2n, -3n, 4n]
 * @category Numeric
 */
export function divideByGcd(values: readonly bigint[]): bigint[] {
  requireArray(values, "divideByGcd", "values");
  let g = 0n;
  for (const v of values) {
    g = gcdBigInt(g, v);
    if (g === 1n) break;
  }
  if (g <= 1n) return values.slice();
  return values.map((v) => v / g);
}

// ── private helpers ──────────────────────────────────────────────────────────

const SAFE = 9007199254740991n;
const MAX_EXPONENT = 10000;
const INTEGER_RE = /^[+-]?\d+$/;
const FRACTION_RE = /^([+-]?\d+)\s*\/\s*(\d+)$/;
const DECIMAL_RE = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

function normalise(num: bigint, den: bigint): Rational {
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  if (num === 0n) return Object.freeze(new ExactRational(0n, 1n));
  const g = gcdBigInt(num, den);
  if (g !== 1n) {
    num /= g;
    den /= g;
  }
  return Object.freeze(new ExactRational(num, den));
}

/**
 * The runtime shape of a {@link Rational}: two own fields and, on the prototype, `toJSON`
 * giving the exact text, so results holding rationals survive `JSON.stringify` (a bare BigInt
 * makes it throw).
 */
class ExactRational implements Rational {
  readonly num: bigint;
  readonly den: bigint;
  constructor(num: bigint, den: bigint) {
    this.num = num;
    this.den = den;
  }
  /** Exact text for JSON, e.g. `"25/2"`. */
  toJSON(): string {
    return rationalToString(this);
  }
}

/** One part of a rational given as an object: a bigint, a safe-integer number or integer text. */
function integerPart(v: unknown, name: "num" | "den"): bigint {
  if (typeof v === "bigint") return v;
  if (typeof v === "number" && Number.isSafeInteger(v)) return BigInt(v);
  if (typeof v === "string" && INTEGER_RE.test(v.trim())) return BigInt(v.trim());
  throw new RxthermError(
    "INVALID_ARGUMENT",
    `rationalFrom requires ${name} to be a bigint, a safe integer or integer text, got ${describeValue(v)}`,
    { [name]: describeValue(v) },
  );
}

/** The shared guard of the rational operations: a normalised-shape rational (bigint parts, den > 0). */
function checkRational(r: Rational, fn: string, path: string): void {
  if (typeof r !== "object" || r === null || typeof r.num !== "bigint" || typeof r.den !== "bigint" || r.den <= 0n) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} requires ${path} to be a Rational (bigint num, bigint den > 0; build one with rationalFrom), got ${describeValue(r)}`,
      { path },
    );
  }
}

function toBigIntStrict(v: bigint | number, name: string): bigint {
  if (typeof v === "bigint") return v;
  if (!Number.isSafeInteger(v)) {
    throw new RxthermError("INVALID_ARGUMENT", `rational requires ${name} to be a safe integer or bigint, got ${describeValue(v)}`, {
      [name]: typeof v === "number" ? v : describeValue(v),
    });
  }
  return BigInt(v);
}

/** an/den correctly rounded (half to even) to a double, including subnormals and overflow. */
function roundedQuotient(an: bigint, den: bigint): number {
  // q = floor(an·2^shift / den) carries 54–55 significant bits; `sticky` records the rest.
  const shift = 54 - (bitLength(an) - bitLength(den));
  const n = shift >= 0 ? an << BigInt(shift) : an;
  const d = shift >= 0 ? den : den << BigInt(-shift);
  let q = n / d;
  const sticky = n % d !== 0n;
  const bits = bitLength(q);
  const exponent = bits - 1 - shift; // value in [2^exponent, 2^(exponent+1))
  if (exponent > 1023) return Infinity;
  const keep = exponent >= -1022 ? 53 : 53 - (-1022 - exponent);
  if (keep < 0) return 0;
  const drop = bits - Math.max(keep, 0);
  const half = 1n << BigInt(drop - 1);
  const low = q & ((1n << BigInt(drop)) - 1n);
  q >>= BigInt(drop);
  if (low > half || (low === half && (sticky || (q & 1n) === 1n))) q += 1n;
  // q·2^(drop−shift) is exactly representable now; scale in two steps to stay in range.
  const e = drop - shift;
  const e1 = Math.trunc(e / 2);
  return Number(q) * 2 ** e1 * 2 ** (e - e1);
}

/** Number of bits of a non-negative BigInt (0 for 0), from its double's exponent, corrected exactly. */
function bitLength(n: bigint): number {
  if (n === 0n) return 0;
  const x = Number(n);
  if (x === Infinity) return n.toString(16).length * 4 - Math.clz32(Number.parseInt(n.toString(16)[0] as string, 16)) + 28;
  // Number(n) rounds to nearest, so its exponent can exceed the true one by 1 at a power of two
  let bits = Math.floor(Math.log2(x)) + 1;
  if (bits > 1 && n < 1n << BigInt(bits - 1)) bits--;
  else if (n >= 1n << BigInt(bits)) bits++;
  return bits;
}
