/**
 * Species and libraries built from parts that are already checked (generated data sets whose checks
 * run in the test suite, such as the opt-in database of `rxtherm/database`), without the zod schema
 * and validator that {@link createLibrary} runs on user files. Not part of the public API.
 *
 * @module
 * @internal
 */
import { buildSpeciesFromParts, type SpeciesParts } from "./internal/speciesObject.js";
import { mergeLibrary, SpeciesLibrary } from "./internal/speciesLibrary.js";
import type { Library, Species } from "./types.js";

export type { SpeciesParts } from "./internal/speciesObject.js";

/**
 * A species from checked parts; its Cp model is compiled on its first evaluation.
 *
 * @param parts - the species' data
 * @returns the species
 * @internal
 */
export function speciesFromParts(parts: SpeciesParts): Species {
  return buildSpeciesFromParts(parts);
}

/**
 * A library of species merged over `base` (later entries win unless `alternative`: then the entry is
 * only a data-set variant of its key and the base's entry stays the default).
 *
 * @param entries - the species, each with whether it is only a data-set variant
 * @param sources - source id → full citation for the ids the species use
 * @param base - library underneath (its entries stay selectable by data set), or null
 * @param missingHint - where else to look, added to UNKNOWN_SPECIES messages
 * @returns the library
 * @internal
 */
export function libraryOfSpecies(
  entries: readonly { species: Species; alternative: boolean }[],
  sources: Record<string, string>,
  base: Library | null,
  missingHint?: string,
): Library {
  let under: SpeciesLibrary | null = null;
  if (base instanceof SpeciesLibrary) under = base;
  else if (base !== null) under = mergeLibrary(null, base.all().map((s) => ({ species: s, alternative: false })), {});
  return mergeLibrary(under, entries, sources, missingHint);
}
