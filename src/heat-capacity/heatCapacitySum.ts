/**
 * Private: a weighted sum of heat-capacity models evaluated as ONE polynomial per temperature (the
 * enthalpy and Cp of a mixture of fixed composition, e.g. the products of complete combustion).
 *
 * Every model made by createHeatCapacity is one canonical polynomial per segment, so a weighted sum
 * is one canonical polynomial on each interval between the union of the models' segment
 * boundaries. The weights may move linearly with a parameter u (wᵢ + u·vᵢ: the products of a flame
 * against the amount of oxidizer): the sums Σ wᵢ·(coefficients) and Σ vᵢ·(coefficients) of an interval
 * are formed once, the first time an evaluation lands in it, and a new u costs one multiply-add per
 * coefficient of each interval visited afterwards (a root search visits one or two). Not re-exported
 * from src/index.ts.
 *
 * @module
 * @internal
 */
import * as compiled from "./internal/cpCompile.js";
import { compiledSegmentsOf, type CompiledSegments, type HeatCapacity } from "./createHeatCapacity.js";

// module-local aliases (see createHeatCapacity.ts)
const STRIDE = compiled.STRIDE, segmentIndex = compiled.segmentIndex, hAt = compiled.hAt;
const H_0 = compiled.H_0, H_1 = compiled.H_1, H_2 = compiled.H_2, H_3 = compiled.H_3, H_4 = compiled.H_4, H_5 = compiled.H_5;
const H_INV = compiled.H_INV, H_LN = compiled.H_LN;
const CP_0 = compiled.CP_0, CP_1 = compiled.CP_1, CP_2 = compiled.CP_2, CP_3 = compiled.CP_3, CP_4 = compiled.CP_4;
const CP_M1 = compiled.CP_M1, CP_M2 = compiled.CP_M2;

/** The slots that are summed, in the order they are kept per interval. */
const SLOTS = [H_0, H_1, H_2, H_3, H_4, H_5, H_INV, H_LN, CP_0, CP_1, CP_2, CP_3, CP_4, CP_M1, CP_M2] as const;
/** SLOTS.length (enthalpy below names the 15 slots by their place in SLOTS). */
const WIDTH = 15;

/**
 * Σ Wᵢ·(cᵢ + Hᵢ(T)) and Σ Wᵢ·Cpᵢ(T) over models i, with weights Wᵢ = wᵢ + u·vᵢ, Hᵢ the sensible enthalpy
 * from 298.15 K (J/mol) and cᵢ a constant of each model (e.g. ΔfH°); each model's nearest segment is
 * extended beyond its data (no range checks: the caller checks ranges).
 * @internal
 */
export interface HeatCapacitySum {
  /** Set wᵢ (one per model, e.g. mol), the constants cᵢ (J/mol) and the slopes vᵢ (default 0); u becomes 0. */
  setWeights(weights: ArrayLike<number>, constants: ArrayLike<number>, slopes?: ArrayLike<number>): void;
  /** Set u (the weights become wᵢ + u·vᵢ). */
  setParameter(u: number): void;
  /** Σ Wᵢ·(cᵢ + Hᵢ(T)), J; also sets {@link HeatCapacitySum.cp} at the same T. */
  enthalpy(T: number): number;
  /** Σ Wᵢ·Cpᵢ at the temperature of the last {@link HeatCapacitySum.enthalpy} call, J/K. */
  readonly cp: number;
  /** Σ |Wᵢ·(cᵢ + Hᵢ(T))| (each model on its own: the scale of a balance's residual), J. */
  magnitude(T: number): number;
}

/** Most interior boundaries of a sum (tabulated forms with many points are left to the models themselves). */
const MAX_BOUNDARIES = 64;

/**
 * The weighted sum of `models`, or null when one of them was not made by createHeatCapacity or the
 * union of their segment boundaries holds more than 64 temperatures.
 * @internal
 */
export function heatCapacitySum(models: readonly HeatCapacity[]): HeatCapacitySum | null {
  const segs: CompiledSegments[] = [];
  const cuts = new Set<number>();
  for (const m of models) {
    const s = compiledSegmentsOf(m);
    if (s === null) return null;
    segs.push(s);
    for (let i = 0; i + 1 < s.n; i++) cuts.add(s.upper[i]!);
  }
  if (cuts.size > MAX_BOUNDARIES) return null;
  return new SummedModels(segs, Float64Array.from([...cuts].sort((x, y) => x - y)));
}

class SummedModels implements HeatCapacitySum {
  cp = 0;
  /** Interior boundaries of the union, ascending (K); interval j is (b[j−1], b[j]], the end ones open. */
  private readonly b: Float64Array;
  private readonly m: number;
  private readonly count: number;
  private readonly segs: readonly CompiledSegments[];
  /** The summed slots of model i's segment on interval j, at [(j·count + i)·WIDTH ...]. */
  private readonly packed: Float64Array;
  /** Σ wᵢ·slots and Σ vᵢ·slots of interval j at [j·2·WIDTH ...], valid when baseStamp[j] === weightGeneration. */
  private readonly base: Float64Array;
  private readonly baseStamp: Int32Array;
  private weightGeneration = 1;
  /** Σ Wᵢ·slots of interval j at [j·WIDTH ...], valid when stamp[j] === generation. */
  private readonly sums: Float64Array;
  private readonly stamp: Int32Array;
  private generation = 1;
  private readonly w: Float64Array;
  private readonly v: Float64Array;
  private readonly cs: Float64Array;
  private u = 0;

