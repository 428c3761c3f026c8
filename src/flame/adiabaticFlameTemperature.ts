import { solveFlamePoint } from "./internal/flameProblem.js";
import { FLAME_OPTION_KEYS, prepareFlameInput } from "./internal/flameInput.js";
import type { AdiabaticFlameInput, AdiabaticFlameOptions, AdiabaticFlameResult } from "./types.js";
import { optionsOf } from "../errors.js";

export type { AdiabaticFlameInput, AdiabaticFlameOptions, AdiabaticFlameResult } from "./types.js";

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
 * @throws RxthermError `INVALID_ARGUMENT` for φ ≤ 0, excess air ≤ −1, excess air above 3 or φ outside 0.05–20 without `allowExtremeMixture` (a likely unit slip), both φ and excess air, T ≤ 0, P ≤ 0, unknown mode/process/oxidizer, a negative amount, or (mode "complete") fewer O than C atoms
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
  options = optionsOf(options, "adiabaticFlameTemperature", "options", FLAME_OPTION_KEYS);
  const fn = "adiabaticFlameTemperature";
  const { setup, point } = prepareFlameInput(fn, input, options);
  return solveFlamePoint(setup, point);
}

