/**
 * Parsed formulas shared between the reactions read from text: species keys repeat across the
 * equations of a plant model (H2O, CO2, O2...), and a parsed formula is deeply frozen, so one
 * object can stand in every reaction that names the same text. Keyed by the species text exactly
 * as written in the equation (content, not identity: strings are immutable); bounded, emptied when
 * full. `parseFormula` itself still returns a fresh object on every call.
 *
 * @module
 * @internal
 */
import type { Formula } from "../../formula/types.js";

/** Most formulas kept. */
const LIMIT = 512;
/** Longest species text kept (longer texts are parsed every time). */
const MAX_KEY_LENGTH = 64;

const memo = /* @__PURE__ */ new Map<string, Formula>();

/** The shared formula of a species text, when it was parsed before. */
export function sharedFormula(text: string): Formula | undefined {
  return memo.get(text);
}

/** Keep the (deeply frozen) formula parsed from `text` for the next equations. */
export function shareFormula(text: string, formula: Formula): void {
  if (text.length > MAX_KEY_LENGTH || !Object.isFrozen(formula) || !Object.isFrozen(formula.elements)) return;
  if (memo.size >= LIMIT) memo.clear();
  memo.set(text, formula);
}
