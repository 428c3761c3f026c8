/**
 * Stream conversions: mass ↔ molar flows, mole and mass fractions, totals.
 *
 * @module
 */
import { RxthermError, describeValue, finiteResult, knownKeys, optionsOf } from "../errors.js";
import { molarMassOf, validateFlows } from "./internal/extentSystem.js";
import type { Flows } from "./types.js";
import { compensatedSum } from "../numeric/compensatedSum.js";

/** The option keys of the mass-flow conversions (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<MassFlowOptions>()("massUnit");

/**
 * Options of the mass-flow conversions {@link massToMolarFlows} and {@link molarToMassFlows}.
 *
 * @category Stoichiometry
 */
export interface MassFlowOptions {
  /**
   * Unit of the mass amounts: `"kg"` (kg or kg/s, SI) or `"g"` (g or g/s).
   * @defaultValue "kg"
   */
  massUnit?: "kg" | "g";
}

/**
 * Molar flows from mass flows, using each species' molar mass.
 *
 * nᵢ = mᵢ / Mᵢ, with Mᵢ in g/mol from IUPAC standard atomic weights (see `molarMass`);
 * masses in kg (default) are multiplied by 1000 g/kg first.
 *
 * @param massFlows - species key → kg or kg/s (g or g/s with `massUnit: "g"`), each ≥ 0
 * @param options - mass unit
 * @returns species key → mol or mol/s
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow, `INVALID_ARGUMENT` for a non-finite one
 * @throws formula parse errors (their own codes, with `species`) for a key that is not a formula
 * @example
 * massToMolarFlows({ "H2O(g)": 18.015 }, { massUnit: "g" }) // => { "H2O(g)": 1 }  (M = 18.015 g/mol)
 * @category Stoichiometry
 * @see IUPAC/CIAAW standard atomic weights (molar masses)
 */
export function massToMolarFlows(massFlows: Flows, options: MassFlowOptions = {}): Flows {
  options = optionsOf(options, "massToMolarFlows", "options", OPTION_KEYS);
  const fn = "massToMolarFlows";
  const factor = unitFactor(options, fn);
  validateFlows(massFlows, fn, "mass");
  const out: Flows = {};
  for (const [key, m] of Object.entries(massFlows)) out[key] = (m * factor) / molarMassOf(key, fn, "mass");
  return finiteResult(out, "massToMolarFlows");
}

/**
 * Mass flows from molar flows, using each species' molar mass.
 *
 * mᵢ = nᵢ · Mᵢ, with Mᵢ in g/mol; the result is in kg (default) or g.
 *
 * @param flows - species key → mol or mol/s, each ≥ 0
 * @param options - mass unit of the result
 * @returns species key → kg or kg/s (g or g/s with `massUnit: "g"`)
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow, `INVALID_ARGUMENT` for a non-finite one
 * @throws formula parse errors (their own codes) for a key that is not a formula
 * @example
 * molarToMassFlows({ CH4: 1000 }) // => { CH4: 16.043 }  (kg; M(CH4) = 16.043 g/mol)
 * @category Stoichiometry
 * @see IUPAC/CIAAW standard atomic weights (molar masses)
 */
export function molarToMassFlows(flows: Flows, options: MassFlowOptions = {}): Flows {
  options = optionsOf(options, "molarToMassFlows", "options", OPTION_KEYS);
  const fn = "molarToMassFlows";
  const factor = unitFactor(options, fn);
  validateFlows(flows, fn, "flows");
  const out: Flows = {};
  for (const [key, n] of Object.entries(flows)) out[key] = (n * molarMassOf(key, fn, "flows")) / factor;
  return finiteResult(out, "molarToMassFlows");
}

