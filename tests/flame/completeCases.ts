/**
 * The grid of complete-combustion flame problems behind tests/fixtures/flame-complete-regression.json:
 * fuels (hydrocarbons, alcohols, H2, CO, NH3, H2S, CS2, fuel-gas mixtures), φ from very lean to rich,
 * preheat of fuel and oxidizer, constant pressure and constant volume, air, oxygen and an Ar-bearing
 * oxidizer, diluents (flue-gas recycle), a NASA-7 library (GRI-Mech 3.0) and extrapolation.
 *
 * Not a source of published values: the fixture holds the library's own results from before the
 * complete-combustion fast path (the sources of commit b185371 with this file beside them, run as
 * `npx tsx tests/flame/completeCases.ts --write`), so that the test shows the faster code gives the same
 * answers to the documented tolerance. `--write` stores the results of the code it runs with: rewrite the
 * fixture only when complete-combustion results are meant to change.
 */
import { writeFileSync } from "node:fs";
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import type { AdiabaticFlameInput, AdiabaticFlameOptions } from "../../src/flame/types.js";
import { createLibrary } from "../../src/species/createLibrary.js";
import { GRI_MECH_30_NASA7_SPECIES } from "../../src/species/data/griMech30Nasa7.js";
import { RxthermError } from "../../src/errors.js";

/** A user library of the GRI-Mech 3.0 NASA-7 entries only (no built-in species). */
export function griLibrary() {
  return createLibrary({ sources: {}, species: GRI_MECH_30_NASA7_SPECIES.map((e) => ({ ...e, alternative: false })) }, { base: null });
}

/** One case: a label, the input (library by name) and the options. */
export interface CompleteCase {
  readonly label: string;
  readonly input: Omit<AdiabaticFlameInput, "library"> & { library?: "gri" };
  readonly options?: AdiabaticFlameOptions;
}

const FUELS: readonly (string | Record<string, number>)[] = [
  "CH4(g)", "C2H6(g)", "C3H8(g)", "n-C8H18(g)", "C2H2(g)", "H2(g)", "CO(g)", "CH3OH(g)", "C2H5OH(g)",
  "NH3(g)", "H2S(g)", "CS2(g)",
  { "CH4(g)": 0.9, "C2H6(g)": 0.05, "N2(g)": 0.03, "CO2(g)": 0.02 },
  { "H2(g)": 0.5, "CO(g)": 0.4, "CO2(g)": 0.1 },
  { "CH4(g)": 0.6, "H2S(g)": 0.1, "H2O(g)": 0.3 },
];
const PHIS = [0.3, 0.6, 0.8, 0.95, 1, 1.05, 1.2, 1.5, 1.9];

