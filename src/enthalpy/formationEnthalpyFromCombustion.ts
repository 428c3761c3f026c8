import { RxthermError, optionsOf, describeValue } from "../errors.js";
import type { Library } from "../species/types.js";
import { parseFormula } from "../formula/parseFormula.js";
import { resolveSpecies } from "./resolveInputs.js";
import { ExactDecimal } from "./exactSum.js";
import { combustionProducts } from "./internal/combustionProducts.js";
import { decimalText } from "./reactionEnthalpyFromCombustion.js";

/**
 * Options of {@link formationEnthalpyFromCombustion}.
 *
 * @category Enthalpy
 */
export interface FormationEnthalpyFromCombustionOptions {
  /**
   * Phase of the product water the measured ΔcH° refers to: `"l"` (standard, bomb calorimetry) or `"g"`.
   * @defaultValue "l"
   */
  water?: "l" | "g";
  /** Library holding ΔfH° of the products CO2(g), H2O, SO2(g). @defaultValue the built-in library */
  library?: Library;
}

/**
 * Standard enthalpy of formation of a C/H/N/O/S compound from its measured standard enthalpy of combustion.
 *
 * Complete combustion CₐHᵦNᵧOδSε + x O2 → a CO2(g) + β/2 H2O(l) + ε SO2(g) + γ/2 N2(g) gives, by
 * Hess's law, ΔfH°(compound) = a·ΔfH°(CO2) + β/2·ΔfH°(H2O) + ε·ΔfH°(SO2) − ΔcH° (N2 and O2 are
 * elements in their reference state). Summed exactly in decimal from the tabulated product values
 * and the given ΔcH°, at 298.15 K and 1 bar.
 *
 * @param species - formula of the compound, with its phase (e.g. `"C6H12O6(cr)"`); only its elements are used
 * @param combustionEnthalpy - ΔcH° in J/mol (negative), as a number or decimal text
 * @param options - product-water phase and library
 * @returns ΔfH° of the compound in J/mol
 * @throws RxthermError `INVALID_ARGUMENT` for an element other than C, H, N, O, S, a compound with nothing
 *   to burn, or a non-finite ΔcH°
 * @throws RxthermError formula errors from {@link parseFormula}; `UNKNOWN_SPECIES` when a product is not in the library
 * @category Enthalpy
 * @example
 * formationEnthalpyFromCombustion("CH4(g)", -890310.1) // => -74873.1 (J/mol, built-in NIST-JANAF data for CO2(g), H2O(l))
 * @see G. H. Hess, Pogg. Ann. 50 (1840) 385; IUPAC Green Book, 3rd ed. (2007), §2.11.
 */
export function formationEnthalpyFromCombustion(
  species: string,
  combustionEnthalpy: number | string,
  options: FormationEnthalpyFromCombustionOptions = {},
): number {
  options = optionsOf(options, "formationEnthalpyFromCombustion");
  const fn = "formationEnthalpyFromCombustion";
  const water = options.water ?? "l";
  if (water !== "l" && water !== "g") throw new RxthermError("INVALID_ARGUMENT", `${fn} option water must be "l" or "g", got ${describeValue(water)}`, { water });
  const dc = decimalText(fn, species, combustionEnthalpy);
  const formula = parseFormula(species);
  const c = combustionProducts(fn, species, formula.elements, water);
  if (c.inert) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a compound with C, H or S to burn, got ${species}`, { species });
  let sum = new ExactDecimal(dc).negated();
  for (const [key, nu] of c.products) {
    const p = resolveSpecies(fn, key, options.library);
    sum = sum.plus(new ExactDecimal(p.hf298Exact).times(nu.num.toString()).div(nu.den.toString()));
  }
  const v = sum.toNumber();
  return v === 0 ? 0 : v;
}
