import { RxthermError, describeValue, knownKeys, optionsOf } from "../errors.js";
import { ATMOSPHERE_PA, GAS_CONSTANT_J_PER_MOL_K } from "../units.js";
import type { Library, Species } from "../species/types.js";
import type { Flows } from "../extent/types.js";
import { molarMass } from "../formula/molarMass.js";
import { resolveSpecies } from "./resolveInputs.js";
import { ExactDecimal } from "./exactSum.js";
import { combustionProducts } from "./internal/combustionProducts.js";

/** The option keys heatingValue reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<HeatingValueOptions>()("basis", "per", "library");

/**
 * Options of {@link heatingValue}.
 *
 * @category Enthalpy
 */
export interface HeatingValueOptions {
  /**
   * `"higher"` (gross; product water liquid, H2O(l)) or `"lower"` (net; product water vapour, H2O(g)).
   * @defaultValue "higher"
   */
  basis?: "higher" | "lower";
  /**
   * Amount basis of the result: `"mol"` → J/mol of fuel, `"kg"` → J/kg of fuel, `"Nm3"` → J per normal
   * cubic metre of gaseous fuel (ideal gas at 0 °C = 273.15 K and 101.325 kPa, 0.022414 m³/mol).
   * @defaultValue "mol"
   */
  per?: "mol" | "kg" | "Nm3";
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
}

/** Normal conditions for Nm³: 0 °C and 1 atm. */
const NORMAL_T_K = 273.15;
/**
 * Ideal-gas molar volume at the normal conditions of `per: "Nm3"` (0 °C = 273.15 K, 101.325 kPa),
 * R·T/P in m³/mol.
 *
 * @category Enthalpy
 * @example
 * NORMAL_MOLAR_VOLUME_M3_PER_MOL // => 0.0224139695 (m³/mol, rounded)
 * @see CODATA 2018 recommended values (molar volume of an ideal gas at 273.15 K, 101.325 kPa).
 */
export const NORMAL_MOLAR_VOLUME_M3_PER_MOL = (GAS_CONSTANT_J_PER_MOL_K * NORMAL_T_K) / ATMOSPHERE_PA;

/**
 * Heating value (heat of complete combustion, sign made positive) of a fuel species or mixture at 25 °C.
 *
 * Each fuel component burns completely with O2 at 298.15 K and 1 bar: C → CO2(g), H → H2O(l)
 * (higher heating value) or H2O(g) (lower heating value), S → SO2(g), N → N2(g). Its heating value
 * is −ΔcH° = ΔfH°(fuel) − Σ νₚ·ΔfH°(products) (Hess's law, summed exactly from the tabulated decimals),
 * in J per mol of fuel. Components with no C, H or S (N2, O2, Ar, ...) and the products themselves
 * (CO2, H2O in any phase, SO2) count as inert and contribute zero. A mixture's value is the
 * mole-fraction-weighted sum; per kg it is divided by the mean molar mass (IUPAC atomic weights),
 * per Nm³ multiplied by 1/0.022414 mol/m³ (ideal gas at 0 °C, 101.325 kPa; gas-phase fuels only).
 *
 * @param fuel - a species key (`"CH4(g)"`) or a mixture, species key → amount (any consistent unit;
 *   normalised to mole fractions)
 * @param options - basis (`"higher"`/`"lower"`), amount basis (`"mol"`, `"kg"`, `"Nm3"`), library
 * @returns heating value in J/mol, J/kg or J/Nm³ (positive for a fuel)
 * @throws RxthermError `UNKNOWN_SPECIES` / `AMBIGUOUS_PHASE` when a component is not in the library
 * @throws RxthermError `INVALID_ARGUMENT` for an empty mixture, a non-finite or all-zero amount, an
 *   element other than C, H, N, O, S or a noble gas, a bad option, or `per: "Nm3"` with a non-gas component
 * @throws RxthermError `NEGATIVE_FLOW` for a negative amount
 * @category Enthalpy
 * @example
 * heatingValue("CH4(g)") // => 890310.1 (J/mol, higher heating value, built-in NIST-JANAF data)
 * @see IUPAC Green Book, 3rd ed. (2007), §2.11 (standard enthalpy of combustion);
 *   ISO 13443:1996 (natural gas — standard reference conditions, 0 °C and 101.325 kPa for "normal").
 */
