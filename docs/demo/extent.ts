/**
 * Demo: extents and combustion on invented scenarios — a biogas boiler at 15 % excess air and
 * a pilot methanol reactor. All plant numbers are invented for this demo.
 */
import { combustion } from "../../src/extent/combustion.js";
import { excessAirFromFlueO2 } from "../../src/extent/excessAirFromFlueO2.js";
import { reconcileExtents } from "../../src/extent/reconcileExtents.js";
import { solveExtents } from "../../src/extent/solveExtents.js";

const pct = (x: number): string => `${(100 * x).toFixed(2)} %`;
const fmt = (x: number, d = 3): string => x.toFixed(d);

export function run(): void {
  console.log("== Extents and combustion (invented scenarios) ==");

  // 1. Biogas boiler: 10 mol/s of an invented digester gas, 15 % excess air, humid air at 20 °C, 60 % RH
  const biogas = { "CH4(g)": 6.2, "CO2(g)": 3.55, "N2(g)": 0.2, "H2S(g)": 0.05 };
  const fire = combustion({ fuel: biogas, excessAir: 0.15, humidity: { relativeHumidity: 0.6, temperatureK: 293.15 } });
  console.log("Biogas boiler — 10 mol/s gas (CH4 62 %, CO2 35.5 %, N2 2 %, H2S 0.5 %), 15 % excess air, air at 20 °C / 60 % RH");
  console.log(`  theoretical O2 ${fmt(fire.theoreticalO2)} mol/s, theoretical dry air ${fmt(fire.theoreticalAir)} mol/s`);
  console.log(`  air fed ${fmt(fire.air)} mol/s (${fmt(fire.airMassKg)} kg/s, ${fmt(fire.airToFuelMass, 2)} kg air per kg gas)`);
  console.log(`  flue gas ${fmt(fire.flueGasTotal)} mol/s wet, ${fmt(fire.dryFlueGasTotal)} mol/s dry`);
  const rows = Object.keys(fire.flueGas).map((k) => `    ${k.padEnd(7)} ${fmt(fire.flueGas[k] as number).padStart(8)} mol/s  wet ${pct(fire.wet[k] as number).padStart(8)}  dry ${k === "H2O(g)" ? "      —" : pct(fire.dry[k] as number).padStart(8)}`);
  console.log(rows.join("\n"));
  const reading = fire.dry["O2(g)"] as number;
  const back = excessAirFromFlueO2({ fuel: biogas, humidity: { relativeHumidity: 0.6, temperatureK: 293.15 }, dryO2: reading });
  console.log(`  a dry-basis analyser would read O2 ${pct(reading)} → excess air back-calculated ${pct(back)} (rule of thumb O2/(20.9−O2): ${pct(100 * reading / (20.9 - 100 * reading))})`);
  console.log("  SO2 from the H2S: check the stack permit and the dew point of the flue gas; screening numbers only.");

  // 2. Pilot methanol reactor: CO and CO2 hydrogenation, invented feed and conversions
  const feed = { CO: 12, CO2: 4, H2: 70, CH4: 3, N2: 1 };
  const reactions = ["CO + 2 H2 -> CH3OH", "CO2 + 3 H2 -> CH3OH + H2O"];
  const r = solveExtents({ feed, reactions, specs: [{ of: "CO", conversion: 0.45 }, { of: "CO2", conversion: 0.2 }] });
  console.log("\nPilot methanol reactor — feed (mol/s): " + Object.entries(feed).map(([k, v]) => `${k} ${v}`).join(", "));
  console.log(`  extents: CO hydrogenation ${fmt(r.extents[0] as number)} mol/s, CO2 hydrogenation ${fmt(r.extents[1] as number)} mol/s`);
  console.log("  outlet (mol/s): " + Object.entries(r.outlet).map(([k, v]) => `${k} ${fmt(v)}`).join(", "));
  console.log("  conversion: " + Object.entries(r.conversion).map(([k, v]) => `${k} ${pct(v)}`).join(", "));
  console.log(`  methanol yield on CO ${pct(r.yield.CH3OH?.CO as number)}; CH4 and N2 pass through as inerts`);

  // 3. The same reactor's outlet as an analyser might report it (invented readings)
  const measured = { CO: 6.55, CO2: 3.25, CH3OH: 6.1, H2O: 0.82 };
  const rec = reconcileExtents({ feed, reactions, measured });
  console.log("  plant readings (mol/s): " + Object.entries(measured).map(([k, v]) => `${k} ${v}`).join(", "));
  console.log(`  reconciled extents ${rec.extents.map((x) => fmt(x)).join(", ")} mol/s; element closure ` +
    Object.entries(rec.closurePercent).map(([el, v]) => `${el} ${v.toFixed(1)} %`).join(", "));
}
