import { describe, expect, it } from "vitest";
import { test, fc } from "../../_helpers/property.js";
import {
  createGibbsState,
  solveGibbs,
  solveGibbsRobust,
  solveDense,
  type GibbsProblem,
} from "../../../src/flame/internal/gibbsMinimizer.js";

// Synthetic data: the minimiser works on dimensionless g°/RT values, so exact analytic answers exist.
const LIMITS = { maxIterations: 300, elementTolerance: 1e-12 };

function problem(a: number[][], gas: number[], b: number[]): GibbsProblem {
  return { m: a.length, ns: gas.length, a: new Float64Array(a.flat()), gas: new Uint8Array(gas), b: new Float64Array(b) };
}

describe("solveGibbs (synthetic data)", () => {
  it("solveGibbs(A2 ⇌ 2 A) satisfies the mass-action law x_A²/x_A2 · P/P° = exp(−Δg/RT)", () => {
    // ideal-gas mass-action law (common practice): K = exp(−(2 μ°A − μ°A2))
    const muA = 3;
    const P = 2; // P/P°
    const p = problem([[2, 1]], [1, 1], [2]);
    const s = createGibbsState(p);
    const out = solveGibbs(p, { mu0: new Float64Array([0, muA]), kind: "P", lnP: Math.log(P) }, s, LIMITS);
    expect(out.converged).toBe(true);
    const nA2 = Math.exp(s.lnn[0]!);
    const nA = Math.exp(s.lnn[1]!);
    const N = nA + nA2;
    expect(((nA / N) ** 2 / (nA2 / N)) * P).toBeCloseTo(Math.exp(-2 * muA), 14);
    expect(2 * nA2 + nA).toBeCloseTo(2, 13);
  });

  it("solveGibbs(H/O system) meets the stationarity conditions μ_j = Σ a_ij π_i to 1e-12", () => {
    const a = [[2, 0, 2, 1, 0, 1], [0, 2, 1, 0, 1, 1]]; // H2 O2 H2O H O OH
    const p = problem(a, [1, 1, 1, 1, 1, 1], [2, 1.2]);
    const mu0 = new Float64Array([-20, -25, -60, 5, 8, -15]);
    const s = createGibbsState(p);
    const out = solveGibbs(p, { mu0, kind: "P", lnP: 0 }, s, LIMITS);
    expect(out.converged).toBe(true);
    expect(out.elementResidual).toBeLessThan(1e-12);
    const n = Array.from(s.lnn, Math.exp);
    const N = n.reduce((x, y) => x + y, 0);
    for (let j = 0; j < 6; j++) {
      const mu = mu0[j]! + Math.log(n[j]! / N);
      expect(Math.abs(mu - (a[0]![j]! * s.pi[0]! + a[1]![j]! * s.pi[1]!))).toBeLessThan(1e-12);
    }
  });

  it("solveGibbs keeps trace species far below double-precision ratios (ln-space)", () => {
    // B is 1e-200 of A: exp(−460.5) — representable only because amounts live in ln-space
    const p = problem([[1, 1]], [1, 1], [1]);
    const s = createGibbsState(p);
    const out = solveGibbs(p, { mu0: new Float64Array([0, 460.517018598809]), kind: "P", lnP: 0 }, s, LIMITS);
    expect(out.converged).toBe(true);
    expect(s.lnn[1]! - s.lnn[0]!).toBeCloseTo(-460.517018598809, 9);
  });

  it("solveGibbsRobust(carbon beyond the oxygen) activates the condensed carbon", () => {
    // species C(s), O2, CO2, CO; 2 CO ⇌ C(s) + CO2 with Δg = 0 → x_CO2 = x_CO² at P = P°,
    // x_CO + x_CO2 = 1 → x_CO = (√5 − 1)/2 (analytic, common practice)
    const p = problem([[1, 0, 1, 1], [0, 2, 2, 1]], [0, 1, 1, 1], [3, 2]);
    const s = createGibbsState(p);
    const out = solveGibbsRobust(p, { mu0: new Float64Array([0, -20, -60, -30]), kind: "P", lnP: 0 }, s, LIMITS);
    expect(out.converged).toBe(true);
    const nCO2 = Math.exp(s.lnn[2]!);
    const nCO = Math.exp(s.lnn[3]!);
    expect(nCO / (nCO + nCO2)).toBeCloseTo((Math.sqrt(5) - 1) / 2, 12);
    expect(s.active[0]).toBe(1);
    expect(s.nc[0]! + nCO + nCO2).toBeCloseTo(3, 12);
  });

  it("solveGibbsRobust drops a condensed species that does not belong", () => {
    // same system, oxygen-rich: C(s) must not survive
    const p = problem([[1, 0, 1, 1], [0, 2, 2, 1]], [0, 1, 1, 1], [1, 4]);
    const s = createGibbsState(p);
    s.active[0] = 1;
    s.nc[0] = 0.5;
    const out = solveGibbsRobust(p, { mu0: new Float64Array([0, -20, -60, -30]), kind: "P", lnP: 0 }, s, LIMITS);
    expect(out.converged).toBe(true);
    expect(s.active[0]).toBe(0);
    expect(s.nc[0]).toBe(0);
  });

  it("solveGibbs at fixed volume matches the fixed-pressure solution at the resulting pressure", () => {
    const p = problem([[2, 1]], [1, 1], [2]);
    const sv = createGibbsState(p);
    const lnC = Math.log(0.7); // R·T/(V·P°) per mol
    solveGibbs(p, { mu0: new Float64Array([0, 2]), kind: "V", lnP: lnC }, sv, LIMITS);
    const N = Math.exp(sv.lnn[0]!) + Math.exp(sv.lnn[1]!);
    const sp = createGibbsState(p);
    solveGibbs(p, { mu0: new Float64Array([0, 2]), kind: "P", lnP: Math.log(0.7 * N) }, sp, LIMITS);
    expect(sp.lnn[1]!).toBeCloseTo(sv.lnn[1]!, 10);
  });

  test.prop([
    fc.double({ min: 0.05, max: 5, noNaN: true }),
    fc.double({ min: 0.05, max: 5, noNaN: true }),
    fc.array(fc.double({ min: -40, max: 20, noNaN: true }), { minLength: 6, maxLength: 6 }),
    fc.double({ min: -3, max: 3, noNaN: true }),
  ])("solveGibbs conserves the elements to 1e-12 for any H/O feed and any g°/RT", (bH, bO, mu, lnP) => {
    const p = problem([[2, 0, 2, 1, 0, 1], [0, 2, 1, 0, 1, 1]], [1, 1, 1, 1, 1, 1], [bH, bO]);
    const s = createGibbsState(p);
    const out = solveGibbsRobust(p, { mu0: new Float64Array(mu), kind: "P", lnP }, s, LIMITS);
    expect(out.converged).toBe(true);
    expect(out.elementResidual).toBeLessThanOrEqual(1e-12);
  });
});

