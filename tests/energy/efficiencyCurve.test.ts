import { describe, expect, it } from "vitest";
import { efficiencyCurve } from "../../src/energy/efficiencyCurve.js";
import { availableHeat } from "../../src/energy/availableHeat.js";
import { caught } from "../_helpers/caught.js";

describe("efficiencyCurve", () => {
  it("efficiencyCurve gives the documented example values", () => {
    const c = efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 }, { parameter: "flueT", values: [400, 450, 500] });
    expect(c.efficiencyLHV.map((x) => x.toFixed(4))).toEqual(["0.9532", "0.9299", "0.9064"]); // @example
  });

  it("efficiencyCurve equals point-by-point availableHeat over flue temperatures (condensing included)", () => {
    const values = [300, 310, 320, 330, 340, 400, 700, 1200];
    const base = { fuel: { "CH4(g)": 0.9, "C2H6(g)": 0.07, "N2(g)": 0.03 }, excessAir: 0.12, airT: 400, condensing: true, coPpm: 50 };
    const c = efficiencyCurve(base, { parameter: "flueT", values });
    values.forEach((T, i) => {
      const r = availableHeat({ ...base, flueT: T });
      expect(c.availableHeat[i]).toBeCloseTo(r.availableHeat, 6);
      expect(c.stackLoss[i]).toBeCloseTo(r.stackLoss, 6);
      expect(c.efficiencyHHV[i]).toBeCloseTo(r.efficiencyHHV, 12);
      expect(c.condensedWater[i]).toBeCloseTo(r.condensedWater, 12);
    });
    expect(c.condensedWater[0]).toBeGreaterThan(0);
    expect(c.condensedWater[7]).toBe(0);
  });

  it("efficiencyCurve equals point-by-point availableHeat over excess air, per kg", () => {
    const values = [0, 0.05, 0.2, 0.5, 1, 3];
    const c = efficiencyCurve({ fuel: "C3H8(g)", flueT: 480, per: "kg" }, { parameter: "excessAir", values });
    values.forEach((e, i) => {
      const r = availableHeat({ fuel: "C3H8(g)", flueT: 480, per: "kg", excessAir: e });
      expect(c.availableHeat[i]).toBeCloseTo(r.availableHeat, 4);
      expect(c.efficiencyLHV[i]).toBeCloseTo(r.efficiencyLHV, 12);
    });
    for (let i = 1; i < values.length; i++) expect(c.efficiencyLHV[i]!).toBeLessThan(c.efficiencyLHV[i - 1]!);
  });

  it("efficiencyCurve names the failing point", () => {
    const e = caught(() => efficiencyCurve({ fuel: "CH4(g)", flueT: 450 }, { parameter: "excessAir", values: [0.1, 12] }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details.index).toBe(1);
    expect(caught(() => efficiencyCurve({ fuel: "CH4(g)" }, { parameter: "flueT", values: [] })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => efficiencyCurve({ fuel: "CH4(g)" }, { parameter: "airT" as "flueT", values: [400] })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => efficiencyCurve({ fuel: "CH4(g)", flueT: 450, equivalenceRatio: 0.9 }, { parameter: "excessAir", values: [0.1] })).code).toBe("INVALID_ARGUMENT");
  });

  it("efficiencyCurve rejects hostile sweeps with RxthermError naming the place", () => {
    const base = { fuel: "CH4(g)", excessAir: 0.15, flueT: 450 };
    const holes: number[] = [];
    holes[2] = 400;
    expect(caught(() => efficiencyCurve(base, { parameter: Object.assign(Object.create(null), { H: 1 }) as never, values: [400] })).details.path).toBe("sweep.parameter");
    expect(caught(() => efficiencyCurve(base, { parameter: "flueT", values: [400, Object.assign(Object.create(null), { H: 1 }) as never] })).details.path).toBe("sweep.values[1]");
    expect(caught(() => efficiencyCurve({ ...base, excessAir: Object.assign(Object.create(null), { H: 1 }) as never }, { parameter: "flueT", values: [400] })).details.path).toBe("input.excessAir");
    expect(caught(() => efficiencyCurve(base, { parameter: "flueT", values: holes })).details.path).toBe("sweep.values[0]");
    expect(caught(() => efficiencyCurve(base, { parameter: "flueT", values: new Array<number>(100_001).fill(400) })).code).toBe("TOO_LARGE");
    expect(caught(() => efficiencyCurve(base, null as never)).details.path).toBe("sweep");
  });
});
