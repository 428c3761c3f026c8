/**
 * Demo: duties at real process temperatures with sourced, temperature-dependent Cp — an
 * ethylene-hydration reactor and a lime calciner. All plant numbers are invented for this demo; the
 * thermochemical data are the library's built-in data with their sources.
 */
import { heatDuty } from "../../src/energy/heatDuty.js";
import { solveExtents } from "../../src/extent/solveExtents.js";
import { species } from "../../src/species/species.js";
import type { ExtrapolatedPoint } from "../../src/species/noteExtrapolation.js";

const kW = (w: number): string => `${(w / 1000).toFixed(1)} kW`;
const C = (c: number): number => c + 273.15;
const listed = (xs: readonly ExtrapolatedPoint[]): string =>
  xs.length === 0 ? "none" : xs.map((x) => `${x.species} at ${x.T} K (data ${x.range[0]}–${x.range[1]} K)`).join(", ");

export function run(): void {
  console.log("== Duties at real process temperatures (invented scenarios, sourced Cp(T)) ==");

  // 1. Ethylene-hydration pilot reactor (invented plant numbers): vapour-phase C2H4 + H2O -> C2H5OH,
  //    feed at 250 °C, outlet at 300 °C, 7 % ethylene conversion per pass
  const hydration = "C2H4(g) + H2O(g) -> C2H5OH(g)";
  const feed = { "C2H4(g)": 1.0, "H2O(g)": 0.6 };
  const ext = solveExtents({ feed, reactions: [hydration], specs: [{ of: "C2H4(g)", conversion: 0.07 }] });
  const r = heatDuty({ inlet: { T: C(250), flows: feed }, outlet: { T: C(300), flows: ext.outlet } });
  console.log("Ethylene-hydration pilot reactor — 1.0 mol/s C2H4 and 0.6 mol/s steam at 250 °C, 7 % conversion, outlet 300 °C (invented)");
  for (const k of ["C2H4(g)", "H2O(g)", "C2H5OH(g)"]) {
    const s = species(k);
    console.log(`  ${k.padEnd(10)} Cp(250 °C) ${s.cp(C(250)).toFixed(2)}, Cp(300 °C) ${s.cp(C(300)).toFixed(2)} J/(mol K) — data ${s.range[0]}–${s.range[1]} K, ${s.dataset}`);
  }
  console.log(`  duty ${kW(r.duty)} (reaction heat at 298.15 K ${kW(r.reactionHeat)}; sensible out ${kW(r.sensibleOut)}, in ${kW(r.sensibleIn)})`);
  console.log(`  extrapolated: ${listed(r.extrapolated)}`);

  // 2. Lime calciner (invented plant numbers): 1 mol/s limestone fed cold, 95 % calcined, solids and gas leave at 900 °C
  const calcination = "CaCO3(cr) -> CaO(cr) + CO2(g)";
  const ore = { "CaCO3(cr)": 1.0 };
  const cal = solveExtents({ feed: ore, reactions: [calcination], specs: [{ of: "CaCO3(cr)", conversion: 0.95 }] });
  const input = { inlet: { T: 298.15, flows: ore }, outlet: { T: C(900), flows: cal.outlet } };
  console.log("\nLime calciner — 1 mol/s limestone at 25 °C, 95 % calcined, solids and CO2 leave at 900 °C (invented)");
  try {
    heatDuty(input);
  } catch (e) {
    console.log(`  without extrapolation: ${(e as { code: string }).code} — ${(e as Error).message}`);
  }
  const q = heatDuty(input, { extrapolate: true });
  console.log(`  duty with { extrapolate: true }: ${kW(q.duty)} (reaction heat at 298.15 K ${kW(q.reactionHeat)})`);
  console.log(`  extrapolated: ${listed(q.extrapolated)}`);
  console.log("  The calcite Cp equation (Jacobs, Kerrick and Krupka 1981) ends at 775 K: the unreacted 5 % of CaCO3 is");
  console.log("  extrapolated and the result says so. CaO (WebBook fit of NIST-JANAF, to 3200 K) and CO2 are inside their data.");
  console.log("  CAUTION: an energy balance only — no kinetics, dust, CO2 or refractory limits; follow local codes and licensed practice.");
}
