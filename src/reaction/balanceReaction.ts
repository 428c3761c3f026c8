import { RxthermError, describeValue, knownKeys, optionsOf, requireArray } from "../errors.js";
import { parseFormula } from "../formula/parseFormula.js";
import type { Formula } from "../formula/types.js";
import { rational, rationalDiv, rationalFrom, type Rational, type RationalLike } from "../numeric/rational.js";
import {
  integerGaussJordan,
  integerGaussJordanNumber,
  integerNullSpaceFromEchelon,
  integerNullSpaceNumber,
  integerNullVectorNumber,
} from "../numeric/integerElimination.js";
import {
  equationText,
  integerElementMatrix,
  integerTerm,
  makeReaction,
  makeTerm,
  numberElementMatrix,
  reactionFromSigned,
  type SpeciesEntry,
} from "./internal/reactionTerms.js";
import { scanEquation } from "./parseReaction.js";
import type { Reaction, Term } from "./types.js";
import { balanceLanes } from "./internal/balanceLanes.js";

/** The option keys balanceReaction reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<BalanceReactionOptions>()("fixed", "per");

/**
 * The species to balance: an equation text (its coefficients are ignored) or the species of
 * each side.
 *
 * @category Reaction
 */
export type BalanceInput = string | { readonly reactants: readonly string[]; readonly products: readonly string[] };

/**
 * Options of {@link balanceReaction}.
 *
 * @category Reaction
 */
export interface BalanceReactionOptions {
  /**
   * Coefficients to hold fixed, by species key as written (`{ "O2": 1 }`, `{ "CO": "1/2" }`).
   * Values must be positive; numbers are read from their shortest decimal text. With fixed
   * coefficients the result is not rescaled to integers. Use them to pin down a reaction
   * whose species admit more than one independent balance.
   * @defaultValue `{}`
   */
  readonly fixed?: Readonly<Record<string, RationalLike>>;
  /**
   * Normalise to one mole of this species (`per: "C8H18"` gives `25/2 O2`). When `fixed` is
   * also given, `fixed` sets the ratios and `per` then sets the scale.
   * @defaultValue undefined (smallest whole numbers)
   */
  readonly per?: string;
}

/**
 * Balance a chemical equation exactly: find positive coefficients that conserve every element
 * and the charge.
 *
 * **Method.** The species form the columns of the element matrix (one row per element plus a
 * charge row when a species is charged), with product columns counted positive and reactant
 * columns negative. Balanced coefficients are the positive vectors of its null space, found
 * by exact fraction-free Gauss–Jordan elimination on integers (BigInt when numbers grow), so
 * no rounding can hide or invent a balance. With a one-dimensional null space the vector is
 * scaled to the smallest coprime whole numbers; element counts written as decimals
 * (`Fe0.947O`) are used exactly.
 *
 * **Input coefficients.** Coefficients written in the equation text are ignored; to hold a
 * coefficient, pass it in `options.fixed`. The result keeps the species, their order and their
 * sides as given.
 *
 * **When there is no unique answer.**
 * - no non-zero balance, or a species that can only take coefficient 0 → `NOT_BALANCEABLE`,
 *   naming the elements present on one side only;
 * - a species that needs a negative coefficient → `WRONG_SIDE` (it belongs on the other side);
 * - more than one independent balance (e.g. `H2 + O2 -> H2O + H2O2`) → `AMBIGUOUS_BALANCE`,
 *   listing an independent set of balanced reactions — unless `fixed` pins one down.
 *
 * @param input - an equation (`"KMnO4 + HCl -> KCl + MnCl2 + Cl2 + H2O"`) or `{ reactants, products }` species lists
 * @param options - fixed coefficients and normalisation, see {@link BalanceReactionOptions}
 * @returns the balanced reaction; `Term.exact` holds each coefficient as exact text
 * @throws RxthermError any code of {@link parseReaction} / {@link parseFormula} for bad text
 * @throws RxthermError `INVALID_REACTION` when a side is empty or a species appears twice (details: `species`)
 * @throws RxthermError `INVALID_ARGUMENT` when a `fixed` or `per` species is not in the reaction, or a fixed value is not positive (details: `species`, `value`)
 * @throws RxthermError `NOT_BALANCEABLE` (details: `elements` — element symbols, or `"charge"`, found on one side only; `species` — species forced to 0)
 * @throws RxthermError `WRONG_SIDE` (details: `species` — those that need a negative coefficient; `suggestion` — the balanced equation with them moved)
 * @throws RxthermError `AMBIGUOUS_BALANCE` (details: `dimension` — number of independent balances; `reactions` — equation texts of an independent set)
 * @throws RxthermError `INCONSISTENT_CONSTRAINTS` when fixed coefficients contradict the balance or each other (details: `species` — the fixed species in conflict)
 * @example
 * formatReaction(balanceReaction("C8H18 + O2 -> CO2 + H2O")) // => "2 C8H18 + 25 O2 -> 16 CO2 + 18 H2O"
 * balanceReaction("C8H18 + O2 -> CO2 + H2O", { per: "C8H18" }).reactants[1].exact // => "25/2"
 * formatReaction(balanceReaction("MnO4- + H+ + Fe2+ -> Mn2+ + Fe3+ + H2O"))
 * // => "MnO4- + 8 H+ + 5 Fe2+ -> Mn2+ + 5 Fe3+ + 4 H2O"
 * @category Reaction
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10.1 (stoichiometric numbers); G. Strang, Linear Algebra and Its Applications, 4th ed. (2006), §2.2 (null space)
 */
