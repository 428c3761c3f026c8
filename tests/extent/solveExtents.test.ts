import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { RxthermError } from "../../src/errors.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { solveExtents } from "../../src/extent/solveExtents.js";
import type { ExtentSpec, Flows } from "../../src/extent/types.js";
import { rationalAdd, rationalFrom, rationalFromNumber, rationalMul, rationalSub, rationalToNumber } from "../../src/numeric/rational.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { caught } from "../_helpers/caught.js";

function elementTotals(flows: Flows): Record<string, number> {
  const t: Record<string, number> = {};
  for (const [k, n] of Object.entries(flows)) {
    for (const [el, c] of Object.entries(parseFormula(k).elements)) t[el] = (t[el] ?? 0) + n * c;
  }
  return t;
}

// Pool of balanced reactions, each with a species that appears in no other reaction of the pool
// (so outlet specs on those species always give a non-singular system). Stoichiometry: common practice.
const POOL = [
  { eq: "CH4 + 2 O2 -> CO2 + 2 H2O", key: "CH4" },
  { eq: "CO + H2O -> CO2 + H2", key: "CO" },
  { eq: "C2H6 -> C2H4 + H2", key: "C2H6" },
  { eq: "N2 + 3 H2 -> 2 NH3", key: "NH3" },
  { eq: "2 SO2 + O2 -> 2 SO3", key: "SO3" },
  { eq: "C3H8 + 5 O2 -> 3 CO2 + 4 H2O", key: "C3H8" },
] as const;
const POOL_SPECIES = ["CH4", "O2", "CO2", "H2O", "CO", "H2", "C2H6", "C2H4", "N2", "NH3", "SO2", "SO3", "C3H8"];

