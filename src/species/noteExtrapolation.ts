import type { Species } from "./types.js";

/**
 * A species evaluated outside the temperature range of its data (with `extrapolate: true`), as
 * results list it in their `extrapolated` field.
 *
 * @category Species
 */
export interface ExtrapolatedPoint {
  /** Species key, e.g. `"CaCO3(cr)"`. */
  readonly species: string;
  /** Temperature at which it was evaluated, K. */
  readonly T: number;
  /** The species' data range, K. */
  readonly range: readonly [number, number];
}

/**
 * Record species evaluations in an extrapolation list: appends `{ species, T, range }` for each
 * species (one or an array) whose data range {@link Species.range} does not hold T, unless the list
 * already holds that species at that temperature. Data that start between 298.15 K and 300 K (the NASA-polynomial convention)
 * are read down to 298.15 K, so their range starts at 298.15 K and 298.15 K counts as inside.
 *
 * Used by the energy, enthalpy and flame functions to build their `extrapolated` field; exported
 * for callers that evaluate species themselves.
 *
 * @param list - the list to append to (mutated; pass a fresh array per result)
 * @param species - the species evaluated (one, or several at the same T)
 * @param T - the temperature it was evaluated at, K
 * @returns the list (for chaining)
 * @category Species
 * @example
 * const list: ExtrapolatedPoint[] = [];
 * noteExtrapolation(list, [species("CaCO3(cr)"), species("CaO(cr)")], 1150);
 * list // => [{ species: "CaCO3(cr)", T: 1150, range: [298, 775] }] (CaO data reach 3200 K)
 */
export function noteExtrapolation(list: ExtrapolatedPoint[], species: Species | readonly Species[], T: number): ExtrapolatedPoint[] {
  const all: readonly Species[] = Array.isArray(species) ? species : [species as Species];
  for (const sp of all) {
    const [lo, hi] = sp.range;
    if (T >= lo && T <= hi) continue;
    if (!list.some((p) => p.species === sp.key && p.T === T)) list.push(Object.freeze({ species: sp.key, T, range: sp.range }));
  }
  return list;
}
