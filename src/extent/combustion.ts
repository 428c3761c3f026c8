import { RxthermError, describeValue, finiteResult, knownKeys, rejectUnknownKeys, requireRecord } from "../errors.js";
import type { Formula } from "../formula/types.js";
import { molarMass } from "../formula/molarMass.js";
import { formulaOf, molarMassOf, validateFlows } from "./internal/extentSystem.js";
import type { Flows, FormulaLookup } from "./types.js";
import { waterSaturationPressure } from "./waterSaturationPressure.js";
import { compensatedSum } from "../numeric/compensatedSum.js";
import { checkMixtureLimits } from "./mixtureLimits.js";
import { attachView } from "../view/attachView.js";
import { COMBUSTION_VIEW } from "./internal/extentView.js";
import { speciesByName } from "../formula/speciesNames.js";

/** The keys combustion reads (a misspelt one is an error, not a silent default). */
const INPUT_KEYS = /* @__PURE__ */ knownKeys<CombustionInput>()(
  "fuel", "excessAir", "equivalenceRatio", "oxidizer", "oxygenEnrichment", "humidity", "carbonToCO", "allowExtremeMixture", "library",
);

/**
 * Dry air by mole fraction, with its argon and CO₂ (pass it as `oxidizer` where the argon and the
 * 412 ppm CO₂ of real air matter, e.g. to match an analyser reading to the last 0.1 %): O₂ 0.209476 and Ar
 * 0.00934 from the U.S. Standard Atmosphere 1976 (table 3; values written from memory of that table), CO₂ 0.000412 (≈ 412 ppm, the
 * global mean of about 2020; NOAA Global Monitoring Laboratory — value from memory), and N₂ the
 * balance 0.780772 (the 1976 table's 0.78084 less the CO₂ update; Ne, He, Kr and the other
 * trace gases, about 24 ppm, are lumped into it). Sums to exactly 1. Molar mass 28.966 g/mol.
 *
 * @category Combustion
 * @example
 * DRY_AIR["O2(g)"] // => 0.209476
 * @see U.S. Standard Atmosphere, 1976, NOAA/NASA/USAF, Washington D.C. 1976, table 3 (sea-level composition of dry air)
 */
export const DRY_AIR: Readonly<Flows> = /* @__PURE__ */ Object.freeze({
  "N2(g)": 0.780772,
  "O2(g)": 0.209476,
  "Ar(g)": 0.00934,
  "CO2(g)": 0.000412,
});

/**
 * The air of combustion calculations: 21 % O₂ and 79 % N₂ by mole (3.762 mol N₂ per mol O₂; argon
 * and CO₂ counted as nitrogen). It is the one default air of rxtherm — {@link combustion}, the flame
 * functions and `availableHeat` all use it when no oxidizer is given, so the same fuel gives the
 * same air and flue gas everywhere. Why this one: it is the convention of published combustion
 * tables and flame temperatures, so results can be checked against them, and it keeps carbon out
 * of the air (a hydrogen flame has no trace CO₂ to carry). It differs from {@link DRY_AIR} by 0.24 %
 * in the air needed (O₂ 0.21 against 0.2095) and by the 0.93 % argon, counted here as nitrogen.
 *
 * @category Combustion
 * @example
 * AIR_21_79["N2(g)"] // => 0.79
 * @see common practice (e.g. the 3.76 mol N₂ per mol O₂ of combustion stoichiometry)
 */
export const AIR_21_79: Readonly<Flows> = /* @__PURE__ */ Object.freeze({ "N2(g)": 0.79, "O2(g)": 0.21 });

/**
 * Ultimate (elemental) analysis of a solid or liquid fuel, as mass fractions of the fuel as
 * fired (they must sum to 1 within 0.001). H and O exclude the moisture, which is listed apart.
 *
 * @category Combustion
 */
export interface UltimateAnalysis {
  /** Carbon, mass fraction. */
  C: number;
  /** Hydrogen (excluding moisture), mass fraction. */
  H: number;
  /** Oxygen (excluding moisture), mass fraction. @defaultValue 0 */
  O?: number;
  /** Nitrogen, mass fraction. @defaultValue 0 */
  N?: number;
  /** Sulfur, mass fraction. @defaultValue 0 */
  S?: number;
  /** Free water, mass fraction. @defaultValue 0 */
  moisture?: number;
  /** Ash (incombustible), mass fraction. @defaultValue 0 */
  ash?: number;
}

