/**
 * The built-in species data set, in the species-data file format: the WebBook Shomate set
 * (default where it exists), the GRI-Mech 3.0 NASA-7 set (default only where the Shomate set has
 * no entry, selectable everywhere as dataset `"gri-mech-3.0"`) and formation data written from memory.
 * Plain data: nothing is computed at import; the built-in library validates and compiles it on
 * first use.
 *
 * @module
 */
import type { SpeciesDataInput } from "../schema.js";
import { SOURCES } from "../citation.js";
import { WEBBOOK_SHOMATE_SPECIES } from "./webbookShomate.js";
import { GRI_MECH_30_NASA7_SPECIES } from "./griMech30Nasa7.js";
import { FORMATION_TABLE_SPECIES } from "./formationTables.js";

/** Every built-in species entry with the source registry, as one species-data file. */
export function builtInSpeciesData(): SpeciesDataInput {
  return {
    description: "rxtherm built-in species data",
    units: { hf298: "kJ/mol", s298: "J/(mol K)", cp: "J/(mol K)", temperature: "K" },
    sources: { ...SOURCES },
    species: [...WEBBOOK_SHOMATE_SPECIES, ...GRI_MECH_30_NASA7_SPECIES, ...FORMATION_TABLE_SPECIES],
  };
}