export function balanceReaction(input: BalanceInput, options: BalanceReactionOptions = {}): Reaction {
  options = optionsOf(options, "balanceReaction", "options", OPTION_KEYS);
  const { species: keys, formulas, nReactants } = readInput(input);
  const n = keys.length;
  const fixed = readFixed(options, keys);

  if (fixed.size === 0 && !balanceLanes.bigIntOnly) {
    const quick = quickBalance(keys, formulas, nReactants);
    if (quick) return quick;
  }

  const entries: SpeciesEntry[] = keys.map((species, j) => ({ species, formula: formulas[j] as Formula }));
  const signs = entries.map((_, j) => (j < nReactants ? -1 : 1));
  const { rows, rowNames } = integerElementMatrix(
    entries.map((e) => e.formula),
    signs,
  );
  const ech = integerGaussJordan(rows, n);
  const nullity = n - ech.pivots.length;

  if (nullity === 0) {
    const oneSided = oneSidedRows(rows, rowNames);
    throw new RxthermError(
      "NOT_BALANCEABLE",
      `balanceReaction found no coefficients that close every element and the charge${oneSided.length ? `: ${oneSided.join(", ")} on one side only` : ""}`,
      { elements: oneSided, species: [] },
    );
  }

  let solution: Rational[];
  if (nullity === 1) {
    const v = orient(integerNullSpaceFromEchelon(ech.rows, ech.pivots, n)[0] as bigint[]);
    checkSigns(v, entries, rows, rowNames, signs);
    if (fixed.size === 0) {
      solution = v.map((x) => rational(x));
    } else {
      // every fixed value must be the same multiple of v
      let scale: Rational | null = null;
      let first = "";
      const conflict: string[] = [];
      for (const [j, value] of fixed) {
        const k = rationalDiv(value, rational(v[j] as bigint));
        if (scale === null) {
          scale = k;
          first = keys[j] as string;
        } else if (k.num !== scale.num || k.den !== scale.den) conflict.push(keys[j] as string);
      }
      if (conflict.length) {
        throw new RxthermError(
          "INCONSISTENT_CONSTRAINTS",
          `balanceReaction cannot hold the fixed coefficients of ${[first, ...conflict].join(", ")} at once: the balance fixes their ratio to ${[first, ...conflict]
            .map((s) => v[keys.indexOf(s)]?.toString())
            .join(" : ")}`,
          { species: [first, ...conflict] },
        );
      }
      const s = scale as Rational;
      solution = v.map((x) => rationalMulInt(s, x));
    }
  } else {
    if (fixed.size === 0) {
      const basis = integerNullSpaceFromEchelon(ech.rows, ech.pivots, n);
      const reactions = basis.map((b) => equationText(reactionFromSigned(entries, b.map((x, j) => x * BigInt(signs[j] as number)))));
      throw new RxthermError(
        "AMBIGUOUS_BALANCE",
        `balanceReaction found ${nullity} independent balances among these species; fix coefficients with options.fixed or split the reaction: ${reactions.join("; ")}`,
        { dimension: nullity, reactions },
      );
    }
    solution = solveWithFixed(rows, ech, fixed, entries, signs, nullity);
    checkSolutionSigns(solution, entries, signs);
  }

  if (options.per !== undefined) {
    const j = keys.indexOf(options.per);
    const at = solution[j] as Rational;
    solution = solution.map((x) => rationalDiv(x, at));
  }
  const terms = entries.map((e, j) => makeTerm(e, solution[j] as Rational));
  return makeReaction(terms.slice(0, nReactants), terms.slice(nReactants));
}

