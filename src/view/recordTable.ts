/**
 * Private to the library: build a view table from records keyed alike (species → flow, species →
 * fraction...), one row per key and one column per record.
 *
 * @module
 * @internal
 */
import type { ViewCell, ViewTable } from "./types.js";

/** One numeric column of a record table: its header and its key → value record. */
export interface RecordColumn {
  readonly label: string;
  readonly unit?: string;
  readonly digits?: number;
  readonly values: Readonly<Record<string, number>>;
}

/**
 * A table with one row per key found in any column (in order of first appearance) and an empty cell where a
 * record lacks the key. `keyLabel` heads the key column (`"species"` by default).
 */
export function recordTable(caption: string | undefined, columns: readonly RecordColumn[], keyLabel = "species"): ViewTable {
  const keys: string[] = [];
  const seen = new Set<string>();
  for (const c of columns) {
    for (const k of Object.keys(c.values)) {
      if (!seen.has(k)) { seen.add(k); keys.push(k); }
    }
  }
  const rows: ViewCell[][] = keys.map((k) => [k, ...columns.map((c) => c.values[k] ?? null)]);
  return {
    ...(caption !== undefined ? { caption } : {}),
    columns: [{ label: keyLabel }, ...columns.map((c) => ({ label: c.label, ...(c.unit !== undefined ? { unit: c.unit } : {}), ...(c.digits !== undefined ? { digits: c.digits } : {}) }))],
    rows,
  };
}

/** Unit label of flows in the API: amounts in mol or flows in mol/s, whichever the caller passed. */
export const FLOW_UNIT = "mol or mol/s";

/** Unit label of an energy that is J for amounts and W for flows, shown in kJ / kW. */
export const ENERGY_UNIT_K = "kJ or kW";

/** A species evaluated outside its data range, as the results list it (`ExtrapolatedPoint`). */
interface ExtrapolatedPointLike {
  readonly species: string;
  readonly T: number;
  readonly range: readonly [number, number];
}

/**
 * The note of a result computed with `extrapolate: true`: which species were evaluated outside their
 * data range, at which temperature (the first five). No note when the list is empty.
 */
export function extrapolationNotes(points: readonly ExtrapolatedPointLike[]): string[] {
  if (points.length === 0) return [];
  const shown = points.slice(0, 5).map((p) => `${p.species} at ${+p.T.toPrecision(6)} K (data ${p.range[0]}–${p.range[1]} K)`);
  const more = points.length > 5 ? ` and ${points.length - 5} more` : "";
  return [`extrapolated outside the data range, a screening number: ${shown.join(", ")}${more}`];
}
