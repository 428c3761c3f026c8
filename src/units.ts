/**
 * Unit conversions into the SI units of the API (K, Pa, J, mol).
 *
 * Exact factors by definition: 1 atm = 101 325 Pa; 1 bar = 100 000 Pa; 1 psi = 6894.757293168361 Pa
 * (0.45359237 kg × 9.80665 m/s² / (0.0254 m)²); 1 kcal (thermochemical) = 4184 J;
 * 1 Btu (International Table) = 1055.05585262 J; 1 lbmol = 453.59237 mol; 1 lb = 0.45359237 kg; °R = K × 9/5.
 * Normal cubic metres (Nm³) are ideal gas at 0 °C and 101.325 kPa: V = R·273.15 K / 101 325 Pa per mol.
 * Sources: NIST SP 811 (2008), Appendix B; DIN 1343 (normal conditions).
 * Results of the `from…` converters are rounded to 12 significant digits to drop float noise
 * (373.15 K → 100 °C, not 100.00000000000006).
 *
 * Conversions into SI are `to…` ({@link toKelvin}, {@link toPascal}, {@link toJoule}, {@link toMol},
 * {@link toMolPerSecond}, {@link toWatt}); conversions of results out of SI are `from…`
 * ({@link fromKelvin}, {@link fromPascal}, {@link fromJoule}, {@link fromWatt},
 * {@link fromMolPerSecond}, {@link fromJoulePerMol}).
 *
 * @module
 */
import { RxthermError, describeValue, finiteResult, optionsOf } from "./errors.js";

/** Temperature units accepted by {@link toKelvin} and {@link fromKelvin}. @category Units */
export type TemperatureUnit = "K" | "C" | "F" | "R";
/** Pressure units accepted by {@link toPascal}. @category Units */
export type PressureUnit = "Pa" | "kPa" | "MPa" | "bar" | "atm" | "psi";
/** Energy units accepted by {@link toJoule}. @category Units */
export type EnergyUnit = "J" | "kJ" | "MJ" | "cal" | "kcal" | "Btu";
/** Amount units accepted by {@link toMol}. @category Units */
export type AmountUnit = "mol" | "kmol" | "lbmol";
/**
 * Flow units accepted by {@link toMolPerSecond} and {@link fromMolPerSecond}: molar flows, mass flows
 * (need the molar mass) and normal volume flows of an ideal gas (`"Nm3/h"`, also written `"Nm³/h"`).
 * @category Units
 */
export type FlowUnit =
  | "mol/s" | "mol/h" | "kmol/s" | "kmol/h" | "lbmol/h"
  | "g/s" | "kg/s" | "kg/h" | "t/h" | "lb/h"
  | "Nm3/h" | "Nm³/h";
/** Power (heat-rate) units accepted by {@link toWatt} and {@link fromWatt}; kcal is thermochemical, Btu International Table. @category Units */
export type PowerUnit = "W" | "kW" | "MW" | "kcal/h" | "Btu/h" | "MMBtu/h";
/**
 * Units of molar enthalpy, heat of reaction or heating value accepted by {@link fromJoulePerMol}: per amount,
 * per mass (need the molar mass) or per normal cubic metre of ideal gas.
 * @category Units
 */
export type SpecificEnergyUnit =
  | "J/mol" | "kJ/mol" | "kJ/kmol" | "kcal/mol" | "Btu/lbmol"
  | "J/g" | "kJ/kg" | "MJ/kg" | "Btu/lb"
  | "kJ/Nm3" | "MJ/Nm3" | "kJ/Nm³" | "MJ/Nm³";

/** Standard temperature of the thermochemical tables, 298.15 K (IUPAC). @category Units */
export const STANDARD_TEMPERATURE_K = 298.15;
/** Standard-state pressure, 1 bar = 100 000 Pa (IUPAC 1982 recommendation). @category Units */
export const STANDARD_PRESSURE_PA = 100000;
/** One standard atmosphere in Pa (exact by definition). @category Units */
export const ATMOSPHERE_PA = 101325;
/** Molar gas constant R in J/(mol·K), exact since the 2019 SI (CODATA 2018). @category Units */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

