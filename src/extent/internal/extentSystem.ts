/**
 * Private helpers shared by the extent functions: flow validation, reaction preparation
 * (parse, exact coefficients, balance check) and the species × reaction stoichiometric table.
 * Not re-exported.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, isDeepFrozen, requireArray, requireRecord } from "../../errors.js";
import { molarMass } from "../../formula/molarMass.js";
import { parseFormula } from "../../formula/parseFormula.js";
import type { Formula } from "../../formula/types.js";
import { parseReaction } from "../../reaction/parseReaction.js";
import type { Reaction } from "../../reaction/types.js";
import {
  type Rational,
  rationalAdd,
  rationalDiv,
  rationalFromDecimalString,
  rationalFromNumber,
  rationalIsZero,
  rationalMul,
  rationalNeg,
  rationalSub,
  rationalToNumber,
} from "../../numeric/rational.js";
import { type SafeQ, SafeOverflow, sqFromNumber, sqFromRational } from "../../numeric/safeRational.js";
import type { Flows } from "../types.js";
import { checkReactionShape } from "../../reaction/checkReactionShape.js";

/** A reaction with exact net coefficients (products +, reactants −), checked for balance. */
export interface PreparedReaction {
  /** Readable text of the reaction, e.g. "CO + 2 H2 -> CH3OH". */
  readonly label: string;
  /** Species keys as written, each once. */
  readonly species: readonly string[];
  /** Net exact coefficient of each species (products positive, reactants negative). */
  readonly nu: readonly Rational[];
  /** The parsed formula of each species. */
  readonly formulas: readonly Formula[];
}

const FORMULA_CACHE_LIMIT = 2048;
/** Largest flow magnitude accepted (mol or mol/s); larger values overflow sums of squares and mass flows. */
export const MAX_FLOW = 1e100;
/** Most species in one stream or feed. */
export const MAX_STREAM_SPECIES = 10_000;
const formulaCache = new Map<string, Formula>();
const reactionTextCache = new Map<string, PreparedReaction>();
const reactionObjectCache = new WeakMap<object, PreparedReaction>();

/** parseFormula with a small bounded memo (keys repeat across calls on a plant model). */
export function formulaOf(key: string, fn: string, role: string): Formula {
  const hit = formulaCache.get(key);
  if (hit !== undefined) return hit;
  let f: Formula;
  try {
    f = parseFormula(key);
  } catch (e) {
    if (e instanceof RxthermError) {
      throw new RxthermError(e.code, `${fn}: ${role} key "${key}" is not a formula: ${e.message.replace(/^\[rxtherm\] /, "")}`, {
        ...e.details,
        species: key,
      });
    }
    throw e;
  }
  if (formulaCache.size >= FORMULA_CACHE_LIMIT) formulaCache.clear();
  formulaCache.set(key, f);
  return f;
}

const molarMassCache = new Map<string, number>();

/** molarMass (g/mol) of a key, with the same bounded memo. */
export function molarMassOf(key: string, fn: string, role: string): number {
  const hit = molarMassCache.get(key);
  if (hit !== undefined) return hit;
  const m = molarMass(formulaOf(key, fn, role));
  if (molarMassCache.size >= FORMULA_CACHE_LIMIT) molarMassCache.clear();
  molarMassCache.set(key, m);
  return m;
}

/**
 * Check a flows object: finite numbers (INVALID_ARGUMENT), none negative (NEGATIVE_FLOW),
 * keys that parse as formulas (the formula's own error code, with `species`).
 */
export function validateFlows(flows: Flows, fn: string, role: string, parseKeys = true): void {
  if (flows === null || typeof flows !== "object" || Array.isArray(flows)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${role} to be an object of species flows`, { role, path: role });
  }
  requireRecord(flows, fn, role);
  const entries = Object.entries(flows);
  if (entries.length > MAX_STREAM_SPECIES) {
    throw new RxthermError("TOO_LARGE", `${fn} accepts at most ${MAX_STREAM_SPECIES} species in ${role}, got ${entries.length}`, {
      role, path: role, limit: MAX_STREAM_SPECIES, size: entries.length,
    });
  }
  for (const [key, value] of entries) {
    if (typeof value !== "number" || !Number.isFinite(value) || Math.abs(value) > MAX_FLOW) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite numeric ${role} flows of at most ${MAX_FLOW} in magnitude, got ${describeValue(value)} for ${key}`, {
        role,
        species: key,
        value,
      });
    }
    if (value < 0) {
      throw new RxthermError("NEGATIVE_FLOW", `${fn} requires ${role} flows >= 0, got ${value} for ${key}`, {
        role,
        species: key,
        value,
      });
    }
    if (parseKeys) formulaOf(key, fn, role);
  }
}

