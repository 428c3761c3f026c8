import { RxthermError, describeValue, finiteResult, knownKeys, optionsOf } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import {
  type Rational,
  rationalAdd,
  rationalDiv,
  rationalFromNumber,
  rationalIsZero,
  rationalMul,
  rationalSub,
  rationalToNumber,
} from "../numeric/rational.js";
import { solveLinearSystem } from "../numeric/linearAlgebra.js";
import { buildSystem, resolveSpecies, validateFlows } from "./internal/extentSystem.js";
import type { Flows } from "./types.js";
import { attachView } from "../view/attachView.js";
import { RECONCILE_VIEW } from "./internal/extentView.js";

/** The option keys reconcileExtents reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<ReconcileExtentsOptions>()("weights");

/**
 * Input of {@link reconcileExtents}.
 *
 * @category Stoichiometry
 */
export interface ReconcileExtentsInput {
  /** Feed: species key → mol or mol/s. */
  feed: Flows;
  /** Balanced reactions, as equation text or {@link Reaction} objects. */
  reactions: readonly (Reaction | string)[];
  /** Measured outlet flows (mol or mol/s) of at least as many species as there are reactions. */
  measured: Flows;
}

/**
 * Options of {@link reconcileExtents}.
 *
 * @category Stoichiometry
 */
export interface ReconcileExtentsOptions {
  /**
   * Weight of each measured species in the sum of squares (e.g. 1/σ² of the analyser).
   * Species not listed get weight 1. Weights must be finite and > 0.
   * @defaultValue every weight 1
   */
  weights?: Record<string, number>;
}

/**
 * Result of {@link reconcileExtents}.
 *
 * @category Stoichiometry
 */
export interface ReconcileExtentsResult {
  /** Least-squares extents, mol or mol/s. */
  extents: number[];
  /** Outlet flows of every species at those extents, mol or mol/s. */
  outlet: Flows;
  /** Measured − reconciled outlet flow of each measured species, mol or mol/s. */
  residuals: Flows;
  /** Weighted sum of squared residuals, (mol or mol/s)². */
  sumOfSquares: number;
  /**
   * Element-balance closure of the measured data: (element leaving ÷ element fed) × 100, in %,
   * for each element fed; outlet species that were not measured count at their reconciled flow.
   */
  closurePercent: Record<string, number>;
  /** Outlet species that were not measured (taken at their reconciled flow in the closure). */
  unmeasured: string[];
}

/**
 * Least-squares extents of reaction from more measured outlet flows than reactions, and the
 * element-balance closure of the measured data.
 *
 * With N the measured-species × reactions coefficient matrix, the extents minimise
 * Σ wₛ (mₛ − nₛ,feed − Σⱼ Nₛⱼ ξⱼ)², i.e. they solve the normal equations
 * (Nᵀ W N) ξ = Nᵀ W (m − n_feed), exactly in rationals. The closure per element
 * (out ÷ in × 100 %) shows whether the plant data close before any fitting: a value far from 100 %
 * points to a flow meter or analyser error, or a missing stream. Exact data give the exact
 * extents and 100 % closure.
 *
 * @param input - feed and measured outlet flows (mol or mol/s) and the reactions
 * @param options - weights of the measured species
 * @returns extents (mol or mol/s), reconciled outlet, residuals, closure per element (%)
 * @throws {@link RxthermError} `SPEC_COUNT_MISMATCH` with fewer measured species than reactions (details: `needed`, `given`)
 * @throws {@link RxthermError} `SINGULAR_SPECS` when the measured species cannot separate the extents (details: `rank`)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for a measured species in neither the feed nor a reaction, a bad weight or a non-finite flow
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative feed or measured flow
 * @throws {@link RxthermError} `UNBALANCED_REACTION` for an unbalanced reaction
 * @example
 * const r = reconcileExtents({
 *   feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 },
 *   reactions: ["CO + H2O -> CO2 + H2"],
 *   measured: { CO: 3, CO2: 7.2, H2: 6.8 },
 * });
 * r.extents           // => [7]
 * r.residuals         // => { CO: 0, CO2: 0.2, H2: -0.2 }
 * r.closurePercent.C  // => 102   (C in 10, out 3 + 7.2)
 * @category Stoichiometry
 * @see C. F. Gauss, Theoria combinationis observationum erroribus minimis obnoxiae (1821–1823): least squares through the normal equations; element-balance closure: common practice
 */
