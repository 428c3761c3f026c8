import { builtInSpeciesData } from "./data/builtInSpeciesData.js";
import { buildSpecies } from "./internal/speciesObject.js";
import { mergeLibrary, type SpeciesLibrary } from "./internal/speciesLibrary.js";
import type { SpeciesEntry } from "./schema.js";
import type { Library } from "./types.js";

let cached: SpeciesLibrary | undefined;

/**
 * The built-in species library, created on first use and then shared (it is immutable).
 *
 * It holds, with a source id on every value: the NIST Chemistry WebBook Shomate set (gas-phase fits
 * from NIST-JANAF, 4th ed. 1998; data set `"nist-janaf"`, the default wherever it has the species);
 * the GRI-Mech 3.0 NASA-7 polynomials (data set `"gri-mech-3.0"`, the default only for species the Shomate
 * set lacks, selectable for the others: `library.get("CH4(g)", { dataset: "gri-mech-3.0" })`; GRI-Mech CH4,
 * NO2, N2O and high-T H2O deviate 1–4 % in Cp from NIST-JANAF); and ΔfH°, S° and a constant Cp° over a
 * narrow stated range for common fuels, solvents, process chemicals and minerals, written from memory
 * of the published tables (source id `memory`: check them before design use).
 *
 * Nothing is computed at import, and the data are not re-validated at run time: the test suite checks
 * them with {@link validateSpeciesData} (tests/species/builtInLibrary.test.ts). The first call builds
 * the species objects (well under a millisecond); each species compiles its Cp model on its first evaluation.
 *
 * @returns the built-in library
 * @category Species
 * @example
 * builtInLibrary().keys().length // => 73
 * builtInLibrary().get("methane").key // => "CH4(g)"
 * builtInLibrary().datasets("CH4(g)") // => ["nist-janaf", "gri-mech-3.0"]
 * @see {@link SOURCES} for the full citations
 */
export function builtInLibrary(): Library {
  if (cached === undefined) {
    // Trusted data: the schema and the validator run on them in the test suite, not here (issue 10:
    // validating at first use cost ~70 ms of start-up). The input and output shapes of the schema agree.
    const data = builtInSpeciesData() as { species: readonly SpeciesEntry[]; sources: Record<string, string> };
    cached = mergeLibrary(
      null,
      data.species.map((e) => ({ species: buildSpecies(e), alternative: e.alternative === true })),
      data.sources,
    );
  }
  return cached;
}
