import { RxthermError, describeValue } from "../errors.js";
import type { EfficiencyCurveResult } from "../energy/firedTypes.js";
import { makeChart } from "./internal/makeChart.js";
import { sweepNumbers } from "./internal/sweepAxis.js";
import type { ChartSpec } from "./types.js";

/**
 * Chart of a fired heater's or boiler's efficiency against flue-gas temperature or excess air, from an
 * {@link efficiencyCurve} result: two Vega-Lite v5 lines with points, the LHV and the HHV basis, in %.
 *
 * The values are the curve's own (no recomputation). A flue temperature below the acid dew point corrodes
 * cold-end surfaces; minimum metal temperatures follow the equipment maker and local practice.
 *
 * @param curve - the result of `efficiencyCurve`
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `INVALID_ARGUMENT` when `curve` is not an efficiency curve (unknown parameter; `values`,
 *   `efficiencyLHV` and `efficiencyHHV` not arrays of finite numbers of one non-zero length, or a fraction whose
 *   value in % is not finite); `TOO_LARGE` past 100 000 points
 * @category Display
 * @example
 * const c = efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15 }, { parameter: "flueT", values: [400, 450, 500] });
 * efficiencyChart(c).encoding.x.title // => "flue-gas temperature (K)"
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function efficiencyChart(curve: EfficiencyCurveResult): ChartSpec {
  const fn = "efficiencyChart";
  if (curve === null || typeof curve !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an efficiencyCurve result, got ${describeValue(curve)}`, { path: "curve", value: describeValue(curve) });
  }
  const p = curve.parameter;
  if (p !== "flueT" && p !== "excessAir") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires curve.parameter "flueT" or "excessAir", got ${describeValue(p)}`, { path: "curve.parameter", value: describeValue(p) });
  }
  const x = sweepNumbers(fn, curve.values, "curve.values");
  if (x.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one point in curve.values`, { path: "curve.values" });
  const lhv = sweepNumbers(fn, curve.efficiencyLHV, "curve.efficiencyLHV", x.length);
  const hhv = sweepNumbers(fn, curve.efficiencyHHV, "curve.efficiencyHHV", x.length);
  const flue = p === "flueT";
  /** A value in % (fractions ×100), finite, or INVALID_ARGUMENT at its path. */
  const percent = (v: number, path: string): number => {
    const y = v * 100;
    if (!Number.isFinite(y)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be a fraction that stays finite in %, got ${describeValue(v)}`, { path, value: describeValue(v) });
    }
    return y;
  };
  const at = (i: number): number => (flue ? (x[i] as number) : percent(x[i] as number, `curve.values[${i}]`));
  const values = [
    ...lhv.map((e, i) => ({ basis: "LHV", x: at(i), efficiency: percent(e, `curve.efficiencyLHV[${i}]`) })),
    ...hhv.map((e, i) => ({ basis: "HHV", x: at(i), efficiency: percent(e, `curve.efficiencyHHV[${i}]`) })),
  ];
  return makeChart({
    title: "efficiency",
    values,
    mark: { type: "line", point: true },
    x: { field: "x", type: "quantitative", title: flue ? "flue-gas temperature (K)" : "excess air (%)", scale: { zero: false } },
    y: { field: "efficiency", type: "quantitative", title: "efficiency (%)", scale: { zero: false } },
    color: { field: "basis", type: "nominal", title: "basis" },
  });
}
