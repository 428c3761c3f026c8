/**
 * `rxtherm mass <formula>...`: molar mass and composition by element.
 *
 * @module
 */
import { elementData } from "../../../formula/atomicWeights.js";
import { formatFormula } from "../../../formula/formatFormula.js";
import { molarMass } from "../../../formula/molarMass.js";
import { parseFormula } from "../../../formula/parseFormula.js";
import type { Command } from "../command.js";
import { fixed, short, table } from "../table.js";
import { UsageError } from "../usage.js";

export const massCommand: Command = {
  name: "mass",
  summary: "molar mass and mass composition of one or more formulas",
  usage: "<formula>... ",
  description:
    "Molar mass in g/mol from the IUPAC standard atomic weights, and the atoms and mass fraction of each\n" +
    "element. Hydrates and adducts with a dot (CuSO4.5H2O or CuSO4·5H2O), groups, decimal counts (Fe0.947O)\n" +
    "and charges are read as in the library.",
  options: [],
  examples: ["mass CuSO4.5H2O", "mass CH4 C2H6 C3H8"],
  run(args) {
    if (args.positionals.length === 0) throw new UsageError("missing FORMULA (see rxtherm mass --help)");
    const results = args.positionals.map((text) => {
      const f = parseFormula(text);
      const M = molarMass(f);
      const elements = Object.entries(f.elements).map(([el, n]) => {
        const w = elementData(el).atomicWeight;
        return { element: el, atoms: n, atomicWeight: w, massGPerMol: n * w, massFraction: (n * w) / M };
      });
      return { formula: text, hill: formatFormula(f), molarMassGPerMol: M, charge: f.charge, elements };
    });
    const text = results.map((r) =>
      [
        `${r.formula}  (Hill ${r.hill})  M = ${fixed(r.molarMassGPerMol, 4)} g/mol`,
        "",
        table(
          ["element", "atoms", "atomic weight", "g/mol", "mass %"],
          r.elements.map((e) => [e.element, short(e.atoms), short(e.atomicWeight), fixed(e.massGPerMol, 4), fixed(100 * e.massFraction, 3)]),
          ["left", "right", "right", "right", "right"],
        ),
      ].join("\n"),
    ).join("\n\n");
    return { text, json: results.length === 1 ? results[0] : results };
  },
};
