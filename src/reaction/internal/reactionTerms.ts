/**
 * Private helpers shared by the reaction functions: exact element counts, element matrices,
 * Term construction and equation text.
 */
import type { Formula } from "../../formula/types.js";
import type { Reaction, Term } from "../types.js";
import { viewDescriptors, viewPrototype } from "../../view/attachView.js";
import { reactionView } from "./reactionView.js";
import {
  lcmBigInt,
  rationalFromDecimalString,
  rationalFromNumber,
  rationalToNumber,
  rationalToString,
  type Rational,
} from "../../numeric/rational.js";

/** Pseudo-element name used for the charge row of an element matrix. */
export const CHARGE_ROW = "charge";

/** A species with its parsed formula (no coefficient). */
export interface SpeciesEntry {
  readonly species: string;
  readonly formula: Formula;
}

/** Element symbols in order of first appearance over the given formulas. */
export function elementOrder(formulas: readonly Formula[]): string[] {
  const seen = new Set<string>();
  for (const f of formulas) for (const el of Object.keys(f.elements)) seen.add(el);
  return [...seen];
}

/** An element count or charge as an exact rational, read from its shortest decimal text. */
export function exactCount(n: number): Rational {
  return rationalFromNumber(n);
}

/**
 * Integer element matrix: one row per element (plus a charge row when any species is charged,
 * or when `forceCharge`), one column per formula, each entry multiplied by `signs[j]`
 * (default +1). Rows with decimal counts are scaled by the lcm of their denominators, which
 * does not change the solutions of `row · x = 0`.
 */
export function integerElementMatrix(
  formulas: readonly Formula[],
  signs?: readonly number[],
): { rows: bigint[][]; rowNames: string[] } {
  const elements = elementOrder(formulas);
  const charged = formulas.some((f) => f.charge !== 0);
  const rowNames = charged ? [...elements, CHARGE_ROW] : elements;
  const rows = rowNames.map((name) => {
    const rs = formulas.map((f, j) => {
      const v = name === CHARGE_ROW ? f.charge : (f.elements[name] ?? 0);
      const r = exactCount(v);
      return (signs?.[j] ?? 1) < 0 ? { num: -r.num, den: r.den } : r;
    });
    let l = 1n;
    for (const r of rs) if (r.den !== 1n) l = lcmBigInt(l, r.den);
    return rs.map((r) => (r.num * l) / r.den);
  });
  return { rows, rowNames };
}

/**
 * The signed element matrix in float64 integers when every count and charge is an integer of
 * magnitude below 2^31 (the common case); null otherwise.
 */
export function numberElementMatrix(formulas: readonly Formula[], signs?: readonly number[]): { rows: number[][]; rowNames: string[] } | null {
  // one pass over each formula's own elements (no lookups of absent elements per row)
  const n = formulas.length;
  const index = new Map<string, number>();
  const rowNames: string[] = [];
  const rows: number[][] = [];
  let charged = false;
  for (let j = 0; j < n; j++) {
    const f = formulas[j] as Formula;
    const sign = (signs?.[j] ?? 1) < 0 ? -1 : 1;
    const els = f.elements;
    for (const el in els) {
      if (!Object.prototype.hasOwnProperty.call(els, el)) continue;
      const v = els[el] as number;
      if (!Number.isInteger(v) || Math.abs(v) >= 2 ** 31) return null;
      let r = index.get(el);
      if (r === undefined) {
        r = rows.length;
        index.set(el, r);
        rowNames.push(el);
        rows.push(new Array<number>(n).fill(0));
      }
      (rows[r] as number[])[j] = sign < 0 ? -v || 0 : v;
    }
    if (f.charge !== 0) charged = true;
  }
  if (charged) {
    const row = new Array<number>(n);
    for (let j = 0; j < n; j++) {
      const q = (formulas[j] as Formula).charge;
      if (!Number.isInteger(q) || Math.abs(q) >= 2 ** 31) return null;
      row[j] = (signs?.[j] ?? 1) < 0 ? -q || 0 : q;
    }
    rowNames.push(CHARGE_ROW);
    rows.push(row);
  }
  return { rows, rowNames };
}

