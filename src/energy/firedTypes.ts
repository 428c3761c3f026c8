/**
 * Input types of the fired-equipment functions, shared by the public files and their private helper
 * (internal/firedModel.ts).
 *
 * @module
 */
import type { Flows } from "../extent/types.js";
import type { AirHumidity } from "../extent/combustion.js";
import type { Library } from "../species/types.js";

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
