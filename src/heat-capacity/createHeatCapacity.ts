import { RxthermError, optionsOf, describeValue } from "../errors.js";
import { slipHintDetails, withSlipHint } from "../units.js";
import { allWithin } from "../numeric/allWithin.js";
import { sortedWithin } from "../numeric/sortedWithin.js";
import * as compiled from "./internal/cpCompile.js";
import type { CpRange, RangeOptions } from "./types.js";

// Module-local aliases of the compiled-form helpers. The hot paths call these per evaluation; a
// local const binding is a direct reference that the JIT inlines, whereas some module loaders (the
// CommonJS interop of TypeScript runners) turn every imported name into a getter call. Plain member
// reads, not a destructuring of the namespace: bundlers then resolve each one to the export itself and
// the shipped dist stays tree-shakeable.
const REFERENCE_T_K = compiled.REFERENCE_T_K, STRIDE = compiled.STRIDE, S_0 = compiled.S_0;
const H_0 = compiled.H_0, H_1 = compiled.H_1, H_2 = compiled.H_2, H_3 = compiled.H_3, H_4 = compiled.H_4, H_5 = compiled.H_5;
const H_INV = compiled.H_INV, H_LN = compiled.H_LN;
const absoluteConstants = compiled.absoluteConstants, cpAt = compiled.cpAt, hAt = compiled.hAt, sAt = compiled.sAt;
const segmentIndex = compiled.segmentIndex, writeSegment = compiled.writeSegment;
const prepareRanges = compiled.prepareRanges, rangePieces = compiled.rangePieces;
const CP_0 = compiled.CP_0, CP_1 = compiled.CP_1, CP_2 = compiled.CP_2, CP_3 = compiled.CP_3, CP_4 = compiled.CP_4;
const CP_M1 = compiled.CP_M1, CP_M2 = compiled.CP_M2;
const S_LN = compiled.S_LN, S_INV = compiled.S_INV, S_INV2 = compiled.S_INV2, S_1 = compiled.S_1, S_2 = compiled.S_2, S_3 = compiled.S_3, S_4 = compiled.S_4;
export { MAX_CP_TABLE_POINTS, MAX_CP_RANGES } from "./internal/cpCompile.js";

/**
 * Options of {@link createHeatCapacity}.
 *
 * @category Heat capacity
 */
export interface CreateHeatCapacityOptions {
  /**
   * Name used in error messages and details (a species key such as `"N2(g)"`).
   * @defaultValue undefined
   */
  label?: string;
  /**
   * Largest mismatch, in K, between one range's `TmaxK` and the next range's `TminK` that still counts
   * as a shared boundary; the lower range's `TmaxK` then becomes the boundary. Larger mismatches are
   * reported as a gap or an overlap.
   * @defaultValue 1e-6
   */
  boundaryToleranceK?: number;
  /**
   * Require Cp > 0 over every range (a physical heat capacity always is). `false` keeps only the
   * finiteness checks, for purely mathematical use of the forms (e.g. testing integrals of
   * arbitrary coefficient sets).
   * @defaultValue true
   */
  requirePositiveCp?: boolean;
}

/**
 * A value together with whether any temperature it used lay outside the data range (evaluated with
 * `{ extrapolate: true }` by extending the nearest range's form).
 *
 * @category Heat capacity
 */
export interface HeatCapacityValue {
  /** The value, in the unit of the method that returned it. */
  readonly value: number;
  /** True when a temperature lay outside [TminK, TmaxK]. */
  readonly extrapolated: boolean;
}

/**
 * A piecewise heat-capacity model Cp°(T) with exact enthalpy and entropy integrals; built by
 * {@link createHeatCapacity}.
 *
 * Every method throws `INVALID_ARGUMENT` for a temperature that is not a finite number above 0 K,
 * and `OUT_OF_RANGE` (details `{ label, T, range: [TminK, TmaxK] }`) for one outside the data range
 * unless `{ extrapolate: true }` is passed, in which case the nearest range's form is extended. At a
 * shared boundary the lower range's form is used (it only matters for Cp and for the absolute values
 * of forms whose pieces do not join exactly; see {@link boundaryJumps}).
 *
 * @category Heat capacity
 */
