/**
 * Benchmarks of the flame module, each beside a baseline measured in the same process:
 * - complete-combustion flame T of methane–air (target ≥ 20× the Python peer, about 1–1.2 µs per solve),
 *   beside a naive bisection of the same enthalpy balance (same products, same species data, to 1e-6 K);
 * - equilibrium flame T with the 12 default products (target < 500 µs), beside one fixed-T
 *   equilibrium solve of the same mixture from a cold start;
 * - a 200-point equilibrium sweep over φ (target < 0.2 s), beside 200 independent solves;
 * - equilibrium with 100 product species (target ≤ 1 ms), beside the 12 default products, and the
 *   cost-growth curve over 20, 50, 100 and 200 species with the fitted slope of log t against
 *   log n. The large sets are gas-phase C/H/O/N species of the Burcat–Ruscic 2005 database
 *   (NASA-7 polynomials as published), copied into bench/fixtures/burcat-ruscic-2005-chon.json.
 */
import { existsSync, readFileSync } from "node:fs";
import { createLibrary } from "../src/species/createLibrary.js";
import type { Library } from "../src/species/types.js";
import { adiabaticFlameTemperature } from "../src/flame/adiabaticFlameTemperature.js";
import { equilibriumComposition } from "../src/flame/equilibriumComposition.js";
import { flameTemperatureSweep } from "../src/flame/flameTemperatureSweep.js";
import { DEFAULT_FLAME_PRODUCTS } from "../src/flame/flameDefaults.js";
import { species } from "../src/species/species.js";
import { GRI_MECH_30_NASA7_SPECIES } from "../src/species/data/griMech30Nasa7.js";
import { formatTime, growthSlope, measure, report, runPeer, type BenchResult } from "./harness.js";

const CO2 = species("CO2(g)");
const H2O = species("H2O(g)");
const N2 = species("N2(g)");
const CH4 = species("CH4(g)");
const O2 = species("O2(g)");
const N2_PER_O2 = 0.79 / 0.21;

/** Baseline: bisection on the complete-combustion enthalpy balance, species resolved in advance. */
function naiveBisection(): number {
  const h0 = CH4.enthalpy(298.15) + 2 * O2.enthalpy(298.15) + 2 * N2_PER_O2 * N2.enthalpy(298.15);
  const f = (T: number): number => CO2.enthalpy(T) + 2 * H2O.enthalpy(T) + 2 * N2_PER_O2 * N2.enthalpy(T) - h0;
  let lo = 298.15;
  let hi = 6000;
  while (hi - lo > 1e-6) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * The same CH4–air balance solved by a general-purpose scientific-Python root finder over the
 * library's GRI-Mech 3.0 NASA-7 sets (bench/peers/flame_root.py), in this run; prints the ratio.
 */
function completePeer(libraryNs: number): void {
  const keys = ["CH4(g)", "O2(g)", "N2(g)", "CO2(g)", "H2O(g)"];
  const species: Record<string, number[][]> = {};
  for (const key of keys) {
    const entry = GRI_MECH_30_NASA7_SPECIES.find((e) => e.key === key);
    if (!entry) throw new Error(`flame bench: no GRI-Mech 3.0 entry for ${key}`);
    species[key] = entry.heatCapacity.ranges.map((r) => {
      const cp = r.cp as { form: string; a?: number[] };
      if (cp.form !== "nasa7" || !cp.a) throw new Error(`flame bench: ${key} GRI-Mech 3.0 range is not NASA-7`);
      return [r.TminK, r.TmaxK, ...cp.a];
    });
  }
  const n2 = 2 * N2_PER_O2;
  const peer = runPeer<{ T: number; usPerSolve: number }>("flame_root.py", {
    species, T0: 298.15, repeat: 2000,
    reactants: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": n2 },
    products: { "CO2(g)": 1, "H2O(g)": 2, "N2(g)": n2 },
  });
  if (peer) {
    console.log(`  peer: Python root finder over the same NASA-7 data ${peer.usPerSolve.toFixed(2)} µs per solve (T ${peer.T.toFixed(2)} K) | library ${(libraryNs / 1e3).toFixed(2)} µs | peer/library ${((peer.usPerSolve * 1e3) / libraryNs).toFixed(1)}× | target ≥ 20×`);
  }
}

const PHI = Array.from({ length: 200 }, (_, i) => 0.5 + (i * 1.0) / 199);

export function run(): void {
  const complete = measure("adiabaticFlameTemperature CH4–air complete", () => adiabaticFlameTemperature({ fuel: "CH4(g)", mode: "complete" }).T);
  const bisect = measure("naive bisection, same balance", naiveBisection);
  report("complete-combustion flame T", complete, bisect, "≈ 1–1.2 µs; ≥ 20× the Python peer below");
  completePeer(complete.medianNs);

  const eq = measure("adiabaticFlameTemperature CH4–air equilibrium (12 products)", () => adiabaticFlameTemperature({ fuel: "CH4(g)" }).T);
  const fixedT = measure("equilibriumComposition at 2225 K (cold start)", () =>
    equilibriumComposition({ feed: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 2 * N2_PER_O2 }, species: DEFAULT_FLAME_PRODUCTS, T: 2225 }).gasMoles);
  report("equilibrium flame T", eq, fixedT, "median < 500 µs");

  const sweep = measure("flameTemperatureSweep 200 φ points (warm starts)", () =>
    flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: PHI }).T.length, { batches: 9, inner: 1 });
  const independent = measure("200 independent adiabaticFlameTemperature calls", () => {
    let s = 0;
    for (const phi of PHI) s += adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: phi }).T;
    return s;
  }, { batches: 9, inner: 1 });
  report("200-point equilibrium sweep", sweep, independent, "median < 0.2 s");

  equilibriumGrowth();
}

