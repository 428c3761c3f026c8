import { RxthermError, MAX_INPUT_ARRAY_LENGTH, describeValue, finiteResult, knownKeys, rejectUnknownKeys, requireArray } from "../errors.js";
import { detailValue, evaluateFired, excessAirOf, flueTemperature, prepareFired } from "./internal/firedModel.js";
import type { AvailableHeatInput, EfficiencyCurveResult } from "./firedTypes.js";
export type { EfficiencyCurveResult } from "./firedTypes.js";
import { attachView } from "../view/attachView.js";
import { EFFICIENCY_CURVE_VIEW } from "./internal/firedView.js";

const SWEEP_KEYS = /* @__PURE__ */ knownKeys<EfficiencySweep>()("parameter", "values");

/**
 * Which setting {@link efficiencyCurve} varies, and over which values.
 *
 * @category Fired equipment
 */
export interface EfficiencySweep {
  /** `"flueT"` (K) or `"excessAir"` (fraction). */
  parameter: "flueT" | "excessAir";
  /** The values, K for `flueT`, fractions for `excessAir` (at least one; at most 100 000). */
  values: readonly number[];
}


/**
 * The efficiency of a fired heater, furnace or boiler over a list of flue temperatures or
 * excess-air values — the same balance as {@link availableHeat}, prepared once and evaluated per
 * point (fuel, air and flue species resolved once; the flue gas is linear in the excess air).
 *
 * The base input is that of {@link availableHeat}; the swept setting replaces `flueT` or
 * `excessAir` (`equivalenceRatio` is then not allowed with `"excessAir"`). Same conventions,
 * sources and cautions as {@link availableHeat}: screening values; dew-point and corrosion limits
 * follow the equipment makers and local practice.
 *
 * @param input - as {@link availableHeat} (`flueT` may be omitted when it is swept)
 * @param sweep - the varied setting and its values
 * @returns arrays of available heat, stack loss (J per unit of fuel), efficiencies (fractions) and condensate, one entry per value
 * @throws RxthermError `INVALID_ARGUMENT` for an unknown parameter, an empty list or one with holes, a bad value (details: `path`, `index`, `value`), or any bad base input
 * @throws RxthermError `TOO_LARGE` for more than 100 000 values (details: `path`, `limit`, `size`)
 * @throws every error of {@link availableHeat}
 * @example
 * const c = efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 }, { parameter: "flueT", values: [400, 450, 500] });
 * c.efficiencyLHV.map((x) => x.toFixed(4)) // => ["0.9532", "0.9299", "0.9064"]
 * @category Fired equipment
 * @see {@link availableHeat} for the method and sources
 */
export function efficiencyCurve(input: Omit<AvailableHeatInput, "flueT"> & { flueT?: number }, sweep: EfficiencySweep): EfficiencyCurveResult {
  const fn = "efficiencyCurve";
  if (sweep === null || typeof sweep !== "object" || Array.isArray(sweep)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a sweep { parameter, values } with 1 to ${MAX_POINTS} values, got ${describeValue(sweep)}`, {
      path: "sweep",
      value: describeValue(sweep),
    });
  }
  rejectUnknownKeys(sweep, SWEEP_KEYS, fn, "sweep");
  const { parameter } = sweep;
  if (parameter !== "flueT" && parameter !== "excessAir") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} can vary "flueT" or "excessAir", got ${describeValue(parameter)}`, {
      path: "sweep.parameter",
      parameter: describeValue(parameter),
    });
  }
  const values = [...requireArray(sweep.values, fn, "sweep.values", MAX_POINTS)] as unknown[];
  if (values.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a sweep { parameter, values } with 1 to ${MAX_POINTS} values, got none`, {
      path: "sweep.values",
      length: 0,
    });
  }
  if (parameter === "excessAir" && input !== null && typeof input === "object" && input.equivalenceRatio !== undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} varies excessAir; drop equivalenceRatio from the base input`, {
      path: "input.equivalenceRatio",
      equivalenceRatio: detailValue(input.equivalenceRatio),
    });
  }
  const m = prepareFired(fn, input);
  const fixedE = parameter === "flueT" ? excessAirOf(m, input.excessAir, input.equivalenceRatio) : 0;
  const fixedT = parameter === "excessAir" ? flueTemperature(m, input.flueT as number) : 0;
  const n = values.length;
  const availableHeat = new Array<number>(n);
  const stackLoss = new Array<number>(n);
  const efficiencyLHV = new Array<number>(n);
  const efficiencyHHV = new Array<number>(n);
  const condensedWater = new Array<number>(n);
  const scratch = new Float64Array(m.flueKeys.length);
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    let p;
    try {
      p = parameter === "flueT"
        ? evaluateFired(m, fixedE, flueTemperature(m, v), scratch)
        : evaluateFired(m, excessAirOf(m, v, undefined), fixedT, scratch);
    } catch (e) {
      if (e instanceof RxthermError) {
        throw new RxthermError(e.code, `${fn} at ${parameter} = ${describeValue(v)} (index ${i}): ${e.message.replace(/^\[rxtherm\] /, "")}`, {
          ...e.details,
          path: `sweep.values[${i}]`,
          index: i,
          value: detailValue(v),
        });
      }
      throw e;
    }
    availableHeat[i] = p.availableHeat * m.scale;
    stackLoss[i] = p.stackLoss * m.scale;
    efficiencyLHV[i] = p.availableHeat / m.lhv;
    efficiencyHHV[i] = p.availableHeat / m.hhv;
    condensedWater[i] = p.condensedWater;
  }
  return attachView(finiteResult({
    parameter, values: values as number[], availableHeat, stackLoss, efficiencyLHV, efficiencyHHV, condensedWater,
    lhv: m.lhv * m.scale, hhv: m.hhv * m.scale,
    extrapolated: [...m.extrapolated], // frozen points
  }, fn), EFFICIENCY_CURVE_VIEW);
}

/** Largest number of points of one curve (more is `TOO_LARGE`); the library-wide input array cap. */
const MAX_POINTS = MAX_INPUT_ARRAY_LENGTH;