/**
 * A fuel given by ultimate analysis and (optionally) its mass flow.
 *
 * @category Combustion
 */
export interface UltimateFuel {
  /** Mass fractions of the fuel as fired. */
  ultimate: UltimateAnalysis;
  /** Fuel mass in kg (or kg/s); results are per this amount. @defaultValue 1 (results per kg fuel) */
  massFlowKg?: number;
}

/**
 * Humidity of the combustion air: relative humidity at a temperature (and pressure), or the
 * water mole fraction of the moist air directly.
 *
 * @category Combustion
 */
export type AirHumidity =
  | {
      /** Relative humidity, 0–1 (fraction, not %). */
      relativeHumidity: number;
      /** Air temperature in K (273.15–647.096). */
      temperatureK: number;
      /** Air pressure in Pa. @defaultValue 101 325 Pa */
      pressurePa?: number;
    }
  | {
      /** Mole fraction of water in the moist air, 0 ≤ y < 1. */
      waterMoleFraction: number;
    };

/**
 * Input of {@link combustion}.
 *
 * @category Combustion
 */
export interface CombustionInput {
  /** Fuel: species flows (mol or mol/s; keys like `CH4(g)` or `CH4`), or an {@link UltimateFuel}. */
  fuel: Flows | UltimateFuel;
  /** Excess air as a fraction (0.2 = 20 % excess), ≥ 0. @defaultValue 0 (or from equivalenceRatio) */
  excessAir?: number;
  /** Equivalence ratio φ in (0, 1]; excessAir = 1/φ − 1. Give this or excessAir, not both. */
  equivalenceRatio?: number;
  /**
   * Dry oxidizer: `"air"` ({@link AIR_21_79}, the one default air of rxtherm, shared with the flame
   * functions and `availableHeat`), `"oxygen"` (pure O₂), or a composition (relative mole amounts,
   * normalised here), e.g. {@link DRY_AIR} for air with its argon and CO₂.
   * @defaultValue "air" ({@link AIR_21_79})
   */
  oxidizer?: "air" | "oxygen" | Flows;
  /** O₂ mole fraction of the dry oxidizer after enriching it with pure O₂ (between its own O₂ fraction and 1). */
  oxygenEnrichment?: number;
  /** Moisture of the oxidizer. @defaultValue dry */
  humidity?: AirHumidity;
  /** Fraction of the fuel carbon leaving as CO instead of CO₂, 0–1. @defaultValue 0 */
  carbonToCO?: number;
  /**
   * Accept excess air above {@link MAX_EXCESS_AIR} (300 %) or an equivalence ratio outside
   * {@link EQUIVALENCE_RATIO_LIMITS}; without it such values are taken as unit slips and rejected.
   * @defaultValue false
   */
  allowExtremeMixture?: boolean;
  /**
   * Species library used to read fuel keys that are not formulas (names), as the flame functions
   * and `availableHeat` do. Without it names are those of the built-in species (`"methane"`,
   * `"propane"`, `"n-butane"`: the table of names the built-in library takes its names
   * from), so the result is the same as with `builtInLibrary()`. Keys that are formulas (`"CH4(g)"`,
   * `"CH4"`) are read directly.
   * @defaultValue the names of the built-in species
   */
  library?: FormulaLookup;
}

/**
 * Result of {@link combustion}. Amounts in mol (or mol/s) of the fuel amount given (per kg fuel
 * for an ultimate analysis without `massFlowKg`).
 *
 * @category Combustion
 */
export interface CombustionResult {
  /** O₂ needed for complete combustion (C→CO₂, H→H₂O, S→SO₂), net of the fuel's own O: mol. */
  theoreticalO2: number;
  /** Dry oxidizer at the stoichiometric point, mol. */
  theoreticalAir: number;
  /** Oxidizer actually fed, including its moisture, mol. */
  air: number;
  /** Dry part of the oxidizer fed, mol. */
  dryAir: number;
  /** Species flows of the oxidizer fed, mol. */
  airFlows: Flows;
  /** O₂ fed, mol. */
  o2Supplied: number;
  /** Excess air fraction (0.2 = 20 %). */
  excessAir: number;
  /** Equivalence ratio φ = 1/(1 + excessAir). */
  equivalenceRatio: number;
  /** Flue gas species flows, mol (keys with phase, e.g. `CO2(g)`). */
  flueGas: Flows;
  /** Total flue gas, mol. */
  flueGasTotal: number;
  /** Total flue gas without water, mol. */
  dryFlueGasTotal: number;
  /** Mole fractions of the wet flue gas. */
  wet: Record<string, number>;
  /** Mole fractions of the dry flue gas (water removed). */
  dry: Record<string, number>;
  /** Fuel mass, kg (or kg/s), ash and moisture included. */
  fuelMassKg: number;
  /** Oxidizer mass fed (with moisture), kg. */
  airMassKg: number;
  /** Oxidizer fed per fuel mass, kg/kg. */
  airToFuelMass: number;
  /** Dry stoichiometric oxidizer per fuel mass, kg/kg. */
  theoreticalAirToFuelMass: number;
  /** Ash leaving as solid (not in the flue gas), kg. */
  ashKg: number;
}

