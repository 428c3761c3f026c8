import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { increasingNewton } from "../../src/numeric/increasingNewton.js";
import { RxthermError } from "../../src/errors.js";

describe("increasingNewton", () => {
  it("increasingNewton finds the root of an increasing cubic from a far start", () => {
    // x³ + x − 10 = 0 has the single real root x = 2 (by inspection)
    const r = increasingNewton("test", (x) => ({ value: x ** 3 + x - 10, slope: 3 * x * x + 1 }), 9, [0, 10], 1e-12, 100);
    expect(r.x).toBeCloseTo(2, 11);
    expect(r.iterations).toBeLessThan(20);
  });

  it("increasingNewton survives a useless slope by bisection once bracketed", () => {
    const r = increasingNewton("test", (x) => ({ value: Math.tanh(x - 3), slope: 0 }), 0, [-10, 10], 1e-9, 200);
    expect(r.x).toBeCloseTo(3, 8);
  });

  it("increasingNewton throws NO_BRACKET when the root lies beyond a limit", () => {
    try {
      increasingNewton("test", (x) => ({ value: x - 20, slope: 1 }), 5, [0, 10], 1e-9, 50);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(RxthermError);
      expect((e as RxthermError).code).toBe("NO_BRACKET");
      expect((e as RxthermError).details.rangeK).toEqual([0, 10]);
    }
  });

  it("increasingNewton throws NO_CONVERGENCE when out of iterations", () => {
    expect(() => increasingNewton("test", (x) => ({ value: x - Math.PI, slope: 1e-3 }), 0, [-100, 100], 1e-15, 3)).toThrowError(
      expect.objectContaining({ code: "NO_CONVERGENCE" }),
    );
  });

  test.prop([fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -99, max: 99, noNaN: true })])(
    "increasingNewton finds the root of x + x³/100 − c from any start in the limits",
    (c, start) => {
      const r = increasingNewton("test", (x) => ({ value: x + x ** 3 / 100 - c, slope: 1 + (3 * x * x) / 100 }), start, [-100, 100], 1e-10, 200);
      expect(Math.abs(r.x + r.x ** 3 / 100 - c)).toBeLessThan(1e-7);
    },
  );
});
