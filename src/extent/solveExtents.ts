import { RxthermError } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import { matrixRank, nullSpace, solveLinearSystem } from "../numeric/linearAlgebra.js";
import {
  type Rational,
  rationalAdd,
  rationalDiv,
  rationalFromNumber,
  rationalMul,
  rationalNeg,
  rationalSub,
  rationalToNumber,
} from "../numeric/rational.js";
import { type StoichSystem, buildSystem, resolveSpecies } from "./_system.js";
import type { ExtentSpec, Flows } from "./types.js";

/**
 * Options of {@link solveExtents}.
 *
 * @category Stoichiometry
 */
export interface SolveExtentsOptions {
  /**
   * `"exact"` solves the linear system in exact rationals (each input number read from its
   * shortest decimal text, so 0.1 is 1/10) and rounds only the final results; `"float"` solves
   * in float64 with partial pivoting and falls back to the exact path whenever a pivot is tiny
   * or an outlet flow comes out negative, so errors are always decided exactly.
   * @defaultValue "exact"
   */
  arithmetic?: "exact" | "float";
}

/**
 * Input of {@link solveExtents}.
 *
 * @category Stoichiometry
 */
export interface SolveExtentsInput {
  /** Feed: species key → mol or mol/s (≥ 0). Species in no reaction pass through as inerts. */
  feed: Flows;
  /** Balanced reactions, as equation text or {@link Reaction} objects. */
  reactions: readonly (Reaction | string)[];
  /** One specification per reaction (see {@link ExtentSpec}). */
  specs: readonly ExtentSpec[];
}

/**
 * Result of {@link solveExtents}. Flows and extents are in the feed's unit (mol or mol/s).
 *
 * @category Stoichiometry
 */
export interface SolveExtentsResult {
  /** Extent of each reaction, in mol (or mol/s), in the order given. */
  extents: number[];
  /** Outlet flow of every species (feed species first, then species formed), mol or mol/s. */
  outlet: Flows;
  /** Net change out − in of every species that takes part in a reaction, mol or mol/s. */
  change: Flows;
  /**
   * Overall fractional conversion (in − out)/in of every fed species that is a reactant of at
   * least one reaction (may be negative when another reaction makes more of it than is used).
   */
  conversion: Record<string, number>;
  /** Per reaction i: fraction of each fed reactant's feed consumed by reaction i alone. */
  conversionByReaction: Record<string, number>[];
  /**
   * Yield `yield[product][basis]`: moles of product formed ÷ moles of product that would form
   * if all the basis reactant fed went to it (see {@link solveExtents}).
   */
  yield: Record<string, Record<string, number>>;
  /**
   * Selectivity `selectivity[desired][undesired]`: moles of desired product formed per mole of
   * undesired product formed; given for pairs of products not made in a fixed ratio, when the
   * undesired product is formed (> 0).
   */
  selectivity: Record<string, Record<string, number>>;
}

