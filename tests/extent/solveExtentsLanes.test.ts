import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { test } from "../_helpers/property.js";
import { exactLanes } from "../../src/extent/internal/exactLanes.js";
import { solveExtents, type SolveExtentsInput } from "../../src/extent/solveExtents.js";
import { NETWORKS, outcome, roundOffCase } from "./roundOffCases.js";

/** The outcome in the BigInt lane only: the reference of the exact path. */
function bigIntOutcome(input: SolveExtentsInput): unknown {
  exactLanes.bigIntOnly = true;
  try {
    return outcome(input);
  } finally {
    exactLanes.bigIntOnly = false;
  }
}

describe("solveExtents exact lanes agree with the BigInt lane", () => {
  // Spec and feed values with float round-off (17 significant digits) leave the safe-integer lane;
  // whichever lane answers, every field, table and error must be the BigInt lane's, exactly.
  test.prop([roundOffCase], { numRuns: 300 })("every field, table and error equals the BigInt lane's", (input) => {
    expect(outcome(input)).toEqual(bigIntOutcome(input));
  });

  it("the bench's 16-reaction case with round-off specs equals the BigInt lane", () => {
    const feed: Record<string, number> = {
      CH4: 30, H2O: 90, CO: 2, CO2: 3, H2: 10, N2: 20, NH3: 0, O2: 6, SO2: 1, SO3: 0, C2H6: 4, C2H4: 0, C3H8: 5, C3H6: 0,
      C4H10: 3, C4H8: 0, CH3OH: 0, CH3OCH3: 0, C2H5OH: 0, H2S: 0.5, COS: 0.2, HCN: 0.3, C2H2: 0.4, Ar: 0.3,
    };
    const reactions = NETWORKS[0]!.reactions;
    const specs = [
      { of: "CH4", conversion: 0.3 }, { reaction: 1, extent: 4 }, { reaction: 2, extent: 0.5 }, { of: "N2", conversion: 0.05 },
      { of: "SO2", conversion: 0.9 }, { reaction: 5, extent: 1.5 }, { reaction: 6, extent: 1.2 }, { reaction: 7, extent: 1 },
      { reaction: 8, extent: 0.7 }, { reaction: 9, extent: 0.4 }, { reaction: 10, extent: 0.1 }, { reaction: 11, extent: 0.2 },
      { of: "H2S", conversion: 0.8 }, { of: "COS", conversion: 0.6 }, { of: "HCN", conversion: 0.5 }, { of: "C2H2", conversion: 0.95 },
    ].map((s) => Object.fromEntries(Object.entries(s).map(([k, v]) => [k, typeof v === "number" && k !== "reaction" ? v * (1 + 2 ** -52) : v])));
    const input = { feed, reactions, specs } as unknown as SolveExtentsInput;
    expect(outcome(input)).toEqual(bigIntOutcome(input));
    expect(solveExtents(input).extents[0]).toBe(10.350000000000001);
  });

  it("a table that outgrows the safe-integer lane is read from the BigInt lane (no internal error escapes)", () => {
    // found by the property above: the safe lane solved, then the yield table's feed × ratio overflowed it
    const input = {
      feed: { C2H6: 34.61803426286357, O2: 5, H2: 5, CO: 0, CO2: 0, H2O: 0, N2: 5 },
      reactions: ["C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O", "H2 + 1/2 O2 -> H2O", "CO + 1/2 O2 -> CO2"],
      specs: [{ reaction: 0, extent: 0 }, { reaction: 1, extent: 0 }, { reaction: 2, extent: 0 }],
    };
    expect(solveExtents(input).yield).toEqual({ CO2: { C2H6: 0 }, H2O: { C2H6: 0, H2: 0 } });
    expect(outcome(input)).toEqual(bigIntOutcome(input));
  });

  it("extreme magnitudes and many decimal places agree with the BigInt lane (or are left to it)", () => {
    const reactions = ["C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O", "H2 + 1/2 O2 -> H2O", "CO + 1/2 O2 -> CO2"];
    const cases = [
      { feed: { C2H6: 1e99 * 1.0000000000000002, O2: 9.999999999999999e99, H2: 3e98, CO: 1e98, N2: 1 }, x: [0.30000000000000004, 0.1 + 0.2, 0.7] },
      { feed: { C2H6: 1.2345678901234567e-30, O2: 1e-20, H2: 2e-25, CO: 3.3333333333333335e-22, N2: 1 }, x: [0.1 + 0.2, 0.30000000000000004, 1 / 3] },
      { feed: { C2H6: 10, O2: 100, H2: 5, CO: 5, N2: 1 }, x: [1 / 3, 2 / 3, 0.9999999999999999] },
      { feed: { C2H6: 10, O2: 100, H2: 5, CO: 5, N2: 1 }, x: [1, 1, 1] },
    ];
    for (const c of cases) {
      const input = { feed: c.feed, reactions, specs: [{ of: "C2H6", conversion: c.x[0]! }, { of: "H2", conversion: c.x[1]! }, { of: "CO", conversion: c.x[2]! }] };
      expect(outcome(input)).toEqual(bigIntOutcome(input));
      const extents = [{ reaction: 0, extent: c.feed.C2H6 * c.x[0]! }, { reaction: 1, extent: c.feed.H2 * c.x[1]! }, { reaction: 2, extent: c.feed.CO * c.x[2]! }];
      const byExtent = { feed: c.feed, reactions, specs: extents };
      expect(outcome(byExtent)).toEqual(bigIntOutcome(byExtent));
    }
  });

  it("outcomes recorded from the BigInt lane before the wide lane existed are unchanged", () => {
    // tests/extent/golden/roundOffSpecs.json: written once from the BigInt lane (see its note)
    const golden = JSON.parse(readFileSync(new URL("./golden/roundOffSpecs.json", import.meta.url), "utf8")) as {
      cases: { input: SolveExtentsInput; outcome: unknown }[];
    };
    expect(golden.cases.length).toBeGreaterThan(40);
    for (const c of golden.cases) expect(JSON.parse(JSON.stringify(outcome(c.input)))).toEqual(c.outcome);
  });
});