// ── private helpers ──────────────────────────────────────────────────────────

/**
 * Fast path for the common case — integer counts, small numbers, a one-dimensional null space
 * with every coefficient positive — done entirely in float64 integers (exact, overflow-checked):
 * the signed element matrix is written straight into a scratch buffer and its null vector found by
 * forward elimination and back substitution. Returns null whenever anything else happens; the
 * exact BigInt path then decides and reports. The vector of a one-dimensional null space is unique
 * up to scale, so the coprime positive coefficients are the same whichever exact route finds them.
 */
function quickBalance(species: readonly string[], formulas: readonly Formula[], nReactants: number): Reaction | null {
  const n = formulas.length;
  // rows: the elements in order of first appearance, then the charge when a species carries one
  const names: string[] = [];
  let charged = false;
  for (let j = 0; j < n; j++) {
    const f = formulas[j] as Formula;
    const els = f.elements;
    for (const el in els) {
      if (!Object.prototype.hasOwnProperty.call(els, el)) continue;
      const v = els[el] as number;
      if (!Number.isInteger(v) || Math.abs(v) >= 2 ** 31) return null;
      if (names.indexOf(el) < 0) names.push(el);
    }
    const q = f.charge;
    if (q !== 0) {
      if (!Number.isInteger(q) || Math.abs(q) >= 2 ** 31) return null;
      charged = true;
    }
  }
  const rows = names.length + (charged ? 1 : 0);
  if (rows * n > MATRIX.length) MATRIX = new Float64Array(rows * n);
  const a = MATRIX;
  a.fill(0, 0, rows * n);
  for (let j = 0; j < n; j++) {
    const f = formulas[j] as Formula;
    const sign = j < nReactants ? -1 : 1;
    const els = f.elements;
    for (const el in els) {
      if (!Object.prototype.hasOwnProperty.call(els, el)) continue;
      a[names.indexOf(el) * n + j] = sign * (els[el] as number);
    }
    if (charged) a[(rows - 1) * n + j] = sign * f.charge;
  }
  let v = integerNullVectorNumber(a, rows, n);
  if (v === null) {
    // the reduced-echelon route keeps its numbers smaller (a gcd per row after every step)
    const m = numberElementMatrix(formulas, formulas.map((_, j) => (j < nReactants ? -1 : 1)));
    const ech = m && integerGaussJordanNumber(m.rows, n);
    if (!ech || n - ech.pivots.length !== 1) return null;
    v = integerNullSpaceNumber(ech.rows, ech.pivots, n)?.[0] ?? null;
    if (v === null) return null;
  }
  const sign = (v[0] as number) < 0 ? -1 : 1;
  for (let j = 0; j < n; j++) if ((v[j] as number) * sign <= 0) return null;
  const reactants: Term[] = new Array<Term>(nReactants);
  const products: Term[] = new Array<Term>(n - nReactants);
  for (let j = 0; j < n; j++) {
    const t = integerTerm(species[j] as string, formulas[j] as Formula, (v[j] as number) * sign);
    if (j < nReactants) reactants[j] = t;
    else products[j - nReactants] = t;
  }
  return makeReaction(reactants, products);
}

/** Scratch element matrix of {@link quickBalance} (grown on demand; the balancer never re-enters). */
let MATRIX = /* @__PURE__ */ new Float64Array(256);

function rationalMulInt(r: Rational, k: bigint): Rational {
  return rational(r.num * k, r.den);
}

function readInput(input: BalanceInput): { species: string[]; formulas: Formula[]; nReactants: number } {
  let species: string[];
  let formulas: Formula[];
  let nReactants: number;
  if (typeof input === "string") {
    const eq = scanEquation(input);
    species = eq.species;
    formulas = eq.formulas;
    nReactants = eq.nReactants;
  } else if (input !== null && typeof input === "object" && Array.isArray(input.reactants) && Array.isArray(input.products)) {
    requireArray(input.reactants, "balanceReaction", "input.reactants");
    requireArray(input.products, "balanceReaction", "input.products");
    const reactants = input.reactants.map((s, i) => entryOf(s, "reactants", i));
    const products = input.products.map((s, i) => entryOf(s, "products", i));
    for (const [side, list] of [["reactants", reactants], ["products", products]] as const) {
      if (list.length === 0) {
        throw new RxthermError("INVALID_REACTION", `balanceReaction requires at least one species on the ${side} side`, { reason: `empty ${side} side`, species: [] });
      }
    }
    const entries = [...reactants, ...products];
    species = entries.map((e) => e.species);
    formulas = entries.map((e) => e.formula);
    nReactants = reactants.length;
  } else {
    throw new RxthermError("INVALID_ARGUMENT", "balanceReaction requires an equation text or { reactants: string[], products: string[] }", {});
  }
  // the first species that repeats an earlier one (pairwise for a short list, a set for a long one)
  const n = species.length;
  const seen = n > 24 ? new Set<string>() : null;
  for (let j = 0; j < n; j++) {
    const s = species[j] as string;
    let repeated = false;
    if (seen !== null) {
      repeated = seen.has(s);
      seen.add(s);
    } else for (let i = 0; i < j && !repeated; i++) repeated = species[i] === s;
    if (repeated) {
      throw new RxthermError("INVALID_REACTION", `balanceReaction requires each species once, "${s}" appears twice`, {
        reason: "species repeated",
        species: [s],
      });
    }
  }
  return { species, formulas, nReactants };
}

