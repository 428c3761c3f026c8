import type { Flows } from "../extent/types.js";
import { finiteResult } from "../errors.js";
import { evaluateFired, excessAirOf, flueTemperature, prepareFired } from "./internal/firedModel.js";
import type { AvailableHeatInput, AvailableHeatResult } from "./firedTypes.js";
import { flueGasDewPoint } from "./flueGasDewPoint.js";
import { attachView } from "../view/attachView.js";
import { AVAILABLE_HEAT_VIEW } from "./internal/firedView.js";

export type { AvailableHeatInput, AvailableHeatResult, FiredLosses, UnburnedCarbon } from "./firedTypes.js";


/**
 * Available heat, stack loss and efficiency of a fired heater, furnace or boiler: the share of the
 * fuel's heat the process receives when the flue gas leaves at `flueT`.
 *
 * Steady-flow energy balance on the combustion chamber and the heat-transfer surfaces, reference
 * 298.15 K and the elements (species enthalpies H = ΔfH° + ∫Cp dT from the library):
 * availableHeat = Σ n·H(fuel at fuelT) + Σ n·H(air at airT) − Σ n·H(flue gas at flueT)
 * − n·H(condensate at flueT). The flue gas is that of `combustion` (same air and fuel conventions,
 * the 21/79 air by default), with the measured CO (`coPpm`, dry basis) taking its carbon from CO2
 * and leaving its O2 unused, and unburned carbon leaving as solid at 298.15 K (its sensible heat in
 * the ash neglected). It closes exactly as
 * LHV + sensibleFuel + sensibleAir + latentRecovered = availableHeat + stackLoss + unburnedCO + unburnedCarbon + fuelMoisture,
 * and on the higher-heating-value basis HHV + sensible heats = availableHeat + stackLoss + latentLossHHV + losses.
 * Efficiencies are availableHeat/LHV and availableHeat/HHV. `flueT` is the temperature at which the
 * flue gas leaves the process heat-transfer surfaces; with an air preheater heated by the flue gas,
 * give the temperature before the preheater and the preheated `airT`: the preheat credit (equal to
 * the air's sensible heat) is the heat the preheater takes from the flue gas, so the result equals
 * the overall efficiency on the final stack temperature. Giving the final stack temperature together
 * with preheated air counts that heat twice (a warning says so when the LHV efficiency exceeds 1). Wall and radiation losses of
 * the casing are not modelled (subtract them yourself, typically 1–3 % of the input for heaters —
 * common practice). Heating values from {@link heatingValue}'s Hess sums. Ideal gases at 1 bar
 * standard state; dew points from {@link flueGasDewPoint}.
 *
 * Caution: efficiency and stack temperatures are screening figures. The acid dew point as a minimum
 * metal temperature is a screening figure: corrosion margins follow the equipment makers and local
 * practice; condensing operation needs materials chosen for acid condensate. Burner, furnace and
 * boiler work follows the applicable codes and licensed engineering practice.
 *
 * @param input - fuel, excess air or φ, oxidizer, fuelT/airT/flueT (K), humidity, P (Pa), condensing, coPpm, unburned carbon, per, library
 * @returns available heat, stack loss and other losses (J per mol, kg or Nm³ of fuel), LHV and HHV efficiencies (fractions), flue gas, dew points
 * @throws RxthermError `INVALID_ARGUMENT` for a bad temperature, flueT below 298.15 K without `condensing` (with a "°C?" hint below 200 K),
 *   excess air < 0 or φ > 1 (rich), excess air above 3 or φ below 0.05 without `allowExtremeMixture`, a CO reading or unburned
 *   carbon beyond the fuel carbon, a non-gaseous fuel `per: "Nm3"`, or a bad option
 * @throws RxthermError `OUT_OF_RANGE` for a temperature outside a species' data range without `extrapolate`
 * @throws RxthermError `NOTHING_TO_BURN`, `NO_OXIDIZER`, `UNKNOWN_SPECIES`, `NEGATIVE_FLOW`, `ELEMENTS_NOT_COVERED` for the fuel and oxidizer, as `combustion` and `heatingValue`
 * @example
 * // methane with 15 % excess air, flue gas leaving at 450 K (177 °C), everything else at 298.15 K
 * const r = availableHeat({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 });
 * r.efficiencyLHV // => 0.92993… (93.0 % of the LHV)
 * r.efficiencyHHV // => 0.83800…
 * r.stackLoss     // => 56220.4… (J/mol)
 * @category Fired equipment
 * @see NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998) for the built-in species data; IAPWS R7-97 (dew point, condensation);
 *   steady-flow first law with the heats of formation (IUPAC Green Book, 3rd ed. (2007), §2.11)
 */
