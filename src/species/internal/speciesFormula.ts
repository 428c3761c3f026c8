/**
 * Private formula reader of the species layer: the formula of a species entry (without phase),
 * read with the formula layer's `parseFormula`, with the entry's phase attached, or the problem found.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import { parseFormula } from "../../formula/parseFormula.js";
import type { Formula, Phase } from "../../formula/types.js";

/** Result of {@link readSpeciesFormula}: the formula, or the problem found. */
export type FormulaReading = { ok: true; formula: Formula } | { ok: false; problem: string };

/**
 * Read a formula without phase, e.g. `"CH3COOH"`, and attach `phase`.
 * @param text - formula text
 * @param phase - phase to attach (null when none)
 */
export function readSpeciesFormula(text: string, phase: Phase | null): FormulaReading {
  let f: Formula;
  try {
    f = parseFormula(text);
  } catch (e) {
    if (e instanceof RxthermError) return { ok: false, problem: `${e.code}: ${e.message.replace(/^\[rxtherm\] /, "")}` };
    throw e;
  }
  if (f.phase !== null) return { ok: false, problem: "the formula field must not carry a phase (the phase has its own field)" };
  if (Object.keys(f.elements).length === 0) return { ok: false, problem: "no element" };
  return { ok: true, formula: Object.freeze({ text: f.text, elements: f.elements, charge: f.charge, phase }) };
}
