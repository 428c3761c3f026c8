import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { jsonReplacer } from "../../src/numeric/jsonReplacer.js";
import {
  divideByGcd,
  gcdBigInt,
  lcmBigInt,
  rational,
  rationalAdd,
  rationalCompare,
  rationalDiv,
  rationalFrom,
  rationalFromDecimalString,
  rationalFromInteger,
  rationalFromNumber,
  rationalIsZero,
  rationalMul,
  rationalNeg,
  rationalSub,
  rationalToNumber,
  rationalToString,
  scaleToCoprimeIntegers,
  type Rational,
} from "../../src/numeric/rational.js";
import { caught } from "../_helpers/caught.js";

const arbRational = fc
  .tuple(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), fc.bigInt({ min: 1n, max: 10n ** 20n }))
  .map(([n, d]) => rational(n, d));
const s = rationalToString;

describe("gcdBigInt / lcmBigInt", () => {
  it("documented examples (arithmetic facts, common practice)", () => {
    expect(gcdBigInt(12n, -18n)).toBe(6n);
    expect(gcdBigInt(0n, 0n)).toBe(0n);
    expect(lcmBigInt(4n, 6n)).toBe(12n);
    expect(lcmBigInt(0n, 6n)).toBe(0n);
  });
  test.prop([fc.bigInt({ min: -(10n ** 25n), max: 10n ** 25n }), fc.bigInt({ min: -(10n ** 25n), max: 10n ** 25n })])(
    "gcd divides both and gcd·lcm = |a·b|",
    (a, b) => {
      const g = gcdBigInt(a, b);
      if (g !== 0n) {
        expect(a % g).toBe(0n);
        expect(b % g).toBe(0n);
      }
      const p = a * b;
      expect(g * lcmBigInt(a, b)).toBe(p < 0n ? -p : p);
    },
  );
});

describe("rational", () => {
  it("normalises sign and reduces (documented example)", () => {
    expect(rational(6n, -4n)).toEqual({ num: -3n, den: 2n });
    expect(rational(0n, -5n)).toEqual({ num: 0n, den: 1n });
    expect(Object.isFrozen(rational(1, 2))).toBe(true);
  });
  it("rejects a zero denominator and non-integers", () => {
    const e = caught(() => rational(1n, 0n));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ num: "1", den: "0" });
    expect(caught(() => rational(1.5)).code).toBe("INVALID_ARGUMENT");
  });
  it("rationalFromInteger (documented example)", () => {
    expect(rationalFromInteger(7)).toEqual({ num: 7n, den: 1n });
    expect(caught(() => rationalFromInteger(0.5)).details).toEqual({ value: 0.5 });
  });
});

describe("rationalFromDecimalString", () => {
  it("reads integers, fractions, decimals and exponents exactly", () => {
    expect(s(rationalFromDecimalString("6.5"))).toBe("13/2"); // documented example
    expect(s(rationalFromDecimalString("13/2"))).toBe("13/2");
    expect(s(rationalFromDecimalString(" -26 / 4 "))).toBe("-13/2");
    expect(s(rationalFromDecimalString("1e-3"))).toBe("1/1000");
    expect(s(rationalFromDecimalString("-0.947"))).toBe("-947/1000");
    expect(s(rationalFromDecimalString(".5"))).toBe("1/2");
    expect(s(rationalFromDecimalString("5."))).toBe("5");
    expect(s(rationalFromDecimalString("2.5E+2"))).toBe("250");
    expect(s(rationalFromDecimalString("+0"))).toBe("0");
    expect(s(rationalFromDecimalString("0.1"))).toBe("1/10");
  });
  it("rejects malformed text with INVALID_ARGUMENT and the text in details", () => {
    for (const t of ["", ".", "1/0", "abc", "1/2/3", "1e", "e5", "--1", "1/-2", "1e99999"]) {
      const e = caught(() => rationalFromDecimalString(t));
      expect(e.code, t).toBe("INVALID_ARGUMENT");
      expect(e.details, t).toEqual({ text: t });
    }
  });
  test.prop([fc.double({ noNaN: true, noDefaultInfinity: true })])("String(x) round trip: toNumber(fromNumber(x)) === x", (x) => {
    expect(rationalToNumber(rationalFromNumber(x))).toBe(x === 0 ? 0 : x);
  });
});

