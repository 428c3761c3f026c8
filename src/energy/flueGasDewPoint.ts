import { RxthermError, describeValue, knownKeys, rejectUnknownKeys, requireRecord } from "../errors.js";
import { parseFormula } from "../formula/parseFormula.js";
import type { Formula } from "../formula/types.js";
import type { Flows } from "../extent/types.js";
import { waterSaturationTemperature } from "../extent/waterSaturationPressure.js";
import type { Library } from "../species/types.js";
import { resolveSpeciesCached } from "../enthalpy/resolveInputs.js";
import { attachView } from "../view/attachView.js";
import { DEW_POINT_VIEW } from "./internal/firedView.js";
import type { FlueGasDewPointResult } from "./firedTypes.js";
export type { FlueGasDewPointResult } from "./firedTypes.js";

const INPUT_KEYS = /* @__PURE__ */ knownKeys<FlueGasDewPointInput>()("composition", "P", "so3Fraction", "library");

/**
 * Input of {@link flueGasDewPoint}.
 *
 * @category Fired equipment
 */
export interface FlueGasDewPointInput {
  /**
   * Flue gas: species key → mol, mol/s or mole fraction (normalised here). Keys are formulas with or
   * without a gas phase (`"H2O(g)"`, `"SO2"`) or names in the library; water must be present.
   */
  composition: Flows;
  /** Total pressure of the flue gas, Pa (101 325 Pa for a furnace near atmospheric). */
  P: number;
  /**
   * Share of the sulfur oxides (SO2 + SO3) present as SO3, 0–1. Boilers and heaters typically convert
   * 1–5 % of the SO2 to SO3 (common practice; it rises with excess air, vanadium in the fuel and
   * catalytic surfaces).
   * @defaultValue the SO3 listed in `composition` when it lists any, else {@link DEFAULT_SO3_FRACTION}
   */
  so3Fraction?: number;
  /** Species library used to read keys that are names. @defaultValue the built-in library */
  library?: Library;
}


/**
 * Share of the sulfur oxides taken as SO3 when neither `so3Fraction` nor any SO3 is given: 2 %.
 *
 * @category Fired equipment
 * @example
 * DEFAULT_SO3_FRACTION // => 0.02
 * @see common practice (1–5 % of the SO2 converts to SO3 in boilers and fired heaters)
 */
export const DEFAULT_SO3_FRACTION = 0.02;

/**
 * Water and sulfuric-acid dew points of a flue gas.
 *
 * **Water:** the water partial pressure p_w = y_w·P is set equal to the saturation pressure; the dew
 * point is the IAPWS-IF97 saturation temperature at p_w ({@link waterSaturationTemperature}, eq. 31
 * of IAPWS R7-97). Ideal-gas mixture; below the triple-point pressure (611.213 Pa) there is no liquid
 * dew point and the call fails.
 *
 * **Acid:** with SO3 present (or SO2, of which `so3Fraction` is taken as SO3), the correlation of
 * F. H. Verhoff and J. T. Banchero, Chem. Eng. Prog. 70 (8) (1974) 71–72:
 * 1000/T_acid = 2.276 − 0.0294·ln p_w − 0.0858·ln p_SO3 + 0.0062·ln p_w·ln p_SO3,
 * T in K, partial pressures in mmHg (coefficients written from memory). It was fitted to the
 * H2SO4–H2O vapour–liquid equilibrium at flue-gas conditions; we treat it as valid for water partial
 * pressures of 1–30 % of an atmosphere and SO3 of 1 ppm–0.1 % of an atmosphere (range from memory;
 * outside it `acidWithinRange` is false).
 *
 * **Caution:** the acid dew point read as a minimum metal temperature is a screening figure. Real
 * cold-end corrosion depends on the SO3 actually formed, on metal temperature rather than gas
 * temperature, on deposits and on load changes; corrosion margins follow the equipment makers and
 * local practice. Condensing operation (flue gas below the water dew point) needs materials chosen for
 * acid condensate.
 *
 * @param input - flue gas composition, total pressure (Pa), SO3 share, library
 * @returns water dew point (K), acid dew point (K, when sulfur is present), partial pressures (Pa)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` without water, for a non-positive or non-finite pressure,
 *   a negative or non-finite amount, an `so3Fraction` outside [0, 1], or a key in a condensed phase
 * @throws {@link RxthermError} `OUT_OF_RANGE` when the water partial pressure lies outside the IF97 saturation line (611.213 Pa – 22.064 MPa),
 *   or the SO3 partial pressure is so high that the acid dew point correlation gives no positive temperature
 * @throws {@link RxthermError} `UNKNOWN_SPECIES` for a key that is neither a formula nor a name in the library
 * @example
 * // 10 % water and 10 ppm SO3 at 1 atm (hand computation from the correlation: 410.4 K)
 * const d = flueGasDewPoint({ composition: { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 }, P: 101325 });
 * d.waterK // => 319.2… (K, 46.1 °C)
 * d.acidK  // => 410.4… (K, 137 °C)
 * @category Fired equipment
 * @see IAPWS R7-97(2012), eq. 31 (saturation temperature); F. H. Verhoff, J. T. Banchero, "Predicting dew points
 *   of flue gases", Chem. Eng. Prog. 70 (8) (1974) 71–72 (acid dew point)
 */
