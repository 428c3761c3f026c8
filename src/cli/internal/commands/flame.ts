/**
 * `rxtherm flame <fuel>`: adiabatic flame temperature, complete or at chemical equilibrium.
 *
 * @module
 */
import { adiabaticFlameTemperature } from "../../../flame/adiabaticFlameTemperature.js";
import type { AdiabaticFlameInput } from "../../../flame/types.js";
import { fromKelvin, fromPascal } from "../../../units.js";
import { flag, optionValue, positionals } from "../args.js";
import { DATABASE_OPTION, readMixture, type Command } from "../command.js";
import { oneOf, readPressure, readTemperature } from "../quantity.js";
import { fields, fixed, num, table } from "../table.js";
import { airOption } from "./air.js";

/** Mole fractions below this are left out of the table (kept in --json). */
const SHOWN_ABOVE = 1e-6;

export const flameCommand: Command = {
  name: "flame",
  summary: "adiabatic flame temperature and products, complete or at chemical equilibrium",
  usage: "<fuel> [--excess-air PERCENT | --equivalence-ratio PHI] [--oxidizer air|oxygen] [--T TEMP] [--P PRESSURE]",
  description:
    "Temperature reached when the fuel burns with no heat loss. --mode equilibrium (the default) minimises\n" +
    "the Gibbs energy over the product gases, so dissociation (CO, H2, OH, H, O, NO...) is counted; --mode\n" +
    "complete burns to CO2 and H2O only and gives a higher, less realistic value. --closed-vessel gives the\n" +
    "constant-volume explosion temperature and pressure. Ideal gas, adiabatic: a screening value, not a\n" +
    "refractory, burner or vessel design value — follow local codes and licensed engineering practice.",
  options: [
    { name: "excess-air", value: "PERCENT", help: "excess air, 15% or 0.15 (default 0, stoichiometric)" },
    { name: "equivalence-ratio", value: "PHI", help: "fuel/oxidizer equivalence ratio (above 1 is rich)" },
    { name: "oxidizer", value: "air|oxygen", help: "dry air (default) or pure oxygen" },
    { name: "T", value: "TEMP", help: "temperature of fuel and oxidizer, e.g. 25C (default 298.15 K)" },
    { name: "fuel-T", value: "TEMP", help: "fuel temperature, overrides --T" },
    { name: "air-T", value: "TEMP", help: "oxidizer (air) preheat temperature, overrides --T" },
    { name: "P", value: "PRESSURE", help: "pressure, e.g. 1atm, 2bar (default 101325 Pa)" },
    { name: "mode", value: "equilibrium|complete", help: "product model (default equilibrium)" },
    { name: "closed-vessel", help: "constant volume instead of constant pressure (explosion temperature and pressure)" },
    { name: "extrapolate", help: "allow species data beyond their temperature range (result flagged)" },
    DATABASE_OPTION,
  ],
  examples: ["flame CH4 --excess-air 15%", "flame CH4:0.6,CO2:0.4 --excess-air 20% --air-T 200C --mode complete"],
  async run(args, ctx) {
    const [text] = positionals("flame", args, ["FUEL"]);
    const library = await ctx.library(args);
    const input: AdiabaticFlameInput = { fuel: readMixture(text!, "FUEL"), ...airOption(args) };
    const ox = optionValue(args, "oxidizer");
    if (ox !== undefined) input.oxidizer = oneOf(ox, ["air", "oxygen"] as const, "--oxidizer");
    const temp = (name: string) => {
      const v = optionValue(args, name);
      return v === undefined ? undefined : readTemperature(v, `--${name}`);
    };
    const T = temp("T"), fuelT = temp("fuel-T"), airT = temp("air-T");
    if (T !== undefined) input.T = T;
    if (fuelT !== undefined) input.fuelT = fuelT;
    if (airT !== undefined) input.oxidizerT = airT;
    const P = optionValue(args, "P");
    if (P !== undefined) input.P = readPressure(P, "--P");
    input.mode = oneOf(optionValue(args, "mode") ?? "equilibrium", ["equilibrium", "complete"] as const, "--mode");
    if (flag(args, "closed-vessel")) input.process = "constant-volume";
    if (library) input.library = library;
    const r = adiabaticFlameTemperature(input, { extrapolate: flag(args, "extrapolate") });
    const shown = Object.entries(r.products).filter(([, x]) => x >= SHOWN_ABOVE).sort((a, b) => b[1] - a[1]);
    const rows: [string, string][] = [
      ["flame temperature", `${fixed(r.T, 1)} K  (${fixed(fromKelvin(r.T, "C"), 1)} °C, ${fixed(fromKelvin(r.T, "F"), 1)} °F)`],
      ["mode", `${r.mode}, ${r.process}`],
      ["pressure", `${num(fromPascal(r.P, "bar"), 6)} bar`],
      ["equivalence ratio", num(r.equivalenceRatio, 6)],
      ["oxidizer", Object.entries(r.oxidizer).map(([k, x]) => `${k} ${num(x, 5)}`).join(", ") + " mol"],
    ];
    if (r.extrapolated.length > 0) rows.push(["note", `species data extrapolated (${r.extrapolated.map((p) => `${p.species} at ${p.T.toFixed(0)} K`).join(", ")}): a screening value only`]);
    return {
      text: [
        fields(rows),
        "",
        table(["product", "mol fraction", "mol"], shown.map(([k, x]) => [k, num(x, 5), num(r.moles[k]!, 5)]), ["left", "right", "right"]),
        "",
        "adiabatic and ideal: not a refractory or burner design value",
      ].join("\n"),
      json: r,
    };
  },
};
