import type { FlameSweepResult } from "../flame/flameTemperatureSweep.js";
import { makeChart } from "./internal/makeChart.js";
import { sweepAxis } from "./internal/sweepAxis.js";
import type { ChartSpec } from "./types.js";

/**
 * Chart of the adiabatic flame temperature against the swept setting of a {@link flameTemperatureSweep}
 * (equivalence ratio, excess air in %, reactant, fuel or oxidizer preheat temperature in K, or pressure in
 * kPa), as a Vega-Lite v5 line chart with points; y `adiabatic flame temperature (K)`.
 *
 * The values are the sweep's own (no recomputation). The adiabatic flame temperature is an upper bound
 * that real flames (heat loss, incomplete mixing) do not reach; refractory and furnace limits follow local
 * codes and licensed engineering practice.
 *
 * @param sweep - the result of `flameTemperatureSweep`
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `INVALID_ARGUMENT` when `sweep` is not a flame sweep result (unknown parameter; `values` and `T`
 *   not arrays of finite numbers of one non-zero length); `TOO_LARGE` past 100 000 points
 * @category Display
 * @example
 * const sweep = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] });
 * flameChart(sweep).encoding.x.title // => "equivalence ratio φ (–)"
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function flameChart(sweep: FlameSweepResult): ChartSpec {
  const axis = sweepAxis("flameChart", sweep);
  return makeChart({
    title: "adiabatic flame temperature",
    values: sweep.T.map((T, i) => ({ x: axis.x[i] as number, T })),
    mark: { type: "line", point: true },
    x: { field: "x", type: "quantitative", title: axis.title },
    y: { field: "T", type: "quantitative", title: "adiabatic flame temperature (K)", scale: { zero: false } },
  });
}
