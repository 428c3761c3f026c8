/**
 * Benchmarks of the flame module, each beside a baseline measured in the same process:
 * - complete-combustion flame T of methane–air (target median < 10 µs per solve), beside a naive
 *   bisection of the same enthalpy balance (same products, same species data, to 1e-6 K);
 * - equilibrium flame T with the 12 default products (target < 500 µs), beside one fixed-T
 *   equilibrium solve of the same mixture from a cold start;
 * - a 200-point equilibrium sweep over φ (target < 0.2 s), beside 200 independent solves.
 */
import { adiabaticFlameTemperature } from "../src/flame/adiabaticFlameTemperature.js";
import { equilibriumComposition } from "../src/flame/equilibriumComposition.js";
import { flameTemperatureSweep } from "../src/flame/flameTemperatureSweep.js";
import { DEFAULT_FLAME_PRODUCTS } from "../src/flame/flameDefaults.js";
import { species } from "../src/species/species.js";
import { measure, report } from "./harness.js";

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

const PHI = Array.from({ length: 200 }, (_, i) => 0.5 + (i * 1.0) / 199);

export function run(): void {
  const complete = measure("adiabaticFlameTemperature CH4–air complete", () => adiabaticFlameTemperature({ fuel: "CH4(g)", mode: "complete" }).T);
  const bisect = measure("naive bisection, same balance", naiveBisection);
  report("complete-combustion flame T", complete, bisect, "median < 10 µs");

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
}