export interface HeatCapacity {
  /** The label given at creation, if any. */
  readonly label: string | undefined;
  /** The ranges, sorted by temperature, as frozen copies of the input. */
  readonly ranges: readonly CpRange[];
  /** Lowest temperature of the data, K. */
  readonly TminK: number;
  /** Highest temperature of the data, K. */
  readonly TmaxK: number;
  /**
   * True when 298.15 K lies outside [TminK, TmaxK], so that {@link HeatCapacity.sensibleEnthalpy} and
   * {@link HeatCapacity.sensibleEntropy} reach their reference temperature by extending the nearest range.
   */
  readonly referenceExtrapolated: boolean;
  /** True when every range carries absolute integration constants (Shomate F and G, NASA a6/a7 or b1/b2). */
  readonly hasAbsoluteConstants: boolean;
  /** Cp°(T), J/(mol·K). */
  cp(T: number, options?: RangeOptions): number;
  /** Cp°(T) in J/(mol·K), with whether T was extrapolated. */
  cpDetailed(T: number, options?: RangeOptions): HeatCapacityValue;
  /** ∫Cp dT from T1 to T2 (K), J/mol; negative when T2 < T1. */
  deltaH(T1: number, T2: number, options?: RangeOptions): number;
  /** ∫Cp dT from T1 to T2 in J/mol, with whether T1 or T2 was extrapolated. */
  deltaHDetailed(T1: number, T2: number, options?: RangeOptions): HeatCapacityValue;
  /** ∫Cp/T dT from T1 to T2 (K), J/(mol·K). */
  deltaS(T1: number, T2: number, options?: RangeOptions): number;
  /** ∫Cp/T dT from T1 to T2 in J/(mol·K), with whether T1 or T2 was extrapolated. */
  deltaSDetailed(T1: number, T2: number, options?: RangeOptions): HeatCapacityValue;
  /** Mean Cp between T1 and T2, ∫Cp dT / (T2 − T1), J/(mol·K); Cp(T1) when T1 = T2. */
  meanCp(T1: number, T2: number, options?: RangeOptions): number;
  /** Sensible enthalpy ∫Cp dT from 298.15 K to T, J/mol (the hot path of species enthalpies). */
  sensibleEnthalpy(T: number, options?: RangeOptions): number;
  /** Sensible entropy ∫Cp/T dT from 298.15 K to T, J/(mol·K). */
  sensibleEntropy(T: number, options?: RangeOptions): number;
  /**
   * Absolute enthalpy from the integration constant of the form that holds T (Shomate F, NASA-7 a6,
   * NASA-9 b1), J/mol; on the data set's own scale (ΔfH°(298.15 K) at 298.15 K for Shomate and NASA data).
   * Throws `MISSING_DATA` when that form carries no constant.
   */
  absoluteEnthalpy(T: number, options?: RangeOptions): number;
  /**
   * Absolute entropy from the integration constant of the form that holds T (Shomate G, NASA-7 a7,
   * NASA-9 b2), J/(mol·K). Throws `MISSING_DATA` when that form carries no constant.
   */
  absoluteEntropy(T: number, options?: RangeOptions): number;
  /** Cp at every temperature of `temperaturesK` (K) into `out` (allocated when omitted), J/(mol·K). */
  cpBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array;
  /** ∫Cp dT from `fromK` to every temperature of `temperaturesK` into `out`, J/mol. */
  deltaHBatch(fromK: number, temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array;
  /** ∫Cp/T dT from `fromK` to every temperature of `temperaturesK` into `out`, J/(mol·K). */
  deltaSBatch(fromK: number, temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array;
  /**
   * ∫Cp dT from 298.15 K to every temperature of `temperaturesK` into `out`, J/mol, plus `offsetJPerMol`
   * (default 0; e.g. ΔfH°(298.15 K) for absolute enthalpies, added inside the same loop).
   */
  sensibleEnthalpyBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions, offsetJPerMol?: number): Float64Array;
  /**
   * ∫Cp/T dT from 298.15 K to every temperature of `temperaturesK` into `out`, J/(mol·K), plus
   * `offsetJPerMolK` (default 0; e.g. S°(298.15 K) for absolute entropies).
   */
  sensibleEntropyBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions, offsetJPerMolK?: number): Float64Array;
}

