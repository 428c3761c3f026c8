/**
 * Demo section "heat-capacity": the syngas preheater of an invented pilot methanol reactor (the
 * Harrowgate pilot unit). Flows and temperatures are invented for this demo; the Cp data are the
 * NIST Chemistry WebBook Shomate parameters (SRD 69, based on NIST-JANAF 4th ed. 1998), and the
 * heat-transfer-oil points are invented lab data of the same scenario.
 */
import { createHeatCapacity, type HeatCapacity } from "../../src/heat-capacity/createHeatCapacity.js";
import { boundaryJumps } from "../../src/heat-capacity/boundaryJumps.js";
import { fitCp } from "../../src/heat-capacity/fitCp.js";
import type { CpRange } from "../../src/heat-capacity/types.js";

// NIST Chemistry WebBook, SRD 69, Shomate parameters (A…E; F, G, H where used)
const shomate = (TminK: number, TmaxK: number, A: number, B: number, C: number, D: number, E: number, F: number, G: number, H: number): CpRange =>
  ({ TminK, TmaxK, cp: { form: "shomate", A, B, C, D, E, F, G, H } });
const DATA: Record<string, CpRange[]> = {
  "H2(g)": [
    shomate(298, 1000, 33.066178, -11.363417, 11.432816, -2.772874, -0.158558, -9.980797, 172.707974, 0),
    shomate(1000, 2500, 18.563083, 12.257357, -2.859786, 0.268238, 1.97799, -1.147438, 156.288133, 0),
  ],
  "CO(g)": [
    shomate(298, 1300, 25.56759, 6.09613, 4.054656, -2.671301, 0.131021, -118.0089, 227.3665, -110.5271),
    shomate(1300, 6000, 35.1507, 1.300095, -0.205921, 0.01355, -3.28278, -127.8375, 231.712, -110.5271),
  ],
  "CO2(g)": [
    shomate(298, 1200, 24.99735, 55.18696, -33.69137, 7.948387, -0.136638, -403.6075, 228.2431, -393.5224),
    shomate(1200, 6000, 58.16639, 2.720074, -0.492289, 0.038844, -6.447293, -425.9186, 263.6125, -393.5224),
  ],
  "N2(g)": [
    shomate(100, 500, 28.98641, 1.853978, -9.647459, 16.63537, 0.000117, -8.671914, 226.4168, 0),
    shomate(500, 2000, 19.50583, 19.88705, -8.598535, 1.369784, 0.527601, -4.935202, 212.39, 0),
  ],
};

// invented scenario: preheater feed, mol/s, heated from 310 K to 520 K
const FEED: Record<string, number> = { "H2(g)": 41.0, "CO(g)": 12.5, "CO2(g)": 4.2, "N2(g)": 1.8 };
const T_IN_K = 310, T_OUT_K = 520;

export function run(): void {
  console.log("## Heat capacity — Harrowgate pilot methanol unit, syngas preheater (invented scenario)");
  console.log(`Cp data: NIST Chemistry WebBook SRD 69 Shomate sets; feed heated ${T_IN_K} K → ${T_OUT_K} K\n`);
  console.log("species     flow (mol/s)   mean Cp (J/(mol·K))   ΔH (J/mol)   duty (kW)");
  let total = 0;
  const models: Record<string, HeatCapacity> = {};
  for (const [key, flow] of Object.entries(FEED)) {
    const m = createHeatCapacity(DATA[key]!, { label: key });
    models[key] = m;
    const dH = m.deltaH(T_IN_K, T_OUT_K);
    const kW = (flow * dH) / 1000;
    total += kW;
    console.log(`${key.padEnd(10)} ${flow.toFixed(1).padStart(12)} ${m.meanCp(T_IN_K, T_OUT_K).toFixed(3).padStart(21)} ${dH.toFixed(1).padStart(12)} ${kW.toFixed(2).padStart(11)}`);
  }
  console.log(`${"total".padEnd(10)} ${"".padStart(12)} ${"".padStart(21)} ${"".padStart(12)} ${total.toFixed(2).padStart(11)}`);

  console.log("\nData audit: where the published ranges meet");
  for (const [key, m] of Object.entries(models)) {
    for (const j of boundaryJumps(m)) {
      console.log(`  ${key.padEnd(8)} at ${j.TK} K: ΔCp ${(100 * j.cpRelativeJump).toFixed(3)} %, ΔH ${j.enthalpyJumpJPerMol!.toFixed(1)} J/mol, ΔS ${j.entropyJumpJPerMolK!.toFixed(4)} J/(mol·K)`);
    }
  }
  const co2 = models["CO2(g)"]!;
  console.log(`  CO2(g) absolute H at 298.15 K from its F constant: ${(co2.absoluteEnthalpy(298.15) / 1000).toFixed(3)} kJ/mol (ΔfH° of the same entry: -393.522)`);

  // invented lab data of the scenario: the hot-oil loop's heat-transfer fluid, Cp in kJ/(mol·K) by °C
  const oil = [[40, 0.5121], [80, 0.5480], [120, 0.5852], [160, 0.6207], [200, 0.6571], [240, 0.6930]];
  const fit = fitCp(oil.map(([c, cp]) => ({ T: c! + 273.15, cp: cp! * 1000 })), "polynomial", { temperatureUnit: "C", energyUnit: "kJ", degree: 2 });
  const c = fit.coefficients;
  console.log("\nHot-oil Cp fitted as a °C polynomial (invented lab data)");
  const signed = (x: number, digits: number): string => `${x < 0 ? "−" : "+"} ${Math.abs(x).toExponential(digits)}`;
  console.log(`  Cp = ${c[0]!.toFixed(4)} ${signed(c[1]!, 4)}·θ ${signed(c[2]!, 3)}·θ²  kJ/(mol·K), θ in °C`);
  console.log(`  worst residual ${fit.maxResidualJPerMolK.toFixed(2)} J/(mol·K), rms ${fit.rmsResidual.toFixed(2)} J/(mol·K)`);
  const oilModel = createHeatCapacity([fit.range], { label: "hot oil" });
  console.log(`  heating the oil from 60 °C to 220 °C takes ${(oilModel.deltaH(333.15, 493.15) / 1000).toFixed(2)} kJ/mol`);
}