function entryOf(species: unknown, side: string, index: number): SpeciesEntry {
  if (typeof species !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `balanceReaction requires species keys as strings, ${side}[${index}] is ${typeof species}`, { side, index });
  }
  const key = species.trim();
  let formula: Formula;
  try {
    formula = parseFormula(key);
  } catch (e) {
    if (e instanceof RxthermError) {
      throw new RxthermError(e.code, `balanceReaction: bad species ${side}[${index}] "${key}": ${e.message.replace(/^\[rxtherm\]\s*/, "")}`, {
        ...e.details,
        side,
        index,
        species: key,
      });
    }
    throw e;
  }
  return { species: key, formula };
}

function readFixed(options: BalanceReactionOptions, keys: readonly string[]): Map<number, Rational> {
  const out = new Map<number, Rational>();
  if (options.fixed === undefined && options.per === undefined) return out;
  const fixed = options.fixed ?? {};
  for (const [species, value] of Object.entries(fixed)) {
    const j = keys.indexOf(species);
    if (j < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `balanceReaction: fixed species "${species}" is not in the reaction (${keys.join(", ")})`, {
        species,
        value: describeValue(value),
      });
    }
    let r: Rational;
    try {
      r = rationalFrom(value);
    } catch {
      r = { num: 0n, den: 1n };
    }
    if (r.num <= 0n) {
      throw new RxthermError("INVALID_ARGUMENT", `balanceReaction requires positive fixed coefficients, got ${describeValue(value)} for "${species}"`, {
        species,
        value: describeValue(value),
      });
    }
    out.set(j, r);
  }
  if (options.per !== undefined) {
    const j = keys.indexOf(options.per);
    if (j < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `balanceReaction: per species "${options.per}" is not in the reaction (${keys.join(", ")})`, {
        species: options.per,
      });
    }
    if (out.size === 0) out.set(j, { num: 1n, den: 1n });
  }
  return out;
}

/** Element/charge rows whose non-zero entries all have one sign: present on one side only. */
function oneSidedRows(rows: readonly bigint[][], rowNames: readonly string[]): string[] {
  const out: string[] = [];
  rows.forEach((row, i) => {
    const pos = row.some((v) => v > 0n);
    const neg = row.some((v) => v < 0n);
    if (pos !== neg) out.push(rowNames[i] as string);
  });
  return out;
}

/** Choose the sign of a 1-D null vector that makes the most entries positive (tie: first non-zero positive). */
function orient(v: bigint[]): bigint[] {
  let pos = 0;
  let neg = 0;
  for (const x of v) {
    if (x > 0n) pos++;
    else if (x < 0n) neg++;
  }
  const firstNonZero = v.find((x) => x !== 0n) ?? 0n;
  const flip = neg > pos || (neg === pos && firstNonZero < 0n);
  return flip ? v.map((x) => -x) : v;
}