/**
 * Build a piecewise heat-capacity model from one or more contiguous Cp ranges.
 *
 * Every form is reduced to one canonical shape, Cp(T) = Σ c_k·T^k for k = −2…4 (T in K):
 * Shomate with t = T/1000 (E/t² becomes 10⁶·E/T²), a polynomial in °C expanded in powers of T
 * by the binomial theorem, NASA-7 and NASA-9 multiplied by R, and a tabulated Cp split into one
 * linear piece per table interval. The enthalpy ∫Cp dT and entropy ∫Cp/T dT then have exact
 * closed forms (powers of T, 1/T, 1/T² and ln T), whose constants are chained from piece to piece
 * so that one continuous antiderivative, zero at 298.15 K, covers the whole range: an integral
 * across range boundaries is the sum of the per-range pieces, evaluated as one difference.
 *
 * Validation: at least one range; each with 0 < TminK < TmaxK; forms well formed (finite numbers,
 * 7 NASA-7 and 9 NASA-9 coefficients, strictly increasing tabulated temperatures covering the range,
 * known units; a °C polynomial may not carry the e/θ² term, which is singular at 0 °C). Ranges are
 * sorted by TminK and must be contiguous: a boundary mismatch up to `boundaryToleranceK` (default
 * 10⁻⁶ K) is a shared boundary, anything larger a gap or an overlap. The input is copied, never kept.
 *
 * Standard state: the forms describe Cp° at 1 bar; this model does not add pressure terms.
 *
 * @param ranges - one or more Cp ranges (K and the form of each)
 * @param options - label for messages and the boundary tolerance
 * @returns the model; its methods take temperatures in K and return J/(mol·K), J/mol
 * @throws RxthermError `INVALID_DATA` for malformed ranges or forms (the first problem found), with details
 *   `{ label, path, received, issues: [{ path, message }] }`, or for a gap or overlap
 *   `{ label, path, problem: "gap" | "overlap", boundary, ranges, issues }`
 * @throws RxthermError `INVALID_ARGUMENT` for a negative or non-finite `boundaryToleranceK`
 * @category Heat capacity
 * @example
 * // N2(g), Shomate coefficients of the NIST Chemistry WebBook, 100–500 K and 500–2000 K
 * const n2 = createHeatCapacity([
 *   { TminK: 100, TmaxK: 500, cp: { form: "shomate", A: 28.98641, B: 1.853978, C: -9.647459, D: 16.63537, E: 0.000117 } },
 *   { TminK: 500, TmaxK: 2000, cp: { form: "shomate", A: 19.50583, B: 19.88705, C: -8.598535, D: 1.369784, E: 0.527601 } },
 * ], { label: "N2(g)" });
 * n2.deltaH(298.15, 1000) // => 21462.0 J/mol (NIST-JANAF table N-023 lists 21.463 kJ/mol)
 * @see NIST Chemistry WebBook, SRD 69: the Shomate equation, Cp° = A + B·t + C·t² + D·t³ + E/t², t = T/1000 K
 * @see B. J. McBride, M. J. Zehe, S. Gordon, NASA/TP-2002-211556 (2002): the 7- and 9-coefficient polynomials
 */
export function createHeatCapacity(ranges: readonly CpRange[], options: CreateHeatCapacityOptions = {}): HeatCapacity {
  options = optionsOf(options, "createHeatCapacity");
  const label = options.label;
  const tol = options.boundaryToleranceK ?? 1e-6;
  if (typeof tol !== "number" || !(tol >= 0) || !Number.isFinite(tol)) {
    throw new RxthermError("INVALID_ARGUMENT", `createHeatCapacity requires boundaryToleranceK >= 0, got ${describeValue(tol)}`, { boundaryToleranceK: tol });
  }
  const sorted = prepareRanges("createHeatCapacity", label, ranges, tol);
  return new PiecewiseHeatCapacity(sorted, label, options.requirePositiveCp !== false);
}

/**
 * The packed segments of a model: upper bounds (K) and, per segment, STRIDE coefficients in the
 * layout of internal/cpCompile.ts (Cp, chained H and S antiderivatives, zero at 298.15 K).
 * @internal
 */
export interface CompiledSegments {
  readonly n: number;
  readonly upper: Float64Array;
  readonly k: Float64Array;
}

/**
 * The packed segments of a model made by {@link createHeatCapacity} (read-only; for the summed
 * models of heatCapacitySum.ts), or null for any other object. Not re-exported.
 * @internal
 */
export function compiledSegmentsOf(model: unknown): CompiledSegments | null {
  return model instanceof PiecewiseHeatCapacity ? PiecewiseHeatCapacity.segmentsOf(model) : null;
}

class PiecewiseHeatCapacity implements HeatCapacity {
  /** The packed coefficients of `m` (see {@link compiledSegmentsOf}). */
  static segmentsOf(m: PiecewiseHeatCapacity): CompiledSegments {
    return { n: m.n, upper: m.upper, k: m.k };
  }