/**
 * Air and flue gas of the complete combustion of a fuel at a given excess air.
 *
 * The default oxidizer is the 21/79 air ({@link AIR_21_79}) shared with the flame functions and
 * `availableHeat`; pass `oxidizer: DRY_AIR` for air with its argon and CO₂. Excess air above 3
 * (300 %) or φ outside 0.05–20 is taken as a unit slip unless `allowExtremeMixture: true`. Fuel keys
 * are formulas, or names: those of the built-in species (`"methane"`, `"propane"`, `"hydrogen"`; the
 * same reading as the flame functions and `availableHeat`), or those of `library` when given.
 *
 * The fuel is reduced to its elements (C, H, O, N, S and noble gases); complete combustion makes
 * CO₂, H₂O, SO₂ and N₂ (fuel nitrogen leaves as N₂ — thermal and fuel NOx are trace amounts not
 * modelled here). Theoretical O₂ = C + H/4 + S − O/2 (mol of atoms). The dry oxidizer fed is
 * (1 + excessAir) · theoreticalO2 / y_O₂; its N₂, Ar, CO₂ and any moisture pass to the flue gas
 * with the unused O₂. Optionally a fraction of the carbon leaves as CO (its unused O₂ stays in the
 * flue gas). Equivalence ratio φ = (fuel/oxidizer) ÷ (fuel/oxidizer)stoich = 1/(1 + excessAir).
 *
 * Rich mixtures (φ > 1, negative excess air) are rejected: their products depend on the
 * CO/H₂ equilibrium, which is a flame calculation, not stoichiometry. Ideal gases; fractions by
 * mole. Results are screening estimates: burner and furnace design follow the applicable codes
 * and licensed engineering practice.
 *
 * @param input - fuel, excess air or equivalence ratio, oxidizer, humidity, enrichment, CO fraction
 * @returns theoretical O₂ and air, air fed, flue gas flows (mol or mol/s) and wet and dry mole fractions, masses in kg
 * @throws {@link RxthermError} `INVALID_ARGUMENT` for excess air < 0 or φ > 1 (rich; details: `equivalenceRatio`, `oxygenDeficit`),
 *   excess air above 3 or φ outside 0.05–20 without `allowExtremeMixture` (a likely unit slip; details: `hint`),
 *   both excessAir and equivalenceRatio, fractions outside their range, an ultimate analysis not summing to 1,
 *   or an oxidizer species other than O₂, N₂, CO₂, H₂O and noble gases
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative fuel or oxidizer flow
 * @throws {@link RxthermError} `NOTHING_TO_BURN` when the fuel needs no oxygen (details: `theoreticalO2`)
 * @throws {@link RxthermError} `NO_OXIDIZER` for an oxidizer without O₂
 * @throws {@link RxthermError} `ELEMENTS_NOT_COVERED` for fuel elements other than C, H, O, N, S and noble gases (details: `elements`)
 * @throws {@link RxthermError} `OUT_OF_RANGE` for a humidity temperature outside 273.15–647.096 K
 * @throws {@link RxthermError} `UNKNOWN_SPECIES` for a fuel name that names no built-in species (or no species of `library`;
 *   a mixture such as `"natural gas"` is given as species amounts; search with `findSpecies`), `AMBIGUOUS_PHASE` for a name
 *   of several phases without one (`"ethanol"`: write `"ethanol(l)"`; details: `choices`)
 * @throws formula parse errors (their own codes) for a fuel key that reads as a malformed formula
 * @example
 * const r = combustion({ fuel: { "CH4(g)": 1 }, oxidizer: AIR_21_79 });
 * r.theoreticalO2       // => 2
 * r.air                 // => 9.5238… (mol air per mol CH4)
 * r.dry["CO2(g)"]       // => 0.11731… (11.7 % dry CO₂)
 * combustion({ fuel: { propane: 1 } }).theoreticalO2 // => 5 (names of the built-in species, as in the flame functions)
 * @category Combustion
 * @see the 21/79 air of combustion practice ({@link AIR_21_79}, the default) and the U.S. Standard Atmosphere, 1976 ({@link DRY_AIR});
 *   complete-combustion stoichiometry by elements: common practice
 */