  constructor(segs: readonly CompiledSegments[], boundaries: Float64Array) {
    this.b = boundaries;
    this.segs = segs;
    this.m = this.b.length;
    this.count = segs.length;
    this.packed = new Float64Array((this.m + 1) * this.count * WIDTH);
    for (let j = 0; j <= this.m; j++) {
      for (let i = 0; i < this.count; i++) {
        const s = segs[i]!;
        // every model boundary is a boundary of the union, so one T of the interval picks the segment
        const o = (j < this.m ? segmentIndex(s.upper, s.n, this.b[j]!) : s.n - 1) * STRIDE;
        const p = (j * this.count + i) * WIDTH;
        for (let q = 0; q < WIDTH; q++) this.packed[p + q] = s.k[o + SLOTS[q]!]!;
      }
    }
    this.base = new Float64Array((this.m + 1) * 2 * WIDTH);
    this.baseStamp = new Int32Array(this.m + 1);
    this.sums = new Float64Array((this.m + 1) * WIDTH);
    this.stamp = new Int32Array(this.m + 1);
    this.w = new Float64Array(this.count);
    this.v = new Float64Array(this.count);
    this.cs = new Float64Array(this.count);
  }

  setWeights(weights: ArrayLike<number>, constants: ArrayLike<number>, slopes?: ArrayLike<number>): void {
    for (let i = 0; i < this.count; i++) {
      this.w[i] = weights[i]!;
      this.v[i] = slopes === undefined ? 0 : slopes[i]!;
      this.cs[i] = constants[i]!;
    }
    this.u = 0;
    this.weightGeneration++;
    this.generation++;
  }

  setParameter(u: number): void {
    this.u = u;
    this.generation++;
  }

  enthalpy(T: number): number {
    const b = this.b, m = this.m;
    let j = 0;
    while (j < m && T > b[j]!) j++;
    if (this.stamp[j] !== this.generation) this.fill(j);
    const s = this.sums, o = j * WIDTH;
    const inv = 1 / T;
    this.cp = s[o + 8]! + T * (s[o + 9]! + T * (s[o + 10]! + T * (s[o + 11]! + T * s[o + 12]!))) + inv * (s[o + 13]! + inv * s[o + 14]!);
    let h = s[o]! + T * (s[o + 1]! + T * (s[o + 2]! + T * (s[o + 3]! + T * (s[o + 4]! + T * s[o + 5]!)))) + s[o + 6]! * inv;
    const l = s[o + 7]!;
    if (l !== 0) h += l * Math.log(T);
    return h;
  }

  magnitude(T: number): number {
    let sum = 0;
    for (let i = 0; i < this.count; i++) {
      const s = this.segs[i]!;
      sum += Math.abs((this.w[i]! + this.u * this.v[i]!) * (this.cs[i]! + hAt(s.k, segmentIndex(s.upper, s.n, T) * STRIDE, T)));
    }
    return sum;
  }

  /** Σ Wᵢ·slots of interval j at the current u (its Σ wᵢ·slots and Σ vᵢ·slots formed first when needed). */
  private fill(j: number): void {
    const base = this.base, bo = j * 2 * WIDTH;
    if (this.baseStamp[j] !== this.weightGeneration) {
      let cw = 0, cv = 0;
      for (let i = 0; i < this.count; i++) {
        cw += this.w[i]! * this.cs[i]!;
        cv += this.v[i]! * this.cs[i]!;
      }
      for (let q = 0; q < WIDTH; q++) {
        let aw = q === 0 ? cw : 0, av = q === 0 ? cv : 0;
        for (let i = 0, r = j * this.count * WIDTH + q; i < this.count; i++, r += WIDTH) {
          aw += this.w[i]! * this.packed[r]!;
          av += this.v[i]! * this.packed[r]!;
        }
        base[bo + q] = aw;
        base[bo + WIDTH + q] = av;
      }
      this.baseStamp[j] = this.weightGeneration;
    }
    // the 15 slots written out (this runs once per interval visited at each new u)
    const s = this.sums, o = j * WIDTH, u = this.u, v = bo + WIDTH;
    s[o] = base[bo]! + u * base[v]!; s[o + 1] = base[bo + 1]! + u * base[v + 1]!; s[o + 2] = base[bo + 2]! + u * base[v + 2]!;
    s[o + 3] = base[bo + 3]! + u * base[v + 3]!; s[o + 4] = base[bo + 4]! + u * base[v + 4]!; s[o + 5] = base[bo + 5]! + u * base[v + 5]!;
    s[o + 6] = base[bo + 6]! + u * base[v + 6]!; s[o + 7] = base[bo + 7]! + u * base[v + 7]!; s[o + 8] = base[bo + 8]! + u * base[v + 8]!;
    s[o + 9] = base[bo + 9]! + u * base[v + 9]!; s[o + 10] = base[bo + 10]! + u * base[v + 10]!; s[o + 11] = base[bo + 11]! + u * base[v + 11]!;
    s[o + 12] = base[bo + 12]! + u * base[v + 12]!; s[o + 13] = base[bo + 13]! + u * base[v + 13]!; s[o + 14] = base[bo + 14]! + u * base[v + 14]!;
    this.stamp[j] = this.generation;
  }
}
