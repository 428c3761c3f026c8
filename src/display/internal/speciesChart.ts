/**
 * Private: the line chart of a species property against temperature (shared by cpChart and enthalpyChart).
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, requireArray } from "../../errors.js";
import { species as lookUp } from "../../species/species.js";
import type { Library, Species } from "../../species/types.js";
import { STANDARD_TEMPERATURE_K } from "../../units.js";
import type { ChartSpec, SpeciesChartOptions } from "../types.js";
import { checkPositive, makeChart, MAX_CHART_SERIES } from "./makeChart.js";

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
  const list: readonly unknown[] = Array.isArray(input) ? requireArray(input, fn, "input", MAX_CHART_SERIES) : [input];
  if (list.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one species`, { path: "input" });
  const lo = checkPositive(fn, "TminK", options.TminK ?? STANDARD_TEMPERATURE_K);
  const hi = checkPositive(fn, "TmaxK", options.TmaxK ?? 2000);
  const points = checkPositive(fn, "points", options.points ?? 60, true);
  if (!(hi > lo)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires TmaxK > TminK, got ${lo} and ${hi}`, { path: "options.TmaxK", TminK: lo, TmaxK: hi });
  const resolved = list.map((item, i) => speciesOf(fn, item, Array.isArray(input) ? `input[${i}]` : "input", library));
  const values: Record<string, number | string>[] = [];
  for (const s of resolved) {
    const a = Math.max(lo, s.range[0]);
    const b = Math.min(hi, s.range[1]);
    if (!(b > a)) {
      throw new RxthermError("OUT_OF_RANGE", `${fn}: ${s.key} has no data between ${lo} and ${hi} K (range [${s.range[0]}, ${s.range[1]}] K)`, {
        species: s.key, range: [s.range[0], s.range[1]], T: [lo, hi],
      });
    }
    for (let i = 0; i < points; i++) {
      const T = i === points - 1 ? b : a + (i * (b - a)) / (points - 1); // from the index, no accumulated step
      const value = property.at(s, T);
      if (!Number.isFinite(value)) {
        throw new RxthermError("INVALID_ARGUMENT", `${fn}: ${s.key} gives no finite value at ${T} K`, { path: "input", species: s.key, T });
      }
      values.push({ species: s.key, T, value });
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

/** A species key (looked up in `library`) or a Species object (checked for what the chart reads). */
function speciesOf(fn: string, item: unknown, path: string, library: Library | undefined): Species {
  if (typeof item === "string") return lookUp(item, library);
  const s = item as Partial<Species> | null;
  if (
    typeof s !== "object" || s === null || Array.isArray(s) || typeof s.key !== "string" ||
    !Array.isArray(s.range) || s.range.length !== 2 || !Number.isFinite(s.range[0]) || !Number.isFinite(s.range[1]) ||
    typeof s.cp !== "function" || typeof s.enthalpy !== "function" || !Number.isFinite(s.hf298)
  ) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires species keys or species objects, got ${describeValue(item)} at ${path}`, {
      path,
      value: describeValue(item),
    });
  }
  return s as Species;
}
