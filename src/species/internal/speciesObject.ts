/**
 * Private: the Species object built from one validated species entry. The hot path
 * (`enthalpy(T)`) is one range test, one compiled polynomial evaluation and, for the rare
 * species with a phase transition inside its range, a short loop: no allocation, no zod.
 *
 * @module
 * @internal
 */
import Decimal from "decimal.js";
import { RxthermError } from "../../errors.js";
import { createHeatCapacity, type HeatCapacity } from "../../heat-capacity/createHeatCapacity.js";
import type { CpRange, RangeOptions } from "../../heat-capacity/types.js";
import type { Formula, Phase } from "../../formula/types.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K } from "../../units.js";
import type { SpeciesEntry } from "../schema.js";
import type { Species, SpeciesEvaluation, SpeciesTransition } from "../types.js";
import { readSpeciesFormula } from "./speciesFormula.js";
import { deepFreeze, describeValue } from "../../guards.js";

const D = /* @__PURE__ */ Decimal.clone({ precision: 34, rounding: Decimal.ROUND_HALF_EVEN });
const EXTEND: RangeOptions = Object.freeze({ extrapolate: true });
const LN_STANDARD_PRESSURE = Math.log(STANDARD_PRESSURE_PA);

/** Build the Species of a validated entry (the entry is copied, never kept). */
export function buildSpecies(entry: SpeciesEntry): Species {
  return new TabulatedSpecies(entry);
}

class TabulatedSpecies implements Species {
  readonly key: string;
  readonly formula: Formula;
  readonly phase: Phase;
  readonly name?: string;
  readonly aliases: readonly string[];
  readonly dataset?: string;
  readonly note?: string;
  readonly hf298: number;
  readonly hf298Exact: string;
  readonly hf298Uncertainty?: number;
  readonly s298: number;
  readonly range: readonly [number, number];
  readonly sources: Readonly<Record<string, string>>;
  readonly transitions: readonly SpeciesTransition[];
  readonly cpRanges: readonly CpRange[];
  private readonly model: HeatCapacity;
  private readonly tMin: number;
  private readonly tMax: number;
  private readonly gas: boolean;
  private readonly trT: Float64Array;
  private readonly trH: Float64Array;
  private readonly trS: Float64Array;

  constructor(e: SpeciesEntry) {
    this.key = e.key;
    const reading = readSpeciesFormula(e.formula, e.phase);
    if (!reading.ok) throw new RxthermError("INVALID_DATA", `species ${e.key}: ${reading.problem}`, { species: e.key });
    this.formula = reading.formula;
    this.phase = e.phase;
    if (e.name !== undefined) this.name = e.name;
    this.aliases = Object.freeze([...(e.aliases ?? [])]);
    if (e.dataset !== undefined) this.dataset = e.dataset;
    if (e.note !== undefined) this.note = e.note;
    const exact = new D(String(e.hf298KJPerMol)).times(1000);
    this.hf298Exact = exact.isZero() ? "0" : exact.toFixed(); // no "-0"
    this.hf298 = Number(this.hf298Exact);
    if (e.hf298UncertaintyKJPerMol !== undefined) this.hf298Uncertainty = e.hf298UncertaintyKJPerMol * 1000;
    this.s298 = e.s298JPerMolK;
    const sources: Record<string, string> = { hf298: e.hf298Source, s298: e.s298Source, cp: e.heatCapacity.source };
    e.heatCapacity.ranges.forEach((r, i) => {
      if (r.source !== undefined) sources[`cp.ranges.${i}`] = r.source;
    });
    (e.transitions ?? []).forEach((t, i) => {
      sources[`transitions.${i}`] = t.source;
    });
    this.sources = Object.freeze(sources);
    // Data that start between 298.15 K and 300 K (the NASA convention) are read down to 298.15 K
    // with the lowest range's form, so that the reference state itself is inside the range.
    const ranges: CpRange[] = e.heatCapacity.ranges.map((r) => Object.freeze({ TminK: r.TminK, TmaxK: r.TmaxK, cp: deepFreeze(structuredClone(r.cp)) }));
    const lowest = ranges[0]!;
    if (lowest.TminK > STANDARD_TEMPERATURE_K) ranges[0] = Object.freeze({ ...lowest, TminK: STANDARD_TEMPERATURE_K });
    this.cpRanges = Object.freeze(ranges);
    this.model = createHeatCapacity(ranges, { label: e.key });
    this.tMin = this.model.TminK;
    this.tMax = this.model.TmaxK;
    this.range = Object.freeze([this.tMin, this.tMax] as const);
    this.gas = e.phase === "g";
    const tr = [...(e.transitions ?? [])].sort((a, b) => a.TK - b.TK);
    this.transitions = Object.freeze(tr.map((t) => Object.freeze({
      TK: t.TK, dHJPerMol: t.dHKJPerMol * 1000, source: t.source, ...(t.label !== undefined ? { label: t.label } : {}),
    })));
    // transitions are counted relative to 298.15 K: above it they add when T passes them,
    // below it they are removed when T goes under them
    this.trT = Float64Array.from(tr.map((t) => t.TK));
    this.trH = Float64Array.from(tr.map((t) => t.dHKJPerMol * 1000));
    this.trS = Float64Array.from(tr.map((t) => (t.dHKJPerMol * 1000) / t.TK));
    Object.freeze(this);
  }

