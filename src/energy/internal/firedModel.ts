/**
 * Private: the prepared energy balance of a fired heater, boiler or furnace, shared by
 * availableHeat (one point) and efficiencyCurve (many points). The fuel, air and flue-gas species
 * are resolved once; the flue gas is linear in the excess air (flue(e) = flue(0) + e·air(0), from two
 * views of `combustion`), so each point costs a handful of species enthalpies.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, knownKeys, rejectUnknownKeys } from "../../errors.js";
import { STANDARD_TEMPERATURE_K, ATMOSPHERE_PA, slipHintDetails, withSlipHint } from "../../units.js";
import type { Flows } from "../../extent/types.js";
import { combustion } from "../../extent/combustion.js";
import type { AvailableHeatInput } from "../firedTypes.js";
import { checkMixtureLimits } from "../../extent/mixtureLimits.js";
import { waterSaturationPressure } from "../../extent/waterSaturationPressure.js";
import { molarMass } from "../../formula/molarMass.js";
import type { Library, Species } from "../../species/types.js";
import { builtInLibrary } from "../../species/builtInLibrary.js";
import { resolveSpeciesCached } from "../../enthalpy/resolveInputs.js";
import { NORMAL_MOLAR_VOLUME_M3_PER_MOL, normalise, speciesHeatingValue } from "../../enthalpy/heatingValue.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../../species/noteExtrapolation.js";

/** The keys availableHeat and efficiencyCurve read (a misspelt one is an error, not a silent default). */
const FIRED_INPUT_KEYS = /* @__PURE__ */ knownKeys<AvailableHeatInput>()(
  "fuel", "excessAir", "equivalenceRatio", "oxidizer", "fuelT", "airT", "flueT", "humidity", "P", "condensing", "coPpm",
  "unburnedCarbon", "per", "library", "allowExtremeMixture", "extrapolate",
);


/** The inputs of the fired-equipment balance (availableHeat without flueT). */
export type FiredInputBase = Omit<AvailableHeatInput, "flueT">;

/** A species with its amount in a stream (mol per mol of fuel, or per unit of excess air). */
interface Part {
  readonly key: string;
  readonly species: Species;
  readonly n: number;
}

/** The prepared balance. */
export interface FiredModel {
  readonly fn: string;
  readonly fuel: readonly Part[];
  /** Stoichiometric oxidizer (with its moisture), per mol fuel. */
  readonly air: readonly Part[];
  /** Flue gas at zero excess air (complete combustion), per mol fuel, keyed like `flueKeys`. */
  readonly flueKeys: readonly string[];
  readonly flueSpecies: readonly Species[];
  readonly flue0: Float64Array;
  /** Oxidizer amount of each flue key per unit of excess air, mol per mol fuel. */
  readonly flueAir: Float64Array;
  readonly iH2O: number;
  readonly iCO2: number;
  readonly iO2: number;
  readonly iCO: number;
  readonly water: Species | null;
  readonly liquid: Species | null;
  readonly lhv: number;
  readonly hhv: number;
  readonly coHeatingValue: number;
  readonly carbonHeatingValue: number;
  readonly fuelMoistureLatent: number;
  readonly fuelCarbon: number;
  readonly unburnedCarbonMol: number;
  readonly coPpm: number;
  readonly fuelT: number;
  readonly airT: number;
  readonly P: number;
  readonly condensing: boolean;
  readonly extrapolate: boolean;
  /** Energy per mol fuel → per `per` unit. */
  readonly scale: number;
  readonly per: "mol" | "kg" | "Nm3";
  readonly fuelSensible: number;
  readonly fuelEnthalpy: number;
  /** Air enthalpy and sensible heat per unit of (1 + excess air). */
  readonly airEnthalpy: number;
  readonly airSensible: number;
  readonly allowExtremeMixture: boolean;
  readonly extrapolated: ExtrapolatedPoint[];
}

/** One evaluated point, per mol of fuel (scale applied by the caller). */
export interface FiredPoint {
  availableHeat: number;
  stackLoss: number;
  sensibleFuel: number;
  sensibleAir: number;
  latentRecovered: number;
  condensedWater: number;
  unburnedCO: number;
  unburnedCarbon: number;
  fuelMoisture: number;
  coMol: number;
  /** Flue gas leaving (gas only), mol per mol fuel, in flueKeys order. */
  flue: Float64Array;
}

