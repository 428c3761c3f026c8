/**
 * Private: a prepared adiabatic-flame problem — fuel, oxidizer and diluent resolved once, the
 * stoichiometry (theoretical O2, O2 carried per unit of oxidizer), complete-combustion products
 * with the water–gas-shift split for rich mixtures, the energy balance at constant pressure
 * (enthalpy) or constant volume (internal energy), and the equilibrium engine kept warm between
 * points. Shared by adiabaticFlameTemperature and flameTemperatureSweep.
 *
 * Complete combustion is the fast path (about 1 µs a point): each product set of a reactant set is
 * prepared once (CompletePlan: the species, their common range, the records' keys), the products of
 * fixed composition are one summed polynomial whose weights are linear in the oxidizer amount
 * (heatCapacitySum), and the result is made with the keys of the records already in place.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue } from "../../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K, slipHintDetails, withSlipHint } from "../../units.js";
import { increasingNewton } from "../../numeric/increasingNewton.js";
import type { Flows } from "../../extent/types.js";
import type { Library, Species } from "../../species/types.js";
import { appendExtrapolated, type ExtrapolatedPoint } from "../../species/noteExtrapolation.js";
import { speciesHeatCapacity } from "../../species/speciesHeatCapacity.js";
import type { HeatCapacity } from "../../heat-capacity/createHeatCapacity.js";
import { heatCapacitySum, type HeatCapacitySum } from "../../heat-capacity/heatCapacitySum.js";
import { DEFAULT_FLAME_PRODUCTS, SULFUR_FLAME_PRODUCTS } from "../flameDefaults.js";
import type { AdiabaticFlameResult } from "../types.js";
import { FlameResult } from "./flameView.js";
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

const R = GAS_CONSTANT_J_PER_MOL_K;

/** Noble gases: inert, carried through as monatomic gases. */
const NOBLE = ["He", "Ne", "Ar", "Kr", "Xe"];
const NOBLE_KEYS = NOBLE.map((g) => `${g}(g)`);
/** Elements the complete-combustion model knows. */
const COMPLETE_ELEMENTS = new Set(["C", "H", "O", "N", "S", ...NOBLE]);
/** The elements of the complete-combustion balance, in the order of `Reactants.completeIndex`. */
const BALANCE_ELEMENTS = ["C", "H", "O", "N", "S", ...NOBLE];

/** One resolved stream member. */
interface Member {
  readonly key: string;
  readonly species: Species;
  /** mol per mol of the stream basis (fuel: as given; oxidizer: per unit; diluent: as given). */
  readonly n: number;
  /** The species' data range (K) and whether it is a gas, read once. */
  readonly lo: number;
  readonly hi: number;
  readonly gas: boolean;
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

/** Resolve a Flows-or-key input into members. */
export function resolveMembers(fn: string, what: string, flows: string | Flows, library: Library | undefined): Member[] {
  if (typeof flows === "string") {
    return [member(flows, flameSpecies(fn, flows, library), 1)];
  }
  if (flows === null || typeof flows !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${what} as a species key or an object of amounts`, { [what]: flows });
  }
  const out: Member[] = [];
  for (const [key, n] of Object.entries(flows)) {
    if (typeof n !== "number" || !Number.isFinite(n) || n < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every ${what} amount to be a finite number ≥ 0, got ${describeValue(n)} for ${key}`, { species: key, amount: n });
    }
    if (n > 0) out.push(member(key, flameSpecies(fn, key, library), n));
  }
  return out;
}

function member(key: string, species: Species, n: number): Member {
  return { key, species, n, lo: species.range[0], hi: species.range[1], gas: species.phase === "g" };
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
  /** The first element the complete-combustion model does not know, or null. */
  readonly foreignElement: string | null;
  /** Whether any stream holds sulfur (the default equilibrium products then add the sulfur gases). */
  readonly hasSulfur: boolean;
  /** Index in `elements` of C, H, O, N, S and the noble gases (BALANCE_ELEMENTS order), −1 when absent. */
  readonly completeIndex: Int32Array;
  /** Whether any stream holds a noble gas (most do not: their totals are then not looked at). */
  readonly hasNoble: boolean;
  /** Complete-combustion product sets met so far, by which products are present (see completePlan). */
  readonly plans: Map<number, CompletePlan>;
  /** The oxidizer's species keys with amount 0, in order: copied for each point's oxidizer amounts. */
  readonly oxidizerTemplate: Readonly<Record<string, number>>;
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
    foreignElement: elements.find((el) => !COMPLETE_ELEMENTS.has(el)) ?? null,
    hasSulfur: [...fuel, ...oxidizer, ...diluent].some((m) => (m.species.formula.elements.S ?? 0) > 0),
    completeIndex: Int32Array.from(BALANCE_ELEMENTS, (el) => elements.indexOf(el)),
    hasNoble: NOBLE.some((el) => elements.includes(el)),
    plans: new Map(),
    oxidizerTemplate: recordTemplate(oxidizer.map((m) => m.key)),
  };
}

