/**
 * Private: the table views of fired-equipment results (available heat, efficiency curve, dew points).
 *
 * @module
 * @internal
 */
import { viewDescriptors } from "../../view/attachView.js";
import { extrapolationNotes, recordTable } from "../../view/recordTable.js";
import type { ResultView } from "../../view/types.js";
import type { AvailableHeatResult, EfficiencyCurveResult, FlueGasDewPointResult } from "../firedTypes.js";

/** Unit label of an energy per unit of fuel on the result's basis, shown in kJ. */
function perFuel(per: "mol" | "kg" | "Nm3"): string {
  return per === "Nm3" ? "kJ/Nm³ fuel" : `kJ/${per} fuel`;
}

/** Fields of an availableHeat result that its view reads. */
type AvailableHeatFields = Omit<AvailableHeatResult, "heatInputHHV">;

/** The view of an available-heat balance: efficiency, the heat balance on the LHV basis, the flue gas. */
export function availableHeatView(r: AvailableHeatFields): ResultView {
  const u = perFuel(r.per);
  const k = (x: number): number => x / 1000;
  const dew = (K: number | undefined): number | null => (K === undefined ? null : K);
  return {
    title: `available heat at ${(r.excessAir * 100).toPrecision(3)} % excess air`,
    tables: [
      {
        columns: [
          { label: "efficiency LHV", unit: "%", digits: 4 }, { label: "efficiency HHV", unit: "%", digits: 4 },
          { label: "available heat", unit: u }, { label: "stack loss", unit: u },
          { label: "water dew point", unit: "K" }, { label: "acid dew point", unit: "K" },
        ],
        rows: [[r.efficiencyLHV * 100, r.efficiencyHHV * 100, k(r.availableHeat), k(r.stackLoss), dew(r.waterDewPointK), dew(r.acidDewPointK)]],
      },
      {
        caption: "heat balance (LHV basis; heat input = available heat + stack loss + other losses)",
        columns: [{ label: "item" }, { label: "energy", unit: u }],
        rows: [
          ["LHV", k(r.lhv)], ["HHV", k(r.hhv)], ["sensible heat of the fuel", k(r.sensibleFuel)],
          ["sensible heat of the air (preheat)", k(r.sensibleAir)], ["heat input (LHV)", k(r.heatInputLHV)],
          ["latent heat recovered (condensing)", k(r.latentRecovered)], ["unburned CO", k(r.losses.unburnedCO)],
          ["unburned carbon", k(r.losses.unburnedCarbon)], ["fuel moisture", k(r.losses.fuelMoisture)],
          ["stack loss", k(r.stackLoss)], ["available heat", k(r.availableHeat)],
          ["latent heat lost in the stack (HHV basis)", k(r.latentLossHHV)],
        ],
      },
      recordTable("flue gas", [
        { label: "flow", unit: "mol/mol fuel", values: r.flueGas },
        { label: "wet", unit: "mol/mol", digits: 4, values: r.wet },
        { label: "dry", unit: "mol/mol", digits: 4, values: r.dry },
      ]),
    ],
    notes: [
      ...extrapolationNotes(r.extrapolated),
      ...(r.condensedWater > 0 ? [`water condensed: ${r.condensedWater.toPrecision(4)} mol/mol fuel`] : []),
      ...r.warnings,
    ],
  };
}

/** Display methods of availableHeat results. */
export const AVAILABLE_HEAT_VIEW = /* @__PURE__ */ viewDescriptors(availableHeatView);

/** Fields of an efficiencyCurve result that its view reads. */
type EfficiencyCurveFields = Omit<EfficiencyCurveResult, "lhv" | "hhv">;

/** The view of an efficiency curve: one row per point. */
export function efficiencyCurveView(r: EfficiencyCurveFields): ResultView {
  const flue = r.parameter === "flueT";
  return {
    title: `efficiency against ${flue ? "flue-gas temperature" : "excess air"}`,
    tables: [{
      columns: [
        flue ? { label: "flue T", unit: "K" } : { label: "excess air", unit: "%" },
        { label: "efficiency LHV", unit: "%", digits: 4 }, { label: "efficiency HHV", unit: "%", digits: 4 },
        { label: "available heat", unit: "kJ per unit fuel" }, { label: "stack loss", unit: "kJ per unit fuel" },
        { label: "water condensed", unit: "mol/mol fuel" },
      ],
      rows: r.values.map((v, i) => [
        flue ? v : v * 100, (r.efficiencyLHV[i] ?? 0) * 100, (r.efficiencyHHV[i] ?? 0) * 100,
        (r.availableHeat[i] ?? 0) / 1000, (r.stackLoss[i] ?? 0) / 1000, r.condensedWater[i] ?? 0,
      ]),
    }],
    notes: extrapolationNotes(r.extrapolated),
  };
}

/** Display methods of efficiencyCurve results. */
export const EFFICIENCY_CURVE_VIEW = /* @__PURE__ */ viewDescriptors(efficiencyCurveView);


/** The view of flue-gas dew points. */
export function dewPointView(r: FlueGasDewPointResult): ResultView {
  return {
    title: "flue-gas dew points",
    tables: [{
      columns: [
        { label: "water dew point", unit: "K" }, { label: "water dew point", unit: "°C" }, { label: "acid dew point", unit: "K" },
        { label: "acid dew point", unit: "°C" }, { label: "p(H2O)", unit: "Pa" }, { label: "p(SO3)", unit: "Pa" },
      ],
      rows: [[
        r.waterK, r.waterK - 273.15, r.acidK ?? null, r.acidK === undefined ? null : r.acidK - 273.15, r.waterPa, r.so3Pa,
      ]],
    }],
    notes: [
      ...(r.acidWithinRange === false ? ["the acid dew point is extrapolated outside the correlation's range"] : []),
      "screening figures: corrosion margins and minimum metal temperatures follow the equipment maker and local practice",
    ],
  };
}

/** Display methods of flueGasDewPoint results. */
export const DEW_POINT_VIEW = /* @__PURE__ */ viewDescriptors(dewPointView);
