/**
 * Fired-equipment benchmarks, each beside a baseline measured in the same process:
 * - one `availableHeat` call (refinery fuel gas of our own invention, 15 % excess air, flue 450 K),
 *   beside `heatDuty` closing the same balance (fuel + air in, the same flue gas out) — the
 *   general energy balance the fired-equipment function specialises;
 * - a 200-point `efficiencyCurve` over the flue temperature, beside 200 separate `availableHeat` calls.
 * Run: `npm run bench -- fired`.
 */
import { measure, report } from "./harness.js";
import { availableHeat } from "../src/energy/availableHeat.js";
import { efficiencyCurve } from "../src/energy/efficiencyCurve.js";
import { heatDuty } from "../src/energy/heatDuty.js";

// invented refinery fuel gas (mole fractions)
const FUEL = { "H2(g)": 0.3, "CH4(g)": 0.4, "C2H6(g)": 0.15, "C3H8(g)": 0.08, "C2H4(g)": 0.03, "N2(g)": 0.03, "H2S(g)": 0.01 };
const INPUT = { fuel: FUEL, excessAir: 0.15, flueT: 450 };
const FLUE_T = Array.from({ length: 200 }, (_, i) => 320 + (i * 880) / 199);

export function run(): void {
  const r = availableHeat(INPUT);
  const air: Record<string, number> = { "O2(g)": r.flueGas["O2(g)"]! / 0.15 * 1.15, "N2(g)": 0 };
  air["N2(g)"] = air["O2(g)"]! * (0.79 / 0.21);
  // a longer warm-up: the first case measured in a process otherwise pays for JIT tiering
  const one = measure("availableHeat, 7-component fuel gas", () => availableHeat(INPUT).efficiencyLHV, { warmupMs: 1500 });
  const duty = measure("heatDuty of the same balance", () =>
    heatDuty({ inlet: [{ T: 298.15, flows: FUEL }, { T: 298.15, flows: air }], outlet: { T: 450, flows: r.flueGas } }).duty);
  report("one available-heat point", one, duty, "median < 50 µs");

  const curve = measure("efficiencyCurve, 200 flue temperatures", () =>
    efficiencyCurve(INPUT, { parameter: "flueT", values: FLUE_T }).efficiencyLHV.length, { batches: 15 });
  const separate = measure("200 separate availableHeat calls", () => {
    let s = 0;
    for (const T of FLUE_T) s += availableHeat({ ...INPUT, flueT: T }).efficiencyLHV;
    return s;
  }, { batches: 15 });
  report("200-point efficiency curve", curve, separate, "median < 1 ms, at least 5× faster than separate calls");
}
