/**
 * Private: a prepared adiabatic-flame problem — fuel, oxidizer and diluent resolved once, the
 * stoichiometry (theoretical O2, O2 carried per unit of oxidizer), complete-combustion products
 * with the water–gas-shift split for rich mixtures, the energy balance at constant pressure
 * (enthalpy) or constant volume (internal energy), and the equilibrium engine kept warm between
 * points. Shared by adiabaticFlameTemperature and flameTemperatureSweep.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_PRESSURE_PA, slipHintDetails, withSlipHint } from "../../units.js";
import { increasingNewton } from "../../numeric/increasingNewton.js";
import type { Flows } from "../../extent/types.js";
import type { Library, Species } from "../../species/types.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../../species/noteExtrapolation.js";
import { flameSpecies } from "./flameLinks.js";
import {
  amount,
  fullElementResidual,
  enthalpyRT,
  prepareEngine,
  setFeedElements,
  solveEnergy,
  type Engine,
  type EngineLimits,
} from "./equilibriumEngine.js";
import { describeValue } from "../../guards.js";

const R = GAS_CONSTANT_J_PER_MOL_K;

/** Noble gases: inert, carried through as monatomic gases. */
const NOBLE = ["He", "Ne", "Ar", "Kr", "Xe"];
const NOBLE_KEYS = NOBLE.map((g) => `${g}(g)`);
/** Elements the complete-combustion model knows. */
const COMPLETE_ELEMENTS = new Set(["C", "H", "O", "N", "S", ...NOBLE]);

/** One resolved stream member. */
interface Member {
  readonly key: string;
  readonly species: Species;
  /** mol per mol of the stream basis (fuel: as given; oxidizer: per unit; diluent: as given). */
  readonly n: number;
}

/** The settings of one flame point that a sweep may vary. */
export interface FlamePoint {
  /** Equivalence ratio φ (> 0). */
  phi: number;
  fuelT: number;
  oxidizerT: number;
  diluentT: number;
  /** Initial pressure, Pa. */
  P: number;
}

/** A prepared flame problem. */
export interface FlameSetup {
  readonly fn: string;
  readonly library: Library | undefined;
  readonly mode: "complete" | "equilibrium";
  readonly constantVolume: boolean;
  /** Equilibrium product keys (equilibrium mode). */
  readonly productKeys: readonly string[];
  /** The resolved reactants, their stoichiometry and the lazily resolved product species (shared between setups of the same content). */
  readonly reactants: Reactants;
  readonly lim: EngineLimits;
  engine: Engine | null;
  lastT: number;
  lastCompleteT: number;
}

/** Result of one solved point. */
export interface FlamePointResult {
  T: number;
  /** Final pressure, Pa. */
  P: number;
  moles: Record<string, number>;
  condensed: Record<string, number>;
  oxidizerMoles: Record<string, number>;
  reactantEnergy: number;
  residual: number;
  relativeResidual: number;
  iterations: number;
  equilibriumIterations: number;
  elementResidual: number;
  /** Reactants outside their data at their stream T, products outside theirs at the flame T. */
  extrapolated: ExtrapolatedPoint[];
  completeT: number | null;
}

/** Resolve a Flows-or-key input into members. */
export function resolveMembers(fn: string, what: string, flows: string | Flows, library: Library | undefined): Member[] {
  if (typeof flows === "string") {
    return [{ key: flows, species: flameSpecies(fn, flows, library), n: 1 }];
  }
  if (flows === null || typeof flows !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${what} as a species key or an object of amounts`, { [what]: flows });
  }
  const out: Member[] = [];
  for (const [key, n] of Object.entries(flows)) {
    if (typeof n !== "number" || !Number.isFinite(n) || n < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every ${what} amount to be a finite number ≥ 0, got ${describeValue(n)} for ${key}`, { species: key, amount: n });
    }
    if (n > 0) out.push({ key, species: flameSpecies(fn, key, library), n });
  }
  return out;
}