describe("solveExtents", () => {
  it("solveExtents(single reaction, conversion) gives the documented example exactly", () => {
    // hand calculation from n_out = n_in + ν ξ with ξ = X · n_CH4 (definition of conversion, common practice)
    const r = solveExtents({ feed: { CH4: 1, O2: 2.4, N2: 9 }, reactions: ["CH4 + 2 O2 -> CO2 + 2 H2O"], specs: [{ of: "CH4", conversion: 0.9 }] });
    expect(r.extents).toEqual([0.9]);
    // exact arithmetic: 1 − 0.9 is 0.1 (float arithmetic would give 0.09999999999999998)
    expect(r.outlet).toEqual({ CH4: 0.1, O2: 0.6, N2: 9, CO2: 0.9, H2O: 1.8 });
    expect(r.conversion).toEqual({ CH4: 0.9, O2: 0.75 });
    expect(r.change).toEqual({ CH4: -0.9, O2: -1.8, CO2: 0.9, H2O: 1.8 });
    expect(r.yield.CO2?.CH4).toBe(0.9);
  });

  it("solveExtents matches a phase-less equation key to a feed key with a phase", () => {
    const r = solveExtents({ feed: { "CH4(g)": 2, "O2(g)": 5 }, reactions: ["CH4 + 2 O2 -> CO2(g) + 2 H2O(g)"], specs: [{ of: "CH4", conversion: 0.5 }] });
    expect(r.outlet).toEqual({ "CH4(g)": 1, "O2(g)": 3, "CO2(g)": 1, "H2O(g)": 2 });
  });

  it("solveExtents(two reactions, conversion + selectivity) is exact: extents 15/7 and 5/14", () => {
    // ethylene partial oxidation vs. total oxidation; invented feed. Hand solution of
    // ξ1 + ξ2 = 0.25·10 and ξ1 = 3·(2 ξ2) (selectivity definition of this library): ξ2 = 5/14, ξ1 = 15/7
    const r = solveExtents({
      feed: { C2H4: 10, O2: 20, N2: 70 },
      reactions: ["2 C2H4 + O2 -> 2 C2H4O", "C2H4 + 3 O2 -> 2 CO2 + 2 H2O"],
      specs: [
        { of: "C2H4", conversion: 0.25 },
        { of: "C2H4O", selectivity: 3, over: "CO2" },
      ],
    });
    expect(r.extents[0]).toBe(15 / 14); // 2 ξ1' = 15/7 mol C2H4O → ξ1' = 15/14
    expect(r.extents[1]).toBe(5 / 14);
    expect(r.outlet.C2H4O).toBe(15 / 7);
    expect(r.outlet.CO2).toBe(5 / 7);
    expect(r.selectivity.C2H4O?.CO2).toBe(3);
    expect(r.conversion.C2H4).toBe(0.25);
    expect(r.conversionByReaction[0]?.C2H4).toBe(15 / 70);
    expect(r.conversionByReaction[1]?.C2H4).toBe(5 / 140);
    // yield of C2H4O on C2H4: formed / (10 · 1) = (15/7)/10
    expect(r.yield.C2H4O?.C2H4).toBe(3 / 14);
  });

  it("solveExtents accepts yield, outlet, extent and per-reaction conversion specs", () => {
    const feed = { C2H4: 10, O2: 20 };
    const reactions = ["2 C2H4 + O2 -> 2 C2H4O", "C2H4 + 3 O2 -> 2 CO2 + 2 H2O"];
    const a = solveExtents({ feed, reactions, specs: [{ of: "C2H4O", yield: 0.2, basis: "C2H4" }, { of: "CO2", outlet: 1 }] });
    expect(a.extents).toEqual([1, 0.5]); // 2 ξ1 = 0.2 · 10; 2 ξ2 = 1
    const b = solveExtents({ feed, reactions, specs: [{ reaction: 0, extent: 1 }, { of: "C2H4", conversion: 0.05, reaction: 1 }] });
    expect(b.extents).toEqual([1, 0.5]);
    expect(b.yield.C2H4O?.C2H4).toBe(0.2);
  });

  it("solveExtents separates dependent reactions only with per-reaction specs", () => {
    // methanol synthesis from CO and CO2 plus the shift: reaction 3 = reaction 1 − reaction 2
    const feed = { CO: 10, CO2: 5, H2: 60, H2O: 0 };
    const reactions = ["CO + 2 H2 -> CH3OH", "CO2 + 3 H2 -> CH3OH + H2O", "CO + H2O -> CO2 + H2"];
    const e = caught(() => solveExtents({ feed, reactions, specs: [{ of: "CO", conversion: 0.5 }, { of: "CO2", conversion: 0.2 }] }));
    expect(e.code).toBe("SPEC_COUNT_MISMATCH");
    expect(e.details).toMatchObject({ needed: 3, given: 2, missing: 1, extra: 0, rank: 2 });
    expect(e.message).toContain("dependent");
    const s = caught(() =>
      solveExtents({ feed, reactions, specs: [{ of: "CO", conversion: 0.5 }, { of: "CO2", conversion: 0.2 }, { of: "H2O", outlet: 1 }] }),
    );
    expect(["SINGULAR_SPECS", "CONFLICTING_SPECS"]).toContain(s.code);
    expect(s.message).toContain("dependent");
    const ok = solveExtents({ feed, reactions, specs: [{ reaction: 0, extent: 4 }, { reaction: 1, extent: 1 }, { reaction: 2, extent: 0.5 }] });
    expect(ok.outlet).toMatchObject({ CO: 5.5, CO2: 4.5, H2: 49.5, H2O: 0.5, CH3OH: 5 });
  });

  describe("errors", () => {
    const feed = { CH4: 1, O2: 2.4, N2: 9 };
    const rx = ["CH4 + 2 O2 -> CO2 + 2 H2O"];
    it("UNBALANCED_REACTION with residuals", () => {
      const e = caught(() => solveExtents({ feed, reactions: ["CH4 + O2 -> CO2 + H2O"], specs: [{ of: "CH4", conversion: 0.5 }] }));
      expect(e.code).toBe("UNBALANCED_REACTION");
      expect(e.details).toMatchObject({ reaction: 0, residuals: { H: -2, O: 1 } });
    });
    it("INVALID_ARGUMENT for a spec on a species in no reaction", () => {
      const e = caught(() => solveExtents({ feed, reactions: rx, specs: [{ of: "N2", conversion: 0.5 }] }));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details).toMatchObject({ spec: 0, species: "N2" });
      const f = caught(() => solveExtents({ feed, reactions: rx, specs: [{ of: "Ar", outlet: 1 }] }));
      expect(f.code).toBe("INVALID_ARGUMENT");
      expect(f.details).toMatchObject({ spec: 0, species: "Ar" });
    });
    it("INVALID_ARGUMENT for a conversion outside [0, 1]", () => {
      for (const X of [-0.1, 1.2, Number.NaN]) {
        const e = caught(() => solveExtents({ feed, reactions: rx, specs: [{ of: "CH4", conversion: X }] }));
        expect(e.code).toBe("INVALID_ARGUMENT");
        expect(e.details.spec).toBe(0);
      }
    });
    it("NEGATIVE_FLOW for a negative feed, and INVALID_ARGUMENT for a non-finite one", () => {
      const e = caught(() => solveExtents({ feed: { CH4: -1, O2: 2 }, reactions: rx, specs: [{ reaction: 0, extent: 0 }] }));
      expect(e.code).toBe("NEGATIVE_FLOW");
      expect(e.details).toMatchObject({ species: "CH4", value: -1 });
      const f = caught(() => solveExtents({ feed: { CH4: Infinity, O2: 2 }, reactions: rx, specs: [{ reaction: 0, extent: 0 }] }));
      expect(f.code).toBe("INVALID_ARGUMENT");
    });
    it("NEGATIVE_FLOW naming the species and the feasible extent range when a solution overdraws a reactant", () => {
      const e = caught(() => solveExtents({ feed: { CH4: 1, O2: 1.5 }, reactions: rx, specs: [{ of: "CH4", conversion: 1 }] }));
      expect(e.code).toBe("NEGATIVE_FLOW");
      expect(e.details).toMatchObject({ species: "O2", outlet: -0.5, feasibleExtentRange: [0, 0.75] });
    });
    it("a feed key that is not a formula fails with the formula's code", () => {
      const e = caught(() => solveExtents({ feed: { Xy2: 1, CH4: 1, O2: 2 }, reactions: rx, specs: [{ reaction: 0, extent: 0 }] }));
      expect(e.code).toBe("UNKNOWN_ELEMENT");
      expect(e.details.species).toBe("Xy2");
    });
    it("SINGULAR_SPECS and CONFLICTING_SPECS name the specs", () => {
      const reactions = ["CO + H2O -> CO2 + H2", "CH4 + H2O -> CO + 3 H2"];
      const feed2 = { CH4: 10, H2O: 30, CO: 0, CO2: 0, H2: 0 };
      const specsS: ExtentSpec[] = [{ of: "CH4", conversion: 0.5 }, { of: "CH4", outlet: 5 }];
      const s = caught(() => solveExtents({ feed: feed2, reactions, specs: specsS }));
      expect(s.code).toBe("SINGULAR_SPECS");
      expect(s.details.specs).toEqual([0, 1]);
      const c = caught(() => solveExtents({ feed: feed2, reactions, specs: [{ of: "CH4", conversion: 0.5 }, { of: "CH4", outlet: 4 }] }));
      expect(c.code).toBe("CONFLICTING_SPECS");
      expect(c.details.specs).toEqual([0, 1]);
    });
    it("the float path defers singular and infeasible cases to the exact path (same codes)", () => {
      const reactions = ["CO + H2O -> CO2 + H2", "CH4 + H2O -> CO + 3 H2"];
      const feed2 = { CH4: 10, H2O: 30, CO: 0, CO2: 0, H2: 0 };
      const s = caught(() => solveExtents({ feed: feed2, reactions, specs: [{ of: "CH4", conversion: 0.5 }, { of: "CH4", outlet: 5 }] }, { arithmetic: "float" }));
      expect(s.code).toBe("SINGULAR_SPECS");
      const n = caught(() => solveExtents({ feed: { CH4: 1, O2: 1.5 }, reactions: rx, specs: [{ of: "CH4", conversion: 1 }] }, { arithmetic: "float" }));
      expect(n.code).toBe("NEGATIVE_FLOW");
      expect(n.details.species).toBe("O2");
      // conversion 1 of the limiting reactant: exactly 0 left, never a tiny negative
      const ok = solveExtents({ feed: { CH4: 0.3, O2: 0.6 }, reactions: rx, specs: [{ of: "CH4", conversion: 1 }] }, { arithmetic: "float" });
      expect(ok.outlet.CH4).toBe(0);
      expect(ok.outlet.O2).toBe(0);
    });
    it("SPEC_COUNT_MISMATCH says how many specs are extra", () => {
      const e = caught(() => solveExtents({ feed, reactions: rx, specs: [{ of: "CH4", conversion: 0.5 }, { reaction: 0, extent: 0.1 }] }));
      expect(e.code).toBe("SPEC_COUNT_MISMATCH");
      expect(e.details).toMatchObject({ needed: 1, given: 2, missing: 0, extra: 1 });
    });
    it("does not mutate frozen inputs", () => {
      const input = Object.freeze({
        feed: Object.freeze({ ...feed }),
        reactions: Object.freeze([...rx]),
        specs: Object.freeze([Object.freeze({ of: "CH4", conversion: 0.5 })]),
      });
      expect(solveExtents(input).extents).toEqual([0.5]);
    });
  });

  const subsetArb = fc.subarray([0, 1, 2, 3, 4, 5], { minLength: 1 });
  const caseArb = subsetArb.chain((idx) =>
    fc.record({
      idx: fc.constant(idx),
      eighths: fc.array(fc.integer({ min: 0, max: 64 }), { minLength: idx.length, maxLength: idx.length }),
      // ≥ 70 so the largest O2 draw (8 · (2 + 1 + 5) = 64) never empties a feed
      feed: fc.array(fc.integer({ min: 70, max: 200 }), { minLength: POOL_SPECIES.length, maxLength: POOL_SPECIES.length }),
    }),
  );

  test.prop([caseArb])("solveExtents conserves every element from feed to outlet", ({ idx, eighths, feed }) => {
    const f: Flows = Object.fromEntries(POOL_SPECIES.map((s, i) => [s, feed[i] as number]));
    const r = solveExtents({
      feed: f,
      reactions: idx.map((i) => POOL[i]!.eq),
      specs: eighths.map((e, j) => ({ reaction: j, extent: e / 8 })),
    });
    const tin = elementTotals(f);
    const tout = elementTotals(r.outlet);
    for (const el of Object.keys(tin)) expect(tout[el]).toBeCloseTo(tin[el] as number, 9);
  });

  test.prop([caseArb])("solveExtents forward, then specs built from the outlet, returns the same extents", ({ idx, eighths, feed }) => {
    const f: Flows = Object.fromEntries(POOL_SPECIES.map((s, i) => [s, feed[i] as number]));
    const reactions = idx.map((i) => POOL[i]!.eq);
    const fwd = solveExtents({ feed: f, reactions, specs: eighths.map((e, j) => ({ reaction: j, extent: e / 8 })) });
    const back = solveExtents({ feed: f, reactions, specs: idx.map((i) => ({ of: POOL[i]!.key, outlet: fwd.outlet[POOL[i]!.key] as number })) });
    expect(back.extents).toEqual(fwd.extents);
    // a conversion spec on the same key reactants gives them again (CH4, CO, C2H6, C3H8 are reactants)
    const viaConversion = solveExtents({
      feed: f,
      reactions,
      specs: idx.map((i) =>
        ["NH3", "SO3"].includes(POOL[i]!.key)
          ? { of: POOL[i]!.key, outlet: fwd.outlet[POOL[i]!.key] as number }
          : { of: POOL[i]!.key, conversion: fwd.conversion[POOL[i]!.key] as number },
      ),
    });
    for (let j = 0; j < idx.length; j++) expect(viaConversion.extents[j]).toBeCloseTo(fwd.extents[j] as number, 12);
  });

  test.prop([caseArb])("solveExtents float arithmetic agrees with exact arithmetic (relTol 1e-12)", ({ idx, eighths, feed }) => {
    const f: Flows = Object.fromEntries(POOL_SPECIES.map((s, i) => [s, feed[i] as number]));
    const reactions = idx.map((i) => POOL[i]!.eq);
    const fwd = solveExtents({ feed: f, reactions, specs: eighths.map((e, j) => ({ reaction: j, extent: e / 8 })) });
    // outlets that are not binary fractions, so the two arithmetics really differ
    const input = { feed: f, reactions, specs: idx.map((i) => ({ of: POOL[i]!.key, outlet: (fwd.outlet[POOL[i]!.key] as number) * 0.97 })) };
    let exact;
    try {
      exact = solveExtents(input);
    } catch (e) {
      // both paths must fail the same way when a spec is infeasible
      expect(() => solveExtents(input, { arithmetic: "float" })).toThrow(RxthermError);
      expect((e as RxthermError).code).toBe("NEGATIVE_FLOW");
      return;
    }
    const fl = solveExtents(input, { arithmetic: "float" });
    exact.extents.forEach((x, j) => expect(Math.abs((fl.extents[j] as number) - x)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(x))));
  });
});