function checkSigns(
  v: readonly bigint[],
  entries: readonly SpeciesEntry[],
  rows: readonly bigint[][],
  rowNames: readonly string[],
  signs: readonly number[],
): void {
  const zero = entries.filter((_, j) => v[j] === 0n).map((e) => e.species);
  if (zero.length) {
    // elements that appear only in the zero species or only on one side
    const elements = new Set(oneSidedRows(rows, rowNames));
    entries.forEach((e, j) => {
      if (v[j] !== 0n) return;
      for (const el of Object.keys(e.formula.elements)) {
        const i = rowNames.indexOf(el);
        const row = rows[i] as bigint[];
        if (row.every((x, k) => x === 0n || v[k] === 0n)) elements.add(el);
      }
    });
    throw new RxthermError(
      "NOT_BALANCEABLE",
      `balanceReaction cannot give ${zero.join(", ")} a non-zero coefficient${elements.size ? ` (${[...elements].join(", ")} cannot close)` : ""}`,
      { elements: [...elements], species: zero },
    );
  }
  const wrong = entries.filter((_, j) => (v[j] as bigint) < 0n).map((e) => e.species);
  if (wrong.length) {
    const signed = v.map((x, j) => x * BigInt(signs[j] as number));
    const suggestion = equationText(reactionFromSigned(entries, signed));
    throw new RxthermError(
      "WRONG_SIDE",
      `balanceReaction: ${wrong.join(", ")} would need a negative coefficient; ${wrong.length > 1 ? "they belong" : "it belongs"} on the other side: ${suggestion}`,
      { species: wrong, suggestion },
    );
  }
}

function checkSolutionSigns(solution: readonly Rational[], entries: readonly SpeciesEntry[], signs: readonly number[]): void {
  const zero = entries.filter((_, j) => (solution[j] as Rational).num === 0n).map((e) => e.species);
  if (zero.length) {
    throw new RxthermError("NOT_BALANCEABLE", `balanceReaction: with the fixed coefficients, ${zero.join(", ")} would get coefficient 0`, {
      elements: [],
      species: zero,
    });
  }
  const wrong = entries.filter((_, j) => (solution[j] as Rational).num < 0n).map((e) => e.species);
  if (wrong.length) {
    const ints = solution.map((x, j) => {
      let l = 1n;
      for (const y of solution) l = (l * y.den) / gcd(l, y.den);
      return ((x.num * l) / x.den) * BigInt(signs[j] as number);
    });
    const suggestion = equationText(reactionFromSigned(entries, ints));
    throw new RxthermError(
      "WRONG_SIDE",
      `balanceReaction: with the fixed coefficients, ${wrong.join(", ")} would need a negative coefficient; move to the other side: ${suggestion}`,
      { species: wrong, suggestion },
    );
  }
}

function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** Solve rows·y = 0 with y_j = fixed_j; unique solution or an error. */
function solveWithFixed(
  rows: readonly bigint[][],
  ech: { rows: bigint[][]; pivots: number[] },
  fixed: ReadonlyMap<number, Rational>,
  entries: readonly SpeciesEntry[],
  signs: readonly number[],
  nullity: number,
): Rational[] {
  const n = entries.length;
  const m0 = rows.length;
  const fixedList = [...fixed];
  const m = m0 + fixedList.length;
  // augmented [A | b | I] with integer rows; a fixed row j: den·y_j = num
  const aug: bigint[][] = [];
  rows.forEach((row, i) => {
    const r = [...row, 0n];
    for (let k = 0; k < m; k++) r.push(k === i ? 1n : 0n);
    aug.push(r);
  });
  fixedList.forEach(([j, value], f) => {
    const r: bigint[] = new Array<bigint>(n).fill(0n);
    r[j] = value.den;
    r.push(value.num);
    for (let k = 0; k < m; k++) r.push(k === m0 + f ? 1n : 0n);
    aug.push(r);
  });
  const { rows: red, pivots } = integerGaussJordan(aug, n);
  const rank = pivots.length;
  for (let r = rank; r < m; r++) {
    const row = red[r] as bigint[];
    if (row[n] !== 0n) {
      const species: string[] = [];
      fixedList.forEach(([j], f) => {
        if (row[n + 1 + m0 + f] !== 0n) species.push(entries[j]?.species as string);
      });
      throw new RxthermError(
        "INCONSISTENT_CONSTRAINTS",
        `balanceReaction cannot hold the fixed coefficients of ${species.join(", ")} at once with the element balance`,
        { species },
      );
    }
  }
  if (rank < n) {
    const basis = integerNullSpaceFromEchelon(ech.rows, ech.pivots, n);
    const reactions = basis.map((b) => equationText(reactionFromSigned(entries, b.map((x, j) => x * BigInt(signs[j] as number)))));
    throw new RxthermError(
      "AMBIGUOUS_BALANCE",
      `balanceReaction: the fixed coefficients leave ${n - rank} of ${nullity} independent balances undetermined; fix more coefficients`,
      { dimension: nullity, undetermined: n - rank, reactions },
    );
  }
  const out: Rational[] = new Array<Rational>(n);
  pivots.forEach((pc, r) => {
    const row = red[r] as bigint[];
    out[pc] = rational(row[n] as bigint, row[pc] as bigint);
  });
  return out;
}