export function combustion(input: CombustionInput): CombustionResult {
  const fn = "combustion";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { fuel, ... }`, {});
  }
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  const fuel = fuelElements(input.fuel, fn, input.library);
  const C = fuel.atoms.C ?? 0;
  const H = fuel.atoms.H ?? 0;
  const O = fuel.atoms.O ?? 0;
  const N = fuel.atoms.N ?? 0;
  const S = fuel.atoms.S ?? 0;
  const theoreticalO2 = C + H / 4 + S - O / 2;
  if (!(theoreticalO2 > 1e-12 * Math.max(C, H, O, S, 1e-300))) {
    throw new RxthermError("NOTHING_TO_BURN", `${fn}: the fuel needs no oxygen (theoretical O2 = ${theoreticalO2})`, {
      theoreticalO2,
    });
  }
  const excessAir = resolveExcess(input, theoreticalO2, fn);
  const carbonToCO = fraction(input.carbonToCO, 0, "carbonToCO", fn);
  const oxidizer = oxidizerComposition(input, fn);
  const yO2 = oxidizer["O2(g)"] ?? 0;
  const theoreticalAir = theoreticalO2 / yO2;
  const dryAir = (1 + excessAir) * theoreticalAir;
  const water = humidityFraction(input.humidity, fn);
  const airFlows: Flows = {};
  for (const [k, y] of Object.entries(oxidizer)) airFlows[k] = y * dryAir;
  const humidWater = water > 0 ? (dryAir * water) / (1 - water) : 0;
  if (humidWater > 0) airFlows["H2O(g)"] = (airFlows["H2O(g)"] ?? 0) + humidWater;
  const air = dryAir + humidWater;
  const o2Supplied = airFlows["O2(g)"] ?? 0;
  const o2Used = theoreticalO2 - (carbonToCO * C) / 2;

  const flue: Flows = { "CO2(g)": 0, "H2O(g)": 0, "N2(g)": 0, "O2(g)": 0 };
  const add = (k: string, v: number): void => {
    if (v > 0) flue[k] = (flue[k] ?? 0) + v;
  };
  add("CO2(g)", C * (1 - carbonToCO));
  add("CO(g)", C * carbonToCO);
  add("H2O(g)", H / 2 + fuel.moistureMol);
  add("SO2(g)", S);
  add("N2(g)", N / 2);
  for (const [k, v] of Object.entries(fuel.noble)) add(k, v);
  for (const [k, v] of Object.entries(airFlows)) if (k !== "O2(g)") add(k, v);
  const leftover = o2Supplied - o2Used;
  flue["O2(g)"] = Math.abs(leftover) <= 1e-12 * o2Supplied ? 0 : leftover;
  const flueGasTotal = compensatedSum(Object.values(flue));
  const dryFlueGasTotal = flueGasTotal - (flue["H2O(g)"] ?? 0);
  const wet: Record<string, number> = {};
  const dry: Record<string, number> = {};
  for (const [k, v] of Object.entries(flue)) {
    wet[k] = v / flueGasTotal;
    if (k !== "H2O(g)") dry[k] = dryFlueGasTotal > 0 ? v / dryFlueGasTotal : 0;
  }
  const airMassKg = massKg(airFlows, fn);
  const dryOxidizerMolarMass = compensatedSum(Object.entries(oxidizer).map(([k, y]) => y * molarMassOf(k, fn, "oxidizer")));
  return attachView(finiteResult({
    theoreticalO2,
    theoreticalAir,
    air,
    dryAir,
    airFlows,
    o2Supplied,
    excessAir,
    equivalenceRatio: 1 / (1 + excessAir),
    flueGas: flue,
    flueGasTotal,
    dryFlueGasTotal,
    wet,
    dry,
    fuelMassKg: fuel.massKg,
    airMassKg,
    airToFuelMass: airMassKg / fuel.massKg,
    theoreticalAirToFuelMass: (theoreticalAir * dryOxidizerMolarMass) / 1000 / fuel.massKg,
    ashKg: fuel.ashKg,
  }, fn), COMBUSTION_VIEW);
}

interface FuelElements {
  atoms: Record<string, number>;
  moistureMol: number;
  noble: Flows;
  massKg: number;
  ashKg: number;
}

const NOBLE = new Set(["He", "Ne", "Ar", "Kr", "Xe"]);
const BURNABLE = new Set(["C", "H", "O", "N", "S"]);

function fuelElements(fuelIn: CombustionInput["fuel"], fn: string, library: FormulaLookup | undefined): FuelElements {
  if (fuelIn === null || typeof fuelIn !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires fuel as species flows or { ultimate }`, {});
  }
  if ("ultimate" in fuelIn && typeof fuelIn.ultimate === "object") {
    requireRecord(fuelIn.ultimate, fn, "fuel.ultimate"); // null or an array is INVALID_ARGUMENT, not a TypeError
    return ultimateElements(fuelIn as UltimateFuel, fn);
  }
  const flows = fuelIn as Flows;
  validateFlows(flows, fn, "fuel", false); // keys are read below (formulas, or names through the library)
  const atoms: Record<string, number> = {};
  const noble: Flows = {};
  const bad = new Set<string>();
  let massG = 0;
  for (const [key, n] of Object.entries(flows)) {
    const f: Formula = fuelFormula(key, fn, library);
    if (f.charge !== 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn}: fuel species ${key} is charged`, { species: key, charge: f.charge });
    }
    massG += n * molarMass(f);
    const els = Object.entries(f.elements);
    if (els.length === 1 && NOBLE.has((els[0] as [string, number])[0])) {
      const el = (els[0] as [string, number])[0];
      noble[`${el}(g)`] = (noble[`${el}(g)`] ?? 0) + n * (els[0] as [string, number])[1];
      continue;
    }
    for (const [el, count] of els) {
      if (!BURNABLE.has(el)) bad.add(el);
      atoms[el] = (atoms[el] ?? 0) + n * count;
    }
  }
  if (bad.size > 0) {
    throw new RxthermError(
      "ELEMENTS_NOT_COVERED",
      `${fn} handles fuels of C, H, O, N, S (and noble gases); the fuel also holds ${[...bad].join(", ")}`,
      { elements: [...bad] },
    );
  }
  if (!(massG > 0)) {
    throw new RxthermError("NOTHING_TO_BURN", `${fn}: the fuel flows are all zero`, { theoreticalO2: 0 });
  }
  return { atoms, moistureMol: 0, noble, massKg: massG / 1000, ashKg: 0 };
}

/**
 * The formula of a fuel key: read as a formula, or — when it is not one — looked up by name: in
 * `library` when one is given (by key, formula or name, as the flame functions do), else in the
 * table of names of the built-in species (src/formula/speciesNames.ts, the table the built-in library
 * takes its names from), so a name reads the same with and without `library: builtInLibrary()`.
 */
function fuelFormula(key: string, fn: string, library: FormulaLookup | undefined): Formula {
  try {
    return formulaOf(key, fn, "fuel");
  } catch (e) {
    if (!(e instanceof RxthermError)) throw e;
    if (library === undefined) return namedFuelFormula(key, fn, e);
    if (library === null || typeof library !== "object" || typeof library.get !== "function") {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires library to be a species library (with get)`, { library: String(library) });
    }
    try {
      return library.get(key).formula;
    } catch (e2) {
      if (e2 instanceof RxthermError) {
        throw new RxthermError(e2.code, `${fn} needs the formula of fuel ${key}: ${e2.message.replace(/^\[rxtherm\] /, "")}`, { ...e2.details, species: key });
      }
      throw e2;
    }
  }
}

