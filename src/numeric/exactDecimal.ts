/**
 * Private: exact decimal numbers as a BigInt mantissa and a power of ten (value = m × 10^−e), for the
 * few places that read decimal text exactly and convert the result once (formula counts, molar-mass
 * sums, formation enthalpies in J). Sums and products are exact; `toNumber` is correctly rounded
 * (ECMAScript's string-to-number conversion rounds to nearest, ties to even). Small on purpose: an app
 * that only parses formulas or computes flame temperatures does not carry a decimal library.
 *
 * @module
 * @internal
 */

/** An exact decimal: value = m × 10^(−e), e ≥ 0. */
export interface ExactDecimalValue {
  readonly m: bigint;
  readonly e: number;
}

const TEN = 10n;

/** 10^k as a BigInt (k ≥ 0). */
function pow10(k: number): bigint {
  return TEN ** BigInt(k);
}

/**
 * Read decimal text exactly: an optional sign, digits with an optional fraction, an optional
 * exponent (`-12.5`, `0.947`, `1e-7`, `2.5E+3`), as `String(x)` writes any finite number.
 * Returns null for anything else.
 */
export function exactDecimal(text: string): ExactDecimalValue | null {
  const match = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  if (match === null) return null;
  const [, sign, int = "", frac = "", exp] = match;
  if (int === "" && frac === "") return null;
  let m = BigInt((int === "" ? "0" : int) + frac);
  let e = frac.length - (exp === undefined ? 0 : Number(exp));
  if (e < 0) {
    m *= pow10(-e);
    e = 0;
  }
  return { m: sign === "-" ? -m : m, e };
}

/** An exact decimal of a finite double's shortest text (`String(x)`), i.e. the decimal the number prints as. */
export function exactDecimalOfNumber(x: number): ExactDecimalValue {
  const d = exactDecimal(String(x));
  if (d === null) throw new RangeError(`exactDecimalOfNumber requires a finite number, got ${String(x)}`);
  return d;
}

/** a × b, exactly. */
export function decimalTimes(a: ExactDecimalValue, b: ExactDecimalValue): ExactDecimalValue {
  return { m: a.m * b.m, e: a.e + b.e };
}

/** a + b, exactly. */
export function decimalPlus(a: ExactDecimalValue, b: ExactDecimalValue): ExactDecimalValue {
  if (a.e === b.e) return { m: a.m + b.m, e: a.e };
  return a.e < b.e ? { m: a.m * pow10(b.e - a.e) + b.m, e: b.e } : { m: a.m + b.m * pow10(a.e - b.e), e: a.e };
}

/** Sign of a − b: −1, 0 or 1, exactly. */
export function decimalCompare(a: ExactDecimalValue, b: ExactDecimalValue): number {
  const d = decimalPlus(a, { m: -b.m, e: b.e }).m;
  return d === 0n ? 0 : d < 0n ? -1 : 1;
}

/** The double nearest to the exact value (ties to even). */
export function decimalToNumber(a: ExactDecimalValue): number {
  const x = Number(`${a.m}e-${a.e}`);
  return x === 0 ? 0 : x; // never −0
}

/** The exact value in plain notation, no exponent, no trailing fraction zeros (`-393522`, `0.5`, `0`). */
export function decimalToPlainText(a: ExactDecimalValue): string {
  if (a.m === 0n) return "0";
  const negative = a.m < 0n;
  let digits = (negative ? -a.m : a.m).toString();
  let e = a.e;
  while (e > 0 && digits.endsWith("0")) {
    digits = digits.slice(0, -1);
    e--;
  }
  let text: string;
  if (e === 0) text = digits;
  else if (digits.length > e) text = `${digits.slice(0, digits.length - e)}.${digits.slice(digits.length - e)}`;
  else text = `0.${"0".repeat(e - digits.length)}${digits}`;
  return negative ? `-${text}` : text;
}
