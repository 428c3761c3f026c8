import { describe, expect, it } from "vitest";
import { fc, test } from "../_helpers/property.js";
import {
  addExpansions,
  compressExpansion,
  decimalOfNumber,
  expansionFromDigits,
  expansionOf,
  expansionQuotient,
  expansionSign,
  expansionToBigInt,
  growExpansion,
  linearCombination,
  linearCombinationAndMore,
  multiplyExpansions,
  negateExpansion,
  scaleByPowerOfTen,
  scaleExpansion,
} from "../../src/numeric/expansion.js";
import { rationalFromNumber, rationalToNumber, type Rational } from "../../src/numeric/rational.js";

/**
 * Oracle side: an integer split into doubles by BigInt arithmetic alone (largest part first, each
 * the double nearest to what is left), listed smallest first — a valid expansion built without the
 * code under test.
 */
function toExpansion(x: bigint): number[] {
  const parts: number[] = [];
  let r = x;
  while (r !== 0n) {
    const h = Number(r);
    parts.push(h);
    r -= BigInt(h);
  }
  return parts.reverse();
}

/** Components non-zero, smallest first, bits not overlapping (each below the lowest set bit of the next). */
function isExpansion(e: readonly number[]): boolean {
  for (const x of e) if (x === 0 || !Number.isInteger(x)) return false;
  for (let i = 0; i + 1 < e.length; i++) {
    const y = BigInt(Math.abs(e[i + 1]!));
    const low = y & -y;
    if (BigInt(Math.abs(e[i]!)) >= low) return false;
  }
  return true;
}

const big = fc.oneof(
  fc.bigInt({ min: -(2n ** 64n), max: 2n ** 64n }),
  fc.bigInt({ min: -(2n ** 200n), max: 2n ** 200n }),
  fc.integer({ min: -1000, max: 1000 }).map(BigInt),
);
const factor = fc.oneof(fc.integer({ min: -(2 ** 53) + 1, max: 2 ** 53 - 1 }), fc.integer({ min: -40, max: 40 }));

describe("expansions: exact integer arithmetic in doubles, against BigInt", () => {
  test.prop([big, big], { numRuns: 300 })("a + b", (a, b) => {
    const s = addExpansions(toExpansion(a), toExpansion(b));
    expect(isExpansion(s)).toBe(true);
    expect(expansionToBigInt(s)).toBe(a + b);
    expect(expansionSign(s)).toBe(a + b > 0n ? 1 : a + b < 0n ? -1 : 0);
  });

  test.prop([big, factor], { numRuns: 300 })("a · k for a double integer k, and a + k", (a, k) => {
    const p = scaleExpansion(toExpansion(a), k);
    expect(isExpansion(p)).toBe(true);
    expect(expansionToBigInt(p)).toBe(a * BigInt(k));
    expect(expansionToBigInt(growExpansion(toExpansion(a), k))).toBe(a + BigInt(k));
  });

  test.prop([big, big], { numRuns: 300 })("a · b, compressed; −a", (a, b) => {
    const p = multiplyExpansions(toExpansion(a), toExpansion(b));
    expect(isExpansion(p)).toBe(true);
    expect(expansionToBigInt(p)).toBe(a * b);
    expect(expansionToBigInt(negateExpansion(toExpansion(a)))).toBe(-a);
  });

  test.prop([fc.array(fc.integer({ min: -(2 ** 53) + 1, max: 2 ** 53 - 1 }), { maxLength: 8 })], { numRuns: 300 })(
    "compress keeps the value in fewer or as many components",
    (xs) => {
      let e: number[] = [];
      for (const x of xs) e = growExpansion(scaleExpansion(e, 2 ** 30 + 7), x);
      const c = compressExpansion(e);
      expect(isExpansion(c)).toBe(true);
      expect(c.length).toBeLessThanOrEqual(e.length);
      expect(expansionToBigInt(c)).toBe(expansionToBigInt(e));
    },
  );

  test.prop([big, fc.integer({ min: 0, max: 60 })], { numRuns: 200 })("a · 10^k", (a, k) => {
    const p = scaleByPowerOfTen(toExpansion(a), k);
    expect(isExpansion(p)).toBe(true);
    expect(expansionToBigInt(p)).toBe(a * 10n ** BigInt(k));
  });

  test.prop([fc.bigInt({ min: 0n, max: 10n ** 60n })], { numRuns: 200 })("decimal digits", (a) => {
    const e = expansionFromDigits(a.toString());
    expect(isExpansion(e)).toBe(true);
    expect(expansionToBigInt(e)).toBe(a);
  });

  it("holds values beyond 2^53 exactly: 10^17 + 1 and (2^53 + 1)²", () => {
    expect(expansionToBigInt(growExpansion(expansionOf(1e17), 1))).toBe(10n ** 17n + 1n);
    const x = growExpansion(expansionOf(2 ** 53), 1);
    expect(expansionToBigInt(multiplyExpansions(x, x))).toBe((2n ** 53n + 1n) ** 2n);
  });
});

