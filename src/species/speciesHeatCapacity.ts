/**
 * Private link from the species layer to the compiled heat-capacity model of a species, for
 * callers that sum the polynomials of several species (the complete-combustion flame balance).
 * Not part of the public API.
 *
 * @module
 * @internal
 */
import type { HeatCapacity } from "../heat-capacity/createHeatCapacity.js";
import { speciesModelOf } from "./internal/speciesObject.js";
import type { Species } from "./types.js";

/**
 * The heat-capacity model behind a species of a library, when H°(T) = `hf298` + its
 * `sensibleEnthalpy(T)` and Cp°(T) = its `cp(T)` (the nearest range extended beyond the data, as
 * with `{ extrapolate: true }`); null for a species with phase transitions or one not made by a library
 * (a caller's own object implementing {@link Species}), whose methods must then be called.
 *
 * @param sp - the species
 * @returns its model, or null
 * @internal
 */
export function speciesHeatCapacity(sp: Species): HeatCapacity | null {
  return speciesModelOf(sp);
}