/**
 * A fuel key that is not a formula, read as the name of a built-in species. The outcomes match
 * `builtInLibrary().get(key)`: one species, AMBIGUOUS_PHASE for a name of several phases
 * (`"water"`, `"ethanol"`: add the phase), UNKNOWN_SPECIES for a name of no species.
 */
function namedFuelFormula(key: string, fn: string, formulaError: RxthermError): Formula {
  const rows = speciesByName(key);
  if (rows.length === 1) return formulaOf(rows[0]!.formula, fn, "fuel");
  if (rows.length > 1) {
    const choices = rows.map((r) => r.key);
    throw new RxthermError(
      "AMBIGUOUS_PHASE",
      `${fn} needs the formula of fuel ${key}: ${JSON.stringify(key)} names a species in more than one phase; name the phase, one of ${choices.join(", ")}`,
      { key, choices, species: key },
    );
  }
  // formula-like text keeps the formula error (UNKNOWN_ELEMENT...); a name has a space, starts in
  // lower case or has two lower-case letters in a row (no element symbol does)
  const bare = key.trim().replace(/\([a-z]+\)$/, "");
  if (!/\s|^[a-z]|[a-z]{2}/.test(bare)) throw formulaError;
  throw new RxthermError(
    "UNKNOWN_SPECIES",
    `${fn}: fuel key "${key}" is neither a formula nor the name of a built-in species; write the formula (e.g. "CH4(g)"), give a mixture such as natural gas as species amounts (e.g. { "CH4(g)": 0.95, "C2H6(g)": 0.03, "N2(g)": 0.02 }), search with findSpecies(${JSON.stringify(key)}), or pass the library that names it as library`,
    { ...formulaError.details, species: key, formulaError: formulaError.code },
  );
}