/** Element totals of members (scaled by `factor`) added into `into`. */
function addElements(into: Map<string, number>, members: readonly Member[], factor: number): void {
  if (factor === 0) return;
  for (let i = 0; i < members.length; i++) {
    const m = members[i]!;
    const e = m.species.formula.elements;
    for (const el in e) {
      const c = e[el]!;
      if (c !== 0) into.set(el, (into.get(el) ?? 0) + factor * m.n * c);
    }
  }
}

/** O2 demand of a set of members: C + H/4 + S − O/2 (mol O2), per their amounts. */
export function oxygenDemand(members: readonly Member[]): { demand: number; combustible: boolean } {
  let c = 0, h = 0, s = 0, o = 0;
  for (const m of members) {
    const e = m.species.formula.elements;
    c += m.n * (e.C ?? 0);
    h += m.n * (e.H ?? 0);
    s += m.n * (e.S ?? 0);
    o += m.n * (e.O ?? 0);
  }
  return { demand: c + h / 4 + s - o / 2, combustible: c > 0 || h > 0 || s > 0 };
}

/** Fuel, oxidizer and diluent resolved and checked: what a flame setup keeps between calls. */
interface Reactants {
  readonly fuel: readonly Member[];
  readonly oxidizer: readonly Member[];
  readonly diluent: readonly Member[];
  readonly theoreticalO2: number;
  readonly o2PerOxidizerUnit: number;
  /** Elements present in any of the three streams, and their totals per stream (oxidizer: per unit). */
  readonly elements: readonly string[];
  readonly fuelElements: Float64Array;
  readonly oxidizerElements: Float64Array;
  readonly diluentElements: Float64Array;
  /** Species of the products, resolved on first use (shared by every setup of these reactants). */
  readonly products: Map<string, Species>;
}

/** Largest number of distinct reactant sets kept per library. */
const REACTANT_CACHE_SIZE = 64;
/** Reactant sets resolved from the built-in library, by content. */
const builtInReactants = new Map<string, Reactants>();
/** Reactant sets resolved from a caller's library, by library and content. */
const libraryReactants = new WeakMap<Library, Map<string, Reactants>>();

/** Content keys of frozen streams (they cannot change, so identity is enough). */
const frozenKeys = new WeakMap<object, string>();

/** Content key of a stream (a species key or an object of amounts); null when it is not cacheable. */
function streamKey(flows: string | Flows | undefined): string | null {
  if (flows === undefined) return "";
  if (typeof flows === "string") return "s" + flows;
  if (flows === null || typeof flows !== "object") return null;
  const frozen = Object.isFrozen(flows);
  if (frozen) {
    const known = frozenKeys.get(flows);
    if (known !== undefined) return known;
  }
  const k = flowsKey(flows);
  if (frozen && k !== null) frozenKeys.set(flows, k);
  return k;
}

function flowsKey(flows: Flows): string | null {
  let k = "o";
  const keys = Object.keys(flows);
  for (let i = 0; i < keys.length; i++) {
    const n = flows[keys[i]!];
    if (typeof n !== "number") return null;
    k += keys[i]! + "\u0001" + n + "\u0001";
  }
  return k;
}

/**
 * Resolve the reactant streams once per distinct content (a small per-library cache keyed by the
 * streams' text and amounts, so an input object edited in place is read afresh; errors are not
 * cached). The species keys are parsed and looked up only on the first call with these streams.
 */
function reactantsOf(fn: string, fuelIn: string | Flows, oxFlows: Flows, diluentIn: Flows | undefined, library: Library | undefined): Reactants {
  // the same immutable inputs as the last call (species keys, frozen objects): no key to build
  const m = lastReactants;
  if (m !== null && m.fuel === fuelIn && m.oxidizer === oxFlows && m.diluent === diluentIn && m.library === library) return m.reactants;
  const r = reactantsByContent(fn, fuelIn, oxFlows, diluentIn, library);
  const immutable = (x: unknown): boolean => x === undefined || typeof x === "string" || (typeof x === "object" && x !== null && Object.isFrozen(x));
  lastReactants = immutable(fuelIn) && immutable(oxFlows) && immutable(diluentIn) && immutable(library)
    ? { fuel: fuelIn, oxidizer: oxFlows, diluent: diluentIn, library, reactants: r }
    : null;
  return r;
}