export function availableHeat(input: AvailableHeatInput): AvailableHeatResult {
  const fn = "availableHeat";
  const m = prepareFired(fn, input);
  const e = excessAirOf(m, input.excessAir, input.equivalenceRatio);
  const T = flueTemperature(m, input.flueT);
  const p = evaluateFired(m, e, T);
  const k = m.scale;
  const flueGas: Flows = {};
  let total = 0, dryTotal = 0;
  m.flueKeys.forEach((key, i) => {
    const n = p.flue[i]!;
    if (n > 0) {
      flueGas[key] = n;
      total += n;
      if (key !== "H2O(g)") dryTotal += n;
    }
  });
  const wet: Record<string, number> = {};
  const dry: Record<string, number> = {};
  for (const [key, n] of Object.entries(flueGas)) {
    wet[key] = n / total;
    if (key !== "H2O(g)") dry[key] = n / dryTotal;
  }
  const warnings: string[] = [];
  // dew points of the gas before any condensation
  let waterDewPointK: number | undefined;
  let acidDewPointK: number | undefined;
  const before: Flows = { ...flueGas };
  if (p.condensedWater > 0) before["H2O(g)"] = (before["H2O(g)"] ?? 0) + p.condensedWater;
  if ((before["H2O(g)"] ?? 0) > 0) {
    const d = flueGasDewPoint({ composition: before, P: m.P, ...(input.library !== undefined ? { library: input.library } : {}) });
    waterDewPointK = d.waterK;
    acidDewPointK = d.acidK;
    if (T < d.waterK && !m.condensing) {
      warnings.push(`flueT ${T} K is below the water dew point ${d.waterK.toFixed(1)} K: water would condense; pass condensing: true to count it`);
    }
    if (d.acidK !== undefined && T < d.acidK) {
      warnings.push(`flueT ${T} K is below the acid dew point ${d.acidK.toFixed(1)} K (screening value): acid condensate corrodes unprotected metal`);
    }
  }
  const efficiencyLHV = p.availableHeat / m.lhv;
  if (efficiencyLHV > 1) {
    warnings.push(`efficiency above 1 on the LHV basis: with a flue-gas air preheater, give flueT before the preheater (the preheat is heat taken from the flue gas)`);
  }
  return attachView(finiteResult({
    availableHeat: clean(p.availableHeat * k),
    stackLoss: clean(p.stackLoss * k),
    efficiencyLHV,
    efficiencyHHV: p.availableHeat / m.hhv,
    lhv: m.lhv * k,
    hhv: m.hhv * k,
    heatInputLHV: (m.lhv + p.sensibleFuel + p.sensibleAir) * k,
    heatInputHHV: (m.hhv + p.sensibleFuel + p.sensibleAir) * k,
    sensibleFuel: clean(p.sensibleFuel * k),
    sensibleAir: clean(p.sensibleAir * k),
    latentRecovered: clean(p.latentRecovered * k),
    latentLossHHV: clean((m.hhv - m.lhv - p.latentRecovered) * k),
    losses: { unburnedCO: clean(p.unburnedCO * k), unburnedCarbon: clean(p.unburnedCarbon * k), fuelMoisture: clean(p.fuelMoisture * k) },
    condensedWater: p.condensedWater,
    flueGas,
    wet,
    dry,
    excessAir: e,
    ...(waterDewPointK !== undefined ? { waterDewPointK } : {}),
    ...(acidDewPointK !== undefined ? { acidDewPointK } : {}),
    warnings,
    per: m.per,
    extrapolated: [...m.extrapolated], // frozen points
  }, fn), AVAILABLE_HEAT_VIEW);
}

function clean(x: number): number {
  return x === 0 ? 0 : x;
}
