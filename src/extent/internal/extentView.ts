/**
 * Private: the table views of extents (outlet streams), of a limiting-reactant analysis and of
 * combustion air and flue gas.
 *
 * @module
 * @internal
 */
import { viewDescriptors } from "../../view/attachView.js";
import { FLOW_UNIT, recordTable } from "../../view/recordTable.js";
import type { ResultView, ViewTable } from "../../view/types.js";
import type { Flows } from "../types.js";

/** The table of extents, one row per reaction (numbered from 1). */
function extentsTable(extents: readonly number[]): ViewTable {
  return {
    caption: "extents",
    columns: [{ label: "reaction" }, { label: "extent", unit: FLOW_UNIT }],
    rows: extents.map((x, i) => [String(i + 1), x]),
  };
}

/** Fields of a solveExtents result that its view reads. */
interface ExtentsFields {
  readonly extents: readonly number[];
  readonly outlet: Flows;
  readonly change: Flows;
  readonly conversion: Readonly<Record<string, number>>;
}

/** The view of solved extents: the extents, then outlet flow, change and conversion per species. */
export function extentsView(r: ExtentsFields): ResultView {
  return {
    title: "extents of reaction and outlet stream",
    tables: [
      extentsTable(r.extents),
      recordTable("outlet", [
        { label: "outlet", unit: FLOW_UNIT, values: r.outlet },
        { label: "change", unit: FLOW_UNIT, values: r.change },
        { label: "conversion", unit: "mol/mol fed", digits: 4, values: r.conversion },
      ]),
    ],
  };
}

/** Fields of a limitingReactant result that its view reads. */
interface LimitingFields {
  readonly species: string;
  readonly maxExtent: number;
  readonly excess: Readonly<Record<string, number>>;
  readonly outletAtMaxExtent: Flows;
}

/** The view of a limiting-reactant analysis. */
export function limitingView(r: LimitingFields): ResultView {
  return {
    title: `limiting reactant ${r.species}`,
    tables: [
      {
        columns: [{ label: "limiting" }, { label: "maximum extent", unit: FLOW_UNIT }],
        rows: [[r.species, r.maxExtent]],
      },
      recordTable("at the maximum extent", [
        { label: "excess", unit: "mol/mol required", digits: 4, values: r.excess },
        { label: "outlet", unit: FLOW_UNIT, values: r.outletAtMaxExtent },
      ]),
    ],
  };
}

/** Fields of a combustion result that its view reads. */
interface CombustionFields {
  readonly theoreticalO2: number;
  readonly theoreticalAir: number;
  readonly air: number;
  readonly excessAir: number;
  readonly equivalenceRatio: number;
  readonly airToFuelMass: number;
  readonly flueGas: Flows;
  readonly flueGasTotal: number;
  readonly dryFlueGasTotal: number;
  readonly wet: Readonly<Record<string, number>>;
  readonly dry: Readonly<Record<string, number>>;
}

/** The view of combustion air and flue gas. */
export function combustionView(r: CombustionFields): ResultView {
  return {
    title: "combustion air and flue gas",
    tables: [
      {
        caption: "air",
        columns: [
          { label: "theoretical O2", unit: FLOW_UNIT }, { label: "theoretical air", unit: FLOW_UNIT },
          { label: "air", unit: FLOW_UNIT }, { label: "excess air", unit: "%", digits: 4 },
          { label: "φ", unit: "–", digits: 4 }, { label: "air/fuel", unit: "kg/kg", digits: 4 },
        ],
        rows: [[r.theoreticalO2, r.theoreticalAir, r.air, r.excessAir * 100, r.equivalenceRatio, r.airToFuelMass]],
      },
      recordTable("flue gas", [
        { label: "flow", unit: FLOW_UNIT, values: { ...r.flueGas, total: r.flueGasTotal } },
        { label: "wet", unit: "mol/mol", digits: 4, values: r.wet },
        { label: "dry", unit: "mol/mol", digits: 4, values: r.dry },
      ]),
    ],
    notes: ["screening estimate: burner and furnace work follows local codes and licensed engineering practice"],
  };
}

/** Display methods of each result kind, built once. */
export const EXTENTS_VIEW = /* @__PURE__ */ viewDescriptors(extentsView);
export const LIMITING_VIEW = /* @__PURE__ */ viewDescriptors(limitingView);
export const COMBUSTION_VIEW = /* @__PURE__ */ viewDescriptors(combustionView);

/** Fields of a reconcileExtents result that its view reads. */
interface ReconcileFields {
  readonly extents: readonly number[];
  readonly outlet: Flows;
  readonly residuals: Flows;
  readonly sumOfSquares: number;
  readonly closurePercent: Readonly<Record<string, number>>;
  readonly unmeasured: readonly string[];
}

/** The view of reconciled extents: extents, outlet with residuals, element closure. */
export function reconcileView(r: ReconcileFields): ResultView {
  return {
    title: "reconciled extents of reaction (least squares)",
    tables: [
      extentsTable(r.extents),
      recordTable("outlet", [
        { label: "reconciled", unit: FLOW_UNIT, values: r.outlet },
        { label: "measured − reconciled", unit: FLOW_UNIT, values: r.residuals },
      ]),
      {
        caption: "element closure of the measured data (out ÷ in)",
        columns: [{ label: "element" }, { label: "closure", unit: "%", digits: 4 }],
        rows: Object.entries(r.closurePercent).map(([el, v]) => [el, v]),
      },
    ],
    notes: [
      `weighted sum of squared residuals ${r.sumOfSquares.toPrecision(6)} (mol or mol/s)²`,
      ...(r.unmeasured.length > 0 ? [`not measured (taken at their reconciled flow): ${r.unmeasured.join(", ")}`] : []),
    ],
  };
}

/** Display methods of reconcileExtents results. */
export const RECONCILE_VIEW = /* @__PURE__ */ viewDescriptors(reconcileView);
