import { RxthermError } from "../../src/errors.js";
import { equilibriumComposition } from "../../src/flame/equilibriumComposition.js";

/**
 * A seeded random sweep of equilibriumComposition: random product sets drawn from the built-in
 * gases whose data reach 3400 K, feeds of one to three of those species (log-uniform amounts),
 * half of the cases with one more feed species at 1e-4…1e-12 of the feed (a trace), T in
 * 600–3400 K, P in 100 Pa – 10 MPa, and 30 % of the cases solved again from the enthalpy of the
 * fixed-T answer (H mode). Invented test inputs, not data: they only exercise the solver.
 *
 * Every returned result is checked here: the element residual within the default tolerance
 * and, in H mode, the temperature back within 1e-3 K of the fixed-T solve. A result that
 * fails either is counted as `wrong` (a silent wrong answer).
 */
export const SWEEP_GASES = [
  "Ar(g)", "C2H2(g)", "C2H6(g)", "C3H8(g)", "CH3OH(g)", "CH4(g)", "CO(g)", "CO2(g)", "Cl2(g)",
  "H(g)", "H2(g)", "H2O(g)", "H2S(g)", "HCN(g)", "HCl(g)", "He(g)", "N(g)", "N2(g)", "N2O(g)",
  "NH3(g)", "NO(g)", "NO2(g)", "O(g)", "O2(g)", "OH(g)", "SO2(g)", "SO3(g)",
];

/** Tally of one class of cases. */
export interface SweepTally {
  cases: number;
  converged: number;
  /** Error code → count. */
  errors: Record<string, number>;
  /** Results returned with a residual above tolerance or a wrong H-mode temperature. */
  wrong: number;
  worstElementResidual: number;
  /** Worst |energy residual| / |H| of the H-mode results. */
  worstEnergyResidual: number;
}

/** mulberry32: a small seeded generator (public-domain algorithm, common practice). */
export function seeded(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let x = Math.imul(t ^ (t >>> 15), 1 | t);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

/** Run `cases` random cases from `seed`; returns the tallies without and with a trace feed. */
export function equilibriumSweep(cases: number, seed: number): { major: SweepTally; trace: SweepTally } {
  const rand = seeded(seed);
  const pick = <T>(a: readonly T[]): T => a[Math.floor(rand() * a.length)]!;
  const fresh = (): SweepTally => ({ cases: 0, converged: 0, errors: {}, wrong: 0, worstElementResidual: 0, worstEnergyResidual: 0 });
  const out = { major: fresh(), trace: fresh() };
  for (let c = 0; c < cases; c++) {
    const set = new Set<string>();
    const size = 3 + Math.floor(rand() * 9);
    while (set.size < size) set.add(pick(SWEEP_GASES));
    const species = [...set];
    const feed: Record<string, number> = {};
    const nFeed = 1 + Math.floor(rand() * 3);
    for (let k = 0; k < nFeed; k++) feed[pick(species)] = Math.exp((rand() * 2 - 1) * 2.3);
    const withTrace = rand() < 0.5;
    if (withTrace) feed[pick(species)] = 10 ** -(4 + rand() * 8);
    const T = 600 + rand() * 2800;
    const P = 10 ** (2 + rand() * 5);
    const hMode = rand() < 0.3;
    const tally = withTrace ? out.trace : out.major;
    tally.cases++;
    try {
      let r = equilibriumComposition({ feed, species, T, P });
      let wrong = false;
      if (hMode) {
        r = equilibriumComposition({ feed, species, H: r.enthalpy, P });
        if (!(Math.abs(r.T - T) <= 1e-3)) wrong = true;
        tally.worstEnergyResidual = Math.max(tally.worstEnergyResidual, Math.abs(r.energyResidual) / Math.max(Math.abs(r.enthalpy), 1));
      }
      if (!(r.elementResidual <= 1e-12)) wrong = true;
      tally.worstElementResidual = Math.max(tally.worstElementResidual, r.elementResidual);
      if (wrong) tally.wrong++;
      else tally.converged++;
    } catch (e) {
      if (!(e instanceof RxthermError)) throw e;
      tally.errors[e.code] = (tally.errors[e.code] ?? 0) + 1;
    }
  }
  return out;
}
