import { RxthermError, describeValue, finiteResult, knownKeys, optionsOf, rejectUnknownKeys } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import { matrixRank, nullSpace } from "../numeric/linearAlgebra.js";
import {
  type Rational,
  rationalAdd,
  rationalDiv,
  rationalFromNumber,
  rational,
  lcmBigInt,
  rationalIsZero,
  rationalMul,
  rationalNeg,
  rationalSub,
  rationalToNumber,
  rationalToString,
} from "../numeric/rational.js";
import { integerGaussJordan, integerGaussJordanNumber } from "../numeric/integerElimination.js";
import {
  type SafeQ,
  S0,
  S1,
  SafeOverflow,
  gcdNumber,
  sq,
  sqAdd,
  sqDiv,
  sqFromNumber,
  sqFromRational,
  sqMul,
  sqNeg,
  sqSub,
  sqToNumber,
} from "../numeric/safeRational.js";
import { type StoichSystem, type YieldPair, buildSystem, resolveSpecies } from "./internal/extentSystem.js";
import type { ExtentSpec, Flows } from "./types.js";
import { attachView } from "../view/attachView.js";
import { EXTENTS_VIEW } from "./internal/extentView.js";
import { exactLanes } from "./internal/exactLanes.js";
import {
  EXPANSION_LIMIT,
  addExpansions,
  compressExpansion,
  decimalOfNumber,
  expansionOf,
  expansionQuotient,
  expansionSign,
  linearCombination,
  linearCombinationAndMore,
  multiplyExpansions,
  shortDecimalPlaces,
  negateExpansion,
  scaleByPowerOfTen,
  scaleExpansion,
} from "../numeric/expansion.js";

/** The keys solveExtents reads (a misspelt one is an error, not a silent default). */
const INPUT_KEYS = /* @__PURE__ */ knownKeys<SolveExtentsInput>()("feed", "reactions", "specs");
const OPTION_KEYS = /* @__PURE__ */ knownKeys<SolveExtentsOptions>()("arithmetic");

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
   * or an outlet flow comes out negative beyond round-off (see {@link solveExtents}), so errors
   * are always decided exactly.
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
  /**
   * Species whose computed outlet came out negative by no more than round-off — at most
   * 1e-12 × (feed + Σⱼ |νⱼ ξⱼ|) of that species — and was therefore set to exactly 0 (their
   * `change` is then −feed). Empty in the usual case. See {@link solveExtents}.
   */
  roundOffZeros: string[];
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
 * Round-off rule: inputs that are themselves results of float arithmetic (an extent computed as
 * 0.3 × 0.7 reads exactly as 0.21000000000000002) can overdraw a species by a few parts in 10¹⁷.
 * An outlet flow that comes out negative by at most 1e-12 × the species' throughput
 * (feed + Σⱼ |νⱼ ξⱼ|) is such a round-off zero: it is set to exactly 0 and the species is listed
 * in `roundOffZeros`. Anything more negative is never clamped: it is a `NEGATIVE_FLOW` error.
 * Both arithmetics apply the same rule. The exact path runs in float64 safe integers while every
 * numerator and denominator fits (exact there); when a spec or feed value carries float round-off
 * (17 significant digits) it holds the long numbers exactly as sums of doubles over one common
 * denominator; and in BigInt rationals otherwise — the same exact values, rounded once, either way.
 *
 * @param input - feed (mol or mol/s), reactions, one spec per reaction
 * @param options - arithmetic (see {@link SolveExtentsOptions})
 * @returns extents (mol or mol/s), outlet flows, conversions, yields and selectivities
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for a non-finite number, a conversion outside
 *   [0, 1], a negative yield or selectivity, a spec on a species in no reaction, a conversion of a
 *   species not fed or not consumed, a bad reaction index or an unknown spec shape (details: `spec`, `species`)
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative feed or specified outlet, or a
 *   solution with an outlet negative beyond round-off (details: `species`, `outlet`, `extents`,
 *   and for one reaction `feasibleExtentRange` [lowest, largest feasible extent])
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
  options = optionsOf(options, "solveExtents", "options", OPTION_KEYS);
  const fn = "solveExtents";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { feed, reactions, specs }`, {});
  }
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  const arithmetic = options.arithmetic ?? "exact";
  if (arithmetic !== "exact" && arithmetic !== "float") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires options.arithmetic "exact" or "float", got ${describeValue(arithmetic)}`, { arithmetic });
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
    const fast = solveIn(FLOAT, sys, rows, fn);
    if (fast !== null) return attachView(eagerFinite(fast, fn), EXTENTS_VIEW);
  }
  return attachView(eagerFinite(solveExactPath(sys, rows, fn), fn), EXTENTS_VIEW);
}

/**
 * The eager fields of a result (extents, outlet, change) are finite, or INVALID_ARGUMENT. The tables
 * computed on first access check themselves when read (a ratio beyond float64 throws there).
 */
function eagerFinite(r: SolveExtentsResult, fn: string): SolveExtentsResult {
  finiteResult({ extents: r.extents, outlet: r.outlet, change: r.change }, fn);
  return r;
}

/** One linear equation Σⱼ a[j] ξⱼ = b built from a spec: in float now, exactly on demand. */
interface SpecRow {
  aF: number[];
  bF: number;
  kind: "conversion" | "conversionInReaction" | "outlet" | "extent" | "yield" | "selectivity";
  /** Species index (of), reaction index or second species index, and the spec's number. */
  i: number;
  j: number;
  value: number;
}

