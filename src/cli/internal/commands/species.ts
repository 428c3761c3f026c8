/**
 * `rxtherm species <query>`: a species' data, and Cp, H, S, G at temperatures.
 *
 * @module
 */
import { formatFormula } from "../../../formula/formatFormula.js";
import { molarMass } from "../../../formula/molarMass.js";
import { builtInLibrary } from "../../../species/builtInLibrary.js";
import type { Library, Species } from "../../../species/types.js";
import { STANDARD_TEMPERATURE_K, fromKelvin, fromPascal } from "../../../units.js";
import { flag, optionValue, positionals } from "../args.js";
import { DATABASE_OPTION, type Command } from "../command.js";
import { readPressure, readTemperatures } from "../quantity.js";
import { fields, fixed, num, short, table } from "../table.js";

export const speciesCommand: Command = {
  name: "species",
  summary: "look a species up: formation data, sources, and Cp, H, S, G at temperatures",
  usage: "<key|formula|name> [--T TEMPERATURES] [--P PRESSURE] | --search TEXT",
  description:
    "Finds a species by key with phase (CO2(g), H2O(l)), by formula when only one phase is known, or by name,\n" +
    "and prints its standard formation enthalpy and entropy with their sources, its data range, and Cp, H, S\n" +
    "and G at the temperatures asked (standard state 1 bar, ideal gas; --P changes S and G of gases).\n" +
    "--search lists the species whose key or name contains the text. --database searches the opt-in\n" +
    "species database instead of the built-in set.",
  options: [
    { name: "T", value: "TEMPERATURES", help: "temperature(s) with unit, comma-separated (default 25C)" },
    { name: "P", value: "PRESSURE", help: "pressure for S and G, e.g. 5bar (default 1 bar)" },
    { name: "dataset", value: "NAME", help: "take the entry of this data set, e.g. gri-mech-3.0" },
    { name: "search", help: "list the species whose key or name contains the text" },
    { name: "extrapolate", help: "allow temperatures outside the data range (rows flagged)" },
    DATABASE_OPTION,
  ],
  examples: ["species CO2 --T 25C,500C,1000C", "species methane --dataset gri-mech-3.0 --T 1500K", "species --search meth"],
  async run(args, ctx) {
    const [query] = positionals("species", args, ["QUERY"]);
    const library = (await ctx.library(args)) ?? builtInLibrary();
    if (flag(args, "search")) return search(library, query!);
    const dataset = optionValue(args, "dataset");
    const s = library.get(query!, dataset === undefined ? undefined : { dataset });
    const temperatures = readTemperatures(optionValue(args, "T") ?? "25C", "--T");
    const pText = optionValue(args, "P");
    const P = pText === undefined ? 1e5 : readPressure(pText, "--P");
    const extrapolate = flag(args, "extrapolate");
    const states = temperatures.map((T) => s.evaluate(T, P, { extrapolate }));
    const h298 = s.hf298;
    const info = describe(s, library);
    const text = [
      fields([
        ["key", s.key + (s.name ? `  (${s.name})` : "")],
        ["formula", `${formatFormula(s.formula)}  M = ${short(info.molarMassGPerMol)} g/mol`],
        ["ΔfH°(298.15 K)", `${short(h298 / 1000)} kJ/mol` + (s.hf298Uncertainty === undefined ? "" : ` ± ${num(s.hf298Uncertainty / 1000, 2)}`)],
        ["S°(298.15 K)", `${short(s.s298)} J/(mol·K)`],
        ["Cp data range", `${short(s.range[0])}–${short(s.range[1])} K`],
        ["data set", s.dataset ?? "(user data)"],
        ["other data sets", library.datasets(s.key).filter((d) => d !== s.dataset).join(", ") || "none"],
        ...Object.entries(info.sources).map(([field, c]) => [`source of ${field}`, `${c.id}: ${c.citation}`] as [string, string]),
        ...(s.note ? [["note", s.note] as [string, string]] : []),
      ]),
      "",
      table(
        ["T (K)", "T (°C)", "Cp J/(mol·K)", "H kJ/mol", "H−H°298 kJ/mol", "S J/(mol·K)", "G kJ/mol", ""],
        states.map((e) => [
          fixed(e.T, 2), fixed(fromKelvin(e.T, "C"), 2), num(e.cp, 6), num(e.enthalpy / 1000, 7), num((e.enthalpy - h298) / 1000, 6),
          num(e.entropy, 6), num(e.gibbs / 1000, 7), e.extrapolated ? "extrapolated" : "",
        ]),
        ["right", "right", "right", "right", "right", "right", "right", "left"],
      ),
      "",
      `P = ${short(fromPascal(P, "bar"))} bar; H = ΔfH°(${STANDARD_TEMPERATURE_K} K) + ∫Cp dT (elements at 298.15 K, 1 bar as reference)`,
    ].join("\n");
    return { text, json: { ...info, states } };
  },
};

function describe(s: Species, library: Library) {
  const sources = Object.fromEntries(Object.entries(s.sources).map(([field, id]) => [field, { id, citation: library.citation(id) }]));
  return {
    key: s.key, name: s.name ?? null, formula: formatFormula(s.formula), phase: s.phase, molarMassGPerMol: molarMass(s.formula),
    hf298JPerMol: s.hf298, hf298Exact: s.hf298Exact, hf298UncertaintyJPerMol: s.hf298Uncertainty ?? null, s298JPerMolK: s.s298,
    rangeK: s.range, dataset: s.dataset ?? null, sources, note: s.note ?? null,
  };
}

function search(library: Library, text: string) {
  const q = text.toLowerCase();
  const found = library.all().filter((s) =>
    s.key.toLowerCase().includes(q) || (s.name ?? "").toLowerCase().includes(q) || s.aliases.some((a) => a.toLowerCase().includes(q)),
  );
  const rows = found.map((s) => [s.key, s.name ?? "", s.dataset ?? "", `${short(s.range[0])}–${short(s.range[1])}`]);
  return {
    text: found.length === 0
      ? `no species whose key or name contains "${text}"`
      : table(["key", "name", "data set", "range (K)"], rows, ["left", "left", "left", "left"]),
    json: found.map((s) => ({ key: s.key, name: s.name ?? null, dataset: s.dataset ?? null, rangeK: s.range })),
  };
}
