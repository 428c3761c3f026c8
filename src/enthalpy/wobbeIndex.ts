import { RxthermError, knownKeys, optionsOf } from "../errors.js";
import type { Library } from "../species/types.js";
import type { Flows } from "../extent/types.js";
import { molarMass } from "../formula/molarMass.js";
import { resolveSpecies } from "./resolveInputs.js";
import { heatingValue } from "./heatingValue.js";

/** The option keys wobbeIndex reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<WobbeIndexOptions>()("basis", "library");

/**
 * Options of {@link wobbeIndex}.
 *
 * @category Enthalpy
 */
export interface WobbeIndexOptions {
  /** Heating value used: `"higher"` (the usual Wobbe index) or `"lower"`. @defaultValue "higher" */
  basis?: "higher" | "lower";
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
}

/**
 * Molar mass of dry air used for the relative density, g/mol (U.S. Standard Atmosphere 1976,
 * sea-level mean molar mass 28.9644 kg/kmol).
 *
 * @category Enthalpy
 * @example
 * AIR_MOLAR_MASS_G_PER_MOL // => 28.9644
 * @see U.S. Standard Atmosphere, 1976 (NOAA, NASA, USAF), Table 3 sea-level values.
 */
export const AIR_MOLAR_MASS_G_PER_MOL = 28.9644;

/**
 * Wobbe index of a fuel gas: heating value per normal cubic metre divided by the square root of
 * its relative density to air, in J/Nm³.
 *
 * W = HV / √d with HV from {@link heatingValue} per Nm³ (ideal gas at 0 °C, 101.325 kPa, combustion
 * at 25 °C) and d = M_gas / M_air the ideal-gas relative density (M_air = 28.9644 g/mol). Gases of
 * equal Wobbe index give the same heat input through the same burner orifice at the same supply
 * pressure — the interchangeability test for fuel gases. Real-gas compression factors are ignored
 * (ideal gas), which changes natural-gas values by a few parts in a thousand.
 *
 * @param gas - a gaseous species key or a gas mixture (species key → amount)
 * @param options - heating-value basis and library
 * @returns Wobbe index in J/Nm³
 * @throws RxthermError `INVALID_ARGUMENT` for a non-gas component or a bad mixture (as {@link heatingValue})
 * @throws RxthermError `UNKNOWN_SPECIES` when a component is not in the library
 * @category Enthalpy
 * @example
 * wobbeIndex("CH4(g)") / 1e6 // => 53.37 (MJ/Nm³, rounded; ideal gas, built-in NIST-JANAF data)
 * @see F. Wobbe (1926) via ISO 14532:2014 (natural gas vocabulary, Wobbe index);
 *   ISO 13443:1996 (standard reference conditions); U.S. Standard Atmosphere 1976 (air molar mass).
 */
export function wobbeIndex(gas: string | Flows, options: WobbeIndexOptions = {}): number {
  options = optionsOf(options, "wobbeIndex", "options", OPTION_KEYS);
  const hv = heatingValue(gas, { basis: options.basis ?? "higher", per: "Nm3", ...(options.library ? { library: options.library } : {}) });
  const entries = typeof gas === "string" ? [[gas, 1] as const] : Object.entries(gas);
  let total = 0;
  let mass = 0;
  for (const [key, n] of entries) {
    if (n <= 0) continue;
    const s = resolveSpecies("wobbeIndex", key, options.library);
    mass += n * molarMass(s.formula);
    total += n;
  }
  const relativeDensity = mass / total / AIR_MOLAR_MASS_G_PER_MOL;
  if (!(relativeDensity > 0)) throw new RxthermError("INVALID_ARGUMENT", "wobbeIndex requires a gas with a positive molar mass", { gas });
  return hv / Math.sqrt(relativeDensity);
}
