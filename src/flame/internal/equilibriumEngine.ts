/**
 * Private: a prepared equilibrium problem over real species data — element bookkeeping
 * (elements absent from the feed removed, species holding them excluded, dependent element rows
 * dropped, and after a failed solve the products no composition of the feed can hold set to zero),
 * thermochemistry at T, the fixed-T solve and the fixed-enthalpy (or fixed-energy) temperature
 * solve with warm starts. Used by equilibriumComposition, adiabaticFlameTemperature
 * and flameTemperatureSweep.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_PRESSURE_PA, slipHintDetails, withSlipHint } from "../../units.js";
import { increasingNewton } from "../../numeric/increasingNewton.js";
import type { Species } from "../../species/types.js";
import { nonNegativeLeastSquares } from "../../numeric/nonNegativeLeastSquares.js";
import { nonNegativeSolution } from "../../numeric/nonNegativeSolution.js";
import {
  coldStart,
  createGibbsState,
  elementResidual,
  equilibriumDerivatives,
  solveGibbsRobust,
  type GibbsConditions,
  type GibbsOutcome,
  type GibbsProblem,
  type GibbsState,
} from "./gibbsMinimizer.js";

const R = GAS_CONSTANT_J_PER_MOL_K;

/** Solver limits shared by the equilibrium routines. */
export interface EngineLimits {
  maxIterations: number;
  elementTolerance: number;
  toleranceK: number;
  extrapolate: boolean;
}

/** A prepared equilibrium problem. */
export interface Engine {
  readonly fn: string;
  /** Included product species (results list every one of them). */
  readonly keys: readonly string[];
  readonly species: readonly Species[];
  /** 1 for a gas, per included product species. */
  readonly gasAll: Uint8Array;
  /** Product keys left out because they hold an element absent from the feed. */
  readonly excluded: readonly string[];
  /** Every element of the feed (rows of aFull / aAll / bAll). */
  readonly elements: readonly string[];
  /** Element matrix of every included product species, row-major (elements × keys). */
  readonly aFull: Float64Array;
  /**
   * The element counts of each feed species, or null when the feed was given as element amounts.
   * Used to find the species that no non-negative composition of the feed's elements can hold
   * (see {@link reduceToSupport}).
   */
  readonly feedSpecies: readonly Readonly<Record<string, number>>[] | null;
  /** Element amounts of the feed, mol. */
  readonly bAll: Float64Array;
  /** Normalising factor: Σ bAll (the core works with b / scale). */
  scale: number;
  // ── the core: the species the minimiser works on (all included species, or after reduceToSupport
  //    those that can be positive); arrays below are indexed by core position ──
  /** Index into keys → core position, or −1 for a species held at zero; null while the core is every species. */
  col: Int32Array | null;
  /** True once the core was cut to the species that can be positive (done at most once). */
  reduced: boolean;
  /** Element matrix of the core species (elements × core). */
  aAll: Float64Array;
  /** Indices (into elements) of the independent rows used by the core. */
  rows: number[];
  problem: GibbsProblem;
  state: GibbsState;
  coreSpecies: Species[];
  /** Data-range intersection of the product species, K. */
  readonly rangeK: readonly [number, number];
  mu0: Float64Array;
  hRT: Float64Array;
  cpR: Float64Array;
  /** Scratch: d ln n_j/dT and dn_k/dT. */
  dlnT: Float64Array;
  dncT: Float64Array;
  /** Temperature at which mu0/hRT/cpR were last evaluated (NaN before). */
  thermoT: number;
  /** Iterations spent by the core since the last reset of this counter. */
  iterations: number;
  /** True once a temperature outside rangeK was used. */
  extrapolated: boolean;
}

/**
 * Prepare an equilibrium problem.
 * @param products - resolved product species (key, species), in the caller's order
 * @param feedElements - element symbol → mol of atoms (zero entries ignored)
 * @param feedSpecies - the element counts of each feed species of positive amount, or null when the
 *   feed is given as element amounts
 */
