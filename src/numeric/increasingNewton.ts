/**
 * Private: Newton's method for an increasing function (an enthalpy or internal energy against
 * temperature), safeguarded by the bracket that every evaluation narrows. It needs no starting
 * bracket — the sign of each value tells on which side the root lies, so a good first guess
 * (the previous point of a sweep) costs one evaluation per Newton step and nothing more. A step
 * that leaves the known bracket is replaced by bisection, or by the limit itself while that
 * side is still unexplored; a root beyond an evaluated limit is reported as NO_BRACKET.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../errors.js";

/** Value and derivative of the function at a point. */
export interface ValueSlope {
  value: number;
  slope: number;
}

/** Outcome of {@link increasingNewton}. */
export interface IncreasingNewtonResult {
  /** The last evaluated point, within `tolerance` of the root. */
  x: number;
  /** f(x). */
  value: number;
  /** Evaluations used. */
  iterations: number;
}

/**
 * Root of an increasing f inside `limits`, from `x0`, to an absolute tolerance in x.
 * @param fn - the calling public function, for error messages
 */
export function increasingNewton(
  fn: string,
  f: (x: number) => ValueSlope,
  x0: number,
  limits: readonly [number, number],
  tolerance: number,
  maxIterations: number,
): IncreasingNewtonResult {
  let lo = limits[0];
  let hi = limits[1];
  let loKnown = false;
  let hiKnown = false;
  let x = Math.min(Math.max(x0, lo), hi);
  // the last values below and above the root (for the NO_BRACKET details)
  let lastLow = Number.NaN;
  let lastHigh = Number.NaN;
  for (let it = 1; it <= maxIterations; it++) {
    const { value, slope } = f(x);
    if (!Number.isFinite(value)) {
      throw new RxthermError("NO_CONVERGENCE", `${fn} met a non-finite energy at T = ${x} K`, { T: x, value });
    }
    if (value === 0) return { x, value, iterations: it };
    if (value < 0) {
      lo = x;
      loKnown = true;
      lastLow = value;
      if (x >= limits[1]) throw noBracket(fn, limits, lastLow, lastHigh);
    } else {
      hi = x;
      hiKnown = true;
      lastHigh = value;
      if (x <= limits[0]) throw noBracket(fn, limits, lastLow, lastHigh);
    }
    const step = slope > 0 && Number.isFinite(slope) ? -value / slope : Number.NaN;
    if (Math.abs(step) <= tolerance) return { x, value, iterations: it };
    let next = x + step;
    if (!(next > lo && next < hi)) {
      // outside the known bracket (or no usable slope): bisect, or probe the unexplored limit
      if (loKnown && hiKnown) next = 0.5 * (lo + hi);
      else next = value < 0 ? hi : lo;
    }
    if (loKnown && hiKnown && hi - lo <= tolerance) return { x, value, iterations: it };
    x = next;
  }
  throw new RxthermError(
    "NO_CONVERGENCE",
    `${fn} did not close the energy balance within ${maxIterations} temperature iterations`,
    { iterations: maxIterations, bracketK: [lo, hi], T: x },
  );
}

function noBracket(fn: string, limits: readonly [number, number], low: number, high: number): RxthermError {
  return new RxthermError(
    "NO_BRACKET",
    `${fn} found no temperature in [${limits[0]}, ${limits[1]}] K (the product data range) that closes the energy balance`,
    { rangeK: [limits[0], limits[1]], energyResidualsJ: [low, high] },
  );
}
