import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { reconcileExtents } from "../../src/extent/reconcileExtents.js";
import { solveExtents } from "../../src/extent/solveExtents.js";
import type { Flows } from "../../src/extent/types.js";
import { caught } from "../_helpers/caught.js";

describe("reconcileExtents", () => {
  it("reconcileExtents gives the documented example (least squares by hand: ξ = (7 + 7.2 + 6.8)/3)", () => {
    const r = reconcileExtents({ feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 } });
    expect(r.extents).toEqual([7]);
    expect(r.residuals).toEqual({ CO: 0, CO2: 0.2, H2: -0.2 });
    expect(r.closurePercent.C).toBe(102);
    // H: in 2·15 = 30; out 2·6.8 (measured H2) + 2·8 (reconciled, unmeasured H2O) = 29.6
    expect(r.closurePercent.H).toBe((29.6 / 30) * 100);
    expect(r.unmeasured).toEqual(["H2O"]);
    expect(r.sumOfSquares).toBe(0.08);
  });

  it("reconcileExtents weights pull the fit toward trusted analysers", () => {
    const base = { feed: { CO: 10, H2O: 15 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 } };
    const r = reconcileExtents(base, { weights: { CO2: 100 } });
    expect(r.extents[0]).toBeGreaterThan(7.19);
    const e = caught(() => reconcileExtents(base, { weights: { CO2: 0 } }));
    expect(e.code).toBe("INVALID_ARGUMENT");
  });

  it("errors: too few measurements, unseparable extents, unknown species, negative measurement", () => {
    const feed = { CH4: 10, H2O: 30 };
    const reactions = ["CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2"];
    const a = caught(() => reconcileExtents({ feed, reactions, measured: { CH4: 4 } }));
    expect(a.code).toBe("SPEC_COUNT_MISMATCH");
    expect(a.details).toMatchObject({ needed: 2, given: 1 });
    const c = caught(() => reconcileExtents({ feed, reactions: ["CH4 + H2O -> CO + 3 H2", "2 CH4 + 2 H2O -> 2 CO + 6 H2"], measured: { CH4: 4, CO: 6, H2: 18 } }));
    expect(c.code).toBe("SINGULAR_SPECS");
    const d = caught(() => reconcileExtents({ feed, reactions, measured: { CH4: 4, CO: 6, NH3: 1 } }));
    expect(d.code).toBe("INVALID_ARGUMENT");
    expect(d.details.species).toBe("NH3");
    const e = caught(() => reconcileExtents({ feed, reactions, measured: { CH4: -4, CO: 6 } }));
    expect(e.code).toBe("NEGATIVE_FLOW");
  });

  const caseArb = fc.record({
    x1: fc.integer({ min: 0, max: 40 }),
    x2: fc.integer({ min: 0, max: 40 }),
    ch4: fc.integer({ min: 10, max: 50 }),
    h2o: fc.integer({ min: 40, max: 120 }),
  });
  test.prop([caseArb])("reconcileExtents of exact data returns the exact extents and 100 % closure", ({ x1, x2, ch4, h2o }) => {
    const feed: Flows = { CH4: ch4, H2O: h2o, N2: 5 };
    const reactions = ["CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2"];
    const e1 = Math.min(x1 / 4, ch4);
    const e2 = Math.min(x2 / 8, e1);
    const fwd = solveExtents({ feed, reactions, specs: [{ reaction: 0, extent: e1 }, { reaction: 1, extent: e2 }] });
    const r = reconcileExtents({ feed, reactions, measured: fwd.outlet });
    expect(r.extents).toEqual([e1, e2]);
    for (const v of Object.values(r.closurePercent)) expect(v).toBe(100);
    for (const v of Object.values(r.residuals)) expect(v).toBe(0);
    expect(r.sumOfSquares).toBe(0);
  });
});
