import { RxthermError, describeValue, knownKeys, optionsOf } from "../errors.js";
import { STANDARD_TEMPERATURE_K } from "../units.js";
import type { Library } from "../species/types.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import type { Reaction } from "../reaction/types.js";
import type Decimal from "decimal.js";
import type { Rational } from "../numeric/rational.js";
import { prepareReaction, type PreparedReaction } from "./preparedReaction.js";
import { standardEnthalpyExact } from "./exactSum.js";
import { REACTION_ENTHALPY_PROTOTYPE } from "./internal/enthalpyView.js";

/** The option keys reactionEnthalpy reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<ReactionEnthalpyOptions>()("T", "library", "per", "extrapolate");

/**
 * Options of {@link reactionEnthalpy}.
 *
 * @category Enthalpy
 */
export interface ReactionEnthalpyOptions {
  /**
   * Temperature in K. At 298.15 K the result is the exact Hess sum of the tabulated formation
   * enthalpies; at any other temperature it is Σν·H°(T) (Kirchhoff's law).
   * @defaultValue 298.15
   */
  T?: number;
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
  /**
   * Express the result per mol of this species (a key as written in the reaction) instead of
   * per mol of reaction as written: the value is divided by |ν| of that species.
   * @defaultValue per mol of reaction as written
   */
  per?: string;
  /**
   * Evaluate species enthalpies outside their data range by extending the nearest Cp form
   * instead of throwing `OUT_OF_RANGE`; the result's `extrapolated` then lists each species and T outside its data.
   * @defaultValue false
   */
  extrapolate?: boolean;
}

/**
 * One species' share of a reaction enthalpy.
 *
 * @category Enthalpy
 */
export interface ReactionEnthalpyTerm {
  /** Species key as written in the reaction. */
  readonly species: string;
  /** Net signed stoichiometric coefficient (products +, reactants −), already divided for `per`. */
  readonly coefficient: number;
  /** H°(T) of the species in J/mol (at 298.15 K this is ΔfH°). */
  readonly enthalpy: number;
}

/**
 * Result of {@link reactionEnthalpy}.
 *
 * @category Enthalpy
 */
export interface ReactionEnthalpyResult {
  /** ΔH°rxn in J per mol of reaction as written (or per mol of `per`). */
  readonly value: number;
  /**
   * Standard uncertainty in J/mol: root-sum-square of ν·u(ΔfH°) over the species. Present only when
   * every species with a non-zero ΔfH° carries an uncertainty (elements in their reference state
   * count as exactly zero). Cp uncertainties are not included.
   */
  readonly uncertainty?: number;
  /** Temperature in K. */
  readonly T: number;
  /**
   * At 298.15 K only: the Hess sum as exact decimal text in J/mol (34 significant digits at most,
   * rounded half-even only when a fractional coefficient makes the sum non-terminating).
   */
  readonly exact?: string;
  /** Species the result is expressed per mol of, or null for per mol of reaction as written. */
  readonly per: string | null;
  /**
   * Each species evaluated outside its data range, with the temperature (possible only with
   * `extrapolate: true`); empty when every species was inside its range.
   */
  readonly extrapolated: readonly ExtrapolatedPoint[];
  /** The contribution of each species. */
  readonly terms: readonly ReactionEnthalpyTerm[];
}

/**
 * Standard enthalpy of reaction ΔH°rxn(T) from formation data: Hess's law at 298.15 K, Kirchhoff's
 * law at other temperatures.
 *
 * At 298.15 K, ΔH°rxn = Σ νᵢ·ΔfH°ᵢ (products ν > 0, reactants ν < 0) is summed **exactly** from the
 * tabulated decimal values (`hf298Exact`) and the exact rational coefficients, with a private
 * decimal.js constructor (34 significant digits, half-even); only a final division by the lcm of
 * the coefficient denominators can round. At any other T, ΔH°rxn(T) = Σ νᵢ·H°ᵢ(T), where each
 * H°ᵢ(T) = ΔfH°ᵢ + ∫ Cp,ᵢ dT from 298.15 K is the species' analytic Cp integral — this is
 * Kirchhoff's law with the full Cp(T), including the phase each key names (H2O(l) and H2O(g) are
 * different species). Standard state: 298.15 K, 1 bar, ideal gases. The reaction must balance in
 * every element and in charge.
 *
 * Reactions and resolved species are cached per (reaction object or text, library), so calling
 * this at many temperatures costs a loop over the species.
 *
 * @param reaction - balanced reaction (text such as `"CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"` or a parsed Reaction)
 * @param options - temperature (K), library, `per` species, extrapolation
 * @returns ΔH°rxn in J per mol of reaction as written (or per mol of `per`), its uncertainty when
 *   the data carry one, and the per-species terms
 * @throws RxthermError `UNBALANCED_REACTION` when elements or charge do not balance (details: `residuals`, `charge`)
 * @throws RxthermError `UNKNOWN_SPECIES` / `AMBIGUOUS_PHASE` when a species is not in the library (details: `species`)
 * @throws RxthermError `OUT_OF_RANGE` when T is outside a species' Cp range and `extrapolate` is false
 * @throws RxthermError `INVALID_ARGUMENT` when T is not a positive finite number or `per` is not in the reaction
 * @category Enthalpy
 * @example
 * reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)").value // => -890310.1 (J/mol, exact Hess sum of the built-in NIST-JANAF ΔfH° values)
 * @see G. H. Hess, Pogg. Ann. 50 (1840) 385 (constant heat summation); G. Kirchhoff, Pogg. Ann. 103 (1858) 177;
 *   IUPAC Green Book, 3rd ed. (2007), §2.11 (standard reaction quantities).
 */
export function reactionEnthalpy(reaction: Reaction | string, options: ReactionEnthalpyOptions = {}): ReactionEnthalpyResult {
  options = optionsOf(options, "reactionEnthalpy", "options", OPTION_KEYS);
  const T = options.T ?? STANDARD_TEMPERATURE_K;
  checkTemperature("reactionEnthalpy", T);
  const p = prepareReaction("reactionEnthalpy", reaction, options.library);
  const divisor = perDivisor("reactionEnthalpy", p, options.per);
  const extrapolate = options.extrapolate === true;
  const rangeOptions = extrapolate ? EXTRAPOLATE : undefined;
  const n = p.species.length;
  const terms: ReactionEnthalpyTerm[] = new Array(n);
  let value = 0;
  const extrapolated: ExtrapolatedPoint[] = [];
  let exact: string | undefined;
  if (T === STANDARD_TEMPERATURE_K) {
    const sum = standardEnthalpyExact(p);
    const scaled = options.per === undefined ? sum : divideByCoefficient(sum, p.nuExact[indexOfSpecies(p, options.per)]!);
    exact = scaled.toString();
    value = zeroToPositive(scaled.toNumber());
    for (let i = 0; i < n; i++) {
      const s = p.species[i]!;
      terms[i] = { species: p.keys[i]!, coefficient: p.nu[i]! / divisor, enthalpy: s.hf298 };
    }
  } else {
    for (let i = 0; i < n; i++) {
      const s = p.species[i]!;
      const h = s.enthalpy(T, rangeOptions); // throws OUT_OF_RANGE outside the range unless extrapolating
      noteExtrapolation(extrapolated, s, T);
      value += p.nu[i]! * h;
      terms[i] = { species: p.keys[i]!, coefficient: p.nu[i]! / divisor, enthalpy: h };
    }
    value = zeroToPositive(value / divisor);
  }
  const uncertainty = propagatedUncertainty(p, divisor);
  // made on the display prototype (non-enumerable display methods, no per-call cost), fields in the usual order
  const result = Object.create(REACTION_ENTHALPY_PROTOTYPE) as { -readonly [K in keyof ReactionEnthalpyResult]: ReactionEnthalpyResult[K] };
  result.value = value;
  result.T = T;
  result.per = options.per ?? null;
  result.extrapolated = extrapolated;
  result.terms = terms;
  if (exact !== undefined) result.exact = exact;
  if (uncertainty !== undefined) result.uncertainty = uncertainty;
  return result;
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });

/** Root-sum-square of ν·u over the species, or undefined when a non-zero ΔfH° has no uncertainty. */
export function propagatedUncertainty(p: PreparedReaction, divisor: number): number | undefined {
  let sumSq = 0;
  for (let i = 0; i < p.species.length; i++) {
    const s = p.species[i]!;
    const u = s.hf298Uncertainty;
    if (u === undefined) {
      if (s.hf298 !== 0) return undefined;
      continue;
    }
    const c = p.nu[i]! * u;
    sumSq += c * c;
  }
  return Math.sqrt(sumSq) / divisor;
}

/** |ν| of the `per` species, or 1. */
export function perDivisor(fn: string, p: PreparedReaction, per: string | undefined): number {
  if (per === undefined) return 1;
  const i = indexOfSpecies(p, per);
  if (i < 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} option per names ${per}, which is not in the reaction (species: ${p.keys.join(", ")})`, { per, species: [...p.keys] });
  }
  return Math.abs(p.nu[i]!);
}

function divideByCoefficient(sum: Decimal, r: Rational): Decimal {
  const num = r.num < 0n ? -r.num : r.num;
  return r.den === 1n ? sum.div(num.toString()) : sum.times(r.den.toString()).div(num.toString());
}

function indexOfSpecies(p: PreparedReaction, key: string): number {
  const i = p.keys.indexOf(key);
  if (i >= 0) return i;
  return p.species.findIndex((s) => s.key === key);
}

/** T must be a finite number > 0 K. */
export function checkTemperature(fn: string, T: unknown, label = "T"): void {
  if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${label} to be a finite temperature above 0 K, got ${describeValue(T)}`, { [label]: T });
  }
}

function zeroToPositive(x: number): number {
  return x === 0 ? 0 : x;
}
