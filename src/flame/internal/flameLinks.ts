/**
 * Private links from the flame layer to the species layer: species lookup (a caller's library
 * or the built-in set), re-throwing lower-layer errors with the flame function's name.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import type { Library, Species } from "../../species/types.js";
import { species } from "../../species/species.js";

/**
 * The species `key` from `library`, or from the built-in set when no library is given.
 * Lower-layer errors (UNKNOWN_SPECIES, AMBIGUOUS_PHASE...) are re-thrown naming `fn`.
 */
export function flameSpecies(fn: string, key: string, library: Library | undefined): Species {
  try {
    return species(key, library);
  } catch (e) {
    if (e instanceof RxthermError) {
      throw new RxthermError(e.code, `${fn} needs the data of ${key}: ${e.message.replace(/^\[rxtherm\] /, "")}`, { ...e.details, species: key });
    }
    throw e;
  }
}
