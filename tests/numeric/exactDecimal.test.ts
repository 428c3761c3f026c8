import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import {
  decimalCompare, decimalPlus, decimalTimes, decimalToNumber, decimalToPlainText, exactDecimal, exactDecimalOfNumber,
} from "../../src/numeric/exactDecimal.js";
import { fc, test } from "../_helpers/property.js";

/** Independent oracle: decimal.js with ample precision (exact for these sizes). */
const Oracle = Decimal.clone({ precision: 200 });
const text = (d: { m: bigint; e: number }): string => new Oracle(d.m.toString()).div(new Oracle(10).pow(d.e)).toFixed();

const decimalText = fc.tuple(fc.boolean(), fc.bigInt({ min: 0n, max: 10n ** 30n }), fc.integer({ min: 0, max: 25 }), fc.integer({ min: -30, max: 30 }))
  .map(([neg, digits, point, exp]) => {
    const s = digits.toString();
    const cut = Math.max(0, s.length - point);
    const body = point > 0 && cut < s.length ? `${s.slice(0, cut) || "0"}.${s.slice(cut)}` : s;
    return `${neg ? "-" : ""}${body}${exp !== 0 ? `e${exp}` : ""}`;
  });

describe("exactDecimal (BigInt decimals for exact formula counts, mass sums and enthalpy text)", () => {
  it("reads the decimal text of any finite number and rejects other text", () => {
    expect(exactDecimal("0.947")).toEqual({ m: 947n, e: 3 });
    expect(exactDecimal("-1e-7")).toEqual({ m: -1n, e: 7 });
    expect(exactDecimal("2.5E+3")).toEqual({ m: 2500n, e: 0 });
    expect(exactDecimal(".5")).toEqual({ m: 5n, e: 1 });
    for (const bad of ["", ".", "e5", "1.2.3", "abc", "1e", "Infinity", "NaN"]) expect(exactDecimal(bad)).toBeNull();
    expect(() => exactDecimalOfNumber(Number.NaN)).toThrow(RangeError);
  });

  it("0.947 × 3 is exactly 2.841 (common practice: the formula (Fe0.947O)3), nearest double 2.841", () => {
    const p = decimalTimes(exactDecimal("0.947")!, exactDecimal("3")!);
    expect(decimalToPlainText(p)).toBe("2.841");
    expect(decimalToNumber(p)).toBe(2.841);
    expect(decimalToPlainText(decimalTimes(exactDecimalOfNumber(-110.53), { m: 1000n, e: 0 }))).toBe("-110530");
    expect(decimalToPlainText({ m: 0n, e: 4 })).toBe("0");
    expect(Object.is(decimalToNumber({ m: -0n, e: 0 }), 0)).toBe(true);
  });

  test.prop([decimalText, decimalText], { numRuns: 400 })("sum, product, comparison and text agree with decimal.js", (a, b) => {
    const x = exactDecimal(a)!;
    const y = exactDecimal(b)!;
    const ox = new Oracle(a);
    const oy = new Oracle(b);
    expect(text(decimalPlus(x, y))).toBe(ox.plus(oy).toFixed());
    expect(text(decimalTimes(x, y))).toBe(ox.times(oy).toFixed());
    expect(decimalCompare(x, y)).toBe(ox.cmp(oy));
    expect(decimalToPlainText(x)).toBe(ox.toFixed());
  });

  test.prop([decimalText], { numRuns: 400 })("toNumber is the correctly rounded double (as Number() of the text)", (a) => {
    expect(decimalToNumber(exactDecimal(a)!)).toBe(Number(new Oracle(a).toString()) || 0);
  });

  test.prop([fc.double({ noNaN: true, noDefaultInfinity: true })], { numRuns: 400 })("a double's own decimal gives it back", (x) => {
    expect(decimalToNumber(exactDecimalOfNumber(x))).toBe(x === 0 ? 0 : x);
  });
});
