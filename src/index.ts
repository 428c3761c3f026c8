/**
 * rxtherm — reaction thermochemistry for process, combustion and process-safety engineers.
 *
 * Every public name is listed here by name (no `export *`). Each module section is kept by
 * the team that owns that folder; add one reviewed line per new public symbol.
 *
 * @module
 */

// ── errors and units (layer 0) ───────────────────────────────────────────────
export { RxthermError, ERROR_CODES, isRxthermError } from "./errors.js";
export type { RxthermErrorCode, RxthermErrorDetails } from "./errors.js";
export {
  toKelvin, fromKelvin, toPascal, toJoule, toMol,
  STANDARD_TEMPERATURE_K, STANDARD_PRESSURE_PA, ATMOSPHERE_PA, GAS_CONSTANT_J_PER_MOL_K,
} from "./units.js";
export type { TemperatureUnit, PressureUnit, EnergyUnit, AmountUnit } from "./units.js";

// ── numeric (layer 0) ─────────────────────────────────────────────────────────
// (numeric section)

// ── formula (layer 1) ─────────────────────────────────────────────────────────
export type { Formula, Phase } from "./formula/types.js";
// (formula section)

// ── reaction (layer 2) ────────────────────────────────────────────────────────
export type { Reaction, Term } from "./reaction/types.js";
// (reaction section)

// ── extent and combustion (layer 3) ──────────────────────────────────────────
export type { Flows, Stream, ExtentSpec } from "./extent/types.js";
// (extent section)

// ── heat capacity (layer 3) ───────────────────────────────────────────────────
// (heat-capacity section)

// ── species and library (layer 4) ─────────────────────────────────────────────
// (species section)

// ── enthalpy (layer 5) ────────────────────────────────────────────────────────
// (enthalpy section)

// ── energy balances (layer 6) ─────────────────────────────────────────────────
// (energy section)

// ── flame (layer 6) ───────────────────────────────────────────────────────────
// (flame section)
