import { STANDARD_TEMPERATURE_K } from "../units.js";
import type { Reaction } from "../reaction/types.js";
import { checkTemperature, reactionEnthalpy } from "./reactionEnthalpy.js";
import { reactionEntropy, type ReactionEntropyOptions } from "./reactionEntropy.js";
import { knownKeys, optionsOf } from "../errors.js";

/** The option keys reactionGibbs reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<ReactionGibbsOptions>()("T", "library", "extrapolate");

/**
 * Options of {@link reactionGibbs}: the same fields as {@link ReactionEntropyOptions}.
 *
 * @category Enthalpy
 */
export type ReactionGibbsOptions = ReactionEntropyOptions;

/**
 * Standard Gibbs energy of reaction ΔG°rxn(T) = ΔH°rxn(T) − T·ΔS°rxn(T).
 *
 * ΔH°rxn(T) comes from {@link reactionEnthalpy} (exact Hess sum at 298.15 K, Kirchhoff's law with the
 * full Cp(T) elsewhere) and ΔS°rxn(T) from {@link reactionEntropy}; standard state 1 bar, ideal gases.
 *
 * @param reaction - balanced reaction (text or parsed)
 * @param options - temperature (K), library, extrapolation
 * @returns ΔG°rxn in J/mol of reaction as written
 * @throws RxthermError `UNBALANCED_REACTION`, `UNKNOWN_SPECIES`, `OUT_OF_RANGE`, `INVALID_ARGUMENT` as {@link reactionEnthalpy}
 * @category Enthalpy
 * @example
 * reactionGibbs("H2(g) + 0.5 O2(g) -> H2O(g)") // => -228582.7 (J/mol, rounded; NIST-JANAF ΔfG° is −228.582 kJ/mol)
 * @see IUPAC Green Book, 3rd ed. (2007), §2.11.
 */
export function reactionGibbs(reaction: Reaction | string, options: ReactionGibbsOptions = {}): number {
  options = optionsOf(options, "reactionGibbs", "options", OPTION_KEYS);
  const T = options.T ?? STANDARD_TEMPERATURE_K;
  checkTemperature("reactionGibbs", T);
  const h = reactionEnthalpy(reaction, { T, ...(options.library ? { library: options.library } : {}), ...(options.extrapolate ? { extrapolate: true } : {}) }).value;
  const s = reactionEntropy(reaction, { T, ...(options.library ? { library: options.library } : {}), ...(options.extrapolate ? { extrapolate: true } : {}) });
  const g = h - T * s;
  return g === 0 ? 0 : g;
}

