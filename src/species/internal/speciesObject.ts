/**
 * Private: the Species object built from one species entry. The hot path (`enthalpy(T)`) is one
 * range test, one compiled polynomial evaluation and, for the rare species with a phase transition
 * inside its range, a short loop: no allocation, no zod. The compiled heat-capacity model is built
 * on the first evaluation, so that a library of a thousand species costs little until used.
 * Everything that is not a documented {@link Species} field is held in private (`#`) fields, which
 * are not properties: `Object.keys(species)` lists only the documented fields.
 *
 * @module
 * @internal
 */
import { decimalTimes, decimalToPlainText, exactDecimalOfNumber } from "../../numeric/exactDecimal.js";
import { RxthermError, deepFreeze, describeValue } from "../../errors.js";
import { createHeatCapacity, type HeatCapacity } from "../../heat-capacity/createHeatCapacity.js";
import type { CpForm, CpRange, RangeOptions } from "../../heat-capacity/types.js";
import type { Formula, Phase } from "../../formula/types.js";
import { GAS_CONSTANT_J_PER_MOL_K, STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K, slipHintDetails, withSlipHint } from "../../units.js";
import type { SpeciesEntry } from "../schema.js";
import type { Species, SpeciesEvaluation, SpeciesTransition } from "../types.js";
import { readSpeciesFormula } from "./speciesFormula.js";
import { speciesView } from "./speciesView.js";
import { JUPYTER_DISPLAY, RESULT_VIEW } from "../../view/displaySymbols.js";
import { viewMimeBundle } from "../../view/renderView.js";
import type { MimeBundle, ResultView } from "../../view/types.js";

const EXTEND: RangeOptions = /* @__PURE__ */ Object.freeze({ extrapolate: true });
const NO_TRANSITIONS: readonly SpeciesTransition[] = /* @__PURE__ */ Object.freeze([]);
const NO_STEPS = /* @__PURE__ */ new Float64Array(0);
/** Data whose lowest range starts by this temperature (the NASA 300 K convention) are read down to 298.15 K. */
const NASA_LOW_K = 300;
const LN_STANDARD_PRESSURE = /* @__PURE__ */ Math.log(STANDARD_PRESSURE_PA);

/**
 * Everything a species is made of, already checked (by the schema and the validator, or by the
 * test suite for generated data). Ranges sorted by temperature and contiguous.
 */
export interface SpeciesParts {
  readonly key: string;
  readonly formula: Formula;
  readonly phase: Phase;
  readonly name?: string;
  readonly aliases: readonly string[];
  readonly cas?: string;
  readonly dataset?: string;
  readonly note?: string;
  /** ΔfH°(298.15 K) as exact decimal text in J/mol. */
  readonly hf298Exact: string;
  readonly hf298UncertaintyJPerMol?: number;
  /** S°(298.15 K), J/(mol·K). */
  readonly s298: number;
  readonly sources: Readonly<Record<string, string>>;
  readonly ranges: readonly CpRange[];
  readonly transitions: readonly { TK: number; dHKJPerMol: number; label?: string; source: string }[];
}

/** Build the Species of a validated entry (the entry is copied, never kept). */
export function buildSpecies(e: SpeciesEntry): Species {
  const reading = readSpeciesFormula(e.formula, e.phase);
  if (!reading.ok) throw new RxthermError("INVALID_DATA", `species ${e.key}: ${reading.problem}`, { species: e.key });
  const exact = decimalToPlainText(decimalTimes(exactDecimalOfNumber(e.hf298KJPerMol), { m: 1000n, e: 0 }));
  const sources: Record<string, string> = { hf298: e.hf298Source, s298: e.s298Source, cp: e.heatCapacity.source };
  e.heatCapacity.ranges.forEach((r, i) => {
    if (r.source !== undefined) sources[`cp.ranges.${i}`] = r.source;
  });
  (e.transitions ?? []).forEach((t, i) => {
    sources[`transitions.${i}`] = t.source;
  });
  return buildSpeciesFromParts({
    key: e.key,
    formula: reading.formula,
    phase: e.phase,
    ...(e.name !== undefined ? { name: e.name } : {}),
    aliases: e.aliases ?? [],
    ...(e.cas !== undefined ? { cas: e.cas } : {}),
    ...(e.dataset !== undefined ? { dataset: e.dataset } : {}),
    ...(e.note !== undefined ? { note: e.note } : {}),
    hf298Exact: exact, // plain decimal text, never "-0"
    ...(e.hf298UncertaintyKJPerMol !== undefined ? { hf298UncertaintyJPerMol: e.hf298UncertaintyKJPerMol * 1000 } : {}),
    s298: e.s298JPerMolK,
    sources,
    ranges: [...e.heatCapacity.ranges].sort((a, b) => a.TminK - b.TminK)
      .map((r) => ({ TminK: r.TminK, TmaxK: r.TmaxK, cp: r.cp as CpForm })), // copied and frozen below
    transitions: e.transitions ?? [],
  });
}

