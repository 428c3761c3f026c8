import type { Formula, Phase } from "../formula/types.js";
import type { RangeOptions } from "../heat-capacity/types.js";

/**
 * A species with its standard-state thermochemical data (298.15 K, 1 bar, ideal gas).
 *
 * All methods throw `OUT_OF_RANGE` outside {@link Species.range} unless `{ extrapolate: true }` is passed.
 *
 * @category Species
 */
export interface Species {
  /** Key with phase, e.g. `"CO2(g)"`. */
  readonly key: string;
  /** Parsed formula. */
  readonly formula: Formula;
  /** Phase. */
  readonly phase: Phase;
  /** Common name, when known. */
  readonly name?: string;
  /** CAS registry number, when the data give one (e.g. `"124-38-9"`). */
  readonly cas?: string;
  /** Standard enthalpy of formation at 298.15 K, J/mol. */
  readonly hf298: number;
  /** Standard enthalpy of formation at 298.15 K as exact decimal text in J/mol, for exact Hess sums. */
  readonly hf298Exact: string;
  /** Standard uncertainty of hf298, J/mol, when the source gives one. */
  readonly hf298Uncertainty?: number;
  /** Standard molar entropy at 298.15 K, J/(mol·K). */
  readonly s298: number;
  /** Temperature range of the Cp data, K. */
  readonly range: readonly [number, number];
  /** Source id of each value (`hf298`, `s298`, `cp`), resolving to a citation in the source registry. */
  readonly sources: Readonly<Record<string, string>>;
  /** Cp°(T), J/(mol·K). */
  cp(T: number, options?: RangeOptions): number;
  /** H°(T) = ΔfH°(298.15 K) + ∫Cp dT from 298.15 K to T, J/mol. */
  enthalpy(T: number, options?: RangeOptions): number;
  /** S(T, P) in J/(mol·K); for gases S°(T) − R·ln(P/P°) with P° = 1 bar. @defaultValue P = 100 000 Pa */
  entropy(T: number, P?: number, options?: RangeOptions): number;
  /** G(T, P) = H(T) − T·S(T, P), J/mol. */
  gibbs(T: number, P?: number, options?: RangeOptions): number;
  /** Label of the data set the entry comes from (e.g. `"nist-janaf"`, `"gri-mech-3.0"`), when given. */
  readonly dataset?: string;
  /** Other names the species is found by (lowercase lookups). */
  readonly aliases: readonly string[];
  /** Notes about the data (derivations, flagged weaknesses), when the data file gives them. */
  readonly note?: string;
  /** Phase transitions inside the Cp ranges (T in K, ΔH in J/mol), in increasing T. */
  readonly transitions: readonly SpeciesTransition[];
  /**
   * Cp°(T) at every temperature of `T` (K) into `out` (allocated when omitted), J/(mol·K).
   *
   * Every temperature is checked before anything is written: one outside {@link Species.range}
   * throws `OUT_OF_RANGE` (details `{ species, T, range, index }`) unless `{ extrapolate: true }`;
   * one that is not a finite number above 0 K throws `INVALID_ARGUMENT`; `out` is then untouched.
   * Sorted or slowly varying temperatures are fastest (the range lookup is skipped while T stays in one range).
   */
  cpBatch(T: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array;
  /**
   * H°(T) = ΔfH°(298.15 K) + ∫Cp dT at every temperature of `T` (K) into `out` (allocated when
   * omitted), J/mol; the same values as {@link Species.enthalpy}, with the same checks as
   * {@link Species.cpBatch} (nothing written when a temperature is rejected).
   */
  enthalpyBatch(T: Float64Array, out?: Float64Array, options?: RangeOptions): Float64Array;
  /**
   * S(T, P) at every temperature of `T` (K) into `out` (allocated when omitted), J/(mol·K); for
   * gases S°(T) − R·ln(P/P°), P° = 1 bar; the same values as {@link Species.entropy}, with the same
   * checks as {@link Species.cpBatch} (nothing written when a temperature or P is rejected).
   * @defaultValue P = 100 000 Pa
   */
  entropyBatch(T: Float64Array, P?: number, out?: Float64Array, options?: RangeOptions): Float64Array;
  /** Cp°, H°, S° and G° at once, with whether T lay outside the data range (see {@link SpeciesEvaluation}). */
  evaluate(T: number, P?: number, options?: RangeOptions): SpeciesEvaluation;
}

/**
 * A phase transition inside a species' Cp ranges (e.g. alpha → beta quartz at 847 K).
 *
 * @category Species
 */
export interface SpeciesTransition {
  /** Transition temperature, K. */
  readonly TK: number;
  /** Transition enthalpy, J/mol (H steps up by this much at TK; S by ΔH/TK). */
  readonly dHJPerMol: number;
  /** What changes, e.g. `"alpha-beta quartz"`. */
  readonly label?: string;
  /** Source id of the transition data. */
  readonly source: string;
}

/**
 * The result of {@link Species.evaluate}: all properties at one state, and whether the
 * temperature lay outside the data range (evaluated with `{ extrapolate: true }`).
 *
 * @category Species
 */
export interface SpeciesEvaluation {
  /** Temperature, K. */
  readonly T: number;
  /** Pressure, Pa. */
  readonly P: number;
  /** Cp°(T), J/(mol·K). */
  readonly cp: number;
  /** H°(T) = ΔfH°(298.15 K) + ∫Cp dT, J/mol. */
  readonly enthalpy: number;
  /** S(T, P), J/(mol·K). */
  readonly entropy: number;
  /** G(T, P) = H − T·S, J/mol. */
  readonly gibbs: number;
  /** True when T lay outside {@link Species.range}. */
  readonly extrapolated: boolean;
}

/**
 * Options of {@link Library.get} and {@link Library.has}.
 *
 * @category Species
 */
export interface LibraryGetOptions {
  /**
   * Data set to take the entry from (e.g. `"gri-mech-3.0"` for the GRI-Mech 3.0 polynomials) instead of
   * the key's default entry.
   * @defaultValue undefined (the default entry)
   */
  dataset?: string;
}

/**
 * A set of species, looked up by key (with or without phase), formula or name.
 *
 * @category Species
 */
export interface Library {
  /** The species with this key; a key without phase resolves when only one phase exists. */
  get(key: string, options?: LibraryGetOptions): Species;
  /** True when {@link Library.get} would succeed. */
  has(key: string, options?: LibraryGetOptions): boolean;
  /** All keys, sorted. */
  keys(): string[];
  /** The data sets that hold an entry for this key (resolved like {@link Library.get}); the default one first. */
  datasets(key: string): string[];
  /** Every species (default entries), sorted by key. */
  all(): Species[];
  /** Full citation of a source id used by this library's data (built-in registry or a user file's `sources`). */
  citation(id: string): string;
}