/**
 * A record of `keys` (in order) with value 0, never handed out. A copy (`{ ...template }`) has every
 * key already, so the values are written in place: much cheaper than adding the keys one by one to a
 * new object. (Not frozen: the copy of a plain object is the fast one.)
 */
function recordTemplate(keys: readonly string[]): Readonly<Record<string, number>> {
  const t: Record<string, number> = {};
  for (const k of keys) t[k] = 0;
  return t;
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
  /** Equilibrium products; the defaults (with the sulfur gases when a stream holds sulfur) when undefined. */
  products: readonly string[] | undefined;
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
    productKeys: args.products ?? (r.hasSulfur ? SULFUR_DEFAULTS : DEFAULT_FLAME_PRODUCTS),
    lim: args.lim,
    engine: null,
    lastT: Number.NaN,
    lastCompleteT: Number.NaN,
  };
  if (args.mode === "complete" && r.foreignElement !== null) {
    const el = r.foreignElement;
    throw new RxthermError(
      "ELEMENTS_NOT_COVERED",
      `${fn} in mode "complete" handles C, H, O, N, S and noble gases only; the reactants contain ${el} (use mode "equilibrium" with products that hold it)`,
      { elements: [el] },
    );
  }
  return setup;
}

/** The default equilibrium products of reactants that hold sulfur. */
const SULFUR_DEFAULTS: readonly string[] = /* @__PURE__ */ Object.freeze([...DEFAULT_FLAME_PRODUCTS, ...SULFUR_FLAME_PRODUCTS]);

const OXYGEN: Flows = Object.freeze({ "O2(g)": 1 });

/** Oxidizer units for an equivalence ratio. */
function oxidizerUnits(s: FlameSetup, phi: number): number {
  return s.reactants.theoreticalO2 / (phi * s.reactants.o2PerOxidizerUnit);
}

