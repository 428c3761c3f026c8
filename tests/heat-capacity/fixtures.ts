/**
 * Loaders for the heat-capacity fixtures (tests/fixtures/heat-capacity-*.json). Each JSON names
 * its published source in its "source" field:
 * - heat-capacity-shomate.json: NIST Chemistry WebBook (SRD 69) Shomate parameters
 * - heat-capacity-nasa7.json: GRI-Mech 3.0 thermodynamic data (NASA 7-coefficient polynomials)
 * - heat-capacity-janaf.json: NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998)
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { CpRange } from "../../src/heat-capacity/types.js";

function load(name: string): Record<string, unknown> {
  return JSON.parse(readFileSync(fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url)), "utf8")) as Record<string, unknown>;
}

interface ShomateRow { Tmin_K: number; Tmax_K: number; A: number; B: number; C: number; D: number; E: number; F: number; G: number; H: number }
interface Nasa7Entry { Tlow_K: number; Tmid_K: number; Thigh_K: number; low: number[]; high: number[] }
/** One NIST-JANAF row: T in K, Cp and S in J/(mol·K), H − H298 in kJ/mol (null where not in the fixture). */
export interface JanafRow { T: number; Cp: number | null; S: number | null; H_minus_H298: number | null; minus_G_minus_H298_over_T: number | null }

const shomate = load("heat-capacity-shomate.json") as { source: string; species: Record<string, { ranges: ShomateRow[]; dHf298_kJ_per_mol: number; S298_J_per_molK?: number }> };
const nasa7 = load("heat-capacity-nasa7.json") as { source: string; species: Record<string, Nasa7Entry> };
const janaf = load("heat-capacity-janaf.json") as { source: string; species: Record<string, { rows: JanafRow[] }> };

/** Shomate ranges of a species from the WebBook fixture. */
export function shomateRanges(species: string): CpRange[] {
  const s = shomate.species[species];
  if (!s) throw new Error(`no Shomate fixture for ${species}`);
  return s.ranges.map((r) => ({
    TminK: r.Tmin_K, TmaxK: r.Tmax_K,
    cp: { form: "shomate", A: r.A, B: r.B, C: r.C, D: r.D, E: r.E, F: r.F, G: r.G, H: r.H },
  }));
}

/** ΔfH°(298.15 K) in J/mol and S°(298.15 K) in J/(mol·K) of the Shomate fixture. */
export function shomateStandard(species: string): { hf298: number; s298: number | undefined } {
  const s = shomate.species[species];
  if (!s) throw new Error(`no Shomate fixture for ${species}`);
  return { hf298: s.dHf298_kJ_per_mol * 1000, s298: s.S298_J_per_molK };
}

/** The two NASA-7 ranges of a species from the GRI-Mech 3.0 fixture. */
export function nasa7Ranges(species: string): CpRange[] {
  const s = nasa7.species[species];
  if (!s) throw new Error(`no NASA-7 fixture for ${species}`);
  return [
    { TminK: s.Tlow_K, TmaxK: s.Tmid_K, cp: { form: "nasa7", a: s.low } },
    { TminK: s.Tmid_K, TmaxK: s.Thigh_K, cp: { form: "nasa7", a: s.high } },
  ];
}

/** NIST-JANAF rows of a species. */
export function janafRows(species: string): JanafRow[] {
  const s = janaf.species[species];
  if (!s) throw new Error(`no JANAF fixture for ${species}`);
  return s.rows;
}