export function reconcileExtents(input: ReconcileExtentsInput, options: ReconcileExtentsOptions = {}): ReconcileExtentsResult {
  options = optionsOf(options, "reconcileExtents", "options", OPTION_KEYS);
  const fn = "reconcileExtents";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { feed, reactions, measured }`, {});
  }
  const sys = buildSystem(input.feed, input.reactions, fn);
  validateFlows(input.measured, fn, "measured", false);
  const weights = options.weights ?? {};
  const R = sys.reactions.length;
  const measuredIdx: number[] = [];
  const measuredQ: Rational[] = [];
  const weightQ: Rational[] = [];
  const seen = new Set<number>();
  for (const [key, value] of Object.entries(input.measured)) {
    const s = resolveSpecies(sys, key, fn);
    if (s === undefined) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: measured species ${key} is in neither the feed nor any reaction`, { species: key });
    }
    if (seen.has(s)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: species ${sys.species[s]} is measured twice (as ${key})`, { species: key });
    }
    seen.add(s);
    const w = weights[key] ?? weights[sys.species[s] as string] ?? 1;
    if (typeof w !== "number" || !Number.isFinite(w) || w <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires weights > 0, got ${describeValue(w)} for ${key}`, { species: key, weight: w });
    }
    measuredIdx.push(s);
    measuredQ.push(rationalFromNumber(value));
    weightQ.push(rationalFromNumber(w));
  }
  const informative = measuredIdx.filter((s) => sys.reacting[s]).length;
  if (informative < R) {
    throw new RxthermError(
      "SPEC_COUNT_MISMATCH",
      `${fn} needs measured outlet flows of at least ${R} species taking part in the reactions, got ${informative}`,
      { needed: R, given: informative, missing: R - informative },
    );
  }
  // normal equations
  const A: Rational[][] = Array.from({ length: R }, () => new Array<Rational>(R).fill(ZERO));
  const b: Rational[] = new Array<Rational>(R).fill(ZERO);
  measuredIdx.forEach((s, k) => {
    const w = weightQ[k] as Rational;
    const target = rationalSub(measuredQ[k] as Rational, sys.feedQ[s] as Rational);
    for (let i = 0; i < R; i++) {
      const ni = (sys.nu[i] as Rational[])[s] as Rational;
      if (rationalIsZero(ni)) continue;
      const wni = rationalMul(w, ni);
      b[i] = rationalAdd(b[i] as Rational, rationalMul(wni, target));
      const Ai = A[i] as Rational[];
      for (let j = 0; j < R; j++) {
        const nj = (sys.nu[j] as Rational[])[s] as Rational;
        if (!rationalIsZero(nj)) Ai[j] = rationalAdd(Ai[j] as Rational, rationalMul(wni, nj));
      }
    }
  });
  const sol = solveLinearSystem(A, b);
  if (sol.kind !== "unique") {
    throw new RxthermError(
      "SINGULAR_SPECS",
      `${fn}: the measured species (${measuredIdx.map((s) => sys.species[s]).join(", ")}) cannot separate the ${R} extents (rank ${sol.rank})`,
      { rank: sol.rank, measured: measuredIdx.map((s) => sys.species[s]) },
    );
  }
  const xi = sol.solution;
  const outQ: Rational[] = sys.species.map((_, s) => {
    let v = sys.feedQ[s] as Rational;
    for (let j = 0; j < R; j++) {
      const c = (sys.nu[j] as Rational[])[s] as Rational;
      if (!rationalIsZero(c)) v = rationalAdd(v, rationalMul(c, xi[j] as Rational));
    }
    return v;
  });
  const outlet: Flows = {};
  sys.species.forEach((key, s) => (outlet[key] = rationalToNumber(outQ[s] as Rational)));
  const residuals: Flows = {};
  let ss: Rational = ZERO;
  measuredIdx.forEach((s, k) => {
    const r = rationalSub(measuredQ[k] as Rational, outQ[s] as Rational);
    residuals[sys.species[s] as string] = rationalToNumber(r);
    ss = rationalAdd(ss, rationalMul(weightQ[k] as Rational, rationalMul(r, r)));
  });
  // closure: measured values where measured, reconciled flows elsewhere
  const outForClosure: Rational[] = outQ.slice();
  measuredIdx.forEach((s, k) => (outForClosure[s] = measuredQ[k] as Rational));
  const elIn = new Map<string, Rational>();
  const elOut = new Map<string, Rational>();
  sys.species.forEach((_, s) => {
    for (const [el, count] of Object.entries(sys.formulas[s]?.elements ?? {})) {
      const c = rationalFromNumber(count);
      elIn.set(el, rationalAdd(elIn.get(el) ?? ZERO, rationalMul(c, sys.feedQ[s] as Rational)));
      elOut.set(el, rationalAdd(elOut.get(el) ?? ZERO, rationalMul(c, outForClosure[s] as Rational)));
    }
  });
  const closurePercent: Record<string, number> = {};
  for (const [el, vin] of elIn) {
    if (rationalIsZero(vin)) continue;
    closurePercent[el] = rationalToNumber(rationalMul(rationalDiv(elOut.get(el) ?? ZERO, vin), rationalFromNumber(100)));
  }
  const unmeasured = sys.species.filter((_, s) => !seen.has(s));
  return attachView(finiteResult({
    extents: xi.map(rationalToNumber),
    outlet,
    residuals,
    sumOfSquares: rationalToNumber(ss),
    closurePercent,
    unmeasured,
  }, fn), RECONCILE_VIEW);
}

const ZERO: Rational = /* @__PURE__ */ rationalFromNumber(0);