const PRESSURE_PA: Record<PressureUnit, number> = {
  Pa: 1, kPa: 1e3, MPa: 1e6, bar: 1e5, atm: ATMOSPHERE_PA, psi: 6894.757293168361,
};
const ENERGY_J: Record<EnergyUnit, number> = {
  J: 1, kJ: 1e3, MJ: 1e6, cal: 4.184, kcal: 4184, Btu: 1055.05585262,
};
const AMOUNT_MOL: Record<AmountUnit, number> = { mol: 1, kmol: 1e3, lbmol: 453.59237 };
const POUND_KG = 0.45359237;
const BTU_J = 1055.05585262;
/** Ideal-gas molar volume at 0 °C and 101.325 kPa, m³/mol (DIN 1343 normal conditions). */
const NORMAL_M3_PER_MOL = (GAS_CONSTANT_J_PER_MOL_K * 273.15) / ATMOSPHERE_PA;
/** Flow unit → [factor, basis]: mol/s = value·factor (amount), ·factor/M (mass, kg/s·1000/M), ·factor/Vm (volume). */
const FLOW: Record<FlowUnit, readonly [number, "amount" | "mass" | "volume"]> = {
  "mol/s": [1, "amount"], "mol/h": [1 / 3600, "amount"], "kmol/s": [1e3, "amount"], "kmol/h": [1e3 / 3600, "amount"],
  "lbmol/h": [453.59237 / 3600, "amount"],
  "g/s": [1, "mass"], "kg/s": [1e3, "mass"], "kg/h": [1e3 / 3600, "mass"], "t/h": [1e6 / 3600, "mass"],
  "lb/h": [(POUND_KG * 1e3) / 3600, "mass"],
  "Nm3/h": [1 / 3600, "volume"], "Nm³/h": [1 / 3600, "volume"],
};
const POWER_W: Record<PowerUnit, number> = {
  W: 1, kW: 1e3, MW: 1e6, "kcal/h": 4184 / 3600, "Btu/h": BTU_J / 3600, "MMBtu/h": (BTU_J * 1e6) / 3600,
};
/** Specific-energy unit → [J per unit-of-energy, basis]: J/mol = value·factor per mol, per g, per m³. */
const SPECIFIC: Record<SpecificEnergyUnit, readonly [number, "amount" | "mass" | "volume"]> = {
  "J/mol": [1, "amount"], "kJ/mol": [1e3, "amount"], "kJ/kmol": [1, "amount"], "kcal/mol": [4184, "amount"],
  "Btu/lbmol": [BTU_J / 453.59237, "amount"],
  "J/g": [1, "mass"], "kJ/kg": [1, "mass"], "MJ/kg": [1e3, "mass"], "Btu/lb": [BTU_J / (POUND_KG * 1e3), "mass"],
  "kJ/Nm3": [1e3, "volume"], "MJ/Nm3": [1e6, "volume"], "kJ/Nm³": [1e3, "volume"], "MJ/Nm³": [1e6, "volume"],
};

/**
 * Convert a temperature to kelvin.
 *
 * @param value - temperature in `unit`
 * @param unit - `"K"`, `"C"` (°C), `"F"` (°F) or `"R"` (rankine)
 * @returns temperature in K
 * @throws RxthermError `INVALID_ARGUMENT` when the value is not finite or the result is below 0 K
 * @category Units
 * @example
 * toKelvin(25, "C") // => 298.15
 */
export function toKelvin(value: number, unit: TemperatureUnit): number {
  finite(value, "toKelvin");
  let k: number;
  switch (unit) {
    case "K": k = value; break;
    case "C": k = value + 273.15; break;
    case "F": k = (value - 32) * 5 / 9 + 273.15; break;
    case "R": k = value * 5 / 9; break;
    default: throw badUnit("toKelvin", unit);
  }
  if (k < 0) throw new RxthermError("INVALID_ARGUMENT", `toKelvin gives a negative absolute temperature (${k} K)`, { value, unit });
  return k;
}

/**
 * Convert a temperature from kelvin.
 *
 * @param kelvin - temperature in K
 * @param unit - target unit
 * @returns temperature in `unit`
 * @category Units
 * @example
 * fromKelvin(373.15, "C") // => 100
 */
export function fromKelvin(kelvin: number, unit: TemperatureUnit): number {
  finite(kelvin, "fromKelvin");
  switch (unit) {
    case "K": return kelvin;
    case "C": return roundOff(kelvin - 273.15);
    case "F": return roundOff((kelvin - 273.15) * 9 / 5 + 32);
    case "R": return kelvin * 9 / 5;
    default: throw badUnit("fromKelvin", unit);
  }
}

/**
 * Convert a pressure to pascal.
 *
 * @param value - pressure in `unit`
 * @param unit - `"Pa" | "kPa" | "MPa" | "bar" | "atm" | "psi"`
 * @returns pressure in Pa
 * @category Units
 * @example
 * toPascal(1, "atm") // => 101325
 */