/** The last reactants resolved from immutable inputs, by identity. */
let lastReactants: {
  readonly fuel: string | Flows;
  readonly oxidizer: Flows;
  readonly diluent: Flows | undefined;
  readonly library: Library | undefined;
  readonly reactants: Reactants;
} | null = null;

function reactantsByContent(fn: string, fuelIn: string | Flows, oxFlows: Flows, diluentIn: Flows | undefined, library: Library | undefined): Reactants {
  const kf = streamKey(fuelIn);
  const ko = streamKey(oxFlows);
  const kd = streamKey(diluentIn);
  const cacheable = kf !== null && ko !== null && kd !== null && (library === undefined || typeof library === "object");
  let map: Map<string, Reactants> | undefined;
  let key = "";
  if (cacheable) {
    key = kf + "\u0002" + ko + "\u0002" + kd;
    if (library === undefined) map = builtInReactants;
    else {
      map = libraryReactants.get(library);
      if (map === undefined) {
        map = new Map();
        libraryReactants.set(library, map);
      }
    }
    const hit = map.get(key);
    if (hit !== undefined) return hit;
  }
  const r = resolveReactants(fn, fuelIn, oxFlows, diluentIn, library);
  if (map !== undefined) {
    if (map.size >= REACTANT_CACHE_SIZE) map.delete(map.keys().next().value as string);
    map.set(key, r);
  }
  return r;
}

function resolveReactants(fn: string, fuelIn: string | Flows, oxFlows: Flows, diluentIn: Flows | undefined, library: Library | undefined): Reactants {
  const fuel = resolveMembers(fn, "fuel", fuelIn, library);
  if (fuel.length === 0) {
    throw new RxthermError("NOTHING_TO_BURN", `${fn} requires a fuel with a positive amount of some species`, { fuel: fuelIn });
  }
  const fuelDemand = oxygenDemand(fuel);
  if (!fuelDemand.combustible || !(fuelDemand.demand > 0)) {
    throw new RxthermError(
      "NOTHING_TO_BURN",
      `${fn} requires a fuel with something to oxidise (C, H or S beyond its own oxygen); theoretical O2 is ${fuelDemand.demand} mol`,
      { fuel: fuelIn, theoreticalO2: fuelDemand.demand },
    );
  }
  const oxidizer = resolveMembers(fn, "oxidizer", oxFlows, library);
  const oxDemand = oxygenDemand(oxidizer).demand;
  if (!(oxDemand < 0)) {
    throw new RxthermError("NO_OXIDIZER", `${fn} requires an oxidizer that carries free oxygen; this one supplies ${-oxDemand} mol O2 per unit`, { oxidizer: oxFlows });
  }
  const diluent = diluentIn === undefined ? [] : resolveMembers(fn, "diluent", diluentIn, library);
  const fe = new Map<string, number>();
  const oe = new Map<string, number>();
  const de = new Map<string, number>();
  addElements(fe, fuel, 1);
  addElements(oe, oxidizer, 1);
  addElements(de, diluent, 1);
  const elements = [...new Set([...fe.keys(), ...oe.keys(), ...de.keys()])];
  const vec = (m: Map<string, number>): Float64Array => Float64Array.from(elements, (el) => m.get(el) ?? 0);
  return {
    fuel, oxidizer, diluent,
    theoreticalO2: fuelDemand.demand,
    o2PerOxidizerUnit: -oxDemand,
    elements,
    fuelElements: vec(fe),
    oxidizerElements: vec(oe),
    diluentElements: vec(de),
    products: new Map(),
  };
}

