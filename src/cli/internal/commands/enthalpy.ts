/**
 * `rxtherm enthalpy "<reaction>" [--T ...]`: ΔH°rxn by Hess's law at 25 °C, Kirchhoff's law at T.
 *
 * @module
 */
import { reactionEnthalpy, type ReactionEnthalpyResult } from "../../../enthalpy/reactionEnthalpy.js";
import { formatReaction } from "../../../reaction/formatReaction.js";
import { balanceReaction } from "../../../reaction/balanceReaction.js";
import { parseReaction } from "../../../reaction/parseReaction.js";
import { molarMass } from "../../../formula/molarMass.js";
import { STANDARD_TEMPERATURE_K, fromJoulePerMol, fromKelvin, type SpecificEnergyUnit } from "../../../units.js";
import { flag, optionValue, positionals } from "../args.js";
import { DATABASE_OPTION, type Command } from "../command.js";
import { SPECIFIC_ENERGY_UNITS, oneOf, readTemperatures } from "../quantity.js";
import { fields, fixed, num, short, table } from "../table.js";
import { UsageError } from "../usage.js";

export const enthalpyCommand: Command = {
  name: "enthalpy",
  summary: "heat of reaction at 25 °C (Hess) or at other temperatures (Kirchhoff)",
  usage: '"<reaction>" [--T TEMPERATURES] [--unit UNIT] [--per SPECIES]',
  description:
    "Standard enthalpy of reaction from the formation enthalpies of the species library: summed exactly at\n" +
    "298.15 K, and at another temperature with each species' full Cp(T) integral (Kirchhoff's law). Species\n" +
    "keys carry their phase: H2O(l) and H2O(g) give different answers. Standard state 1 bar, ideal gases.\n" +
    "Several temperatures may be given, separated by commas. A negative value is heat released.",
  options: [
    { name: "T", value: "TEMPERATURES", help: "temperature(s) with unit, comma-separated, e.g. 25C or 298.15K,1000K (default 25C)" },
    { name: "unit", value: "UNIT", help: `result unit: ${SPECIFIC_ENERGY_UNITS.join(", ")} (default kJ/mol; per-mass units need --per)` },
    { name: "per", value: "SPECIES", help: "per mol (or kg) of this species instead of per mol of reaction as written" },
    { name: "balance", help: "balance the equation first (coefficients written are replaced)" },
    { name: "extrapolate", help: "allow temperatures outside a species' data range (results flagged as extrapolated)" },
    DATABASE_OPTION,
  ],
  examples: [
    'enthalpy "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"',
    'enthalpy "CO(g) + 2 H2(g) -> CH3OH(g)" --T 25C,250C --per CH3OH(g)',
  ],
  async run(args, ctx) {
    const [text] = positionals("enthalpy", args, ["REACTION"]);
    const library = await ctx.library(args);
    const unit = oneOf(optionValue(args, "unit") ?? "kJ/mol", SPECIFIC_ENERGY_UNITS, "--unit");
    const per = optionValue(args, "per");
    const temperatures = readTemperatures(optionValue(args, "T") ?? "25C", "--T");
    const reaction = flag(args, "balance") ? balanceReaction(text!) : parseReaction(text!);
    const extrapolate = flag(args, "extrapolate");
    const results = temperatures.map((T) =>
      reactionEnthalpy(reaction, { T, ...(library ? { library } : {}), ...(per !== undefined ? { per } : {}), extrapolate }),
    );
    const M = perMassMolarMass(unit, per);
    const convert = (jPerMol: number) => fromJoulePerMol(jPerMol, unit, M === undefined ? {} : { molarMassGPerMol: M });
    const basis = per === undefined ? "of reaction as written" : `of ${per}`;
    const equation = formatReaction(reaction);
    const first = results[0]!;
    const lines = [equation, ""];
    if (results.length === 1) {
      lines.push(fields(summary(first, unit, convert, basis)));
    } else {
      lines.push(
        table(
          ["T (K)", "T (°C)", `ΔH°rxn (${unit})`, "extrapolated"],
          results.map((r) => [fixed(r.T, 2), fixed(fromKelvin(r.T, "C"), 2), num(convert(r.value), 7), r.extrapolated.length > 0 ? "yes" : ""]),
          ["right", "right", "right", "left"],
        ),
        "",
        `ΔH°rxn in ${unit} ${basis}`,
      );
    }
    lines.push(
      "",
      table(
        ["species", "ν", ...results.map((r) => `H°(${fixed(r.T, 2)} K) kJ/mol`)],
        first.terms.map((t, i) => [t.species, short(t.coefficient), ...results.map((r) => fixed(r.terms[i]!.enthalpy / 1000, 3))]),
        ["left", "right", ...results.map(() => "right" as const)],
      ),
    );
    return {
      text: lines.join("\n"),
      json: {
        reaction: equation,
        per: per ?? null,
        unit,
        results: results.map((r) => ({ ...r, valueInUnit: convert(r.value) })),
      },
    };
  },
};

function summary(r: ReactionEnthalpyResult, unit: string, convert: (j: number) => number, basis: string): [string, string][] {
  const rows: [string, string][] = [
    ["T", `${fixed(r.T, 2)} K (${fixed(fromKelvin(r.T, "C"), 2)} °C)`],
    ["ΔH°rxn", `${num(convert(r.value), 7)} ${unit} ${basis}`],
  ];
  if (r.uncertainty !== undefined) rows.push(["uncertainty", `± ${num(convert(r.uncertainty), 2)} ${unit} (standard)`]);
  if (r.exact !== undefined && r.T === STANDARD_TEMPERATURE_K) rows.push(["exact sum", `${r.exact} J/mol`]);
  if (r.extrapolated.length > 0) rows.push(["note", `extrapolated outside a species' data range (${r.extrapolated.map((p) => `${p.species} at ${fixed(p.T, 2)} K`).join(", ")}): a screening value only`]);
  return rows;
}

/** Molar mass for a per-mass unit: that of `--per`, else a usage error. */
function perMassMolarMass(unit: SpecificEnergyUnit, per: string | undefined): number | undefined {
  if (!/\/(g|kg|lb)$/.test(unit)) return undefined;
  if (per === undefined) throw new UsageError(`--unit ${unit} is per mass: name the species with --per`);
  return molarMass(per);
}