export function toPascal(value: number, unit: PressureUnit): number {
  finite(value, "toPascal");
  return finiteResult(value * factorOf(PRESSURE_PA, unit, value, "toPascal"), "toPascal");
}

/**
 * Convert an energy to joule.
 *
 * @param value - energy in `unit`
 * @param unit - `"J" | "kJ" | "MJ" | "cal" | "kcal" | "Btu"` (thermochemical calorie, IT Btu)
 * @returns energy in J
 * @category Units
 * @example
 * toJoule(1, "kcal") // => 4184
 */
export function toJoule(value: number, unit: EnergyUnit): number {
  finite(value, "toJoule");
  return finiteResult(value * factorOf(ENERGY_J, unit, value, "toJoule"), "toJoule");
}

/**
 * Convert an amount of substance to mol.
 *
 * @param value - amount in `unit`
 * @param unit - `"mol" | "kmol" | "lbmol"`
 * @returns amount in mol
 * @category Units
 * @example
 * toMol(1, "lbmol") // => 453.59237
 */
export function toMol(value: number, unit: AmountUnit): number {
  finite(value, "toMol");
  return finiteResult(value * factorOf(AMOUNT_MOL, unit, value, "toMol"), "toMol");
}

/**
 * Convert a pressure from pascal.
 *
 * @param pascal - pressure in Pa
 * @param unit - target unit, `"Pa" | "kPa" | "MPa" | "bar" | "atm" | "psi"`
 * @returns pressure in `unit`
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value or an unknown unit
 * @category Units
 * @example
 * fromPascal(250000, "bar") // => 2.5
 */
export function fromPascal(pascal: number, unit: PressureUnit): number {
  return roundOff(pascal / factorOf(PRESSURE_PA, unit, pascal, "fromPascal"));
}

/**
 * Convert an energy from joule.
 *
 * @param joule - energy in J
 * @param unit - target unit, `"J" | "kJ" | "MJ" | "cal" | "kcal" | "Btu"` (thermochemical calorie, IT Btu)
 * @returns energy in `unit`
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value or an unknown unit
 * @category Units
 * @example
 * fromJoule(1055.05585262, "Btu") // => 1
 */
export function fromJoule(joule: number, unit: EnergyUnit): number {
  return roundOff(joule / factorOf(ENERGY_J, unit, joule, "fromJoule"));
}

/**
 * Convert a heat rate (power) to watt.
 *
 * @param value - power in `unit`
 * @param unit - `"W" | "kW" | "MW" | "kcal/h" | "Btu/h" | "MMBtu/h"` (thermochemical kcal, IT Btu)
 * @returns power in W
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value, an unknown unit, or a result beyond float64 (±1e308 MMBtu/h)
 * @category Units
 * @example
 * toWatt(1, "MMBtu/h") // => 293071.0701722222 (W)
 */
export function toWatt(value: number, unit: PowerUnit): number {
  return finiteResult(value * factorOf(POWER_W, unit, value, "toWatt"), "toWatt");
}

/**
 * Convert a heat rate (power), such as a heat duty in W, to the unit a reader asked for.
 *
 * @param watt - power in W (the unit of {@link heatDuty} for flows in mol/s)
 * @param unit - `"W" | "kW" | "MW" | "kcal/h" | "Btu/h" | "MMBtu/h"` (thermochemical kcal, IT Btu)
 * @returns power in `unit`
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value or an unknown unit
 * @category Units
 * @example
 * fromWatt(-521756.75, "kW") // => -521.75675
 */
export function fromWatt(watt: number, unit: PowerUnit): number {
  return roundOff(watt / factorOf(POWER_W, unit, watt, "fromWatt"));
}

/** A flow in some unit, for {@link toMolPerSecond}. @category Units */
export interface FlowQuantity {
  /** The flow, in `unit` (≥ 0 is not required: a difference of flows may be negative). */
  value: number;
  /** Its unit. */
  unit: FlowUnit;
  /** Molar mass of the species in g/mol; required for mass-flow units (`kg/h`, `lb/h`...). @defaultValue undefined */
  molarMassGPerMol?: number;
}

/** Options of {@link fromMolPerSecond} and {@link fromJoulePerMol}. @category Units */
export interface MolarMassOption {
  /** Molar mass in g/mol; required for per-mass units (`kg/h`, `kJ/kg`, `Btu/lb`...). @defaultValue undefined */
  molarMassGPerMol?: number;
}