/**
 * Extents of reaction, outlet flows, conversions, yields and selectivities of one or many
 * reactions from a feed and one specification per reaction.
 *
 * Each species leaves at nᵢ = nᵢ,feed + Σⱼ νᵢⱼ ξⱼ (ν > 0 for products, < 0 for reactants).
 * Every accepted specification is linear in the extents ξ, so the R specifications of R
 * reactions form a square linear system A ξ = b, solved exactly in rationals (default):
 *
 * - `{ of, conversion }`: overall fractional conversion X of a fed reactant, n_out = n_feed (1 − X);
 * - `{ of, conversion, reaction: i }`: the fraction of the reactant's feed consumed by reaction i alone, −ν ξᵢ = X n_feed;
 * - `{ of, outlet }`: a known outlet flow of any species taking part in a reaction;
 * - `{ reaction: i, extent }`: a known extent of reaction i (0-based);
 * - `{ of: P, yield: Y, basis: A }`: yield = (moles of P formed) / (moles of P that would form if all
 *   the A fed went to P, by the stoichiometric ratio ν_P/|ν_A| of the reactions that make P from A —
 *   these reactions must agree on that ratio);
 * - `{ of: D, selectivity: S, over: U }`: moles of D formed per mole of U formed, formed_D = S · formed_U.
 *
 * Species in reactions but not in the feed start at 0; feed species in no reaction pass
 * through. A reaction key matches a feed key when equal or when one of them has no phase
 * suffix (`CH4` matches `CH4(g)`). With dependent reactions the extents can still be fixed by
 * per-reaction specifications (extent, per-reaction conversion); specifications on species
 * flows alone then give a singular system, and the error says the reactions are dependent.
 * No outlet flow is ever clamped: a negative one is an error.
 *
 * @param input - feed (mol or mol/s), reactions, one spec per reaction
 * @param options - arithmetic (see {@link SolveExtentsOptions})
 * @returns extents (mol or mol/s), outlet flows, conversions, yields and selectivities
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for a non-finite number, a conversion outside
 *   [0, 1], a negative yield or selectivity, a spec on a species in no reaction, a conversion of a
 *   species not fed or not consumed, a bad reaction index or an unknown spec shape (details: `spec`, `species`)
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative feed or specified outlet, or a
 *   solution with a negative outlet (details: `species`, `outlet`, `extents`, and for one
 *   reaction `feasibleExtentRange`)
 * @throws {@link RxthermError} `UNBALANCED_REACTION` (details: `reaction`, `residuals`)
 * @throws {@link RxthermError} `SPEC_COUNT_MISMATCH` when specs ≠ reactions (details: `needed`, `given`, `missing`, `extra`, `rank`)
 * @throws {@link RxthermError} `SINGULAR_SPECS` / `CONFLICTING_SPECS` (details: `specs` — the indices involved, `descriptions`)
 * @throws formula and equation parse errors (their own codes) for keys or equations that do not parse
 * @example
 * const r = solveExtents({
 *   feed: { CH4: 1, O2: 2.4, N2: 9 },
 *   reactions: ["CH4 + 2 O2 -> CO2 + 2 H2O"],
 *   specs: [{ of: "CH4", conversion: 0.9 }],
 * });
 * r.extents // => [0.9]
 * r.outlet  // => { CH4: 0.1, O2: 0.6, N2: 9, CO2: 0.9, H2O: 1.8 }
 * @category Stoichiometry
 * @see IUPAC Compendium of Chemical Terminology (the Gold Book), entry "extent of reaction, ξ"; conversion, yield and selectivity as defined above (common practice — definitions of yield and selectivity vary between sources, so check the one your plant uses)
 */
export function solveExtents(input: SolveExtentsInput, options: SolveExtentsOptions = {}): SolveExtentsResult {
  const fn = "solveExtents";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { feed, reactions, specs }`, {});
  }
  const arithmetic = options.arithmetic ?? "exact";
  if (arithmetic !== "exact" && arithmetic !== "float") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires options.arithmetic "exact" or "float", got ${String(arithmetic)}`, { arithmetic });
  }
  const sys = buildSystem(input.feed, input.reactions, fn);
  const specs = input.specs;
  if (!Array.isArray(specs)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires specs to be an array`, {});
  }
  const R = sys.reactions.length;
  if (specs.length !== R) {
    const rank = matrixRank(sys.nu);
    const missing = Math.max(0, R - specs.length);
    const extra = Math.max(0, specs.length - R);
    const dep = rank < R ? `; note the ${R} reactions are dependent (only ${rank} independent)` : "";
    throw new RxthermError(
      "SPEC_COUNT_MISMATCH",
      `${fn} needs one spec per reaction: ${R} reaction(s), ${specs.length} spec(s) given — ${missing > 0 ? `${missing} missing` : `${extra} extra`}${dep}`,
      { needed: R, given: specs.length, missing, extra, rank },
    );
  }
  const rows: SpecRow[] = [];
  for (let k = 0; k < specs.length; k++) rows.push(specRow(sys, specs[k] as ExtentSpec, k, fn));
  if (arithmetic === "float") {
    const fast = solveFloat(sys, rows);
    if (fast !== null) return fast;
  }
  return solveExactPath(sys, rows, fn);
}

/** One linear equation Σⱼ a[j] ξⱼ = b built from a spec: in float now, exactly on demand. */
interface SpecRow {
  aF: number[];
  bF: number;
  text: string;
  kind: "conversion" | "conversionInReaction" | "outlet" | "extent" | "yield" | "selectivity";
  /** Species index (of), reaction index or second species index, the spec's number, yield ratio. */
  i: number;
  j: number;
  value: number;
  ratio: Rational | null;
}

function specNumber(s: Record<string, unknown>, field: string, k: number, fn: string): number {
  const v = s[field];
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} needs a finite number for ${field}, got ${String(v)}`, { spec: k, field, value: v });
  }
  return v;
}

