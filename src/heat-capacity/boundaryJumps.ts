import { RxthermError, describeValue } from "../errors.js";
import { formAbsolute, formCp } from "./internal/cpCompile.js";
import type { HeatCapacity } from "./createHeatCapacity.js";

/**
 * How two adjacent ranges of a heat-capacity model meet at their shared boundary.
 *
 * @category Heat capacity
 */
export interface BoundaryJump {
  /** The shared boundary temperature, K. */
  readonly TK: number;
  /** Index of the lower range in {@link HeatCapacity.ranges}; the upper one is `lowerRange + 1`. */
  readonly lowerRange: number;
  /** Cp of the upper range's form minus Cp of the lower range's form at TK, J/(mol·K). */
  readonly cpJumpJPerMolK: number;
  /** The same jump relative to the lower range's Cp (dimensionless). */
  readonly cpRelativeJump: number;
  /**
   * Absolute enthalpy of the upper form minus that of the lower form at TK, J/mol, from their own
   * integration constants; null when either form carries none.
   */
  readonly enthalpyJumpJPerMol: number | null;
  /** Absolute entropy jump at TK, J/(mol·K), from the forms' own constants; null when either carries none. */
  readonly entropyJumpJPerMolK: number | null;
}

/**
 * Audit the internal boundaries of a piecewise heat-capacity model: the step in Cp, and in the
 * absolute enthalpy and entropy that each range's own integration constants imply.
 *
 * Published piecewise fits join only approximately: Cp usually steps by a fraction of a percent, and
 * the absolute H and S of the two forms (Shomate F/G, NASA a6/a7 or b1/b2) differ by the fitting
 * residual. The sensible integrals of {@link createHeatCapacity} are continuous whatever the jumps
 * (their constants are chained), but {@link HeatCapacity.absoluteEnthalpy} and
 * {@link HeatCapacity.absoluteEntropy} use each range's own constant and so step by exactly these
 * amounts. A large jump points to a transcription error or to mismatched data sets.
 *
 * @param model - a model from {@link createHeatCapacity}
 * @returns one entry per internal boundary, in increasing temperature (empty for a single range)
 * @category Heat capacity
 * @example
 * // O2(g), NIST Chemistry WebBook Shomate sets, 100–700 K and 700–2000 K
 * const o2 = createHeatCapacity([
 *   { TminK: 100, TmaxK: 700, cp: { form: "shomate", A: 31.32234, B: -20.23531, C: 57.86644, D: -36.50624, E: -0.007374, F: -8.903471, G: 246.7945 } },
 *   { TminK: 700, TmaxK: 2000, cp: { form: "shomate", A: 30.03235, B: 8.772972, C: -3.988133, D: 0.788313, E: -0.741599, F: -11.32468, G: 236.1663 } },
 * ]);
 * const [j] = boundaryJumps(o2);
 * j.cpJumpJPerMolK      // => 0.00068 J/(mol·K) at 700 K (rounded)
 * j.enthalpyJumpJPerMol // => -1.71 J/mol (rounded)
 * @see NIST Chemistry WebBook, SRD 69: Shomate parameters and their temperature ranges
 */
export function boundaryJumps(model: HeatCapacity): BoundaryJump[] {
  if (typeof model !== "object" || model === null || !Array.isArray(model.ranges) || typeof model.cp !== "function") {
    throw new RxthermError("INVALID_ARGUMENT", `boundaryJumps requires a HeatCapacity from createHeatCapacity, got ${describeValue(model)}`, { path: "model" });
  }
  const ranges = model.ranges;
  const jumps: BoundaryJump[] = [];
  for (let i = 0; i + 1 < ranges.length; i++) {
    const lower = ranges[i]!, upper = ranges[i + 1]!;
    const T = lower.TmaxK;
    const cpLow = formCp(lower.cp, T);
    const cpJump = formCp(upper.cp, T) - cpLow;
    const aLow = formAbsolute(lower.cp, T);
    const aUp = formAbsolute(upper.cp, T);
    jumps.push(Object.freeze({
      TK: T,
      lowerRange: i,
      cpJumpJPerMolK: cpJump,
      cpRelativeJump: cpJump / cpLow,
      enthalpyJumpJPerMol: aLow && aUp ? aUp.H - aLow.H : null,
      entropyJumpJPerMolK: aLow && aUp ? aUp.S - aLow.S : null,
    }));
  }
  return jumps;
}
