/**
 * The built-in species data set, in the species-data file format: the WebBook Shomate set
 * (default where it exists), the GRI-Mech 3.0 NASA-7 set (default only where no other set has
 * the species, selectable everywhere as dataset `"gri-mech-3.0"`), the Burcat–Ruscic 2005 NASA-7
 * set (`"burcat-ruscic-2005"`), the WebBook condensed-phase Shomate fits, Cp fits of NIST-JANAF
 * rows, published Cp equations, and the few entries no source was found for (`memory`).
 * The data files carry no names: each entry takes its `name` and `aliases` from the one table of
 * names, `SPECIES_NAMES` (src/formula/speciesNames.ts), which `combustion` reads too.
 * Plain data: nothing is computed at import; the built-in library validates and compiles it on
 * first use.
 *
 * @module
 */
import type { SpeciesDataInput, SpeciesEntryInput } from "../schema.js";
import { SOURCES } from "../citation.js";
import { SPECIES_NAMES } from "../../formula/speciesNames.js";
import { WEBBOOK_SHOMATE_SPECIES } from "./webbookShomate.js";
import { GRI_MECH_30_NASA7_SPECIES } from "./griMech30Nasa7.js";
import { BURCAT_RUSCIC_2005_SPECIES } from "./burcatRuscic2005.js";
import { WEBBOOK_CONDENSED_SPECIES } from "./webbookCondensedShomate.js";
import { JANAF_ROW_FIT_SPECIES } from "./janafRowFits.js";
import { PUBLISHED_EQUATION_SPECIES } from "./publishedEquations.js";
import { FORMATION_TABLE_SPECIES } from "./formationTables.js";

/** Every built-in species entry with the source registry, as one species-data file (names from `SPECIES_NAMES`). */
export function builtInSpeciesData(): SpeciesDataInput {
  const names = new Map(SPECIES_NAMES.map((r) => [r.key, r]));
  const named = (e: SpeciesEntryInput): SpeciesEntryInput => {
    const row = names.get(e.key);
    return row === undefined ? e : { ...e, name: row.name, ...(row.aliases.length > 0 ? { aliases: [...row.aliases] } : {}) };
  };
  return {
    description: "rxtherm built-in species data",
    units: { hf298: "kJ/mol", s298: "J/(mol K)", cp: "J/(mol K)", temperature: "K" },
    sources: { ...SOURCES },
    species: [
      ...WEBBOOK_SHOMATE_SPECIES, ...GRI_MECH_30_NASA7_SPECIES, ...BURCAT_RUSCIC_2005_SPECIES, ...WEBBOOK_CONDENSED_SPECIES,
      ...JANAF_ROW_FIT_SPECIES, ...PUBLISHED_EQUATION_SPECIES, ...FORMATION_TABLE_SPECIES,
    ].map(named),
  };
}
