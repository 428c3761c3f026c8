import { describe, expect, it } from "vitest";
import { editDistance, knownKeys, rejectUnknownKeys } from "../src/errors.js";
import { caught } from "./_helpers/caught.js";

interface Opts { method?: string; extrapolate?: boolean; library?: object }

describe("knownKeys / rejectUnknownKeys (misspelt options are errors, not defaults)", () => {
  const KEYS = knownKeys<Opts>()("method", "extrapolate", "library");

  it("the key list is checked complete against the type at compile time", () => {
    // @ts-expect-error "library" is missing from the list
    knownKeys<Opts>()("method", "extrapolate");
    // @ts-expect-error "methd" is not a key of the type
    knownKeys<Opts>()("method", "extrapolate", "library", "methd");
    expect([...KEYS]).toEqual(["method", "extrapolate", "library"]);
  });

  it("passes known keys and rejects an unknown one with a suggestion within two edits", () => {
    expect(() => rejectUnknownKeys({ method: "formation", extrapolate: true }, KEYS, "heatDuty", "options")).not.toThrow();
    const e = caught(() => rejectUnknownKeys({ extrapolte: true }, KEYS, "heatDuty", "options"));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.message).toContain('did you mean "extrapolate"?');
    expect(e.details).toMatchObject({ path: "options.extrapolte", key: "extrapolte", suggestion: "extrapolate" });
    const far = caught(() => rejectUnknownKeys({ temperature: 300 }, KEYS, "heatDuty", "options"));
    expect(far.details).not.toHaveProperty("suggestion");
    expect(far.message).toContain("it reads method, extrapolate, library");
  });

  it("ignores inherited keys (they are never read)", () => {
    const o = Object.create({ inherited: 1 }) as object;
    expect(() => rejectUnknownKeys(o, KEYS, "f", "options")).not.toThrow();
  });

  it("editDistance is the Levenshtein distance (common practice)", () => {
    expect(editDistance("kitten", "sitting")).toBe(3);
    expect(editDistance("", "abc")).toBe(3);
    expect(editDistance("excessAir", "excesAir")).toBe(1);
  });
});