/**
 * A copy of a checked Cp form: numbers, strings and arrays of numbers, one level deep (the shapes of
 * `CpForm`). Cheaper than `structuredClone` by an order of magnitude, which matters when a library of
 * a thousand species is built.
 */
function copyCpForm(cp: CpForm): CpForm {
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(cp)) {
    const v = (cp as unknown as Record<string, unknown>)[k];
    out[k] = Array.isArray(v) ? v.slice() : v;
  }
  return out as unknown as CpForm;
}

/** Build a Species from checked parts (the parts are copied or frozen, never changed). */
export function buildSpeciesFromParts(parts: SpeciesParts): Species {
  return new TabulatedSpecies(parts);
}

/**
 * The compiled heat-capacity model of a species built here whose H°(T) is `hf298` + the model's
 * sensible enthalpy and whose Cp° is the model's (no phase transitions), compiled on first use;
 * null for a species with transitions or an object not built here.
 */
export function speciesModelOf(sp: Species): HeatCapacity | null {
  return TabulatedSpecies.modelOf(sp);
}

// Built inside a pure function call: the class has computed (symbol-keyed) display methods, which a
// bundler would otherwise keep as possible side effects, pulling the species layer into every bundle.
const TabulatedSpecies = /* @__PURE__ */ (() =>
class TabulatedSpecies implements Species {
  readonly key: string;
  readonly formula: Formula;
  readonly phase: Phase;
  readonly name?: string;
  readonly aliases: readonly string[];
  readonly cas?: string;
  readonly dataset?: string;
  readonly note?: string;
  readonly hf298: number;
  readonly hf298Exact: string;
  readonly hf298Uncertainty?: number;
  readonly s298: number;
  readonly range: readonly [number, number];
  readonly sources: Readonly<Record<string, string>>;
  readonly transitions: readonly SpeciesTransition[];
  readonly #ranges: readonly CpRange[];
  #model: HeatCapacity | undefined;
  readonly #tMin: number;
  readonly #tMax: number;
  readonly #gas: boolean;
  readonly #trT: Float64Array;
  readonly #trH: Float64Array;
  readonly #trS: Float64Array;

  constructor(p: SpeciesParts) {
    this.key = p.key;
    this.formula = p.formula;
    this.phase = p.phase;
    if (p.name !== undefined) this.name = p.name;
    this.aliases = Object.freeze([...p.aliases]);
    if (p.cas !== undefined) this.cas = p.cas;
    if (p.dataset !== undefined) this.dataset = p.dataset;
    if (p.note !== undefined) this.note = p.note;
    this.hf298Exact = p.hf298Exact;
    this.hf298 = Number(p.hf298Exact);
    if (p.hf298UncertaintyJPerMol !== undefined) this.hf298Uncertainty = p.hf298UncertaintyJPerMol;
    this.s298 = p.s298;
    this.sources = Object.isFrozen(p.sources) ? p.sources : Object.freeze({ ...p.sources }); // shared when already frozen
    // Data that start between 298.15 K and 300 K (the NASA convention) are read down to 298.15 K
    // with the lowest range's form, so that the reference state itself is inside the range. Data
    // that start higher (a liquid above its melting point) keep their range: 298.15 K is then an
    // extrapolation of the lowest form, used only as the reference of the integrals.
    const ranges: CpRange[] = p.ranges.map((r) => Object.freeze({ TminK: r.TminK, TmaxK: r.TmaxK, cp: deepFreeze(copyCpForm(r.cp)) }));
    const lowest = ranges[0]!;
    if (lowest.TminK > STANDARD_TEMPERATURE_K && lowest.TminK <= NASA_LOW_K) {
      ranges[0] = Object.freeze({ ...lowest, TminK: STANDARD_TEMPERATURE_K });
    }
    this.#ranges = Object.freeze(ranges);
    this.#model = undefined;
    this.#tMin = ranges[0]!.TminK;
    this.#tMax = ranges[ranges.length - 1]!.TmaxK;
    this.range = Object.freeze([this.#tMin, this.#tMax] as const);
    this.#gas = p.phase === "g";
    if (p.transitions.length === 0) {
      // most species: shared empty values (a library of a thousand species allocates nothing here)
      this.transitions = NO_TRANSITIONS;
      this.#trT = this.#trH = this.#trS = NO_STEPS;
    } else {
      const tr = [...p.transitions].sort((a, b) => a.TK - b.TK);
      this.transitions = Object.freeze(tr.map((t) => Object.freeze({
        TK: t.TK, dHJPerMol: t.dHKJPerMol * 1000, source: t.source, ...(t.label !== undefined ? { label: t.label } : {}),
      })));
      // transitions are counted relative to 298.15 K: above it they add when T passes them,
      // below it they are removed when T goes under them
      this.#trT = Float64Array.from(tr.map((t) => t.TK));
      this.#trH = Float64Array.from(tr.map((t) => t.dHKJPerMol * 1000));
      this.#trS = Float64Array.from(tr.map((t) => (t.dHKJPerMol * 1000) / t.TK));
    }
    Object.freeze(this);
  }

  cp(T: number, options?: RangeOptions): number {
    if (!(T >= this.#tMin && T <= this.#tMax)) this.#check("cp", T, options);
    return (this.#model ?? this.#compile()).cp(T, EXTEND);
  }

  enthalpy(T: number, options?: RangeOptions): number {
    if (!(T >= this.#tMin && T <= this.#tMax)) this.#check("enthalpy", T, options);
    return this.#h(T);
  }

  entropy(T: number, P?: number, options?: RangeOptions): number {
    if (!(T >= this.#tMin && T <= this.#tMax)) this.#check("entropy", T, options);
    return this.#s(T, this.#pressureTerm("entropy", P));
  }

  gibbs(T: number, P?: number, options?: RangeOptions): number {
    if (!(T >= this.#tMin && T <= this.#tMax)) this.#check("gibbs", T, options);
    const pt = this.#pressureTerm("gibbs", P);
    return this.#h(T) - T * this.#s(T, pt);
  }

  /** The table view of this species (data, sources, properties on a temperature grid). */
  [RESULT_VIEW](): ResultView {
    return speciesView(this);
  }

  /** Notebook rich display: text, Markdown and HTML tables of the species view. */
  [JUPYTER_DISPLAY](): MimeBundle {
    return viewMimeBundle(speciesView(this));
  }

  evaluate(T: number, P?: number, options?: RangeOptions): SpeciesEvaluation {
    const extrapolated = !(T >= this.#tMin && T <= this.#tMax) && this.#check("evaluate", T, options);
    const pt = this.#pressureTerm("evaluate", P);
    const enthalpy = this.#h(T);
    const entropy = this.#s(T, pt);
    return Object.freeze({
      T, P: P ?? STANDARD_PRESSURE_PA, cp: (this.#model ?? this.#compile()).cp(T, EXTEND), enthalpy, entropy, gibbs: enthalpy - T * entropy, extrapolated,
    });
  }

  cpBatch(T: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array {
    const res = this.#prepareBatch("cpBatch", T, out);
    const m = this.#model ?? this.#compile();
    try {
      return m.cpBatch(T, res, options);
    } catch (e) {
      throw this.#batchError("cpBatch", T, options, e);
    }
  }

  enthalpyBatch(T: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array {
    const res = this.#prepareBatch("enthalpyBatch", T, out);
    const m = this.#model ?? this.#compile();
    try {
      // ΔfH° is added inside the model's loop: one pass over the temperatures
      m.sensibleEnthalpyBatch(T, res, options, this.hf298);
    } catch (e) {
      throw this.#batchError("enthalpyBatch", T, options, e);
    }
    if (this.#trT.length !== 0) for (let j = 0; j < T.length; j++) res[j] = res[j]! + this.#transitionSum(T[j]!, this.#trH);
    return res;
  }

  entropyBatch(T: Float64Array, P?: number, out?: Float64Array, options?: RangeOptions): Float64Array {
    const pt = this.#pressureTerm("entropyBatch", P);
    const res = this.#prepareBatch("entropyBatch", T, out);
    const m = this.#model ?? this.#compile();
    try {
      m.sensibleEntropyBatch(T, res, options, this.s298 - pt);
    } catch (e) {
      throw this.#batchError("entropyBatch", T, options, e);
    }
    if (this.#trT.length !== 0) for (let j = 0; j < T.length; j++) res[j] = res[j]! + this.#transitionSum(T[j]!, this.#trS);
    return res;
  }

  /** See {@link speciesModelOf}. */
  static modelOf(sp: unknown): HeatCapacity | null {
    if (typeof sp !== "object" || sp === null || !(#trT in sp) || sp.#trT.length !== 0) return null;
    return sp.#model ?? sp.#compile();
  }

  /** Compile the heat-capacity model on first use (data are trusted: validated or test-checked). */
  #compile(): HeatCapacity {
    const m = createHeatCapacity(this.#ranges, { label: this.key });
    this.#model = m;
    return m;
  }

  #h(T: number): number {
    if (T === STANDARD_TEMPERATURE_K) return this.hf298; // exactly ΔfH°, no rounding residue
    let h = this.hf298 + (this.#model ?? this.#compile()).sensibleEnthalpy(T, EXTEND);
    if (this.#trT.length !== 0) h += this.#transitionSum(T, this.#trH);
    return h;
  }

  #s(T: number, pressureTerm: number): number {
    let s = this.s298 + (this.#model ?? this.#compile()).sensibleEntropy(T, EXTEND) - pressureTerm;
    if (this.#trT.length !== 0) s += this.#transitionSum(T, this.#trS);
    return s;
  }

  /** Σ of the transition steps between 298.15 K and T (signed: removed below 298.15 K). */
  #transitionSum(T: number, steps: Float64Array): number {
    const trT = this.#trT;
    let sum = 0;
    for (let i = 0; i < trT.length; i++) {
      const tt = trT[i]!;
      if (tt >= STANDARD_TEMPERATURE_K) {
        if (T > tt) sum += steps[i]!;
      } else if (T <= tt) {
        sum -= steps[i]!;
      }
    }
    return sum;
  }

  /** R·ln(P/P°) for gases (ideal), 0 for condensed phases (pressure effect neglected). */
  #pressureTerm(fn: string, P: number | undefined): number {
    if (P === undefined) return 0;
    if (typeof P !== "number" || !Number.isFinite(P) || P <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires a finite pressure > 0 Pa, got ${describeValue(P)}`, { species: this.key, P });
    }
    // ln P − ln P° rather than ln(P/P°): the quotient underflows to 0 for P near 5e-324 Pa
    return this.#gas ? GAS_CONSTANT_J_PER_MOL_K * (Math.log(P) - LN_STANDARD_PRESSURE) : 0;
  }

  /** Check the arrays (the model checks every temperature before it writes anything); return the output array. */
  #prepareBatch(fn: string, T: Float64Array, out: Float64Array | undefined): Float64Array {
    if (!(T instanceof Float64Array)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires the temperatures as a Float64Array`, { species: this.key });
    }
    if (out !== undefined && (!(out instanceof Float64Array) || out.length < T.length)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires out to be a Float64Array at least as long as the temperatures (${T.length})`, {
        species: this.key, length: T.length, outLength: out instanceof Float64Array ? out.length : undefined,
      });
    }
    return out ?? new Float64Array(T.length);
  }

  /**
   * The model rejected a temperature (before writing anything; species and model share one range):
   * the same error as the scalar functions, naming this species and function.
   */
  #batchError(fn: string, T: Float64Array, options: RangeOptions | undefined, e: unknown): unknown {
    if (!(e instanceof RxthermError)) return e;
    for (let j = 0; j < T.length; j++) {
      const t = T[j]!;
      if (!(t >= this.#tMin && t <= this.#tMax)) this.#check(fn, t, options, j);
    }
    return e;
  }

  /** Validate T; true when outside the range and extrapolation is allowed; otherwise throws. */
  #check(fn: string, T: number, options: RangeOptions | undefined, index?: number): boolean {
    if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} (${this.key}) requires a finite temperature > 0 K, got ${describeValue(T)}`,
        index === undefined ? { species: this.key, T } : { species: this.key, T, index });
    }
    if (T >= this.#tMin && T <= this.#tMax) return false;
    if (options?.extrapolate === true) return true;
    const range = [this.#tMin, this.#tMax];
    throw new RxthermError(
      "OUT_OF_RANGE",
      `${fn} (${this.key}): ${T} K is outside the data range [${this.#tMin}, ${this.#tMax}] K${withSlipHint(T)}; pass { extrapolate: true } to extend the nearest range`,
      index === undefined ? { species: this.key, T, range, ...slipHintDetails(T) } : { species: this.key, T, range, index, ...slipHintDetails(T) },
    );
  }
})();
