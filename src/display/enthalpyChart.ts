import { optionsOf } from "../errors.js";
import type { Species } from "../species/types.js";
import type { CpChartOptions } from "./cpChart.js";
import { speciesChart } from "./internal/speciesChart.js";
import type { ChartSpec } from "./types.js";

/**
 * Options of {@link enthalpyChart}.
 *
 * @category Display
 */
export interface EnthalpyChartOptions extends CpChartOptions {
  /** Draw H°(T) itself (formation enthalpy included) instead of the sensible part H°(T) − ΔfH°298. @defaultValue false */
  absolute?: boolean;
}

/**
 * Chart of the molar enthalpy of one or more species against temperature, as a Vega-Lite v5 specification:
 * by default the sensible part H°(T) − ΔfH°(298.15 K) (which starts at 0 for every species, so they compare on
 * one axis), or H°(T) itself with `absolute: true`; in kJ/mol.
 *
 * Values come from `species(key).enthalpy(T)` (ΔfH°298 + ∫Cp dT from 298.15 K, transitions included; standard
 * state 1 bar, ideal gas), sampled evenly over each species' data range clipped to [TminK, TmaxK].
 *
 * @param input - species key(s) or Species object(s)
 * @param options - temperature window (K), points, chart size, library, absolute
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `UNKNOWN_SPECIES` / `AMBIGUOUS_PHASE` from the lookup, `OUT_OF_RANGE` when a species has no
 *   data inside the window, `INVALID_ARGUMENT` for an empty list, an entry that is neither a key nor a species, or a
 *   bad window, point count or size; `TOO_LARGE` above `MAX_CHART_POINTS` points or `MAX_CHART_SERIES` species
 * @category Display
 * @example
 * const chart = enthalpyChart("N2(g)", { TminK: 298.15, TmaxK: 1000, points: 2 });
 * chart.data.values[1].value  // => 21.46 (kJ/mol, rounded; NIST-JANAF lists 21.463 kJ/mol at 1000 K)
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function enthalpyChart(input: string | Species | readonly (string | Species)[], options?: EnthalpyChartOptions): ChartSpec {
  const o = optionsOf(options, "enthalpyChart");
  const absolute = o.absolute === true;
  return speciesChart("enthalpyChart", input, absolute
    ? { title: "enthalpy H°(T)", axis: "H° (kJ/mol)", at: (s, T) => s.enthalpy(T) / 1000 }
    : { title: "sensible enthalpy H°(T) − ΔfH°298", axis: "H° − ΔfH°298 (kJ/mol)", at: (s, T) => (s.enthalpy(T) - s.hf298) / 1000 },
  o, o.library);
}
