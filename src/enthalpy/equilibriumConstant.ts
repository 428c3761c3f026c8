import { RxthermError, describeValue, knownKeys, optionsOf } from "../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_TEMPERATURE_K } from "../units.js";
import type { Library } from "../species/types.js";
import type { Reaction } from "../reaction/types.js";
import { prepareReaction } from "./preparedReaction.js";
import { checkTemperature, reactionEnthalpy } from "./reactionEnthalpy.js";
import { reactionGibbs } from "./reactionGibbs.js";

/** The option keys equilibriumConstant reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<EquilibriumConstantOptions>()("method", "library", "extrapolate");

/**
 * Options of {@link equilibriumConstant}.
 *
 * @category Enthalpy
 */
export interface EquilibriumConstantOptions {
  /**
   * `"kirchhoff"`: K from ΔG°(T) with the full Cp(T) of every species (ΔH° and ΔS° both follow
   * Kirchhoff's law). `"van-t-hoff"`: the constant-ΔH° shortcut, ln K(T) = ln K(298.15) −
   * (ΔH°298/R)·(1/T − 1/298.15), which ignores ΔCp and drifts from the full value as T moves away from 298.15 K.
   * @defaultValue "kirchhoff"
   */
  method?: "kirchhoff" | "van-t-hoff";
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
  /** Extend the species' Cp forms beyond their data range instead of throwing `OUT_OF_RANGE`. @defaultValue false */
  extrapolate?: boolean;
}

/**
 * Thermodynamic equilibrium constant K(T) = exp(−ΔG°rxn(T) / (R·T)) of a reaction.
 *
 * Standard state 1 bar: for an ideal-gas reaction K = Π (pᵢ / 1 bar)^νᵢ; pure condensed phases have
 * unit activity. By default ΔG°(T) comes from {@link reactionGibbs} with the full Cp(T) (consistent
 * with Kirchhoff's law); `method: "van-t-hoff"` uses ΔH°(298.15 K) held constant instead. K beyond
 * the range of float64 (|ln K| > 709) becomes `Infinity` or 0; use −{@link reactionGibbs}/(R·T) for
 * ln K directly. R = 8.314462618 J/(mol·K) (CODATA 2018, exact).
 *
 * @param reaction - balanced reaction (text or parsed)
 * @param T - temperature in K
 * @param options - method, library, extrapolation
 * @returns K (dimensionless, standard pressure 1 bar)
 * @throws RxthermError `UNBALANCED_REACTION`, `UNKNOWN_SPECIES`, `OUT_OF_RANGE`, `INVALID_ARGUMENT` as {@link reactionEnthalpy}
 * @category Enthalpy
 * @example
 * equilibriumConstant("CO(g) + H2O(g) -> CO2(g) + H2(g)", 1000) // => 1.44 (rounded; built-in NIST data)
 * @see J. H. van 't Hoff, Études de dynamique chimique (1884); IUPAC Green Book, 3rd ed. (2007), §2.11;
 *   CODATA 2018 (R).
 */
export function equilibriumConstant(reaction: Reaction | string, T: number, options: EquilibriumConstantOptions = {}): number {
  options = optionsOf(options, "equilibriumConstant", "options", OPTION_KEYS);
  checkTemperature("equilibriumConstant", T);
  const method = options.method ?? "kirchhoff";
  const base = { ...(options.library ? { library: options.library } : {}), ...(options.extrapolate ? { extrapolate: true } : {}) };
  let lnK: number;
  if (method === "kirchhoff") {
    lnK = -reactionGibbs(reaction, { T, ...base }) / (GAS_CONSTANT_J_PER_MOL_K * T);
  } else if (method === "van-t-hoff") {
    const T0 = STANDARD_TEMPERATURE_K;
    const g0 = reactionGibbs(reaction, { T: T0, ...base });
    const h0 = reactionEnthalpy(reaction, base).value;
    lnK = -g0 / (GAS_CONSTANT_J_PER_MOL_K * T0) - (h0 / GAS_CONSTANT_J_PER_MOL_K) * (1 / T - 1 / T0);
  } else {
    // validate through prepareReaction first so a bad reaction still reports its own error
    prepareReaction("equilibriumConstant", reaction, options.library);
    throw new RxthermError("INVALID_ARGUMENT", `equilibriumConstant option method must be "kirchhoff" or "van-t-hoff", got ${describeValue(method)}`, { method });
  }
  return Math.exp(lnK);
}

