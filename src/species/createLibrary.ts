import { buildSpecies } from "./internal/speciesObject.js";
import { mergeLibrary, SpeciesLibrary } from "./internal/speciesLibrary.js";
import { libraryOf } from "./species.js";
import type { Library, Species } from "./types.js";
import { validateSpeciesData } from "./validateSpeciesData.js";
import { knownKeys, optionsOf } from "../errors.js";

/** The option keys createLibrary reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<CreateLibraryOptions>()("base");

/**
 * Options of {@link createLibrary}.
 *
 * @category Species
 */
export interface CreateLibraryOptions {
  /**
   * The library the new data are merged over: the built-in set ({@link builtInLibrary}), another
   * library made by `createLibrary`, or `null` for a library holding only the new data.
   * @defaultValue the built-in library
   */
  base?: Library | null;
}

/**
 * Make a species library from a species data file (parsed JSON), merged over the built-in set.
 *
 * The data are validated first ({@link validateSpeciesData}): the zod schema plus contiguous
 * ranges, Cp > 0, formula ↔ key, resolvable source ids and no prototype-polluting keys. A file
 * that fails is rejected whole, with every problem listed; nothing from it enters any library.
 *
 * Merging: **user entries win**. An entry whose key exists in the base becomes that key's default
 * (unless marked `alternative`); the base's entries stay selectable by their data set, e.g.
 * `library.get("CH4(g)", { dataset: "nist-janaf" })`. Libraries are immutable values: the base is
 * not changed, and the returned library shares the base's species objects.
 *
 * Each species uses the standard state of its data (298.15 K, 1 bar, ideal gas): H°(T) =
 * ΔfH°(298.15 K) + ∫Cp dT, S(T, P) = S°298 + ∫Cp/T dT − R·ln(P/P°) for gases, with no
 * pressure term for condensed phases.
 *
 * @param data - a species data file: `{ sources: { id: citation }, species: [...] }`
 * @param options - see {@link CreateLibraryOptions}
 * @returns a new library
 * @throws RxthermError `INVALID_DATA` when the data fail validation, details `{ issues: { path, message }[] }`
 * @category Species
 * @example
 * const lib = createLibrary({
 *   sources: { pilot: "Pilot methanol reactor data sheet (invented demo scenario)" },
 *   species: [{
 *     key: "C5H8O2(l)", formula: "C5H8O2", phase: "l", name: "demo solvent",
 *     hf298KJPerMol: -390, hf298Source: "pilot", s298JPerMolK: 230, s298Source: "pilot",
 *     heatCapacity: { source: "pilot", ranges: [{ TminK: 280, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 180 } }] },
 *   }],
 * });
 * lib.get("demo solvent").enthalpy(350) // => -380667 (J/mol; −390 000 + 180 × 51.85)
 * lib.has("CO2(g)") // => true (the built-in set is underneath)
 * @see NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), introduction: the standard state and H°(T) − H°(298.15 K)
 */
export function createLibrary(data: unknown, options: CreateLibraryOptions = {}): Library {
  options = optionsOf(options, "createLibrary", "options", OPTION_KEYS);
  const valid = validateSpeciesData(data);
  const entries: { species: Species; alternative: boolean }[] = valid.species.map((e) => ({
    species: buildSpecies(e),
    alternative: e.alternative === true,
  }));
  const base = options.base === null ? null : libraryOf(options.base, "createLibrary", "options.base");
  if (base !== null && !(base instanceof SpeciesLibrary)) {
    // a library from elsewhere: copy its default entries under their own data-set labels
    const copied = mergeLibrary(null, base.all().map((s) => ({ species: s, alternative: false })), {});
    return mergeLibrary(copied, entries, valid.sources);
  }
  return mergeLibrary(base, entries, valid.sources);
}