export function prepareEngine(
  fn: string,
  products: readonly { key: string; species: Species }[],
  feedElements: ReadonlyMap<string, number>,
  feedSpecies: readonly Readonly<Record<string, number>>[] | null = null,
): Engine {
  const elements = [...feedElements.entries()].filter(([, v]) => v > 0).map(([e]) => e).sort();
  if (elements.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a feed with a positive amount of some element`, {});
  }
  const inFeed = new Set(elements);
  const keys: string[] = [];
  const species: Species[] = [];
  const excluded: string[] = [];
  const seen = new Set<string>();
  for (const p of products) {
    if (seen.has(p.species.key)) continue;
    seen.add(p.species.key);
    const els = Object.keys(p.species.formula.elements).filter((e) => (p.species.formula.elements[e] ?? 0) !== 0);
    if (els.length === 0) continue;
    if (els.every((e) => inFeed.has(e))) {
      keys.push(p.species.key);
      species.push(p.species);
    } else {
      excluded.push(p.species.key);
    }
  }
  const ns = species.length;
  const missing = elements.filter((e) => !species.some((s) => (s.formula.elements[e] ?? 0) > 0));
  if (missing.length > 0) {
    throw new RxthermError(
      "ELEMENTS_NOT_COVERED",
      `${fn} requires a product set that holds every element of the feed; none of the products holds ${missing.join(", ")}`,
      { elements: missing, products: products.map((p) => p.key) },
    );
  }
  if (!species.some((s) => s.phase === "g")) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one gas species in the product set`, { products: keys });
  }
  const mAll = elements.length;
  const aFull = new Float64Array(mAll * ns);
  const bAll = new Float64Array(mAll);
  for (let i = 0; i < mAll; i++) {
    bAll[i] = feedElements.get(elements[i]!)!;
    for (let j = 0; j < ns; j++) aFull[i * ns + j] = species[j]!.formula.elements[elements[i]!] ?? 0;
  }
  let scale = 0;
  for (let i = 0; i < mAll; i++) scale += bAll[i]!;
  const gasAll = new Uint8Array(ns);
  let lo = -Infinity;
  let hi = Infinity;
  for (let j = 0; j < ns; j++) {
    const s = species[j]!;
    gasAll[j] = s.phase === "g" ? 1 : 0;
    lo = Math.max(lo, s.range[0]);
    hi = Math.min(hi, s.range[1]);
  }
  // every field in one literal (one object shape for the hot paths); setCore fills the core
  const e: Engine = {
    fn, keys, species, gasAll, excluded, elements, aFull, feedSpecies, bAll, scale,
    col: null, reduced: false, aAll: aFull, rows: [],
    problem: null as unknown as GibbsProblem, state: null as unknown as GibbsState, coreSpecies: species,
    rangeK: [lo, hi],
    mu0: aFull, hRT: aFull, cpR: aFull, dlnT: aFull, dncT: aFull,
    thermoT: Number.NaN,
    iterations: 0,
    extrapolated: false,
  };
  // whether the products can hold the feed's element ratios is decided only when a solve fails
  // (solveAtT, acceptSolution): a converged solve proves it, and the test costs more than the solve
  setCore(e, null);
  return e;
}

/**
 * Make the given species (indices into keys, ascending; null for all of them) the core of the
 * minimiser, from a cold start.
 */