describe("expansionQuotient: correctly rounded n/d, against BigInt rounding (rationalToNumber)", () => {
  const oracle = (n: bigint, d: bigint): number => {
    if (d < 0n) [n, d] = [-n, -d];
    return rationalToNumber({ num: n, den: d } as Rational);
  };
  const nonzero = big.filter((x) => x !== 0n);

  test.prop([big, nonzero], { numRuns: 500 })("any quotient", (n, d) => {
    expect(Object.is(expansionQuotient(toExpansion(n), toExpansion(d)), oracle(n, d) || 0)).toBe(true);
  });

  // exact ties and their neighbours: n/d at, just above and just below the midpoint between two doubles
  const tie = fc.record({
    mantissa: fc.bigInt({ min: 2n ** 52n, max: 2n ** 53n - 1n }),
    exponent: fc.integer({ min: -80, max: 20 }),
    scale: fc.bigInt({ min: 1n, max: 2n ** 40n }),
    nudge: fc.constantFrom(-1n, 0n, 1n),
    negative: fc.boolean(),
  });
  test.prop([tie], { numRuns: 500 })("ties go to even, near ties to the nearer double", ({ mantissa, exponent, scale, nudge, negative }) => {
    // midpoint (2m + 1)·2^(e−1) = n/d with d = scale·2^s and n = (2m + 1)·scale·2^(e−1+s), s making both integers
    const s = BigInt(Math.max(0, 1 - exponent));
    const d = scale * 2n ** s;
    let n = (2n * mantissa + 1n) * scale * 2n ** (BigInt(exponent - 1) + s) + nudge;
    if (negative) n = -n;
    const got = expansionQuotient(toExpansion(n), toExpansion(d));
    expect(got).toBe(oracle(n, d));
  });

  it("rounds 1/3, 2/3 and a value one unit past a tie as BigInt division does", () => {
    expect(expansionQuotient([1], [3])).toBe(1 / 3);
    expect(expansionQuotient([-2], [3])).toBe(-2 / 3);
    // (2^53 + 1)/2 is a tie between 2^52 and 2^52 + 1... scaled: 9007199254740993 / 2 → 4503599627370496.5 → even 4503599627370496
    expect(expansionQuotient(growExpansion([2 ** 53], 1), [2])).toBe(4503599627370496);
    expect(expansionQuotient(growExpansion([2 ** 53], 3), [2])).toBe(4503599627370498);
  });
});

describe("decimalOfNumber: the shortest decimal of a double, as rationalFromNumber reads it", () => {
  const value = fc.oneof(
    fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e30, max: 1e30 }),
    fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e-10, max: 1e-10 }),
    fc.tuple(fc.integer({ min: -100000, max: 100000 }), fc.constantFrom(1, 10, 100, 1000, 1e6)).map(([a, b]) => a / b),
    fc.tuple(fc.integer({ min: 1, max: 1000 }), fc.integer({ min: -3, max: 3 })).map(([a, m]) => (a / 10) * (1 + m * 2 ** -52)),
  );
  test.prop([value], { numRuns: 500 })("digits · 10^−exponent is the exact rational of String(x)", (x) => {
    const d = decimalOfNumber(x, 400);
    expect(d).not.toBeNull();
    const r = rationalFromNumber(x);
    expect(expansionToBigInt(d!.digits) * r.den).toBe(r.num * 10n ** BigInt(d!.exponent));
    expect(d!.exponent).toBeGreaterThanOrEqual(0);
  });

  it("0.30000000000000004 is 30000000000000004 · 10^−17; 1e21 is an integer; too many places give null", () => {
    const d = decimalOfNumber(0.1 + 0.2, 40)!;
    expect(expansionToBigInt(d.digits)).toBe(30000000000000004n);
    expect(d.exponent).toBe(17);
    expect(expansionToBigInt(decimalOfNumber(1e21, 40)!.digits)).toBe(10n ** 21n);
    expect(decimalOfNumber(1e-30, 20)).toBeNull();
  });
});

describe("linearCombination: Σ cᵢ·eᵢ exactly, against BigInt", () => {
  test.prop([fc.array(fc.tuple(big, factor), { maxLength: 12 }), fc.option(big, { nil: null })], { numRuns: 300 })("any combination", (terms, extra) => {
    const es = terms.map(([a]) => toExpansion(a));
    const pick = terms.map((_, i) => i);
    const got = linearCombination(es, pick, terms.map(([, c]) => c), extra === null ? null : toExpansion(extra));
    const want = terms.reduce((s, [a, c]) => s + a * BigInt(c), extra ?? 0n);
    expect(isExpansion(got)).toBe(true);
    expect(expansionToBigInt(got)).toBe(want);
  });
});

describe("linearCombinationAndMore: Σ cᵢ·eᵢ and Σ cᵢ·eᵢ + c·e from one pass, against BigInt", () => {
  test.prop([fc.array(fc.tuple(big, factor), { maxLength: 12 }), big, factor], { numRuns: 300 })("both sums", (terms, a, c) => {
    const es = terms.map(([x]) => toExpansion(x));
    const [sum, more] = linearCombinationAndMore(es, null, terms.map(([, k]) => k), toExpansion(a), c);
    const want = terms.reduce((s, [x, k]) => s + x * BigInt(k), 0n);
    expect(isExpansion(sum) && isExpansion(more)).toBe(true);
    expect(expansionToBigInt(sum)).toBe(want);
    expect(expansionToBigInt(more)).toBe(want + a * BigInt(c));
  });
});
