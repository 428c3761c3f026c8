/**
 * Input types of the fired-equipment functions, shared by the public files and their private helper
 * (internal/firedModel.ts).
 *
 * @module
 */
import type { Flows } from "../extent/types.js";
import type { AirHumidity } from "../extent/combustion.js";
import type { Library } from "../species/types.js";
import type { ExtrapolatedPoint } from "../species/noteExtrapolation.js";

/**
 * Unburned carbon of a solid fuel, for {@link AvailableHeatInput}: a share of the fuel carbon, or the
 * customary carbon-in-ash reading.
 *
 * @category Fired equipment
 */
export type UnburnedCarbon =
  | {
      /** Fraction of the fuel carbon left unburnt (in ash, refuse or soot), 0–1. */
      fractionOfFuelCarbon: number;
    }
  | {
      /** Carbon-free ash (refuse) collected per kg of fuel, kg/kg. */
      ashPerFuelMass: number;
      /** Mass fraction of carbon in the collected ash/refuse, 0 ≤ w < 1 (the "carbon in ash" reading). */
      carbonInAsh: number;
    };

/**
 * Input of {@link availableHeat}: the fuel, the air, the stream temperatures and the optional losses.
 *
 * @category Fired equipment
 */
export interface AvailableHeatInput {
  /** Fuel: a species key or name (1 mol), or species key → amount (normalised to 1 mol of fuel mixture; inerts allowed). */
  fuel: string | Flows;
  /** Excess air as a fraction (0.15 = 15 %), ≥ 0. Not with `equivalenceRatio`. @defaultValue 0 */
  excessAir?: number;
  /** Equivalence ratio φ in (0, 1] (excessAir = 1/φ − 1). Not with `excessAir`. */
  equivalenceRatio?: number;
  /** `"air"` (21/79 air, the default everywhere in rxtherm), `"oxygen"`, or a dry oxidizer composition. @defaultValue "air" */
  oxidizer?: "air" | "oxygen" | Flows;
  /** Fuel temperature, K. @defaultValue 298.15 */
  fuelT?: number;
  /** Combustion-air temperature (after any preheater), K. @defaultValue 298.15 */
  airT?: number;
  /** Flue-gas temperature leaving the process heat-transfer surfaces (before any air preheater heated by it), K; ≥ 298.15 K unless `condensing`. */
  flueT: number;
  /** Moisture of the combustion air, as for `combustion`. @defaultValue dry */
  humidity?: AirHumidity;
  /** Flue-gas pressure for the dew points and condensation, Pa. @defaultValue 101 325 Pa */
  P?: number;
  /**
   * Let water condense when the flue gas is below its water dew point (a condensing boiler or
   * economiser): the condensate leaves as liquid at `flueT`, and its latent heat is recovered.
   * Without it water leaves as vapour, and a flue temperature below 298.15 K is an error.
   * @defaultValue false
   */
  condensing?: boolean;
  /** CO in the dry flue gas, ppm by volume as measured (not corrected to a reference O2); its heating value is lost. @defaultValue 0 */
  coPpm?: number;
  /** Unburned carbon (solid fuels): a share of the fuel carbon or a carbon-in-ash reading; its heating value is lost. */
  unburnedCarbon?: UnburnedCarbon;
  /** Amount basis of the energies: per mol, per kg or per Nm³ (0 °C, 101.325 kPa; gaseous fuels) of fuel. @defaultValue "mol" */
  per?: "mol" | "kg" | "Nm3";
  /** Species library. @defaultValue the built-in library */
  library?: Library;
  /** Accept excess air above 3 (300 %) or φ below 0.05 (otherwise taken as unit slips). @defaultValue false */
  allowExtremeMixture?: boolean;
  /** Evaluate species data outside their temperature range (listed in `extrapolated`) instead of throwing `OUT_OF_RANGE`. @defaultValue false */
  extrapolate?: boolean;
}

/**
 * Losses besides the stack, in a {@link AvailableHeatResult}; J per unit of fuel (`per`).
 *
 * @category Fired equipment
 */
export interface FiredLosses {
  /** Heating value of the CO in the flue gas. */
  readonly unburnedCO: number;
  /** Heating value of the unburned carbon (graphite → CO2, 393.5 kJ/mol C). */
  readonly unburnedCarbon: number;
  /** Latent heat of liquid water in the fuel, evaporated and leaving as vapour. */
  readonly fuelMoisture: number;
}

/**
 * Result of {@link availableHeat}. Energies in J per mol of fuel (or per kg, per Nm³ with `per`);
 * amounts in mol per mol of fuel.
 *
 * @category Fired equipment
 */
