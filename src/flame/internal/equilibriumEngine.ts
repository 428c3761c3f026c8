/**
 * Private: a prepared equilibrium problem over real species data — element bookkeeping
 * (elements absent from the feed removed, species holding them excluded, dependent element rows
 * dropped), thermochemistry at T, the fixed-T solve and the fixed-enthalpy (or fixed-energy)
 * temperature solve with warm starts. Used by equilibriumComposition, adiabaticFlameTemperature
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
import {
  coldStart,
  createGibbsState,
  elementResidual,
  equilibriumDerivatives,
  solveGibbsRobust,
  type GibbsConditions,
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
  /** Included product species (columns). */
  readonly keys: readonly string[];
  readonly species: readonly Species[];
  /** Product keys left out because they hold an element absent from the feed. */
  readonly excluded: readonly string[];
  /** Every element of the feed (rows of aAll / bAll). */
  readonly elements: readonly string[];
  readonly aAll: Float64Array;
  /** Element amounts of the feed, mol. */
  readonly bAll: Float64Array;
  /** Normalising factor: Σ bAll (the core works with b / scale). */
  scale: number;
  /** Indices (into elements) of the independent rows used by the core. */
  readonly rows: readonly number[];
  readonly problem: GibbsProblem;
  readonly state: GibbsState;
  /** Data-range intersection of the product species, K. */
  readonly rangeK: readonly [number, number];
  readonly mu0: Float64Array;
  readonly hRT: Float64Array;
  readonly cpR: Float64Array;
  /** Scratch: d ln n_j/dT and dn_k/dT. */
  readonly dlnT: Float64Array;
  readonly dncT: Float64Array;
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
 */
export function prepareEngine(
  fn: string,
  products: readonly { key: string; species: Species }[],
  feedElements: ReadonlyMap<string, number>,
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
  const aAll = new Float64Array(mAll * ns);
  const bAll = new Float64Array(mAll);
  for (let i = 0; i < mAll; i++) {
    bAll[i] = feedElements.get(elements[i]!)!;
    for (let j = 0; j < ns; j++) aAll[i * ns + j] = species[j]!.formula.elements[elements[i]!] ?? 0;
  }
  // whether the products can hold the feed's element ratios is decided only when a solve fails
  // (solveAtT, acceptSolution): a converged solve proves it, and the test costs more than the solve
  const rows = independentRows(aAll, mAll, ns, bAll);
  const m = rows.length;
  const a = new Float64Array(m * ns);
  const b = new Float64Array(m);
  let scale = 0;
  for (let i = 0; i < mAll; i++) scale += bAll[i]!;
  rows.forEach((r, i) => {
    b[i] = bAll[r]! / scale;
    for (let j = 0; j < ns; j++) a[i * ns + j] = aAll[r * ns + j]!;
  });
  const gas = new Uint8Array(ns);
  let lo = -Infinity;
  let hi = Infinity;
  for (let j = 0; j < ns; j++) {
    const s = species[j]!;
    gas[j] = s.phase === "g" ? 1 : 0;
    lo = Math.max(lo, s.range[0]);
    hi = Math.min(hi, s.range[1]);
  }
  const problem: GibbsProblem = { m, ns, a, gas, b };
  return {
    fn, keys, species, excluded, elements, aAll, bAll, scale, rows, problem,
    state: createGibbsState(problem),
    rangeK: [lo, hi],
    mu0: new Float64Array(ns),
    hRT: new Float64Array(ns),
    cpR: new Float64Array(ns),
    dlnT: new Float64Array(ns),
    dncT: new Float64Array(ns),
    thermoT: Number.NaN,
    iterations: 0,
    extrapolated: false,
  };
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
    const s = e.species[j]!;
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
 * Throws NO_CONVERGENCE (after a cold restart) or ELEMENTS_NOT_COVERED.
 */
export function solveAtT(e: Engine, T: number, kind: "P" | "V", pOrV: number, lim: EngineLimits): void {
  evaluateThermo(e, T, lim);
  const lnP = kind === "P" ? Math.log(pOrV / STANDARD_PRESSURE_PA) : Math.log((e.scale * R * T) / (pOrV * STANDARD_PRESSURE_PA));
  const c: GibbsConditions = { mu0: e.mu0, kind, lnP };
  const out = solveGibbsRobust(e.problem, c, e.state, { maxIterations: lim.maxIterations, elementTolerance: lim.elementTolerance });
  e.iterations += out.iterations;
  if (!out.converged) {
    coldStart(e.problem, e.state);
    checkCovered(e.fn, e.aAll, e.elements.length, e.problem.ns, e.bAll, e.keys);
    throw new RxthermError(
      "NO_CONVERGENCE",
      `${e.fn} did not reach equilibrium at T = ${T} K within ${lim.maxIterations} iterations (${out.reason ?? "no progress"})`,
      { T, iterations: out.iterations, elementResidual: out.elementResidual, reason: out.reason ?? null },
    );
  }
  acceptSolution(e, T, lim, null);
}

/**
 * The one check every equilibrium result passes before it is returned (fixed-T solves, the
 * temperature search, flame points): every feed element — the dependent rows dropped from the
 * core included — balances to `elementTolerance` (relative to that element's own amount), and,
 * with an energy target, the energy residual is within `toleranceK` times the frozen heat
 * capacity (a lower bound of the equilibrium one, so the temperature is within `toleranceK`).
 * Throws ELEMENTS_NOT_COVERED when an element misses by more than 1e-6 (the product set cannot
 * hold the feed's ratios), NO_CONVERGENCE otherwise.
 */
export function acceptSolution(e: Engine, T: number, lim: EngineLimits, energy: { residual: number; capacity: number } | null): void {
  const res = fullElementResidual(e);
  if (!(res <= lim.elementTolerance)) {
    coldStart(e.problem, e.state);
    checkCovered(e.fn, e.aAll, e.elements.length, e.problem.ns, e.bAll, e.keys);
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

/** Amount (mol, unscaled) of species j at the current state. */
export function amount(e: Engine, j: number): number {
  return (e.problem.gas[j] ? Math.exp(e.state.lnn[j]!) : e.state.nc[j]!) * e.scale;
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
