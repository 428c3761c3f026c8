import { RxthermError, describeValue, requireArray } from "../errors.js";
import type { Species } from "./types.js";

const FN = "noteExtrapolation";

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
 * @throws RxthermError `INVALID_ARGUMENT` (details `path`) when T is not a finite temperature > 0 K, `list`
 *   is not an array of `{ species, T, range }` points, or a species has no key and range; nothing is
 *   appended then. `TOO_LARGE` for a list or species array longer than `MAX_INPUT_ARRAY_LENGTH` (100 000).
 * @category Species
 * @example
 * const list: ExtrapolatedPoint[] = [];
 * noteExtrapolation(list, [species("CaCO3(cr)"), species("CaO(cr)")], 1150);
 * list // => [{ species: "CaCO3(cr)", T: 1150, range: [298, 775] }] (CaO data reach 3200 K)
 */
export function noteExtrapolation(list: ExtrapolatedPoint[], species: Species | readonly Species[], T: number): ExtrapolatedPoint[] {
  if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
    throw new RxthermError("INVALID_ARGUMENT", `noteExtrapolation requires T to be a finite temperature > 0 K, got ${describeValue(T)}`, {
      path: "T",
      value: describeValue(T),
    });
  }
  checkList(list);
  const all: readonly unknown[] = Array.isArray(species) ? requireArray(species, FN, "species") : [species];
  for (let i = 0; i < all.length; i++) checkSpecies(all[i], Array.isArray(species) ? `species[${i}]` : "species");
  for (const sp of all as readonly Species[]) appendExtrapolated(list, sp, T);
  return list;
}

/**
 * {@link noteExtrapolation} of one species without the checks, for the library's own callers, whose
 * list, species and T are already known to be well formed (a finite T > 0 K, a library species).
 * @internal
 */
export function appendExtrapolated(list: ExtrapolatedPoint[], sp: Species, T: number): void {
  const range = sp.range;
  if (T >= range[0] && T <= range[1]) return;
  for (let i = 0; i < list.length; i++) if (list[i]!.species === sp.key && list[i]!.T === T) return;
  list.push(Object.freeze({ species: sp.key, T, range }));
}

// ── private helpers ──────────────────────────────────────────────────────────

/** The list must be an array (no holes) of points with a species key and a finite T. */
function checkList(list: unknown): void {
  const entries = requireArray(list, FN, "list");
  for (let i = 0; i < entries.length; i++) {
    const p = entries[i] as Partial<ExtrapolatedPoint> | null;
    if (typeof p !== "object" || p === null || typeof p.species !== "string" || !isFiniteNumber(p.T) || !isRange(p.range)) {
      throw new RxthermError("INVALID_ARGUMENT", `${FN} requires list[${i}] to be a point { species, T, range } of finite numbers, got ${describeValue(p)}`, {
        path: `list[${i}]`,
      });
    }
  }
}

/** A species (or species-like object) with a text key and a range of two finite temperatures. */
function checkSpecies(sp: unknown, path: string): void {
  const s = sp as Partial<Species> | null;
  if (typeof s !== "object" || s === null || typeof s.key !== "string" || !isRange(s.range)) {
    throw new RxthermError("INVALID_ARGUMENT", `${FN} requires ${path} to be a Species (from species() or a library), got ${describeValue(sp)}`, {
      path,
      value: describeValue(sp),
    });
  }
}

function isFiniteNumber(x: unknown): x is number {
  return typeof x === "number" && Number.isFinite(x);
}

/** `[lo, hi]`: an array of exactly two finite numbers. */
function isRange(r: unknown): boolean {
  return Array.isArray(r) && r.length === 2 && isFiniteNumber(r[0]) && isFiniteNumber(r[1]);
}