export function flueGasDewPoint(input: FlueGasDewPointInput): FlueGasDewPointResult {
  const fn = "flueGasDewPoint";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { composition, P }, got ${describeValue(input)}`, {
      path: "input",
      value: describeValue(input),
    });
  }
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  const { P } = input;
  if (typeof P !== "number" || !Number.isFinite(P) || !(P > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a total pressure P > 0 Pa, got ${describeValue(P)}`, { path: "input.P", P: detail(P) });
  }
  const parts = flueParts(fn, input.composition, input.library);
  if (!(parts.water > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires water vapour in the composition (H2O(g)); without it there is no dew point`, {
      composition: Object.keys(input.composition),
    });
  }
  const waterPa = (parts.water / parts.total) * P;
  const waterK = waterSaturationTemperature(waterPa);
  const sulfurOxides = parts.so2 + parts.so3;
  let share: number;
  if (input.so3Fraction !== undefined) {
    const x = input.so3Fraction;
    if (typeof x !== "number" || !Number.isFinite(x) || x < 0 || x > 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires so3Fraction in [0, 1] (a fraction, not %), got ${describeValue(x)}`, {
        path: "input.so3Fraction",
        so3Fraction: detail(x),
      });
    }
    share = x;
  } else share = parts.so3 > 0 ? parts.so3 / sulfurOxides : DEFAULT_SO3_FRACTION;
  const so3Pa = sulfurOxides > 0 ? ((share * sulfurOxides) / parts.total) * P : 0;
  if (!(so3Pa > 0)) return attachView({ waterK, waterPa, so3Pa: 0 }, DEW_POINT_VIEW);
  const acidK = acidDewPointK(waterPa, so3Pa);
  if (!Number.isFinite(acidK) || !(acidK > 0)) {
    // only at SO3 partial pressures far beyond any flue gas (the correlation's denominator reaches 0)
    throw new RxthermError("OUT_OF_RANGE", `${fn}: the acid dew point correlation gives no temperature at an SO3 partial pressure of ${so3Pa} Pa`, {
      path: "input.composition",
      so3Pa,
      waterPa,
    });
  }
  return attachView({ waterK, acidK, waterPa, so3Pa, acidWithinRange: acidInRange(waterPa, so3Pa) }, DEW_POINT_VIEW);
}

/** Pa per mmHg (torr: 101 325/760 Pa; mmHg differs by 1.4e-7 relative). */
const PA_PER_MMHG = 101325 / 760;

/** Verhoff–Banchero (1974) sulfuric-acid dew point, K, from partial pressures in Pa. */
function acidDewPointK(waterPa: number, so3Pa: number): number {
  const lw = Math.log(waterPa / PA_PER_MMHG);
  const ls = Math.log(so3Pa / PA_PER_MMHG);
  // Verhoff & Banchero, Chem. Eng. Prog. 70 (8) (1974) 71 — coefficients from memory
  return 1000 / (2.276 - 0.0294 * lw - 0.0858 * ls + 0.0062 * lw * ls);
}

/** The range we apply the correlation in: water 1–30 % and SO3 1e-6–1e-3 of 1 atm (from memory). */
function acidInRange(waterPa: number, so3Pa: number): boolean {
  const atm = 101325;
  return waterPa >= 0.01 * atm && waterPa <= 0.3 * atm && so3Pa >= 1e-6 * atm && so3Pa <= 1e-3 * atm;
}

interface FlueParts {
  total: number;
  water: number;
  so2: number;
  so3: number;
}

/** Totals of a flue gas by formula: all gas, water, SO2 and SO3. */
function flueParts(fn: string, composition: Flows, library: Library | undefined): FlueParts {
  requireRecord(composition, fn, "input.composition");
  const out: FlueParts = { total: 0, water: 0, so2: 0, so3: 0 };
  for (const [key, n] of Object.entries(composition)) {
    if (typeof n !== "number" || !Number.isFinite(n) || n < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite amounts >= 0, got ${describeValue(n)} for ${describeValue(key)}`, {
        path: `input.composition.${key}`,
        species: key,
        amount: detail(n),
      });
    }
    if (n === 0) continue;
    const sig = gasSignature(fn, key, library);
    out.total += n;
    if (sig === "H2O1") out.water += n;
    else if (sig === "O2S1") out.so2 += n;
    else if (sig === "O3S1") out.so3 += n;
  }
  if (!(out.total > 0)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a composition with a positive total`, { path: "input.composition" });
  if (!Number.isFinite(out.total)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot total the composition: its amounts sum beyond the float64 range (scale them down)`, { path: "input.composition" });
  }
  return out;
}

/** Element signature of a gas key ("H2O1", "O2S1"...), memoised for formula keys (bounded). */
function gasSignature(fn: string, key: string, library: Library | undefined): string {
  const hit = signatureCache.get(key);
  if (hit !== undefined) return hit;
  const f = gasFormula(fn, key, library);
  const sig = signature(f);
  if (library === undefined && isFormulaKey(key)) {
    if (signatureCache.size >= 1024) signatureCache.clear();
    signatureCache.set(key, sig);
  }
  return sig;
}
const signatureCache = new Map<string, string>();

function isFormulaKey(key: string): boolean {
  try {
    parseFormula(key);
    return true;
  } catch {
    return false;
  }
}

function gasFormula(fn: string, key: string, library: Library | undefined): Formula {
  let f: Formula;
  try {
    f = parseFormula(key);
  } catch (e) {
    if (!(e instanceof RxthermError)) throw e;
    f = resolveSpeciesCached(fn, key, library).formula;
  }
  if (f.phase !== null && f.phase !== "g") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} takes the gas phase only; ${key} is not a gas`, { species: key, phase: f.phase });
  }
  return f;
}

/** A caller's value for error details: numbers as they are, anything else as safe text. */
function detail(v: unknown): number | string {
  return typeof v === "number" ? v : describeValue(v);
}

function signature(f: Formula): string {
  return Object.keys(f.elements).sort().map((e) => `${e}${f.elements[e]}`).join("");
}