function setCore(e: Engine, cols: readonly number[] | null): void {
  const ns = e.keys.length;
  const nc = cols === null ? ns : cols.length;
  const mAll = e.elements.length;
  let aAll = e.aFull;
  if (cols !== null) {
    aAll = new Float64Array(mAll * nc);
    for (let i = 0; i < mAll; i++) for (let k = 0; k < nc; k++) aAll[i * nc + k] = e.aFull[i * ns + cols[k]!]!;
  }
  const rows = independentRows(aAll, mAll, nc, e.bAll);
  const m = rows.length;
  const a = new Float64Array(m * nc);
  const b = new Float64Array(m);
  rows.forEach((r, i) => {
    b[i] = e.bAll[r]! / e.scale;
    for (let k = 0; k < nc; k++) a[i * nc + k] = aAll[r * nc + k]!;
  });
  let gas = e.gasAll;
  if (cols === null) {
    e.col = null;
    e.coreSpecies = e.species as Species[];
  } else {
    gas = Uint8Array.from(cols, (j) => e.gasAll[j]!);
    const col = new Int32Array(ns).fill(-1);
    cols.forEach((j, k) => {
      col[j] = k;
    });
    e.col = col;
    e.coreSpecies = cols.map((j) => e.species[j]!);
  }
  const problem: GibbsProblem = { m, ns: nc, a, gas, b };
  e.aAll = aAll;
  e.rows = rows;
  e.problem = problem;
  e.state = createGibbsState(problem);
  e.mu0 = new Float64Array(nc);
  e.hRT = new Float64Array(nc);
  e.cpR = new Float64Array(nc);
  e.dlnT = new Float64Array(nc);
  e.dncT = new Float64Array(nc);
  e.thermoT = Number.NaN;
}

/** Replace the feed element amounts (same element set) for a warm-started new point. */
export function setFeedElements(e: Engine, feedElements: ReadonlyMap<string, number>): boolean {
  const present = [...feedElements.entries()].filter(([, v]) => v > 0).map(([k]) => k).sort();
  if (present.length !== e.elements.length || present.some((k, i) => k !== e.elements[i])) return false;
  let scale = 0;
  for (let i = 0; i < e.elements.length; i++) {
    e.bAll[i] = feedElements.get(e.elements[i]!)!;
    scale += e.bAll[i]!;
  }
  // the warm state is kept in normalised amounts (b / scale), so it stays a good start
  e.scale = scale;
  e.rows.forEach((r, i) => {
    (e.problem.b as Float64Array)[i] = e.bAll[r]! / scale;
  });
  return true;
}

/** Evaluate g°/RT, h/RT and cp/R of every product species at T. */
export function evaluateThermo(e: Engine, T: number, lim: EngineLimits): void {
  if (T === e.thermoT) return;
  const opts = { extrapolate: lim.extrapolate };
  if (T < e.rangeK[0] || T > e.rangeK[1]) {
    if (!lim.extrapolate) {
      const worst = e.species.find((sp) => T < sp.range[0] || T > sp.range[1]);
      throw new RxthermError(
        "OUT_OF_RANGE",
        `${e.fn} needs product data at ${T} K, outside the common data range [${e.rangeK[0]}, ${e.rangeK[1]}] K of the product set (${worst?.key ?? "?"} covers [${worst?.range[0]}, ${worst?.range[1]}] K)${withSlipHint(T)}`,
        { T, range: [e.rangeK[0], e.rangeK[1]], species: worst?.key ?? null, ...slipHintDetails(T) },
      );
    }
    e.extrapolated = true;
  }
  for (let j = 0; j < e.problem.ns; j++) {
    const s = e.coreSpecies[j]!;
    const h = s.enthalpy(T, opts);
    const sEnt = s.entropy(T, STANDARD_PRESSURE_PA, opts);
    e.hRT[j] = h / (R * T);
    e.mu0[j] = (h - T * sEnt) / (R * T);
    e.cpR[j] = s.cp(T, opts) / R;
  }
  e.thermoT = T;
}

/**
 * Equilibrium at fixed T and P (kind "P", pressure in Pa) or T and V (kind "V", volume in m³).
 * When a solve fails (no convergence, or a converged core whose full element balance misses), the
 * core is cut once to the species that can be positive ({@link reduceToSupport}) and solved again.
 * Throws NO_CONVERGENCE (after a cold restart) or ELEMENTS_NOT_COVERED.
 */
