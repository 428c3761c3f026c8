import { RxthermError, describeValue } from "../errors.js";
import type { HeatDutyResult } from "../energy/heatDuty.js";
import { makeChart } from "./internal/makeChart.js";
import type { ChartSpec } from "./types.js";

/**
 * Bar chart of the breakdown of a {@link heatDuty} result (heat-of-reaction method), as a Vega-Lite v5
 * specification: sensible in (the heat to bring the feed to 298.15 K, so −sensibleIn), reaction at
 * 298.15 K, latent heat of phase changes, sensible out, −Δ(PV) for a rigid vessel (when not zero), and the
 * duty, their sum; y `heat (kJ or kW)` — kJ for amounts in mol, kW for flows in mol/s.
 *
 * @param duty - the result of `heatDuty`
 * @returns the Vega-Lite specification (with display methods)
 * @throws RxthermError `INVALID_ARGUMENT` when `duty` is not a heat duty result (its parts finite numbers)
 * @category Display
 * @example
 * const q = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } });
 * dutyChart(q).data.values.map((v) => v.part) // => ["sensible in", "reaction", "latent", "sensible out", "duty"]
 * @see Vega-Lite specification, version 5 (https://vega.github.io/vega-lite/)
 */
export function dutyChart(duty: HeatDutyResult): ChartSpec {
  if (duty === null || typeof duty !== "object" || Array.isArray(duty)) {
    throw new RxthermError("INVALID_ARGUMENT", `dutyChart requires a heatDuty result, got ${describeValue(duty)}`, { path: "duty", value: describeValue(duty) });
  }
  for (const field of DUTY_FIELDS) {
    const v: unknown = duty[field];
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new RxthermError("INVALID_ARGUMENT", `dutyChart requires a heatDuty result with a finite ${field}, got ${describeValue(v)}`, {
        path: `duty.${field}`,
        value: describeValue(v),
      });
    }
  }
  const parts: [string, number, string][] = [
    ["sensible in", -duty.sensibleIn, "part"],
    ["reaction", duty.reactionHeat, "part"],
    ["latent", duty.latentHeat, "part"],
    ["sensible out", duty.sensibleOut, "part"],
    ...(duty.pvTerm !== 0 ? [["−Δ(PV)", -duty.pvTerm, "part"] as [string, number, string]] : []),
    ["duty", duty.reaction, "total"],
  ];
  return makeChart({
    title: "heat duty breakdown",
    values: parts.map(([part, q, kind]) => ({ part, heat: q / 1000 + 0, kind })),
    mark: { type: "bar" },
    x: { field: "part", type: "nominal", title: "part of the balance", sort: null },
    y: { field: "heat", type: "quantitative", title: "heat (kJ or kW)" },
    color: { field: "kind", type: "nominal", title: "bar" },
  });
}

/** The numbers of a heat duty result that the chart draws. */
const DUTY_FIELDS = ["sensibleIn", "reactionHeat", "latentHeat", "sensibleOut", "pvTerm", "reaction"] as const;