const REF = STANDARD_TEMPERATURE_K;

/** A caller's value for error details: numbers as they are (JSON-safe), anything else as safe text. */
export function detailValue(v: unknown): number | string {
  return typeof v === "number" ? v : describeValue(v);
}

/** Resolve and check everything that does not depend on the flue temperature or the point. */
export function prepareFired(fn: string, input: FiredInputBase): FiredModel {
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { fuel, flueT, ... }, got ${describeValue(input)}`, { path: "input", value: detailValue(input) });
  }
  rejectUnknownKeys(input, FIRED_INPUT_KEYS, fn, "input");
  const library = input.library;
  const lookup = library ?? builtInLibrary();
  const extrapolate = input.extrapolate === true;
  const fuelT = temperature(fn, "fuelT", input.fuelT ?? REF);
  const airT = temperature(fn, "airT", input.airT ?? REF);
  const P = input.P ?? ATMOSPHERE_PA;
  if (typeof P !== "number" || !Number.isFinite(P) || !(P > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires P > 0 Pa, got ${describeValue(P)}`, { path: "input.P", P: detailValue(P) });
  }
  const per = input.per ?? "mol";
  if (per !== "mol" && per !== "kg" && per !== "Nm3") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires per "mol", "kg" or "Nm3", got ${describeValue(per)}`, { path: "input.per", per: detailValue(per) });
  }
  const coPpm = input.coPpm ?? 0;
  if (typeof coPpm !== "number" || !Number.isFinite(coPpm) || coPpm < 0 || coPpm >= 1e6) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires coPpm (dry flue gas, ppm by volume) in [0, 1e6), got ${describeValue(coPpm)}`, { path: "input.coPpm", coPpm: detailValue(coPpm) });
  }

  // ── fuel: mole fractions, species, heating values ──
  const extrapolated: ExtrapolatedPoint[] = [];
  const fuel: Part[] = normalise(fn, input.fuel).map(([key, x]) => ({ key, species: resolveSpeciesCached(fn, key, library), n: x }));
  let lhv = 0, hhv = 0, molarMassG = 0, fuelEnthalpy = 0, fuelSensible = 0, fuelMoistureLatent = 0, fuelCarbon = 0;
  const hfWaterGas = resolveSpeciesCached(fn, "H2O(g)", library).hf298;
  for (const p of fuel) {
    lhv += p.n * heatingValueCached(fn, p.species, "lower", library);
    hhv += p.n * heatingValueCached(fn, p.species, "higher", library);
    molarMassG += p.n * molarMass(p.species.formula);
    const h = enthalpyAt(p.species, fuelT, extrapolate, extrapolated);
    fuelEnthalpy += p.n * h;
    fuelSensible += p.n * (h - p.species.hf298);
    fuelCarbon += p.n * (p.species.formula.elements.C ?? 0);
    if (isWater(p.species) && p.species.phase !== "g") fuelMoistureLatent += p.n * (hfWaterGas - p.species.hf298);
    if (per === "Nm3" && p.species.phase !== "g") {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} per Nm3 needs gaseous fuel components; ${p.key} is not a gas`, { species: p.key, phase: p.species.phase });
    }
  }
  if (!(lhv > 0)) {
    throw new RxthermError("NOTHING_TO_BURN", `${fn}: the fuel has no heating value (LHV ${lhv} J/mol)`, { theoreticalO2: 0 });
  }

  // ── stoichiometry from combustion at zero excess air (excess air is added point by point) ──
  const fuelFlows: Flows = {};
  for (const p of fuel) fuelFlows[p.species.key] = (fuelFlows[p.species.key] ?? 0) + p.n;
  const common = { fuel: fuelFlows, library: lookup, ...(input.oxidizer !== undefined ? { oxidizer: input.oxidizer } : {}), ...(input.humidity !== undefined ? { humidity: input.humidity } : {}) };
  const allowExtremeMixture = input.allowExtremeMixture === true;
  const c0 = combustion({ ...common, excessAir: 0 });
  const keys = [...new Set([...Object.keys(c0.flueGas), ...Object.keys(c0.airFlows), "CO(g)"])];
  const flue0 = new Float64Array(keys.length);
  const flueAir = new Float64Array(keys.length);
  keys.forEach((k, i) => {
    flue0[i] = c0.flueGas[k] ?? 0;
    flueAir[i] = c0.airFlows[k] ?? 0;
  });
  const flueSpecies = keys.map((k) => resolveSpeciesCached(fn, k, library));
  const air: Part[] = Object.entries(c0.airFlows).map(([key, n]) => ({ key, species: resolveSpeciesCached(fn, key, library), n }));
  let airEnthalpy = 0, airSensible = 0;
  for (const p of air) {
    const h = enthalpyAt(p.species, airT, extrapolate, extrapolated);
    airEnthalpy += p.n * h;
    airSensible += p.n * (h - p.species.hf298);
  }

  // ── unburned carbon ──
  let unburnedCarbonMol = 0;
  const u = input.unburnedCarbon;
  if (u !== undefined) {
    if (u === null || typeof u !== "object" || Array.isArray(u)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires unburnedCarbon as an object, got ${describeValue(u)}`, { path: "input.unburnedCarbon", value: detailValue(u) });
    }
    if ("fractionOfFuelCarbon" in u) {
      const f = u.fractionOfFuelCarbon;
      if (typeof f !== "number" || !Number.isFinite(f) || f < 0 || f > 1) {
        throw new RxthermError("INVALID_ARGUMENT", `${fn} requires unburnedCarbon.fractionOfFuelCarbon in [0, 1], got ${describeValue(f)}`, {
          path: "input.unburnedCarbon.fractionOfFuelCarbon",
          fractionOfFuelCarbon: detailValue(f),
        });
      }
      unburnedCarbonMol = f * fuelCarbon;
    } else {
      const a = u.ashPerFuelMass;
      const w = u.carbonInAsh;
      if (typeof a !== "number" || !Number.isFinite(a) || a < 0 || typeof w !== "number" || !Number.isFinite(w) || w < 0 || w >= 1) {
        const bad = typeof a !== "number" || !Number.isFinite(a) || a < 0 ? "ashPerFuelMass" : "carbonInAsh";
        throw new RxthermError("INVALID_ARGUMENT", `${fn} requires unburnedCarbon.ashPerFuelMass >= 0 and 0 <= carbonInAsh < 1 (fractions, not %), got ${describeValue(a)} and ${describeValue(w)}`, {
          path: `input.unburnedCarbon.${bad}`,
          ashPerFuelMass: detailValue(a),
          carbonInAsh: detailValue(w),
        });
      }
      // carbon mass in the refuse per kg fuel = a·w/(1 − w); per mol fuel × M_fuel (kg/mol) / M_C (kg/mol)
      unburnedCarbonMol = ((a * w) / (1 - w)) * (molarMassG / CARBON_MOLAR_MASS_G);
    }
    if (unburnedCarbonMol > fuelCarbon * (1 + 1e-12)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: the unburned carbon (${unburnedCarbonMol} mol per mol fuel) exceeds the fuel carbon (${fuelCarbon})`, {
        unburnedCarbonMol,
        fuelCarbon,
      });
    }
  }

  const co = resolveSpeciesCached(fn, "CO(g)", library);
  const co2 = resolveSpeciesCached(fn, "CO2(g)", library);
  const condensing = input.condensing === true;
  const scale = per === "mol" ? 1 : per === "kg" ? 1000 / molarMassG : 1 / NORMAL_MOLAR_VOLUME_M3_PER_MOL;
  return {
    fn, fuel, air,
    flueKeys: keys, flueSpecies, flue0, flueAir,
    iH2O: keys.indexOf("H2O(g)"), iCO2: keys.indexOf("CO2(g)"), iO2: keys.indexOf("O2(g)"), iCO: keys.indexOf("CO(g)"),
    water: keys.includes("H2O(g)") ? resolveSpeciesCached(fn, "H2O(g)", library) : null,
    liquid: condensing ? resolveSpeciesCached(fn, "H2O(l)", library) : null,
    lhv, hhv,
    coHeatingValue: heatingValueCached(fn, co, "lower", library),
    carbonHeatingValue: -co2.hf298,
    fuelMoistureLatent, fuelCarbon, unburnedCarbonMol, coPpm,
    fuelT, airT, P, condensing, extrapolate, scale, per,
    fuelSensible, fuelEnthalpy, airEnthalpy, airSensible,
    allowExtremeMixture,
    extrapolated,
  };
}

/**
 * speciesHeatingValue (an exact decimal Hess sum, the costly part of a call) memoised per library
 * and species object; libraries and species are immutable, so the value cannot go stale.
 */
function heatingValueCached(fn: string, sp: Species, basis: "lower" | "higher", library: Library | undefined): number {
  const lib: object = library ?? BUILT_IN;
  let bySpecies = hvCache.get(lib);
  if (bySpecies === undefined) {
    bySpecies = new WeakMap();
    hvCache.set(lib, bySpecies);
  }
  let pair = bySpecies.get(sp);
  if (pair === undefined) {
    pair = [speciesHeatingValue(fn, sp, "lower", library), speciesHeatingValue(fn, sp, "higher", library)];
    bySpecies.set(sp, pair);
  }
  return basis === "lower" ? pair[0] : pair[1];
}
const BUILT_IN = {};
const hvCache = new WeakMap<object, WeakMap<Species, [number, number]>>();

/** Carbon, IUPAC standard atomic weight (conventional value), g/mol. */
const CARBON_MOLAR_MASS_G = 12.011;

/** Excess air of a point from excessAir or φ, checked like `combustion` (lean or stoichiometric only). */
export function excessAirOf(m: FiredModel, excessAir: number | undefined, equivalenceRatio: number | undefined): number {
  if (excessAir !== undefined && equivalenceRatio !== undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${m.fn} takes excessAir or equivalenceRatio, not both`, {
      path: "input.equivalenceRatio",
      excessAir: detailValue(excessAir),
      equivalenceRatio: detailValue(equivalenceRatio),
    });
  }
  try {
    checkMixtureLimits(m.fn, { excessAir, equivalenceRatio }, m.allowExtremeMixture);
  } catch (e) {
    // name the caller's field (checkMixtureLimits names its own argument)
    if (e instanceof RxthermError && typeof e.details.path === "string") {
      throw new RxthermError(e.code, e.message.replace(/^\[rxtherm\] /, ""), { ...e.details, path: e.details.path.replace(/^values\./, "input.") });
    }
    throw e;
  }
  let e = 0;
  if (equivalenceRatio !== undefined) {
    if (typeof equivalenceRatio !== "number" || !Number.isFinite(equivalenceRatio) || !(equivalenceRatio > 0) || equivalenceRatio > 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${m.fn} requires 0 < equivalenceRatio <= 1 (complete combustion), got ${describeValue(equivalenceRatio)}`, {
        path: "input.equivalenceRatio",
        equivalenceRatio: detailValue(equivalenceRatio),
      });
    }
    e = 1 / equivalenceRatio - 1;
  } else if (excessAir !== undefined) {
    if (typeof excessAir !== "number" || !Number.isFinite(excessAir) || excessAir < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${m.fn} requires excessAir >= 0 (a fraction: 0.2 = 20 %), got ${describeValue(excessAir)}`, {
        path: "input.excessAir",
        excessAir: detailValue(excessAir),
      });
    }
    e = excessAir;
  }
  return e;
}

