/**
 * Private: element-composition helpers of the species layer (formula queries that ignore the order
 * in which elements are written, e.g. `"OC3H6"` = `"C3H6O"`).
 *
 * @module
 * @internal
 */
import { safeParseFormula } from "../../formula/safeParseFormula.js";
import type { Formula } from "../../formula/types.js";

/** True when both formulas hold the same elements in the same amounts and the same charge. */
export function sameComposition(a: Formula, b: Formula): boolean {
  if (a.charge !== b.charge) return false;
  const ka = Object.keys(a.elements);
  if (ka.length !== Object.keys(b.elements).length) return false;
  for (const k of ka) if (a.elements[k] !== b.elements[k]) return false;
  return true;
}

/** The formula of a query text when it reads as one (with at least one element), else null. */
export function queryFormula(text: string): Formula | null {
  const r = safeParseFormula(text);
  return r.success && Object.keys(r.data.elements).length > 0 ? r.data : null;
}
