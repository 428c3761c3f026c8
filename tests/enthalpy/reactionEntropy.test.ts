import { describe, expect, it } from "vitest";
import { reactionEntropy } from "../../src/enthalpy/reactionEntropy.js";
import { caught, janafRow } from "./_helpers.js";

describe("reactionEntropy", () => {
  it("reactionEntropy(H2 + ½O2 → H2O(g)) is the documented example and matches NIST-JANAF S° values", () => {
    const v = reactionEntropy("H2(g) + 0.5 O2(g) -> H2O(g)");
    expect(v).toBeCloseTo(-44.4195, 4); // the @example value
    // NIST-JANAF 4th ed. 1998, tables H-064, H-050, O-029: S°298 = 188.834, 130.680, 205.147 J/(mol·K)
    const published = janafRow("H2O(g)", 298.15).S! - janafRow("H2", 298.15).S! - 0.5 * janafRow("O2", 298.15).S!;
    expect(Math.abs(v - published)).toBeLessThan(0.01);
  });

  it("reactionEntropy at 1000 K matches NIST-JANAF S°(1000 K)", () => {
    // NIST-JANAF 4th ed. 1998 (H-064, H-050, O-029): S°(1000 K) = 232.738, 166.216, 243.578 J/(mol·K)
    const published = janafRow("H2O(g)", 1000).S! - janafRow("H2", 1000).S! - 0.5 * janafRow("O2", 1000).S!;
    expect(Math.abs(reactionEntropy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: 1000 }) - published)).toBeLessThan(0.05);
  });

  it("reactionEntropy rejects a bad temperature and an unbalanced reaction", () => {
    expect(caught(() => reactionEntropy("H2(g) + 0.5 O2(g) -> H2O(g)", { T: 0 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => reactionEntropy("H2(g) + O2(g) -> H2O(g)")).code).toBe("UNBALANCED_REACTION");
  });
});
