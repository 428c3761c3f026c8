/**
 * Numbers with units as typed on a command line or in a case file: `25C`, `-40 °F`, `2bar`,
 * `15%`, `120 Nm3/h`, `1800K`. A bare number is read in the SI unit of the API (K, Pa, mol/s).
 *
 * @module
 */
import {
  toKelvin, toPascal, type FlowUnit, type PowerUnit, type PressureUnit, type SpecificEnergyUnit, type TemperatureUnit,
} from "../../units.js";
import { UsageError } from "./usage.js";

const NUMBER = String.raw`[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const QUANTITY_RE = new RegExp(String.raw`^\s*(${NUMBER})\s*(.*?)\s*$`);

/** Temperature text: a number and K, C, °C, F, °F or R (a bare number is K). Shared with the case-file schema. */
export const TEMPERATURE_PATTERN = String.raw`^\s*${NUMBER}\s*(K|C|°C|F|°F|R)?\s*$`;
/** Pressure text: a number and Pa, kPa, MPa, bar, atm or psi (a bare number is Pa). Shared with the case-file schema. */
export const PRESSURE_PATTERN = String.raw`^\s*${NUMBER}\s*(Pa|kPa|MPa|bar|atm|psi)?\s*$`;

const TEMPERATURE_UNITS: Record<string, TemperatureUnit> = { "": "K", K: "K", C: "C", "°C": "C", F: "F", "°F": "F", R: "R" };
const PRESSURE_UNITS: readonly PressureUnit[] = ["Pa", "kPa", "MPa", "bar", "atm", "psi"];
/** Flow units the command line accepts (those of {@link toMolPerSecond}). */
export const FLOW_UNITS: readonly FlowUnit[] = [
  "mol/s", "mol/h", "kmol/s", "kmol/h", "lbmol/h", "g/s", "kg/s", "kg/h", "t/h", "lb/h", "Nm3/h", "Nm³/h",
];
/** Power units for duties. */
export const POWER_UNITS: readonly PowerUnit[] = ["W", "kW", "MW", "kcal/h", "Btu/h", "MMBtu/h"];
/** Units for reaction enthalpies and heating values. */
export const SPECIFIC_ENERGY_UNITS: readonly SpecificEnergyUnit[] = [
  "J/mol", "kJ/mol", "kJ/kmol", "kcal/mol", "Btu/lbmol", "J/g", "kJ/kg", "MJ/kg", "Btu/lb", "kJ/Nm3", "MJ/Nm3", "kJ/Nm³", "MJ/Nm³",
];

function split(text: string, what: string): [number, string] {
  const m = QUANTITY_RE.exec(text);
  if (m === null) throw new UsageError(`${what} must be a number with an optional unit, got "${text}"`);
  return [Number(m[1]), m[2]!];
}

/** Temperature text → K. `what` names the option in the error (`--T`). */
export function readTemperature(text: string, what: string): number {
  const [value, unitText] = split(text, what);
  const unit = TEMPERATURE_UNITS[unitText];
  if (unit === undefined) throw new UsageError(`${what} has unit "${unitText}"; use K, C, °C, F, °F or R (e.g. 25C)`);
  const k = toKelvin(value, unit);
  if (k <= 0) throw new UsageError(`${what} must be above absolute zero, got ${text}`);
  return k;
}

/** Comma-separated temperatures (`25C,250C,1000K`) → K. */
export function readTemperatures(text: string, what: string): number[] {
  return text.split(",").map((t) => readTemperature(t, what));
}

/** Pressure text → Pa. */
export function readPressure(text: string, what: string): number {
  const [value, unitText] = split(text, what);
  const unit = unitText === "" ? "Pa" : (PRESSURE_UNITS as readonly string[]).includes(unitText) ? (unitText as PressureUnit) : undefined;
  if (unit === undefined) throw new UsageError(`${what} has unit "${unitText}"; use Pa, kPa, MPa, bar, atm or psi (e.g. 2bar)`);
  const pa = toPascal(value, unit);
  if (pa <= 0) throw new UsageError(`${what} must be positive, got ${text}`);
  return pa;
}

/**
 * A fraction written as `15%` or `0.15` → 0.15. A bare number above 1 is refused: `15` could mean 15 % or
 * 1500 %, so values above 100 % must carry the `%` sign (`150%`).
 */
export function readFraction(text: string, what: string): number {
  const [value, unitText] = split(text, what);
  if (unitText !== "" && unitText !== "%") throw new UsageError(`${what} must be a fraction (0.15) or a percentage (15%), got "${text}"`);
  if (unitText === "" && Math.abs(value) > 1) {
    throw new UsageError(`${what} ${text} is ambiguous: write a percentage with its sign (${text}%) or a fraction (${value / 100})`);
  }
  return unitText === "%" ? value / 100 : value;
}

/** A positive plain number (equivalence ratio...). */
export function readPositive(text: string, what: string): number {
  const [value, unitText] = split(text, what);
  if (unitText !== "" || !(value > 0)) throw new UsageError(`${what} must be a positive number, got "${text}"`);
  return value;
}

/** A flow with a unit (`120Nm3/h`, `2 kmol/h`; a bare number is mol/s). */
export function readFlow(text: string, what: string): { value: number; unit: FlowUnit } {
  const [value, unitText] = split(text, what);
  const unit = unitText === "" ? "mol/s" : oneOf(unitText, FLOW_UNITS, what);
  if (!(value > 0)) throw new UsageError(`${what} must be positive, got "${text}"`);
  return { value, unit };
}

/** A unit name from a list, or a usage error listing the list. */
export function oneOf<T extends string>(text: string, list: readonly T[], what: string): T {
  if ((list as readonly string[]).includes(text)) return text as T;
  throw new UsageError(`${what} must be one of ${list.join(", ")}; got "${text}"`);
}