/** Solve one point of a prepared problem, warm-starting from the previous point: its public result. */
export function solveFlamePoint(s: FlameSetup, pt: FlamePoint): AdiabaticFlameResult {
  const rx = s.reactants;
  const units = oxidizerUnits(s, pt.phi);
  // reactant enthalpy and Σ n R T of the gases (for the vessel volume)
  const extrapolated: ExtrapolatedPoint[] = [];
  const x = s.lim.extrapolate;
  let H = streamEnthalpy(s.fn, "fuel", extrapolated, rx.fuel, 1, pt.fuelT, x, 0);
  H = streamEnthalpy(s.fn, "oxidizer", extrapolated, rx.oxidizer, units, pt.oxidizerT, x, H);
  H = streamEnthalpy(s.fn, "diluent", extrapolated, rx.diluent, 1, pt.diluentT, x, H);
  const nRT = streamNRT(rx.diluent, 1, pt.diluentT, streamNRT(rx.oxidizer, units, pt.oxidizerT, streamNRT(rx.fuel, 1, pt.fuelT, 0)));

  // constant volume: V = Σ n R T_in / P; the balance is on U = H − (n R T) for gases
  const volume = nRT / pt.P;
  const target = s.constantVolume ? H - nRT : H;
  const oxidizerMoles = oxidizerRecord(rx, units);

  let completeT: number | null = null;
  let complete: CompleteSolution | null = null;
  // in mode "equilibrium" the complete-combustion T only seeds a cold start
  if (s.mode === "complete" || (rx.foreignElement === null && !Number.isFinite(s.lastT))) {
    try {
      complete = solveComplete(s, units, target, pt);
      completeT = complete.T;
      s.lastCompleteT = complete.T;
    } catch (err) {
      if (s.mode === "complete") throw err;
      complete = null; // only a starting guess for equilibrium mode
    }
  }
  if (s.mode === "complete") {
    const c = complete!;
    const plan = c.plan;
    if (!(c.T >= plan.range[0] && c.T <= plan.range[1])) {
      // outside the common range: name each product outside its own
      for (let k = 0; k < plan.species.length; k++) appendExtrapolated(extrapolated, plan.species[k]!, c.T);
      for (let k = 0; k < 4; k++) if (plan.shift[k] !== null) appendExtrapolated(extrapolated, plan.shift[k]!, c.T);
    }
    // every product of complete combustion is a gas: `products` holds the mole fractions of all of them
    return new FlameResult(
      c.T, s.constantVolume ? (c.gas * R * c.T) / volume : pt.P, c.products, c.moles, {}, oxidizerMoles, pt.phi,
      rx.theoreticalO2, s.mode, PROCESS[s.constantVolume ? 1 : 0]!, target, c.residual, Math.abs(c.residual) / c.scale,
      c.iterations, 0, 0, extrapolated,
    );
  }
  // equilibrium
  const els = new Map<string, number>();
  for (let i = 0; i < rx.elements.length; i++) {
    els.set(rx.elements[i]!, rx.fuelElements[i]! + units * rx.oxidizerElements[i]! + rx.diluentElements[i]!);
  }
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
  for (let j = 0; j < engine.species.length; j++) appendExtrapolated(extrapolated, engine.species[j]!, sol.T);
  // mole fractions of the gas-phase products
  let gasTotal = 0;
  const keys = Object.keys(moles);
  for (let i = 0; i < keys.length; i++) if (!(keys[i]! in condensed)) gasTotal += moles[keys[i]!]!;
  const fractions: Record<string, number> = {};
  for (let i = 0; i < keys.length; i++) {
    const k = keys[i]!;
    if (!(k in condensed) && !isCondensedKey(engine, k)) fractions[k] = moles[k]! / gasTotal;
  }
  return new FlameResult(
    sol.T, s.constantVolume ? (gas * R * sol.T) / volume : pt.P, fractions, moles, condensed, oxidizerMoles, pt.phi,
    rx.theoreticalO2, s.mode, PROCESS[s.constantVolume ? 1 : 0]!, target, sol.residual,
    Math.abs(sol.residual) / Math.max(scale, gas * R * sol.T), sol.outerIterations, engine.iterations,
    fullElementResidual(engine), extrapolated,
  );
}

const PROCESS = ["constant-pressure", "constant-volume"] as const;

/** Whether `key` is a condensed-phase product of the equilibrium engine. */
function isCondensedKey(e: Engine, key: string): boolean {
  const j = e.keys.indexOf(key);
  return j >= 0 && e.problem.gas[j] === 0;
}

function cached(s: FlameSetup, key: string): Species {
  let sp = s.reactants.products.get(key);
  if (!sp) {
    sp = flameSpecies(s.fn, key, s.library);
    s.reactants.products.set(key, sp);
  }
  return sp;
}

/**
 * `H` plus the enthalpy of a reactant stream at T (J; `factor` units of its members' amounts). A
 * member outside its data range is rejected (OUT_OF_RANGE) or, with extrapolation, noted in `list`.
 */
function streamEnthalpy(fn: string, what: string, list: ExtrapolatedPoint[], members: readonly Member[], factor: number, T: number, extrapolate: boolean, H: number): number {
  const opts = extrapolate ? EXTRAPOLATE : STRICT;
  for (let i = 0; i < members.length; i++) {
    const m = members[i]!;
    const sp = m.species;
    if (T < m.lo || T > m.hi) {
      if (!extrapolate) {
        throw new RxthermError(
          "OUT_OF_RANGE",
          `${fn} needs ${m.key} at the ${what} temperature ${T} K, outside its data range [${sp.range[0]}, ${sp.range[1]}] K (pass { extrapolate: true } to extend it)${withSlipHint(T)}`,
          { species: m.key, T, range: [sp.range[0], sp.range[1]], stream: what, ...slipHintDetails(T) },
        );
      }
      appendExtrapolated(list, sp, T);
    }
    H += m.n * factor * sp.enthalpy(T, opts);
  }
  return H;
}

/** `nRT` plus Σ n·R·T of the gases of a reactant stream at T (J). */
function streamNRT(members: readonly Member[], factor: number, T: number, nRT: number): number {
  for (let i = 0; i < members.length; i++) {
    const m = members[i]!;
    if (m.gas) nRT += m.n * factor * R * T;
  }
  return nRT;
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });
const STRICT = /* @__PURE__ */ Object.freeze({ extrapolate: false });