function specNumber(s: Record<string, unknown>, field: string, k: number, fn: string): number {
  const v = s[field];
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} needs a finite number for ${field}, got ${describeValue(v)}`, { spec: k, field, value: v });
  }
  return v;
}

function specReaction(R: number, v: unknown, k: number, fn: string): number {
  if (typeof v !== "number" || !Number.isInteger(v) || v < 0 || v >= R) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} names reaction ${describeValue(v)}, but reactions are numbered 0..${R - 1}`, {
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
      return { aF, bF: X * fed, kind: "conversionInReaction", i, j, value: X };
    }
    if (!sys.consumed[i]) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: spec ${k} gives a conversion of ${key}, which no reaction consumes`, { spec: k, species: key });
    }
    // Σ ν ξ = −X n_feed
    return { aF: columnF(sys, i), bF: -X * fed, kind: "conversion", i, j: -1, value: X };
  }
  if ("outlet" in s) {
    const out = specNumber(s, "outlet", k, fn);
    const i = specSpecies(sys, s, "of", k, fn);
    const key = sys.species[i] as string;
    if (out < 0) {
      throw new RxthermError("NEGATIVE_FLOW", `${fn}: spec ${k} gives a negative outlet flow ${out} of ${key}`, { spec: k, species: key, outlet: out });
    }
    return { aF: columnF(sys, i), bF: out - (sys.feed[i] as number), kind: "outlet", i, j: -1, value: out };
  }
  if ("extent" in s) {
    const e = specNumber(s, "extent", k, fn);
    const j = specReaction(R, s.reaction, k, fn);
    const aF = new Array<number>(R).fill(0);
    aF[j] = 1;
    return { aF, bF: e, kind: "extent", i: -1, j, value: e };
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
    return { aF: columnF(sys, p), bF, kind: "yield", i: p, j: b, value: Y };
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
    return { aF, bF: 0, kind: "selectivity", i: d, j: u, value: S };
  }
  throw new RxthermError(
    "INVALID_ARGUMENT",
    `${fn}: spec ${k} has none of conversion, outlet, extent, yield, selectivity`,
    { spec: k, keys: Object.keys(s) },
  );
}

/**
 * The arithmetic a solve runs in: exact BigInt rationals, exact safe-integer rationals (the fast
 * lane, which throws {@link SafeOverflow} when a value outgrows it) or float64. The wide exact lane
 * ({@link solveWide}) solves in its own way and provides only the {@link TableLane} part.
 */
interface Lane<T> {
  readonly exact: boolean;
  readonly zero: T;
  readonly one: T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  div(a: T, b: T): T;
  neg(a: T): T;
  isNegative(a: T): boolean;
  isZero(a: T): boolean;
  /** A user number: exact lanes read its shortest decimal text (0.1 is 1/10). */
  fromNumber(x: number): T;
  toNumber(a: T): number;
  /** Exact text of a value, for messages. */
  text(a: T): string;
  /** nu[j][s] in this lane. */
  nu(sys: StoichSystem): readonly (readonly T[])[];
  /** Feed of each species in this lane. */
  feed(sys: StoichSystem): readonly T[];
  /** The yield ratio ν_P/|ν_A| in this lane (null when there is none or they disagree). */
  yieldRatio(sys: StoichSystem, p: number, a: number): T | null;
  /** a / b as the correctly rounded double of the exact quotient (b ≠ 0). */
  quotient(a: T, b: T): number;
  /** The ratio of a yield pair in this lane. */
  pairRatio(pair: YieldPair): T;
  /** The linear equation of a spec in this lane (not to be mutated). */
  specRow(sys: StoichSystem, r: SpecRow): { a: T[]; b: T };
  /** Solve A ξ = b (A and b not mutated); null when A is singular (exact lanes) or ill-conditioned (float). */
  solve(A: T[][], b: T[]): T[] | null;
  /** feed + change (exact lanes may leave it unreduced: it is only signed, rounded and printed). */
  offset(feed: T, change: T): T;
  /** Net change Σⱼ νⱼₛ ξⱼ of each of the S species. */
  changes(nu: readonly (readonly T[])[], xi: readonly T[], S: number): T[];
}

/** What the result tables read of a lane (the wide lane has only these). */
type TableLane<T> = Pick<Lane<T>, "nu" | "feed" | "quotient" | "isNegative" | "isZero" | "mul" | "pairRatio" | "toNumber">;

/** Σⱼ νⱼₛ ξⱼ in any lane, term by term. */
function laneChanges<T>(L: Lane<T>, nu: readonly (readonly T[])[], xi: readonly T[], S: number): T[] {
  const out = new Array<T>(S);
  for (let s = 0; s < S; s++) {
    let d = L.zero;
    for (let j = 0; j < xi.length; j++) {
      const c = (nu[j] as readonly T[])[s] as T;
      if (!L.isZero(c)) d = L.add(d, L.mul(c, xi[j] as T));
    }
    out[s] = d;
  }
  return out;
}

/**
 * Σⱼ νⱼₛ ξⱼ in BigInt rationals over one common denominator: the extents and stoichiometric
 * numbers are brought to a common denominator once (R + R·S lcm steps only where a ν is
 * fractional), the sums are then plain BigInt products and additions, and each species' sum is
 * reduced once — instead of one gcd-normalised rational product and sum per (species, reaction).
 */
function bigChanges(nu: readonly (readonly Rational[])[], xi: readonly Rational[], S: number): Rational[] {
  let D = 1n;
  for (const x of xi) if (x.den !== 1n && D % x.den !== 0n) D = lcmBigInt(D, x.den);
  let N = 1n;
  for (const row of nu) for (const c of row) if (c.den !== 1n && N % c.den !== 0n) N = lcmBigInt(N, c.den);
  const X = xi.map((x) => x.num * (D / x.den));
  const den = N * D;
  const out = new Array<Rational>(S);
  for (let s = 0; s < S; s++) {
    let acc = 0n;
    for (let j = 0; j < X.length; j++) {
      const c = (nu[j] as readonly Rational[])[s] as Rational;
      if (c.num === 0n) continue;
      acc += (c.den === 1n ? c.num * N : c.num * (N / c.den)) * (X[j] as bigint);
    }
    // left unreduced: only its sign, its sum with the feed and its rounded value are needed
    out[s] = acc === 0n ? BIG_ZERO : { num: acc, den };
  }
  return out;
}

const BIG_ZERO = rationalFromNumber(0);

/**
 * Solve A ξ = b exactly: each row [a | b] scaled to integers by the lcm of its denominators,
 * then fraction-free Gauss–Jordan in BigInt; ξᵢ is returned unreduced (last column over the
 * pivot), as the later sums bring everything to one denominator anyway. Null when singular.
 */
function solveBigSystem(A: Rational[][], b: Rational[]): Rational[] | null {
  const R = A.length;
  const ints: bigint[][] = [];
  for (let i = 0; i < R; i++) {
    const row = A[i] as Rational[];
    const rhs = b[i] as Rational;
    let l = rhs.den;
    for (const v of row) if (v.den !== 1n && l % v.den !== 0n) l = lcmBigInt(l, v.den);
    const out = new Array<bigint>(R + 1);
    for (let j = 0; j < R; j++) {
      const v = row[j] as Rational;
      out[j] = v.num === 0n ? 0n : v.den === 1n ? v.num * l : v.num * (l / v.den);
    }
    out[R] = rhs.num * (l / rhs.den);
    ints.push(out);
  }
  const ech = integerGaussJordan(ints, R);
  if (ech.pivots.length < R) return null;
  const x = new Array<Rational>(R);
  for (let i = 0; i < R; i++) {
    const row = ech.rows[i] as bigint[];
    x[ech.pivots[i] as number] = { num: row[R] as bigint, den: row[ech.pivots[i] as number] as bigint };
  }
  return x;
}

const BIG: Lane<Rational> = {
  exact: true,
  zero: /* @__PURE__ */ rationalFromNumber(0),
  one: /* @__PURE__ */ rationalFromNumber(1),
  add: rationalAdd,
  sub: rationalSub,
  mul: rationalMul,
  div: rationalDiv,
  neg: rationalNeg,
  isNegative: (a) => a.num < 0n,
  isZero: rationalIsZero,
  fromNumber: rationalFromNumber,
  toNumber: rationalToNumber,
  nu: (sys) => sys.nu,
  feed: (sys) => sys.feedQ,
  yieldRatio(sys, p, a) {
    const r = (sys.yieldRatio[p] as (Rational | null | "inconsistent")[])[a] ?? null;
    return r === "inconsistent" ? null : r;
  },
  quotient: (a, b) => rationalToNumber(rationalDiv(a, b)),
  pairRatio: (pair) => pair.ratio,
  specRow: (sys, r) => laneRow(BIG, sys, r),
  solve: solveBigSystem,
  changes: bigChanges,
  offset: (f, d) => (d.num === 0n ? f : { num: f.num * d.den + d.num * f.den, den: f.den * d.den }),
  // values may arrive unreduced from bigChanges/offset: reduce before printing
  text: (a) => rationalToString(rational(a.num, a.den)),
};

const SAFE: Lane<SafeQ> = {
  exact: true,
  zero: S0,
  one: S1,
  add: sqAdd,
  sub: sqSub,
  mul: sqMul,
  div: sqDiv,
  neg: sqNeg,
  isNegative: (a) => a.n < 0,
  isZero: (a) => a.n === 0,
  fromNumber: sqFromNumber,
  toNumber: sqToNumber,
  text: (a) => (a.d === 1 ? String(a.n) : `${a.n}/${a.d}`),
  nu(sys) {
    const nu = sys.nuSafe;
    if (nu === null) throw new SafeOverflow();
    return nu;
  },
  feed: (sys) => sys.feedSafe,
  yieldRatio(sys, p, a) {
    const r = (sys.yieldRatio[p] as (Rational | null | "inconsistent")[])[a] ?? null;
    return r === null || r === "inconsistent" ? null : sqFromRational(r);
  },
  quotient(a, b) {
    // (a.n·b.d) / (a.d·b.n): two exact doubles, so one correctly rounded division
    const num = a.n * b.d;
    const den = a.d * b.n;
    if (Number.isSafeInteger(num) && Number.isSafeInteger(den)) return num === 0 ? 0 : num / den;
    return sqToNumber(sqDiv(a, b));
  },
  pairRatio(pair) {
    if (pair.ratioSafe === null) throw new SafeOverflow();
    return pair.ratioSafe;
  },
  specRow: (sys, r) => laneRow(SAFE, sys, r),
  solve(A, b) {
    // scale each row [a | b] to integers, then fraction-free Gauss–Jordan in float64 integers
    const R = A.length;
    const ints: number[][] = [];
    for (let i = 0; i < R; i++) {
      const row = [...(A[i] as SafeQ[]), b[i] as SafeQ];
      let l = 1;
      for (const v of row) if (v.d !== 1) l = checkedSafe((l / gcdNumber(l, v.d)) * v.d);
      ints.push(row.map((v) => checkedSafe(v.n * (l / v.d))));
    }
    const ech = integerGaussJordanNumber(ints, R);
    if (ech === null) throw new SafeOverflow();
    if (ech.pivots.length < R) return null;
    const x = new Array<SafeQ>(R);
    for (let i = 0; i < R; i++) {
      const row = ech.rows[i] as number[];
      x[ech.pivots[i] as number] = sq(row[R] as number, row[ech.pivots[i] as number] as number);
    }
    return x;
  },
  changes: (nu, xi, S) => laneChanges(SAFE, nu, xi, S),
  offset: sqAdd,
};

const FLOAT: Lane<number> = {
  exact: false,
  zero: 0,
  one: 1,
  add: (a, b) => a + b,
  sub: (a, b) => a - b,
  mul: (a, b) => a * b,
  div: (a, b) => a / b,
  neg: (a) => -a,
  isNegative: (a) => a < 0,
  isZero: (a) => a === 0,
  fromNumber: (x) => x,
  toNumber: (a) => a,
  text: (a) => String(a),
  nu: (sys) => sys.nuF,
  feed: (sys) => sys.feed,
  yieldRatio(sys, p, a) {
    const r = (sys.yieldRatio[p] as (Rational | null | "inconsistent")[])[a] ?? null;
    return r === null || r === "inconsistent" ? null : rationalToNumber(r);
  },
  quotient: (a, b) => a / b,
  pairRatio: (pair) => pair.ratioF,
  specRow: (_sys, r) => ({ a: r.aF, b: r.bF }),
  solve: solveFloatSystem,
  changes: (nu, xi, S) => laneChanges(FLOAT, nu, xi, S),
  offset: (a, b) => a + b,
};

function checkedSafe(v: number): number {
  if (!Number.isSafeInteger(v)) throw new SafeOverflow();
  return v;
}

/**
 * Relative size below which a negative outlet flow is round-off of the inputs and is set to
 * exactly 0: |outlet| ≤ ROUND_OFF_RELATIVE × (feed + Σⱼ |νⱼ ξⱼ|) of that species.
 */
const ROUND_OFF_RELATIVE = 1e-12;

/** The exact form of a spec row in a lane. */
function laneRow<T>(L: Lane<T>, sys: StoichSystem, r: SpecRow): { a: T[]; b: T } {
  const R = sys.reactions.length;
  const nu = L.nu(sys);
  const feed = L.feed(sys);
  const column = (i: number): T[] => {
    const out = new Array<T>(R);
    for (let j = 0; j < R; j++) out[j] = (nu[j] as readonly T[])[i] as T;
    return out;
  };
  switch (r.kind) {
    case "conversion":
      return { a: column(r.i), b: L.neg(L.mul(L.fromNumber(r.value), feed[r.i] as T)) };
    case "conversionInReaction": {
      const a = new Array<T>(R).fill(L.zero);
      a[r.j] = L.neg((nu[r.j] as readonly T[])[r.i] as T);
      return { a, b: L.mul(L.fromNumber(r.value), feed[r.i] as T) };
    }
    case "outlet":
      return { a: column(r.i), b: L.sub(L.fromNumber(r.value), feed[r.i] as T) };
    case "extent": {
      const a = new Array<T>(R).fill(L.zero);
      a[r.j] = L.one;
      return { a, b: L.fromNumber(r.value) };
    }
    case "yield":
      return { a: column(r.i), b: L.mul(L.mul(L.fromNumber(r.value), feed[r.j] as T), L.yieldRatio(sys, r.i, r.j) as T) };
    case "selectivity": {
      const Sq = L.fromNumber(r.value);
      const a = new Array<T>(R);
      for (let j = 0; j < R; j++) a[j] = L.sub((nu[j] as readonly T[])[r.i] as T, L.mul(Sq, (nu[j] as readonly T[])[r.j] as T));
      return { a, b: L.zero };
    }
  }
}

/**
 * Exact path: the safe-integer lane; when a value outgrows it (a spec or feed value with float
 * round-off, 0.30000000000000004, has 17 significant digits), the wide lane; BigInt rationals for
 * everything the wide lane declines (and for every error, which the BigInt lane words).
 */
function solveExactPath(sys: StoichSystem, rows: SpecRow[], fn: string): SolveExtentsResult {
  if (sys.nuSafe !== null && !exactLanes.bigIntOnly) {
    // a spec value with more than 15 significant digits cannot enter the safe lane: skip the attempt
    const places: number[] = [];
    let short = true;
    for (let k = 0; k < rows.length && short; k++) {
      const v = (rows[k] as SpecRow).value;
      const p = Number.isSafeInteger(v) ? -1 : shortDecimalPlaces(v);
      places.push(p);
      short = p !== 0;
    }
    if (short) {
      try {
        const r = solveIn(SAFE, sys, rows, fn);
        if (r !== null) return r;
      } catch (e) {
        if (!(e instanceof SafeOverflow)) throw e;
      }
    }
    try {
      const w = solveWide(sys, rows, places, fn);
      if (w !== null) return w;
    } catch (e) {
      if (!(e instanceof SafeOverflow)) throw e;
    }
  }
  return solveIn(BIG, sys, rows, fn) as SolveExtentsResult;
}

/**
 * An exact value of the wide lane: integer expansions `n / d` (d > 0), unreduced. Values that
 * share a denominator share the very array, which lets a quotient of two of them skip it.
 */
interface WideQ {
  readonly n: readonly number[];
  readonly d: readonly number[];
}

/** Largest power of ten the wide lane brings its values to (a decimal with more places goes to BigInt). */
const WIDE_MAX_EXPONENT = 80;
/** Largest component the wide lane keeps in an eager value, so products in the tables stay below the expansion limit. */
const WIDE_MAX = Math.sqrt(EXPANSION_LIMIT);

/** The exact decimal of a double in the wide lane, or SafeOverflow. */
function wideDecimal(x: number, places?: number): WideDecimal {
  const d = decimalOfNumber(x, WIDE_MAX_EXPONENT, places);
  if (d === null) throw new SafeOverflow();
  checkedWide(d.digits);
  return d;
}

/** The expansion itself when its magnitude is at most {@link WIDE_MAX}, else SafeOverflow (the product of two such stays finite). */
function checkedWide<E extends readonly number[]>(e: E): E {
  if (e.length > 0 && !(Math.abs(e[e.length - 1] as number) <= WIDE_MAX)) throw new SafeOverflow();
  return e;
}

function lcmSafe(a: number, b: number): number {
  return a === b || b === 1 ? a : checkedSafe((a / gcdNumber(a, b)) * b);
}

/**
 * The wide exact lane. The stoichiometric numbers stay in safe integers; only the right-hand
 * sides carry the long decimals. So the square system A ξ = b is inverted once in float64
 * integers — fraction-free Gauss–Jordan of [A | I] gives pᵢ ξᵢ = Σₖ Kᵢₖ bₖ — and every extent,
 * change and outlet is an integer combination of the bₖ over one common denominator, held
 * exactly in floating-point expansions (src/numeric/expansion.ts) and rounded once, correctly.
 * The exact values are those of the BigInt lane, so are the doubles. Returns null (or throws
 * SafeOverflow) to leave a case to the BigInt lane: a singular system, an outlet negative beyond
 * round-off (both reported there), a stoichiometric or selectivity value outside safe integers,
 * a decimal with more than {@link WIDE_MAX_EXPONENT} places, or numbers beyond the expansions' range.
 */
function solveWide(sys: StoichSystem, rows: SpecRow[], places: readonly number[], fn: string): SolveExtentsResult | null {
  const nu = sys.nuSafe as SafeQ[][];
  const R = sys.reactions.length;
  const S = sys.species.length;
  const columns = wideColumns(nu, S);
  // the feed's decimals, kept for the next call with the same feed numbers (as the safe lane keeps its feed)
  let feedDecimals = columns.lastFeed !== null && sameNumbers(columns.lastFeed.values, sys.feed) ? columns.lastFeed.decimals : null;
  if (feedDecimals === null) {
    feedDecimals = new Array<WideDecimal | undefined>(S);
    columns.lastFeed = { values: sys.feed, decimals: feedDecimals };
  }
  const decimals = feedDecimals;
  const feedDecimal = (s: number) => (decimals[s] ??= wideDecimal(sys.feed[s] as number));
  // 1. each row: its coefficients scaled to integers, then the identity; its right-hand side num / (q·10^e)
  const M: number[][] = [];
  if (WIDE_ROWS.length < R || (WIDE_ROWS[0] as number[]).length !== 2 * R) WIDE_ROWS = Array.from({ length: R }, () => new Array<number>(2 * R).fill(0));
  const scales: number[] = [];
  const rhsNum: number[][] = [];
  const rhsQ: number[] = [];
  const rhsE: number[] = [];
  for (let k = 0; k < R; k++) {
    const r = rows[k] as SpecRow;
    const row = (WIDE_ROWS[k] as number[]).fill(0);
    row[R + k] = 1;
    let l = 1;
    let num: number[] = [];
    let q = 1;
    let e = 0;
    if (r.kind === "conversion" || r.kind === "outlet" || r.kind === "yield") {
      // the species' column: Σⱼ νⱼ ξⱼ
      const ints = columns.integerColumns[r.i] as number[];
      for (let j = 0; j < R; j++) row[j] = ints[j] as number;
      l = columns.columnScales[r.i] as number;
    }
    switch (r.kind) {
      case "conversion":
      case "conversionInReaction": {
        const v = wideDecimal(r.value, places[k]);
        const f = feedDecimal(r.i);
        num = multiplyExpansions(v.digits, f.digits);
        if (r.kind === "conversion") num = negateExpansion(num);
        else {
          const c = (nu[r.j] as SafeQ[])[r.i] as SafeQ;
          row[r.j] = -c.n;
          l = c.d;
        }
        e = v.exponent + f.exponent;
        break;
      }
      case "outlet": {
        const v = wideDecimal(r.value, places[k]);
        const f = feedDecimal(r.i);
        e = Math.max(v.exponent, f.exponent);
        num = addExpansions(scaleByPowerOfTen(v.digits, e - v.exponent), negateExpansion(scaleByPowerOfTen(f.digits, e - f.exponent)));
        break;
      }
      case "extent": {
        row[r.j] = 1;
        const v = wideDecimal(r.value, places[k]);
        num = v.digits;
        e = v.exponent;
        break;
      }
      case "yield": {
        const ratio = sqFromRational((sys.yieldRatio[r.i] as (Rational | null | "inconsistent")[])[r.j] as Rational);
        const v = wideDecimal(r.value, places[k]);
        const f = feedDecimal(r.j);
        num = scaleExpansion(multiplyExpansions(v.digits, f.digits), ratio.n);
        q = ratio.d;
        e = v.exponent + f.exponent;
        break;
      }
      case "selectivity": {
        const Sq = sqFromNumber(r.value);
        const a = new Array<SafeQ>(R);
        for (let j = 0; j < R; j++) {
          const c = sqSub((nu[j] as SafeQ[])[r.i] as SafeQ, sqMul(Sq, (nu[j] as SafeQ[])[r.j] as SafeQ));
          a[j] = c;
          if (c.d !== 1) l = lcmSafe(l, c.d);
        }
        for (let j = 0; j < R; j++) {
          const c = a[j] as SafeQ;
          row[j] = c.n === 0 ? 0 : checkedSafe(c.n * (l / c.d));
        }
        break;
      }
    }
    M.push(row);
    scales.push(l);
    rhsNum.push(checkedWide(compressExpansion(num)));
    rhsQ.push(q);
    rhsE.push(e);
  }
  // 2. [A | I] → [diag(p) | K]
  const ech = integerGaussJordanNumber(M, R, true);
  if (ech === null) throw new SafeOverflow();
  if (ech.pivots.length < R) return null;
  // 3. one denominator P·Qb·10^E for every extent, and for the feeds
  let E = 0;
  let Qb = 1;
  for (let k = 0; k < R; k++) {
    if ((rhsNum[k] as number[]).length === 0) continue;
    if ((rhsE[k] as number) > E) E = rhsE[k] as number;
    Qb = lcmSafe(Qb, rhsQ[k] as number);
  }
  for (let s = 0; s < sys.feedCount; s++) {
    if (sys.feed[s] !== 0 && sys.reacting[s]) E = Math.max(E, feedDecimal(s).exponent);
  }
  let P = 1;
  for (let i = 0; i < R; i++) P = lcmSafe(P, (ech.rows[i] as number[])[i] as number);
  const PQ = checkedSafe(P * Qb);
  // each right-hand side brought to 10^E: by its coefficient when that stays a safe integer, else by the expansion itself
  const terms = new Array<number[] | undefined>(R);
  const N: number[][] = [];
  const sources: number[][] = [];
  const coefficients: number[] = [];
  for (let i = 0; i < R; i++) {
    const row = ech.rows[i] as number[];
    const pi = P / (row[i] as number);
    sources.length = 0;
    coefficients.length = 0;
    for (let k = 0; k < R; k++) {
      const K = row[R + k] as number;
      if (K === 0 || (rhsNum[k] as number[]).length === 0) continue;
      const c = checkedSafe(checkedSafe(checkedSafe(K * (scales[k] as number)) * pi) * (Qb / (rhsQ[k] as number)));
      const m = E - (rhsE[k] as number);
      const scaled = m <= 15 ? c * (POW10[m] as number) : NaN;
      if (Number.isSafeInteger(scaled)) {
        sources.push(rhsNum[k] as number[]);
        coefficients.push(scaled);
      } else {
        sources.push((terms[k] ??= scaleByPowerOfTen(rhsNum[k] as number[], m)));
        coefficients.push(c);
      }
    }
    N.push(checkedWide(linearCombination(sources, null, coefficients)));
  }
  const den = checkedWide(scaleByPowerOfTen(expansionOf(PQ), E));
  const extents = new Array<number>(R);
  for (let j = 0; j < R; j++) extents[j] = expansionQuotient(N[j] as number[], den);
  // 4. changes Σⱼ νⱼₛ ξⱼ over V·den, V the lcm of the stoichiometric denominators; outlets feed + change
  const V = columns.V;
  const denV = V === 1 ? den : checkedWide(scaleExpansion(den, V));
  const PQV = checkedSafe(PQ * V);
  const changeNumerators = new Array<readonly number[] | null>(S).fill(null); // null: minus the feed (a round-off zero)
  const changeNumbers = new Array<number>(S);
  const outlet = new Array<number>(S);
  const roundOffZeros: string[] = [];
  const empty: number[] = [];
  let feedQ: WideQ[] | null = null;
  const feedWide = (): WideQ[] =>
    (feedQ ??= sys.feed.map((x, s) => {
      if (x === 0) return { n: empty, d: ONE_EXPANSION };
      const f = feedDecimal(s);
      return { n: f.digits, d: scaleByPowerOfTen(ONE_EXPANSION, f.exponent) };
    }));
  for (let s = 0; s < S; s++) {
    if (!sys.reacting[s]) {
      changeNumerators[s] = empty;
      changeNumbers[s] = 0;
      outlet[s] = sys.feed[s] as number;
      continue;
    }
    const js = columns.reactions[s] as number[];
    const cs = columns.coefficients[s] as number[];
    const fed = sys.feed[s] as number;
    let C: number[];
    let O: number[];
    if (fed === 0) O = C = checkedWide(linearCombination(N, js, cs));
    else {
      // feed·V·den = digits · P·Qb·V · 10^(E − exponent)
      const f = feedDecimal(s);
      const m = E - f.exponent;
      const scaled = m <= 15 ? PQV * (POW10[m] as number) : NaN;
      const both = Number.isSafeInteger(scaled)
        ? linearCombinationAndMore(N, js, cs, f.digits, scaled)
        : linearCombinationAndMore(N, js, cs, scaleByPowerOfTen(f.digits, m), PQV);
      C = checkedWide(both[0]);
      O = checkedWide(both[1]);
    }
    if (expansionSign(O) < 0) {
      // round-off rule, as in solveIn
      let scale = fed;
      for (let j = 0; j < R; j++) scale += Math.abs(((sys.nuF[j] as number[])[s] as number) * (extents[j] as number));
      const value = expansionQuotient(O, denV);
      if (-value > ROUND_OFF_RELATIVE * scale) return null; // a real negative: the BigInt lane reports it
      roundOffZeros.push(sys.species[s] as string);
      changeNumbers[s] = -fed;
      outlet[s] = 0;
      continue;
    }
    changeNumerators[s] = C;
    changeNumbers[s] = expansionQuotient(C, denV);
    outlet[s] = O === C ? (changeNumbers[s] as number) : expansionQuotient(O, denV);
  }
  let values: { xi: WideQ[]; change: WideQ[] } | null = null;
  const wideValues = () =>
    (values ??= {
      xi: N.map((n) => ({ n, d: den })),
      change: changeNumerators.map((C, s) => {
        if (C !== null) return { n: C, d: denV };
        const f = feedWide()[s] as WideQ;
        return { n: negateExpansion(f.n), d: f.d };
      }),
    });
  const lane: TableLane<WideQ> = {
    nu: () => (columns.wide ??= nu.map((row) => row.map((c) => ({ n: expansionOf(c.n), d: expansionOf(c.d) })))),
    feed: feedWide,
    toNumber: (a) => expansionQuotient(a.n, a.d),
    isNegative: (a) => expansionSign(a.n) < 0,
    isZero: (a) => a.n.length === 0,
    mul: (a, b) => ({
      n: multiplyExpansions(checkedWide(a.n), checkedWide(b.n)),
      d: multiplyExpansions(checkedWide(a.d), checkedWide(b.d)),
    }),
    quotient: (a, b) =>
      a.d === b.d
        ? expansionQuotient(a.n, b.n)
        : expansionQuotient(multiplyExpansions(checkedWide(a.n), checkedWide(b.d)), multiplyExpansions(checkedWide(a.d), checkedWide(b.n))),
    pairRatio(pair) {
      if (pair.ratioSafe === null) throw new SafeOverflow();
      return { n: expansionOf(pair.ratioSafe.n), d: expansionOf(pair.ratioSafe.d) };
    },
  };
  return assemble(lane, sys, wideValues, extents, outlet, changeNumbers, roundOffZeros, () => solveIn(BIG, sys, rows, fn) as SolveExtentsResult);
}

const ONE_EXPANSION: readonly number[] = [1];

/** 10^k for k = 0 … 15 (exact doubles). */
const POW10: readonly number[] = /* @__PURE__ */ Array.from({ length: 16 }, (_, k) => 10 ** k);

/** Scratch rows of the wide lane's [A | I] (reused from call to call; the lane never re-enters). */
let WIDE_ROWS: number[][] = [];

/** A double's exact decimal in the wide lane: `digits · 10^−exponent`. */
type WideDecimal = { readonly digits: number[]; readonly exponent: number };

/**
 * What the wide lane reads of a stoichiometric table, memoised per table: per species the
 * reactions it takes part in and its coefficients times V (the lcm of all denominators), its
 * column scaled to integers (and the scale), the table as wide values for the result tables, and
 * the decimals of the last feed.
 */
interface WideColumns {
  readonly V: number;
  readonly reactions: number[][];
  readonly coefficients: number[][];
  readonly integerColumns: number[][];
  readonly columnScales: number[];
  wide: WideQ[][] | null;
  lastFeed: { values: readonly number[]; decimals: (WideDecimal | undefined)[] } | null;
}

const wideColumnsMemo = /* @__PURE__ */ new WeakMap<readonly (readonly SafeQ[])[], WideColumns>();

function sameNumbers(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}

function wideColumns(nu: readonly (readonly SafeQ[])[], S: number): WideColumns {
  const hit = wideColumnsMemo.get(nu);
  if (hit !== undefined) return hit;
  let V = 1;
  for (const row of nu) for (let s = 0; s < S; s++) if ((row[s] as SafeQ).d !== 1) V = lcmSafe(V, (row[s] as SafeQ).d);
  const reactions: number[][] = [];
  const coefficients: number[][] = [];
  const integerColumns: number[][] = [];
  const columnScales: number[] = [];
  for (let s = 0; s < S; s++) {
    const js: number[] = [];
    const cs: number[] = [];
    let l = 1;
    nu.forEach((row, j) => {
      const c = row[s] as SafeQ;
      if (c.d !== 1) l = lcmSafe(l, c.d);
      if (c.n === 0) return;
      js.push(j);
      cs.push(checkedSafe(c.n * (V / c.d)));
    });
    reactions.push(js);
    coefficients.push(cs);
    integerColumns.push(nu.map((row) => ((row[s] as SafeQ).n === 0 ? 0 : checkedSafe((row[s] as SafeQ).n * (l / (row[s] as SafeQ).d)))));
    columnScales.push(l);
  }
  const out: WideColumns = { V, reactions, coefficients, integerColumns, columnScales, wide: null, lastFeed: null };
  wideColumnsMemo.set(nu, out);
  return out;
}

/**
 * Solve and assemble in one lane. Exact lanes throw the singular/conflicting/negative errors
 * (a singular system is diagnosed in BigInt); the float lane returns null to defer to the exact
 * path (tiny pivot, or an outlet negative beyond round-off).
 */
function solveIn<T>(L: Lane<T>, sys: StoichSystem, rows: SpecRow[], fn: string): SolveExtentsResult | null {
  const R = sys.reactions.length;
  const A: T[][] = [];
  const b: T[] = [];
  for (const r of rows) {
    const e = L.specRow(sys, r);
    A.push(e.a);
    b.push(e.b);
  }
  const xi = L.solve(A, b);
  if (xi === null) {
    if (!L.exact) return null;
    const Ab: Rational[][] = [];
    const bb: Rational[] = [];
    for (const r of rows) {
      const e = laneRow(BIG, sys, r);
      Ab.push(e.a);
      bb.push(e.b);
    }
    throwSingular(sys, rows, Ab, bb, matrixRank(Ab), fn);
  }
  const S = sys.species.length;
  const nu = L.nu(sys);
  const feed = L.feed(sys);
  const extents = new Array<number>(R);
  for (let j = 0; j < R; j++) extents[j] = L.toNumber(xi[j] as T);
  const change = new Array<T>(S);
  const outlet = new Array<number>(S);
  const roundOffZeros: string[] = [];
  const net = L.changes(nu, xi, S);
  for (let s = 0; s < S; s++) {
    const d = net[s] as T;
    const v = L.offset(feed[s] as T, d);
    if (L.isNegative(v)) {
      // round-off rule: a negative outlet within ROUND_OFF_RELATIVE of the species' throughput is 0
      let scale = sys.feed[s] as number;
      for (let j = 0; j < R; j++) scale += Math.abs(((sys.nuF[j] as number[])[s] as number) * (extents[j] as number));
      const value = L.toNumber(v);
      if (-value > ROUND_OFF_RELATIVE * scale) {
        if (!L.exact) return null; // decide real negatives exactly
        throwNegative(sys, s, value, L.text(v), extents, fn);
      }
      roundOffZeros.push(sys.species[s] as string);
      change[s] = L.neg(feed[s] as T);
      outlet[s] = 0;
      continue;
    }
    change[s] = d;
    outlet[s] = L.toNumber(v);
  }
  // the safe lane's tables can outgrow it (a quotient of two exact values): they are then read from the BigInt lane
  const exactTables = L === (SAFE as Lane<unknown>) ? () => solveIn(BIG, sys, rows, fn) as SolveExtentsResult : null;
  const changeNumbers = new Array<number>(S);
  for (let s = 0; s < S; s++) changeNumbers[s] = sys.reacting[s] ? L.toNumber(change[s] as T) : 0;
  const values = { xi, change };
  return assemble(L, sys, () => values, extents, outlet, changeNumbers, roundOffZeros, exactTables);
}

/** Readable text of a spec row, for messages (built only when needed: number text is slow). */
function describeRow(sys: StoichSystem, r: SpecRow): string {
  const sp = (i: number): string => sys.species[i] as string;
  switch (r.kind) {
    case "conversion":
      return `conversion of ${sp(r.i)} = ${r.value}`;
    case "conversionInReaction":
      return `conversion of ${sp(r.i)} in reaction ${r.j} = ${r.value}`;
    case "outlet":
      return `outlet of ${sp(r.i)} = ${r.value}`;
    case "extent":
      return `extent of reaction ${r.j} = ${r.value}`;
    case "yield":
      return `yield of ${sp(r.i)} on ${sp(r.j)} = ${r.value}`;
    case "selectivity":
      return `selectivity of ${sp(r.i)} over ${sp(r.j)} = ${r.value}`;
  }
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
    let rhs: Rational = BIG.zero;
    y.forEach((c, i) => {
      if (!rationalIsZero(c)) rhs = rationalAdd(rhs, rationalMul(c, b[i] as Rational));
    });
    return { rows: y.flatMap((c, i) => (rationalIsZero(c) ? [] : [i])), conflicting: !rationalIsZero(rhs) };
  });
  const conflicting = combos.filter((c) => c.conflicting);
  const chosen = conflicting.length > 0 ? conflicting : combos;
  const involved = [...new Set(chosen.flatMap((c) => c.rows))].sort((x, y) => x - y);
  const descriptions = involved.map((i) => `spec ${i} (${describeRow(sys, rows[i] as SpecRow)})`);
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

function throwNegative(sys: StoichSystem, s: number, value: number, exactText: string, extents: number[], fn: string): never {
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
    hint = `; feasible extents lie in [${lo}, ${hi}], so the largest is ${hi}`;
  }
  // a value too small for a double is shown as its exact fraction, never as "0" or "-0"
  const shown = value !== 0 ? String(value) : exactText;
  throw new RxthermError(
    "NEGATIVE_FLOW",
    `${fn}: the specs give a negative outlet flow ${shown} of ${key}, beyond round-off (${ROUND_OFF_RELATIVE} × its throughput) (extents ${extents.join(", ")})${hint}`,
    details,
  );
}

function noNegZero(v: number): number {
  return v === 0 ? 0 : v;
}

/**
 * Build the result from the lane's exact (or float) extents and changes out − in. Extents,
 * outlet and change are computed now; the conversion, per-reaction conversion, yield and
 * selectivity tables (the last grows with the square of the species count) are computed on
 * first access and then kept, so a caller who reads only the flows never pays for them. A lane
 * that can outgrow its range while computing a table (the safe-integer lane throws
 * {@link SafeOverflow}) passes `exactTables`, which solves the same problem in a lane that cannot,
 * and the tables are then read from that result. `values` gives the lane's exact extents and
 * changes (built only when a table is read); `changeNumbers` the changes as doubles.
 */
function assemble<T>(
  L: TableLane<T>,
  sys: StoichSystem,
  values: () => { readonly xi: readonly T[]; readonly change: readonly T[] },
  extents: number[],
  outlet: number[],
  changeNumbers: readonly number[],
  roundOffZeros: string[],
  exactTables: (() => SolveExtentsResult) | null = null,
): SolveExtentsResult {
  const S = sys.species.length;
  const R = sys.reactions.length;
  const outletFlows: Flows = {};
  const changeFlows: Flows = {};
  for (let s = 0; s < S; s++) {
    const key = sys.species[s] as string;
    outletFlows[key] = noNegZero(outlet[s] as number);
    if (sys.reacting[s]) changeFlows[key] = noNegZero(changeNumbers[s] as number);
  }
  const ext = new Array<number>(R);
  for (let j = 0; j < R; j++) ext[j] = noNegZero(extents[j] as number);
  let other: SolveExtentsResult | null = null;
  const table = <V>(compute: () => V, read: (r: SolveExtentsResult) => V): V => {
    if (exactTables === null) return compute();
    try {
      return compute();
    } catch (e) {
      if (!(e instanceof SafeOverflow)) throw e;
      return read((other ??= exactTables()));
    }
  };
  let conversions: { conversion: Record<string, number>; conversionByReaction: Record<string, number>[] } | null = null;
  const conversionTables = () =>
    (conversions ??= table(
      () => finiteResult(conversionTablesOf(L, sys, values().xi, values().change), "solveExtents (conversion)"),
      (r) => ({ conversion: r.conversion, conversionByReaction: r.conversionByReaction }),
    ));
  let yields: Record<string, Record<string, number>> | null = null;
  let selectivity: Record<string, Record<string, number>> | null = null;
  const result = { extents: ext, outlet: outletFlows, change: changeFlows, roundOffZeros } as SolveExtentsResult;
  Object.defineProperties(result, {
    conversion: { enumerable: true, get: () => conversionTables().conversion },
    conversionByReaction: { enumerable: true, get: () => conversionTables().conversionByReaction },
    yield: {
      enumerable: true,
      get: () => (yields ??= table(() => finiteResult(yieldTableOf(L, sys, values().change), "solveExtents (yield)"), (r) => r.yield)),
    },
    selectivity: {
      enumerable: true,
      get: () => (selectivity ??= table(() => finiteResult(selectivityTableOf(L, sys, values().change), "solveExtents (selectivity)"), (r) => r.selectivity)),
    },
  });
  return result;
}

function conversionTablesOf<T>(L: TableLane<T>, sys: StoichSystem, xi: readonly T[], change: readonly T[]): { conversion: Record<string, number>; conversionByReaction: Record<string, number>[] } {
  const S = sys.species.length;
  const R = sys.reactions.length;
  const nu = L.nu(sys);
  const feed = L.feed(sys);
  const conversion: Record<string, number> = {};
  const conversionByReaction: Record<string, number>[] = [];
  for (let j = 0; j < R; j++) conversionByReaction.push({});
  for (let s = 0; s < S; s++) {
    if (!sys.reacting[s] || !sys.consumed[s] || sys.feed[s] === 0) continue;
    const key = sys.species[s] as string;
    const fed = feed[s] as T;
    conversion[key] = noNegZero(-L.quotient(change[s] as T, fed));
    for (let j = 0; j < R; j++) {
      const c = (nu[j] as readonly T[])[s] as T;
      if (L.isNegative(c)) (conversionByReaction[j] as Record<string, number>)[key] = noNegZero(-L.quotient(L.mul(c, xi[j] as T), fed));
    }
  }
  return { conversion, conversionByReaction };
}

function yieldTableOf<T>(L: TableLane<T>, sys: StoichSystem, change: readonly T[]): Record<string, Record<string, number>> {
  const feed = L.feed(sys);
  const yields: Record<string, Record<string, number>> = {};
  for (const yp of sys.yieldPairs) {
    if (sys.feed[yp.a] === 0) continue;
    const ideal = L.mul(feed[yp.a] as T, L.pairRatio(yp));
    (yields[sys.species[yp.p] as string] ??= {})[sys.species[yp.a] as string] = noNegZero(L.quotient(change[yp.p] as T, ideal));
  }
  return yields;
}

function selectivityTableOf<T>(L: TableLane<T>, sys: StoichSystem, change: readonly T[]): Record<string, Record<string, number>> {
  const S = sys.species.length;
  const selectivity: Record<string, Record<string, number>> = {};
  if (sys.reactions.length > 1) {
    for (let d = 0; d < S; d++) {
      if (!sys.produced[d]) continue;
      for (let u = 0; u < S; u++) {
        if (u === d || !sys.produced[u] || (sys.proportional[d] as boolean[])[u]) continue;
        const cu = change[u] as T;
        if (L.isNegative(cu) || L.isZero(cu)) continue;
        (selectivity[sys.species[d] as string] ??= {})[sys.species[u] as string] = noNegZero(L.quotient(change[d] as T, cu));
      }
    }
  }
  return selectivity;
}

/** Float64 Gauss elimination with partial pivoting; null when a pivot is tiny (defer to exact). */
function solveFloatSystem(A: number[][], b: number[]): number[] | null {
  const R = A.length;
  const M: number[][] = [];
  let scale = 0;
  for (let i = 0; i < R; i++) {
    const row = (A[i] as number[]).slice();
    row.push(b[i] as number);
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
  return x;
}