const PHASE_RE = /\((g|l|s|aq|cr)\)$/;

/** Key without its phase suffix, and whether it had one. */
export function stripPhase(key: string): { base: string; hasPhase: boolean } {
  const m = PHASE_RE.exec(key);
  return m === null ? { base: key, hasPhase: false } : { base: key.slice(0, m.index), hasPhase: true };
}

/** Parse (if text), check balance exactly and return net exact coefficients; memoised. */
export function prepareReaction(reaction: Reaction | string, index: number, fn: string): PreparedReaction {
  if (typeof reaction === "string") {
    const hit = reactionTextCache.get(reaction);
    if (hit !== undefined) return hit;
    const prepared = prepareObject(parseReaction(reaction), index, fn);
    if (reactionTextCache.size >= FORMULA_CACHE_LIMIT) reactionTextCache.clear();
    reactionTextCache.set(reaction, prepared);
    return prepared;
  }
  if (reaction === null || typeof reaction !== "object" || !Array.isArray(reaction.reactants) || !Array.isArray(reaction.products)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires each reaction to be an equation text or a Reaction object (reaction ${index})`, {
      reaction: index,
    });
  }
  // Cached by identity only when nothing in it can change any more (issue 11): a user-built,
  // unfrozen reaction is checked and read afresh on every call.
  if (!isDeepFrozen(reaction)) {
    checkReactionShape(reaction, fn, `reactions[${index}]`);
    return prepareObject(reaction, index, fn);
  }
  const hit = reactionObjectCache.get(reaction);
  if (hit !== undefined) return hit;
  const prepared = prepareObject(reaction, index, fn);
  reactionObjectCache.set(reaction, prepared);
  return prepared;
}

function prepareObject(reaction: Reaction, index: number, fn: string): PreparedReaction {
  const species: string[] = [];
  const nu: Rational[] = [];
  const formulas: Formula[] = [];
  const pos = new Map<string, number>();
  const add = (key: string, formula: Formula, coef: Rational): void => {
    const at = pos.get(key);
    if (at === undefined) {
      pos.set(key, species.length);
      species.push(key);
      nu.push(coef);
      formulas.push(formula);
    } else nu[at] = rationalAdd(nu[at] as Rational, coef);
  };
  const coefOf = (t: Reaction["reactants"][number]): Rational => {
    const fromText = typeof t.exact === "string" ? exactFromText(t.exact) : null;
    return fromText ?? rationalFromNumber(t.coefficient);
  };
  for (const t of reaction.reactants) add(t.species, t.formula, rationalNeg(coefOf(t)));
  for (const t of reaction.products) add(t.species, t.formula, coefOf(t));
  // exact element and charge balance
  const residual = new Map<string, Rational>();
  let charge: Rational = ZERO;
  species.forEach((_, i) => {
    const f = formulas[i] as Formula;
    const c = nu[i] as Rational;
    for (const [el, count] of Object.entries(f.elements)) {
      residual.set(el, rationalAdd(residual.get(el) ?? ZERO, rationalMul(c, rationalFromNumber(count))));
    }
    if (f.charge !== 0) charge = rationalAdd(charge, rationalMul(c, rationalFromNumber(f.charge)));
  });
  const label = reactionLabel(reaction);
  const residuals: Record<string, number> = {};
  for (const [el, r] of residual) if (!rationalIsZero(r)) residuals[el] = rationalToNumber(r);
  if (Object.keys(residuals).length > 0 || !rationalIsZero(charge)) {
    const parts = Object.entries(residuals).map(([el, r]) => `${el} ${r > 0 ? "+" : ""}${r}`);
    if (!rationalIsZero(charge)) parts.push(`charge ${rationalToNumber(charge)}`);
    throw new RxthermError("UNBALANCED_REACTION", `${fn} requires balanced reactions; reaction ${index} (${label}) leaves ${parts.join(", ")} (products − reactants)`, {
      reaction: index,
      label,
      residuals,
      charge: rationalToNumber(charge),
    });
  }
  return { label, species, nu, formulas };
}

/** Exact value of a coefficient text ("13/2", "2", "0.947", or a fraction of decimals); null if it is none. */
function exactFromText(text: string): Rational | null {
  try {
    return rationalFromDecimalString(text);
  } catch {
    const slash = text.indexOf("/");
    if (slash < 0) return null;
    try {
      const den = rationalFromDecimalString(text.slice(slash + 1));
      return rationalIsZero(den) ? null : rationalDiv(rationalFromDecimalString(text.slice(0, slash)), den);
    } catch {
      return null;
    }
  }
}

const ZERO: Rational = /* @__PURE__ */ rationalFromNumber(0);

function reactionLabel(r: Reaction): string {
  const side = (ts: Reaction["reactants"]): string =>
    ts.map((t) => (t.coefficient === 1 ? t.species : `${t.exact ?? t.coefficient} ${t.species}`)).join(" + ");
  return `${side(r.reactants)} -> ${side(r.products)}`;
}

/** The feed-independent part of a problem: species, coefficients and derived flags. */
export interface StoichStructure {
  /** All species: feed keys first (feed order), then species met only in reactions. */
  readonly species: string[];
  readonly index: Map<string, number>;
  /** Number of feed keys (the first species). */
  readonly feedCount: number;
  /** Formula of each species. */
  readonly formulas: Formula[];
  /** nu[j][s]: net exact coefficient of species s in reaction j. */
  readonly nu: Rational[][];
  /** The same as numbers. */
  readonly nuF: number[][];
  /** The same as safe-integer rationals (the exact fast lane), or null when one outgrows it. */
  readonly nuSafe: SafeQ[][] | null;
  readonly reactions: PreparedReaction[];
  /** True for species that appear in at least one reaction. */
  readonly reacting: boolean[];
  /** True for species consumed (ν < 0) in at least one reaction. */
  readonly consumed: boolean[];
  /** True for species made (ν > 0) in at least one reaction. */
  readonly produced: boolean[];
  /** yieldRatio[p][a]: ν_P/|ν_A| agreed by the reactions making p from a; null if none, "inconsistent" if they differ. */
  readonly yieldRatio: (Rational | null | "inconsistent")[][];
  /** proportional[a][b]: true when two species' coefficient columns are proportional. */
  readonly proportional: boolean[][];
  /** Every (product p, reactant a) with an agreed yield ratio, in (p, a) order. */
  readonly yieldPairs: readonly YieldPair[];
}

/** A product, a reactant it is made from, and their agreed ratio ν_P/|ν_A|. */
export interface YieldPair {
  readonly p: number;
  readonly a: number;
  readonly ratio: Rational;
  /** The ratio in the safe-integer lane, null when it does not fit. */
  readonly ratioSafe: SafeQ | null;
  readonly ratioF: number;
}

/** The species × reaction table of a problem with its feed. */
export interface StoichSystem extends StoichStructure {
  /** Feed of each species (0 when not fed), as numbers. */
  readonly feed: number[];
  /** The same, exact (computed on first use). */
  readonly feedQ: Rational[];
  /**
   * The same in the safe-integer lane (throws SafeOverflow when a value does not fit). The last
   * conversion is kept on the shared structure and reused when the feed numbers are equal.
   */
  readonly feedSafe: readonly SafeQ[];
}

const STRUCTURE_CACHE_LIMIT = 256;
const structureCache = new Map<string, StoichStructure>();

/**
 * Build the table. A reaction key matches a feed key when equal, or when one of the two has no
 * phase suffix and the rest is equal (so `CH4` in an equation matches `CH4(g)` in the feed);
 * a key without a phase that could match two feed keys is an error (no silent phase choice).
 * The feed-independent structure is memoised on the feed keys and the reactions.
 */
export function buildSystem(feed: Flows, reactions: readonly (Reaction | string)[], fn: string): StoichSystem {
  validateFlows(feed, fn, "feed");
  if (!Array.isArray(reactions) || reactions.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one reaction`, { reactions: Array.isArray(reactions) ? 0 : typeof reactions });
  }
  requireArray(reactions, fn, "reactions");
  const feedKeys = Object.keys(feed);
  const last = lastStructure.get(reactions);
  let st: StoichStructure | undefined;
  // reuse only while every item is text or deeply frozen: an unfrozen reaction may have been edited in place
  if (
    last !== undefined && sameItems(last.items, reactions) && sameItems(last.feedKeys, feedKeys) &&
    reactions.every((r) => typeof r === "string" || isDeepFrozen(r))
  ) st = last.structure;
  else st = structureFor(feedKeys, reactions, fn);
  const feedF: number[] = new Array<number>(st.species.length).fill(0);
  for (let i = 0; i < st.feedCount; i++) feedF[i] = feed[feedKeys[i] as string] as number;
  // the per-call system inherits the memoised structure (no copying) and adds the feed
  const sys = Object.create(st) as { feed: number[]; exactFeed: Rational[] | null };
  sys.feed = feedF;
  sys.exactFeed = null;
  return sys as unknown as StoichSystem;
}