  readonly label: string | undefined;
  readonly ranges: readonly CpRange[];
  readonly TminK: number;
  readonly TmaxK: number;
  readonly referenceExtrapolated: boolean;
  readonly hasAbsoluteConstants: boolean;
  /** Packed per-segment coefficients (STRIDE slots each). */
  private readonly k: Float64Array;
  /** Upper bound of each segment, K. */
  private readonly upper: Float64Array;
  /** Lower bound used by the batch cache: −∞ for the first segment. */
  private readonly lowerX: Float64Array;
  /** Upper bound used by the batch cache: +∞ for the last segment. */
  private readonly upperX: Float64Array;
  private readonly n: number;
  /** Range index of each segment. */
  private readonly rangeOf: Int32Array;
  /** Absolute H and S constants per segment relative to the chained antiderivative (NaN when absent). */
  private readonly absH: Float64Array;
  private readonly absS: Float64Array;

  constructor(ranges: CpRange[], label: string | undefined, requirePositiveCp: boolean) {
    this.label = label;
    this.ranges = Object.freeze(ranges);
    this.TminK = ranges[0]!.TminK;
    this.TmaxK = ranges[ranges.length - 1]!.TmaxK;
    this.referenceExtrapolated = !(REFERENCE_T_K >= this.TminK && REFERENCE_T_K <= this.TmaxK);

    const pieces: { lo: number; hi: number; c: ReturnType<typeof rangePieces>[number]["c"]; range: number }[] = [];
    ranges.forEach((r, ri) => {
      for (const p of rangePieces(r)) pieces.push({ ...p, range: ri });
    });
    // shared boundaries (within tolerance) become exact: each piece ends where the next starts
    for (let i = 0; i + 1 < pieces.length; i++) pieces[i + 1]!.lo = pieces[i]!.hi;
    const n = pieces.length;
    this.n = n;
    this.k = new Float64Array(n * STRIDE);
    this.upper = new Float64Array(n);
    this.lowerX = new Float64Array(n);
    this.upperX = new Float64Array(n);
    this.rangeOf = new Int32Array(n);
    pieces.forEach((p, i) => {
      writeSegment(this.k, i * STRIDE, p.c);
      this.upper[i] = p.hi;
      this.lowerX[i] = i === 0 ? -Infinity : p.lo;
      this.upperX[i] = i === n - 1 ? Infinity : p.hi;
      this.rangeOf[i] = p.range;
    });
    // chain the constants so that H and S antiderivatives are continuous, then zero them at 298.15 K
    for (let i = 1; i < n; i++) {
      const b = this.upper[i - 1]!;
      const o = i * STRIDE, p = (i - 1) * STRIDE;
      this.k[o + H_0] = hAt(this.k, p, b) - hAt(this.k, o, b);
      this.k[o + S_0] = sAt(this.k, p, b) - sAt(this.k, o, b);
    }
    const r = segmentIndex(this.upper, n, REFERENCE_T_K) * STRIDE;
    const h298 = hAt(this.k, r, REFERENCE_T_K);
    const s298 = sAt(this.k, r, REFERENCE_T_K);
    for (let i = 0; i < n; i++) {
      this.k[i * STRIDE + H_0]! -= h298;
      this.k[i * STRIDE + S_0]! -= s298;
    }
    this.absH = new Float64Array(n).fill(NaN);
    this.absS = new Float64Array(n).fill(NaN);
    let all = true;
    ranges.forEach((rg) => {
      if (absoluteConstants(rg.cp) === null) all = false;
    });
    for (let i = 0; i < n; i++) {
      const c = absoluteConstants(ranges[this.rangeOf[i]!]!.cp);
      if (c === null) continue;
      this.absH[i] = c.hConstJPerMol - this.k[i * STRIDE + H_0]!;
      this.absS[i] = c.sConstJPerMolK - this.k[i * STRIDE + S_0]!;
    }
    this.hasAbsoluteConstants = all;
    this.checkValues(requirePositiveCp);
    Object.freeze(this);
  }

