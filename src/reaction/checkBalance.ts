import { RxthermError } from "../errors.js";
import {
  rationalAdd,
  rationalFromNumber,
  rationalMul,
  rationalNeg,
  rationalToNumber,
  rationalToString,
  type Rational,
} from "../numeric/rational.js";
import { termCoefficient } from "./internal/reactionTerms.js";
import { BALANCE_CHECK_VIEW } from "./internal/reactionView.js";
import { attachView } from "../view/attachView.js";
import { parseReaction } from "./parseReaction.js";
import type { Reaction, Term } from "./types.js";
import { checkReactionShape } from "./checkReactionShape.js";

/**
 * Result of {@link checkBalance}: residuals are products − reactants.
 *
 * @category Reaction
 */
export interface BalanceCheck {
  /** True when every element residual and the charge residual are exactly zero. */
  readonly balanced: boolean;
  /** Element symbol → atoms (products − reactants), for every element in the reaction (0 when it closes). */
  readonly residuals: Record<string, number>;
  /** Charge of the products − charge of the reactants, in elementary charges. */
  readonly charge: number;
  /** The same residuals as exact rational text (`"0"`, `"-1/2"`). */
  readonly exactResiduals: Record<string, string>;
  /** The charge residual as exact rational text. */
  readonly exactCharge: string;
  /** Elements whose residual is not zero, in order of first appearance. */
  readonly unbalancedElements: string[];
}

/**
 * Check whether a reaction conserves every element and the charge, and by how much it misses.
 *
 * The residual of an element is Σ(products) ν·n − Σ(reactants) ν·n, computed exactly from the
 * terms' exact coefficients (`Term.exact`) and the formulas' element counts (read from their
 * shortest decimal text), so a balanced equation gives exactly 0 and any slip — a wrong
 * coefficient, a species swapped for its neighbour in a homologous series — shows up as a
 * non-zero residual. The charge residual counts electrons `e-` as −1 each.
 *
 * @param reaction - a {@link Reaction} or an equation text (parsed with {@link parseReaction})
 * @returns `{ balanced, residuals, charge }` plus exact text of each residual and the list of
 *   unbalanced elements; residuals in atoms per reaction as written, charge in elementary charges
 * @throws RxthermError any code of {@link parseReaction} for a bad equation text
 * @throws RxthermError `INVALID_ARGUMENT` when `reaction` is neither text nor a reaction object, or a term lacks its formula
 * @example
 * checkBalance("C3H8 + 5 O2 -> 3 CO2 + 4 H2O").balanced // => true
 * // the same coefficients written with butane as the fuel:
 * checkBalance("C4H10 + 5 O2 -> 3 CO2 + 4 H2O").residuals // => { C: -1, H: -2, O: 0 }
 * @category Reaction
 * @see A.-L. Lavoisier, Traité élémentaire de chimie (1789) — conservation of mass; IUPAC Green Book, 3rd ed. (2007), §2.10.1
 */
export function checkBalance(reaction: Reaction | string): BalanceCheck {
  const r = typeof reaction === "string" ? parseReaction(reaction) : reaction;
  checkReactionShape(r, "checkBalance");
  if (r === null || typeof r !== "object" || !Array.isArray(r.reactants) || !Array.isArray(r.products)) {
    throw new RxthermError("INVALID_ARGUMENT", "checkBalance requires an equation text or a reaction { reactants, products }", {});
  }
  for (const t of [...r.reactants, ...r.products]) {
    if (t === null || typeof t !== "object" || t.formula === null || typeof t.formula !== "object" || typeof t.formula.elements !== "object") {
      throw new RxthermError("INVALID_ARGUMENT", "checkBalance requires every term to carry a parsed formula (build reactions with parseReaction or balanceReaction)", {
        species: t && typeof t === "object" ? t.species : undefined,
      });
    }
  }
  const sums = new Map<string, Rational>();
  let charge: Rational = ZERO;
  const add = (terms: readonly Term[], sign: 1 | -1) => {
    for (const t of terms) {
      let nu = termCoefficient(t);
      if (sign < 0) nu = rationalNeg(nu);
      for (const [el, count] of Object.entries(t.formula.elements)) {
        sums.set(el, rationalAdd(sums.get(el) ?? ZERO, rationalMul(nu, rationalFromNumber(count))));
      }
      if (t.formula.charge !== 0) charge = rationalAdd(charge, rationalMul(nu, rationalFromNumber(t.formula.charge)));
    }
  };
  add(r.reactants, -1);
  add(r.products, 1);
  const residuals: Record<string, number> = {};
  const exactResiduals: Record<string, string> = {};
  const unbalancedElements: string[] = [];
  for (const [el, v] of sums) {
    residuals[el] = rationalToNumber(v);
    exactResiduals[el] = rationalToString(v);
    if (v.num !== 0n) unbalancedElements.push(el);
  }
  return attachView({
    balanced: unbalancedElements.length === 0 && charge.num === 0n,
    residuals,
    charge: rationalToNumber(charge),
    exactResiduals,
    exactCharge: rationalToString(charge),
    unbalancedElements,
  }, BALANCE_CHECK_VIEW);
}

const ZERO: Rational = /* @__PURE__ */ Object.freeze({ num: 0n, den: 1n });