/** A frozen Term with a positive safe-integer coefficient (fast path of {@link makeTerm}). */
export function makeIntegerTerm(entry: SpeciesEntry, coefficient: number): Term {
  return Object.freeze({ species: entry.species, formula: entry.formula, coefficient, exact: String(coefficient) });
}

/** {@link makeIntegerTerm} from the species and formula themselves (no entry object). */
export function integerTerm(species: string, formula: Formula, coefficient: number): Term {
  return Object.freeze({ species, formula, coefficient, exact: String(coefficient) });
}

/** Build a frozen Term from a species, its formula and an exact positive coefficient. */
export function makeTerm(entry: SpeciesEntry, coefficient: Rational): Term {
  return Object.freeze({
    species: entry.species,
    formula: entry.formula,
    coefficient: rationalToNumber(coefficient),
    exact: rationalToString(coefficient),
  });
}

/** The exact coefficient of a term: its `exact` text when present, else its number. */
export function termCoefficient(term: Term): Rational {
  if (typeof term.exact === "string" && term.exact !== "") return rationalFromDecimalString(term.exact);
  return rationalFromNumber(term.coefficient);
}

/** Frozen Reaction from term lists. */
export function makeReaction(reactants: Term[], products: Term[]): Reaction {
  // the prototype carries the (non-enumerable) display methods; the reaction stays a frozen plain record
  const r = Object.create(REACTION_PROTOTYPE) as { reactants: readonly Term[]; products: readonly Term[] };
  r.reactants = Object.freeze(reactants);
  r.products = Object.freeze(products);
  return Object.freeze(r);
}

/** Prototype of every reaction made here: the display methods (a table of the terms). */
const REACTION_PROTOTYPE = /* @__PURE__ */ viewPrototype(
  /* @__PURE__ */ viewDescriptors((r: Reaction) => reactionView(r, equationText(r))),
);

/** Equation text `a A + b B -> c C` (coefficient 1 omitted, fractions as `13/2`). */
export function equationText(reaction: Reaction, arrow = "->"): string {
  const side = (terms: readonly Term[]) =>
    terms.map((t) => (t.exact === "1" ? t.species : `${t.exact} ${t.species}`)).join(" + ");
  return `${side(reaction.reactants)} ${arrow} ${side(reaction.products)}`;
}

/**
 * A reaction from a signed integer vector over species: negative entries become reactants,
 * positive entries products, zeros are left out (species order kept on each side).
 */
export function reactionFromSigned(entries: readonly SpeciesEntry[], v: readonly bigint[]): Reaction {
  const reactants: Term[] = [];
  const products: Term[] = [];
  entries.forEach((e, j) => {
    const x = v[j] ?? 0n;
    if (x < 0n) reactants.push(makeTerm(e, { num: -x, den: 1n }));
    else if (x > 0n) products.push(makeTerm(e, { num: x, den: 1n }));
  });
  return makeReaction(reactants, products);
}

/**
 * A reaction from a sparse signed integer vector over species (columns ascending, safe-integer
 * values): negative entries become reactants, positive entries products, species order kept.
 */
export function reactionFromSparse(entries: readonly SpeciesEntry[], columns: readonly number[], values: readonly number[]): Reaction {
  const reactants: Term[] = [];
  const products: Term[] = [];
  for (let k = 0; k < columns.length; k++) {
    const x = values[k]!;
    const e = entries[columns[k]!]!;
    if (x < 0) reactants.push(makeIntegerTerm(e, -x));
    else if (x > 0) products.push(makeIntegerTerm(e, x));
  }
  return makeReaction(reactants, products);
}
