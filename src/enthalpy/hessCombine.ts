import { RxthermError, describeValue, requireArray, requireRecord } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import {
  rationalAdd, rationalDiv, rationalFromDecimalString, rationalIsZero, rationalMul, rationalNeg, rationalSub,
  rationalToNumber, rationalToString, type Rational,
} from "../numeric/rational.js";
import { toReaction } from "./resolveInputs.js";
import { ExactDecimal, exactWeightedSum } from "./exactSum.js";
import { formatReaction } from "../reaction/formatReaction.js";
import { attachView, viewDescriptors } from "../view/attachView.js";
import { hessCombinationView, type HessViewParts } from "./internal/enthalpyView.js";

/**
 * One known reaction and its enthalpy, for {@link hessCombine}.
 *
 * @category Enthalpy
 */
export interface KnownReactionEnthalpy {
  /** The reaction (text or parsed). */
  reaction: Reaction | string;
  /** Its enthalpy of reaction, J per mol of reaction as written (a number, or exact decimal text). */
  enthalpy: number | string;
}

/**
 * Result of {@link hessCombine}.
 *
 * @category Enthalpy
 */
export interface HessCombination {
  /** Multiplier of each known reaction (same order), as numbers. */
  readonly multipliers: number[];
  /** The same multipliers exactly, as rational text (`"-1/2"`). */
  readonly exactMultipliers: string[];
  /** Enthalpy of the target, Σ multiplierⱼ·ΔHⱼ, J per mol of target reaction as written. */
  readonly enthalpy: number;
  /** The same sum as exact decimal text (at most 34 significant digits). */
  readonly exact: string;
  /** True when the known reactions are linearly dependent, so other multipliers would also work. */
  readonly unique: boolean;
}

/**
 * Combine known reactions with known enthalpies into a target reaction (a Hess cycle), exactly.
 *
 * Each reaction is a vector of net signed coefficients over species keys (products +, reactants −;
 * keys compared as written, so `CO2(g)` and `CO2` differ). The multipliers m solve Σⱼ mⱼ·νⱼ = ν_target
 * by Gauss–Jordan elimination over exact rationals; the target's enthalpy is then Σⱼ mⱼ·ΔHⱼ by
 * Hess's law (constant heat summation), summed exactly in decimal. When the known reactions are
 * linearly dependent the free multipliers are set to 0 and `unique` is false (the enthalpy is the
 * same for every solution when the known enthalpies are consistent).
 *
 * @param target - the reaction whose enthalpy is wanted
 * @param known - reactions with their enthalpies (J per mol of reaction as written)
 * @returns the multipliers (numbers and exact text), the target's enthalpy in J/mol, and whether the combination is unique
 * @throws RxthermError `NOT_IN_SPAN` when no combination gives the target (details: `unreachable` — the species
 *   whose net coefficient no combination can match — and `residual`, species → coefficient left over
 *   by the best exact combination)
 * @throws RxthermError `INVALID_ARGUMENT` when `known` is empty or an enthalpy is not a finite number or decimal text
 * @category Enthalpy
 * @example
 * hessCombine("C(cr) + 0.5 O2(g) -> CO(g)", [
 *   { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: -393510 },
 *   { reaction: "CO(g) + 0.5 O2(g) -> CO2(g)", enthalpy: -282980 },
 * ]) // => { multipliers: [1, -1], enthalpy: -110530, ... }
 * @see G. H. Hess, Pogg. Ann. 50 (1840) 385 (law of constant heat summation).
 */