function specReaction(R: number, v: unknown, k: number, fn: string): number {
  if (typeof v !== "number" || !Number.isInteger(v) || v < 0 || v >= R) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} names reaction ${String(v)}, but reactions are numbered 0..${R - 1}`, {
      spec: k,
      reaction: v,
    });
  }
  return v;
}

function specSpecies(sys: StoichSystem, s: Record<string, unknown>, field: string, k: number, fn: string): number {
  const key = s[field];
  if (typeof key !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} needs a species key in ${field}`, { spec: k, field });
  }
  const i = resolveSpecies(sys, key, fn);
  if (i === undefined || !sys.reacting[i]) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn}: spec ${k} is about ${key}, which takes part in no reaction${i === undefined ? " and is not in the feed" : ""}`,
      { spec: k, species: key },
    );
  }
  return i;
}

function columnF(sys: StoichSystem, i: number): number[] {
  const R = sys.nuF.length;
  const out = new Array<number>(R);
  for (let j = 0; j < R; j++) out[j] = (sys.nuF[j] as number[])[i] as number;
  return out;
}

function columnQ(sys: StoichSystem, i: number): Rational[] {
  const R = sys.nu.length;
  const out = new Array<Rational>(R);
  for (let j = 0; j < R; j++) out[j] = (sys.nu[j] as Rational[])[i] as Rational;
  return out;
}

function specRow(sys: StoichSystem, spec: ExtentSpec, k: number, fn: string): SpecRow {
  const R = sys.reactions.length;
  if (spec === null || typeof spec !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} is not an object`, { spec: k });
  }
  const s = spec as Record<string, unknown>;
  if ("conversion" in s) {
    const X = specNumber(s, "conversion", k, fn);
    const i = specSpecies(sys, s, "of", k, fn);
    const key = sys.species[i] as string;
    if (X < 0 || X > 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives conversion ${X} of ${key}; conversion must lie in [0, 1]`, {
        spec: k,
        species: key,
        conversion: X,
      });
    }
    const fed = sys.feed[i] as number;
    if (fed === 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a conversion of ${key}, which is not fed`, { spec: k, species: key });
    }
    if (s.reaction !== undefined) {
      const j = specReaction(R, s.reaction, k, fn);
      const nu = (sys.nuF[j] as number[])[i] as number;
      if (nu >= 0) {
        throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a conversion of ${key} in reaction ${j}, where it is not a reactant`, {
          spec: k,
          species: key,
          reaction: j,
        });
      }
      const aF = new Array<number>(R).fill(0);
      aF[j] = -nu;
      return { aF, bF: X * fed, text: `conversion of ${key} in reaction ${j} = ${X}`, kind: "conversionInReaction", i, j, value: X, ratio: null };
    }
    if (!sys.consumed[i]) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a conversion of ${key}, which no reaction consumes`, { spec: k, species: key });
    }
    // Σ ν ξ = −X n_feed
    return { aF: columnF(sys, i), bF: -X * fed, text: `conversion of ${key} = ${X}`, kind: "conversion", i, j: -1, value: X, ratio: null };
  }
  if ("outlet" in s) {
    const out = specNumber(s, "outlet", k, fn);
    const i = specSpecies(sys, s, "of", k, fn);
    const key = sys.species[i] as string;
    if (out < 0) {
      throw new RxthermError("NEGATIVE_FLOW", `${fn}: spec ${k} gives a negative outlet flow ${out} of ${key}`, { spec: k, species: key, outlet: out });
    }
    return { aF: columnF(sys, i), bF: out - (sys.feed[i] as number), text: `outlet of ${key} = ${out}`, kind: "outlet", i, j: -1, value: out, ratio: null };
  }
  if ("extent" in s) {
    const e = specNumber(s, "extent", k, fn);
    const j = specReaction(R, s.reaction, k, fn);
    const aF = new Array<number>(R).fill(0);
    aF[j] = 1;
    return { aF, bF: e, text: `extent of reaction ${j} = ${e}`, kind: "extent", i: -1, j, value: e, ratio: null };
  }
  if ("yield" in s) {
    const Y = specNumber(s, "yield", k, fn);
    const p = specSpecies(sys, s, "of", k, fn);
    const b = specSpecies(sys, s, "basis", k, fn);
    const pk = sys.species[p] as string;
    const bk = sys.species[b] as string;
    if (Y < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a negative yield ${Y}`, { spec: k, species: pk, yield: Y });
    }
    const ratio = (sys.yieldRatio[p] as (Rational | null | "inconsistent")[])[b] ?? null;
    if (ratio === null || ratio === "inconsistent") {
      throw new RxthermError(
        "INVALID_ARGUMENT",
        ratio === null
          ? `${fn}: spec ${k} asks the yield of ${pk} on ${bk}, but no reaction makes ${pk} from ${bk}`
          : `${fn}: spec ${k} asks the yield of ${pk} on ${bk}, but the reactions making ${pk} from ${bk} disagree on the ratio`,
        { spec: k, species: pk, basis: bk },
      );
    }
    if (sys.feed[b] === 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} takes the yield on ${bk}, which is not fed`, { spec: k, basis: bk });
    }
    const bF = Y * (sys.feed[b] as number) * rationalToNumber(ratio);
    return { aF: columnF(sys, p), bF, text: `yield of ${pk} on ${bk} = ${Y}`, kind: "yield", i: p, j: b, value: Y, ratio };
  }
  if ("selectivity" in s) {
    const S = specNumber(s, "selectivity", k, fn);
    const d = specSpecies(sys, s, "of", k, fn);
    const u = specSpecies(sys, s, "over", k, fn);
    const dk = sys.species[d] as string;
    const uk = sys.species[u] as string;
    if (S < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a negative selectivity ${S}`, { spec: k, species: dk, selectivity: S });
    }
    const aF = new Array<number>(R);
    for (let j = 0; j < R; j++) aF[j] = ((sys.nuF[j] as number[])[d] as number) - S * ((sys.nuF[j] as number[])[u] as number);
    return { aF, bF: 0, text: `selectivity of ${dk} over ${uk} = ${S}`, kind: "selectivity", i: d, j: u, value: S, ratio: null };
  }
  throw new RxthermError(
    "INVALID_ARGUMENT",
    `${fn}: spec ${k} has none of conversion, outlet, extent, yield, selectivity`,
    { spec: k, keys: Object.keys(s) },
  );
}

/** The exact form of a spec row. */
function exactRow(sys: StoichSystem, r: SpecRow): { a: Rational[]; b: Rational } {
  const R = sys.reactions.length;
  switch (r.kind) {
    case "conversion":
      return { a: columnQ(sys, r.i), b: rationalNeg(rationalMul(rationalFromNumber(r.value), sys.feedQ[r.i] as Rational)) };
    case "conversionInReaction": {
      const a = new Array<Rational>(R).fill(ZERO);
      a[r.j] = rationalNeg((sys.nu[r.j] as Rational[])[r.i] as Rational);
      return { a, b: rationalMul(rationalFromNumber(r.value), sys.feedQ[r.i] as Rational) };
    }
    case "outlet":
      return { a: columnQ(sys, r.i), b: rationalSub(rationalFromNumber(r.value), sys.feedQ[r.i] as Rational) };
    case "extent": {
      const a = new Array<Rational>(R).fill(ZERO);
      a[r.j] = ONE;
      return { a, b: rationalFromNumber(r.value) };
    }
    case "yield":
      return { a: columnQ(sys, r.i), b: rationalMul(rationalMul(rationalFromNumber(r.value), sys.feedQ[r.j] as Rational), r.ratio as Rational) };
    case "selectivity": {
      const Sq = rationalFromNumber(r.value);
      const a = new Array<Rational>(R);
      for (let j = 0; j < R; j++) a[j] = rationalSub((sys.nu[j] as Rational[])[r.i] as Rational, rationalMul(Sq, (sys.nu[j] as Rational[])[r.j] as Rational));
      return { a, b: ZERO };
    }
  }
}

function solveExactPath(sys: StoichSystem, rows: SpecRow[], fn: string): SolveExtentsResult {
  const R = sys.reactions.length;
  const A: Rational[][] = [];
  const b: Rational[] = [];
  for (const r of rows) {
    const e = exactRow(sys, r);
    A.push(e.a);
    b.push(e.b);
  }
  const sol = solveLinearSystem(A, b);
  if (sol.kind !== "unique") throwSingular(sys, rows, A, b, sol.rank, fn);
  const xi = sol.solution;
  const S = sys.species.length;
  const feedQ = sys.feedQ;
  const change: Rational[] = new Array<Rational>(S);
  const outlet: number[] = new Array<number>(S);
  const extents = new Array<number>(R);
  for (let j = 0; j < R; j++) extents[j] = rationalToNumber(xi[j] as Rational);
  for (let s = 0; s < S; s++) {
    let d: Rational = ZERO;
    for (let j = 0; j < R; j++) {
      const c = (sys.nu[j] as Rational[])[s] as Rational;
      if (c.num !== 0n) d = rationalAdd(d, rationalMul(c, xi[j] as Rational));
    }
    const v = rationalAdd(feedQ[s] as Rational, d);
    if (v.num < 0n) throwNegative(sys, s, rationalToNumber(v), extents, fn);
    change[s] = d;
    outlet[s] = rationalToNumber(v);
  }
  return assemble(sys, extents, outlet, change, xi);
}

/**
 * Name the specs behind a singular system: every y with yᵀA = 0 (a basis of the left null space)
 * is a combination of spec rows that cancels; it is a conflict when yᵀb ≠ 0.
 */
function throwSingular(sys: StoichSystem, rows: SpecRow[], A: Rational[][], b: Rational[], rank: number, fn: string): never {
  const R = sys.reactions.length;
  const transposed: Rational[][] = [];
  for (let j = 0; j < R; j++) transposed.push(A.map((row) => row[j] as Rational));
  const combos = nullSpace(transposed).map((y) => {
    let rhs = ZERO;
    y.forEach((c, i) => {
      if (!rationalIsZero(c)) rhs = rationalAdd(rhs, rationalMul(c, b[i] as Rational));
    });
    return { rows: y.flatMap((c, i) => (rationalIsZero(c) ? [] : [i])), conflicting: !rationalIsZero(rhs) };
  });
  const conflicting = combos.filter((c) => c.conflicting);
  const chosen = conflicting.length > 0 ? conflicting : combos;
  const involved = [...new Set(chosen.flatMap((c) => c.rows))].sort((x, y) => x - y);
  const descriptions = involved.map((i) => `spec ${i} (${(rows[i] as SpecRow).text})`);
  const rxRank = matrixRank(sys.nu);
  const dep = rxRank < R ? `; the reactions are dependent (${rxRank} independent of ${R}), so species specs cannot separate their extents — give per-reaction specs` : "";
  if (conflicting.length > 0) {
    throw new RxthermError("CONFLICTING_SPECS", `${fn}: ${descriptions.join(", ")} contradict each other${dep}`, {
      specs: involved,
      descriptions,
      rank,
    });
  }
  throw new RxthermError("SINGULAR_SPECS", `${fn}: ${descriptions.join(", ")} do not fix the extents independently (rank ${rank} of ${R})${dep}`, {
    specs: involved,
    descriptions,
    rank,
  });
}

function throwNegative(sys: StoichSystem, s: number, value: number, extents: number[], fn: string): never {
  const key = sys.species[s] as string;
  const details: Record<string, unknown> = { species: key, outlet: value, extents };
  let hint = "";
  if (sys.reactions.length === 1) {
    let hi = Infinity;
    let lo = -Infinity;
    const row = sys.nu[0] as Rational[];
    row.forEach((c, i) => {
      const f = sys.feedQ[i] as Rational;
      if (c.num < 0n) hi = Math.min(hi, rationalToNumber(rationalDiv(f, rationalNeg(c))));
      else if (c.num > 0n) lo = Math.max(lo, -rationalToNumber(rationalDiv(f, c)));
    });
    if (lo === 0) lo = 0; // never -0
    details.feasibleExtentRange = [lo, hi];
    hint = `; feasible extents lie in [${lo}, ${hi}]`;
  }
  throw new RxthermError("NEGATIVE_FLOW", `${fn}: the specs give a negative outlet flow ${value} of ${key} (extents ${extents.join(", ")})${hint}`, details);
}

/** a/b as a number; exact when both are rationals. */
function ratioOf(a: Rational | number, b: Rational | number): number {
  if (typeof a === "number" || typeof b === "number") {
    const an = typeof a === "number" ? a : rationalToNumber(a);
    const bn = typeof b === "number" ? b : rationalToNumber(b);
    return an / bn;
  }
  return rationalToNumber(rationalDiv(a, b));
}

function noNegZero(v: number): number {
  return v === 0 ? 0 : v;
}

/**
 * Build the result. `change[s]` is out − in of each species and `xi` the extents, both exact
 * (rationals) or float (numbers, with xi null and the extents in `extents`).
 */
function assemble(sys: StoichSystem, extents: number[], outlet: number[], change: (Rational | number)[], xi: Rational[] | null): SolveExtentsResult {
  const S = sys.species.length;
  const R = sys.reactions.length;
  const exact = xi !== null;
  const feedQ: Rational[] | null = exact ? sys.feedQ : null;
  const outletFlows: Flows = {};
  const changeFlows: Flows = {};
  const conversion: Record<string, number> = {};
  const conversionByReaction: Record<string, number>[] = [];
  for (let j = 0; j < R; j++) conversionByReaction.push({});
  for (let s = 0; s < S; s++) {
    const key = sys.species[s] as string;
    outletFlows[key] = noNegZero(outlet[s] as number);
    if (!sys.reacting[s]) continue;
    const ch = change[s] as Rational | number;
    changeFlows[key] = noNegZero(typeof ch === "number" ? ch : rationalToNumber(ch));
    if (sys.consumed[s] && sys.feed[s] !== 0) {
      const fed: Rational | number = feedQ !== null ? (feedQ[s] as Rational) : (sys.feed[s] as number);
      conversion[key] = noNegZero(-ratioOf(ch, fed));
      for (let j = 0; j < R; j++) {
        if (((sys.nuF[j] as number[])[s] as number) < 0) {
          const used: Rational | number = exact
            ? rationalMul((sys.nu[j] as Rational[])[s] as Rational, xi[j] as Rational)
            : ((sys.nuF[j] as number[])[s] as number) * (extents[j] as number);
          (conversionByReaction[j] as Record<string, number>)[key] = noNegZero(-ratioOf(used, fed));
        }
      }
    }
  }
  const yields: Record<string, Record<string, number>> = {};
  for (let p = 0; p < S; p++) {
    if (!sys.produced[p]) continue;
    const ratios = sys.yieldRatio[p] as (Rational | null | "inconsistent")[];
    for (let a = 0; a < S; a++) {
      const r = ratios[a] ?? null;
      if (r === null || r === "inconsistent" || sys.feed[a] === 0) continue;
      const ideal: Rational | number = feedQ !== null ? rationalMul(feedQ[a] as Rational, r) : (sys.feed[a] as number) * rationalToNumber(r);
      (yields[sys.species[p] as string] ??= {})[sys.species[a] as string] = noNegZero(ratioOf(change[p] as Rational | number, ideal));
    }
  }
  const selectivity: Record<string, Record<string, number>> = {};
  if (R > 1) {
    for (let d = 0; d < S; d++) {
      if (!sys.produced[d]) continue;
      for (let u = 0; u < S; u++) {
        if (u === d || !sys.produced[u] || (sys.proportional[d] as boolean[])[u]) continue;
        const cu = change[u] as Rational | number;
        if ((typeof cu === "number" ? cu : Number(cu.num)) <= 0) continue;
        (selectivity[sys.species[d] as string] ??= {})[sys.species[u] as string] = noNegZero(ratioOf(change[d] as Rational | number, cu));
      }
    }
  }
  const ext = new Array<number>(R);
  for (let j = 0; j < R; j++) ext[j] = noNegZero(extents[j] as number);
  return { extents: ext, outlet: outletFlows, change: changeFlows, conversion, conversionByReaction, yield: yields, selectivity };
}

/** Float64 Gauss elimination with partial pivoting; null to defer to the exact path. */
function solveFloat(sys: StoichSystem, rows: SpecRow[]): SolveExtentsResult | null {
  const R = rows.length;
  const M: number[][] = [];
  let scale = 0;
  for (const r of rows) {
    const row = r.aF.slice();
    row.push(r.bF);
    for (const v of row) scale = Math.max(scale, Math.abs(v));
    M.push(row);
  }
  const tiny = 1e-12 * (scale || 1);
  for (let c = 0; c < R; c++) {
    let p = c;
    for (let i = c + 1; i < R; i++) if (Math.abs((M[i] as number[])[c] as number) > Math.abs((M[p] as number[])[c] as number)) p = i;
    const pr = M[p] as number[];
    const pv = pr[c] as number;
    if (Math.abs(pv) <= tiny) return null;
    M[p] = M[c] as number[];
    M[c] = pr;
    for (let i = c + 1; i < R; i++) {
      const ri = M[i] as number[];
      const f = (ri[c] as number) / pv;
      if (f === 0) continue;
      for (let k = c; k <= R; k++) ri[k] = (ri[k] as number) - f * (pr[k] as number);
    }
  }
  const x = new Array<number>(R).fill(0);
  for (let i = R - 1; i >= 0; i--) {
    const ri = M[i] as number[];
    let v = ri[R] as number;
    for (let k = i + 1; k < R; k++) v -= (ri[k] as number) * (x[k] as number);
    x[i] = v / (ri[i] as number);
  }
  const S = sys.species.length;
  const out: number[] = new Array<number>(S);
  const change: number[] = new Array<number>(S);
  for (let s = 0; s < S; s++) {
    let d = 0;
    for (let j = 0; j < R; j++) d += ((sys.nuF[j] as number[])[s] as number) * (x[j] as number);
    const v = (sys.feed[s] as number) + d;
    if (v < 0) return null; // decide negatives exactly
    out[s] = v;
    change[s] = d;
  }
  return assemble(sys, x, out, change, null);
}

const ZERO: Rational = rationalFromNumber(0);
const ONE: Rational = rationalFromNumber(1);