export function solveAtT(e: Engine, T: number, kind: "P" | "V", pOrV: number, lim: EngineLimits): void {
  let out = solveCore(e, T, kind, pOrV, lim);
  let res = out.converged ? fullElementResidual(e) : Number.NaN;
  if (!(res <= lim.elementTolerance) && reduceToSupport(e)) {
    out = solveCore(e, T, kind, pOrV, lim);
    res = out.converged ? fullElementResidual(e) : Number.NaN;
  }
  if (out.converged && !(res <= lim.elementTolerance)) {
    // the core balances, a dependent row does not: it is a sum of core rows with coefficients
    // (up to 8 for the H of C3H8), so the core's own residual must be that much smaller
    out = solveCore(e, T, kind, pOrV, { ...lim, elementTolerance: lim.elementTolerance / 64 });
    res = out.converged ? fullElementResidual(e) : Number.NaN;
  }
  if (!out.converged) {
    coldStart(e.problem, e.state);
    checkCovered(e.fn, e.aFull, e.elements.length, e.keys.length, e.bAll, e.keys);
    throw new RxthermError(
      "NO_CONVERGENCE",
      `${e.fn} did not reach equilibrium at T = ${T} K within ${lim.maxIterations} iterations (${out.reason ?? "no progress"})`,
      { T, iterations: out.iterations, elementResidual: out.elementResidual, reason: out.reason ?? null },
    );
  }
  acceptSolution(e, T, lim, null, res);
}

/** One solve of the core at T (warm or cold, with the restarts of solveGibbsRobust). */
function solveCore(e: Engine, T: number, kind: "P" | "V", pOrV: number, lim: EngineLimits): GibbsOutcome {
  evaluateThermo(e, T, lim);
  const lnP = kind === "P" ? Math.log(pOrV / STANDARD_PRESSURE_PA) : Math.log((e.scale * R * T) / (pOrV * STANDARD_PRESSURE_PA));
  const c: GibbsConditions = { mu0: e.mu0, kind, lnP };
  const out = solveGibbsRobust(e.problem, c, e.state, { maxIterations: lim.maxIterations, elementTolerance: lim.elementTolerance });
  e.iterations += out.iterations;
  return out;
}

/**
 * Cut the core to the species that can be positive, once per engine, when the feed was given as
 * species: a product whose every non-negative composition holding the feed's elements has it at
 * zero (e.g. CH4 among He, CH4, HCl and CO with HCl, CO and He fed: CH4 = (H − Cl)/4 = 0) drives its ln n and
 * the element potentials without bound, and the dependent element rows it leaves make the core
 * matrix singular. Which products can be positive depends only on which species were fed, not on
 * their amounts (the feed lies inside the face of the products' cone that holds every feed
 * species), so it is decided on small integers — the feed species' element counts — and a trace
 * feed at 1e-12 decides it as firmly as a major one. Species held at zero report amount 0.
 * Returns true when the core changed (the caller solves again).
 */
export function reduceToSupport(e: Engine): boolean {
  if (e.reduced || e.feedSpecies === null) return false;
  e.reduced = true;
  const m = e.elements.length;
  const ns = e.keys.length;
  // the sum of the feed species' element counts: inside the same face as the feed, whatever the amounts
  const g = new Float64Array(m);
  for (const f of e.feedSpecies) for (let i = 0; i < m; i++) g[i] = g[i]! + (f[e.elements[i]!] ?? 0);
  if (!g.some((v) => v > 0)) return false;
  const can = positiveSupport(e.aFull, m, ns, g);
  if (can === null) return false; // the products cannot hold the feed at all: checkCovered says so
  const keep: number[] = [];
  let gas = false;
  for (let j = 0; j < ns; j++) {
    if (!can[j]) continue;
    keep.push(j);
    if (e.gasAll[j]) gas = true;
  }
  if (keep.length === ns || !gas) return false;
  setCore(e, keep);
  return true;
}

