/**
 * Demo section "species": the Kettlewick pilot methanol unit (an invented scenario). Feed gases are
 * preheated from 25 °C to 250 °C, the crude methanol is flashed, and the hot-oil loop uses a fluid whose
 * Cp the (invented) supplier gave as a short table. Built-in data come from NIST-JANAF / the NIST WebBook,
 * GRI-Mech 3.0, or memory (each value's source id is printed); the hot-oil data are invented.
 */
import { species } from "../../src/species/species.js";
import { createLibrary } from "../../src/species/createLibrary.js";

const T_FEED_K = 298.15;
const T_REACTOR_K = 523.15;

export function run(): void {
  console.log("## Species — Kettlewick pilot methanol unit (invented scenario)\n");
  console.log(`Preheat of the make-up gas, ${T_FEED_K} K → ${T_REACTOR_K} K, per mol of each component:`);
  console.log("species   data set     H(T1) kJ/mol   H(T2) kJ/mol   ΔH kJ/mol   S(T2, 50 bar) J/(mol·K)   sources (ΔfH°, S°, Cp)");
  for (const key of ["H2(g)", "CO(g)", "CO2(g)", "CH4(g)", "N2(g)"]) {
    const s = species(key);
    const h1 = s.enthalpy(T_FEED_K), h2 = s.enthalpy(T_REACTOR_K);
    console.log(
      `${key.padEnd(9)} ${String(s.dataset).padEnd(12)} ${(h1 / 1000).toFixed(3).padStart(12)} ${(h2 / 1000).toFixed(3).padStart(14)} ${((h2 - h1) / 1000).toFixed(3).padStart(11)} ${s.entropy(T_REACTOR_K, 50e5).toFixed(2).padStart(25)}   ${s.sources["hf298"]}, ${s.sources["s298"]}, ${s.sources["cp"]}`,
    );
  }
  const ch4Gri = species("CH4(g)", undefined, { dataset: "gri-mech-3.0" });
  const ch4 = species("CH4(g)");
  console.log(
    `\nCH4 data sets at ${T_REACTOR_K} K: nist-janaf Cp ${ch4.cp(T_REACTOR_K).toFixed(2)}, gri-mech-3.0 Cp ${ch4Gri.cp(T_REACTOR_K).toFixed(2)} J/(mol·K) (GRI-Mech CH4 is flagged: 1–4 % high in Cp at high T)`,
  );

  const dhVap = species("H2O(g)").enthalpy(373.15) - species("H2O(l)").enthalpy(373.15);
  console.log(`Steam for the reformer: latent heat of water at 373.15 K = ${(dhVap / 1000).toFixed(2)} kJ/mol (steam tables, IAPWS-IF97, from memory: 40.66)`);
  const meoh = species("CH3OH(g)");
  console.log(`Methanol vapour (${meoh.dataset}): G(523.15 K, 1 bar) = ${(meoh.gibbs(T_REACTOR_K) / 1000).toFixed(2)} kJ/mol`);

  // the hot-oil supplier's table (invented numbers for this scenario)
  const lib = createLibrary({
    sources: { kettlewick: "Kettlewick hot-oil supplier sheet KW-HO-7 (invented for this demo)" },
    species: [{
      key: "C16H34(l)", formula: "C16H34", phase: "l", name: "hot oil KW-7",
      hf298KJPerMol: -456, hf298Source: "kettlewick", s298JPerMolK: 586, s298Source: "kettlewick",
      heatCapacity: {
        source: "kettlewick",
        ranges: [{ TminK: 290, TmaxK: 620, cp: { form: "tabulated", temperaturesK: [290, 400, 500, 620], cpJPerMolK: [495, 560, 625, 700] } }],
      },
    }],
  });
  const oil = lib.get("hot oil KW-7");
  const duty = oil.enthalpy(563.15) - oil.enthalpy(473.15);
  console.log(`Hot-oil loop: heating KW-7 from 473.15 K to 563.15 K takes ${(duty / 1000).toFixed(2)} kJ/mol (${lib.citation("kettlewick")})`);
  try {
    oil.enthalpy(700);
  } catch (e) {
    console.log(`Asking for 700 K is refused: ${(e as Error).message}`);
  }
  const ev = oil.evaluate(640, undefined, { extrapolate: true });
  console.log(`With { extrapolate: true }: H(640 K) = ${(ev.enthalpy / 1000).toFixed(2)} kJ/mol, extrapolated: ${ev.extrapolated}`);
}