/** Keys of the water–gas-shift species of rich mixtures: CO2, CO, H2O, H2. */
const SHIFT_KEYS = ["CO2(g)", "CO(g)", "H2O(g)", "H2(g)"] as const;

// Which complete-combustion products are present (the key of a product set in Reactants.plans).
const HAS_N2 = 1, HAS_SO2 = 2, NOBLE_BIT = 4; // noble gas i: NOBLE_BIT << i
const HAS_CO2 = 128, HAS_H2O = 256, HAS_O2 = 512, RICH = 1024, RICH_C = 2048, RICH_H = 4096;

/**
 * One complete-combustion product set of a reactant set: the products of fixed composition at a
 * point (N2, SO2, noble gases and, lean, CO2, H2O and excess O2), the water–gas-shift species of
 * rich mixtures, their common data range, and the fixed products' polynomials summed into one.
 */
interface CompletePlan {
  readonly keys: readonly string[];
  /** Every product key (the fixed ones, then the shift species present) with amount 0: see recordTemplate. */
  readonly template: Readonly<Record<string, number>>;
  readonly species: readonly Species[];
  /** 1 for a gas. */
  readonly gas: Uint8Array;
  /** CO2, CO, H2O, H2 (rich mixtures; null when the element is absent). */
  readonly shift: readonly (Species | null)[];
  /** Common data range of every product, K. */
  readonly range: readonly [number, number];
  /** Root-search limits without and with extrapolation, K. */
  readonly limits: readonly [number, number];
  readonly limitsExtrapolated: readonly [number, number];
  /**
   * Σ n·H and Σ n·Cp of the fixed products as one polynomial, the amounts set as linear in the
   * oxidizer units (every product a library species without phase transitions), or null: each
   * species is then evaluated on its own.
   */
  readonly sum: HeatCapacitySum | null;
  /** ΔfH°(298.15 K) of the fixed products, J/mol. */
  readonly hf298: Float64Array;
  /** The balance object reused by every point of this product set when `sum` is set; else null, and each point makes its own. */
  balance: CompleteBalance | null;
}

/** The product set `mask` of these reactants (resolved on first use, then kept with the reactants). */
function completePlan(s: FlameSetup, mask: number): CompletePlan {
  const plans = s.reactants.plans;
  let plan = plans.get(mask);
  if (plan === undefined) {
    plan = buildPlan(s, mask);
    plans.set(mask, plan);
  }
  return plan;
}

function buildPlan(s: FlameSetup, mask: number): CompletePlan {
  const keys: string[] = [];
  if (mask & HAS_N2) keys.push("N2(g)");
  if (mask & HAS_SO2) keys.push("SO2(g)");
  for (let i = 0; i < NOBLE.length; i++) if (mask & (NOBLE_BIT << i)) keys.push(NOBLE_KEYS[i]!);
  if (mask & HAS_CO2) keys.push("CO2(g)");
  if (mask & HAS_H2O) keys.push("H2O(g)");
  if (mask & HAS_O2) keys.push("O2(g)");
  const species = keys.map((k) => cached(s, k));
  const shift: (Species | null)[] = [null, null, null, null];
  if (mask & RICH_C) {
    shift[0] = cached(s, SHIFT_KEYS[0]);
    shift[1] = cached(s, SHIFT_KEYS[1]);
  }
  if (mask & RICH_H) {
    shift[2] = cached(s, SHIFT_KEYS[2]);
    shift[3] = cached(s, SHIFT_KEYS[3]);
  }
  let lo = -Infinity;
  let hi = Infinity;
  for (const sp of [...species, ...shift]) {
    if (sp === null) continue;
    if (sp.range[0] > lo) lo = sp.range[0];
    if (sp.range[1] < hi) hi = sp.range[1];
  }
  // the summed polynomial holds the fixed products' state between points: only when every product is
  // a library species (no caller code runs during a solve, so no solve can start inside another)
  const models: HeatCapacity[] = [];
  for (const sp of species) {
    const m = speciesHeatCapacity(sp);
    if (m !== null) models.push(m);
  }
  const libraryOnly = models.length === species.length && shift.every((sp) => sp === null || speciesHeatCapacity(sp) !== null);
  const sum = libraryOnly ? heatCapacitySum(models) : null;
  const plan: CompletePlan = {
    keys, species, shift,
    template: recordTemplate([...keys, ...SHIFT_KEYS.filter((_, k) => shift[k] !== null)]),
    gas: Uint8Array.from(species, (sp) => (sp.phase === "g" ? 1 : 0)),
    range: [lo, hi],
    limits: [lo, hi],
    limitsExtrapolated: [Math.min(lo, 200), Math.max(hi, 6000)],
    sum,
    hf298: Float64Array.from(species, (sp) => sp.hf298),
    balance: null,
  };
  if (sum !== null) {
    // the amounts are linear in the oxidizer units: those of the fuel and diluent alone, plus units × those per unit
    const rx = s.reactants;
    const alone = new Float64Array(keys.length);
    const perUnit = new Float64Array(keys.length);
    fixedAmounts(alone, mask, Float64Array.from(BALANCE_ELEMENTS, (_, q) => elementTotal(rx, 0, q)));
    fixedAmounts(perUnit, mask, Float64Array.from(BALANCE_ELEMENTS, (_, q) => (rx.completeIndex[q]! < 0 ? 0 : rx.oxidizerElements[rx.completeIndex[q]!]!)));
    sum.setWeights(alone, plan.hf298, perUnit);
    plan.balance = new CompleteBalance(plan);
  }
  return plan;
}

