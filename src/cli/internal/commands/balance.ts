/**
 * `rxtherm balance "<equation>"`: smallest whole-number coefficients, with the element check.
 *
 * @module
 */
import { balanceReaction } from "../../../reaction/balanceReaction.js";
import { formatReaction } from "../../../reaction/formatReaction.js";
import type { Reaction, Term } from "../../../reaction/types.js";
import { optionValue, positionals } from "../args.js";
import type { Command } from "../command.js";
import { short, table } from "../table.js";

export const balanceCommand: Command = {
  name: "balance",
  summary: "balance a chemical equation (exact whole-number or per-species coefficients)",
  usage: '"<equation>" [--per SPECIES]',
  description:
    "Finds the smallest whole-number coefficients that conserve every element and the charge, by exact\n" +
    "rational arithmetic, and prints the element count of each side. Write the equation with ->, =, <=> or\n" +
    "a Unicode arrow; coefficients already written are ignored. Electrons are e-, charges Fe3+ or SO4^2-.\n" +
    "Quote the equation so the shell keeps it in one piece.",
  options: [{ name: "per", value: "SPECIES", help: "scale to one mol of this species (fractions such as 25/2 then appear)" }],
  examples: ['balance "KMnO4 + HCl -> KCl + MnCl2 + Cl2 + H2O"', 'balance "C8H18 + O2 -> CO2 + H2O" --per C8H18'],
  run(args) {
    const [equation] = positionals("balance", args, ["EQUATION"]);
    const per = optionValue(args, "per");
    const r = balanceReaction(equation!, per === undefined ? {} : { per });
    const elements = elementCounts(r);
    const text = [
      formatReaction(r),
      "",
      table(
        ["element", "reactants", "products"],
        [...elements].map(([el, [left, right]]) => [el, short(left), short(right)]),
        ["left", "right", "right"],
      ),
    ].join("\n");
    const term = (t: Term) => ({ species: t.species, coefficient: t.coefficient, exact: t.exact });
    return {
      text,
      json: {
        equation: formatReaction(r),
        reactants: r.reactants.map(term),
        products: r.products.map(term),
        elements: Object.fromEntries([...elements].map(([el, [left, right]]) => [el, { reactants: left, products: right }])),
      },
    };
  },
};

/** Element → [atoms on the left, atoms on the right], elements in order of first appearance; charge as "charge". */
function elementCounts(r: Reaction): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  const add = (terms: readonly Term[], side: 0 | 1) => {
    for (const t of terms) {
      for (const [el, n] of Object.entries(t.formula.elements)) {
        const row = out.get(el) ?? [0, 0];
        row[side] += n * t.coefficient;
        out.set(el, row);
      }
    }
  };
  add(r.reactants, 0);
  add(r.products, 1);
  const charge: [number, number] = [0, 0];
  r.reactants.forEach((t) => (charge[0] += t.formula.charge * t.coefficient));
  r.products.forEach((t) => (charge[1] += t.formula.charge * t.coefficient));
  if (charge[0] !== 0 || charge[1] !== 0) out.set("charge", charge);
  return out;
}