describe("rationalFromNumber / rationalFrom", () => {
  it("reads the shortest decimal, not the binary double (documented example)", () => {
    expect(s(rationalFromNumber(0.947))).toBe("947/1000");
    expect(s(rationalFromNumber(0.1))).toBe("1/10");
    expect(s(rationalFromNumber(1e21))).toBe("1000000000000000000000");
    expect(s(rationalFromNumber(-2.5e-7))).toBe("-1/4000000");
    expect(s(rationalFrom("13/2"))).toBe("13/2");
    expect(s(rationalFrom(4n))).toBe("4");
    expect(s(rationalFrom({ num: 4n, den: -6n }))).toBe("-2/3");
  });
  it("rejects NaN and infinities", () => {
    expect(caught(() => rationalFromNumber(Number.NaN)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => rationalFromNumber(Infinity)).details).toEqual({ value: Infinity });
  });
});

describe("rational arithmetic", () => {
  it("documented examples", () => {
    expect(s(rationalAdd(rational(1n, 3n), rational(1n, 6n)))).toBe("1/2");
    expect(s(rationalSub(rational(1n, 2n), rational(1n, 3n)))).toBe("1/6");
    expect(s(rationalMul(rational(2n, 3n), rational(9n, 4n)))).toBe("3/2");
    expect(s(rationalDiv(rational(3n), rational(4n)))).toBe("3/4");
    expect(s(rationalNeg(rational(13n, 2n)))).toBe("-13/2");
    expect(rationalCompare(rational(1n, 3n), rational(1n, 2n))).toBe(-1);
    expect(rationalIsZero(rationalSub(rational(1n, 3n), rational(2n, 6n)))).toBe(true);
    expect(rationalToNumber(rational(13n, 2n))).toBe(6.5);
    expect(s(rational(-26n, 4n))).toBe("-13/2");
  });
  it("1/3 + 1/3 + 1/3 is exactly 1 (where float64 sums to 0.9999999999999999 for 0.1 × 10 — common practice)", () => {
    const third = rational(1n, 3n);
    expect(rationalAdd(rationalAdd(third, third), third)).toEqual({ num: 1n, den: 1n });
    let t = rational(0n);
    for (let i = 0; i < 10; i++) t = rationalAdd(t, rationalFromNumber(0.1));
    expect(s(t)).toBe("1");
  });
  it("division by zero throws INVALID_ARGUMENT", () => {
    const e = caught(() => rationalDiv(rational(3n, 2n), rational(0n)));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ dividend: "3/2" });
  });
  test.prop([arbRational, arbRational, arbRational])("field laws hold exactly and results stay normalised", (a, b, c) => {
    const norm = (r: Rational) => r.den > 0n && gcdBigInt(r.num, r.den) === (r.num === 0n ? r.den : 1n);
    expect(rationalAdd(a, b)).toEqual(rationalAdd(b, a));
    expect(rationalMul(a, rationalAdd(b, c))).toEqual(rationalAdd(rationalMul(a, b), rationalMul(a, c)));
    expect(rationalSub(rationalAdd(a, b), b)).toEqual(a);
    expect(norm(rationalMul(a, b))).toBe(true);
    expect(norm(rationalSub(a, c))).toBe(true);
    if (!rationalIsZero(b)) expect(rationalMul(rationalDiv(a, b), b)).toEqual(a);
    expect(rationalCompare(a, b)).toBe(-rationalCompare(b, a) || 0);
    expect(rationalAdd(a, rationalNeg(a))).toEqual({ num: 0n, den: 1n });
  });
  test.prop([arbRational])("toString and fromDecimalString round trip; toNumber agrees with the float quotient", (a) => {
    expect(rationalFromDecimalString(rationalToString(a))).toEqual(a);
    const approx = Number(a.num) / Number(a.den);
    const v = rationalToNumber(a);
    expect(Math.abs(v - approx)).toBeLessThanOrEqual(Math.abs(approx) * 1e-15);
  });
  test.prop([
    fc.bigInt({ min: 1n, max: 1n << 300n }),
    fc.bigInt({ min: 1n, max: 1n << 300n }),
    fc.integer({ min: 0, max: 300 }),
  ])("toNumber is correctly rounded: no neighbouring double is closer to the exact value (round half to even)", (n0, d, k) => {
    // bring numerator and denominator near powers of two, where the bit length is easiest to get wrong
    const n = k % 3 === 0 ? (1n << BigInt(k)) - 1n : k % 3 === 1 ? 1n << BigInt(k) : n0;
    const q = rational(n, d);
    const v = rationalToNumber(q);
    const exact = (x: number): Rational => {
      // a finite positive double as an exact dyadic rational
      const view = new DataView(new ArrayBuffer(8));
      view.setFloat64(0, x);
      const bits = view.getBigUint64(0);
      const e = Number((bits >> 52n) & 0x7ffn);
      const frac = bits & ((1n << 52n) - 1n);
      const m = e === 0 ? frac : frac | (1n << 52n);
      const p = (e === 0 ? 1 : e) - 1075;
      return p >= 0 ? rational(m << BigInt(p), 1n) : rational(m, 1n << BigInt(-p));
    };
    const dist = (x: number): Rational => {
      const diff = rationalSub(q, exact(x));
      return diff.num < 0n ? rationalNeg(diff) : diff;
    };
    const view = new DataView(new ArrayBuffer(8));
    view.setFloat64(0, v);
    const up = view.getBigUint64(0) + 1n;
    const down = view.getBigUint64(0) - 1n;
    view.setBigUint64(0, up);
    const next = view.getFloat64(0);
    view.setBigUint64(0, down);
    const prev = view.getFloat64(0);
    expect(rationalCompare(dist(v), dist(next))).toBeLessThanOrEqual(0);
    if (prev > 0) expect(rationalCompare(dist(v), dist(prev))).toBeLessThanOrEqual(0);
  });
  it("rationalToNumber of huge numerator and denominator does not overflow", () => {
    const big = 10n ** 400n;
    expect(rationalToNumber(rational(3n * big, 4n * big + 1n))).toBeCloseTo(0.75, 15);
    expect(rationalToNumber(rational(-(big + 1n), big))).toBe(-1);
  });
});

