/**
 * Demo: available heat and efficiency of an invented refinery crude heater burning its own fuel gas
 * — an efficiency table against stack temperature and excess air, the effect of an air preheater,
 * a CO reading and the flue-gas dew points. The heater, its fuel gas and its readings are invented
 * for this demo; the thermochemical data are the library's built-in data with their sources.
 * Screening values: casing losses are not modelled, and dew points as metal-temperature limits follow
 * the equipment makers and local practice.
 */
import { availableHeat } from "../../src/energy/availableHeat.js";
import { efficiencyCurve } from "../../src/energy/efficiencyCurve.js";
import { flueGasDewPoint } from "../../src/energy/flueGasDewPoint.js";

// invented refinery fuel gas of the demo heater (mole fractions)
const FUEL_GAS = { "H2(g)": 0.3, "CH4(g)": 0.4, "C2H6(g)": 0.15, "C3H8(g)": 0.08, "C2H4(g)": 0.03, "N2(g)": 0.03, "H2S(g)": 0.01 };
const pct = (x: number): string => `${(100 * x).toFixed(1)} %`;
const C = (K: number): string => `${(K - 273.15).toFixed(0)} °C`;

export function run(): void {
  console.log("== Fired heater: available heat and efficiency (invented crude heater, refinery fuel gas) ==");
  const base = availableHeat({ fuel: FUEL_GAS, excessAir: 0.15, flueT: 473.15 });
  console.log(`Fuel gas LHV ${(base.lhv / 1000).toFixed(1)} kJ/mol, HHV ${(base.hhv / 1000).toFixed(1)} kJ/mol`);
  console.log(`At 15 % excess air and a 200 °C stack: available heat ${(base.availableHeat / 1000).toFixed(1)} kJ/mol, ` +
    `stack loss ${(base.stackLoss / 1000).toFixed(1)} kJ/mol → efficiency ${pct(base.efficiencyLHV)} (LHV), ${pct(base.efficiencyHHV)} (HHV)`);
  console.log(`Dew points of this flue gas: water ${C(base.waterDewPointK!)}, sulfuric acid ${C(base.acidDewPointK!)} (2 % of the SO2 as SO3; screening value)`);

  // efficiency table: rows = stack temperature, columns = excess air (one curve per column)
  const stackC = [150, 175, 200, 250, 300, 350, 400];
  const excess = [0.05, 0.1, 0.15, 0.25, 0.4];
  console.log("\nEfficiency (LHV basis) against stack temperature and excess air, air and fuel at 25 °C:");
  console.log(`  stack \\ excess air ${excess.map((e) => `${(e * 100).toFixed(0).padStart(6)} %`).join("")}`);
  const columns = excess.map((e) => efficiencyCurve({ fuel: FUEL_GAS, excessAir: e }, { parameter: "flueT", values: stackC.map((c) => c + 273.15) }).efficiencyLHV);
  stackC.forEach((c, i) => {
    console.log(`  ${String(c).padStart(5)} °C            ${columns.map((col) => pct(col[i]!).padStart(8)).join("")}`);
  });

  // air preheater heated by the flue gas after the convection section: flueT is the gas leaving the process coils
  const noPreheat = availableHeat({ fuel: FUEL_GAS, excessAir: 0.15, flueT: 673.15 });
  const preheat = availableHeat({ fuel: FUEL_GAS, excessAir: 0.15, flueT: 673.15, airT: 523.15 });
  console.log(`\nFlue gas leaving the process coils at 400 °C: efficiency ${pct(noPreheat.efficiencyLHV)} (LHV) with cold air; ` +
    `with a preheater raising the air to 250 °C, ${pct(preheat.efficiencyLHV)}`);
  console.log(`  the gain ${((preheat.availableHeat - noPreheat.availableHeat) / 1000).toFixed(1)} kJ/mol equals the air's sensible heat ${(preheat.sensibleAir / 1000).toFixed(1)} kJ/mol, ` +
    `taken from the flue gas in the preheater`);
  const co = availableHeat({ fuel: FUEL_GAS, excessAir: 0.15, flueT: 473.15, coPpm: 400 });
  console.log(`A 400 ppm (dry) CO reading costs ${(co.losses.unburnedCO / 1000).toFixed(2)} kJ/mol of fuel (${pct(co.losses.unburnedCO / co.lhv)} of the LHV)`);
  const acid = flueGasDewPoint({ composition: base.flueGas, P: 101325, so3Fraction: 0.05 });
  console.log(`If 5 % of the SO2 forms SO3 the acid dew point rises to ${C(acid.acidK!)}: keep the coldest metal above it with the makers' margin`);
  console.log("(screening values; casing losses not included — follow the equipment makers, local codes and licensed engineering practice)");
}