  /**
   * Cp must be finite and > 0, and H and S finite, over every segment (checked at its ends and
   * 7 interior points): coefficients like 1e308 or a negative Cp are INVALID_DATA, never NaN later.
   */
  private checkValues(requirePositiveCp: boolean): void {
    for (let i = 0; i < this.n; i++) {
      const lo = i === 0 ? this.TminK : this.upper[i - 1]!;
      const hi = this.upper[i]!;
      const o = i * STRIDE;
      for (let j = 0; j <= 8; j++) {
        const T = j === 8 ? hi : lo + ((hi - lo) * j) / 8;
        const cp = cpAt(this.k, o, T);
        const bad = !Number.isFinite(cp) ? `Cp is not finite at ${T} K`
          : requirePositiveCp && !(cp > 0) ? `Cp is not positive at ${T} K (${cp} J/(mol·K))`
          : !Number.isFinite(hAt(this.k, o, T)) || !Number.isFinite(sAt(this.k, o, T)) ? `the H and S integrals are not finite at ${T} K` : null;
        if (bad !== null) {
          const range = this.rangeOf[i]!;
          throw new RxthermError(
            "INVALID_DATA",
            `createHeatCapacity${this.label ? ` (${this.label})` : ""}: ${bad}`,
            { label: this.label, path: ["ranges", range, "cp"], T, cp, issues: [{ path: ["ranges", range, "cp"], message: bad }] },
          );
        }
      }
    }
  }