/**
 * Which columns of A (m × ns, non-negative integers) are positive in some x ≥ 0 with A x = t·g,
 * t > 0 (g: non-negative integers); null when there is no such x. Column j can be positive when
 * A y − t·g = −a_j has a solution y, t ≥ 0 (then A (y + e_j) = t·g, and t > 0 as A ≥ 0); a
 * feasible test also marks every other column its solution uses. One test covers all undecided
 * columns at once (they can be positive together if each can), so the usual case — every product
 * can be present — costs two small linear programmes; each further one decides at least one column.
 */
function positiveSupport(a: Float64Array, m: number, ns: number, g: Float64Array): Uint8Array | null {
  const first = nonNegativeSolution(a, m, ns, g);
  if (first === null) return null;
  const can = new Uint8Array(ns);
  const mark = (x: Float64Array): void => {
    let big = 0;
    for (let j = 0; j < ns; j++) big = Math.max(big, x[j]!);
    for (let j = 0; j < ns; j++) if (x[j]! > 1e-9 * big) can[j] = 1;
  };
  mark(first);
  const w = ns + 1;
  const bMat = new Float64Array(m * w);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < ns; j++) bMat[i * w + j] = a[i * ns + j]!;
    bMat[i * w + ns] = -g[i]!;
  }
  const rhs = new Float64Array(m);
  const test = (cols: readonly number[]): boolean => {
    rhs.fill(0);
    for (const j of cols) for (let i = 0; i < m; i++) rhs[i] = rhs[i]! - a[i * ns + j]!;
    const x = nonNegativeSolution(bMat, m, w, rhs);
    if (x === null) return false;
    for (const j of cols) can[j] = 1;
    mark(x.subarray(0, ns));
    return true;
  };
  const rest: number[] = [];
  for (let j = 0; j < ns; j++) if (!can[j]) rest.push(j);
  if (rest.length === 0 || test(rest)) return can;
  for (const j of rest) if (!can[j]) test([j]);
  return can;
}

/**
 * The one check every equilibrium result passes before it is returned (fixed-T solves, the
 * temperature search, flame points): every feed element — the dependent rows dropped from the
 * core included — balances to `elementTolerance` (relative to that element's own amount), and,
 * with an energy target, the energy residual is within `toleranceK` times the frozen heat
 * capacity (a lower bound of the equilibrium one, so the temperature is within `toleranceK`).
 * Throws ELEMENTS_NOT_COVERED when an element misses by more than 1e-6 (the product set cannot
 * hold the feed's ratios), NO_CONVERGENCE otherwise. `res` is the full element residual of the
 * current state when the caller has just computed it.
 */
export function acceptSolution(
  e: Engine, T: number, lim: EngineLimits, energy: { residual: number; capacity: number } | null,
  res: number = fullElementResidual(e),
): void {
  if (!(res <= lim.elementTolerance)) {
    coldStart(e.problem, e.state);
    checkCovered(e.fn, e.aFull, e.elements.length, e.keys.length, e.bAll, e.keys);
    if (res > 1e-6) {
      throw new RxthermError(
        "ELEMENTS_NOT_COVERED",
        `${e.fn} requires a product set that can hold the feed's element ratios; the closest composition misses an element balance by ${res.toExponential(2)} (relative)`,
        { elementResidual: res, products: [...e.keys] },
      );
    }
    throw new RxthermError(
      "NO_CONVERGENCE",
      `${e.fn} did not reach equilibrium at T = ${T} K: element residual ${res.toExponential(2)} above the tolerance ${lim.elementTolerance}`,
      { T, elementResidual: res, reason: "element residual above tolerance" },
    );
  }
  if (energy !== null && !(Math.abs(energy.residual) <= lim.toleranceK * energy.capacity)) {
    coldStart(e.problem, e.state);
    throw new RxthermError(
      "NO_CONVERGENCE",
      `${e.fn} did not close the energy balance: residual ${energy.residual.toExponential(2)} J at T = ${T} K exceeds ${lim.toleranceK} K times the heat capacity ${energy.capacity.toExponential(3)} J/K`,
      { T, energyResidual: energy.residual, reason: "energy residual above tolerance" },
    );
  }
}

