import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { RxthermError } from "../../src/errors.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { safeParseFormula } from "../../src/formula/safeParseFormula.js";

describe("safeParseFormula", () => {
  it("safeParseFormula(text) gives the documented example", () => {
    const r = safeParseFormula("Ca(OH");
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error).toBeInstanceOf(RxthermError);
      expect(r.error.code).toBe("UNCLOSED_GROUP");
      expect(r.error.details.column).toBe(2);
    }
  });

  it("safeParseFormula(text) returns the formula on success", () => {
    expect(safeParseFormula("H2O(l)")).toEqual({ success: true, data: { text: "H2O(l)", elements: { H: 2, O: 1 }, charge: 0, phase: "l" } });
  });

  test.prop([fc.string({ maxLength: 40 })], { numRuns: 500 })("never throws and agrees with parseFormula", (t) => {
    const r = safeParseFormula(t);
    if (r.success) expect(r.data).toEqual(parseFormula(t));
    else expect(() => parseFormula(t)).toThrow(r.error.message);
  });
});
