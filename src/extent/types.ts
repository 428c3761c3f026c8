import type { Formula } from "../formula/types.js";

/**
 * Species flows or amounts: species key → mol (batch) or mol/s (flow).
 *
 * @category Stoichiometry
 */
export type Flows = Record<string, number>;

/**
 * A material stream: its temperature, its species flows and optionally its pressure.
 *
 * @category Stoichiometry
 */
export interface Stream {
  /** Temperature in K. */
  T: number;
  /** Species key → mol or mol/s. */
  flows: Flows;
  /** Pressure in Pa. @defaultValue 100 000 Pa (standard state) */
  P?: number;
}

/**
 * One specification that fixes an extent of reaction:
 * a fractional conversion of a reactant, a known outlet flow, or a known extent of reaction `reaction` (0-based index).
 * Further forms (yield, selectivity, per-reaction conversion) are documented with {@link solveExtents}.
 *
 * @category Stoichiometry
 */
export type ExtentSpec =
  | { of: string; conversion: number; reaction?: number }
  | { of: string; outlet: number }
  | { reaction: number; extent: number }
  | { of: string; yield: number; basis: string }
  | { of: string; selectivity: number; over: string };

/**
 * Anything that resolves a species key, formula or name to its formula — a species `Library`
 * (`builtInLibrary()`, `createLibrary(...)`) fits. {@link combustion} uses it to read fuel keys that
 * are names (`"methane"`), the way the flame functions and `availableHeat` resolve them.
 *
 * @category Stoichiometry
 */
export interface FormulaLookup {
  /** The entry for a key, formula or name; throws when there is none. */
  get(key: string): { readonly formula: Formula };
}