/** Max relative element residual over every feed element. */
export function fullElementResidual(e: Engine): number {
  const { ns, gas } = e.problem;
  let worst = 0;
  for (let i = 0; i < e.elements.length; i++) {
    let sum = 0;
    for (let j = 0; j < ns; j++) {
      const aij = e.aAll[i * ns + j]!;
      if (aij !== 0) sum += aij * (gas[j] ? Math.exp(e.state.lnn[j]!) : e.state.nc[j]!);
    }
    const bi = e.bAll[i]! / e.scale;
    worst = Math.max(worst, Math.abs(sum - bi) / bi);
  }
  return Math.max(worst, elementResidual(e.problem, e.state));
}

/** Amount (mol, unscaled) of included species j (index into keys) at the current state: 0 for a species held at zero. */
export function amount(e: Engine, j: number): number {
  const k = e.col === null ? j : e.col[j]!;
  if (k < 0) return 0;
  return (e.problem.gas[k] ? Math.exp(e.state.lnn[k]!) : e.state.nc[k]!) * e.scale;
}

/** h/(R T) of included species j (index into keys) at the last evaluated temperature (0 for a species held at zero). */
export function enthalpyRT(e: Engine, j: number): number {
  const k = e.col === null ? j : e.col[j]!;
  return k < 0 ? 0 : e.hRT[k]!;
}

/**
 * Enthalpy (kind "P") or internal energy (kind "V") of the equilibrium mixture at the current
 * state, J, and its total temperature derivative along the equilibrium, J/K.
 */
export function energyAndSlope(e: Engine, T: number, kind: "P" | "V", withSlope = true): { value: number; slope: number; frozen: number } {
  const { ns, gas } = e.problem;
  const dln = e.dlnT;
  const dnc = e.dncT;
  const c: GibbsConditions = { mu0: e.mu0, kind, lnP: 0 };
  const ok = withSlope && equilibriumDerivatives(e.problem, c, e.state, T, e.hRT, dln, dnc);
  let value = 0;
  let slope = 0;
  let frozen = 0;
  for (let j = 0; j < ns; j++) {
    const isGas = gas[j] === 1;
    const n = isGas ? Math.exp(e.state.lnn[j]!) : e.state.nc[j]!;
    if (n === 0) continue;
    const h = e.hRT[j]! * R * T;
    const cp = e.cpR[j]! * R;
    const u = kind === "V" && isGas ? h - R * T : h;
    const cu = kind === "V" && isGas ? cp - R : cp;
    value += n * u;
    slope += n * cu;
    frozen += n * cu;
    if (ok) slope += isGas ? u * n * dln[j]! : u * dnc[j]!;
  }
  return { value: value * e.scale, slope: slope * e.scale, frozen: frozen * e.scale };
}

/**
 * Temperature at which the equilibrium mixture has enthalpy (kind "P") or internal energy
 * (kind "V") `target` (J), by bracketed Newton on T using the equilibrium heat capacity,
 * warm-starting each inner solve. Returns the temperature, the outer iteration count and
 * the energy residual (J).
 */