describe("scaleToCoprimeIntegers / divideByGcd", () => {
  it("documented examples (octane combustion 1 : 25/2 : 8 : 9 → 2 : 25 : 16 : 18, arithmetic)", () => {
    expect(scaleToCoprimeIntegers(["1", "25/2", "8", "9"])).toEqual([2n, 25n, 16n, 18n]);
    expect(divideByGcd([4n, -6n, 8n])).toEqual([2n, -3n, 4n]);
    expect(divideByGcd([0n, 0n])).toEqual([0n, 0n]);
    expect(scaleToCoprimeIntegers([0.5, -0.25])).toEqual([2n, -1n]);
  });
  test.prop([fc.array(arbRational, { minLength: 1, maxLength: 8 })])("result is coprime and parallel to the input", (v) => {
    const ints = scaleToCoprimeIntegers(v);
    let g = 0n;
    for (const x of ints) g = gcdBigInt(g, x);
    const allZero = v.every(rationalIsZero);
    expect(g).toBe(allZero ? 0n : 1n);
    if (!allZero) {
      // parallel: ints[i]·v[j] = ints[j]·v[i], and the sign of each entry is kept
      const k = v.findIndex((r) => !rationalIsZero(r));
      const ratio = rationalDiv(rational(ints[k] as bigint), v[k] as Rational);
      expect(ratio.num > 0n).toBe(true);
      v.forEach((r, i) => expect(rationalMul(r, ratio)).toEqual(rational(ints[i] as bigint)));
    }
  });
});

describe("jsonReplacer", () => {
  it("writes BigInts as text and non-finite numbers as null, as JSON.stringify does for them", () => {
    expect(jsonReplacer("c", 12n)).toBe("12");
    for (const x of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) expect(jsonReplacer("x", x)).toBeNull();
    expect(jsonReplacer("x", 1.5)).toBe(1.5);
    expect(jsonReplacer("x", "text")).toBe("text");
    const value = { a: Number.NaN, b: [Number.POSITIVE_INFINITY, 2n] };
    expect(JSON.stringify(value, jsonReplacer)).toBe(JSON.stringify({ a: Number.NaN, b: [Number.POSITIVE_INFINITY, "2"] }));
    expect(JSON.stringify(value, jsonReplacer)).toBe('{"a":null,"b":[null,"2"]}');
  });
});

