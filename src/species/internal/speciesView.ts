/**
 * Private: the table view of a species — its data and sources, then Cp°, H°, S° and G° at a few
 * temperatures inside its data range.
 *
 * @module
 * @internal
 */
import { molarMass } from "../../formula/molarMass.js";
import { STANDARD_TEMPERATURE_K } from "../../units.js";
import type { ResultView, ViewCell } from "../../view/types.js";
import type { Species } from "../types.js";

/** Temperatures (K) tried for the property table; those inside the data range are shown. */
const GRID_K = [STANDARD_TEMPERATURE_K, 400, 500, 600, 800, 1000, 1500, 2000, 2500, 3000, 4000, 5000, 6000];

/** The view of a species. */
export function speciesView(s: Species): ResultView {
  const [lo, hi] = s.range;
  const temperatures = [...new Set([lo, ...GRID_K.filter((T) => T > lo && T < hi), hi])];
  const rows: ViewCell[][] = temperatures.map((T) => {
    const e = s.evaluate(T);
    return [T, e.cp, e.enthalpy / 1000, (e.enthalpy - s.hf298) / 1000, e.entropy, e.gibbs / 1000];
  });
  return {
    title: `species ${s.key}${s.name !== undefined ? ` (${s.name})` : ""}`,
    tables: [
      {
        columns: [
          { label: "key" }, { label: "phase" }, { label: "M", unit: "g/mol" }, { label: "ΔfH°298", unit: "kJ/mol" },
          { label: "S°298", unit: "J/(mol·K)" }, { label: "Tmin", unit: "K" }, { label: "Tmax", unit: "K" }, { label: "data set" },
        ],
        rows: [[s.key, s.phase, molarMass(s.formula), s.hf298 / 1000, s.s298, lo, hi, s.dataset ?? ""]],
      },
      {
        caption: "standard-state properties (1 bar, ideal gas)",
        columns: [
          { label: "T", unit: "K" }, { label: "Cp°", unit: "J/(mol·K)" }, { label: "H°", unit: "kJ/mol" },
          { label: "H° − ΔfH°298", unit: "kJ/mol" }, { label: "S°", unit: "J/(mol·K)" }, { label: "G°", unit: "kJ/mol" },
        ],
        rows,
      },
      {
        caption: "sources",
        columns: [{ label: "value" }, { label: "source id" }],
        rows: Object.entries(s.sources).map(([k, v]) => [k, v]),
      },
    ],
  };
}
