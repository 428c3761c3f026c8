import { STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K } from "../units.js";
import type { Library } from "../species/types.js";
import type { Reaction } from "../reaction/types.js";
import { prepareReaction } from "./preparedReaction.js";
import { checkTemperature } from "./reactionEnthalpy.js";
import { knownKeys, optionsOf } from "../errors.js";

/** The option keys reactionEntropy reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<ReactionEntropyOptions>()("T", "library", "extrapolate");

/**
 * Options of {@link reactionEntropy} and {@link reactionGibbs} (which accepts the same fields).
 *
 * @category Enthalpy
 */
export interface ReactionEntropyOptions {
  /** Temperature in K. @defaultValue 298.15 */
  T?: number;
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
  /** Extend the species' Cp forms beyond their data range instead of throwing `OUT_OF_RANGE`. @defaultValue false */
  extrapolate?: boolean;
}

/**
 * Standard entropy of reaction ΔS°rxn(T) = Σ νᵢ·S°ᵢ(T), every species at the standard pressure 1 bar.
 *
 * S°ᵢ(T) is the third-law standard molar entropy at 298.15 K plus ∫ Cp/T dT (exact analytic
 * integral of the species' Cp form). Products count ν > 0, reactants ν < 0. Standard state:
 * 1 bar, ideal gases, pure condensed phases.
 *
 * @param reaction - balanced reaction (text or parsed)
 * @param options - temperature (K), library, extrapolation
 * @returns ΔS°rxn in J/(mol·K) per mol of reaction as written
 * @throws RxthermError `UNBALANCED_REACTION`, `UNKNOWN_SPECIES`, `OUT_OF_RANGE`, `INVALID_ARGUMENT` as {@link reactionEnthalpy}
 * @category Enthalpy
 * @example
 * reactionEntropy("H2(g) + 0.5 O2(g) -> H2O(g)") // => -44.4195 (J/(mol·K), rounded; built-in NIST-JANAF S° values)
 * @see IUPAC Green Book, 3rd ed. (2007), §2.11; M. W. Chase, NIST-JANAF Thermochemical Tables, 4th ed. (1998).
 */
export function reactionEntropy(reaction: Reaction | string, options: ReactionEntropyOptions = {}): number {
  options = optionsOf(options, "reactionEntropy", "options", OPTION_KEYS);
  const T = options.T ?? STANDARD_TEMPERATURE_K;
  checkTemperature("reactionEntropy", T);
  const p = prepareReaction("reactionEntropy", reaction, options.library);
  const ro = options.extrapolate === true ? EXTRAPOLATE : undefined;
  let sum = 0;
  for (let i = 0; i < p.species.length; i++) sum += p.nu[i]! * p.species[i]!.entropy(T, STANDARD_PRESSURE_PA, ro);
  return sum === 0 ? 0 : sum;
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });
