import { RxthermError, describeValue } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import { rationalFromDecimalString, rationalNeg, type Rational } from "../numeric/rational.js";
import { reactionResiduals, toReaction } from "./resolveInputs.js";
import { ExactDecimal, exactWeightedSum } from "./exactSum.js";

/**
 * Species whose standard enthalpy of combustion is zero by definition: the products of complete
 * combustion in their standard states, and O2. Keys without a phase are accepted for the gases.
 *
 * @category Enthalpy
 * @example
 * COMBUSTION_REFERENCE_SPECIES.includes("H2O(l)") // => true
 */
export const COMBUSTION_REFERENCE_SPECIES: readonly string[] = /* @__PURE__ */ Object.freeze([
  "CO2(g)", "H2O(l)", "N2(g)", "O2(g)", "SO2(g)", "CO2", "N2", "O2", "SO2",
]);

/**
 * Result of {@link reactionEnthalpyFromCombustion}.
 *
 * @category Enthalpy
 */
export interface CombustionEnthalpyResult {
  /** ΔH°rxn in J per mol of reaction as written. */
  readonly value: number;
  /** The same, as exact decimal text (at most 34 significant digits). */
  readonly exact: string;
}

/**
 * Standard enthalpy of reaction from standard enthalpies of combustion (Hess's law through the
 * combustion products), for species whose ΔfH° is unknown but whose ΔcH° has been measured.
 *
 * ΔH°rxn = −Σ νᵢ·ΔcH°ᵢ (products ν > 0, reactants ν < 0): burn the reactants, un-burn the products.
 * Every ΔcH° must refer to the same products — CO2(g), H2O(l), N2(g), SO2(g) at 298.15 K, 1 bar —
 * for which ΔcH° = 0 (see {@link COMBUSTION_REFERENCE_SPECIES}); those may be left out of
 * `combustionEnthalpies`. The sum is exact in decimal; the reaction must balance.
 *
 * @param reaction - balanced reaction (text or parsed)
 * @param combustionEnthalpies - species key (as written in the reaction) → ΔcH° in J/mol (negative for
 *   a fuel), as a number or decimal text
 * @returns ΔH°rxn in J per mol of reaction as written, as a number and as exact text
 * @throws RxthermError `UNBALANCED_REACTION` when the reaction does not balance (details: `residuals`, `charge`)
 * @throws RxthermError `MISSING_DATA` when a species has no ΔcH° and is not a combustion reference species (details: `missing`)
 * @throws RxthermError `INVALID_ARGUMENT` when a ΔcH° is not a finite number or decimal text
 * @category Enthalpy
 * @example
 * // ethylene hydrogenation from published heats of combustion (J/mol; CRC Handbook, CODATA 1989)
 * reactionEnthalpyFromCombustion("C2H4(g) + H2(g) -> C2H6(g)", {
 *   "C2H4(g)": -1411200, "H2(g)": -285830, "C2H6(g)": -1560700,
 * }).value // => -136330
 * @see G. H. Hess, Pogg. Ann. 50 (1840) 385; IUPAC Green Book, 3rd ed. (2007), §2.11 (enthalpy of combustion).
 */
export function reactionEnthalpyFromCombustion(
  reaction: Reaction | string,
  combustionEnthalpies: Readonly<Record<string, number | string>>,
): CombustionEnthalpyResult {
  const fn = "reactionEnthalpyFromCombustion";
  const r = toReaction(fn, reaction);
  const { residuals, charge } = reactionResiduals(r);
  if (Object.keys(residuals).length > 0 || charge !== 0) {
    throw new RxthermError("UNBALANCED_REACTION", `${fn} requires a balanced reaction; products − reactants leave ${Object.entries(residuals).map(([e, v]) => `${e} ${v}`).join(", ") || `charge ${charge}`}`, { residuals, charge });
  }
  if (combustionEnthalpies === null || typeof combustionEnthalpies !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an object of combustion enthalpies`, { combustionEnthalpies });
  }
  const nus: Rational[] = [];
  const values: string[] = [];
  const missing: string[] = [];
  const add = (key: string, nu: Rational): void => {
    const given = Object.prototype.hasOwnProperty.call(combustionEnthalpies, key) ? combustionEnthalpies[key] : undefined;
    if (given === undefined) {
      if (!COMBUSTION_REFERENCE_SPECIES.includes(key)) missing.push(key);
      return;
    }
    nus.push(rationalNeg(nu)); // ΔH = −Σ ν·ΔcH
    values.push(decimalText(fn, key, given));
  };
  for (const t of r.reactants) add(t.species, rationalNeg(coef(t)));
  for (const t of r.products) add(t.species, coef(t));
  if (missing.length > 0) {
    throw new RxthermError("MISSING_DATA", `${fn} needs the enthalpy of combustion of ${missing.join(", ")}`, { missing });
  }
  const sum = exactWeightedSum(nus, values);
  const value = sum.toNumber();
  return { value: value === 0 ? 0 : value, exact: sum.toString() };
}

function coef(t: Reaction["reactants"][number]): Rational {
  return rationalFromDecimalString(typeof t.exact === "string" && t.exact !== "" ? t.exact : String(t.coefficient));
}

/** Decimal text of a finite number or decimal text, or INVALID_ARGUMENT. */
export function decimalText(fn: string, key: string, v: number | string): string {
  if (typeof v === "number" && Number.isFinite(v)) return String(v);
  if (typeof v === "string") {
    try {
      const d = new ExactDecimal(v.trim());
      if (d.isFinite()) return d.toString();
    } catch { /* fall through */ }
  }
  throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a finite enthalpy for ${key}, got ${describeValue(v)}`, { species: key, value: v });
}
