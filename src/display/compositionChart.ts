import { RxthermError, describeValue, optionsOf, requireArray, requireRecord } from "../errors.js";
import type { FlameSweepResult } from "../flame/flameTemperatureSweep.js";
import { makeChart } from "./internal/makeChart.js";
import { sweepAxis, sweepNumbers } from "./internal/sweepAxis.js";
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
 * @throws RxthermError `INVALID_ARGUMENT` when `sweep` is not a flame sweep result (unknown parameter; `values`, `T`
 *   or a `products` entry not an array of finite numbers of one non-zero length), `options` is not an object,
 *   `species` is not a non-empty array of product keys, or `minFraction` is not a number in [0, 1);
 *   `TOO_LARGE` past 100 000 points or species
 * @category Display
 * @example
 * const sweep = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] });
 * compositionChart(sweep, { species: ["CO2(g)", "H2O(g)"] }).data.values.length // => 4
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function compositionChart(sweep: FlameSweepResult, options?: CompositionChartOptions): ChartSpec {
  const fn = "compositionChart";
  const axis = sweepAxis(fn, sweep);
  const o = optionsOf(options, fn);
  const min = o.minFraction ?? 1e-3;
  if (typeof min !== "number" || !(min >= 0 && min < 1)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires minFraction in [0, 1), got ${describeValue(min)}`, {
      path: "options.minFraction",
      value: describeValue(min),
    });
  }
  const productsIn = requireRecord(sweep.products, fn, "sweep.products");
  const products = new Map<string, readonly number[]>();
  for (const k of Object.keys(productsIn)) products.set(k, sweepNumbers(fn, productsIn[k], `sweep.products.${k}`, axis.x.length));
  let chosen: readonly string[];
  if (o.species === undefined) {
    chosen = [...products.keys()].filter((k) => (products.get(k) as readonly number[]).some((y) => y >= min));
  } else {
    const asked = requireArray(o.species, fn, "options.species");
    if (asked.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one species in options.species`, { path: "options.species" });
    asked.forEach((k, i) => {
      if (typeof k !== "string" || !products.has(k)) {
        const known = [...products.keys()].join(", ");
        throw new RxthermError("INVALID_ARGUMENT", `${fn}: ${describeValue(k)} is not among the sweep's products (${known.length > 200 ? `${known.slice(0, 200)}…` : known})`, {
          path: `options.species[${i}]`,
          species: describeValue(k),
        });
      }
    });
    chosen = asked as readonly string[];
  }
  const values = chosen.flatMap((k) => (products.get(k) as readonly number[]).map((y, i) => ({ species: k, x: axis.x[i] as number, y })));
  return makeChart({
    title: "product composition",
    values,
    mark: { type: "line", point: true },
    x: { field: "x", type: "quantitative", title: axis.title },
    y: { field: "y", type: "quantitative", title: "mole fraction (mol/mol)", ...(o.logScale === true ? { scale: { type: "log" } } : {}) },
    color: { field: "species", type: "nominal", title: "species" },
  });
}
