import { RxthermError, describeValue, knownKeys, optionsOf } from "../errors.js";
import { builtInLibrary } from "./builtInLibrary.js";
import type { Library, LibraryGetOptions, Species } from "./types.js";

/** The option keys species() reads (a misspelt one is an error, not a silent default). */
const GET_KEYS = /* @__PURE__ */ knownKeys<LibraryGetOptions>()("dataset");

/**
 * Look up a species by key (`"CO2(g)"`), by formula when only one phase exists (`"CO2"`), or by
 * name (`"methane"`), in the built-in library or in `library`.
 *
 * The returned {@link Species} gives Cp°(T), H°(T) = ΔfH°(298.15 K) + ∫Cp dT from 298.15 K,
 * S(T, P) = S°298 + ∫Cp/T dT − R·ln(P/P°) for gases (P° = 1 bar; condensed phases get no pressure
 * term) and G = H − T·S, all in SI units (K, Pa, J/mol, J/(mol·K)); standard state 298.15 K, 1 bar,
 * ideal gas. Outside the data range they throw `OUT_OF_RANGE` unless `{ extrapolate: true }` is
 * passed; {@link Species.evaluate} then says `extrapolated: true`.
 *
 * @param key - species key, formula or name
 * @param library - where to look; the built-in library when omitted
 * @param options - `{ dataset }` to pick a data-set variant, e.g. `"gri-mech-3.0"`
 * @returns the species
 * @throws RxthermError `UNKNOWN_SPECIES` (details `{ key, suggestions }`), `AMBIGUOUS_PHASE` (details
 *   `{ key, choices }`, e.g. `"H2O"` → `H2O(g)`, `H2O(l)`), `AMBIGUOUS_SPECIES` (isomers, e.g. `"C4H10"`)
 * @category Species
 * @example
 * species("CO2(g)").enthalpy(1000) // => -360120 (J/mol, rounded; NIST-JANAF gives −393.522 + 33.397 = −360.125 kJ/mol)
 * species("CO2").key // => "CO2(g)"
 * @see M. W. Chase Jr., NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data Monograph 9 (1998)
 */
export function species(key: string, library?: Library, options?: LibraryGetOptions): Species {
  if (typeof key !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `species requires a key as text, got ${describeValue(key)}`, { path: "key", value: describeValue(key) });
  }
  return libraryOf(library, "species", "library").get(key, optionsOf(options, "species", "options", GET_KEYS));
}

/**
 * The library a function was given, or the built-in library when none (`undefined`). Anything
 * that is not a {@link Library} (a number, a Map, the `builtInLibrary` function itself...) is
 * INVALID_ARGUMENT with `details.path`. Not re-exported: the shared guard of every function
 * that takes a `library` or `base`.
 *
 * @internal
 */
export function libraryOf(library: unknown, fn: string, path: string): Library {
  if (library === undefined) return builtInLibrary();
  const l = library as Partial<Library> | null;
  if (typeof l !== "object" || l === null || typeof l.get !== "function" || typeof l.has !== "function" || typeof l.all !== "function") {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} requires ${path} to be a Library (from builtInLibrary() or createLibrary), got ${describeValue(library)}`,
      { path, value: describeValue(library) },
    );
  }
  return l as Library;
}