/**
 * Convert a flow in kmol/h, lbmol/h, kg/h, lb/h, t/h, Nm³/h... to mol/s, the flow unit of the API.
 *
 * Mass flows divide by the molar mass (pass `molarMassGPerMol`, e.g. from `molarMass("CH4")`);
 * normal volume flows divide by the ideal-gas molar volume at 0 °C and 101.325 kPa
 * (22.413 97 L/mol, DIN 1343), which holds for gases only.
 *
 * @param flow - `{ value, unit, molarMassGPerMol? }`
 * @returns flow in mol/s
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value, an unknown unit, or a mass unit without a
 *   positive finite molar mass, or a result beyond float64 (a molar mass near 5e-324 g/mol, a value near 1e308)
 * @category Units
 * @example
 * toMolPerSecond({ value: 36, unit: "kmol/h" })                          // => 10 (mol/s)
 * toMolPerSecond({ value: 57.753, unit: "kg/h", molarMassGPerMol: 16.0425 })  // => 1 (mol/s of methane)
 */
export function toMolPerSecond(flow: FlowQuantity): number {
  if (flow === null || typeof flow !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", "toMolPerSecond requires an object { value, unit }", { flow });
  }
  const entry = factorOf(FLOW, flow.unit, flow.value, "toMolPerSecond");
  const divisor = basisDivisor("toMolPerSecond", entry[1], flow.unit, flow.molarMassGPerMol, "flow.molarMassGPerMol");
  return finiteResult((flow.value * entry[0]) / divisor, "toMolPerSecond");
}

/**
 * Convert a flow in mol/s (the API unit) to kmol/h, lbmol/h, kg/h, lb/h, t/h, Nm³/h...
 *
 * @param molPerSecond - flow in mol/s
 * @param unit - target flow unit
 * @param options - `molarMassGPerMol` for mass-flow units
 * @returns flow in `unit`
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value, an unknown unit, or a mass unit without a
 *   positive finite molar mass, or a result beyond float64 (a molar mass near 5e-324 g/mol, a value near 1e308);
 *   a non-object `options` (details `path`)
 * @category Units
 * @example
 * fromMolPerSecond(10, "kmol/h") // => 36
 * fromMolPerSecond(1, "Nm3/h")   // => 80.6903 (Nm³/h of ideal gas; rounded)
 */
export function fromMolPerSecond(molPerSecond: number, unit: FlowUnit, options?: MolarMassOption): number {
  const entry = factorOf(FLOW, unit, molPerSecond, "fromMolPerSecond");
  const { molarMassGPerMol } = optionsOf(options, "fromMolPerSecond");
  const divisor = basisDivisor("fromMolPerSecond", entry[1], unit, molarMassGPerMol, "options.molarMassGPerMol");
  return finiteResult(roundOff((molPerSecond * divisor) / entry[0]), "fromMolPerSecond");
}

/**
 * Convert a molar enthalpy, heat of reaction or heating value in J/mol (the API unit) to kJ/mol, kcal/mol,
 * Btu/lbmol, kJ/kg, MJ/kg, Btu/lb, or kJ/Nm³ and MJ/Nm³ of ideal gas.
 *
 * Per-mass units divide by the molar mass (pass `molarMassGPerMol`); per-Nm³ units multiply by the number of
 * moles in one normal cubic metre (0 °C, 101.325 kPa, ideal gas; DIN 1343).
 *
 * @param joulePerMol - energy per mol in J/mol
 * @param unit - target unit
 * @param options - `molarMassGPerMol` for per-mass units
 * @returns the energy in `unit`
 * @throws RxthermError `INVALID_ARGUMENT` for a non-finite value, an unknown unit, or a per-mass unit without a
 *   positive finite molar mass, or a result beyond float64 (a molar mass near 5e-324 g/mol, a value near 1e308);
 *   a non-object `options` (details `path`)
 * @category Units
 * @example
 * fromJoulePerMol(-890310.1, "kJ/mol")                              // => -890.3101
 * fromJoulePerMol(890310.1, "MJ/kg", { molarMassGPerMol: 16.0425 }) // => 55.497 (methane HHV; rounded)
 */
export function fromJoulePerMol(joulePerMol: number, unit: SpecificEnergyUnit, options?: MolarMassOption): number {
  const entry = factorOf(SPECIFIC, unit, joulePerMol, "fromJoulePerMol");
  const { molarMassGPerMol } = optionsOf(options, "fromJoulePerMol");
  const divisor = basisDivisor("fromJoulePerMol", entry[1], unit, molarMassGPerMol, "options.molarMassGPerMol");
  return finiteResult(roundOff(joulePerMol / divisor / entry[0]), "fromJoulePerMol");
}