describe("solveExtents round-off rule", () => {
  // invented methane-burner feed; stoichiometry CH4 + 2 O2 -> CO2 + 2 H2O: common practice
  const rx = ["CH4 + 2 O2 -> CO2 + 2 H2O"];
  const arithmetics = ["exact", "float"] as const;

  it.each(arithmetics)("a float-computed extent that overdraws the feed by round-off gives exactly 0 (%s)", (arithmetic) => {
    const extent = 0.1 * 3; // 0.30000000000000004 in float64: exactly 4e-17 more than the 0.3 fed
    expect(String(extent)).toBe("0.30000000000000004");
    const r = solveExtents({ feed: { CH4: 0.3, O2: 1 }, reactions: rx, specs: [{ reaction: 0, extent }] }, { arithmetic });
    expect(Object.is(r.outlet.CH4, 0)).toBe(true);
    expect(r.roundOffZeros).toEqual(["CH4"]);
    expect(r.change.CH4).toBe(-0.3); // out − in stays consistent with the zeroed outlet
    expect(r.conversion.CH4).toBe(1);
    expect(r.extents).toEqual([0.30000000000000004]);
  });

  it.each(arithmetics)("the tolerance is 1e-12 of the species' throughput: just inside → 0, just outside → NEGATIVE_FLOW (%s)", (arithmetic) => {
    // CH4 fed 1, drawn 1 + δ: throughput 1 + (1 + δ) ≈ 2, so the limit is ≈ 2e-12
    const inside = solveExtents({ feed: { CH4: 1, O2: 3 }, reactions: rx, specs: [{ reaction: 0, extent: 1.000000000001 }] }, { arithmetic });
    expect(inside.outlet.CH4).toBe(0);
    expect(inside.roundOffZeros).toEqual(["CH4"]);
    const e = caught(() => solveExtents({ feed: { CH4: 1, O2: 3 }, reactions: rx, specs: [{ reaction: 0, extent: 1.000000000003 }] }, { arithmetic }));
    expect(e.code).toBe("NEGATIVE_FLOW");
    expect(e.details).toMatchObject({ species: "CH4", outlet: -3e-12, feasibleExtentRange: [0, 1] });
  });

  it.each(arithmetics)("a clearly negative outlet is NEGATIVE_FLOW naming the species, its value and the largest feasible extent (%s)", (arithmetic) => {
    const e = caught(() => solveExtents({ feed: { CH4: 0.21, O2: 1 }, reactions: rx, specs: [{ reaction: 0, extent: 0.2100001 }] }, { arithmetic }));
    expect(e.code).toBe("NEGATIVE_FLOW");
    expect(e.details).toMatchObject({ species: "CH4", outlet: -1e-7, extents: [0.2100001], feasibleExtentRange: [0, 0.21] });
    expect(e.message).toContain("negative outlet flow -1e-7 of CH4");
    expect(e.message).toContain("the largest is 0.21");
    expect(e.message).not.toMatch(/flow -?0 of/);
  });

  it("no result lists round-off zeros when nothing was zeroed", () => {
    const r = solveExtents({ feed: { CH4: 1, O2: 2.4 }, reactions: rx, specs: [{ of: "CH4", conversion: 1 }] });
    expect(r.outlet.CH4).toBe(0); // an exact zero is not a round-off zero
    expect(r.roundOffZeros).toEqual([]);
  });
});

