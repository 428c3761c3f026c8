/**
 * Random equation texts for comparing two runs of parseReaction / balanceReaction exactly: real
 * species (neutral, ions, the electron, hydrates, decimal counts, phases), a few bad ones,
 * coefficients of every accepted form (and some refused), separators spaced or glued, every arrow.
 * `reactionOutcome` turns a call into plain data: every term (species, formula, coefficient, exact)
 * or the error (code, message, details).
 */
import fc from "fast-check";
import { RxthermError } from "../../src/errors.js";
import type { Reaction } from "../../src/reaction/types.js";

/** Species texts; stoichiometry of the balanced ones is common practice. */
export const SPECIES = [
  "K4Fe(CN)6", "KMnO4", "H2SO4", "KHSO4", "Fe2(SO4)3", "MnSO4", "HNO3", "CO2", "H2O", "MnO4-", "K+", "Fe3+", "Fe2+", "Mn2+",
  "NO3-", "HSO4-", "H+", "e-", "O2", "H2", "CH4", "C8H18", "Cr2O7^2-", "Cr3+", "Cu", "Cu(NO3)2", "NO", "NH3", "Al", "Fe2O3",
  "Al2O3", "Fe", "C6H12O6", "Fe0.947O", "CuSO4·5H2O", "CuSO4", "H2O(g)", "H2O(l)", "CO2(g)", "Na+", "Cl-", "NaCl(s)", "SO4^2-",
  "Ca(OH)2", "CaCO3", "HCl", "Cl2", "KCl", "MnCl2", "H2C2O4", "C3H8", "CO", "N2", "SO2", "SO3", "Fe^{3+}", "Fe³⁺", "Fe+2",
  "[Fe(CN)6]^4-", "Li1.2Mn0.6Ni0.2O2", "CaSO4·0.5H2O",
] as const;

/** Texts that are not formulas (each gives its own parse error). */
const BAD = ["Xy2", "H2O)", "(H2O", "co", "H0O", "2H2O", "Fe3++", "H2O(x)", "", "NaN"] as const;

const coefficient = fc.oneof(
  { weight: 6, arbitrary: fc.constant("") },
  { weight: 2, arbitrary: fc.integer({ min: 1, max: 40 }).map((n) => `${n} `) },
  { weight: 1, arbitrary: fc.integer({ min: 1, max: 40 }).map((n) => `${n}`) },
  { weight: 1, arbitrary: fc.constantFrom("1/2 ", "13/2 ", "0.5 ", "2.25 ", ".5 ", "0 ", "1e3 ", "3 / 4 ", "2000000000 ") },
);

const species = fc.oneof({ weight: 30, arbitrary: fc.constantFrom(...SPECIES) }, { weight: 1, arbitrary: fc.constantFrom(...BAD) });

const side = fc
  .array(fc.tuple(coefficient, species), { minLength: 1, maxLength: 6 })
  .chain((terms) => fc.constantFrom(" + ", "+", " +", "  +  ").map((sep) => terms.map(([c, s]) => `${c}${s}`).join(sep)));

/** A random equation text: two sides, an arrow; now and then an extra arrow or an empty side. */
export const equationText: fc.Arbitrary<string> = fc.oneof(
  { weight: 20, arbitrary: fc.tuple(side, fc.constantFrom(" -> ", "->", " = ", " <=> ", " → ", " ⇌ "), side).map(([l, a, r]) => `${l}${a}${r}`) },
  { weight: 1, arbitrary: fc.tuple(side, side).map(([l, r]) => `${l} -> ${r} -> H2O`) },
  { weight: 1, arbitrary: side.map((l) => `${l} -> `) },
  { weight: 1, arbitrary: side },
);

