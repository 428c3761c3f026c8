/**
 * Private: the table views of a flame temperature, an equilibrium composition and a flame sweep.
 *
 * @module
 * @internal
 */
import { viewDescriptors, viewPrototype } from "../../view/attachView.js";
import { FLOW_UNIT, extrapolationNotes, recordTable } from "../../view/recordTable.js";
import type { ResultView, ViewCell } from "../../view/types.js";
import type { AdiabaticFlameResult, EquilibriumResult } from "../types.js";

/** Caution shown under every flame result. */
const FLAME_CAUTION = "furnace, refractory and burner limits: follow local codes and licensed engineering practice";

/** The view of an adiabatic flame temperature: T, P, φ and the product composition. */
export function flameView(r: AdiabaticFlameResult): ResultView {
  const notes = [...extrapolationNotes(r.extrapolated), FLAME_CAUTION];
  return {
    title: `adiabatic flame temperature (${r.mode}, ${r.process})`,
    tables: [
      {
        columns: [
          { label: "T", unit: "K" }, { label: "T", unit: "°C" }, { label: "P", unit: "kPa" },
          { label: "φ", unit: "–", digits: 4 }, { label: "theoretical O2", unit: "mol/mol fuel" },
        ],
        rows: [[r.T, r.T - 273.15, r.P / 1000, r.equivalenceRatio, r.theoreticalO2]],
      },
      recordTable("products", [
        { label: "mole fraction (gas)", unit: "mol/mol", digits: 4, values: r.products },
        { label: "amount", unit: "mol/mol fuel", values: r.moles },
      ]),
      ...(Object.keys(r.condensed).length > 0
        ? [recordTable("condensed", [{ label: "amount", unit: "mol/mol fuel", values: r.condensed }])]
        : []),
    ],
    notes,
  };
}


/** The view of an equilibrium composition. */
export function equilibriumView(r: EquilibriumResult): ResultView {
  return {
    title: `chemical equilibrium at ${r.T} K`,
    tables: [
      {
        columns: [{ label: "T", unit: "K" }, { label: "P", unit: "kPa" }, { label: "gas", unit: FLOW_UNIT }],
        rows: [[r.T, r.P / 1000, r.gasMoles]],
      },
      recordTable("composition", [
        { label: "amount", unit: FLOW_UNIT, values: { ...r.moles, ...r.condensed } },
        { label: "mole fraction (gas)", unit: "mol/mol", digits: 4, values: r.moleFractions },
      ]),
    ],
    notes: [
      ...extrapolationNotes(r.extrapolated),
      "toxic or flammable products: check exposure and flammability limits under local codes",
    ],
  };
}

/** Fields of a flame sweep that its view reads. */
interface SweepFields {
  readonly parameter: string;
  readonly values: readonly number[];
  readonly T: readonly number[];
  readonly equivalenceRatio: readonly number[];
  readonly products: Readonly<Record<string, readonly number[]>>;
}

/** Label and unit of each swept setting. */
export const SWEEP_AXES: Readonly<Record<string, { readonly label: string; readonly unit: string }>> = {
  equivalenceRatio: { label: "equivalence ratio φ", unit: "–" },
  excessAir: { label: "excess air", unit: "mol/mol" },
  T: { label: "reactant T", unit: "K" },
  fuelT: { label: "fuel T", unit: "K" },
  oxidizerT: { label: "oxidizer (preheat) T", unit: "K" },
  P: { label: "P", unit: "Pa" },
};

/** The view of a flame sweep: one row per swept value, T, φ and the main product fractions. */
export function sweepView(r: SweepFields): ResultView {
  const axis = SWEEP_AXES[r.parameter] ?? { label: r.parameter, unit: "" };
  const species = Object.keys(r.products).filter((k) => (r.products[k] ?? []).some((y) => y >= 1e-3));
  const phi = r.parameter !== "equivalenceRatio"; // a φ column only when φ is not the swept setting
  const rows: ViewCell[][] = r.values.map((v, i) => [
    v, r.T[i] ?? null, ...(phi ? [r.equivalenceRatio[i] ?? null] : []), ...species.map((k) => r.products[k]?.[i] ?? null),
  ]);
  return {
    title: `flame temperature against ${axis.label}`,
    tables: [{
      columns: [
        { label: axis.label, unit: axis.unit }, { label: "T", unit: "K" }, ...(phi ? [{ label: "φ", unit: "–", digits: 4 }] : []),
        ...species.map((k) => ({ label: `y ${k}`, unit: "mol/mol", digits: 4 })),
      ],
      rows,
    }],
    notes: ["species below 0.1 % at every point are left out", FLAME_CAUTION],
  };
}

/** Prototype of every flame result (made per solved point, so the display methods cost nothing per result). */
export const FLAME_PROTOTYPE = /* @__PURE__ */ viewPrototype(/* @__PURE__ */ viewDescriptors(flameView));

type Mutable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Flame results: `new FlameResult(...)` makes an object on FLAME_PROTOTYPE with its fields in the
 * documented order, as `Object.create(FLAME_PROTOTYPE)` and assignments would, but with one shape that
 * the engine keeps in the object itself (about half the cost). A plain function so that its
 * `prototype` can be the display prototype.
 */
export const FlameResult = /* @__PURE__ */ (() => {
  function make(
    this: Mutable<AdiabaticFlameResult>,
    T: number, P: number, products: Record<string, number>, moles: Record<string, number>, condensed: Record<string, number>,
    oxidizer: Record<string, number>, equivalenceRatio: number, theoreticalO2: number, mode: AdiabaticFlameResult["mode"],
    process: AdiabaticFlameResult["process"], reactantEnergy: number, residual: number, relativeResidual: number,
    iterations: number, equilibriumIterations: number, elementResidual: number, extrapolated: AdiabaticFlameResult["extrapolated"],
  ): void {
    this.T = T;
    this.P = P;
    this.products = products;
    this.moles = moles;
    this.condensed = condensed;
    this.oxidizer = oxidizer;
    this.equivalenceRatio = equivalenceRatio;
    this.theoreticalO2 = theoreticalO2;
    this.mode = mode;
    this.process = process;
    this.reactantEnergy = reactantEnergy;
    this.residual = residual;
    this.relativeResidual = relativeResidual;
    this.iterations = iterations;
    this.equilibriumIterations = equilibriumIterations;
    this.elementResidual = elementResidual;
    this.extrapolated = extrapolated;
  }
  make.prototype = FLAME_PROTOTYPE;
  return make as unknown as new (...args: Parameters<typeof make>) => AdiabaticFlameResult;
})();

/** Display methods of the other result kinds, built once (one result per solve: attached with attachView). */
export const EQUILIBRIUM_VIEW = /* @__PURE__ */ viewDescriptors(equilibriumView);
export const SWEEP_VIEW = /* @__PURE__ */ viewDescriptors(sweepView);
