import { viewToText } from "../view/renderView.js";
import { resolveView } from "./internal/resolveView.js";

/**
 * A result as aligned plain-text tables, units in every column header — for logs, terminals and reports.
 *
 * Numbers are shown to 6 significant digits (4 for fractions); energies per mol in kJ/mol, duties in kJ
 * (amounts) or kW (flows in mol/s), as the headers say.
 *
 * @param value - an rxtherm result, a chart (its data), a stream `{ T, flows }` or flows
 * @returns the text, first line the title
 * @throws RxthermError `INVALID_ARGUMENT` for any other value
 * @category Display
 * @example
 * toText(parseFormula("H2O")).split("\n")[0] // => "formula H2O"
 */
export function toText(value: unknown): string {
  return viewToText(resolveView(value, "toText"));
}