export function heatingValue(fuel: string | Flows, options: HeatingValueOptions = {}): number {
  options = optionsOf(options, "heatingValue", "options", OPTION_KEYS);
  const { basis, per } = resolveOptions("heatingValue", options);
  const mixture = normalise("heatingValue", fuel);
  let perMol = 0;
  let meanMolarMass = 0;
  for (const [key, x] of mixture) {
    const s = resolveSpecies("heatingValue", key, options.library);
    if (per === "Nm3" && s.phase !== "g") {
      throw new RxthermError("INVALID_ARGUMENT", `heatingValue per Nm3 needs gaseous fuel components; ${key} is not a gas`, { species: key, phase: s.phase });
    }
    perMol += x * speciesHeatingValue("heatingValue", s, basis, options.library);
    if (per === "kg") meanMolarMass += x * molarMass(s.formula);
  }
  if (per === "kg") return perMol / (meanMolarMass / 1000);
  if (per === "Nm3") return perMol / NORMAL_MOLAR_VOLUME_M3_PER_MOL;
  return perMol === 0 ? 0 : perMol;
}

/** −ΔcH° of one species in J/mol (exact decimal sum, converted once), 0 for inert species. */
export function speciesHeatingValue(fn: string, s: Species, basis: "higher" | "lower", library: Library | undefined): number {
  const c = combustionProducts(fn, s.key, s.formula.elements, basis === "higher" ? "l" : "g");
  if (c.inert) return 0;
  let sum = new ExactDecimal(s.hf298Exact);
  for (const [key, nu] of c.products) {
    const p = resolveSpecies(fn, key, library);
    sum = sum.minus(new ExactDecimal(p.hf298Exact).times(nu.num.toString()).div(nu.den.toString()));
  }
  const v = sum.toNumber();
  return v === 0 ? 0 : v;
}

/** Validated options. */
export function resolveOptions(fn: string, o: HeatingValueOptions): { basis: "higher" | "lower"; per: "mol" | "kg" | "Nm3" } {
  const basis = o.basis ?? "higher";
  const per = o.per ?? "mol";
  if (basis !== "higher" && basis !== "lower") throw new RxthermError("INVALID_ARGUMENT", `${fn} option basis must be "higher" or "lower", got ${describeValue(basis)}`, { basis });
  if (per !== "mol" && per !== "kg" && per !== "Nm3") throw new RxthermError("INVALID_ARGUMENT", `${fn} option per must be "mol", "kg" or "Nm3", got ${describeValue(per)}`, { per });
  return { basis, per };
}

/** Mole fractions of a species key or a mixture. */
export function normalise(fn: string, fuel: string | Flows): [string, number][] {
  if (typeof fuel === "string") return [[fuel, 1]];
  if (fuel === null || typeof fuel !== "object") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a species key or a mixture object, got ${describeValue(fuel)}`, { fuel });
  const entries = Object.entries(fuel);
  let total = 0;
  for (const [key, n] of entries) {
    if (typeof n !== "number" || !Number.isFinite(n)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite amounts, got ${describeValue(n)} for ${key}`, { species: key, amount: n });
    if (n < 0) throw new RxthermError("NEGATIVE_FLOW", `${fn} requires non-negative amounts, got ${n} for ${key}`, { species: key, amount: n });
    total += n;
  }
  if (!(total > 0)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a mixture with a positive total amount`, { fuel });
  return entries.filter(([, n]) => n > 0).map(([k, n]) => [k, n / total]);
}