describe("solveExtents exact arithmetic", () => {
  // Independent check: each outlet is the correctly rounded double of feed + ν·ξ computed here in
  // BigInt rationals. Feeds with 1–3 decimals keep the library in its safe-integer lane; feeds with
  // 17 significant digits force its BigInt lane. Both must give the same doubles.
  const feedArb = fc.oneof(
    fc.integer({ min: 70_000, max: 200_000 }).map((n) => n / 1000),
    fc.double({ min: 70, max: 200, noNaN: true }).filter((x) => String(x).replace(/[.-]/g, "").length >= 17),
  );
  test.prop([
    fc.subarray([0, 1, 2, 3, 4, 5], { minLength: 1 }),
    fc.array(fc.integer({ min: 0, max: 64 }), { minLength: 6, maxLength: 6 }),
    fc.array(feedArb, { minLength: POOL_SPECIES.length, maxLength: POOL_SPECIES.length }),
  ])("solveExtents outlets are the correctly rounded exact values in either integer lane", (idx, eighths, feed) => {
    const f: Flows = Object.fromEntries(POOL_SPECIES.map((s, i) => [s, feed[i] as number]));
    const reactions = idx.map((i) => POOL[i]!.eq);
    const xi = idx.map((_, j) => rationalFrom(`${eighths[j] as number}/8`));
    const r = solveExtents({ feed: f, reactions, specs: idx.map((_, j) => ({ reaction: j, extent: (eighths[j] as number) / 8 })) });
    for (const sp of POOL_SPECIES) {
      let v = rationalFromNumber(f[sp] as number);
      idx.forEach((i, j) => {
        const p = parseReaction(POOL[i]!.eq);
        for (const t of p.reactants) if (t.species === sp) v = rationalSub(v, rationalMul(rationalFrom(t.exact), xi[j]!));
        for (const t of p.products) if (t.species === sp) v = rationalAdd(v, rationalMul(rationalFrom(t.exact), xi[j]!));
      });
      expect(r.outlet[sp]).toBe(rationalToNumber(v));
    }
  });
});
