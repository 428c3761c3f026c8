import { RxthermError } from "../errors.js";
import { checkFormula } from "./internal/checkFormula.js";
import { INDEX_WEIGHTS, symbolIndexOf } from "./internal/elementIndex.js";
import { molarMass } from "./molarMass.js";
import { parseFormula } from "./parseFormula.js";
import type { Formula } from "./types.js";

/**
 * Mass fraction of each element in a formula: wᵢ = countᵢ · Arᵢ / M, with M from {@link molarMass}
 * (electron masses neglected). The fractions sum to 1 within rounding; the keys keep the order of
 * `formula.elements`.
 *
 * @param formula - formula text or a Formula object
 * @returns element symbol → mass fraction (dimensionless, kg of element per kg of compound)
 * @throws {@link RxthermError} the codes of {@link molarMass}, and `INVALID_ARGUMENT` for the electron `e-`
 *   (no elements, no mass)
 * @category Formula
 * @example
 * elementMassFractions("H2O").H // => 0.11190674437968359 (2 × 1.008 / 18.015)
 * @see J. Meija et al., Atomic weights of the elements 2013, Pure Appl. Chem. 88 (2016) 265–291
 */
export function elementMassFractions(formula: string | Formula): Record<string, number> {
  const f = typeof formula === "string" ? parseFormula(formula) : formula;
  if (typeof formula !== "string") checkFormula(f, "elementMassFractions");
  const symbols = Object.keys(f.elements);
  if (symbols.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", "elementMassFractions requires a formula with at least one element, got the electron", {});
  }
  const total = molarMass(f);
  const out: Record<string, number> = {};
  for (const sym of symbols) out[sym] = ((f.elements[sym] as number) * (INDEX_WEIGHTS[symbolIndexOf(sym)] as number)) / total;
  return out;
}
