/**
 * Private links from the enthalpy and energy layers to the layers below (species lookup,
 * reaction parsing, balance check). Kept in one place so every enthalpy/energy routine
 * resolves species and reactions the same way and wraps lower-layer errors with its own name.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue } from "../errors.js";
import type { Library, Species } from "../species/types.js";
import type { Reaction } from "../reaction/types.js";
import { libraryOf, species } from "../species/species.js";
import { parseReaction } from "../reaction/parseReaction.js";
import { checkBalance } from "../reaction/checkBalance.js";
import { checkReactionShape } from "../reaction/checkReactionShape.js";

/**
 * The species `key` from `library`, or from the built-in set when no library is given.
 * Lower-layer errors (UNKNOWN_SPECIES, AMBIGUOUS_PHASE) are re-thrown naming `fn`.
 */
export function resolveSpecies(fn: string, key: string, library: Library | undefined): Species {
  try {
    if (library) return library.get(key);
    return builtInSpecies(key);
  } catch (e) {
    if (e instanceof RxthermError) {
      throw new RxthermError(e.code, `${fn} needs the data of ${key}: ${e.message.replace(/^\[rxtherm\] /, "")}`, { ...e.details, species: key });
    }
    throw e;
  }
}

const speciesCache = new WeakMap<object, Map<string, Species>>();
const BUILT_IN = {};

/** {@link resolveSpecies} with a per-library cache of key → Species (libraries are immutable). */
export function resolveSpeciesCached(fn: string, key: string, library: Library | undefined): Species {
  if (library !== undefined) libraryOf(library, fn, "library");
  const lib: object = library ?? BUILT_IN;
  let map = speciesCache.get(lib);
  if (!map) {
    map = new Map();
    speciesCache.set(lib, map);
  }
  const hit = map.get(key);
  if (hit) return hit;
  const s = resolveSpecies(fn, key, library);
  if (map.size > 4096) map.clear();
  map.set(key, s);
  return s;
}

/** A reaction object from a Reaction or its text. */
export function toReaction(fn: string, reaction: Reaction | string): Reaction {
  if (typeof reaction === "string") return parseReactionText(fn, reaction);
  checkReactionShape(reaction, fn);
  return reaction;
}

/**
 * Element and charge residuals (products − reactants) of a reaction, non-zero entries only,
 * computed exactly by {@link checkBalance}.
 */
export function reactionResiduals(reaction: Reaction): { residuals: Record<string, number>; charge: number } {
  const check = checkBalance(reaction);
  if (check.balanced) return { residuals: {}, charge: 0 };
  const residuals: Record<string, number> = {};
  for (const [el, v] of Object.entries(check.residuals)) if (v !== 0) residuals[el] = v;
  return { residuals, charge: check.charge === 0 ? 0 : check.charge };
}

function builtInSpecies(key: string): Species {
  return species(key);
}
function parseReactionText(_fn: string, text: string): Reaction {
  return parseReaction(text);
}
