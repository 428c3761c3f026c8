import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { heatDuty } from "../../src/energy/heatDuty.js";
import type { Stream } from "../../src/extent/types.js";
import { solveExtents } from "../../src/extent/solveExtents.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { caught, janafRow } from "../enthalpy/_helpers.js";

const COMBUSTION = "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)";
const PARTIAL = "CH4(g) + 1.5 O2(g) -> CO(g) + 2 H2O(g)";

describe("heatDuty", () => {
  it("heatDuty heating N2 to 500 K is the documented example and matches NIST-JANAF H°−H°298", () => {
    const r = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } });
    expect(Math.round(r.duty * 10) / 10).toBe(5910.7); // the @example value
    // NIST-JANAF 4th ed. 1998, table N-023: H°−H°298 = 5.911 kJ/mol (500 K), 21.463 kJ/mol (1000 K)
    expect(Math.abs(r.duty - janafRow("N2", 500).H_minus_H298! * 1000)).toBeLessThan(5);
    const hot = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 2 } }, outlet: { T: 1000, flows: { "N2(g)": 2 } } });
    expect(Math.abs(hot.duty - 2 * janafRow("N2", 1000).H_minus_H298! * 1000)).toBeLessThan(10);
  });

  it("heatDuty is zero for a stream passed through unchanged", () => {
    const s = { T: 640, flows: { "CH4(g)": 1.3, "N2(g)": 4, "H2O(g)": 0.7 } };
    const r = heatDuty({ inlet: s, outlet: s });
    expect(r.formation).toBe(0);
    expect(Math.abs(r.reaction)).toBeLessThan(1e-9);
    expect(r.reactionHeat).toBe(0);
  });

  test.prop([
    fc.dictionary(fc.constantFrom("CH4(g)", "N2(g)", "H2O(g)", "CO2(g)", "O2(g)", "NH3(g)", "Ar(g)"), fc.double({ min: 0, max: 100, noNaN: true }), { minKeys: 1 }),
    fc.double({ min: 300, max: 2500, noNaN: true }),
  ])("heatDuty is zero for any stream passed through unchanged", (flows, T) => {
    const r = heatDuty({ inlet: { T, flows }, outlet: { T, flows: { ...flows } } });
    expect(r.duty).toBe(0);
    expect(r.reactionHeat).toBe(0);
    expect(r.latentHeat).toBe(0);
  });

  it("heatDuty in a rigid vessel (constant volume) subtracts Δ(PV) = R·Δ(n_gas·T)", () => {
    const input = { inlet: { T: 298.15, flows: { "N2(g)": 1, "H2O(l)": 1 } }, outlet: { T: 350, flows: { "N2(g)": 1, "H2O(l)": 1 } } };
    const p = heatDuty(input);
    const v = heatDuty(input, { vessel: "constant-volume" });
    // common practice: for an ideal gas Cv = Cp − R, so Q_v = Q_p − n·R·ΔT (liquid PV neglected)
    expect(v.pvTerm).toBeCloseTo(8.314462618 * (350 - 298.15), 9);
    expect(v.duty).toBeCloseTo(p.duty - 8.314462618 * (350 - 298.15), 6);
    expect(v.reaction).toBeCloseTo(v.formation, 6);
    expect(caught(() => heatDuty(input, { vessel: "open" as never })).code).toBe("INVALID_ARGUMENT");
  });

  it("heatDuty separates the latent heat of water that evaporates", () => {
    const r = heatDuty({ inlet: { T: 298.15, flows: { "H2O(l)": 2 } }, outlet: { T: 298.15, flows: { "H2O(g)": 2 } } });
    // CODATA Key Values 1989 (from memory): ΔvapH°(298.15 K) = 44.004 kJ/mol
    expect(r.duty).toBeCloseTo(2 * 44004, -1);
    expect(r.latentHeat).toBeCloseTo(r.duty, 6);
    expect(r.reactionHeat).toBeCloseTo(0, 6);
    expect(r.phaseChanges).toEqual([{ from: "H2O(l)", to: "H2O(g)", amount: 2, heat: r.latentHeat }]);
  });

  it("heatDuty with reactions and extents gives the same duty as without", () => {
    const inlet = { T: 500, flows: { "CH4(g)": 1, "O2(g)": 3, "N2(g)": 11 } };
    const ext = solveExtents({ feed: inlet.flows, reactions: [COMBUSTION, PARTIAL], specs: [{ reaction: 0, extent: 0.7 }, { reaction: 1, extent: 0.2 }] });
    const outlet = { T: 1100, flows: ext.outlet };
    const plain = heatDuty({ inlet, outlet });
    const withRx = heatDuty({ inlet, outlet, reactions: [COMBUSTION, PARTIAL], extents: ext.extents }, { method: "reaction" });
    expect(withRx.method).toBe("reaction");
    expect(Math.abs(withRx.duty - plain.duty)).toBeLessThan(1e-9 * Math.abs(plain.duty));
    const hess = 0.7 * reactionEnthalpy(COMBUSTION).value + 0.2 * reactionEnthalpy(PARTIAL).value;
    expect(withRx.reactionHeat).toBeCloseTo(hess, 6);
  });

  test.prop([
    fc.record({
      ch4: fc.double({ min: 0.1, max: 5, noNaN: true }),
      excessO2: fc.double({ min: 2.05, max: 4, noNaN: true }), // O2 per CH4 ≥ 2: enough for complete combustion
      n2: fc.double({ min: 0, max: 20, noNaN: true }),
      h2o: fc.double({ min: 0, max: 2, noNaN: true }),
      co2: fc.double({ min: 0, max: 2, noNaN: true }),
      conversion: fc.double({ min: 0, max: 1, noNaN: true }),
      coShare: fc.double({ min: 0, max: 1, noNaN: true }),
      tIn: fc.double({ min: 300, max: 900, noNaN: true }),
      tOut: fc.double({ min: 300, max: 1800, noNaN: true }),
      split: fc.boolean(),
    }),
  ])("heatDuty: heat-of-formation and heat-of-reaction methods agree to 1e-9 on randomised feeds", (p) => {
    const feed = { "CH4(g)": p.ch4, "O2(g)": p.ch4 * p.excessO2, "N2(g)": p.n2, "H2O(g)": p.h2o, "CO2(g)": p.co2 };
    // extents and outlet by hand (ν of the two reactions), so float round-off cannot make a flow negative
    const e1 = p.ch4 * p.conversion * p.coShare;
    const e0 = p.ch4 * p.conversion - e1;
    const ext = {
      extents: [e0, e1],
      outlet: {
        "CH4(g)": Math.max(0, p.ch4 - e0 - e1), "O2(g)": feed["O2(g)"] - 2 * e0 - 1.5 * e1, "N2(g)": p.n2,
        "H2O(g)": p.h2o + 2 * e0 + 2 * e1, "CO2(g)": p.co2 + e0, "CO(g)": e1,
      },
    };
    const inlet: Stream | Stream[] = p.split
      ? [{ T: p.tIn, flows: { "CH4(g)": feed["CH4(g)"] } }, { T: 300, flows: { "O2(g)": feed["O2(g)"], "N2(g)": feed["N2(g)"], "H2O(g)": feed["H2O(g)"], "CO2(g)": feed["CO2(g)"] } }]
      : { T: p.tIn, flows: feed };
    const outlet = { T: p.tOut, flows: ext.outlet };
    const r = heatDuty({ inlet, outlet });
    const rx = heatDuty({ inlet, outlet, reactions: [COMBUSTION, PARTIAL], extents: ext.extents });
    const scale = Math.max(Math.abs(r.duty), ...r.streams.inlet.map((s) => Math.abs(s.enthalpy)), ...r.streams.outlet.map((s) => Math.abs(s.enthalpy)));
    expect(Math.abs(r.formation - r.reaction)).toBeLessThanOrEqual(1e-9 * scale);
    expect(Math.abs(rx.reaction - r.formation)).toBeLessThanOrEqual(1e-9 * scale);
    expect(r.reactionHeat + r.latentHeat + r.sensibleOut - r.sensibleIn).toBeCloseTo(r.reaction, 6);
  });

  it("heatDuty throws ELEMENT_IMBALANCE with the per-element imbalance and computes nothing", () => {
    const e = caught(() => heatDuty({ inlet: { T: 300, flows: { "CH4(g)": 1, "O2(g)": 2 } }, outlet: { T: 900, flows: { "CO2(g)": 1, "H2O(g)": 1 } } }));
    expect(e.code).toBe("ELEMENT_IMBALANCE");
    expect(e.details).toEqual({ imbalance: { H: -2, O: -1 } });
  });

  it("heatDuty rejects negative or zero absolute temperatures, negative flows, bad extents", () => {
    const ok = { T: 300, flows: { "N2(g)": 1 } };
    const t = caught(() => heatDuty({ inlet: { T: -20, flows: { "N2(g)": 1 } }, outlet: ok }));
    expect(t.code).toBe("INVALID_ARGUMENT");
    expect(t.details).toMatchObject({ stream: "inlet[0]", T: -20 });
    expect(caught(() => heatDuty({ inlet: ok, outlet: { T: 0, flows: { "N2(g)": 1 } } })).code).toBe("INVALID_ARGUMENT");
    const n = caught(() => heatDuty({ inlet: { T: 300, flows: { "N2(g)": -1 } }, outlet: ok }));
    expect(n.code).toBe("NEGATIVE_FLOW");
    expect(n.details).toMatchObject({ species: "N2(g)", flow: -1 });
    expect(caught(() => heatDuty({ inlet: ok, outlet: ok, extents: [1] })).code).toBe("INVALID_ARGUMENT");
    const wrong = caught(() => heatDuty({
      inlet: { T: 300, flows: { "CH4(g)": 1, "O2(g)": 2 } }, outlet: { T: 300, flows: { "CO2(g)": 1, "H2O(g)": 2 } },
      reactions: [COMBUSTION], extents: [0.5],
    }));
    expect(wrong.code).toBe("INVALID_ARGUMENT");
    expect(wrong.details).toHaveProperty("species");
  });

  it("heatDuty warns about likely unit slips only when asked", () => {
    const input = { inlet: { T: 25, flows: { "N2(g)": 2e6 } }, outlet: { T: 300, flows: { "N2(g)": 2e6 } } };
    expect(heatDuty(input, { extrapolate: true }).warnings).toEqual([]);
    const w = heatDuty(input, { warnings: true, extrapolate: true }).warnings;
    expect(w.some((m) => m.includes("°C"))).toBe(true);
    expect(w.some((m) => m.includes("kmol"))).toBe(true);
  });

  it("heatDuty does not mutate its input", () => {
    const input = Object.freeze({
      inlet: Object.freeze({ T: 300, flows: Object.freeze({ "N2(g)": 1 }) }),
      outlet: Object.freeze({ T: 400, flows: Object.freeze({ "N2(g)": 1 }) }),
    });
    expect(heatDuty(input).duty).toBeGreaterThan(0);
  });
});

describe("heatDuty: extrapolation is reported", () => {
  // a calciner-type duty of our own: 1 mol/s limestone, 95 % calcined, solids and gas leave at 1150 K
  const calciner = {
    inlet: { T: 298.15, flows: { "CaCO3(cr)": 1 } },
    outlet: { T: 1150, flows: { "CaCO3(cr)": 0.05, "CaO(cr)": 0.95, "CO2(g)": 0.95 } },
  };

  it("heatDuty lists each species outside its data with the stream T (empty when none)", () => {
    // the calcite Cp equation (Jacobs, Kerrick and Krupka 1981) holds 298–775 K: unreacted CaCO3 at 1150 K is outside
    const e = caught(() => heatDuty(calciner));
    expect(e.code).toBe("OUT_OF_RANGE");
    const r = heatDuty(calciner, { extrapolate: true });
    expect(r.extrapolated).toEqual([{ species: "CaCO3(cr)", T: 1150, range: [298, 775] }]);
    const inside = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } }, { extrapolate: true });
    expect(inside.extrapolated).toEqual([]);
  });
});
