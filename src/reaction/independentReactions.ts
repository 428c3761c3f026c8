import { RxthermError } from "../errors.js";
import { parseFormula } from "../formula/parseFormula.js";
import type { Formula } from "../formula/types.js";
import {
  integerGaussJordan,
  integerGaussJordanNumber,
  integerNullSpaceFromEchelon,
  integerNullSpaceSparseNumber,
} from "../numeric/integerElimination.js";
import { integerElementMatrix, numberElementMatrix, reactionFromSigned, reactionFromSparse, type SpeciesEntry } from "./internal/reactionTerms.js";
import type { Reaction } from "./types.js";

/**
 * A basis of independent reactions among a set of species: every balanced reaction among them
 * is a combination of these, and none of these is a combination of the others.
 *
 * **Method.** The element matrix (one row per element, plus a charge row when a species is
 * charged) has rank r; the number of independent reactions is `species − r` (the Gibbs
 * stoichiometry rule). Exact Gauss–Jordan elimination picks the first r species, in the order
 * given, whose element columns are independent ("component" species); each remaining species
 * then gets one reaction that forms it from components only. Each reaction is scaled to the
 * smallest coprime whole numbers, species with negative stoichiometric numbers go to the
 * reactant side, and the non-component species is always a product. The basis is therefore
 * deterministic and readable: list the species you want as building blocks first.
 *
 * @param species - species keys (formulas with optional phase, e.g. `"CO2(g)"`); each once
 * @returns `species.length − rank` reactions, in the order of their non-component species
 * @throws RxthermError `INVALID_ARGUMENT` when the list is empty, not strings, or repeats a species (details: `species`)
 * @throws RxthermError any code of {@link parseFormula} for a bad species, with `details.index`
 * @example
 * // components CO, H2, H2O (listed first); one reaction forms each of CO2 and CH4
 * independentReactions(["CO", "H2", "H2O", "CO2", "CH4"]).map((r) => formatReaction(r))
 * // => ["CO + H2O -> H2 + CO2", "CO + 3 H2 -> H2O + CH4"]
 * @category Reaction
 * @see W. R. Smith and R. W. Missen, Chemical Reaction Equilibrium Analysis: Theory and Algorithms (Wiley, 1982), ch. 2 (stoichiometry, number of independent reactions)
 */
export function independentReactions(species: readonly string[]): Reaction[] {
  if (!Array.isArray(species) || species.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", "independentReactions requires a non-empty array of species", { species: [] });
  }
  const seen = new Set<string>();
  const entries: SpeciesEntry[] = species.map((s, index) => {
    if (typeof s !== "string") {
      throw new RxthermError("INVALID_ARGUMENT", `independentReactions requires species keys as strings, species[${index}] is ${typeof s}`, { index });
    }
    const key = s.trim();
    if (seen.has(key)) {
      throw new RxthermError("INVALID_ARGUMENT", `independentReactions requires each species once, "${key}" appears twice`, { species: key, index });
    }
    seen.add(key);
    let formula: Formula;
    try {
      formula = parseFormula(key);
    } catch (e) {
      if (e instanceof RxthermError) {
        throw new RxthermError(e.code, `independentReactions: bad species[${index}] "${key}": ${e.message.replace(/^\[rxtherm\]\s*/, "")}`, {
          ...e.details,
          index,
          species: key,
        });
      }
      throw e;
    }
    return { species: key, formula };
  });
  const n = entries.length;
  const formulas = entries.map((e) => e.formula);
  // fast path: integer counts, exact float64-integer elimination (overflow-checked), sparse
  // basis vectors (each touches only the pivot columns and its own species: linear in n)
  const small = numberElementMatrix(formulas);
  const echSmall = small ? integerGaussJordanNumber(small.rows, n) : null;
  const basisSmall = echSmall ? integerNullSpaceSparseNumber(echSmall.rows, echSmall.pivots, n) : null;
  if (basisSmall) return basisSmall.map((v) => reactionFromSparse(entries, v.columns, v.values));
  const { rows } = integerElementMatrix(formulas);
  const ech = integerGaussJordan(rows, n);
  return integerNullSpaceFromEchelon(ech.rows, ech.pivots, n).map((v) => reactionFromSigned(entries, v));
}
