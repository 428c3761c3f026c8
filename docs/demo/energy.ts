/**
 * Demo: reaction enthalpy, heat duty and adiabatic temperatures on invented scenarios — an
 * ammonia-oxidation pilot burner and a peroxide dosing tank. All plant numbers are invented for
 * this demo; the thermochemical data are the library's built-in data with their sources.
 */
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { heatingValue } from "../../src/enthalpy/heatingValue.js";
import { equilibriumConstant } from "../../src/enthalpy/equilibriumConstant.js";
import { heatDuty } from "../../src/energy/heatDuty.js";
import { adiabaticReactionTemperature, adiabaticTemperatureRise } from "../../src/energy/adiabaticReactionTemperature.js";
import { solveExtents } from "../../src/extent/solveExtents.js";

const kW = (w: number): string => `${(w / 1000).toFixed(2)} kW`;
const kJ = (j: number): string => `${(j / 1000).toFixed(2)} kJ/mol`;

export function run(): void {
  console.log("== Reaction enthalpy, heat duty and adiabatic temperature (invented scenarios) ==");

  // 1. Ammonia-oxidation pilot burner: 10 % NH3 in air, partly converting, two reactions (invented plant numbers)
  const toNO = "4 NH3(g) + 5 O2(g) -> 4 NO(g) + 6 H2O(g)";
  const toN2 = "4 NH3(g) + 3 O2(g) -> 2 N2(g) + 6 H2O(g)";
  console.log("Ammonia-oxidation pilot burner — feed 1.0 mol/s NH3, 1.89 mol/s O2, 7.11 mol/s N2 at 470 K (invented)");
  console.log(`  ΔH°rxn(298.15 K): to NO ${kJ(reactionEnthalpy(toNO).value)}, to N2 ${kJ(reactionEnthalpy(toN2).value)} (per reaction as written)`);
  console.log(`  ΔH°rxn(1100 K), Kirchhoff with full Cp: to NO ${kJ(reactionEnthalpy(toNO, { T: 1100 }).value)}`);
  const feed = { "NH3(g)": 1.0, "O2(g)": 1.89, "N2(g)": 7.11 };
  const ext = solveExtents({ feed, reactions: [toNO, toN2], specs: [{ of: "NH3(g)", conversion: 0.98 }, { of: "NO(g)", outlet: 0.93 }] });
  const inlet = { T: 470, flows: feed };
  const outlet = { T: 1100, flows: ext.outlet };
  console.log(`  extents ${ext.extents.map((x) => x.toFixed(4)).join(", ")} mol/s; NH3 conversion 98 %, NO selectivity ${((0.93 / 0.98) * 100).toFixed(1)} %`);
  const byFormation = heatDuty({ inlet, outlet });
  const byReaction = heatDuty({ inlet, outlet, reactions: [toNO, toN2], extents: ext.extents }, { method: "reaction" });
  console.log(`  duty, outlet held at 1100 K — heat-of-formation method: ${kW(byFormation.duty)}`);
  console.log(`                             heat-of-reaction method:  ${kW(byReaction.duty)}`);
  console.log(`    = reaction heat at 298.15 K ${kW(byReaction.reactionHeat)} + sensible heat out ${kW(byReaction.sensibleOut)} − sensible heat in ${kW(byReaction.sensibleIn)}`);
  console.log("    (negative: heat must be removed, e.g. by a waste-heat boiler)");
  const adiabatic = adiabaticReactionTemperature({ inlet, reactions: [toNO, toN2], specs: [{ of: "NH3(g)", conversion: 0.98 }, { of: "NO(g)", outlet: 0.93 }] });
  console.log(`  with no heat removed the gas would leave at ${adiabatic.T.toFixed(1)} K (${adiabatic.iterations} iterations, residual ${adiabatic.residual.toExponential(1)} W)`);
  console.log(`  K of NH3 → NO at 1100 K: ${equilibriumConstant(toNO, 1100).toExponential(3)} (complete conversion is not limited by equilibrium)`);

  // 2. The burner's start-up fuel (invented choice): heating values of methane
  console.log(`\nStart-up fuel, methane: HHV ${(heatingValue("CH4(g)", { per: "kg" }) / 1e6).toFixed(2)} MJ/kg, LHV ${(heatingValue("CH4(g)", { basis: "lower", per: "kg" }) / 1e6).toFixed(2)} MJ/kg, HHV ${(heatingValue("CH4(g)", { per: "Nm3" }) / 1e6).toFixed(2)} MJ/Nm³ (0 °C, 101.325 kPa)`);

  // 3. Runaway screening: a dosing tank of 8 wt % hydrogen peroxide in water (invented batch, 1 kg basis)
  const h2o2 = 80 / 34.0147; // mol in 80 g
  const water = 920 / 18.0153; // mol in 920 g
  const rise = adiabaticTemperatureRise({
    inlet: { T: 298.15, flows: { "H2O2(l)": h2o2, "H2O(l)": water } },
    reactions: ["2 H2O2(l) -> 2 H2O(l) + O2(g)"],
    specs: [{ of: "H2O2(l)", conversion: 1 }],
  });
  console.log("\nPeroxide dosing tank — 1 kg of 8 wt % H2O2 in water at 25 °C, full decomposition (invented batch)");
  console.log(`  adiabatic temperature rise ΔT_ad = ${rise.deltaT.toFixed(1)} K → ${rise.T.toFixed(1)} K, with ${(rise.outlet.flows["O2(g)"] ?? 0).toFixed(3)} mol O2 released`);
  console.log("  CAUTION: a screening estimate (ideal data, H2O2(l) from the Burcat–Ruscic 2005 liquid record, no vaporisation, no vessel heat capacity).");
  console.log("  It is no substitute for calorimetry of the real mixture or a hazard study; follow local codes and licensed engineering practice.");
}
