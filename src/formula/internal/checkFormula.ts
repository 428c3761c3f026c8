/**
 * Private validation of a caller-built {@link Formula} object (one not produced by parseFormula), shared by
 * formatFormula, molarMass and elementMassFractions. Never re-exported.
 */
import { RxthermError, describeValue, requireRecord } from "../../errors.js";
import { FORMULA_LIMITS } from "../parseFormula.js";
import type { Formula } from "../types.js";
import { symbolIndexOf } from "./elementIndex.js";

/**
 * Check that `formula` is a Formula whose element keys are known symbols (or D, T) with finite counts in
 * [FORMULA_LIMITS.minCount, FORMULA_LIMITS.maxCount], an integer charge within ±maxCharge and a known phase
 * or null. Throws RxthermError (INVALID_ARGUMENT, UNKNOWN_ELEMENT, INVALID_COUNT, COUNT_TOO_LARGE,
 * INVALID_CHARGE, INVALID_PHASE) naming `fn`.
 */
export function checkFormula(formula: Formula, fn: string): void {
  if (formula === null || typeof formula !== "object" || formula.elements === null || typeof formula.elements !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a formula text or a Formula object`, {});
  }
  requireRecord(formula.elements, fn, "formula.elements");
  for (const symbol of Object.keys(formula.elements)) {
    if (symbolIndexOf(symbol) < 0) {
      throw new RxthermError("UNKNOWN_ELEMENT", `${fn} found the unknown element key "${symbol}" in formula.elements`, { symbol });
    }
    const count = formula.elements[symbol];
    if (typeof count !== "number" || !Number.isFinite(count) || count < FORMULA_LIMITS.minCount) {
      throw new RxthermError("INVALID_COUNT",
        `${fn} requires element counts to be finite numbers of at least ${FORMULA_LIMITS.minCount}, got ${describeValue(count)} for ${symbol}`,
        { symbol, count });
    }
    if (count > FORMULA_LIMITS.maxCount) {
      throw new RxthermError("COUNT_TOO_LARGE",
        `${fn} accepts element counts up to ${FORMULA_LIMITS.maxCount}, got ${count} for ${symbol}`,
        { symbol, count, limit: FORMULA_LIMITS.maxCount });
    }
  }
  const q = formula.charge;
  if (typeof q !== "number" || !Number.isInteger(q) || Math.abs(q) > FORMULA_LIMITS.maxCharge) {
    throw new RxthermError("INVALID_CHARGE",
      `${fn} requires an integer charge of at most ${FORMULA_LIMITS.maxCharge} in magnitude, got ${describeValue(q)}`,
      { charge: q, limit: FORMULA_LIMITS.maxCharge });
  }
  const p = formula.phase;
  if (p !== null && p !== undefined && p !== "g" && p !== "l" && p !== "s" && p !== "aq" && p !== "cr") {
    throw new RxthermError("INVALID_PHASE", `${fn} accepts the phases g, l, s, aq, cr or null, got ${describeValue(p)}`, { phase: p });
  }
}
