import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { reverseReaction, scaleReaction } from "../../src/reaction/scaleReaction.js";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { errorOf } from "./helpers.js";

describe("scaleReaction", () => {
  it("documented example: water formation per mole of H2 (common practice)", () => {
    expect(formatReaction(scaleReaction(parseReaction("2 H2 + O2 -> 2 H2O"), "1/2"))).toBe("H2 + 1/2 O2 -> H2O");
    expect(formatReaction(scaleReaction(parseReaction("H2 + 1/2 O2 -> H2O"), 2))).toBe("2 H2 + O2 -> 2 H2O");
  });
  it("rejects zero, negative and malformed factors", () => {
    const r = parseReaction("2 H2 + O2 -> 2 H2O");
    for (const f of [0, -1, "abc", Number.NaN]) {
      const e = errorOf(() => scaleReaction(r, f));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details).toEqual({ path: "factor", factor: String(f) });
    }
  });
  it("a hostile factor (null-prototype object, symbol) is INVALID_ARGUMENT, never a TypeError", () => {
    const r = parseReaction("2 H2 + O2 -> 2 H2O");
    for (const f of [Object.create(null), Symbol("f"), null]) {
      const e = errorOf(() => scaleReaction(r, f as never));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details.path).toBe("factor");
    }
  });
  test.prop([fc.integer({ min: 1, max: 99 }), fc.integer({ min: 1, max: 99 })])("scaling by p/q then q/p gives the reaction back, exactly", (p, q) => {
    const r = parseReaction("C3H8 + 5 O2 -> 3 CO2 + 4 H2O");
    expect(scaleReaction(scaleReaction(r, `${p}/${q}`), `${q}/${p}`)).toEqual(r);
  });
});

describe("reverseReaction", () => {
  it("documented example: ammonia decomposition is the reverse of its synthesis (common practice)", () => {
    expect(formatReaction(reverseReaction(parseReaction("N2 + 3 H2 -> 2 NH3")))).toBe("2 NH3 -> N2 + 3 H2");
  });
  it("is its own inverse and does not mutate its input", () => {
    const r = parseReaction("CaCO3(s) -> CaO(s) + CO2(g)");
    expect(reverseReaction(reverseReaction(r))).toEqual(r);
    expect(formatReaction(r)).toBe("CaCO3(s) -> CaO(s) + CO2(g)");
  });
});
