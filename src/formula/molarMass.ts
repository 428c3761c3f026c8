import { decimalPlus, decimalTimes, decimalToNumber, exactDecimalOfNumber, type ExactDecimalValue } from "../numeric/exactDecimal.js";
import { RxthermError, optionsOf, describeValue } from "../errors.js";
import { checkFormula } from "./internal/checkFormula.js";
import { INDEX_MICRO_WEIGHTS, INDEX_WEIGHTS, symbolIndexOf } from "./internal/elementIndex.js";
import { parseFormula } from "./parseFormula.js";
import type { Formula } from "./types.js";

/**
 * Options of {@link molarMass}.
 *
 * @category Formula
 */
export interface MolarMassOptions {
  /**
   * Subtract the mass of the electrons an ion has gained or lost: charge × {@link ELECTRON_MOLAR_MASS_G_PER_MOL}
   * (a cation is lighter, an anion heavier; the electron `e-` then weighs 0.000548579909 g/mol).
   * By default electron masses are neglected, as is common practice for molar masses of ions.
   * @defaultValue false
   */
  electronMass?: boolean;
}

/**
 * Molar mass of the electron in g/mol (its relative atomic mass, 5.48579909065 × 10⁻⁴, rounded).
 *
 * @category Formula
 * @see CODATA 2018 recommended values, electron relative atomic mass (from memory)
 * @example
 * ELECTRON_MOLAR_MASS_G_PER_MOL // => 0.000548579909
 */
export const ELECTRON_MOLAR_MASS_G_PER_MOL = 0.000548579909;

/**
 * Molar mass of a formula in g/mol: Σ countᵢ · Arᵢ over its elements.
 *
 * Atomic weights are the IUPAC standard atomic weights of {@link ATOMIC_WEIGHTS} (edition in
 * {@link ATOMIC_WEIGHTS_EDITION}); elements without a standard atomic weight use the mass number of their
 * longest-lived isotope; D and T their isotopic masses. The sum is exact: integer counts are summed in integer
 * micro-units, decimal counts in decimal arithmetic, and the result is the double nearest to the exact sum
 * (`molarMass("H2O")` is exactly 18.015, not 18.015000000000001). The precision of the result is that of the
 * atomic weights (about five significant figures), not of the digits printed.
 * Electron masses of ions are neglected unless `options.electronMass` is set.
 *
 * @param formula - formula text (parsed with {@link parseFormula}) or a Formula object
 * @param options - see {@link MolarMassOptions}
 * @returns molar mass in g/mol
 * @throws {@link RxthermError} every code of {@link parseFormula} for bad text; for a Formula object
 *   `INVALID_ARGUMENT`, `UNKNOWN_ELEMENT`, `INVALID_COUNT`, `COUNT_TOO_LARGE`, `INVALID_CHARGE`, `INVALID_PHASE`
 * @category Formula
 * @example
 * molarMass("H2O")        // => 18.015 (g/mol)
 * molarMass("CuSO4·5H2O") // => 249.677 (g/mol)
 * molarMass("Na+", { electronMass: true }) // => 22.989451420091 (g/mol)
 * @see J. Meija et al., Atomic weights of the elements 2013, Pure Appl. Chem. 88 (2016) 265–291
 */
export function molarMass(formula: string | Formula, options: MolarMassOptions = {}): number {
  options = optionsOf(options, "molarMass");
  const f = typeof formula === "string" ? parseFormula(formula) : checked(formula);
  const electron = options.electronMass ?? false;
  if (typeof electron !== "boolean") {
    throw new RxthermError("INVALID_ARGUMENT", `molarMass requires options.electronMass to be a boolean, got ${describeValue(electron)}`, {});
  }
  if (!electron) {
    // integer fast path: exact integer sum in micro-units (every weight has at most 6 decimals)
    let micro = 0;
    let exact = true;
    for (const sym in f.elements) {
      const n = f.elements[sym] as number;
      if (!Number.isInteger(n)) {
        exact = false;
        break;
      }
      micro += n * microWeight(sym);
    }
    if (exact && micro <= Number.MAX_SAFE_INTEGER) return micro / 1e6;
  }
  // exact sum of count × weight over the decimals the numbers print as, rounded once
  let sum: ExactDecimalValue = { m: 0n, e: 0 };
  for (const sym in f.elements) {
    const weight = exactDecimalOfNumber(INDEX_WEIGHTS[symbolIndexOf(sym)] as number);
    sum = decimalPlus(sum, decimalTimes(exactDecimalOfNumber(f.elements[sym] as number), weight));
  }
  if (electron && f.charge !== 0) {
    sum = decimalPlus(sum, decimalTimes(exactDecimalOfNumber(ELECTRON_MOLAR_MASS_G_PER_MOL), exactDecimalOfNumber(-f.charge)));
  }
  return decimalToNumber(sum);
}

function microWeight(sym: string): number {
  return INDEX_MICRO_WEIGHTS[symbolIndexOf(sym)] as number;
}

function checked(f: Formula): Formula {
  checkFormula(f, "molarMass");
  return f;
}
