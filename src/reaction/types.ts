import type { Formula } from "../formula/types.js";

/**
 * One species in a reaction with its stoichiometric coefficient.
 *
 * @category Reaction
 */
export interface Term {
  /** Species key as written, without the coefficient, e.g. `"H2O(g)"`. */
  readonly species: string;
  /** The parsed formula of the species. */
  readonly formula: Formula;
  /** Stoichiometric coefficient (positive) as a number, e.g. 6.5. */
  readonly coefficient: number;
  /** The same coefficient as an exact rational in text, e.g. `"13/2"` or `"2"`. */
  readonly exact: string;
}

/**
 * A chemical equation: reactants on the left, products on the right, positive coefficients.
 *
 * @category Reaction
 */
export interface Reaction {
  /** Left-hand side terms. */
  readonly reactants: readonly Term[];
  /** Right-hand side terms. */
  readonly products: readonly Term[];
}