interface BurcatRecord {
  formula: string;
  hf298KJPerMol: number;
  TlowK: number;
  TmidK: number;
  ThighK: number;
  low: number[];
  high: number[];
}

/** The fixture as a species library of its own (no built-in species), keys `formula(g)`. */
function burcatLibrary(): { library: Library; keys: string[] } {
  // beside this file, or two levels up when run bundled from .out/bench/
  const name = "fixtures/burcat-ruscic-2005-chon.json";
  const path = [new URL(`./${name}`, import.meta.url), new URL(`../../bench/${name}`, import.meta.url)].find((u) => existsSync(u))!;
  const file = JSON.parse(readFileSync(path, "utf8")) as { citation: string; records: BurcatRecord[] };
  const R = 8.31446261815324;
  const species = file.records.map((r) => {
    const [a1, a2, a3, a4, a5, , a7] = r.low as [number, number, number, number, number, number, number];
    const T = 298.15;
    // S°(298.15 K) from the low-range polynomial: S/R = a1 ln T + a2 T + a3 T²/2 + a4 T³/3 + a5 T⁴/4 + a7
    const s298 = R * (a1 * Math.log(T) + a2 * T + (a3 * T * T) / 2 + (a4 * T ** 3) / 3 + (a5 * T ** 4) / 4 + a7);
    return {
      key: `${r.formula}(g)`, formula: r.formula, phase: "g",
      hf298KJPerMol: r.hf298KJPerMol, hf298Source: "burcat-ruscic-2005",
      s298JPerMolK: s298, s298Source: "burcat-ruscic-2005",
      heatCapacity: {
        source: "burcat-ruscic-2005",
        ranges: [
          { TminK: r.TlowK, TmaxK: r.TmidK, cp: { form: "nasa7", a: r.low } },
          { TminK: r.TmidK, TmaxK: r.ThighK, cp: { form: "nasa7", a: r.high } },
        ],
      },
    };
  });
  const library = createLibrary({ sources: { "burcat-ruscic-2005": file.citation }, species }, { base: null });
  return { library, keys: species.map((s) => s.key) };
}

/** Keeps the results of `fastest` alive. */
export let fastestSink: unknown = undefined;

/**
 * Fastest batch of `batches` short batches (about 2 ms each): on a machine shared with other
 * jobs the median counts their time too, while the fastest batch approaches the cost of the work
 * itself. Used for the cost-growth curve, where only ratios between sizes matter.
 */
function fastest(name: string, fn: () => unknown, batches = 60): BenchResult {
  const t0 = performance.now();
  let calls = 0;
  while (performance.now() - t0 < 100) {
    fastestSink = fn();
    calls++;
  }
  const inner = Math.max(1, Math.round((2 * calls) / (performance.now() - t0)));
  let best = Infinity;
  for (let b = 0; b < batches; b++) {
    const s = performance.now();
    for (let i = 0; i < inner; i++) fastestSink = fn();
    best = Math.min(best, ((performance.now() - s) * 1e6) / inner);
  }
  return { name: `${name} (fastest batch)`, medianNs: best, perSecond: 1e9 / best };
}

/** Equilibrium cost against the number of product species: the 100-species row, the curve and its slope. */
export function equilibriumGrowth(): void {
  const { library, keys } = burcatLibrary();
  // stoichiometric methane–air products at 2200 K and 1 atm, cold start every call
  const feed = { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 2 * N2_PER_O2 };
  const solve = (n: number) => () => equilibriumComposition({ feed, species: keys.slice(0, n), T: 2200, library }).gasMoles;
  const small = () => equilibriumComposition({ feed, species: DEFAULT_FLAME_PRODUCTS, T: 2200 }).gasMoles;
  report("equilibrium, 100 product species", measure("equilibriumComposition, 100 products", solve(100)),
    measure("equilibriumComposition, 12 default products", small), "median ≤ 1 ms");
  const sizes = [20, 50, 100, 200];
  const base = fastest("12 default products", small);
  const results = sizes.map((n) => fastest(`${n} products`, solve(n)));
  const curve = sizes.map((n, i) => `${n}: ${formatTime(results[i]!.medianNs)} (${(results[i]!.medianNs / base.medianNs).toFixed(1)}×)`).join(", ");
  console.log(`equilibrium cost growth, fastest batch (species: time, ratio to the 12 default products at ${formatTime(base.medianNs)}): ${curve} | fitted slope of log t vs log n: ${growthSlope(sizes.map((size, i) => ({ size, medianNs: results[i]!.medianNs }))).toFixed(2)}`);
}
