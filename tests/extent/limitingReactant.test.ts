import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { limitingReactant } from "../../src/extent/limitingReactant.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { caught } from "../_helpers/caught.js";

describe("limitingReactant", () => {
  it("limitingReactant(feed, reaction) gives the documented example", () => {
    // fractional excess = (fed − required)/required, the trade's definition (common practice)
    const r = limitingReactant({ CH4: 1, O2: 2.4 }, "CH4 + 2 O2 -> CO2 + 2 H2O");
    expect(r.species).toBe("CH4");
    expect(r.maxExtent).toBe(1);
    expect(r.excess).toEqual({ CH4: 0, O2: 0.2 });
    expect(r.runOut).toEqual({ CH4: 1, O2: 1.2 });
    expect(r.limiting).toEqual(["CH4"]);
    expect(r.outletAtMaxExtent).toEqual({ CH4: 0, O2: 0.4, CO2: 1, H2O: 2 });
  });

  it("limitingReactant finds the limiting reactant of an off-stoichiometric ammonia feed exactly", () => {
    // invented feed: 1 N2 : 2.7 H2 → H2 limits (runs out at 0.9), N2 in 1/0.9 − 1 = 1/9 excess
    const r = limitingReactant({ N2: 1, H2: 2.7, Ar: 0.1 }, parseReaction("N2 + 3 H2 -> 2 NH3"));
    expect(r.species).toBe("H2");
    expect(r.maxExtent).toBe(0.9);
    expect(r.excess.N2).toBe(1 / 9);
    expect(r.excess.H2).toBe(0);
    expect(r.excess.Ar).toBeUndefined();
    expect(r.outletAtMaxExtent).toEqual({ N2: 0.1, H2: 0, Ar: 0.1, NH3: 1.8 });
  });

  it("limitingReactant reports ties", () => {
    const r = limitingReactant({ H2: 2, O2: 1 }, "2 H2 + O2 -> 2 H2O");
    expect(r.limiting).toEqual(["H2", "O2"]);
    expect(r.species).toBe("H2");
  });

  it("errors: reactant not fed, negative flow, unbalanced reaction, bad key", () => {
    const a = caught(() => limitingReactant({ CH4: 1 }, "CH4 + 2 O2 -> CO2 + 2 H2O"));
    expect(a.code).toBe("INVALID_ARGUMENT");
    expect(a.details.missing).toEqual(["O2"]);
    const b = caught(() => limitingReactant({ CH4: 1, O2: -2 }, "CH4 + 2 O2 -> CO2 + 2 H2O"));
    expect(b.code).toBe("NEGATIVE_FLOW");
    expect(b.details).toMatchObject({ species: "O2", value: -2 });
    const c = caught(() => limitingReactant({ CH4: 1, O2: 2 }, "CH4 + 2 O2 -> CO2 + H2O"));
    expect(c.code).toBe("UNBALANCED_REACTION");
    expect(c.details.residuals).toEqual({ H: -2, O: -1 });
    const d = caught(() => limitingReactant({ "Qq": 1 }, "CH4 + 2 O2 -> CO2 + 2 H2O"));
    expect(d.code).toBe("UNKNOWN_ELEMENT");
  });

  test.prop([fc.integer({ min: 1, max: 1000 }), fc.integer({ min: 1, max: 1000 })])(
    "limitingReactant: the limiting reactant has zero excess, the others non-negative, and running to maxExtent empties it",
    (a, b) => {
      const r = limitingReactant({ C3H8: a / 10, O2: b / 10 }, "C3H8 + 5 O2 -> 3 CO2 + 4 H2O");
      expect(r.excess[r.species]).toBe(0);
      for (const v of Object.values(r.excess)) expect(v).toBeGreaterThanOrEqual(0);
      expect(r.outletAtMaxExtent[r.species]).toBe(0);
      expect(r.maxExtent).toBe(Math.min(a / 10, b / 50));
    },
  );
});
