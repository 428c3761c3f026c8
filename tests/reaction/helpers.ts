/**
 * Test helpers for the reaction tests: an independent element count (plain float sums over
 * parseFormula's counts, rounded to 1e-9 — it does not use the exact code under test) and a
 * generator of random balanced reactions.
 */
import { fc } from "../_helpers/property.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import type { Reaction } from "../../src/reaction/types.js";

/** Products − reactants for every element and the charge, by plain float arithmetic. */
export function independentResiduals(species: { reactants: [number, string][]; products: [number, string][] }): Record<string, number> {
  const out: Record<string, number> = {};
  const add = (terms: [number, string][], sign: number) => {
    for (const [nu, s] of terms) {
      const f = parseFormula(s);
      for (const [el, n] of Object.entries(f.elements)) out[el] = (out[el] ?? 0) + sign * nu * n;
      out["(charge)"] = (out["(charge)"] ?? 0) + sign * nu * f.charge;
    }
  };
  add(species.reactants, -1);
  add(species.products, 1);
  for (const k of Object.keys(out)) out[k] = Math.round((out[k] as number) * 1e9) / 1e9 || 0;
  return out;
}

/** Pairs [coefficient, species] of a reaction. */
export function pairs(r: Reaction): { reactants: [number, string][]; products: [number, string][] } {
  return {
    reactants: r.reactants.map((t) => [t.coefficient, t.species]),
    products: r.products.map((t) => [t.coefficient, t.species]),
  };
}

export { caught as errorOf } from "../_helpers/caught.js";

const ELEMENTS = ["C", "H", "O", "N", "S", "Fe", "Cl"] as const;
type Atoms = Record<string, number>;

function formulaText(atoms: Atoms): string {
  return Object.entries(atoms)
    .filter(([, n]) => n > 0)
    .map(([el, n]) => (n === 1 ? el : `${el}${n}`))
    .join("");
}

const arbAtoms = fc
  .array(fc.tuple(fc.constantFrom(...ELEMENTS), fc.integer({ min: 1, max: 4 })), { minLength: 1, maxLength: 3 })
  .map((list) => {
    const a: Atoms = {};
    for (const [el, n] of list) a[el] = n;
    return a;
  });

/**
 * A random balanced reaction: random reactant formulas with random coefficients; products are
 * random formulas with random coefficients taken out of the reactant atoms, and the last
 * product holds whatever is left. Returns the species and the construction's coefficients.
 */
export const arbBalancedReaction = fc
  .record({
    reactants: fc.array(fc.tuple(fc.integer({ min: 1, max: 6 }), arbAtoms), { minLength: 1, maxLength: 3 }),
    products: fc.array(fc.tuple(fc.integer({ min: 1, max: 3 }), arbAtoms), { minLength: 0, maxLength: 3 }),
  })
  .map(({ reactants, products }) => {
    const pool: Atoms = {};
    for (const [nu, a] of reactants) for (const [el, n] of Object.entries(a)) pool[el] = (pool[el] ?? 0) + nu * n;
    const prods: [number, Atoms][] = [];
    for (const [nu, a] of products) {
      if (Object.entries(a).every(([el, n]) => (pool[el] ?? 0) >= nu * n)) {
        for (const [el, n] of Object.entries(a)) pool[el] = (pool[el] as number) - nu * n;
        prods.push([nu, a]);
      }
    }
    const rest: Atoms = {};
    for (const [el, n] of Object.entries(pool)) if (n > 0) rest[el] = n;
    if (Object.keys(rest).length > 0) prods.push([1, rest]);
    return {
      reactants: reactants.map(([nu, a]) => [nu, formulaText(a)] as [number, string]),
      products: prods.map(([nu, a]) => [nu, formulaText(a)] as [number, string]),
    };
  })
  .filter((r) => {
    const all = [...r.reactants, ...r.products].map(([, s]) => s);
    return r.products.length > 0 && new Set(all).size === all.length;
  });