/**
 * Mole fractions of a stream: yᵢ = nᵢ / Σ n.
 *
 * @param flows - species key → mol or mol/s, each ≥ 0, not all zero
 * @returns species key → mole fraction (dimensionless, sums to 1)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for an empty or all-zero stream or a non-finite flow
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow
 * @throws formula parse errors (their own codes) for a key that is not a formula (`{ xyz: 1 }`, `__proto__`)
 * @example
 * moleFractions({ N2: 3, O2: 1 }) // => { N2: 0.75, O2: 0.25 }
 * @category Stoichiometry
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10 (amount fraction)
 */
export function moleFractions(flows: Flows): Record<string, number> {
  const fn = "moleFractions";
  validateFlows(flows, fn, "flows");
  const total = compensatedSum(Object.values(flows));
  if (!(total > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a stream with a positive total flow`, { total });
  }
  const out: Record<string, number> = {};
  for (const [key, n] of Object.entries(flows)) out[key] = n / total;
  return out;
}

/**
 * Mass fractions of a stream given in molar flows: wᵢ = nᵢ Mᵢ / Σ nⱼ Mⱼ.
 *
 * @param flows - species key → mol or mol/s, each ≥ 0, not all zero
 * @returns species key → mass fraction (dimensionless, sums to 1)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for an empty or all-zero stream or a non-finite flow
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow
 * @throws formula parse errors (their own codes) for a key that is not a formula
 * @example
 * massFractions({ CH4: 1, CO2: 1 }) // => { CH4: 0.2671…, CO2: 0.7328… }
 * @category Stoichiometry
 * @see IUPAC Green Book, 3rd ed. (2007), §2.10 (mass fraction)
 */
export function massFractions(flows: Flows): Record<string, number> {
  const fn = "massFractions";
  validateFlows(flows, fn, "flows");
  const masses = Object.entries(flows).map(([key, n]) => [key, n * molarMassOf(key, fn, "flows")] as const);
  const total = compensatedSum(masses.map(([, m]) => m));
  if (!(total > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a stream with a positive total flow`, { total });
  }
  const out: Record<string, number> = {};
  for (const [key, m] of masses) out[key] = m / total;
  return out;
}

/**
 * Total molar flow of a stream, Σ nᵢ (compensated summation).
 *
 * @param flows - species key → mol or mol/s, each ≥ 0
 * @returns total in mol or mol/s
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow, `INVALID_ARGUMENT` for a non-finite one
 * @example
 * totalFlow({ N2: 3, O2: 1 }) // => 4
 * @category Stoichiometry
 * @see common practice
 */
export function totalFlow(flows: Flows): number {
  validateFlows(flows, "totalFlow", "flows", false);
  return compensatedSum(Object.values(flows));
}

/**
 * Total mass flow of a stream given in molar flows, Σ nᵢ Mᵢ.
 *
 * @param flows - species key → mol or mol/s, each ≥ 0
 * @param options - mass unit of the result
 * @returns total in kg or kg/s (g or g/s with `massUnit: "g"`)
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative flow, `INVALID_ARGUMENT` for a non-finite one
 * @throws formula parse errors (their own codes) for a key that is not a formula
 * @example
 * totalMassFlow({ H2: 1, O2: 0.5 }, { massUnit: "g" }) // => 18.015  (g; H2 2.016 + ½ O2 15.999)
 * @category Stoichiometry
 * @see IUPAC/CIAAW standard atomic weights (molar masses)
 */
export function totalMassFlow(flows: Flows, options: MassFlowOptions = {}): number {
  options = optionsOf(options, "totalMassFlow", "options", OPTION_KEYS);
  const fn = "totalMassFlow";
  const factor = unitFactor(options, fn);
  validateFlows(flows, fn, "flows");
  return finiteResult(compensatedSum(Object.entries(flows).map(([key, n]) => n * molarMassOf(key, fn, "flows"))) / factor, fn);
}

function unitFactor(options: MassFlowOptions, fn: string): number {
  const u = options.massUnit ?? "kg";
  if (u === "kg") return 1000;
  if (u === "g") return 1;
  throw new RxthermError("INVALID_ARGUMENT", `${fn} requires massUnit "kg" or "g", got ${describeValue(u)}`, { massUnit: u });
}