export function hessCombine(target: Reaction | string, known: readonly KnownReactionEnthalpy[]): HessCombination {
  if (!Array.isArray(known) || known.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", "hessCombine requires at least one known reaction", { known });
  }
  requireArray(known, "hessCombine", "known");
  known.forEach((k, j) => requireRecord(k, "hessCombine", `known[${j}]`));
  const enthalpies = known.map((k, j) => enthalpyText(k.enthalpy, j));
  const targetReaction = toReaction("hessCombine", target);
  const knownReactions = known.map((k) => toReaction("hessCombine", k.reaction));
  const targetVector = netVector(targetReaction);
  const vectors = knownReactions.map(netVector);
  const keys: string[] = [];
  const seen = new Set<string>();
  for (const v of [targetVector, ...vectors]) for (const key of v.keys()) if (!seen.has(key)) { seen.add(key); keys.push(key); }
  const zero: Rational = { num: 0n, den: 1n };
  const cols = known.length;
  // augmented matrix: rows = species, columns = known reactions + target
  const m: Rational[][] = keys.map((key) => [...vectors.map((v) => v.get(key) ?? zero), targetVector.get(key) ?? zero]);
  const pivots = gaussJordan(m, cols);
  const x: Rational[] = new Array(cols).fill(zero);
  pivots.forEach((col, row) => { x[col] = m[row]![cols]!; });
  // residual of the target after the best combination
  const residual: Record<string, number> = {};
  const unreachable: string[] = [];
  keys.forEach((key) => {
    let sum = zero;
    vectors.forEach((v, j) => { const c = v.get(key); if (c) sum = rationalAdd(sum, rationalMul(x[j]!, c)); });
    const left = rationalSub(targetVector.get(key) ?? zero, sum);
    if (!rationalIsZero(left)) {
      residual[key] = rationalToNumber(left);
      unreachable.push(key);
    }
  });
  if (unreachable.length > 0) {
    const absent = unreachable.filter((key) => vectors.every((v) => !v.has(key)));
    throw new RxthermError(
      "NOT_IN_SPAN",
      `hessCombine cannot build the target from the known reactions: ${absent.length > 0 ? `${absent.join(", ")} appear in no known reaction` : `no combination matches ${unreachable.join(", ")}`}`,
      { unreachable, residual, absent },
    );
  }
  const exact = exactWeightedSum(x, enthalpies);
  const enthalpy = exact.toNumber();
  const result: HessCombination = {
    multipliers: x.map((r) => rationalToNumber(r)),
    exactMultipliers: x.map((r) => rationalToString(r)),
    enthalpy: enthalpy === 0 ? 0 : enthalpy,
    exact: exact.toString(),
    unique: pivots.length === cols,
  };
  // the view needs the reactions' text, which the result does not hold: its display methods close over them
  const parts: HessViewParts = {
    target: formatReaction(targetReaction),
    known: knownReactions.map((r) => formatReaction(r)),
    enthalpies: enthalpies.map(Number),
  };
  return attachView(result, viewDescriptors((r: HessCombination) => hessCombinationView(r, parts)));
}

function enthalpyText(h: number | string, index: number): string {
  if (typeof h === "number" && Number.isFinite(h)) return String(h);
  if (typeof h === "string") {
    try {
      const v = new ExactDecimal(h.trim());
      if (v.isFinite()) return v.toString();
    } catch { /* fall through */ }
  }
  throw new RxthermError("INVALID_ARGUMENT", `hessCombine requires each known enthalpy to be a finite number or decimal text, got ${describeValue(h)} at index ${index}`, { index, enthalpy: h });
}

function netVector(r: Reaction): Map<string, Rational> {
  const v = new Map<string, Rational>();
  const add = (key: string, c: Rational): void => {
    const prev = v.get(key);
    const next = prev ? rationalAdd(prev, c) : c;
    if (rationalIsZero(next)) v.delete(key); else v.set(key, next);
  };
  for (const t of r.reactants) add(t.species, rationalNeg(exactCoefficient(t)));
  for (const t of r.products) add(t.species, exactCoefficient(t));
  return v;
}

function exactCoefficient(t: Reaction["reactants"][number]): Rational {
  return rationalFromDecimalString(typeof t.exact === "string" && t.exact !== "" ? t.exact : String(t.coefficient));
}

/** Reduced row echelon form in place over the first `cols` columns; returns the pivot column of each pivot row. */
function gaussJordan(m: Rational[][], cols: number): number[] {
  const pivots: number[] = [];
  let row = 0;
  for (let col = 0; col < cols && row < m.length; col++) {
    let p = row;
    while (p < m.length && rationalIsZero(m[p]![col]!)) p++;
    if (p === m.length) continue;
    [m[row], m[p]] = [m[p]!, m[row]!];
    const pivotRow = m[row]!;
    const pv = pivotRow[col]!;
    for (let c = col; c <= cols; c++) pivotRow[c] = rationalDiv(pivotRow[c]!, pv);
    for (let r = 0; r < m.length; r++) {
      if (r === row) continue;
      const f = m[r]![col]!;
      if (rationalIsZero(f)) continue;
      const target = m[r]!;
      for (let c = col; c <= cols; c++) target[c] = rationalSub(target[c]!, rationalMul(f, pivotRow[c]!));
    }
    pivots.push(col);
    row++;
  }
  return pivots;
}
