import { RxthermError, describeValue } from "../errors.js";
import { rationalFrom, rationalMul, type Rational, type RationalLike } from "../numeric/rational.js";
import { makeReaction, makeTerm, termCoefficient } from "./internal/reactionTerms.js";
import type { Reaction, Term } from "./types.js";
import { checkReactionShape } from "./checkReactionShape.js";

/**
 * Multiply every coefficient of a reaction by a positive factor, exactly.
 *
 * Stoichiometry, and every extensive reaction property (ΔH, ΔG), scales with the factor;
 * `scaleReaction(r, "1/2")` writes a reaction per half the amount. The input is not mutated.
 *
 * @param reaction - the reaction
 * @param factor - a positive rational, integer, decimal number or text such as `"1/2"`
 * @returns a new reaction with coefficients × factor (exact)
 * @throws RxthermError `INVALID_ARGUMENT` when the factor is not positive or not a number (details: `factor`)
 * @example
 * formatReaction(scaleReaction(parseReaction("2 H2 + O2 -> 2 H2O"), "1/2")) // => "H2 + 1/2 O2 -> H2O"
 * @category Reaction
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10.1 (stoichiometric numbers)
 */
export function scaleReaction(reaction: Reaction, factor: RationalLike): Reaction {
  checkReactionShape(reaction, "scaleReaction");
  let k: Rational;
  try {
    k = rationalFrom(factor);
  } catch {
    k = { num: 0n, den: 1n };
  }
  if (k.num <= 0n) {
    throw new RxthermError("INVALID_ARGUMENT", `scaleReaction requires a positive factor, got ${describeValue(factor)} (use reverseReaction to swap sides)`, {
      path: "factor",
      factor: describeValue(factor),
    });
  }
  const scale = (t: Term) => makeTerm(t, rationalMul(termCoefficient(t), k));
  return makeReaction(reaction.reactants.map(scale), reaction.products.map(scale));
}

/**
 * The reverse reaction: products become reactants and reactants products, with the same
 * coefficients. Reaction properties change sign (ΔH(reverse) = −ΔH). The input is not mutated.
 *
 * @param reaction - the reaction
 * @returns a new reaction with the sides swapped
 * @example
 * formatReaction(reverseReaction(parseReaction("N2 + 3 H2 -> 2 NH3"))) // => "2 NH3 -> N2 + 3 H2"
 * @category Reaction
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10.1
 */
export function reverseReaction(reaction: Reaction): Reaction {
  checkReactionShape(reaction, "reverseReaction");
  const copy = (t: Term) => makeTerm(t, termCoefficient(t));
  return makeReaction(reaction.products.map(copy), reaction.reactants.map(copy));
}