/** Check the value, then the unit's entry in a factor table (own keys only: "toString" is no unit). */
function factorOf<U extends string, F>(table: Readonly<Record<U, F>>, unit: U, value: number, fn: string): F {
  finite(value, fn);
  if (typeof unit !== "string" || !Object.hasOwn(table, unit)) throw badUnit(fn, unit);
  return table[unit];
}
function finite(value: number, fn: string): void {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a finite number, got ${describeValue(value)}`, { value });
  }
}
function badUnit(fn: string, unit: unknown): RxthermError {
  return new RxthermError("INVALID_ARGUMENT", `${fn} does not know the unit ${describeValue(unit)}`, { unit });
}
/** What one mol is worth in the unit's basis: 1 (amount), M in g (mass), Vm in m³ (volume). */
function basisDivisor(
  fn: string,
  basis: "amount" | "mass" | "volume",
  unit: string,
  molarMassGPerMol: number | undefined,
  path: string,
): number {
  if (basis === "amount") return 1;
  if (basis === "volume") return NORMAL_M3_PER_MOL;
  if (typeof molarMassGPerMol !== "number" || !Number.isFinite(molarMassGPerMol) || molarMassGPerMol <= 0) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} requires a positive molarMassGPerMol for the mass unit ${unit} (finite, g/mol), got ${describeValue(molarMassGPerMol)}`,
      { path, unit, molarMassGPerMol: describeValue(molarMassGPerMol) },
    );
  }
  return molarMassGPerMol;
}
/** Remove float noise from offsets such as 373.15 − 273.15 (12 significant digits). */
function roundOff(x: number): number {
  const r = Number(x.toPrecision(12));
  return r === 0 ? 0 : r;
}

/**
 * Temperatures below this (K) given to the library are likely °C slips (25 meant as 25 °C);
 * out-of-range errors at such temperatures carry a hint. Cryogenic data ranges below it stay usable.
 *
 * @category Units
 * @example
 * CELSIUS_SLIP_BELOW_K // => 200
 * @see common practice (process temperatures in °C are rarely meant as kelvin below 200 K)
 */
export const CELSIUS_SLIP_BELOW_K = 200;

/**
 * The "was °C meant?" hint for a temperature in K that is positive but below
 * {@link CELSIUS_SLIP_BELOW_K}; `undefined` otherwise. Error sites append `hint` to their message
 * and put it in `details.hint`.
 *
 * @param temperatureK - the temperature given, K
 * @returns the hint text, or undefined when the temperature does not look like a °C slip
 * @category Units
 * @example
 * celsiusSlipHint(25) // => "was °C meant? 25 °C is 298.15 K"
 */
export function celsiusSlipHint(temperatureK: number): string | undefined {
  if (typeof temperatureK !== "number" || !(temperatureK > 0) || !(temperatureK < CELSIUS_SLIP_BELOW_K)) return undefined;
  return `was °C meant? ${temperatureK} °C is ${roundOff(temperatureK + 273.15)} K`;
}

/**
 * `"; <hint>"` for a message when {@link celsiusSlipHint} has one, else `""`.
 *
 * @param temperatureK - the temperature given, K
 * @returns text to append to an error message
 * @category Units
 * @example
 * withSlipHint(25) // => "; was °C meant? 25 °C is 298.15 K"
 */
export function withSlipHint(temperatureK: number): string {
  const h = celsiusSlipHint(temperatureK);
  return h === undefined ? "" : `; ${h}`;
}

/**
 * `{ hint }` for error details when {@link celsiusSlipHint} has one, else `{}`.
 *
 * @param temperatureK - the temperature given, K
 * @returns details to spread into an error's details
 * @category Units
 * @example
 * slipHintDetails(25).hint // => "was °C meant? 25 °C is 298.15 K"
 */
export function slipHintDetails(temperatureK: number): { hint?: string } {
  const h = celsiusSlipHint(temperatureK);
  return h === undefined ? {} : { hint: h };
}

/** A unit's factor: own keys of the table only, and only for a text unit (no "toString", no objects). */
function lookup(table: Readonly<Record<string, number>>, unit: unknown): number | undefined {
  return typeof unit === "string" && Object.prototype.hasOwnProperty.call(table, unit) ? table[unit] : undefined;
}
