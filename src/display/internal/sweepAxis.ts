/**
 * Private: the x axis of a flame sweep chart — title with unit and the conversion from the API unit.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
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

/** The axis of a sweep, after checking that `sweep` looks like a flameTemperatureSweep result. */
export function sweepAxis(fn: string, sweep: FlameSweepResult): { title: string; x: (i: number) => number } {
  if (sweep === null || typeof sweep !== "object" || !Array.isArray(sweep.values) || !Array.isArray(sweep.T)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a flameTemperatureSweep result`, {});
  }
  const axis = AXES[sweep.parameter];
  if (axis === undefined) throw new RxthermError("INVALID_ARGUMENT", `${fn} does not know the swept setting ${String(sweep.parameter)}`, { parameter: sweep.parameter });
  return { title: axis.title, x: (i) => (sweep.values[i] as number) * axis.scale };
}
