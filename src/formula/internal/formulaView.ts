/**
 * Private: the table view of a parsed formula (text, charge, phase, molar mass, element
 * composition), and the prototype that gives every parsed formula its display methods.
 *
 * @module
 * @internal
 */
import { viewDescriptors, viewPrototype } from "../../view/attachView.js";
import type { ResultView } from "../../view/types.js";
import type { Formula } from "../types.js";
import { INDEX_WEIGHTS, symbolIndexOf } from "./elementIndex.js";

/** The view of a formula: one summary row and one row per element. */
export function formulaView(f: Formula): ResultView {
  const masses = Object.entries(f.elements).map(([el, n]) => [el, n, n * (INDEX_WEIGHTS[symbolIndexOf(el)] ?? NaN)] as const);
  const total = masses.reduce((s, m) => s + m[2], 0);
  return {
    title: `formula ${f.text}`,
    tables: [
      {
        columns: [{ label: "formula" }, { label: "charge", unit: "e" }, { label: "phase" }, { label: "M", unit: "g/mol" }],
        rows: [[f.text, f.charge, f.phase ?? "", total]],
      },
      {
        caption: "elements",
        columns: [{ label: "element" }, { label: "atoms", unit: "per formula unit" }, { label: "mass", unit: "g/mol" }, { label: "mass fraction", unit: "g/g", digits: 4 }],
        rows: masses.map(([el, n, m]) => [el, n, m, total > 0 ? m / total : null]),
      },
    ],
    notes: ["molar masses from IUPAC standard atomic weights, without the electron mass"],
  };
}

/** Prototype of every formula `parseFormula` returns (carries the display methods, nothing enumerable). */
export const FORMULA_PROTOTYPE = /* @__PURE__ */ viewPrototype(/* @__PURE__ */ viewDescriptors(formulaView));
