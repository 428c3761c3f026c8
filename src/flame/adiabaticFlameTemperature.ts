import type { Flows } from "../extent/types.js";
import type { Library } from "../species/types.js";
import { solveFlamePoint } from "../_internal/flameProblem.js";
import { prepareFlameInput, toFlameResult } from "../_internal/flameInput.js";

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
   * instead of throwing `NO_BRACKET`/`OUT_OF_RANGE`; the result then says whether it extrapolated.
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
  /** True when the temperature lies outside the products' data range (only with `extrapolate`). */
  readonly extrapolated: boolean;
}

/**
 * Adiabatic flame temperature of a fuel (or fuel mixture) burnt with air, oxygen or another
 * oxidizer, at constant pressure — or the adiabatic explosion temperature and pressure of a
 * closed vessel at constant volume.
 *
 * Energy balance: H(products, T) = H(reactants, T_in) at constant pressure, or
 * U(products, T) = U(reactants, T_in) at constant volume (ideal gases: U = H − nRT; the
 * vessel volume is set by the reactants at their temperatures and the given pressure). The
 * fuel and the oxidizer may enter at different temperatures (preheat), with an optional diluent
 * (inert gas or recycled flue gas). The oxidizer flow follows the theoretical O2 of the fuel,
 * C + H/4 + S − O/2 mol O2, divided by φ (or times 1 + excess air).
 *
 * - mode `"complete"`: C → CO2, H → H2O (vapour), S → SO2, N → N2, excess O2 left over,
 *   variable Cp. Rich mixtures: CO2/CO/H2O/H2 in water–gas-shift equilibrium at the flame
 *   temperature (an assumption of this model; no other dissociation); a mixture with fewer O
 *   than C atoms is rejected (it would deposit carbon).
 * - mode `"equilibrium"`: products at chemical equilibrium (Gibbs minimisation, see
 *   {@link equilibriumComposition}) over {@link DEFAULT_FLAME_PRODUCTS} or `products`.
 *
 * The temperature is found by bracketed Newton iteration inside the common data range of the
 * products (with the equilibrium heat capacity in mode "equilibrium"): it converges or throws,
 * and never returns a temperature outside the data range without `extrapolated: true`.
 * Gases are ideal, the standard state is 1 bar, and water leaves as vapour.
 *
 * Caution: these are ideal screening values — adiabatic, ideal gas, complete mixing, equilibrium
 * or complete reaction. Real flames and explosions lose heat and run cooler; do not use them as
 * refractory, burner or vessel design values. Follow the makers' limits, local codes and licensed
 * engineering practice (for vessels: recognised explosion-venting and pressure-rating standards).
 *
 * @param input - fuel, oxidizer, φ or excess air, reactant temperatures (K), pressure (Pa), mode, process, product set, diluent, library
 * @param options - temperature tolerance (K), iteration limits, extrapolation
 * @returns flame temperature (K), final pressure (Pa), product mole fractions and amounts (mol), iterations, energy residual (J)
 * @throws RxthermError `NOTHING_TO_BURN` when the fuel has no C, H or S to oxidise beyond its own oxygen (details: `theoreticalO2`)
 * @throws RxthermError `NO_OXIDIZER` when the oxidizer supplies no free oxygen
 * @throws RxthermError `INVALID_ARGUMENT` for φ ≤ 0, excess air ≤ −1, both φ and excess air, T ≤ 0, P ≤ 0, unknown mode/process/oxidizer, a negative amount, or (mode "complete") fewer O than C atoms
 * @throws RxthermError `ELEMENTS_NOT_COVERED` when the product set cannot hold every element of the reactants
 * @throws RxthermError `NO_BRACKET` when no temperature inside the products' data range closes the energy balance (details: `rangeK`)
 * @throws RxthermError `NO_CONVERGENCE` when an equilibrium or temperature iteration does not converge
 * @throws RxthermError `OUT_OF_RANGE` when a reactant temperature lies outside that species' data range, `UNKNOWN_SPECIES` for unknown keys
 * @category Flame
 * @example
 * // stoichiometric methane–air from 298.15 K at 1 atm, built-in data
 * adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 1 }).T // => 2225.0 (K, to 0.1 K)
 * adiabaticFlameTemperature({ fuel: "CH4(g)", mode: "complete" }).T     // => 2326.6 (K, to 0.1 K)
 * @see NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998) for the built-in product data;
 *   W. B. White, S. M. Johnson, G. B. Dantzig, J. Chem. Phys. 28 (1958) 751 (equilibrium by Gibbs minimisation)
 */
export function adiabaticFlameTemperature(input: AdiabaticFlameInput, options: AdiabaticFlameOptions = {}): AdiabaticFlameResult {
  const fn = "adiabaticFlameTemperature";
  const { setup, point } = prepareFlameInput(fn, input, options);
  const r = solveFlamePoint(setup, point);
  return toFlameResult(setup, point, r);
}

