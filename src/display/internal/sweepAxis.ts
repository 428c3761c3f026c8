/**
 * Private: the x axis of a flame sweep chart — title with unit and the conversion from the API unit.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, requireArray } from "../../errors.js";
import type { FlameSweepResult } from "../../flame/flameTemperatureSweep.js";

/** Title and scale of each swept setting (excess air shown in %, pressure in kPa). */
const AXES: Readonly<Record<string, { readonly title: string; readonly scale: number }>> = {
  equivalenceRatio: { title: "equivalence ratio φ (–)", scale: 1 },
  excessAir: { title: "excess air (%)", scale: 100 },
  T: { title: "reactant temperature (K)", scale: 1 },
  fuelT: { title: "fuel temperature (K)", scale: 1 },
  oxidizerT: { title: "oxidizer preheat temperature (K)", scale: 1 },
  P: { title: "pressure (kPa)", scale: 1e-3 },
};

/** A checked sweep axis: its title and the x value of each point (in the axis unit). */
export interface SweepAxis {
  readonly title: string;
  readonly x: readonly number[];
}

/**
 * The axis of a sweep, after checking that `sweep` looks like a flameTemperatureSweep result: a known
 * `parameter`, and `values` and `T` arrays of finite numbers (no holes, at most MAX_INPUT_ARRAY_LENGTH),
 * of one length ≥ 1. INVALID_ARGUMENT / TOO_LARGE naming `fn`, with `details.path`.
 */
export function sweepAxis(fn: string, sweep: FlameSweepResult): SweepAxis {
  if (sweep === null || typeof sweep !== "object" || Array.isArray(sweep)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a flameTemperatureSweep result, got ${describeValue(sweep)}`, {
      path: "sweep",
      value: describeValue(sweep),
    });
  }
  const parameter: unknown = sweep.parameter;
  const axis = typeof parameter === "string" && Object.hasOwn(AXES, parameter) ? AXES[parameter] : undefined;
  if (axis === undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} does not know the swept setting ${describeValue(parameter)}`, {
      path: "sweep.parameter",
      parameter: describeValue(parameter),
    });
  }
  const values = sweepNumbers(fn, sweep.values, "sweep.values");
  if (values.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a sweep with at least one point`, { path: "sweep.values" });
  sweepNumbers(fn, sweep.T, "sweep.T", values.length);
  const x = values.map((v, i) => {
    const xi = v * axis.scale;
    if (!Number.isFinite(xi)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot draw the swept value ${v} (beyond float64 in ${axis.title})`, { path: `sweep.values[${i}]`, value: v });
    }
    return xi;
  });
  return { title: axis.title, x };
}

/**
 * A numeric column of a sweep at `path`: an array without holes of finite numbers, of `length`
 * entries when given. INVALID_ARGUMENT (TOO_LARGE past MAX_INPUT_ARRAY_LENGTH) otherwise.
 */
export function sweepNumbers(fn: string, value: unknown, path: string, length?: number): readonly number[] {
  const a = requireArray(value, fn, path);
  if (length !== undefined && a.length !== length) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to hold one entry per swept value (${length}), got ${a.length}`, {
      path,
      expected: length,
      size: a.length,
    });
  }
  for (let i = 0; i < a.length; i++) {
    const v = a[i];
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite numbers in ${path}, got ${describeValue(v)} at entry ${i}`, {
        path: `${path}[${i}]`,
        value: describeValue(v),
      });
    }
  }
  return a as readonly number[];
}
