/**
 * Demo: flame temperatures on invented scenarios — a landfill-gas burner with a recuperator
 * (air preheated to 200 °C) and a closed-vessel screening check for a propane–air mixture.
 * All plant numbers are invented for this demo; the thermochemical data are the library's
 * built-in data (NIST-JANAF / WebBook Shomate fits, GRI-Mech 3.0 where JANAF is missing).
 */
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import { flameTemperatureSweep } from "../../src/flame/flameTemperatureSweep.js";

const C = (k: number): string => `${(k - 273.15).toFixed(0)} °C`;
const ppm = (x: number | undefined): string => `${((x ?? 0) * 1e6).toFixed(0)} ppm`;
const pct = (x: number | undefined): string => `${((x ?? 0) * 100).toFixed(2)} %`;

export function run(): void {
  console.log("== Flame temperatures (invented scenarios) ==");

  // 1. Landfill-gas burner: invented gas analysis, 10 % excess air, air from a recuperator at 200 °C
  const gas = { "CH4(g)": 0.52, "CO2(g)": 0.43, "N2(g)": 0.045, "O2(g)": 0.005 };
  const base = { fuel: gas, excessAir: 0.1, fuelT: 298.15, oxidizerT: 473.15 } as const;
  const complete = adiabaticFlameTemperature({ ...base, mode: "complete" });
  const eq = adiabaticFlameTemperature({ ...base, mode: "equilibrium" });
  const cold = adiabaticFlameTemperature({ ...base, oxidizerT: 298.15 });
  console.log("Landfill-gas burner — gas CH4 52 %, CO2 43 %, N2 4.5 %, O2 0.5 % at 25 °C; 10 % excess air preheated to 200 °C (invented)");
  console.log(`  adiabatic flame temperature, complete combustion: ${complete.T.toFixed(1)} K (${C(complete.T)})`);
  console.log(`  adiabatic flame temperature, equilibrium (12 products): ${eq.T.toFixed(1)} K (${C(eq.T)}); without preheat ${cold.T.toFixed(1)} K`);
  console.log(`  equilibrium products: CO2 ${pct(eq.products["CO2(g)"])}, H2O ${pct(eq.products["H2O(g)"])}, O2 ${pct(eq.products["O2(g)"])}, CO ${ppm(eq.products["CO(g)"])}, NO ${ppm(eq.products["NO(g)"])}, OH ${ppm(eq.products["OH(g)"])}`);
  console.log(`  solver: ${eq.iterations} temperature iterations, energy residual ${eq.relativeResidual.toExponential(1)} (relative), elements to ${eq.elementResidual.toExponential(1)}`);
  const sweep = flameTemperatureSweep(base, { parameter: "excessAir", values: [0, 0.05, 0.1, 0.2, 0.3, 0.5] });
  console.log("  excess air →  equilibrium flame T");
  sweep.values.forEach((ea, i) => console.log(`    ${(ea * 100).toFixed(0).padStart(3)} %      ${sweep.T[i]!.toFixed(1)} K`));
  console.log("  equilibrium NO at the flame temperature is not an emission forecast (NO forms by kinetics);");
  console.log("  flame temperatures are ideal adiabatic values — refractory and burner limits come from their makers.");

  // 2. Closed-vessel screening: stoichiometric propane–air at 25 °C and 1 atm ignited in a closed enclosure (invented)
  const vessel = adiabaticFlameTemperature({ fuel: "C3H8(g)", T: 298.15, P: 101325, process: "constant-volume" });
  console.log("Propane–air in a closed enclosure — stoichiometric, 25 °C, 1 atm, ignited (invented screening case)");
  console.log(`  adiabatic explosion temperature ${vessel.T.toFixed(0)} K, pressure ${(vessel.P / 1e5).toFixed(2)} bar (${(vessel.P / 101325).toFixed(2)} × initial)`);
  console.log("  an ideal upper screening value: real deflagrations lose heat; vessel ratings and venting follow the recognised standards and licensed engineering practice.");
}
