/**
 * Built-in species for which no published source was found in the project's reference files:
 * ΔfH°, S° and a constant Cp° over a narrow stated range, written from memory of the published
 * tables (NBS 1982, CODATA 1989) and therefore marked with the source id `memory`: check them
 * against the printed tables before design use. docs/species.md lists them.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const FORMATION_TABLE_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "HNO3(l)",
    "formula": "HNO3",
    "phase": "l",
    "dataset": "memory",
    "hf298KJPerMol": -174.1,
    "hf298Source": "memory",
    "s298JPerMolK": 155.6,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 356,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 109.87
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–356 K); the error grows away from 298 K; pure acid; no published temperature-dependent source was found in the project's reference files: every value is from memory, check before design use"
  },
  {
    "key": "NaHCO3(cr)",
    "formula": "NaHCO3",
    "phase": "cr",
    "dataset": "memory",
    "hf298KJPerMol": -950.81,
    "hf298Source": "memory",
    "s298JPerMolK": 101.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 87.61
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K; no published temperature-dependent source was found in the project's reference files: every value is from memory, check before design use"
  }
];
