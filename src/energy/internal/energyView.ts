/**
 * Private: the table views of a heat duty (with its breakdown) and of an adiabatic reaction temperature.
 *
 * @module
 * @internal
 */
import { viewDescriptors, viewPrototype } from "../../view/attachView.js";
import { ENERGY_UNIT_K, FLOW_UNIT, extrapolationNotes, recordTable } from "../../view/recordTable.js";
import type { ExtrapolatedPoint } from "../../species/noteExtrapolation.js";
import type { ResultView } from "../../view/types.js";
import type { Flows } from "../../extent/types.js";

/** Fields of a heatDuty result that its view reads. */
interface HeatDutyFields {
  readonly duty: number;
  readonly method: string;
  readonly formation: number;
  readonly reaction: number;
  readonly reactionHeat: number;
  readonly latentHeat: number;
  readonly sensibleIn: number;
  readonly sensibleOut: number;
  readonly pvTerm: number;
  readonly streams: {
    readonly inlet: readonly { readonly T: number; readonly enthalpy: number; readonly sensible: number }[];
    readonly outlet: readonly { readonly T: number; readonly enthalpy: number; readonly sensible: number }[];
  };
  readonly warnings: readonly string[];
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/** The view of a heat duty: the duty by both methods, its breakdown, and each stream. */
export function heatDutyView(r: HeatDutyFields): ResultView {
  const k = (x: number): number => x / 1000;
  const streams = [
    ...r.streams.inlet.map((s, i) => [`inlet ${i + 1}`, s.T, k(s.enthalpy), k(s.sensible)]),
    ...r.streams.outlet.map((s, i) => [`outlet ${i + 1}`, s.T, k(s.enthalpy), k(s.sensible)]),
  ];
  return {
    title: `heat duty ${r.duty >= 0 ? "(heat added)" : "(heat removed)"}`,
    tables: [
      {
        columns: [
          { label: "duty", unit: ENERGY_UNIT_K }, { label: "method" },
          { label: "formation method", unit: ENERGY_UNIT_K }, { label: "reaction method", unit: ENERGY_UNIT_K },
        ],
        rows: [[k(r.duty), r.method, k(r.formation), k(r.reaction)]],
      },
      {
        caption: "breakdown (reaction method: duty = −sensible in + reaction + latent + sensible out − Δ(PV))",
        columns: [{ label: "part" }, { label: "heat", unit: ENERGY_UNIT_K }],
        rows: [
          ["sensible in (cool the feed to 298.15 K)", k(-r.sensibleIn)],
          ["reaction at 298.15 K", k(r.reactionHeat)],
          ["latent (phase changes at 298.15 K)", k(r.latentHeat)],
          ["sensible out (heat the products from 298.15 K)", k(r.sensibleOut)],
          ...(r.pvTerm !== 0 ? [["−Δ(PV) (constant volume)", k(-r.pvTerm)]] : []),
          ["duty", k(r.reaction)],
        ],
      },
      {
        caption: "streams",
        columns: [{ label: "stream" }, { label: "T", unit: "K" }, { label: "H", unit: ENERGY_UNIT_K }, { label: "sensible", unit: ENERGY_UNIT_K }],
        rows: streams,
      },
    ],
    notes: [...extrapolationNotes(r.extrapolated), ...r.warnings],
  };
}

/** Fields of an adiabatic reaction temperature (or rise) result that its view reads. */
interface AdiabaticFields {
  readonly T: number;
  readonly outlet: { readonly T: number; readonly flows: Flows };
  readonly extents: readonly number[];
  readonly vessel: string;
  readonly deltaT?: number;
  readonly startT?: number;
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/** The view of an adiabatic reaction temperature (and rise, when present). */
export function adiabaticView(r: AdiabaticFields): ResultView {
  const rise = r.deltaT !== undefined && r.startT !== undefined;
  return {
    title: rise ? "adiabatic temperature rise" : "adiabatic reaction temperature",
    tables: [
      {
        columns: [
          { label: "T", unit: "K" }, { label: "T", unit: "°C" },
          ...(rise ? [{ label: "start T", unit: "K" }, { label: "ΔT_ad", unit: "K" }] : []), { label: "vessel" },
        ],
        rows: [[r.T, r.T - 273.15, ...(rise ? [r.startT ?? null, r.deltaT ?? null] : []), r.vessel]],
      },
      {
        caption: "extents",
        columns: [{ label: "reaction" }, { label: "extent", unit: FLOW_UNIT }],
        rows: r.extents.map((x, i) => [String(i + 1), x]),
      },
      recordTable("outlet", [{ label: "outlet", unit: FLOW_UNIT, values: r.outlet.flows }]),
    ],
    notes: [...extrapolationNotes(r.extrapolated), "runaway and relief screening only: follow local codes and licensed process-safety practice"],
  };
}

/** Display methods of each result kind, built once. */
export const HEAT_DUTY_PROTOTYPE = /* @__PURE__ */ viewPrototype(/* @__PURE__ */ viewDescriptors(heatDutyView));
export const ADIABATIC_VIEW = /* @__PURE__ */ viewDescriptors(adiabaticView);