  // ── scalar evaluations ────────────────────────────────────────────────────
  cp(T: number, options?: RangeOptions): number {
    if (!(typeof T === "number" && T >= this.TminK && T <= this.TmaxK)) this.check("cp", T, options);
    return cpAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T);
  }

  cpDetailed(T: number, options?: RangeOptions): HeatCapacityValue {
    const extrapolated = this.check("cpDetailed", T, options);
    return { value: cpAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T), extrapolated };
  }

  sensibleEnthalpy(T: number, options?: RangeOptions): number {
    if (!(typeof T === "number" && T >= this.TminK && T <= this.TmaxK)) this.check("sensibleEnthalpy", T, options);
    return hAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T);
  }

  sensibleEntropy(T: number, options?: RangeOptions): number {
    if (!(typeof T === "number" && T >= this.TminK && T <= this.TmaxK)) this.check("sensibleEntropy", T, options);
    return sAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T);
  }

  deltaH(T1: number, T2: number, options?: RangeOptions): number {
    if (!(typeof T1 === "number" && T1 >= this.TminK && T1 <= this.TmaxK)) this.check("deltaH", T1, options);
    if (!(typeof T2 === "number" && T2 >= this.TminK && T2 <= this.TmaxK)) this.check("deltaH", T2, options);
    return this.h(T2) - this.h(T1);
  }

  deltaHDetailed(T1: number, T2: number, options?: RangeOptions): HeatCapacityValue {
    const x1 = this.check("deltaHDetailed", T1, options);
    const x2 = this.check("deltaHDetailed", T2, options);
    return { value: this.h(T2) - this.h(T1), extrapolated: x1 || x2 };
  }

  deltaS(T1: number, T2: number, options?: RangeOptions): number {
    if (!(typeof T1 === "number" && T1 >= this.TminK && T1 <= this.TmaxK)) this.check("deltaS", T1, options);
    if (!(typeof T2 === "number" && T2 >= this.TminK && T2 <= this.TmaxK)) this.check("deltaS", T2, options);
    return this.s(T2) - this.s(T1);
  }

  deltaSDetailed(T1: number, T2: number, options?: RangeOptions): HeatCapacityValue {
    const x1 = this.check("deltaSDetailed", T1, options);
    const x2 = this.check("deltaSDetailed", T2, options);
    return { value: this.s(T2) - this.s(T1), extrapolated: x1 || x2 };
  }

  meanCp(T1: number, T2: number, options?: RangeOptions): number {
    this.check("meanCp", T1, options);
    this.check("meanCp", T2, options);
    if (T1 === T2) return cpAt(this.k, segmentIndex(this.upper, this.n, T1) * STRIDE, T1);
    return (this.h(T2) - this.h(T1)) / (T2 - T1);
  }

  absoluteEnthalpy(T: number, options?: RangeOptions): number {
    this.check("absoluteEnthalpy", T, options);
    const i = segmentIndex(this.upper, this.n, T);
    const c = this.absH[i]!;
    if (Number.isNaN(c)) throw this.missing("absoluteEnthalpy", T, i);
    return hAt(this.k, i * STRIDE, T) + c;
  }

  absoluteEntropy(T: number, options?: RangeOptions): number {
    this.check("absoluteEntropy", T, options);
    const i = segmentIndex(this.upper, this.n, T);
    const c = this.absS[i]!;
    if (Number.isNaN(c)) throw this.missing("absoluteEntropy", T, i);
    return sAt(this.k, i * STRIDE, T) + c;
  }

  // ── batch evaluations ─────────────────────────────────────────────────────
  cpBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array {
    this.checkArrays("cpBatch", temperaturesK, out);
    const sorted = this.checkTemperatures("cpBatch", temperaturesK, options);
    const res = out ?? new Float64Array(temperaturesK.length);
    const k = this.k, len = temperaturesK.length, n = this.n;
    if (sorted) {
      for (let j = 0, end = 0; j < len; j = end) {
        const i = segmentIndex(this.upper, n, temperaturesK[j]!);
        end = this.runEnd(temperaturesK, j, i);
        cpRun(temperaturesK, res, k, i * STRIDE, j, end);
      }
      return res;
    }
    // one run per segment with the coefficients in locals, as in hBatch
    let j = 0;
    while (j < len) {
      const i = segmentIndex(this.upper, n, temperaturesK[j]!);
      const lo = this.lowerX[i]!, hi = this.upperX[i]!;
      const o = i * STRIDE;
      const c0 = k[o + CP_0]!, c1 = k[o + CP_1]!, c2 = k[o + CP_2]!, c3 = k[o + CP_3]!, c4 = k[o + CP_4]!, m1 = k[o + CP_M1]!, m2 = k[o + CP_M2]!;
      for (; j < len; j++) {
        const T = temperaturesK[j]!;
        if (!(T > lo && T <= hi)) break;
        const inv = 1 / T;
        res[j] = c0 + T * (c1 + T * (c2 + T * (c3 + T * c4))) + inv * (m1 + inv * m2);
      }
    }
    return res;
  }

  deltaHBatch(fromK: number, temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array {
    this.check("deltaHBatch", fromK, options);
    this.checkArrays("deltaHBatch", temperaturesK, out);
    const sorted = this.checkTemperatures("deltaHBatch", temperaturesK, options);
    const res = out ?? new Float64Array(temperaturesK.length);
    this.hBatch(temperaturesK, res, this.h(fromK), sorted);
    return res;
  }

  sensibleEnthalpyBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions, offsetJPerMol = 0): Float64Array {
    this.checkArrays("sensibleEnthalpyBatch", temperaturesK, out);
    const sorted = this.checkTemperatures("sensibleEnthalpyBatch", temperaturesK, options);
    const res = out ?? new Float64Array(temperaturesK.length);
    this.hBatch(temperaturesK, res, -offsetJPerMol, sorted);
    return res;
  }

  deltaSBatch(fromK: number, temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array {
    this.check("deltaSBatch", fromK, options);
    this.checkArrays("deltaSBatch", temperaturesK, out);
    const sorted = this.checkTemperatures("deltaSBatch", temperaturesK, options);
    const res = out ?? new Float64Array(temperaturesK.length);
    this.sBatch(temperaturesK, res, this.s(fromK), sorted);
    return res;
  }

  sensibleEntropyBatch(temperaturesK: Float64Array, out?: Float64Array, options?: RangeOptions, offsetJPerMolK = 0): Float64Array {
    this.checkArrays("sensibleEntropyBatch", temperaturesK, out);
    const sorted = this.checkTemperatures("sensibleEntropyBatch", temperaturesK, options);
    const res = out ?? new Float64Array(temperaturesK.length);
    this.sBatch(temperaturesK, res, -offsetJPerMolK, sorted);
    return res;
  }

  // ── private ───────────────────────────────────────────────────────────────
  /** The chained H antiderivative at a checked T. */
  private h(T: number): number {
    return hAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T);
  }

  /** The chained S antiderivative at a checked T. */
  private s(T: number): number {
    return sAt(this.k, segmentIndex(this.upper, this.n, T) * STRIDE, T);
  }

  /** Hot loop of the enthalpy batches: ∫Cp dT antiderivative minus `minus`, J/mol (`sorted`: checked sorted and in range). */
  private hBatch(ts: Float64Array, res: Float64Array, minus: number, sorted: boolean): void {
    const k = this.k, len = ts.length, n = this.n;
    if (sorted) {
      for (let j = 0, end = 0; j < len; j = end) {
        const i = segmentIndex(this.upper, n, ts[j]!);
        end = this.runEnd(ts, j, i);
        hRun(ts, res, k, i * STRIDE, minus, j, end);
      }
      return;
    }
    // One run per segment: the coefficients go into locals and an inner loop without the ln-term test
    // runs while T stays in the segment (a temperature sweep or an iteration stays in one segment for
    // long runs); leaving it ends the run and costs one lookup.
    let j = 0;
    while (j < len) {
      const i = segmentIndex(this.upper, n, ts[j]!);
      const lo = this.lowerX[i]!, hi = this.upperX[i]!;
      const o = i * STRIDE;
      const h0 = k[o + H_0]! - minus, h1 = k[o + H_1]!, h2 = k[o + H_2]!, h3 = k[o + H_3]!;
      const h4 = k[o + H_4]!, h5 = k[o + H_5]!, hi1 = k[o + H_INV]!, hl = k[o + H_LN]!;
      if (hl === 0) {
        for (; j < len; j++) {
          const T = ts[j]!;
          if (!(T > lo && T <= hi)) break;
          res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5)))) + hi1 / T;
        }
      } else {
        for (; j < len; j++) {
          const T = ts[j]!;
          if (!(T > lo && T <= hi)) break;
          res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5)))) + hi1 / T + hl * Math.log(T);
        }
      }
    }
  }

  /** Hot loop of the entropy batches: ∫Cp/T dT antiderivative minus `minus`, J/(mol·K) (`sorted`: checked sorted and in range). */
  private sBatch(ts: Float64Array, res: Float64Array, minus: number, sorted: boolean): void {
    const k = this.k, len = ts.length, n = this.n;
    if (sorted) {
      for (let j = 0, end = 0; j < len; j = end) {
        const i = segmentIndex(this.upper, n, ts[j]!);
        end = this.runEnd(ts, j, i);
        sRun(ts, res, k, i * STRIDE, minus, j, end);
      }
      return;
    }
    // one run per segment with the coefficients in locals, as in hBatch
    let j = 0;
    while (j < len) {
      const i = segmentIndex(this.upper, n, ts[j]!);
      const lo = this.lowerX[i]!, hi = this.upperX[i]!;
      const o = i * STRIDE;
      const s0 = k[o + S_0]! - minus, sl = k[o + S_LN]!, s1 = k[o + S_1]!, s2 = k[o + S_2]!, s3 = k[o + S_3]!, s4 = k[o + S_4]!;
      const si1 = k[o + S_INV]!, si2 = k[o + S_INV2]!;
      for (; j < len; j++) {
        const T = ts[j]!;
        if (!(T > lo && T <= hi)) break;
        const inv = 1 / T;
        res[j] = s0 + sl * Math.log(T) + T * (s1 + T * (s2 + T * (s3 + T * s4))) + inv * (si1 + inv * si2);
      }
    }
  }

  /** The temperatures and the output of a batch must be Float64Arrays, the output at least as long. */
  private checkArrays(fn: string, ts: Float64Array, out: Float64Array | undefined): void {
    if (!(ts instanceof Float64Array)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires temperaturesK as a Float64Array`, { label: this.label });
    }
    if (out !== undefined && (!(out instanceof Float64Array) || out.length < ts.length)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires out to be a Float64Array at least as long as temperaturesK (${ts.length})`, {
        label: this.label, length: ts.length, outLength: out instanceof Float64Array ? out.length : undefined,
      });
    }
  }

  /**
   * Check every temperature before anything is written (throws, or allows extrapolation). Returns true
   * when the batch is sorted and inside the data range: one pass that compares each temperature with
   * the one before (then the first with TminK, the last with TmaxK) checks both, and the evaluation
   * then runs segment by segment without a test per temperature. Otherwise false, after the range check.
   */
  private checkTemperatures(fn: string, ts: Float64Array, options: RangeOptions | undefined): boolean {
    const len = ts.length;
    const lo = this.TminK, hi = this.TmaxK;
    if (sortedWithin(ts, lo, hi)) return true;
    if (!allWithin(ts, lo, hi)) {
      // slow path: find each temperature outside the range (throws, or allows extrapolation)
      for (let j = 0; j < len; j++) {
        const T = ts[j]!;
        if (!(T >= lo && T <= hi)) this.check(fn, T, options, j);
      }
    }
    return false;
  }

  /** End (exclusive) of the run of a sorted batch that starts at j in segment i: the first T above the segment. */
  private runEnd(ts: Float64Array, j: number, i: number): number {
    if (i === this.n - 1) return ts.length;
    const bound = this.upper[i]!;
    let lo = j + 1, hi = ts.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (ts[mid]! > bound) hi = mid;
      else lo = mid + 1;
    }
    return lo;
  }

  /** Validate T; return true when it is outside the range (and extrapolation is allowed). */
  private check(fn: string, T: number, options: RangeOptions | undefined, index?: number): boolean {
    if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
      throw new RxthermError(
        "INVALID_ARGUMENT",
        `${fn}${this.label ? ` (${this.label})` : ""} requires a finite temperature > 0 K, got ${describeValue(T)}`,
        index === undefined ? { label: this.label, T } : { label: this.label, T, index },
      );
    }
    if (T >= this.TminK && T <= this.TmaxK) return false;
    if (options?.extrapolate === true) return true;
    const range = [this.TminK, this.TmaxK];
    throw new RxthermError(
      "OUT_OF_RANGE",
      `${fn}${this.label ? ` (${this.label})` : ""}: ${T} K is outside the data range [${this.TminK}, ${this.TmaxK}] K${withSlipHint(T)}; pass { extrapolate: true } to extend the nearest range`,
      index === undefined ? { label: this.label, T, range, ...slipHintDetails(T) } : { label: this.label, T, range, index, ...slipHintDetails(T) },
    );
  }

  private missing(fn: string, T: number, segment: number): RxthermError {
    const rangeIndex = this.rangeOf[segment]!;
    const r = this.ranges[rangeIndex]!;
    return new RxthermError(
      "MISSING_DATA",
      `${fn}${this.label ? ` (${this.label})` : ""}: the ${r.cp.form} form of range [${r.TminK}, ${r.TmaxK}] K carries no absolute integration constant`,
      { label: this.label, T, rangeIndex, form: r.cp.form },
    );
  }
}


