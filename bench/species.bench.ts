/**
 * Benchmarks of the species layer: Species.enthalpy(T) (the hot path of flame and duty solvers)
 * beside a hand-inlined Shomate evaluation of the same coefficients; species lookup beside a plain
 * Map.get; and the one-time cost of building a library from a data file.
 */
import { species } from "../src/species/species.js";
import { createLibrary } from "../src/species/createLibrary.js";
import { builtInSpeciesData } from "../src/species/data/builtInSpeciesData.js";
import { measure, report } from "./harness.js";

// 64 temperatures spread over 300–3000 K (both CO2(g) Shomate ranges)
const TS = Array.from({ length: 64 }, (_, i) => 300 + (2700 * i) / 63);

// CO2(g) Shomate coefficients (NIST Chemistry WebBook), the same numbers the library holds
const LO = [24.99735, 55.18696, -33.69137, 7.948387, -0.136638, -403.6075, 228.2431, -393.5224];
const HI = [58.16639, 2.720074, -0.492289, 0.038844, -6.447293, -425.9186, 263.6125, -393.5224];
/** Baseline: H°(T) from the Shomate F/H constants, inlined (no range checks, no transitions). */
function shomateH(T: number): number {
  const c = T <= 1200 ? LO : HI;
  const t = T / 1000;
  return 1000 * (t * (c[0]! + t * (c[1]! / 2 + t * (c[2]! / 3 + t * (c[3]! / 4)))) - c[4]! / t + c[5]! - c[7]!) - 393522.4;
}

export function run(): void {
  const co2 = species("CO2(g)");
  let i = 0;
  const base = measure("inline Shomate H(T)", () => shomateH(TS[i++ & 63]!));
  i = 0;
  const lib = measure("species(\"CO2(g)\").enthalpy(T)", () => co2.enthalpy(TS[i++ & 63]!));
  report("enthalpy hot path", lib, base, "ratio < 3× an inlined Shomate evaluation, no allocation");

  const keys = ["CO2(g)", "H2O(g)", "N2(g)", "O2(g)", "CH4(g)", "CO(g)", "H2(g)", "Ar(g)"];
  const map = new Map(keys.map((k) => [k, species(k)]));
  let j = 0;
  const mapGet = measure("Map.get(key)", () => map.get(keys[j++ & 7]!));
  j = 0;
  const lookup = measure("species(key)", () => species(keys[j++ & 7]!));
  report("lookup by key", lookup, mapGet, "ratio < 5× a Map.get");

  const data = builtInSpeciesData();
  const copy = measure("JSON round trip of the built-in data", () => JSON.parse(JSON.stringify(data)), { batches: 9 });
  const build = measure("createLibrary(built-in data, { base: null })", () => createLibrary(data, { base: null }), { batches: 9 });
  report("library build (one-time cost)", build, copy, "median < 100 ms for the 94 built-in entries");
}