/**
 * A copy of `template` with values[k] / divisor at keys[k] (the keys are distinct and already in the
 * template, in this order). One store per place in the list rather than one store in a loop: in a
 * steady workload each store then meets one key, which the engine writes directly, while a loop's
 * single store meets every key and looks each one up (measured: about 60 ns less per solve).
 */
function recordOf(template: Readonly<Record<string, number>>, keys: readonly string[], values: Float64Array, divisor: number): Record<string, number> {
  const o: Record<string, number> = { ...template };
  const n = keys.length;
  if (n > 0) o[keys[0]!] = values[0]! / divisor;
  if (n > 1) o[keys[1]!] = values[1]! / divisor;
  if (n > 2) o[keys[2]!] = values[2]! / divisor;
  if (n > 3) o[keys[3]!] = values[3]! / divisor;
  if (n > 4) o[keys[4]!] = values[4]! / divisor;
  for (let k = 5; k < n; k++) o[keys[k]!] = values[k]! / divisor;
  return o;
}

/** The oxidizer's amounts at `units` (mol): a copy of its template, one store per place as in recordOf. */
function oxidizerRecord(rx: Reactants, units: number): Record<string, number> {
  // the oxidizer's keys are distinct (the keys of one object, or one key)
  const o: Record<string, number> = { ...rx.oxidizerTemplate };
  const m = rx.oxidizer, n = m.length;
  if (n > 0) o[m[0]!.key] = m[0]!.n * units;
  if (n > 1) o[m[1]!.key] = m[1]!.n * units;
  if (n > 2) o[m[2]!.key] = m[2]!.n * units;
  for (let k = 3; k < n; k++) o[m[k]!.key] = m[k]!.n * units;
  return o;
}

/** Element totals of the point being solved (BALANCE_ELEMENTS order): filled and read with no call between. */
const TOTALS = /* @__PURE__ */ new Float64Array(BALANCE_ELEMENTS.length);

/**
 * The amounts of the products of fixed composition (plan order) from the element totals t
 * (BALANCE_ELEMENTS order), mol: linear in t, so that the amounts of the fuel and diluent alone and
 * those per unit of oxidizer give the amounts at any φ (see buildPlan).
 */
function fixedAmounts(out: Float64Array, mask: number, t: ArrayLike<number>): void {
  const C = t[0]!, H = t[1]!, O = t[2]!, N = t[3]!, S = t[4]!;
  let k = 0;
  if (mask & HAS_N2) out[k++] = N / 2;
  if (mask & HAS_SO2) out[k++] = S;
  for (let i = 0; i < NOBLE.length; i++) if (mask & (NOBLE_BIT << i)) out[k++] = t[5 + i]!;
  if (mask & HAS_CO2) out[k++] = C;
  if (mask & HAS_H2O) out[k++] = H / 2;
  // the excess O2: (O − 2 S (to SO2) − 2 C − H/2) / 2
  if (mask & HAS_O2) out[k++] = (O - 2 * S - 2 * C - H / 2) / 2;
}