// ── runs of a sorted batch inside one segment ────────────────────────────────
// ts[j..end) are known to lie in the segment at offset o: no range test per temperature. A term
// whose coefficient is exactly 0 (the T⁴ and 1/T terms of a Shomate Cp, the T⁵ and ln T terms of
// its H; the 1/T terms of NASA-7) is left out, which changes no value (x + 0·T = x); otherwise the
// Horner forms are those of cpAt, hAt and sAt.

/** Cp of ts[j..end) into res, in the segment at offset o. */
function cpRun(ts: Float64Array, res: Float64Array, k: Float64Array, o: number, j: number, end: number): void {
  const c0 = k[o + CP_0]!, c1 = k[o + CP_1]!, c2 = k[o + CP_2]!, c3 = k[o + CP_3]!, c4 = k[o + CP_4]!, m1 = k[o + CP_M1]!, m2 = k[o + CP_M2]!;
  if (m1 === 0 && m2 === 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = c0 + T * (c1 + T * (c2 + T * (c3 + T * c4)));
    }
  } else if (m1 === 0 && c4 === 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      const inv = 1 / T;
      res[j] = c0 + T * (c1 + T * (c2 + T * c3)) + inv * (inv * m2);
    }
  } else {
    for (; j < end; j++) {
      const T = ts[j]!;
      const inv = 1 / T;
      res[j] = c0 + T * (c1 + T * (c2 + T * (c3 + T * c4))) + inv * (m1 + inv * m2);
    }
  }
}

