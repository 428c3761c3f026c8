import { readFileSync } from "node:fs";
import { createLibrary } from "../../src/species/createLibrary.js";
import type { Library } from "../../src/species/types.js";

export { caught } from "../_helpers/caught.js";

/** JANAF rows copied into tests/fixtures/enthalpy-janaf.json (source named in the file). */
export interface JanafRow {
  T: number;
  S?: number;
  minus_G_minus_H298_over_T?: number;
  H_minus_H298?: number;
  dfH?: number;
  dfG?: number;
  logKf?: number;
}
export const JANAF = JSON.parse(readFileSync(new URL("../fixtures/enthalpy-janaf.json", import.meta.url), "utf8")) as {
  species: Record<string, JanafRow[]>;
};
export function janafRow(species: string, T: number): JanafRow {
  const row = JANAF.species[species]?.find((r) => r.T === T);
  if (!row) throw new Error(`no JANAF row ${species} ${T}`);
  return row;
}

/**
 * A library whose CO(g), CO2(g) and H2O(g) carry the CODATA Key Values 1989 formation enthalpies
 * with their uncertainties (from memory: CO2(g) −393.51 ± 0.13, CO(g) −110.53 ± 0.17,
 * H2O(g) −241.826 ± 0.040 kJ/mol) and a constant Cp (demo Cp, used only at 298.15 K here).
 */
export function codataLibrary(): Library {
  const entry = (key: string, formula: string, hf: number, u: number, s: number) => ({
    key, formula, phase: "g" as const, hf298KJPerMol: hf, hf298Source: "codata", hf298UncertaintyKJPerMol: u,
    s298JPerMolK: s, s298Source: "codata",
    heatCapacity: { source: "codata", ranges: [{ TminK: 250, TmaxK: 1500, cp: { form: "constant" as const, cpJPerMolK: 35 } }] },
  });
  return createLibrary({
    sources: { codata: "J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, Hemisphere 1989 (values from memory)" },
    species: [
      entry("CO2(g)", "CO2", -393.51, 0.13, 213.785),
      entry("CO(g)", "CO", -110.53, 0.17, 197.66),
      entry("H2O(g)", "H2O", -241.826, 0.04, 188.835),
    ],
  });
}