export interface AvailableHeatResult {
  /** Heat released to the process: enthalpy of fuel and air in minus enthalpy of the flue gas (and condensate, unburned carbon) out. */
  readonly availableHeat: number;
  /** Sensible heat of the flue gas (and condensate) above 298.15 K. */
  readonly stackLoss: number;
  /** availableHeat / LHV (fraction). */
  readonly efficiencyLHV: number;
  /** availableHeat / HHV (fraction). */
  readonly efficiencyHHV: number;
  /** Lower heating value of the fuel (water as vapour), at 298.15 K. */
  readonly lhv: number;
  /** Higher heating value of the fuel (water as liquid), at 298.15 K. */
  readonly hhv: number;
  /** LHV + sensible heat of fuel and air above 298.15 K. */
  readonly heatInputLHV: number;
  /** HHV + sensible heat of fuel and air above 298.15 K. */
  readonly heatInputHHV: number;
  /** Sensible heat of the fuel above 298.15 K (negative below). */
  readonly sensibleFuel: number;
  /** Sensible heat of the combustion air (and its moisture) above 298.15 K — the preheat credit. */
  readonly sensibleAir: number;
  /** Latent heat (at 298.15 K) of the water condensed (condensing only), else 0. */
  readonly latentRecovered: number;
  /** Latent heat of the fuel water leaving as vapour — the HHV-basis loss: HHV − LHV − latentRecovered. */
  readonly latentLossHHV: number;
  /** Losses besides the stack. */
  readonly losses: FiredLosses;
  /** Water condensed, mol per mol of fuel (0 unless condensing below the dew point). */
  readonly condensedWater: number;
  /** Flue gas leaving as gas, species key → mol per mol of fuel. */
  readonly flueGas: Readonly<Flows>;
  /** Wet mole fractions of the flue gas leaving. */
  readonly wet: Readonly<Record<string, number>>;
  /** Dry mole fractions of the flue gas leaving (water removed). */
  readonly dry: Readonly<Record<string, number>>;
  /** Excess air used (fraction). */
  readonly excessAir: number;
  /** Water dew point of the flue gas before any condensation, K (absent without water). */
  readonly waterDewPointK?: number;
  /** Sulfuric-acid dew point, K (with sulfur in the fuel; 2 % of the SO2 taken as SO3, see {@link flueGasDewPoint}). */
  readonly acidDewPointK?: number;
  /** Plain-language warnings: flue gas below a dew point, efficiency above 1 from preheat... */
  readonly warnings: readonly string[];
  /** Energy basis of the result. */
  readonly per: "mol" | "kg" | "Nm3";
  /** Species evaluated outside their data range (only with `extrapolate`), with the temperature, K. */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/**
 * Result of {@link efficiencyCurve}: one array entry per swept value, ready for a chart.
 * Energies in J per mol of fuel (or per kg, per Nm³ with `per`).
 *
 * @category Fired equipment
 */
export interface EfficiencyCurveResult {
  /** The varied setting. */
  readonly parameter: "flueT" | "excessAir";
  /** The swept values (a copy). */
  readonly values: readonly number[];
  /** Available heat at each value. */
  readonly availableHeat: readonly number[];
  /** Stack loss at each value. */
  readonly stackLoss: readonly number[];
  /** availableHeat / LHV at each value. */
  readonly efficiencyLHV: readonly number[];
  /** availableHeat / HHV at each value. */
  readonly efficiencyHHV: readonly number[];
  /** Water condensed, mol per mol fuel (condensing only, else zeros). */
  readonly condensedWater: readonly number[];
  /** LHV of the fuel (the same for every point). */
  readonly lhv: number;
  /** HHV of the fuel. */
  readonly hhv: number;
  /** Species evaluated outside their data range (only with `extrapolate`). */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/**
 * Result of {@link flueGasDewPoint}.
 *
 * @category Fired equipment
 */
export interface FlueGasDewPointResult {
  /** Water dew point, K: the IAPWS-IF97 saturation temperature at the water partial pressure. */
  readonly waterK: number;
  /** Sulfuric-acid dew point, K (Verhoff–Banchero correlation); absent when the gas holds no SO3 (and no SO2 to convert). */
  readonly acidK?: number;
  /** Water partial pressure, Pa. */
  readonly waterPa: number;
  /** SO3 partial pressure used for the acid dew point, Pa (0 without sulfur). */
  readonly so3Pa: number;
  /**
   * False when the water or SO3 partial pressure lies outside the range the acid dew point correlation is
   * quoted for (see {@link flueGasDewPoint}); the value is then an extrapolation. Absent without `acidK`.
   */
  readonly acidWithinRange?: boolean;
}
