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
}

/**
 * A set of species, looked up by key (with or without phase), formula or name.
 *
 * @category Species
 */
export interface Library {
  /** The species with this key; a key without phase resolves when only one phase exists. */
  get(key: string): Species;
  /** True when {@link Library.get} would succeed. */
  has(key: string): boolean;
  /** All keys, sorted. */
  keys(): string[];
}
