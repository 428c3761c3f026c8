/**
 * Private: the table view of a reaction enthalpy (value, uncertainty, and each species' term).
 *
 * @module
 * @internal
 */
import { viewDescriptors, viewPrototype } from "../../view/attachView.js";
import type { ResultView } from "../../view/types.js";
import { extrapolationNotes } from "../../view/recordTable.js";
import type { ExtrapolatedPoint } from "../../species/noteExtrapolation.js";

/** Fields of a reactionEnthalpy result that its view reads. */
interface ReactionEnthalpyFields {
  readonly value: number;
  readonly uncertainty?: number;
  readonly T: number;
  readonly exact?: string;
  readonly per: string | null;
  readonly extrapolated: readonly ExtrapolatedPoint[];
  readonly terms: readonly { readonly species: string; readonly coefficient: number; readonly enthalpy: number }[];
}

/** The view of a reaction enthalpy. */
export function reactionEnthalpyView(r: ReactionEnthalpyFields): ResultView {
  const per = r.per === null ? "mol/mol reaction" : `mol/mol ${r.per}`;
  return {
    title: `reaction enthalpy at ${r.T} K`,
    tables: [
      {
        columns: [
          { label: "ΔrH", unit: r.per === null ? "kJ/mol" : `kJ/mol ${r.per}` }, { label: "uncertainty", unit: "kJ/mol" },
          { label: "T", unit: "K" }, { label: "exact", unit: "J/mol" },
        ],
        rows: [[r.value / 1000, r.uncertainty !== undefined ? r.uncertainty / 1000 : null, r.T, r.exact ?? null]],
      },
      {
        caption: "terms (products positive, reactants negative)",
        columns: [
          { label: "species" }, { label: "ν", unit: per }, { label: "H°(T)", unit: "kJ/mol" }, { label: "ν·H°(T)", unit: "kJ/mol" },
        ],
        rows: r.terms.map((t) => [t.species, t.coefficient, t.enthalpy / 1000, (t.coefficient * t.enthalpy) / 1000]),
      },
    ],
    notes: extrapolationNotes(r.extrapolated),
  };
}

/** Prototype of every reaction enthalpy result: its display methods (built once; results are made on it). */
export const REACTION_ENTHALPY_PROTOTYPE = /* @__PURE__ */ viewPrototype(/* @__PURE__ */ viewDescriptors(reactionEnthalpyView));

/** What the view of a Hess combination shows, besides the result's own fields. */
export interface HessViewParts {
  readonly target: string;
  readonly known: readonly string[];
  /** Enthalpy of each known reaction, J/mol. */
  readonly enthalpies: readonly number[];
}

/** The view of a Hess combination: the target's enthalpy, then each known reaction's multiplier and share. */
export function hessCombinationView(
  r: { readonly multipliers: readonly number[]; readonly exactMultipliers: readonly string[]; readonly enthalpy: number; readonly exact: string; readonly unique: boolean },
  parts: HessViewParts,
): ResultView {
  return {
    title: `Hess's law: ${parts.target}`,
    tables: [
      {
        columns: [{ label: "ΔrH", unit: "kJ/mol" }, { label: "exact", unit: "J/mol" }, { label: "unique" }],
        rows: [[r.enthalpy / 1000, r.exact, r.unique ? "yes" : "no"]],
      },
      {
        caption: "known reactions",
        columns: [
          { label: "reaction" }, { label: "multiplier" }, { label: "exact" },
          { label: "ΔrH", unit: "kJ/mol" }, { label: "multiplier·ΔrH", unit: "kJ/mol" },
        ],
        rows: parts.known.map((text, j) => {
          const m = r.multipliers[j] ?? 0;
          const h = parts.enthalpies[j] ?? 0;
          return [text, m, r.exactMultipliers[j] ?? null, h / 1000, (m * h) / 1000];
        }),
      },
    ],
    ...(r.unique ? {} : { notes: ["the known reactions are linearly dependent: other multipliers give the same target (free ones set to 0)"] }),
  };
}
