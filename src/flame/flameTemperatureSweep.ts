import type { ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import { RxthermError, describeValue, knownKeys, optionsOf, rejectUnknownKeys, requireArray } from "../errors.js";
import { solveFlamePoint, type FlamePoint } from "./internal/flameProblem.js";
import { FLAME_OPTION_KEYS, flamePointOf, prepareFlameInput } from "./internal/flameInput.js";
import type { AdiabaticFlameInput, AdiabaticFlameOptions } from "./types.js";
import { attachView } from "../view/attachView.js";
import { SWEEP_VIEW } from "./internal/flameView.js";

const SWEEP_KEYS = /* @__PURE__ */ knownKeys<FlameSweep>()("parameter", "values");

/**
 * Which setting of an {@link AdiabaticFlameInput} a sweep varies, and over which values.
 *
 * - `"equivalenceRatio"`: φ (> 0); `"excessAir"`: fraction (> −1);
 * - `"T"`: every reactant temperature, K; `"fuelT"`, `"oxidizerT"`: one stream's temperature, K
 *   (the diluent follows the oxidizer unless `diluentT` is set);
 * - `"P"`: pressure, Pa.
 *
 * @category Flame
 */
export interface FlameSweep {
  /** The varied setting. */
  parameter: "equivalenceRatio" | "excessAir" | "T" | "fuelT" | "oxidizerT" | "P";
  /** Its values, in the unit of the setting (at least one). */
  values: readonly number[];
}

/**
 * Result of {@link flameTemperatureSweep}: one array entry per swept value.
 *
 * @category Flame
 */
export interface FlameSweepResult {
  /** The varied setting. */
  readonly parameter: FlameSweep["parameter"];
  /** The swept values (a copy). */
  readonly values: readonly number[];
  /** Flame (or explosion) temperature at each value, K. */
  readonly T: readonly number[];
  /** Final pressure at each value, Pa. */
  readonly P: readonly number[];
  /** Equivalence ratio at each value. */
  readonly equivalenceRatio: readonly number[];
  /** Product key → gas mole fraction at each value (0 where the species is absent). */
  readonly products: Readonly<Record<string, readonly number[]>>;
  /** Temperature iterations at each value. */
  readonly iterations: readonly number[];
  /** Energy residual at each value, J. */
  readonly residual: readonly number[];
  /**
   * For each point, the species evaluated outside their data range with the temperature (see
   * {@link AdiabaticFlameResult.extrapolated}); empty arrays when none (possible only with `extrapolate: true`).
   */
  readonly extrapolated: readonly (readonly ExtrapolatedPoint[])[];
}

/**
 * Most points in one flame-temperature sweep; a longer sweep is TOO_LARGE (split it: each point
 * is a full flame solve).
 *
 * @category Flame
 * @example
 * MAX_SWEEP_POINTS // => 1000
 */
export const MAX_SWEEP_POINTS = 1000;

/**
 * Adiabatic flame temperature over a range of one setting — equivalence ratio, excess air,
 * reactant or preheat temperature, or pressure — for plotting or screening.
 *
 * The species are resolved and the problem prepared once; each point warm-starts from the
 * previous one (temperature and, in mode "equilibrium", the element potentials and amounts), so
 * a few Newton steps suffice per point. Each point is the same calculation, with the same
 * assumptions and caution, as {@link adiabaticFlameTemperature}: ideal screening values, not
 * design values.
 *
 * @param input - the base mixture and conditions (as for {@link adiabaticFlameTemperature}); the swept setting overrides its field
 * @param sweep - the varied setting and its values
 * @param options - temperature tolerance (K), iteration limits, extrapolation
 * @returns arrays of flame temperature (K), pressure (Pa), φ, product mole fractions, iterations and residual (J)
 * @throws RxthermError `INVALID_ARGUMENT` for an unknown parameter, an empty or non-finite value list, a value outside its domain, or any bad base input
 * @throws RxthermError every error of {@link adiabaticFlameTemperature}, for the first failing point (details add `index` and `value`)
 * @category Flame
 * @example
 * const s = flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [0.8, 1, 1.2] });
 * s.T.map((t) => Math.round(t)) // => [1995, 2225, 2136]
 * @see NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998) for the built-in product data
 */
export function flameTemperatureSweep(input: AdiabaticFlameInput, sweep: FlameSweep, options: AdiabaticFlameOptions = {}): FlameSweepResult {
  options = optionsOf(options, "flameTemperatureSweep", "options", FLAME_OPTION_KEYS);
  const fn = "flameTemperatureSweep";
  if (sweep === null || typeof sweep !== "object" || !Array.isArray(sweep.values) || sweep.values.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a sweep { parameter, values } with at least one value`, { sweep });
  }
  rejectUnknownKeys(sweep, SWEEP_KEYS, fn, "sweep");
  const { parameter } = sweep;
  const known = ["equivalenceRatio", "excessAir", "T", "fuelT", "oxidizerT", "P"];
  if (!known.includes(parameter)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot vary ${describeValue(parameter)}; choose one of ${known.join(", ")}`, { parameter });
  }
  requireArray(sweep.values, fn, "sweep.values", MAX_SWEEP_POINTS);
  sweep.values.forEach((v, i) => {
    // null or a non-number would silently mean "the default" (φ = 1, 101 325 Pa) for that point
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every sweep value to be a finite number, got ${describeValue(v)} at index ${i}`, {
        path: `sweep.values[${i}]`, index: i, value: describeValue(v),
      });
    }
  });
  const values = [...sweep.values];
  // validate every value up front (nothing half-done): each must be a valid input on its own
  const points: FlamePoint[] = [];
  const base = { ...input };
  if (parameter === "equivalenceRatio" || parameter === "excessAir") {
    delete base.equivalenceRatio;
    delete base.excessAir;
  }
  let prepared: ReturnType<typeof prepareFlameInput> | null = null;
  values.forEach((value, index) => {
    const variant: AdiabaticFlameInput = { ...base, [parameter]: value };
    try {
      if (prepared === null) {
        prepared = prepareFlameInput(fn, variant, options);
        points.push(prepared.point);
      } else {
        points.push(flamePointOf(fn, variant));
      }
    } catch (e) {
      throw withIndex(e, index, value);
    }
  });
  const { setup } = prepared!;
  const T: number[] = [];
  const P: number[] = [];
  const phi: number[] = [];
  const iterations: number[] = [];
  const residual: number[] = [];
  const extrapolated: (readonly ExtrapolatedPoint[])[] = [];
  const products: Record<string, number[]> = {};
  points.forEach((pt, index) => {
    let r;
    try {
      r = solveFlamePoint(setup, pt);
    } catch (e) {
      throw withIndex(e, index, values[index]!);
    }
    T.push(r.T);
    P.push(r.P);
    phi.push(pt.phi);
    iterations.push(r.iterations);
    residual.push(r.residual);
    extrapolated.push(r.extrapolated);
    for (const [k, x] of Object.entries(r.products)) {
      if (!(k in products)) products[k] = new Array<number>(index).fill(0);
      products[k]!.push(x);
    }
    for (const arr of Object.values(products)) if (arr.length < index + 1) arr.push(0);
  });
  return attachView({ parameter, values, T, P, equivalenceRatio: phi, products, iterations, residual, extrapolated }, SWEEP_VIEW);
}

function withIndex(e: unknown, index: number, value: number): unknown {
  if (e instanceof RxthermError) {
    return new RxthermError(e.code, `${e.message.replace(/^\[rxtherm\] /, "")} (sweep point ${index}, value ${value})`, { ...e.details, index, value });
  }
  return e;
}
