import { RxthermError } from "../errors.js";
import type { FlameSweepResult } from "../flame/flameTemperatureSweep.js";
import { makeChart } from "./internal/makeChart.js";
import { sweepAxis } from "./internal/sweepAxis.js";
import type { ChartSpec } from "./types.js";

/**
 * Options of {@link compositionChart}.
 *
 * @category Display
 */
export interface CompositionChartOptions {
  /** Species to draw (keys of the sweep's products). @defaultValue every species reaching `minFraction` somewhere */
  species?: readonly string[];
  /** Smallest peak mole fraction for a species to be drawn by default. @defaultValue 0.001 */
  minFraction?: number;
  /** Logarithmic y axis (shows minor species such as CO, NO and OH). @defaultValue false */
  logScale?: boolean;
}

/**
 * Chart of the product composition (gas mole fractions) against the swept setting of a
 * {@link flameTemperatureSweep} — typically against the equivalence ratio φ — as a Vega-Lite v5 line
 * chart, one line per species; y `mole fraction (mol/mol)`.
 *
 * Toxic or flammable products (CO, NO, H2) seen here are screening values at adiabatic equilibrium;
 * exposure and flammability checks follow local codes and licensed engineering practice.
 *
 * @param sweep - the result of `flameTemperatureSweep`
 * @param options - which species, threshold, log scale
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `INVALID_ARGUMENT` when `sweep` is not a flame sweep result, a requested species is not among
 *   its products, or `minFraction` is not a number in [0, 1)
 * @category Display
 * @example
 * const sweep = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] });
 * compositionChart(sweep, { species: ["CO2(g)", "H2O(g)"] }).data.values.length // => 4
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function compositionChart(sweep: FlameSweepResult, options: CompositionChartOptions = {}): ChartSpec {
  const fn = "compositionChart";
  const axis = sweepAxis(fn, sweep);
  const min = options.minFraction ?? 1e-3;
  if (typeof min !== "number" || !(min >= 0 && min < 1)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires minFraction in [0, 1), got ${String(min)}`, { minFraction: min });
  }
  const all = Object.keys(sweep.products);
  const chosen = options.species ?? all.filter((k) => (sweep.products[k] ?? []).some((y) => y >= min));
  for (const k of chosen) {
    if (!all.includes(k)) throw new RxthermError("INVALID_ARGUMENT", `${fn}: ${k} is not among the sweep's products (${all.join(", ")})`, { species: k });
  }
  const values = chosen.flatMap((k) => (sweep.products[k] ?? []).map((y, i) => ({ species: k, x: axis.x(i), y })));
  return makeChart({
    title: "product composition",
    values,
    mark: { type: "line", point: true },
    x: { field: "x", type: "quantitative", title: axis.title },
    y: { field: "y", type: "quantitative", title: "mole fraction (mol/mol)", ...(options.logScale === true ? { scale: { type: "log" } } : {}) },
    color: { field: "species", type: "nominal", title: "species" },
  });
}
