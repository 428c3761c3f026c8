import { RxthermError, optionsOf } from "../errors.js";
import { termCoefficient } from "./internal/reactionTerms.js";
import { rationalToNumber, rationalToString } from "../numeric/rational.js";
import type { Reaction, Term } from "./types.js";
import { checkReactionShape } from "./checkReactionShape.js";

/**
 * Options of {@link formatReaction}.
 *
 * @category Reaction
 */
export interface FormatReactionOptions {
  /**
   * Text between the sides (written with a space on each side).
   * @defaultValue `"->"`
   */
  readonly arrow?: string;
  /**
   * How to write coefficients: `"exact"` as integers or fractions (`13/2`), `"decimal"` as the
   * shortest decimal of the number (`6.5`; a repeating fraction becomes a rounded decimal).
   * @defaultValue `"exact"`
   */
  readonly coefficients?: "exact" | "decimal";
}

/**
 * Write a reaction as equation text: `2 H2 + O2 -> 2 H2O`.
 *
 * Coefficients of 1 are left out; others are written before the species with one space. The
 * text parses back with {@link parseReaction} to the same species and coefficients (in the
 * default exact mode).
 *
 * @param reaction - the reaction
 * @param options - arrow and coefficient style, see {@link FormatReactionOptions}
 * @returns the equation text
 * @throws RxthermError `INVALID_ARGUMENT` when `reaction` is not a reaction object
 * @example
 * formatReaction(parseReaction("C2H6 + 3.5 O2 -> 2 CO2 + 3 H2O")) // => "C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O"
 * formatReaction(parseReaction("C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O"), { coefficients: "decimal", arrow: "→" })
 * // => "C2H6 + 3.5 O2 → 2 CO2 + 3 H2O"
 * @category Reaction
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10.1 (writing chemical equations)
 */
export function formatReaction(reaction: Reaction, options: FormatReactionOptions = {}): string {
  options = optionsOf(options, "formatReaction");
  checkReactionShape(reaction, "formatReaction");
  const arrow = options.arrow ?? "->";
  const decimal = options.coefficients === "decimal";
  const term = (t: Term): string => {
    const c = termCoefficient(t);
    if (c.num === c.den) return t.species;
    return `${decimal ? String(rationalToNumber(c)) : rationalToString(c)} ${t.species}`;
  };
  return `${reaction.reactants.map(term).join(" + ")} ${arrow} ${reaction.products.map(term).join(" + ")}`;
}