export function solveEnergy(
  e: Engine,
  target: number,
  kind: "P" | "V",
  pOrV: number,
  guessK: number,
  lim: EngineLimits,
): { T: number; outerIterations: number; residual: number } {
  const limits: [number, number] = lim.extrapolate ? [Math.min(e.rangeK[0], 200), Math.max(e.rangeK[1], 6000)] : [e.rangeK[0], e.rangeK[1]];
  let cachedT = Number.NaN;
  let cached = { value: 0, slope: 0, frozen: 0 };
  const at = (T: number): { value: number; slope: number; frozen: number } => {
    if (T !== cachedT) {
      solveAtT(e, T, kind, pOrV, lim);
      cached = energyAndSlope(e, T, kind);
      cachedT = T;
    }
    return cached;
  };
  const root = increasingNewton(e.fn, (T) => {
    const v = at(T);
    return { value: v.value - target, slope: v.slope };
  }, guessK, limits, lim.toleranceK, 100);
  // polish: the search stops when its Newton step is below toleranceK, judged with the slope it
  // computed; a few more steps bring the residual within toleranceK times the frozen heat
  // capacity, which bounds the temperature error whatever the slope
  let T = root.x;
  let outer = root.iterations;
  let v = at(T);
  for (let k = 0; k < 4 && !(Math.abs(v.value - target) <= lim.toleranceK * v.frozen); k++) {
    const slope = v.slope >= v.frozen && Number.isFinite(v.slope) ? v.slope : v.frozen;
    const next = Math.min(Math.max(T - (v.value - target) / slope, limits[0]), limits[1]);
    if (next === T) break;
    T = next;
    v = at(T);
    outer++;
  }
  const residual = v.value - target;
  acceptSolution(e, T, lim, { residual, capacity: v.frozen });
  // probes of the search outside the range do not count; the answer does
  e.extrapolated = T < e.rangeK[0] || T > e.rangeK[1];
  return { T, outerIterations: outer, residual };
}

/**
 * Throw ELEMENTS_NOT_COVERED unless some non-negative amounts of the products hold the feed's
 * elements (non-negative least squares; a relative residual above 1e-6 means they cannot — the active-set
 * method resolves trace shares only to about 1e-8 of an element, so the test leaves a margin).
 */
function checkCovered(fn: string, a: Float64Array, m: number, ns: number, b: Float64Array, keys: readonly string[]): void {
  const scaled = new Float64Array(m);
  let sum = 0;
  for (let i = 0; i < m; i++) sum += b[i]!;
  for (let i = 0; i < m; i++) scaled[i] = b[i]! / sum;
  const { residual } = nonNegativeLeastSquares(a, m, ns, scaled);
  if (residual > 1e-6) {
    throw new RxthermError(
      "ELEMENTS_NOT_COVERED",
      `${fn} requires a product set that can hold the feed's element ratios; no non-negative amounts of ${keys.join(", ")} do (closest misses an element by ${residual.toExponential(2)}, relative)`,
      { elementResidual: residual, products: [...keys] },
    );
  }
}

/**
 * Indices of a maximal set of linearly independent rows of a (m × n), taken greedily in order of
 * increasing element amount `b`: a dependent element is then a sum of smaller ones, never a
 * difference of larger ones (a trace element derived as O − C would lose its digits to
 * cancellation, e.g. S from CO and SO2 with S at 2e-6 of the feed).
 */
function independentRows(a: Float64Array, m: number, n: number, b: Float64Array): number[] {
  const order = Array.from({ length: m }, (_, i) => i).sort((x, y) => b[x]! - b[y]! || x - y);
  const basis: { row: Float64Array; col: number }[] = [];
  const chosen: number[] = [];
  for (const i of order) {
    const w = a.slice(i * n, (i + 1) * n);
    for (const { row, col } of basis) {
      const f = w[col]! / row[col]!;
      if (f !== 0) for (let k = 0; k < n; k++) w[k] = w[k]! - f * row[k]!;
    }
    let col = -1;
    let best = 1e-9;
    for (let k = 0; k < n; k++) {
      if (Math.abs(w[k]!) > best) {
        best = Math.abs(w[k]!);
        col = k;
      }
    }
    if (col < 0) continue;
    basis.push({ row: w, col });
    chosen.push(i);
  }
  return chosen.sort((x, y) => x - y);
}
