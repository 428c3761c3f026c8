/**
 * Unit conversions into the SI units of the API (K, Pa, J, mol).
 *
 * Exact factors by definition: 1 atm = 101 325 Pa; 1 bar = 100 000 Pa; 1 psi = 6894.757293168361 Pa
 * (0.45359237 kg × 9.80665 m/s² / (0.0254 m)²); 1 kcal (thermochemical) = 4184 J;
 * 1 Btu (International Table) = 1055.05585262 J; 1 lbmol = 453.59237 mol; °R = K × 9/5.
 * Sources: NIST SP 811 (2008), Appendix B.
 *
 * @module
 */
import { RxthermError } from "./errors.js";
import { describeValue, finiteResult } from "./guards.js";

/** Temperature units accepted by {@link toKelvin} and {@link fromKelvin}. @category Units */
export type TemperatureUnit = "K" | "C" | "F" | "R";
/** Pressure units accepted by {@link toPascal}. @category Units */
export type PressureUnit = "Pa" | "kPa" | "MPa" | "bar" | "atm" | "psi";
/** Energy units accepted by {@link toJoule}. @category Units */
export type EnergyUnit = "J" | "kJ" | "MJ" | "cal" | "kcal" | "Btu";
/** Amount units accepted by {@link toMol}. @category Units */
export type AmountUnit = "mol" | "kmol" | "lbmol";

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
  const f = lookup(PRESSURE_PA, unit);
  if (f === undefined) throw badUnit("toPascal", unit);
  return finiteResult(value * f, "toPascal");
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
  const f = lookup(ENERGY_J, unit);
  if (f === undefined) throw badUnit("toJoule", unit);
  return finiteResult(value * f, "toJoule");
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
  const f = lookup(AMOUNT_MOL, unit);
  if (f === undefined) throw badUnit("toMol", unit);
  return finiteResult(value * f, "toMol");
}

function finite(value: number, fn: string): void {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a finite number, got ${describeValue(value)}`, { value });
  }
}
function badUnit(fn: string, unit: unknown): RxthermError {
  return new RxthermError("INVALID_ARGUMENT", `${fn} does not know the unit ${describeValue(unit)}`, { unit });
}
/** Remove float noise from offsets such as 373.15 − 273.15 (12 significant digits). */
function roundOff(x: number): number {
  const r = Number(x.toPrecision(12));
  return r === 0 ? 0 : r;
}

/** A unit's factor: own keys of the table only, and only for a text unit (no "toString", no objects). */
function lookup(table: Readonly<Record<string, number>>, unit: unknown): number | undefined {
  return typeof unit === "string" && Object.prototype.hasOwnProperty.call(table, unit) ? table[unit] : undefined;
}
