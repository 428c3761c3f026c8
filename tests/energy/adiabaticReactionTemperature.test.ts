import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { adiabaticReactionTemperature, adiabaticTemperatureRise } from "../../src/energy/adiabaticReactionTemperature.js";
import { heatDuty } from "../../src/energy/heatDuty.js";
import { caught } from "../enthalpy/_helpers.js";

const METHANE_AIR = {
  inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } },
  reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"],
  specs: [{ of: "CH4(g)", conversion: 1 }],
};

describe("adiabaticReactionTemperature", () => {
  it("adiabaticReactionTemperature(stoichiometric methane–air, complete) is the documented example", () => {
    const r = adiabaticReactionTemperature(METHANE_AIR);
    expect(Math.round(r.T * 10) / 10).toBe(2327.2);
    // common practice: complete-combustion (no dissociation) adiabatic temperature of stoichiometric methane–air ≈ 2330 K
    expect(Math.abs(r.T - 2330)).toBeLessThan(20);
    expect(r.extents).toEqual([1]);
    expect(Math.abs(r.residual)).toBeLessThan(1e-6);
  });

  it("adiabaticReactionTemperature closes the energy balance: heatDuty(inlet → outlet) is zero", () => {
    const r = adiabaticReactionTemperature(METHANE_AIR);
    const q = heatDuty({ inlet: METHANE_AIR.inlet, outlet: r.outlet });
    expect(Math.abs(q.duty)).toBeLessThan(1e-6 * Math.abs(r.inletEnthalpy));
  });

  test.prop([fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 300, max: 700, noNaN: true })])(
    "adiabaticReactionTemperature: an exothermic reaction never cools the stream, and more conversion heats it more",
    (x1, x2, tIn) => {
      const base = { inlet: { T: tIn, flows: { "CO(g)": 1, "H2O(g)": 1.5, "N2(g)": 2 } }, reactions: ["CO(g) + H2O(g) -> CO2(g) + H2(g)"] };
      const lo = Math.min(x1, x2);
      const hi = Math.max(x1, x2);
      const tLo = adiabaticReactionTemperature({ ...base, specs: [{ of: "CO(g)", conversion: lo }] }).T;
      const tHi = adiabaticReactionTemperature({ ...base, specs: [{ of: "CO(g)", conversion: hi }] }).T;
      expect(tLo).toBeGreaterThanOrEqual(tIn - 1e-6);
      expect(tHi).toBeGreaterThanOrEqual(tLo - 1e-6);
    },
  );

  it("adiabaticReactionTemperature throws NO_BRACKET inside limits that cannot hold the answer", () => {
    const e = caught(() => adiabaticReactionTemperature(METHANE_AIR, { limitsK: [300, 1500] }));
    expect(e.code).toBe("NO_BRACKET");
    expect(e.details).toHaveProperty("limits", [300, 1500]);
  });

  it("adiabaticReactionTemperature passes the extent errors through", () => {
    expect(caught(() => adiabaticReactionTemperature({ ...METHANE_AIR, specs: [] })).code).toBe("SPEC_COUNT_MISMATCH");
    expect(caught(() => adiabaticReactionTemperature({ ...METHANE_AIR, inlet: { T: -1, flows: { "CH4(g)": 1 } } })).code).toBe("INVALID_ARGUMENT");
  });
});

describe("adiabaticTemperatureRise", () => {
  it("adiabaticTemperatureRise of a lean hydrogen batch is the documented example", () => {
    const r = adiabaticTemperatureRise({
      inlet: { T: 298.15, flows: { "H2(g)": 0.02, "O2(g)": 0.01, "N2(g)": 0.97 } },
      reactions: ["2 H2(g) + O2(g) -> 2 H2O(g)"],
      specs: [{ of: "H2(g)", conversion: 1 }],
    });
    expect(Math.round(r.deltaT * 10) / 10).toBe(166.5);
    expect(r.startT).toBe(298.15);
    expect(r.T - r.startT).toBe(r.deltaT);
  });

  it("adiabaticTemperatureRise starts from the adiabatic mixing temperature of streams at different T", () => {
    const r = adiabaticTemperatureRise({
      inlet: [{ T: 300, flows: { "N2(g)": 1 } }, { T: 500, flows: { "N2(g)": 1, "CO(g)": 0.1, "H2O(g)": 0.1 } }],
      reactions: ["CO(g) + H2O(g) -> CO2(g) + H2(g)"],
      specs: [{ reaction: 0, extent: 0 }],
    });
    expect(r.startT).toBeGreaterThan(300);
    expect(r.startT).toBeLessThan(500);
    expect(Math.abs(r.deltaT)).toBeLessThan(1e-6); // no reaction: outlet is the adiabatic mix
  });
});

describe("adiabaticReactionTemperature in a rigid vessel", () => {
  it("constant volume conserves U = H − n_gas·R·T and runs hotter than constant pressure", () => {
    const p = adiabaticReactionTemperature(METHANE_AIR);
    const v = adiabaticReactionTemperature(METHANE_AIR, { vessel: "constant-volume" });
    expect(v.vessel).toBe("constant-volume");
    expect(v.T).toBeGreaterThan(p.T);
    // check U conservation directly: Δ(H − n_gas·R·T) over the reaction is zero (gas count is unchanged here)
    const q = heatDuty({ inlet: METHANE_AIR.inlet, outlet: v.outlet }, { vessel: "constant-volume" });
    expect(Math.abs(q.duty)).toBeLessThan(1e-6 * Math.abs(v.inletEnthalpy) + 1e-6);
    expect(caught(() => adiabaticReactionTemperature(METHANE_AIR, { vessel: "sealed" as never })).code).toBe("INVALID_ARGUMENT");
  });
});

describe("adiabaticReactionTemperature / adiabaticTemperatureRise: extrapolation is reported", () => {
  // propane burnt lean from a cold feed (an invented case): the GRI-Mech 3.0 propane data start at 300 K,
  // read down to 298.15 K, so a 250 K feed is outside them
  const input = {
    inlet: { T: 250, flows: { "C3H8(g)": 0.01, "O2(g)": 0.1, "N2(g)": 0.89 } },
    reactions: ["C3H8(g) + 5 O2(g) -> 3 CO2(g) + 4 H2O(g)"],
    specs: [{ of: "C3H8(g)", conversion: 1 }],
  };

  it("lists the feed species outside its data at the inlet T; empty when none", () => {
    expect(caught(() => adiabaticReactionTemperature(input)).code).toBe("OUT_OF_RANGE");
    const r = adiabaticReactionTemperature(input, { extrapolate: true });
    expect(r.extrapolated).toEqual([{ species: "C3H8(g)", T: 250, range: [298.15, 5000] }]);
    const rise = adiabaticTemperatureRise(input, { extrapolate: true });
    expect(rise.extrapolated).toEqual(r.extrapolated);
    const warm = adiabaticReactionTemperature({ ...input, inlet: { ...input.inlet, T: 300 } }, { extrapolate: true });
    expect(warm.extrapolated).toEqual([]);
  });
});
