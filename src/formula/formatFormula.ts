import { RxthermError, optionsOf, describeValue } from "../errors.js";
import { checkFormula } from "./internal/checkFormula.js";
import type { Formula } from "./types.js";

/**
 * Options of {@link formatFormula}.
 *
 * @category Formula
 */
export interface FormatFormulaOptions {
  /**
   * Element order: `"hill"` — C first, H second, then the rest alphabetically; without carbon every symbol
   * (H included) alphabetically; `"input"` — the order of the keys of `formula.elements` (for a parsed formula,
   * the order in which elements first appear in the text).
   * @defaultValue "hill"
   */
  order?: "hill" | "input";
  /** Write the charge (`^2-` notation). @defaultValue true */
  charge?: boolean;
  /** Write the phase suffix (`(g)`, `(aq)`...). @defaultValue true */
  phase?: boolean;
}

/**
 * Write a formula as canonical text: one term per element, in Hill order (or input order), then the
 * charge and the phase.
 *
 * Counts of 1 are left out; other counts are written as the shortest decimal that reads back as the same
 * number (`Fe0.947O`). The charge is always written in one notation: a caret, the magnitude when it is not 1,
 * and the sign (`Na^+`, `SO4^2-`, `Fe^3+`); the electron is `e-`. Deuterium and tritium sort as the symbols
 * `D` and `T`. Groups and adduct parts are multiplied out (`CuSO4·5H2O` → `CuH10O9S`).
 * The text reads back through {@link parseFormula} to the same elements, charge and phase.
 *
 * @param formula - a parsed formula, or a caller-built one (checked)
 * @param options - see {@link FormatFormulaOptions}
 * @returns the formula text
 * @throws {@link RxthermError} `INVALID_ARGUMENT` (not a formula, or no elements with a charge other than −1),
 *   `UNKNOWN_ELEMENT`, `INVALID_COUNT`, `COUNT_TOO_LARGE`, `INVALID_CHARGE`, `INVALID_PHASE` for a caller-built
 *   formula outside the grammar's limits ({@link FORMULA_LIMITS})
 * @category Formula
 * @example
 * formatFormula(parseFormula("CH3COOH"))                      // => "C2H4O2"
 * formatFormula(parseFormula("CuSO4·5H2O"))                   // => "CuH10O9S"
 * formatFormula(parseFormula("SO4--(aq)"))                    // => "O4S^2-(aq)"
 * formatFormula(parseFormula("CH3COOH"), { order: "input" }) // => "C2H4O2"
 * formatFormula(parseFormula("NaOH"), { order: "input" })    // => "NaOH"
 * @see E. A. Hill, J. Am. Chem. Soc. 22 (1900) 478–494 (the Hill order of formula indexes)
 */
export function formatFormula(formula: Formula, options: FormatFormulaOptions = {}): string {
  options = optionsOf(options, "formatFormula");
  checkFormula(formula, "formatFormula");
  const order = options.order ?? "hill";
  if (order !== "hill" && order !== "input") {
    throw new RxthermError("INVALID_ARGUMENT", `formatFormula accepts order "hill" or "input", got ${describeValue(order)}`, { order });
  }
  const writeCharge = options.charge ?? true;
  const writePhase = options.phase ?? true;
  const symbols = Object.keys(formula.elements);
  let out: string;
  if (symbols.length === 0) {
    if (formula.charge !== -1) {
      throw new RxthermError("INVALID_ARGUMENT",
        `formatFormula requires at least one element (only the electron, charge -1, has none), got charge ${formula.charge}`,
        { charge: formula.charge });
    }
    out = writeCharge ? "e-" : "e";
  } else {
    const ordered = order === "input" ? symbols : hillOrder(symbols);
    out = "";
    for (const sym of ordered) {
      const n = formula.elements[sym] as number;
      out += n === 1 ? sym : sym + String(n);
    }
    if (writeCharge && formula.charge !== 0) {
      const m = Math.abs(formula.charge);
      out += "^" + (m === 1 ? "" : String(m)) + (formula.charge > 0 ? "+" : "-");
    }
  }
  if (writePhase && formula.phase !== null && formula.phase !== undefined) out += `(${formula.phase})`;
  return out;
}

/** Hill order: with carbon, C then H then the rest alphabetically; without carbon, all alphabetically. */
function hillOrder(symbols: readonly string[]): string[] {
  const sorted = [...symbols].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  if (!symbols.includes("C")) return sorted;
  const rest = sorted.filter((s) => s !== "C" && s !== "H");
  return symbols.includes("H") ? ["C", "H", ...rest] : ["C", ...rest];
}