function ultimateElements(fuel: UltimateFuel, fn: string): FuelElements {
  const u = fuel.ultimate;
  const massKg = fuel.massFlowKg ?? 1;
  if (typeof massKg !== "number" || !Number.isFinite(massKg) || massKg <= 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires fuel.massFlowKg > 0, got ${describeValue(massKg)}`, { massFlowKg: massKg });
  }
  const fields = ["C", "H", "O", "N", "S", "moisture", "ash"] as const;
  let total = 0;
  const w: Record<string, number> = {};
  for (const k of fields) {
    const v = u[k] ?? 0;
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || v > 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ultimate-analysis mass fractions in [0, 1], got ${describeValue(v)} for ${k}`, {
        field: k,
        value: v,
      });
    }
    w[k] = v;
    total += v;
  }
  if (Math.abs(total - 1) > 1e-3) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} requires ultimate-analysis mass fractions summing to 1 (±0.001), got ${total}${total > 2 ? " — give fractions, not %" : ""}`,
      { sum: total },
    );
  }
  const grams = massKg * 1000;
  const atoms: Record<string, number> = {};
  for (const el of ["C", "H", "O", "N", "S"] as const) {
    atoms[el] = (grams * (w[el] as number)) / molarMassOf(el, fn, "ultimate");
  }
  return {
    atoms,
    moistureMol: (grams * (w.moisture as number)) / molarMassOf("H2O", fn, "ultimate"),
    noble: {},
    massKg,
    ashKg: massKg * (w.ash as number),
  };
}

function resolveExcess(input: CombustionInput, theoreticalO2: number, fn: string): number {
  const { excessAir, equivalenceRatio } = input;
  if (excessAir !== undefined && equivalenceRatio !== undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} takes excessAir or equivalenceRatio, not both`, { excessAir, equivalenceRatio });
  }
  let e = 0;
  if (equivalenceRatio !== undefined) {
    if (typeof equivalenceRatio !== "number" || !Number.isFinite(equivalenceRatio) || equivalenceRatio <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires equivalenceRatio > 0, got ${describeValue(equivalenceRatio)}`, { equivalenceRatio });
    }
    e = 1 / equivalenceRatio - 1;
  } else if (excessAir !== undefined) {
    if (typeof excessAir !== "number" || !Number.isFinite(excessAir)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a finite excessAir, got ${describeValue(excessAir)}`, { excessAir });
    }
    e = excessAir;
  }
  checkMixtureLimits(fn, { excessAir, equivalenceRatio }, input.allowExtremeMixture);
  if (e < 0 || (equivalenceRatio !== undefined && equivalenceRatio > 1)) {
    const phi = equivalenceRatio ?? 1 / (1 + e);
    const oxygenDeficit = theoreticalO2 * (1 - 1 / phi);
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} covers lean and stoichiometric mixtures (equivalence ratio <= 1); this one (${phi}) lacks ${oxygenDeficit} mol O2 for complete combustion — rich products need an equilibrium (flame) calculation`,
      { equivalenceRatio: phi, excessAir: e, oxygenDeficit },
    );
  }
  return e === 0 ? 0 : e;
}

function fraction(v: number | undefined, dflt: number, name: string, fn: string): number {
  if (v === undefined) return dflt;
  if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || v > 1) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${name} in [0, 1], got ${describeValue(v)}`, { [name]: v });
  }
  return v;
}