/** Total of balance element q (BALANCE_ELEMENTS order) at `units` of oxidizer, mol. */
function elementTotal(rx: Reactants, units: number, q: number): number {
  const i = rx.completeIndex[q]!;
  return i < 0 ? 0 : rx.fuelElements[i]! + units * rx.oxidizerElements[i]! + rx.diluentElements[i]!;
}

interface CompleteSolution {
  T: number;
  moles: Record<string, number>;
  /** Mole fractions (every product is a gas). */
  products: Record<string, number>;
  residual: number;
  scale: number;
  iterations: number;
  /** Gas amount of the products, mol. */
  gas: number;
  plan: CompletePlan;
}

/**
 * Complete combustion: C → CO2, H → H2O(g), S → SO2, N → N2, noble gases inert, excess O2
 * left over. Short of oxygen (rich), the C and H share the oxygen as CO2/CO/H2O/H2 in
 * water–gas-shift equilibrium (CO + H2O ⇌ CO2 + H2) at the flame temperature; oxygen short
 * even of CO for every carbon is outside this model (it would deposit carbon).
 */
function solveComplete(s: FlameSetup, units: number, target: number, pt: FlamePoint): CompleteSolution {
  const rx = s.reactants;
  const C = elementTotal(rx, units, 0);
  const H = elementTotal(rx, units, 1);
  const O = elementTotal(rx, units, 2);
  const N = elementTotal(rx, units, 3);
  const S = elementTotal(rx, units, 4);
  const oFree = O - 2 * S; // sulphur always to SO2 (documented)
  const rich = oFree < 2 * C + H / 2;
  if (rich && oFree < C) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${s.fn} in mode "complete" needs at least one O per C beyond the sulphur (it would otherwise deposit carbon); this mixture has ${oFree} O for ${C} C — use mode "equilibrium" with C(cr) among the products`,
      { equivalenceRatio: pt.phi, oxygen: oFree, carbon: C },
    );
  }
  // which products of fixed composition are present: the product set (plan)
  const o2 = (oFree - 2 * C - H / 2) / 2;
  let mask = (N > 0 ? HAS_N2 : 0) | (S > 0 ? HAS_SO2 : 0);
  if (rx.hasNoble) for (let i = 0; i < NOBLE.length; i++) if (elementTotal(rx, units, 5 + i) > 0) mask |= NOBLE_BIT << i;
  if (!rich) mask |= (C > 0 ? HAS_CO2 : 0) | (H > 0 ? HAS_H2O : 0) | (o2 > 0 ? HAS_O2 : 0);
  else mask |= RICH | (C > 0 ? RICH_C : 0) | (H > 0 ? RICH_H : 0);
  const plan = completePlan(s, mask);
  const bal = plan.balance ?? new CompleteBalance(plan);
  // their amounts, in the order of the plan
  for (let q = 0; q < BALANCE_ELEMENTS.length; q++) TOTALS[q] = elementTotal(rx, units, q);
  fixedAmounts(bal.amounts, mask, TOTALS);
  const extrapolate = s.lim.extrapolate;
  bal.reset(target, units, s.constantVolume, extrapolate ? EXTRAPOLATE : STRICT, rich, C, H, oFree);
  const guess = Number.isFinite(s.lastCompleteT) ? s.lastCompleteT : 2000;
  const root = increasingNewton(s.fn, bal.f, guess, extrapolate ? plan.limitsExtrapolated : plan.limits, s.lim.toleranceK, 200);
  const T = root.x;
  const scale = bal.finish(T);
  // `gas` counts the gases (vessel pressure), `total` every product (mole fractions)
  let gas = 0;
  let total = 0;
  for (let k = 0; k < plan.keys.length; k++) {
    const n = bal.amounts[k]!;
    if (plan.gas[k] === 1) gas += n;
    total += n;
  }
  if (rich) {
    for (let k = 0; k < 4; k++) {
      const sp = plan.shift[k] ?? null;
      if (sp === null) continue;
      if (sp.phase === "g") gas += bal.split[k]!;
      total += bal.split[k]!;
    }
  }
  const moles = recordOf(plan.template, plan.keys, bal.amounts, 1);
  const products = recordOf(plan.template, plan.keys, bal.amounts, total);
  if (rich) {
    for (let k = 0; k < 4; k++) {
      if (plan.shift[k] === null) continue;
      moles[SHIFT_KEYS[k]!] = bal.split[k]!;
      products[SHIFT_KEYS[k]!] = bal.split[k]! / total;
    }
  }
  return { T, moles, products, residual: root.value, scale, iterations: root.iterations, gas, plan };
}

/** The complete-combustion energy balance of a product set, set for one point at a time by `reset`. */
class CompleteBalance {
  /** Amounts of the fixed products, mol (plan order). */
  readonly amounts: Float64Array;
  /** CO2, CO, H2O, H2 (rich mixtures), mol. */
  readonly split: [number, number, number, number] = [0, 0, 0, 0];
  readonly out = { value: 0, slope: 0 };
  /** {@link CompleteBalance.evaluate} as a function, made once. */
  readonly f: (T: number) => { value: number; slope: number };
  private target = 0;
  private constantVolume = false;
  private opts: { extrapolate: boolean } = STRICT;
  private rich = false;
  private C = 0;
  private H = 0;
  private oFree = 0;
  /** Gas amount of the fixed products, mol. */
  private gasN = 0;

  constructor(private readonly plan: CompletePlan) {
    this.amounts = new Float64Array(plan.keys.length);
    this.f = (T) => this.evaluate(T);
  }

  /** Set the point (after its amounts were written into `amounts`): the oxidizer units, the target energy and the rich split's element totals. */
  reset(target: number, units: number, constantVolume: boolean, opts: { extrapolate: boolean }, rich: boolean, C: number, H: number, oFree: number): void {
    const plan = this.plan;
    let gasN = 0;
    for (let k = 0; k < this.amounts.length; k++) if (plan.gas[k] === 1) gasN += this.amounts[k]!;
    this.gasN = gasN;
    this.target = target;
    this.constantVolume = constantVolume;
    this.opts = opts;
    this.rich = rich;
    this.C = C;
    this.H = H;
    this.oFree = oFree;
    if (plan.sum !== null) plan.sum.setParameter(units);
  }

  /** Energy of the products at T minus the target (J) and its slope (J/K, composition frozen). */
  evaluate(T: number): { value: number; slope: number } {
    const gasTerm = this.constantVolume ? R : 0;
    const plan = this.plan;
    const sum = plan.sum;
    let value: number;
    let slope: number;
    if (sum !== null) {
      // the fixed products as one polynomial
      value = sum.enthalpy(T) - gasTerm * this.gasN * T;
      slope = sum.cp - gasTerm * this.gasN;
    } else {
      value = 0;
      slope = 0;
      for (let k = 0; k < plan.species.length; k++) {
        const sp = plan.species[k]!;
        const n = this.amounts[k]!;
        const g = plan.gas[k] === 1 ? gasTerm : 0;
        value += n * (sp.enthalpy(T, this.opts) - g * T);
        slope += n * (sp.cp(T, this.opts) - g);
      }
    }
    if (this.rich) {
      this.splitAt(T);
      for (let k = 0; k < 4; k++) {
        const sp = plan.shift[k] ?? null;
        const n = this.split[k]!;
        if (sp === null || n === 0) continue;
        value += n * (sp.enthalpy(T, this.opts) - gasTerm * T);
        slope += n * (sp.cp(T, this.opts) - gasTerm);
      }
    }
    this.out.value = value - this.target;
    this.out.slope = slope;
    return this.out;
  }

  /** Set the rich split at the root T and return Σ |n·H| of the products there (the residual's scale), J. */
  finish(T: number): number {
    const plan = this.plan;
    let sc = 0;
    // H = ΔfH° + the sensible enthalpy, as the species compute it (at 298.15 K they return ΔfH° exactly)
    if (plan.sum !== null && T !== STANDARD_TEMPERATURE_K) sc = plan.sum.magnitude(T);
    else for (let k = 0; k < plan.species.length; k++) sc += Math.abs(this.amounts[k]! * plan.species[k]!.enthalpy(T, this.opts));
    if (this.rich) {
      this.splitAt(T);
      for (let k = 0; k < 4; k++) {
        const sp = plan.shift[k] ?? null;
        const n = this.split[k]!;
        if (sp !== null && n !== 0) sc += Math.abs(n * sp.enthalpy(T, this.opts));
      }
    }
    return sc;
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
    const sp = this.plan.shift[k]!;
    return sp.enthalpy(T, this.opts) - T * sp.entropy(T, STANDARD_PRESSURE_PA, this.opts);
  }
}
