/**
 * Private: a reaction resolved once against a species library — net signed coefficients
 * (products +, reactants −) as float and exact text, and the Species objects — cached so
 * that repeated evaluations at many temperatures cost only a loop over the species.
 *
 * @module
 * @internal
 */
import { RxthermError, isDeepFrozen } from "../errors.js";
import type { Library, Species } from "../species/types.js";
import type { Reaction } from "../reaction/types.js";
import { rationalAdd, rationalFromDecimalString, rationalNeg, type Rational } from "../numeric/rational.js";
import { reactionResiduals, resolveSpecies, toReaction } from "./resolveInputs.js";
import { libraryOf } from "../species/species.js";


/** A reaction resolved against a library. */
export interface PreparedReaction {
  readonly reaction: Reaction;
  /** Species keys as written (net, each once). */
  readonly keys: readonly string[];
  readonly species: readonly Species[];
  /** Net signed coefficients, products positive. */
  readonly nu: Float64Array;
  /** The same as exact rationals. */
  readonly nuExact: readonly Rational[];
}

const DEFAULT_LIBRARY = {};
const parsedText = new Map<string, Reaction>();
const PARSED_TEXT_LIMIT = 512;
const prepared = new WeakMap<object, WeakMap<Reaction, PreparedReaction>>();

/**
 * Resolve (or fetch from the cache) a reaction against a library. Throws UNBALANCED_REACTION
 * with the residuals when the reaction does not balance (elements and charge).
 */
export function prepareReaction(fn: string, input: Reaction | string, library: Library | undefined): PreparedReaction {
  let reaction: Reaction;
  if (typeof input === "string") {
    const hit = parsedText.get(input);
    if (hit) reaction = hit;
    else {
      reaction = toReaction(fn, input);
      if (parsedText.size >= PARSED_TEXT_LIMIT) parsedText.clear();
      parsedText.set(input, reaction);
    }
  } else reaction = toReaction(fn, input);
  if (library !== undefined) libraryOf(library, fn, "options.library");
  const libKey: object = library ?? DEFAULT_LIBRARY;
  let perLib = prepared.get(libKey);
  if (!perLib) {
    perLib = new WeakMap();
    prepared.set(libKey, perLib);
  }
  // Only a reaction that can no longer change is cached by identity (issue 11): results of
  // parseReaction / balanceReaction are deeply frozen; a user-built object is read afresh.
  const cacheable = typeof input === "string" || isDeepFrozen(reaction);
  const hit = cacheable ? perLib.get(reaction) : undefined;
  if (hit) return hit;
  const p = build(fn, reaction, library);
  if (cacheable) perLib.set(reaction, p);
  return p;
}

function build(fn: string, reaction: Reaction, library: Library | undefined): PreparedReaction {
  const { residuals, charge } = reactionResiduals(reaction);
  if (Object.keys(residuals).length > 0 || charge !== 0) {
    throw new RxthermError(
      "UNBALANCED_REACTION",
      `${fn} requires a balanced reaction; products − reactants leave ${Object.entries(residuals).map(([e, v]) => `${e} ${v}`).join(", ") || "no element"}${charge !== 0 ? ` and charge ${charge}` : ""}`,
      { residuals, charge },
    );
  }
  const order: string[] = [];
  const net = new Map<string, Rational>();
  const add = (key: string, r: Rational): void => {
    const prev = net.get(key);
    if (prev === undefined) order.push(key);
    net.set(key, prev === undefined ? r : rationalAdd(prev, r));
  };
  for (const t of reaction.reactants) add(t.species, rationalNeg(termRational(t)));
  for (const t of reaction.products) add(t.species, termRational(t));
  const keys = order.filter((k) => (net.get(k) as Rational).num !== 0n);
  const nuExact = keys.map((k) => net.get(k) as Rational);
  const nu = Float64Array.from(nuExact, (r) => Number(r.num) / Number(r.den));
  const species = keys.map((k) => resolveSpecies(fn, k, library));
  return Object.freeze({ reaction, keys: Object.freeze(keys), species: Object.freeze(species), nu, nuExact: Object.freeze(nuExact) });
}

function termRational(t: Reaction["reactants"][number]): Rational {
  const text = typeof t.exact === "string" && t.exact !== "" ? t.exact : String(t.coefficient);
  return rationalFromDecimalString(text);
}