/** Species sets that balance (common practice; see tests/reaction/balanceReaction.test.ts for the coefficients). */
const BALANCEABLE: readonly (readonly [readonly string[], readonly string[]])[] = [
  [["K4Fe(CN)6", "KMnO4", "H2SO4"], ["KHSO4", "Fe2(SO4)3", "MnSO4", "HNO3", "CO2", "H2O"]],
  [["K4Fe(CN)6", "MnO4-", "H2SO4"], ["K+", "Fe3+", "Mn2+", "NO3-", "CO2", "H2O", "HSO4-"]],
  [["MnO4-", "H+", "Fe2+"], ["Mn2+", "Fe3+", "H2O"]],
  [["Cr2O7^2-", "H+", "e-"], ["Cr3+", "H2O"]],
  [["Fe0.947O", "O2"], ["Fe2O3"]],
  [["C8H18", "O2"], ["CO2", "H2O(g)"]],
  [["CuSO4·5H2O"], ["CuSO4", "H2O"]],
  [["Cu", "HNO3"], ["Cu(NO3)2", "NO", "H2O"]],
  [["KMnO4", "HCl"], ["KCl", "MnCl2", "Cl2", "H2O"]],
  [["Al", "Fe2O3"], ["Al2O3", "Fe"]],
  [["CaSO4·0.5H2O", "H2O"], ["CaSO4·2H2O"]],
  [["Li1.2Mn0.6Ni0.2O2", "H+"], ["Li+", "Mn2+", "Ni2+", "O2", "H2O"]],
  [["H2", "O2"], ["H2O", "H2O2"]],
  [["C6H12O6", "O2"], ["CO2", "H2O(l)"]],
];

/**
 * An equation over a balanceable species set: shuffled on each side, with coefficients the
 * balancer ignores, and now and then one species moved to the other side or left out.
 */
export const balanceableText: fc.Arbitrary<string> = fc
  .record({
    set: fc.constantFrom(...BALANCEABLE),
    order: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 8, maxLength: 8 }),
    coefficients: fc.array(coefficient, { minLength: 8, maxLength: 8 }),
    edit: fc.constantFrom("none", "none", "none", "move", "drop"),
    which: fc.nat(),
    sep: fc.constantFrom(" + ", "+", " +"),
    arrow: fc.constantFrom(" -> ", " = ", "→"),
  })
  .map(({ set, order, coefficients, edit, which, sep, arrow }) => {
    const left = [...set[0]];
    const right = [...set[1]];
    const all = left.length + right.length;
    const k = which % all;
    if (edit === "move") {
      if (k < left.length) right.push(...left.splice(k, 1));
      else left.push(...right.splice(k - left.length, 1));
    } else if (edit === "drop" && left.length + right.length > 3) {
      if (k < left.length && left.length > 1) left.splice(k, 1);
      else if (k >= left.length && right.length > 1) right.splice(k - left.length, 1);
    }
    const shuffle = (xs: string[], off: number) =>
      xs.map((x, i) => [x, order[(i + off) % order.length] as number] as const).sort((a, b) => a[1] - b[1]).map(([x]) => x);
    const text = (xs: string[], off: number) => shuffle(xs, off).map((x, i) => `${coefficients[(i + off) % 8] as string}${x}`).join(sep);
    return `${text(left, 0)}${arrow}${text(right, 3)}`;
  });

/**
 * A reaction as plain data: per term [species, coefficient, exact, formula text, element entries in
 * order, charge, phase], and whether the reaction, its term lists, terms and formulas are frozen.
 */
export function reactionData(r: Reaction): unknown {
  const term = (t: Reaction["reactants"][number]) => [
    t.species, t.coefficient, t.exact, t.formula.text, Object.entries(t.formula.elements), t.formula.charge, t.formula.phase,
  ];
  const terms = [...r.reactants, ...r.products];
  const frozen = Object.isFrozen(r) && Object.isFrozen(r.reactants) && Object.isFrozen(r.products) &&
    terms.every((t) => Object.isFrozen(t) && Object.isFrozen(t.formula) && Object.isFrozen(t.formula.elements));
  return { reactants: r.reactants.map(term), products: r.products.map(term), frozen };
}

/** The outcome of a call as plain data: the reaction, or the error. */
export function reactionOutcome(f: () => Reaction): unknown {
  try {
    return reactionData(f());
  } catch (e) {
    if (e instanceof RxthermError) return { error: e.code, message: e.message, details: e.details };
    throw e;
  }
}
