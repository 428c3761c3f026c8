/**
 * Types shared by the public flame functions and their private helpers (internal/).
 *
 * @module
 */
import type { ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import type { Flows } from "../extent/types.js";
import type { Library } from "../species/types.js";

/**
 * The mixture and conditions of {@link adiabaticFlameTemperature}.
 *
 * @category Flame
 */
export interface AdiabaticFlameInput {
  /** Fuel: a species key (1 mol) or species key → mol (a fuel mixture, possibly with inerts). */
  fuel: string | Flows;
  /** `"air"` ({@link AIR_21_79}: 21 % O2 and 79 % N2 by mole), `"oxygen"` (pure O2) or species key → mol per unit of oxidizer. @defaultValue "air" */
  oxidizer?: "air" | "oxygen" | Flows;
  /** Equivalence ratio φ = (fuel/oxidizer) / (fuel/oxidizer)stoichiometric, > 0. Not with `excessAir`. @defaultValue 1 */
  equivalenceRatio?: number;
  /** Excess oxidizer as a fraction of the theoretical (0.2 = 20 % excess; −0.1 = 10 % short), > −1. Not with `equivalenceRatio`. */
  excessAir?: number;
  /** Temperature of all reactants, K (overridden per stream by `fuelT`, `oxidizerT`, `diluentT`). @defaultValue 298.15 */
  T?: number;
  /** Fuel temperature, K. @defaultValue T */
  fuelT?: number;
  /** Oxidizer (air preheat) temperature, K. @defaultValue T */
  oxidizerT?: number;
  /** Pressure, Pa (the initial pressure at constant volume). @defaultValue 101 325 Pa (1 atm) */
  P?: number;
  /** `"complete"`: complete-combustion products; `"equilibrium"`: Gibbs-minimised products. @defaultValue "equilibrium" */
  mode?: "complete" | "equilibrium";
  /** `"constant-pressure"` (a flame) or `"constant-volume"` (a closed vessel: explosion temperature and pressure). @defaultValue "constant-pressure" */
  process?: "constant-pressure" | "constant-volume";
  /** Equilibrium product set (mode "equilibrium"). @defaultValue {@link DEFAULT_FLAME_PRODUCTS} */
  products?: readonly string[];
  /** Inert or recycled flue gas added to the reactants: species key → mol (same basis as the fuel). */
  diluent?: Flows;
  /** Temperature of the diluent, K. @defaultValue oxidizerT */
  diluentT?: number;
  /** Species library. @defaultValue the built-in library */
  library?: Library;
  /**
   * Accept excess air above 3 (300 %) or an equivalence ratio outside 0.05–20; without it such values
   * are taken as unit slips and rejected (`INVALID_ARGUMENT`), as in `combustion`.
   * @defaultValue false
   */
  allowExtremeMixture?: boolean;
}

/**
 * Solver settings of {@link adiabaticFlameTemperature} and {@link flameTemperatureSweep}.
 *
 * @category Flame
 */
export interface AdiabaticFlameOptions {
  /** Tolerance on the flame temperature, K. @defaultValue 1e-6 */
  toleranceK?: number;
  /** Largest number of Newton iterations of one fixed-T equilibrium solve. @defaultValue 300 */
  maxIterations?: number;
  /** Required relative element balance of the equilibrium products. @defaultValue 1e-12 */
  elementTolerance?: number;
  /**
   * Evaluate species data outside their temperature range (search in [200, 6000] K at least)
   * instead of throwing `NO_BRACKET`/`OUT_OF_RANGE`; the result's `extrapolated` then lists each species and T outside its data.
   * @defaultValue false
   */
  extrapolate?: boolean;
}

/**
 * Result of {@link adiabaticFlameTemperature}.
 *
 * @category Flame
 */
export interface AdiabaticFlameResult {
  /** Adiabatic flame (or, at constant volume, explosion) temperature, K. */
  readonly T: number;
  /** Final pressure, Pa (the given pressure at constant pressure). */
  readonly P: number;
  /** Product mole fractions in the gas phase. */
  readonly products: Readonly<Record<string, number>>;
  /** Product amounts, mol (per the fuel amounts given; 1 mol for a fuel key). */
  readonly moles: Readonly<Record<string, number>>;
  /** Condensed products present (equilibrium mode with condensed species in `products`), mol. */
  readonly condensed: Readonly<Record<string, number>>;
  /** Oxidizer fed, species key → mol. */
  readonly oxidizer: Readonly<Record<string, number>>;
  /** Equivalence ratio used. */
  readonly equivalenceRatio: number;
  /** Theoretical O2 of the fuel, mol. */
  readonly theoreticalO2: number;
  /** `"complete"` or `"equilibrium"`. */
  readonly mode: "complete" | "equilibrium";
  /** `"constant-pressure"` or `"constant-volume"`. */
  readonly process: "constant-pressure" | "constant-volume";
  /** Enthalpy (constant pressure) or internal energy (constant volume) of the reactants, J. */
  readonly reactantEnergy: number;
  /** Energy balance residual at the solution: products minus reactants, J. */
  readonly residual: number;
  /** |residual| divided by Σ|n·h| of the products (dimensionless). */
  readonly relativeResidual: number;
  /** Temperature iterations of the energy balance. */
  readonly iterations: number;
  /** Newton iterations of the equilibrium solves, summed (0 in mode "complete"). */
  readonly equilibriumIterations: number;
  /** Relative element balance of the equilibrium products (0 in mode "complete", exact by construction). */
  readonly elementResidual: number;
  /**
   * Each species evaluated outside its data range, with the temperature: reactants at their stream
   * temperatures, products at the flame temperature (possible only with `extrapolate: true`); empty
   * when every species was inside its range.
   */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/**
 * Result of {@link equilibriumComposition}.
 *
 * @category Flame
 */
export interface EquilibriumResult {
  /** Temperature, K (given, or solved from `H`). */
  readonly T: number;
  /** Pressure, Pa. */
  readonly P: number;
  /** Amount of every included product species, mol (condensed species not present: 0). */
  readonly moles: Readonly<Record<string, number>>;
  /** Mole fractions in the gas phase (condensed species are not counted). */
  readonly moleFractions: Readonly<Record<string, number>>;
  /** Amounts of the condensed species present, mol. */
  readonly condensed: Readonly<Record<string, number>>;
  /** Total amount of the gas phase, mol. */
  readonly gasMoles: number;
  /** Always true: a solve that does not converge throws `NO_CONVERGENCE` instead. */
  readonly converged: true;
  /** Newton iterations of the fixed-T solves (summed over the temperature search with `H`). */
  readonly iterations: number;
  /** Outer temperature iterations (0 at given `T`). */
  readonly temperatureIterations: number;
  /** Max over elements of |Σ a·n − b| / b (relative element balance). */
  readonly elementResidual: number;
  /** Enthalpy of the equilibrium mixture, J. */
  readonly enthalpy: number;
  /** With `H`: enthalpy of the result minus `H`, J. Otherwise 0. */
  readonly energyResidual: number;
  /** Element symbol → element potential divided by RT (dimensionless Lagrange multiplier). */
  readonly elementPotentials: Readonly<Record<string, number>>;
  /** Product species left out because they hold an element absent from the feed. */
  readonly excluded: readonly string[];
  /**
   * Each product species outside its data range at the result temperature, with that temperature
   * (possible only with `extrapolate: true`); empty when every species was inside its range.
   */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}
