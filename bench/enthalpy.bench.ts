/**
 * Enthalpy and energy-balance benchmarks: `heatDuty` for 10 species in / 12 out and
 * `reactionEnthalpy` at a temperature, each beside a hand-written loop over species resolved
 * in advance (the floor: the same species enthalpy evaluations with no validation or bookkeeping).
 * Run: `npx tsx bench/run.ts enthalpy`.
 */
import { measure, report } from "./harness.js";
import { heatDuty } from "../src/energy/heatDuty.js";
import { reactionEnthalpy } from "../src/enthalpy/reactionEnthalpy.js";
import { parseReaction } from "../src/reaction/parseReaction.js";
import { species } from "../src/species/species.js";
import type { Flows, Stream } from "../src/extent/types.js";

export function run(): void {
  // ── heatDuty: a partly converting fuel-gas burner, 10 species in, 12 out (invented scenario) ──
  const inletFlows: Flows = {
    "CH4(g)": 1, "C2H6(g)": 0.1, "C3H8(g)": 0.05, "O2(g)": 3, "N2(g)": 12,
    "H2O(g)": 0.2, "CO2(g)": 0.1, "Ar(g)": 0.1, "H2(g)": 0.1, "CO(g)": 0.05,
  };
  // extents: CH4 + 2 O2 → CO2 + 2 H2O (0.8); C2H6 + 3.5 O2 → 2 CO2 + 3 H2O (0.05);
  // C3H8 + 5 O2 → 3 CO2 + 4 H2O (0.02); H2 + ½O2 → H2O (0.05); CO + ½O2 → CO2 (0.02);
  // N2 + O2 → 2 NO (0.001); N2 + 2 O2 → 2 NO2 (0.0005)
  const x = [0.8, 0.05, 0.02, 0.05, 0.02, 0.001, 0.0005] as const;
  const outletFlows: Flows = {
    "CH4(g)": 1 - x[0], "C2H6(g)": 0.1 - x[1], "C3H8(g)": 0.05 - x[2],
    "O2(g)": 3 - 2 * x[0] - 3.5 * x[1] - 5 * x[2] - 0.5 * x[3] - 0.5 * x[4] - x[5] - 2 * x[6],
    "N2(g)": 12 - x[5] - x[6], "H2O(g)": 0.2 + 2 * x[0] + 3 * x[1] + 4 * x[2] + x[3],
    "CO2(g)": 0.1 + x[0] + 2 * x[1] + 3 * x[2] + x[4], "Ar(g)": 0.1, "H2(g)": 0.1 - x[3], "CO(g)": 0.05 - x[4],
    "NO(g)": 2 * x[5], "NO2(g)": 2 * x[6],
  };
  const inlet: Stream = { T: 450, flows: inletFlows };
  const outlet: Stream = { T: 1400, flows: outletFlows };
  const input = { inlet, outlet };
  heatDuty(input); // warm the species cache and check the balance once
  const inSp = Object.keys(inletFlows).map((k) => species(k));
  const inN = Object.values(inletFlows);
  const outSp = Object.keys(outletFlows).map((k) => species(k));
  const outN = Object.values(outletFlows);
  const baseline = measure("hand loop Σn·H(T) out − in (22 species, resolved)", () => {
    let q = 0;
    for (let i = 0; i < outSp.length; i++) q += outN[i]! * outSp[i]!.enthalpy(1400);
    for (let i = 0; i < inSp.length; i++) q -= inN[i]! * inSp[i]!.enthalpy(450);
    return q;
  });
  const duty = measure("heatDuty (10 in, 12 out, both methods + breakdown)", () => heatDuty(input).duty);
  report("heatDuty", duty, baseline, "median < 10 µs");

  // ── reactionEnthalpy at T ──
  const text = "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)";
  const parsed = parseReaction(text);
  const sp = ["CH4(g)", "O2(g)", "CO2(g)", "H2O(g)"].map((k) => species(k));
  const nu = [-1, -2, 1, 2];
  let T = 900;
  const rxBaseline = measure("hand loop Σν·H(T) (4 species, resolved)", () => {
    T = T === 900 ? 901 : 900;
    let h = 0;
    for (let i = 0; i < 4; i++) h += nu[i]! * sp[i]!.enthalpy(T);
    return h;
  });
  const opts900 = { T: 900 };
  const opts901 = { T: 901 };
  const rxObject = measure("reactionEnthalpy(Reaction, { T })", () => {
    T = T === 900 ? 901 : 900;
    return reactionEnthalpy(parsed, T === 900 ? opts900 : opts901).value;
  });
  report("reactionEnthalpy at T", rxObject, rxBaseline, "median < 2 µs");
  const rxText = measure("reactionEnthalpy(text, { T }) (parsed-text cache)", () => {
    T = T === 900 ? 901 : 900;
    return reactionEnthalpy(text, T === 900 ? opts900 : opts901).value;
  });
  report("reactionEnthalpy at T", rxText, rxBaseline, "median < 2 µs");
  const rx298 = measure("reactionEnthalpy(Reaction) at 298.15 K (exact decimal Hess sum)", () => reactionEnthalpy(parsed).value);
  report("reactionEnthalpy 298.15 K", rx298, rxBaseline, "(no target; exact decimal path)");
}