/** Check a flue temperature (K). */
export function flueTemperature(m: FiredModel, flueT: number): number {
  const T = temperature(m.fn, "flueT", flueT);
  if (T < REF && !m.condensing) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${m.fn} requires flueT >= ${REF} K (the reference temperature) unless condensing: true, got ${T} K${withSlipHint(T)}`,
      { flueT: T, reference: REF, ...slipHintDetails(T) },
    );
  }
  return T;
}

/** Evaluate one point: excess air e (fraction) and flue temperature T (K). */
export function evaluateFired(m: FiredModel, e: number, T: number, out?: Float64Array): FiredPoint {
  const n = m.flueKeys.length;
  const flue = out ?? new Float64Array(n);
  for (let i = 0; i < n; i++) flue[i] = m.flue0[i]! + e * m.flueAir[i]!;
  // unburned carbon: stays solid (at the reference temperature); its O2 stays in the flue gas
  const nC = m.unburnedCarbonMol;
  if (nC > 0) {
    flue[m.iCO2] = flue[m.iCO2]! - nC;
    flue[m.iO2] = flue[m.iO2]! + nC;
  }
  // CO from a dry-basis ppm reading: y = nCO / (D + nCO/2) with D the dry total without CO
  let coMol = 0;
  if (m.coPpm > 0) {
    let dry = 0;
    for (let i = 0; i < n; i++) if (i !== m.iH2O) dry += flue[i]!;
    const y = m.coPpm * 1e-6;
    coMol = (y * dry) / (1 - y / 2);
    if (m.iCO2 < 0 || coMol > flue[m.iCO2]! * (1 + 1e-12)) {
      throw new RxthermError("INVALID_ARGUMENT", `${m.fn}: a CO reading of ${m.coPpm} ppm needs more carbon than the flue gas carries`, { coPpm: m.coPpm });
    }
    flue[m.iCO2] = Math.max(0, flue[m.iCO2]! - coMol);
    flue[m.iCO] = flue[m.iCO]! + coMol;
    flue[m.iO2] = flue[m.iO2]! + coMol / 2;
  }
  // condensation of water below the dew point (condensing only)
  let condensed = 0;
  if (m.condensing && m.iH2O >= 0 && T < 647.096) {
    if (T < 273.15) {
      throw new RxthermError("OUT_OF_RANGE", `${m.fn} condensing needs flueT >= 273.15 K (liquid water), got ${T} K${withSlipHint(T)}`, {
        flueT: T,
        range: [273.15, 647.096],
        ...slipHintDetails(T),
      });
    }
    let total = 0;
    for (let i = 0; i < n; i++) total += flue[i]!;
    const s = waterSaturationPressure(T) / m.P;
    const w = flue[m.iH2O]!;
    if (s < 1 && w > s * total) {
      condensed = (w - s * total) / (1 - s);
      flue[m.iH2O] = w - condensed;
    }
  }
  // enthalpies
  let hOut = 0, stack = 0;
  for (let i = 0; i < n; i++) {
    const amount = flue[i]!;
    if (amount === 0) continue;
    const sp = m.flueSpecies[i]!;
    const h = enthalpyAt(sp, T, m.extrapolate, m.extrapolated);
    hOut += amount * h;
    stack += amount * (h - sp.hf298);
  }
  let latentRecovered = 0;
  if (condensed > 0) {
    const liq = m.liquid!;
    const h = enthalpyAt(liq, T, m.extrapolate, m.extrapolated);
    hOut += condensed * h;
    stack += condensed * (h - liq.hf298);
    latentRecovered = condensed * (m.water!.hf298 - liq.hf298);
  }
  const hIn = m.fuelEnthalpy + (1 + e) * m.airEnthalpy;
  return {
    availableHeat: hIn - hOut,
    stackLoss: stack,
    sensibleFuel: m.fuelSensible,
    sensibleAir: (1 + e) * m.airSensible,
    latentRecovered,
    condensedWater: condensed,
    unburnedCO: coMol * m.coHeatingValue,
    unburnedCarbon: nC * m.carbonHeatingValue,
    fuelMoisture: m.fuelMoistureLatent,
    coMol,
    flue,
  };
}

/** H(T) of a species; out-of-range temperatures are an error unless extrapolating (then recorded). */
function enthalpyAt(sp: Species, T: number, extrapolate: boolean, record: ExtrapolatedPoint[]): number {
  if (extrapolate && (T < sp.range[0] || T > sp.range[1])) {
    noteExtrapolation(record, sp, T);
    return sp.enthalpy(T, EXTRAPOLATE);
  }
  return sp.enthalpy(T);
}

const EXTRAPOLATE = Object.freeze({ extrapolate: true });

function isWater(sp: Species): boolean {
  const e = sp.formula.elements;
  return Object.keys(e).length === 2 && e.H === 2 && e.O === 1;
}

function temperature(fn: string, name: string, T: number): number {
  if (typeof T !== "number" || !Number.isFinite(T) || !(T > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${name} as an absolute temperature > 0 K, got ${describeValue(T)}`, {
      path: `input.${name}`,
      [name]: detailValue(T),
    });
  }
  return T;
}