  cp(T: number, options?: RangeOptions): number {
    if (!(T >= this.tMin && T <= this.tMax)) this.check("cp", T, options);
    return this.model.cp(T, EXTEND);
  }

  enthalpy(T: number, options?: RangeOptions): number {
    if (!(T >= this.tMin && T <= this.tMax)) this.check("enthalpy", T, options);
    if (T === STANDARD_TEMPERATURE_K) return this.hf298; // exactly ΔfH°, no rounding residue
    let h = this.hf298 + this.model.sensibleEnthalpy(T, EXTEND);
    if (this.trT.length !== 0) h += this.transitionSum(T, this.trH);
    return h;
  }

  entropy(T: number, P?: number, options?: RangeOptions): number {
    if (!(T >= this.tMin && T <= this.tMax)) this.check("entropy", T, options);
    return this.s(T, this.pressureTerm("entropy", P));
  }

  gibbs(T: number, P?: number, options?: RangeOptions): number {
    if (!(T >= this.tMin && T <= this.tMax)) this.check("gibbs", T, options);
    const pt = this.pressureTerm("gibbs", P);
    return this.h(T) - T * this.s(T, pt);
  }

  evaluate(T: number, P?: number, options?: RangeOptions): SpeciesEvaluation {
    const extrapolated = !(T >= this.tMin && T <= this.tMax) && this.check("evaluate", T, options);
    const pt = this.pressureTerm("evaluate", P);
    const enthalpy = this.h(T);
    const entropy = this.s(T, pt);
    return Object.freeze({
      T, P: P ?? STANDARD_PRESSURE_PA, cp: this.model.cp(T, EXTEND), enthalpy, entropy, gibbs: enthalpy - T * entropy, extrapolated,
    });
  }

  private h(T: number): number {
    if (T === STANDARD_TEMPERATURE_K) return this.hf298;
    let h = this.hf298 + this.model.sensibleEnthalpy(T, EXTEND);
    if (this.trT.length !== 0) h += this.transitionSum(T, this.trH);
    return h;
  }

  private s(T: number, pressureTerm: number): number {
    let s = this.s298 + this.model.sensibleEntropy(T, EXTEND) - pressureTerm;
    if (this.trT.length !== 0) s += this.transitionSum(T, this.trS);
    return s;
  }

  /** Σ of the transition steps between 298.15 K and T (signed: removed below 298.15 K). */
  private transitionSum(T: number, steps: Float64Array): number {
    let sum = 0;
    for (let i = 0; i < this.trT.length; i++) {
      const tt = this.trT[i]!;
      if (tt >= STANDARD_TEMPERATURE_K) {
        if (T > tt) sum += steps[i]!;
      } else if (T <= tt) {
        sum -= steps[i]!;
      }
    }
    return sum;
  }

  /** R·ln(P/P°) for gases (ideal), 0 for condensed phases (pressure effect neglected). */
  private pressureTerm(fn: string, P: number | undefined): number {
    if (P === undefined) return 0;
    if (typeof P !== "number" || !Number.isFinite(P) || P <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires a finite pressure > 0 Pa, got ${describeValue(P)}`, { species: this.key, P });
    }
    // ln P − ln P° rather than ln(P/P°): the quotient underflows to 0 for P near 5e-324 Pa
    return this.gas ? GAS_CONSTANT_J_PER_MOL_K * (Math.log(P) - LN_STANDARD_PRESSURE) : 0;
  }

  /** Validate T; true when outside the range and extrapolation is allowed; otherwise throws. */
  private check(fn: string, T: number, options: RangeOptions | undefined): boolean {
    if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires a finite temperature > 0 K, got ${describeValue(T)}`, { species: this.key, T });
    }
    if (T >= this.tMin && T <= this.tMax) return false;
    if (options?.extrapolate === true) return true;
    throw new RxthermError(
      "OUT_OF_RANGE",
      `${fn} (${this.key}): ${T} K is outside the data range [${this.tMin}, ${this.tMax}] K; pass { extrapolate: true } to extend the nearest range`,
      { species: this.key, T, range: [this.tMin, this.tMax] },
    );
  }
}