describe("solveDense", () => {
  it("solveDense(M, r) solves a pivoting-needing 3×3 system", () => {
    const M = new Float64Array([0, 2, 1, 1, 1, 1, 2, 1, 0]);
    const r = new Float64Array([5, 4, 4]); // x = (1, 2, 1)
    expect(solveDense(M, r, 3)).toBe(0);
    expect(Array.from(r).map((v) => Math.round(v * 1e12) / 1e12)).toEqual([1, 2, 1]);
  });
  it("solveDense keeps the digits of a trace element's row (symmetric scaling)", () => {
    // the element-potential matrix (rows C, O, H and the ln N border) of CO and CO2 at 1e-12 mol
    // beside 1 mol H2O and 0.3 mol H2, with right-hand side M·x for x = (1.5, −2, 0.7, 0.1);
    // unscaled elimination pivots a large O row into the tiny C column and returns x₀ ≈ 1.50015
    const t = 1e-12;
    const n = [t, t, 1, 0.3];
    const A = [[1, 1, 0, 0], [1, 2, 1, 0], [0, 0, 2, 2]];
    const M = new Float64Array(16);
    for (let i = 0; i < 3; i++) {
      for (let l = 0; l < 3; l++) M[i * 4 + l] = n.reduce((sum, nj, j) => sum + A[i]![j]! * A[l]![j]! * nj, 0);
      const si = n.reduce((sum, nj, j) => sum + A[i]![j]! * nj, 0);
      M[i * 4 + 3] = si;
      M[3 * 4 + i] = si;
    }
    const x = [1.5, -2, 0.7, 0.1];
    const r = new Float64Array(4).map((_, i) => x.reduce((sum, xk, k) => sum + M[i * 4 + k]! * xk, 0));
    expect(solveDense(M, r, 4)).toBe(0);
    for (let k = 0; k < 4; k++) expect(Math.abs(r[k]! - x[k]!)).toBeLessThan(1e-12);
  });
  it("solveDense drops an element-potential direction at round-off and leaves that unknown at 0", () => {
    // rows 1 and 2 differ by 1e-17 after scaling: their difference is unresolvable in float64
    const M = new Float64Array([1, 1, 1, 1 + 1e-17]);
    const r = new Float64Array([2, 2]);
    expect(solveDense(M, r, 2, new Float64Array(2), 2)).toBe(1);
    expect(r[0]! + r[1]!).toBeCloseTo(2, 14);
    expect(Number.isFinite(r[0]!) && Number.isFinite(r[1]!)).toBe(true);
  });
  it("solveDense reports a singular matrix", () => {
    expect(solveDense(new Float64Array([1, 2, 2, 4]), new Float64Array([1, 2]), 2)).toBe(-1);
  });
});
