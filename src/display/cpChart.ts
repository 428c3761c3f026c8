import { optionsOf } from "../errors.js";
import type { Library, Species } from "../species/types.js";
import { speciesChart } from "./internal/speciesChart.js";
import type { ChartSpec, SpeciesChartOptions } from "./types.js";

export { MAX_CHART_POINTS, MAX_CHART_SERIES } from "./internal/makeChart.js";

/**
 * Options of {@link cpChart} and {@link enthalpyChart}: the temperature window and sampling, plus the library
 * that resolves species keys.
 *
 * @category Display
 */
export interface CpChartOptions extends SpeciesChartOptions {
  /** Library that resolves species keys. @defaultValue the built-in library */
  library?: Library;
}

/**
 * Chart of the standard molar heat capacity Cp°(T) of one or more species, as a Vega-Lite v5 specification
 * (line per species; x `T (K)`, y `Cp° (J/(mol·K))`).
 *
 * Each species is sampled at `points` temperatures spread evenly over its own data range clipped to
 * [TminK, TmaxK], from the same Cp(T) data `species(key).cp(T)` uses (standard state 1 bar, ideal gas). A
 * notebook renders the returned object as a chart; `JSON.stringify` gives the spec for any Vega-Lite tool.
 *
 * @param input - species key(s) or Species object(s)
 * @param options - temperature window (K), points per species, chart size, library
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `UNKNOWN_SPECIES` / `AMBIGUOUS_PHASE` from the lookup, `OUT_OF_RANGE` when a species has no
 *   data inside the window, `INVALID_ARGUMENT` for an empty list, an entry that is neither a key nor a species, or a
 *   bad window, point count or size; `TOO_LARGE` above `MAX_CHART_POINTS` points or `MAX_CHART_SERIES` species
 * @category Display
 * @example
 * const chart = cpChart(["N2(g)", "CO2(g)"], { TminK: 300, TmaxK: 1500, points: 25 });
 * chart.data.values.length  // => 50
 * chart.encoding.y.title    // => "Cp° (J/(mol·K))"
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function cpChart(input: string | Species | readonly (string | Species)[], options?: CpChartOptions): ChartSpec {
  const o = optionsOf(options, "cpChart");
  return speciesChart("cpChart", input, {
    title: "heat capacity Cp°(T)",
    axis: "Cp° (J/(mol·K))",
    at: (s, T) => s.cp(T),
  }, o, o.library);
}
