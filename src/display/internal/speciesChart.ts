/**
 * Private: the line chart of a species property against temperature (shared by cpChart and enthalpyChart).
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import { species as lookUp } from "../../species/species.js";
import type { Library, Species } from "../../species/types.js";
import { STANDARD_TEMPERATURE_K } from "../../units.js";
import type { ChartSpec, SpeciesChartOptions } from "../types.js";
import { checkPositive, makeChart } from "./makeChart.js";

/** One property to draw: its axis title and how to evaluate it. */
export interface SpeciesProperty {
  readonly title: string;
  readonly axis: string;
  readonly at: (s: Species, T: number) => number;
}

/** Sample `property` of each species on its own data range clipped to [TminK, TmaxK]. */
export function speciesChart(
  fn: string, input: string | Species | readonly (string | Species)[], property: SpeciesProperty,
  options: SpeciesChartOptions, library: Library | undefined,
): ChartSpec {
  const list = Array.isArray(input) ? (input as readonly (string | Species)[]) : [input as string | Species];
  if (list.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one species`, {});
  const lo = checkPositive(fn, "TminK", options.TminK ?? STANDARD_TEMPERATURE_K);
  const hi = checkPositive(fn, "TmaxK", options.TmaxK ?? 2000);
  const points = checkPositive(fn, "points", options.points ?? 60, true);
  if (!(hi > lo)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires TmaxK > TminK, got ${lo} and ${hi}`, { TminK: lo, TmaxK: hi });
  const values: Record<string, number | string>[] = [];
  for (const item of list) {
    const s = typeof item === "string" ? lookUp(item, library) : item;
    const a = Math.max(lo, s.range[0]);
    const b = Math.min(hi, s.range[1]);
    if (!(b > a)) {
      throw new RxthermError("OUT_OF_RANGE", `${fn}: ${s.key} has no data between ${lo} and ${hi} K (range [${s.range[0]}, ${s.range[1]}] K)`, {
        species: s.key, range: [s.range[0], s.range[1]], T: [lo, hi],
      });
    }
    for (let i = 0; i < points; i++) {
      const T = i === points - 1 ? b : a + (i * (b - a)) / (points - 1); // from the index, no accumulated step
      values.push({ species: s.key, T, value: property.at(s, T) });
    }
  }
  return makeChart({
    title: property.title,
    ...(options.width !== undefined ? { width: checkPositive(fn, "width", options.width) } : {}),
    ...(options.height !== undefined ? { height: checkPositive(fn, "height", options.height) } : {}),
    values,
    mark: { type: "line" },
    x: { field: "T", type: "quantitative", title: "T (K)" },
    y: { field: "value", type: "quantitative", title: property.axis },
    color: { field: "species", type: "nominal", title: "species" },
  });
}
