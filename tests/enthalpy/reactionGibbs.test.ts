import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { reactionGibbs } from "../../src/enthalpy/reactionGibbs.js";
import { reactionEnthalpy } from "../../src/enthalpy/reactionEnthalpy.js";
import { reactionEntropy } from "../../src/enthalpy/reactionEntropy.js";
import { caught, janafRow } from "./_helpers.js";

describe("reactionGibbs", () => {
  it("reactionGibbs(H2 + ½O2 → H2O(g)) matches NIST-JANAF ΔfG° at 298.15 K and 1500 K", () => {
    const v = reactionGibbs("H2(g) + 0.5 O2(g) -> H2O(g)");
    expect(Math.round(v * 10) / 10).toBe(-228582.7); // the @example value
    // NIST-JANAF 4th ed. 1998, table H-064: ΔfG° = −228.582 kJ/mol (298.15 K), −164.376 kJ/mol (1500 K)
    expect(Math.abs(v - janafRow("H2O(g)", 298.15).dfG! * 1000)).toBeLessThan(5);
    expect(Math.abs(reactionGibbs("H2(g) + 0.5 O2(g) -> H2O(g)", { T: 1500 }) - janafRow("H2O(g)", 1500).dfG! * 1000)).toBeLessThan(100);
  });

  test.prop([fc.double({ min: 300, max: 3000, noNaN: true })])("reactionGibbs = ΔH − T·ΔS at any T", (T) => {
    const text = "CO(g) + H2O(g) -> CO2(g) + H2(g)";
    const g = reactionGibbs(text, { T });
    const expected = reactionEnthalpy(text, { T }).value - T * reactionEntropy(text, { T });
    expect(Math.abs(g - expected)).toBeLessThan(1e-9 * (1 + Math.abs(expected)));
  });

  it("reactionGibbs rejects a bad temperature", () => {
    expect(caught(() => reactionGibbs("H2(g) + 0.5 O2(g) -> H2O(g)", { T: -1 })).code).toBe("INVALID_ARGUMENT");
  });
});