/** Canonical flue keys of the species an oxidizer may hold. */
function canonicalOxidizerKey(f: Formula): string | null {
  const els = Object.entries(f.elements).sort(([a], [b]) => (a < b ? -1 : 1));
  const sig = els.map(([e, c]) => `${e}${c}`).join("");
  if (f.charge !== 0) return null;
  const known: Record<string, string> = { O2: "O2(g)", N2: "N2(g)", C1O2: "CO2(g)", H2O1: "H2O(g)" };
  if (known[sig] !== undefined) return known[sig];
  if (els.length === 1 && NOBLE.has((els[0] as [string, number])[0]) && (els[0] as [string, number])[1] === 1) {
    return `${(els[0] as [string, number])[0]}(g)`;
  }
  return null;
}

function oxidizerComposition(input: CombustionInput, fn: string): Flows {
  let comp: Flows;
  const ox = input.oxidizer;
  if (ox === undefined || ox === "air") comp = { ...AIR_21_79 };
  else if (ox === "oxygen") comp = { "O2(g)": 1 };
  else if (typeof ox === "string") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires oxidizer "air", "oxygen" or a composition object, got "${ox}"`, { oxidizer: ox });
  } else {
    validateFlows(ox, fn, "oxidizer");
    comp = {};
    for (const [key, v] of Object.entries(ox)) {
      const canon = canonicalOxidizerKey(formulaOf(key, fn, "oxidizer"));
      if (canon === null) {
        throw new RxthermError("INVALID_ARGUMENT", `${fn}: oxidizer species ${key} is not one of O2, N2, CO2, H2O or a noble gas`, { species: key });
      }
      comp[canon] = (comp[canon] ?? 0) + v;
    }
    const total = compensatedSum(Object.values(comp));
    if (!(total > 0)) throw new RxthermError("NO_OXIDIZER", `${fn}: the oxidizer flows are all zero`, {});
    for (const k of Object.keys(comp)) comp[k] = (comp[k] as number) / total;
  }
  const yO2 = comp["O2(g)"] ?? 0;
  if (!(yO2 > 0)) throw new RxthermError("NO_OXIDIZER", `${fn}: the oxidizer holds no O2`, { oxidizer: comp });
  if (input.oxygenEnrichment !== undefined) {
    const x = input.oxygenEnrichment;
    if (typeof x !== "number" || !Number.isFinite(x) || x < yO2 || x > 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires oxygenEnrichment between the oxidizer's O2 fraction ${yO2} and 1, got ${describeValue(x)}`, {
        oxygenEnrichment: x,
        range: [yO2, 1],
      });
    }
    const scale = yO2 < 1 ? (1 - x) / (1 - yO2) : 0;
    for (const k of Object.keys(comp)) comp[k] = k === "O2(g)" ? x : (comp[k] as number) * scale;
  }
  return comp;
}

function humidityFraction(h: AirHumidity | undefined, fn: string): number {
  if (h === undefined) return 0;
  if (h === null || typeof h !== "object") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires humidity to be an object`, {});
  let y: number;
  if ("waterMoleFraction" in h) {
    y = h.waterMoleFraction;
    if (typeof y !== "number" || !Number.isFinite(y) || y < 0 || y >= 1) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires humidity.waterMoleFraction in [0, 1), got ${describeValue(y)}`, { waterMoleFraction: y });
    }
    return y;
  }
  const rh = fraction(h.relativeHumidity, 0, "relativeHumidity", fn);
  const P = h.pressurePa ?? 101325;
  if (typeof P !== "number" || !Number.isFinite(P) || P <= 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires humidity.pressurePa > 0, got ${describeValue(P)}`, { pressurePa: P });
  }
  y = (rh * waterSaturationPressure(h.temperatureK)) / P;
  if (y >= 1) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: humid air at ${h.temperatureK} K and ${P} Pa would be all water (y = ${y})`, {
      waterMoleFraction: y,
    });
  }
  return y;
}

function massKg(flows: Flows, fn: string): number {
  return compensatedSum(Object.entries(flows).map(([k, n]) => n * molarMassOf(k, fn, "flows"))) / 1000;
}