/**
 * Last structure built for a reactions array, with copies of its items and the feed keys, so a
 * plant model that calls again with the same arrays skips the key building (the copies catch an
 * array edited in place).
 */
const lastStructure = new WeakMap<readonly (Reaction | string)[], { items: (Reaction | string)[]; feedKeys: string[]; structure: StoichStructure }>();

function sameItems<T>(a: readonly T[], b: readonly T[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function structureFor(feedKeys: string[], reactions: readonly (Reaction | string)[], fn: string): StoichStructure {
  const prepared = reactions.map((r, i) => prepareReaction(r, i, fn));
  const cacheKey = `${feedKeys.join("\u0000")}\u0001${prepared.map((r) => `${r.label}\u0002${r.species.join("\u0000")}`).join("\u0001")}`;
  let st = structureCache.get(cacheKey);
  if (st === undefined || st.reactions.some((r, j) => r !== prepared[j])) {
    st = buildStructure(feedKeys, prepared, fn);
    if (structureCache.size >= STRUCTURE_CACHE_LIMIT) structureCache.clear();
    structureCache.set(cacheKey, st);
  }
  lastStructure.set(reactions, { items: reactions.slice(), feedKeys, structure: st });
  return st;
}

function buildStructure(feedKeys: readonly string[], prepared: PreparedReaction[], fn: string): StoichStructure {
  const species: string[] = [];
  const index = new Map<string, number>();
  const formulas: Formula[] = [];
  for (const key of feedKeys) {
    index.set(key, species.length);
    species.push(key);
    formulas.push(formulaOf(key, fn, "feed"));
  }
  const feedCount = species.length;
  const alias = new Map<string, number>();
  for (const r of prepared) {
    r.species.forEach((key, k) => {
      if (index.has(key) || alias.has(key)) return;
      const target = matchByPhase(key, species.slice(0, feedCount), fn);
      if (target !== undefined) {
        alias.set(key, index.get(target) as number);
        return;
      }
      index.set(key, species.length);
      species.push(key);
      formulas.push(r.formulas[k] as Formula);
    });
  }
  const n = species.length;
  const nu: Rational[][] = [];
  const nuF: number[][] = [];
  const reacting: boolean[] = new Array<boolean>(n).fill(false);
  const consumed: boolean[] = new Array<boolean>(n).fill(false);
  const produced: boolean[] = new Array<boolean>(n).fill(false);
  for (const r of prepared) {
    const row: Rational[] = new Array<Rational>(n).fill(ZERO);
    r.species.forEach((key, k) => {
      const s = index.get(key) ?? (alias.get(key) as number);
      row[s] = rationalAdd(row[s] as Rational, r.nu[k] as Rational);
    });
    row.forEach((c, s) => {
      if (!rationalIsZero(c)) reacting[s] = true;
      if (c.num < 0n) consumed[s] = true;
      if (c.num > 0n) produced[s] = true;
    });
    nu.push(row);
    nuF.push(row.map(rationalToNumber));
  }
  for (const [key, s] of alias) index.set(key, s);
  const yieldRatio: (Rational | null | "inconsistent")[][] = [];
  const proportional: boolean[][] = [];
  for (let p = 0; p < n; p++) {
    const yr: (Rational | null | "inconsistent")[] = [];
    const pr: boolean[] = [];
    for (let a = 0; a < n; a++) {
      yr.push(produced[p] && consumed[a] && a !== p ? ratioOf(nu, p, a) : null);
      pr.push(produced[p] && produced[a] && a !== p ? columnsProportional(nu, p, a) : false);
    }
    yieldRatio.push(yr);
    proportional.push(pr);
  }
  const nuSafe = safeOrNull(() => nu.map((row) => row.map(sqFromRational)));
  const yieldPairs: YieldPair[] = [];
  yieldRatio.forEach((ratios, p) =>
    ratios.forEach((ratio, a) => {
      if (ratio !== null && ratio !== "inconsistent") {
        yieldPairs.push({ p, a, ratio, ratioSafe: safeOrNull(() => sqFromRational(ratio)), ratioF: rationalToNumber(ratio) });
      }
    }),
  );
  const structure = { species, index, feedCount, formulas, nu, nuF, nuSafe, reactions: prepared, reacting, consumed, produced, yieldRatio, proportional, yieldPairs };
  // exact feed, computed on first use by each per-call system that inherits this structure
  let lastSafe: { values: number[]; safe: SafeQ[] } | null = null;
  Object.defineProperty(structure, "feedSafe", {
    get(this: { feed: number[] }): readonly SafeQ[] {
      const feed = this.feed;
      if (lastSafe !== null && sameItems(lastSafe.values, feed)) return lastSafe.safe;
      const safe = feed.map(sqFromNumber);
      lastSafe = { values: feed, safe };
      return safe;
    },
  });
  Object.defineProperty(structure, "feedQ", {
    get(this: { feed: number[]; exactFeed: Rational[] | null }): Rational[] {
      this.exactFeed ??= this.feed.map((v, i) => (i < feedCount ? rationalFromNumber(v) : ZERO));
      return this.exactFeed;
    },
  });
  return structure;
}

function safeOrNull<T>(f: () => T): T | null {
  try {
    return f();
  } catch (e) {
    if (e instanceof SafeOverflow) return null;
    throw e;
  }
}

function ratioOf(nu: Rational[][], p: number, a: number): Rational | null | "inconsistent" {
  let ratio: Rational | null = null;
  for (const row of nu) {
    const np = row[p] as Rational;
    const na = row[a] as Rational;
    if (np.num > 0n && na.num < 0n) {
      const r = rationalDiv(np, rationalNeg(na));
      if (ratio === null) ratio = r;
      else if (!rationalIsZero(rationalSub(ratio, r))) return "inconsistent";
    }
  }
  return ratio;
}

function columnsProportional(nu: Rational[][], a: number, b: number): boolean {
  let k: Rational | null = null;
  for (const row of nu) {
    const ca = row[a] as Rational;
    const cb = row[b] as Rational;
    if (rationalIsZero(ca) !== rationalIsZero(cb)) return false;
    if (rationalIsZero(cb)) continue;
    const r = rationalDiv(ca, cb);
    if (k === null) k = r;
    else if (!rationalIsZero(rationalSub(k, r))) return false;
  }
  return true;
}

function matchByPhase(key: string, candidates: readonly string[], fn: string): string | undefined {
  const k = stripPhase(key);
  const hits = candidates.filter((c) => {
    const s = stripPhase(c);
    return s.base === k.base && (!s.hasPhase || !k.hasPhase);
  });
  if (hits.length > 1) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: species "${key}" could be any of ${hits.join(", ")}; write the phase`, {
      species: key,
      choices: hits,
    });
  }
  return hits[0];
}

/** Index of a species named in a spec or measurement: exact key, else a unique phase-less match. */
export function resolveSpecies(sys: StoichSystem, key: string, fn: string): number | undefined {
  const direct = sys.index.get(key);
  if (direct !== undefined) return direct;
  const hit = matchByPhase(key, sys.species, fn);
  if (hit !== undefined) return sys.index.get(hit);
  return undefined;
}
