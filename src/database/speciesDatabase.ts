import { builtInLibrary } from "../species/builtInLibrary.js";
import { libraryOfSpecies, speciesFromParts } from "../species/libraryFromParts.js";
import type { Library, Species } from "../species/types.js";
import { BURCAT_RUSCIC_2005_CITATION } from "./data/burcatRuscic2005.js";
import { counterparts } from "./internal/counterparts.js";
import { databaseParts, DATASET } from "./internal/records.js";

/**
 * Options of {@link speciesDatabase}.
 *
 * @category Species database
 */
export interface SpeciesDatabaseOptions {
  /**
   * Layer the built-in species set over the database: where both hold a species, the built-in
   * (NIST-JANAF / WebBook-based) entry is the default and the database's entry stays selectable with
   * `{ dataset: "burcat-ruscic-2005" }` under the built-in key; the database key still finds it. Every
   * other database species keeps its own key.
   * @defaultValue false (the database alone)
   */
  withBuiltIn?: boolean;
}

const HINT = "search by formula, name or CAS number with findSpecies(query, library)";
let alone: Library | undefined;
let layered: Library | undefined;

/**
 * The opt-in species database: a {@link Library} of every usable record of the Burcat–Ruscic
 * thermochemical database, 2005 edition (1,306 species: gases, liquids and crystals; NASA
 * 7-coefficient polynomials as published, nothing refitted), for the species the built-in set lacks.
 *
 * Pass it wherever a library is accepted: `species(key, db)`, `findSpecies(query, db)`,
 * `heatDuty({ ..., library: db })`, `reactionEnthalpy(r, { library: db })`, the flame functions'
 * `library`. Keys are the formula with its phase (`CO2(g)`, `NH3(g)`, `Fe2O3(cr)`), with a tag in
 * front where several species share formula and phase (`acetone-C3H6O(g)`, `n-butane-C4H10(g)`);
 * the database's name text, label, CAS number and Hill formula find a species too.
 * docs/species-database.md lists the records used, skipped and fixed, and why.
 *
 * Standard state 298.15 K and 1 bar, ideal gas: H°(T) = ΔfH°(298.15 K) + ∫Cp dT; S(T, P) = S°(T) −
 * R·ln(P/P°) for gases. ΔfH° is the database's stated value; S°(298.15 K) comes from the polynomial.
 * Every value carries the source id `burcat-ruscic-2005`. Many records are calculated (group
 * additivity, quantum chemistry) rather than measured, with uncertainties of several kJ/mol: where
 * the built-in set has the species, prefer it (`withBuiltIn: true`), and check data that a design
 * or a safety decision depends on against the primary literature.
 *
 * Built on the first call, then shared (libraries are immutable): the records are parsed and the
 * species objects made at once, each species' Cp model is compiled on its first evaluation.
 *
 * @param options - see {@link SpeciesDatabaseOptions}
 * @returns the database as a library
 * @throws nothing for valid options (the data are checked by the test suite)
 * @category Species database
 * @example
 * const db = speciesDatabase();
 * db.keys().length // => 1306
 * species("acetone", db).key // => "acetone-C3H6O(g)"
 * Math.round(species("NH3(g)", db).enthalpy(1000)) // => -13378 (J/mol; ΔfH° −45.940 kJ/mol + H − H298 32.56 kJ/mol, record "NH3 Anharmonic")
 * speciesDatabase({ withBuiltIn: true }).get("CO2(g)").dataset // => "nist-janaf" (the built-in entry wins)
 * @see A. Burcat, B. Ruscic, Third Millennium Ideal Gas and Condensed Phase Thermochemical Database for Combustion
 *   with Updates from Active Thermochemical Tables, ANL-05/20 and TAE 960, Argonne National Laboratory / Technion (2005)
 */
export function speciesDatabase(options: SpeciesDatabaseOptions = {}): Library {
  if (options.withBuiltIn === true) return (layered ??= buildLayered());
  return (alone ??= libraryOfSpecies(
    databaseParts().map((parts) => ({ species: speciesFromParts(parts), alternative: false })), { [DATASET]: BURCAT_RUSCIC_2005_CITATION }, null, HINT,
  ));
}

/** The built-in set over the database: paired species move under the built-in key as a data-set variant. */
function buildLayered(): Library {
  const base = builtInLibrary();
  const db = speciesDatabase();
  const pairs = counterparts(base, db);
  const builtInKeyOf = new Map<string, string>();
  // where the built-in entry is itself this database's record, the database copy keeps its own key
  for (const [bKey, d] of pairs) if (!base.datasets(bKey).includes(DATASET)) builtInKeyOf.set(d.key, bKey);
  const paired = new Set([...pairs].filter(([bKey]) => !base.datasets(bKey).includes(DATASET)).map(([, d]) => d.key));
  const baseKeys = new Set(base.keys());
  const entries: { species: Species; alternative: boolean }[] = [];
  for (const parts of databaseParts()) {
    const bKey = builtInKeyOf.get(parts.key);
    if (bKey !== undefined) {
      const species = speciesFromParts({ ...parts, key: bKey, aliases: [...parts.aliases, parts.key.replace(/\([a-z]+\)$/, "")] });
      entries.push({ species, alternative: true });
    } else if (baseKeys.has(parts.key) && base.datasets(parts.key).includes(DATASET)) {
      // the built-in set already holds this record under the same key: the built-in entry stays
      continue;
    } else if (!paired.has(parts.key)) {
      // a key the built-in set also uses for a species the rule could not pair stays the built-in's
      entries.push({ species: db.get(parts.key), alternative: baseKeys.has(parts.key) });
    }
  }
  return libraryOfSpecies(entries, { [DATASET]: BURCAT_RUSCIC_2005_CITATION }, base);
}