/** Every case of the grid. */
export function completeCases(): CompleteCase[] {
  const cases: CompleteCase[] = [];
  for (const fuel of FUELS) {
    const name = typeof fuel === "string" ? fuel : JSON.stringify(fuel);
    for (const phi of PHIS) {
      cases.push({ label: `${name} air φ=${phi}`, input: { fuel, mode: "complete", equivalenceRatio: phi } });
    }
    cases.push({ label: `${name} air preheat`, input: { fuel, mode: "complete", excessAir: 0.15, fuelT: 400, oxidizerT: 700 } });
    cases.push({ label: `${name} oxygen`, input: { fuel, mode: "complete", oxidizer: "oxygen", equivalenceRatio: 0.9 }, options: { extrapolate: true } });
    cases.push({ label: `${name} vessel`, input: { fuel, mode: "complete", process: "constant-volume", equivalenceRatio: 1.1, P: 2e5 } });
  }
  const ox = { "O2(g)": 0.3, "N2(g)": 0.65, "Ar(g)": 0.05 };
  for (const phi of [0.7, 1, 1.3]) {
    cases.push({ label: `C3H8 enriched air φ=${phi}`, input: { fuel: "C3H8(g)", mode: "complete", oxidizer: ox, equivalenceRatio: phi, T: 350 } });
    cases.push({
      label: `CH4 air + flue-gas recycle φ=${phi}`,
      input: { fuel: "CH4(g)", mode: "complete", equivalenceRatio: phi, diluent: { "CO2(g)": 0.5, "H2O(g)": 1, "N2(g)": 3 }, diluentT: 600, oxidizerT: 500 },
    });
    cases.push({ label: `CH4 GRI-Mech 3.0 φ=${phi}`, input: { fuel: "CH4(g)", mode: "complete", equivalenceRatio: phi, library: "gri" } });
    cases.push({ label: `C2H6 GRI-Mech 3.0 vessel φ=${phi}`, input: { fuel: "C2H6(g)", mode: "complete", process: "constant-volume", equivalenceRatio: phi, library: "gri" } });
  }
  cases.push({ label: "CH4 oxygen vessel GRI-Mech 3.0 (above 3500 K)", input: { fuel: "CH4(g)", mode: "complete", oxidizer: "oxygen", process: "constant-volume", library: "gri" } });
  cases.push({ label: "CH4 oxygen vessel GRI-Mech 3.0 extrapolated", input: { fuel: "CH4(g)", mode: "complete", oxidizer: "oxygen", process: "constant-volume", library: "gri" }, options: { extrapolate: true } });
  cases.push({ label: "CH4 air, cold reactants extrapolated", input: { fuel: "CH4(g)", mode: "complete", T: 250 }, options: { extrapolate: true } });
  cases.push({ label: "CH4 air, loose tolerance", input: { fuel: "CH4(g)", mode: "complete", equivalenceRatio: 0.9 }, options: { toleranceK: 0.5 } });
  cases.push({ label: "CH4 air φ = 2.5 (carbon)", input: { fuel: "CH4(g)", mode: "complete", equivalenceRatio: 2.5 } });
  return cases;
}

/** What the fixture keeps of one result (or the error code). */
export interface CompleteOutcome {
  readonly label: string;
  readonly T?: number;
  readonly P?: number;
  readonly moles?: Record<string, number>;
  readonly products?: Record<string, number>;
  readonly oxidizer?: Record<string, number>;
  readonly reactantEnergy?: number;
  readonly relativeResidual?: number;
  readonly extrapolated?: readonly { species: string; T: number; range: readonly [number, number] }[];
  readonly error?: string;
}

/** Solve one case. */
export function solveCase(c: CompleteCase, gri: ReturnType<typeof griLibrary>): CompleteOutcome {
  const input: AdiabaticFlameInput = { ...c.input, ...(c.input.library === "gri" ? { library: gri } : {}) } as AdiabaticFlameInput;
  try {
    const r = adiabaticFlameTemperature(input, c.options);
    return {
      label: c.label, T: r.T, P: r.P, moles: { ...r.moles }, products: { ...r.products }, oxidizer: { ...r.oxidizer },
      reactantEnergy: r.reactantEnergy, relativeResidual: r.relativeResidual, extrapolated: r.extrapolated.map((p) => ({ ...p })),
    };
  } catch (e) {
    if (e instanceof RxthermError) return { label: c.label, error: e.code };
    throw e;
  }
}

if (process.argv.includes("--write")) {
  const gri = griLibrary();
  const outcomes = completeCases().map((c) => solveCase(c, gri));
  const url = new URL("../fixtures/flame-complete-regression.json", import.meta.url);
  const description = "Complete-combustion adiabatic flame temperatures computed by rxtherm itself before the fast path (commit b185371); regression values, not published data. Written by tests/flame/completeCases.ts --write.";
  // one outcome per line (numbers as JSON writes them: they read back exactly)
  writeFileSync(url, `{"description": ${JSON.stringify(description)},\n"outcomes": [\n${outcomes.map((o) => JSON.stringify(o)).join(",\n")}\n]}\n`);
  console.log(`wrote ${outcomes.length} outcomes (${outcomes.filter((o) => o.error).length} errors)`);
}
