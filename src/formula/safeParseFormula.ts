import { RxthermError } from "../errors.js";
import { parseFormula } from "./parseFormula.js";
import type { Formula } from "./types.js";

/**
 * Result of {@link safeParseFormula}: the formula, or the error that {@link parseFormula} would throw.
 *
 * @category Formula
 */
export type SafeParseFormulaResult =
  | { readonly success: true; readonly data: Formula }
  | { readonly success: false; readonly error: RxthermError };

/**
 * Parse a formula without throwing, for form fields where a user is still typing.
 *
 * Same grammar and limits as {@link parseFormula}; a bad text gives `{ success: false, error }` whose
 * `error.code` and `error.details.column` point at the problem (e.g. to underline it).
 *
 * @param text - the formula text
 * @returns `{ success: true, data }` with the parsed formula (counts in atoms per formula unit, charge in
 *   elementary charges), or `{ success: false, error }` with the {@link RxthermError}
 * @throws nothing for any string; only a non-RxthermError (a bug) would propagate
 * @category Formula
 * @example
 * safeParseFormula("Ca(OH").success // => false
 * const r = safeParseFormula("Ca(OH");
 * if (!r.success) r.error.code       // => "UNCLOSED_GROUP" (r.error.details.column === 2)
 * @see IUPAC, Nomenclature of Inorganic Chemistry (Red Book, 2005), IR-4
 */
export function safeParseFormula(text: string): SafeParseFormulaResult {
  try {
    return { success: true, data: parseFormula(text) };
  } catch (e) {
    if (e instanceof RxthermError) return { success: false, error: e };
    throw e;
  }
}
