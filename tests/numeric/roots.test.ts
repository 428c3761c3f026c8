import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { findRoot } from "../../src/numeric/roots.js";
import { caught } from "../_helpers/caught.js";

describe("findRoot", () => {
  it("findRoot(x² − 2, [0, 2]) gives √2 (the documented example)", () => {
    // √2 = 1.4142135623730951 to double precision (common practice)
    const r = findRoot((x) => x * x - 2, [0, 2]);
    expect(Math.abs(r.root - Math.SQRT2)).toBeLessThan(1e-10);
    expect(r.root).toBeCloseTo(1.4142135623730951, 10);
    expect(r.bracket[0]).toBeLessThanOrEqual(r.root);
    expect(r.bracket[1]).toBeGreaterThanOrEqual(r.root);
    expect(r.expansions).toBe(0);
  });

  it("findRoot(cos x − x) gives the Dottie number with and without a derivative", () => {
    // 0.7390851332151607 — fixed point of cos, from memory; checked by the residual below
    const f = (x: number): number => Math.cos(x) - x;
    const brent = findRoot(f, [0, 1]);
    const newton = findRoot(f, [0, 1], { derivative: (x) => -Math.sin(x) - 1 });
    expect(brent.root).toBeCloseTo(0.7390851332151607, 9);
    expect(newton.root).toBeCloseTo(0.7390851332151607, 9);
    expect(Math.abs(brent.residual)).toBeLessThan(1e-9);
  });

  it("findRoot widens a bracket that holds no sign change, within the limits", () => {
    const r = findRoot((x) => x - 1000, [0, 1], { limits: [0, 5000] });
    expect(r.root).toBeCloseTo(1000, 8);
    expect(r.expansions).toBeGreaterThan(0);
    expect(r.bracket[0]).toBeGreaterThanOrEqual(0);
    expect(r.bracket[1]).toBeLessThanOrEqual(5000);
  });

  it("findRoot never evaluates f outside the limits", () => {
    const seen: number[] = [];
    const r = findRoot((x) => { seen.push(x); return 3000 - x; }, [300, 400], { limits: [200, 6000] });
    expect(r.root).toBeCloseTo(3000, 8);
    expect(Math.min(...seen)).toBeGreaterThanOrEqual(200);
    expect(Math.max(...seen)).toBeLessThanOrEqual(6000);
  });

  it("findRoot stops early at |f| ≤ toleranceF", () => {
    const loose = findRoot((x) => x - 0.5, [0, 3], { toleranceF: 0.1 });
    expect(Math.abs(loose.residual)).toBeLessThanOrEqual(0.1);
  });

  it("findRoot returns an end of the bracket at which f is exactly zero", () => {
    expect(findRoot((x) => x - 2, [2, 5]).root).toBe(2);
    expect(findRoot((x) => x - 5, [2, 5]).root).toBe(5);
  });

  test.prop([
    fc.double({ min: -100, max: 100, noNaN: true }),
    fc.double({ min: 0.1, max: 50, noNaN: true }),
    fc.double({ min: 0.01, max: 10, noNaN: true }),
    fc.boolean(),
  ])("findRoot on (x − r)(x² + c) finds r from a bracket that may need widening", (r, halfWidth, c, withDerivative) => {
    const p = (x: number): number => (x - r) * (x * x + c);
    const dp = (x: number): number => (x * x + c) + 2 * x * (x - r);
    const opts = withDerivative ? { derivative: dp, toleranceX: 1e-10 } : { toleranceX: 1e-10 };
    const res = findRoot(p, [r + 0.3 * halfWidth, r + halfWidth], opts);
    expect(Math.abs(res.root - r)).toBeLessThanOrEqual(1e-8 * (1 + Math.abs(r)));
    expect(res.bracket[0]).toBeLessThanOrEqual(res.root);
    expect(res.bracket[1]).toBeGreaterThanOrEqual(res.root);
  });

  test.prop([
    fc.tuple(
      fc.double({ min: -20, max: 20, noNaN: true }),
      fc.double({ min: 0.5, max: 10, noNaN: true }),
      fc.double({ min: 0.5, max: 10, noNaN: true }),
    ),
    fc.boolean(),
  ])("findRoot on a cubic with three known roots returns the one bracketed", ([r1, gap1, gap2], withDerivative) => {
    const r2 = r1 + gap1;
    const r3 = r2 + gap2;
    const p = (x: number): number => (x - r1) * (x - r2) * (x - r3);
    const dp = (x: number): number => (x - r2) * (x - r3) + (x - r1) * (x - r3) + (x - r1) * (x - r2);
    const res = findRoot(p, [r2 - gap1 / 2, r2 + gap2 / 2], withDerivative ? { derivative: dp } : {});
    expect(Math.abs(res.root - r2)).toBeLessThanOrEqual(1e-8 * (1 + Math.abs(r2)));
    expect(Math.abs(res.root - r2)).toBeLessThan(Math.min(gap1, gap2) / 2);
  });

  it("findRoot throws NO_BRACKET with the bracket tried and the f values", () => {
    const e = caught(() => findRoot((x) => x * x + 1, [-1, 1], { limits: [-10, 10] }));
    expect(e.code).toBe("NO_BRACKET");
    const d = e.details as { bracket: number[]; fValues: number[]; limits: number[] };
    expect(d.limits).toEqual([-10, 10]);
    expect(d.bracket).toHaveLength(2);
    expect(d.fValues[0]).toBeGreaterThan(0);
    expect(d.fValues[1]).toBeGreaterThan(0);
    // no widening allowed
    const e2 = caught(() => findRoot((x) => x + 5, [0, 1], { limits: [0, 1] }));
    expect(e2.code).toBe("NO_BRACKET");
    expect(e2.details).toMatchObject({ bracket: [0, 1], fValues: [5, 6], expansions: 0 });
  });

  it("findRoot throws NO_CONVERGENCE with iterations and the bracket", () => {
    const e = caught(() => findRoot((x) => Math.atan(x - 0.3), [-1000, 1000], { maxIterations: 2 }));
    expect(e.code).toBe("NO_CONVERGENCE");
    const d = e.details as { iterations: number; bracket: [number, number] };
    expect(d.iterations).toBe(2);
    expect(d.bracket[0]).toBeLessThan(d.bracket[1]);
  });

  it("findRoot rejects bad brackets, options and non-finite f values with INVALID_ARGUMENT", () => {
    expect(caught(() => findRoot((x) => x, [1, 1])).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findRoot((x) => x, [Number.NaN, 1])).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findRoot((x) => x, [-1, 1], { toleranceX: 0 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findRoot((x) => x, [-1, 1], { maxIterations: 0 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findRoot((x) => x, [-1, 1], { limits: [0, 10] })).code).toBe("INVALID_ARGUMENT");
    const e = caught(() => findRoot(() => Number.NaN, [-1, 1]));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toMatchObject({ x: -1 });
  });

  it("findRoot does not mutate the bracket or the options", () => {
    const bracket = Object.freeze([0, 2] as [number, number]);
    const opts = Object.freeze({ limits: Object.freeze([-5, 5] as [number, number]) });
    expect(() => findRoot((x) => x - 1, bracket, opts)).not.toThrow();
  });
});