/** Build a flame setup (species resolved once per distinct reactant content, see reactantsOf). */
export function prepareFlame(args: {
  fn: string;
  fuel: string | Flows;
  oxidizer: "air" | "oxygen" | Flows;
  air: Flows;
  diluent: Flows | undefined;
  mode: "complete" | "equilibrium";
  constantVolume: boolean;
  products: readonly string[];
  library: Library | undefined;
  lim: EngineLimits;
}): FlameSetup {
  const { fn, library } = args;
  const oxFlows: Flows | string = args.oxidizer === "air" ? args.air : args.oxidizer === "oxygen" ? OXYGEN : args.oxidizer;
  if (typeof oxFlows === "string") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires oxidizer "air", "oxygen" or an object of amounts, got "${oxFlows}"`, { oxidizer: oxFlows });
  }
  const r = reactantsOf(fn, args.fuel, oxFlows, args.diluent, library);
  const setup: FlameSetup = {
    fn, library, mode: args.mode, constantVolume: args.constantVolume,
    reactants: r,
    productKeys: args.products,
    lim: args.lim,
    engine: null,
    lastT: Number.NaN,
    lastCompleteT: Number.NaN,
  };
  if (args.mode === "complete") {
    for (const el of r.elements) {
      if (!COMPLETE_ELEMENTS.has(el)) {
        throw new RxthermError(
          "ELEMENTS_NOT_COVERED",
          `${fn} in mode "complete" handles C, H, O, N, S and noble gases only; the reactants contain ${el} (use mode "equilibrium" with products that hold it)`,
          { elements: [el] },
        );
      }
    }
  }
  return setup;
}

const OXYGEN: Flows = Object.freeze({ "O2(g)": 1 });

/** Oxidizer units for an equivalence ratio. */
function oxidizerUnits(s: FlameSetup, phi: number): number {
  return s.reactants.theoreticalO2 / (phi * s.reactants.o2PerOxidizerUnit);
}

/** Solve one point of a prepared problem, warm-starting from the previous point. */
export function solveFlamePoint(s: FlameSetup, pt: FlamePoint): FlamePointResult {
  const units = oxidizerUnits(s, pt.phi);
  // reactant enthalpy and Σ n R T of the gases (for the vessel volume)
  const acc: StreamSums = { H: 0, nRT: 0, extrapolated: [] };
  addStream(s.fn, "fuel", acc, s.reactants.fuel, 1, pt.fuelT, s.lim.extrapolate);
  addStream(s.fn, "oxidizer", acc, s.reactants.oxidizer, units, pt.oxidizerT, s.lim.extrapolate);
  addStream(s.fn, "diluent", acc, s.reactants.diluent, 1, pt.diluentT, s.lim.extrapolate);

  // constant volume: V = Σ n R T_in / P; the balance is on U = H − (n R T) for gases
  const volume = acc.nRT / pt.P;
  const target = s.constantVolume ? acc.H - acc.nRT : acc.H;
  const els = new Map<string, number>();
  const rx = s.reactants;
  for (let i = 0; i < rx.elements.length; i++) {
    els.set(rx.elements[i]!, rx.fuelElements[i]! + units * rx.oxidizerElements[i]! + rx.diluentElements[i]!);
  }
  const oxidizerMoles: Record<string, number> = {};
  for (const m of s.reactants.oxidizer) oxidizerMoles[m.key] = (oxidizerMoles[m.key] ?? 0) + m.n * units;

  let completeT: number | null = null;
  let complete: CompleteSolution | null = null;
  let canComplete = true;
  for (const el of els.keys()) if (!COMPLETE_ELEMENTS.has(el)) canComplete = false;
  // in mode "equilibrium" the complete-combustion T only seeds a cold start
  if (s.mode === "complete" || (canComplete && !Number.isFinite(s.lastT))) {
    try {
      complete = solveComplete(s, els, target, s.constantVolume, pt);
      completeT = complete.T;
      s.lastCompleteT = complete.T;
    } catch (err) {
      if (s.mode === "complete") throw err;
      complete = null; // only a starting guess for equilibrium mode
    }
  }
  if (s.mode === "complete") {
    const c = complete!;
    const gas = gasMolesOf(s, c.moles);
    return {
      T: c.T,
      P: s.constantVolume ? (gas * R * c.T) / volume : pt.P,
      moles: c.moles,
      condensed: {},
      oxidizerMoles,
      reactantEnergy: target,
      residual: c.residual,
      relativeResidual: Math.abs(c.residual) / c.scale,
      iterations: c.iterations,
      equilibriumIterations: 0,
      elementResidual: 0,
      extrapolated: noteExtrapolation(acc.extrapolated, Object.keys(c.moles).map((k) => cached(s, k)), c.T),
      completeT,
    };
  }
  // equilibrium
  let engine = s.engine;
  if (engine === null || !setFeedElements(engine, els)) {
    const products = s.productKeys.map((key) => ({ key, species: cached(s, key) }));
    const feed = [...rx.fuel, ...rx.oxidizer, ...rx.diluent].map((m) => m.species.formula.elements);
    engine = prepareEngine(s.fn, products, els, feed);
    s.engine = engine;
    s.lastT = Number.NaN;
  }
  engine.iterations = 0;
  engine.extrapolated = false;
  // start from the previous point of a sweep, else a little below the complete-combustion T
  const guess = Number.isFinite(s.lastT) ? s.lastT : completeT !== null ? completeT - 80 : 2000;
  const kind = s.constantVolume ? "V" : "P";
  const pOrV = s.constantVolume ? volume : pt.P;
  let sol;
  try {
    sol = solveEnergy(engine, target, kind, pOrV, guess, s.lim);
  } catch (err) {
    s.lastT = Number.NaN;
    throw err;
  }
  s.lastT = sol.T;
  const moles: Record<string, number> = {};
  const condensed: Record<string, number> = {};
  let gas = 0;
  let scale = 0;
  for (let j = 0; j < engine.keys.length; j++) {
    const n = amount(engine, j);
    moles[engine.keys[j]!] = n;
    if (engine.gasAll[j]) gas += n;
    else if (n > 0) condensed[engine.keys[j]!] = n;
    scale += Math.abs(n * enthalpyRT(engine, j) * R * sol.T);
  }
  return {
    T: sol.T,
    P: s.constantVolume ? (gas * R * sol.T) / volume : pt.P,
    moles,
    condensed,
    oxidizerMoles,
    reactantEnergy: target,
    residual: sol.residual,
    relativeResidual: Math.abs(sol.residual) / Math.max(scale, gas * R * sol.T),
    iterations: sol.outerIterations,
    equilibriumIterations: engine.iterations,
    elementResidual: fullElementResidual(engine),
    extrapolated: noteExtrapolation(acc.extrapolated, engine.species, sol.T),
    completeT,
  };
}

function cached(s: FlameSetup, key: string): Species {
  let sp = s.reactants.products.get(key);
  if (!sp) {
    sp = flameSpecies(s.fn, key, s.library);
    s.reactants.products.set(key, sp);
  }
  return sp;
}

function gasMolesOf(s: FlameSetup, moles: Record<string, number>): number {
  let g = 0;
  for (const k in moles) if (cached(s, k).phase === "g") g += moles[k]!;
  return g;
}

/** Running sums over the reactant streams. */
interface StreamSums {
  H: number;
  nRT: number;
  extrapolated: ExtrapolatedPoint[];
}

function addStream(fn: string, what: string, acc: StreamSums, members: readonly Member[], factor: number, T: number, extrapolate: boolean): void {
  const opts = extrapolate ? EXTRAPOLATE : STRICT;
  for (let i = 0; i < members.length; i++) {
    const m = members[i]!;
    const n = m.n * factor;
    if (T < m.species.range[0] || T > m.species.range[1]) {
      if (!extrapolate) {
        throw new RxthermError(
          "OUT_OF_RANGE",
          `${fn} needs ${m.key} at the ${what} temperature ${T} K, outside its data range [${m.species.range[0]}, ${m.species.range[1]}] K (pass { extrapolate: true } to extend it)${withSlipHint(T)}`,
          { species: m.key, T, range: [m.species.range[0], m.species.range[1]], stream: what, ...slipHintDetails(T) },
        );
      }
      noteExtrapolation(acc.extrapolated, m.species, T);
    }
    acc.H += n * m.species.enthalpy(T, opts);
    if (m.species.phase === "g") acc.nRT += n * R * T;
  }
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });
const STRICT = /* @__PURE__ */ Object.freeze({ extrapolate: false });

interface CompleteSolution {
  T: number;
  moles: Record<string, number>;
  residual: number;
  scale: number;
  iterations: number;
  extrapolated: boolean;
}

/**
 * Complete combustion: C → CO2, H → H2O(g), S → SO2, N → N2, noble gases inert, excess O2
 * left over. Short of oxygen (rich), the C and H share the oxygen as CO2/CO/H2O/H2 in
 * water–gas-shift equilibrium (CO + H2O ⇌ CO2 + H2) at the flame temperature; oxygen short
 * even of CO for every carbon is outside this model (it would deposit carbon).
 */
function solveComplete(s: FlameSetup, els: ReadonlyMap<string, number>, target: number, constantVolume: boolean, pt: FlamePoint): CompleteSolution {
  const bal = new CompleteBalance(s, els, target, constantVolume, pt);
  const guess = Number.isFinite(s.lastCompleteT) ? s.lastCompleteT : 2000;
  const root = increasingNewton(s.fn, (T) => bal.evaluate(T), guess, bal.limits, s.lim.toleranceK, 200);
  const T = root.x;
  bal.evaluate(T);
  const moles: Record<string, number> = {};
  for (let k = 0; k < bal.keys.length; k++) moles[bal.keys[k]!] = (moles[bal.keys[k]!] ?? 0) + bal.amounts[k]!;
  if (bal.rich) {
    if (bal.C > 0) {
      moles["CO2(g)"] = bal.split[0];
      moles["CO(g)"] = bal.split[1];
    }
    if (bal.H > 0) {
      moles["H2O(g)"] = bal.split[2];
      moles["H2(g)"] = bal.split[3];
    }
  }
  return { T, moles, residual: root.value, scale: bal.scale, iterations: root.iterations, extrapolated: T < bal.range[0] || T > bal.range[1] };
}

/** The complete-combustion energy balance of one point (no closures on the hot path). */
class CompleteBalance {
  readonly keys: string[] = [];
  readonly amounts: number[] = [];
  readonly species: Species[] = [];
  readonly rich: boolean;
  readonly C: number;
  readonly H: number;
  readonly oFree: number;
  readonly shift: (Species | null)[] = [null, null, null, null];
  readonly range: [number, number];
  readonly limits: [number, number];
  /** CO2, CO, H2O, H2 (rich mixtures), mol. */
  readonly split: [number, number, number, number] = [0, 0, 0, 0];
  readonly opts: { extrapolate: boolean };
  readonly out = { value: 0, slope: 0 };
  scale = 0;

  constructor(
    s: FlameSetup,
    els: ReadonlyMap<string, number>,
    private readonly target: number,
    private readonly constantVolume: boolean,
    pt: FlamePoint,
  ) {
    const C = els.get("C") ?? 0;
    const H = els.get("H") ?? 0;
    const O = els.get("O") ?? 0;
    const N = els.get("N") ?? 0;
    const S = els.get("S") ?? 0;
    const oFree = O - 2 * S; // sulphur always to SO2 (documented)
    this.C = C;
    this.H = H;
    this.oFree = oFree;
    this.rich = oFree < 2 * C + H / 2;
    if (this.rich && oFree < C) {
      throw new RxthermError(
        "INVALID_ARGUMENT",
        `${s.fn} in mode "complete" needs at least one O per C beyond the sulphur (it would otherwise deposit carbon); this mixture has ${oFree} O for ${C} C — use mode "equilibrium" with C(cr) among the products`,
        { equivalenceRatio: pt.phi, oxygen: oFree, carbon: C },
      );
    }
    if (N > 0) this.add(s, "N2(g)", N / 2);
    if (S > 0) this.add(s, "SO2(g)", S);
    for (let i = 0; i < NOBLE.length; i++) {
      const n = els.get(NOBLE[i]!) ?? 0;
      if (n > 0) this.add(s, NOBLE_KEYS[i]!, n);
    }
    if (!this.rich) {
      if (C > 0) this.add(s, "CO2(g)", C);
      if (H > 0) this.add(s, "H2O(g)", H / 2);
      const o2 = (oFree - 2 * C - H / 2) / 2;
      if (o2 > 0) this.add(s, "O2(g)", o2);
    } else {
      if (C > 0) {
        this.shift[0] = cached(s, "CO2(g)");
        this.shift[1] = cached(s, "CO(g)");
      }
      if (H > 0) {
        this.shift[2] = cached(s, "H2O(g)");
        this.shift[3] = cached(s, "H2(g)");
      }
    }
    let lo = -Infinity;
    let hi = Infinity;
    for (let k = 0; k < this.species.length + 4; k++) {
      const sp = k < this.species.length ? this.species[k]! : this.shift[k - this.species.length]!;
      if (sp === null) continue;
      if (sp.range[0] > lo) lo = sp.range[0];
      if (sp.range[1] < hi) hi = sp.range[1];
    }
    this.range = [lo, hi];
    this.limits = s.lim.extrapolate ? [Math.min(lo, 200), Math.max(hi, 6000)] : [lo, hi];
    this.opts = s.lim.extrapolate ? EXTRAPOLATE : STRICT;
  }

  private add(s: FlameSetup, key: string, n: number): void {
    this.keys.push(key);
    this.amounts.push(n);
    this.species.push(cached(s, key));
  }

  /** Energy of the products at T minus the target (J) and its slope (J/K, composition frozen). */
  evaluate(T: number): { value: number; slope: number } {
    let value = 0;
    let slope = 0;
    let sc = 0;
    const gasTerm = this.constantVolume ? R : 0;
    for (let k = 0; k < this.species.length; k++) {
      const sp = this.species[k]!;
      const n = this.amounts[k]!;
      const h = sp.enthalpy(T, this.opts);
      const g = sp.phase === "g" ? gasTerm : 0;
      value += n * (h - g * T);
      slope += n * (sp.cp(T, this.opts) - g);
      sc += Math.abs(n * h);
    }
    if (this.rich) {
      this.splitAt(T);
      for (let k = 0; k < 4; k++) {
        const sp = this.shift[k] ?? null;
        const n = this.split[k]!;
        if (sp === null || n === 0) continue;
        const h = sp.enthalpy(T, this.opts);
        value += n * (h - gasTerm * T);
        slope += n * (sp.cp(T, this.opts) - gasTerm);
        sc += Math.abs(n * h);
      }
    }
    this.scale = sc;
    this.out.value = value - this.target;
    this.out.slope = slope;
    return this.out;
  }

  /** Rich split at T: x = CO2; CO = C − x; H2O = O − C − x; H2 = H/2 − H2O. */
  private splitAt(T: number): void {
    const { C, H, oFree } = this;
    const sp = this.split;
    if (C === 0) {
      sp[0] = 0; sp[1] = 0; sp[2] = oFree; sp[3] = H / 2 - oFree;
      return;
    }
    if (H === 0) {
      sp[0] = oFree - C; sp[1] = 2 * C - oFree; sp[2] = 0; sp[3] = 0;
      return;
    }
    const dG = this.g(0, T) + this.g(3, T) - this.g(1, T) - this.g(2, T);
    const K = Math.exp(-dG / (R * T));
    const xLo = Math.max(0, oFree - C - H / 2);
    const xHi = Math.min(C, oFree - C);
    // f(x) = x·H2 − K·CO·H2O is increasing in x: the stable quadratic root inside [xLo, xHi]
    const qa = 1 - K;
    const qb = H / 2 - oFree + C + K * oFree;
    const qc = -K * C * (oFree - C);
    let x: number;
    if (Math.abs(qa) < 1e-12 * Math.max(Math.abs(qb), 1e-300)) x = -qc / qb;
    else {
      const disc = Math.sqrt(Math.max(qb * qb - 4 * qa * qc, 0));
      const q = -0.5 * (qb + (qb >= 0 ? 1 : -1) * disc);
      const r1 = q / qa;
      const r2 = qc / q;
      x = r1 >= xLo - 1e-12 && r1 <= xHi + 1e-12 ? r1 : r2;
    }
    x = Math.min(Math.max(x, xLo), xHi);
    const h2o = oFree - C - x;
    sp[0] = x; sp[1] = C - x; sp[2] = h2o; sp[3] = H / 2 - h2o;
  }

  private g(k: number, T: number): number {
    const sp = this.shift[k]!;
    return sp.enthalpy(T, this.opts) - T * sp.entropy(T, STANDARD_PRESSURE_PA, this.opts);
  }
}