/** The H antiderivative minus `minus` of ts[j..end) into res, in the segment at offset o. */
function hRun(ts: Float64Array, res: Float64Array, k: Float64Array, o: number, minus: number, j: number, end: number): void {
  const h0 = k[o + H_0]! - minus, h1 = k[o + H_1]!, h2 = k[o + H_2]!, h3 = k[o + H_3]!;
  const h4 = k[o + H_4]!, h5 = k[o + H_5]!, hi1 = k[o + H_INV]!, hl = k[o + H_LN]!;
  if (hl !== 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5)))) + hi1 / T + hl * Math.log(T);
    }
  } else if (h5 === 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * h4))) + hi1 / T;
    }
  } else if (hi1 === 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5))));
    }
  } else {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5)))) + hi1 / T;
    }
  }
}

/** The S antiderivative minus `minus` of ts[j..end) into res, in the segment at offset o. */
function sRun(ts: Float64Array, res: Float64Array, k: Float64Array, o: number, minus: number, j: number, end: number): void {
  const s0 = k[o + S_0]! - minus, sl = k[o + S_LN]!, s1 = k[o + S_1]!, s2 = k[o + S_2]!, s3 = k[o + S_3]!, s4 = k[o + S_4]!;
  const si1 = k[o + S_INV]!, si2 = k[o + S_INV2]!;
  if (si1 === 0 && si2 === 0) {
    for (; j < end; j++) {
      const T = ts[j]!;
      res[j] = s0 + sl * Math.log(T) + T * (s1 + T * (s2 + T * (s3 + T * s4)));
    }
  } else {
    for (; j < end; j++) {
      const T = ts[j]!;
      const inv = 1 / T;
      res[j] = s0 + sl * Math.log(T) + T * (s1 + T * (s2 + T * (s3 + T * s4))) + inv * (si1 + inv * si2);
    }
  }
}
