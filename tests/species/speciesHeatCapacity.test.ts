import { describe, expect, it } from "vitest";
import { speciesHeatCapacity } from "../../src/species/speciesHeatCapacity.js";
import { species } from "../../src/species/species.js";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import type { Species } from "../../src/species/types.js";

describe("speciesHeatCapacity (private link to a species' compiled model)", () => {
  it("gives the model behind H = ΔfH° + sensible H and Cp of a library species, exactly", () => {
    for (const key of ["N2(g)", "CO2(g)", "H2O(g)", "CH4(g)", "H2O(l)"]) {
      const sp = species(key);
      const m = speciesHeatCapacity(sp)!;
      expect(m).not.toBeNull();
      for (const T of [300, 450.5, 999, 1500, 2500]) {
        if (T < sp.range[0] || T > sp.range[1]) continue;
        expect(sp.hf298 + m.sensibleEnthalpy(T, { extrapolate: true })).toBe(sp.enthalpy(T));
        expect(m.cp(T, { extrapolate: true })).toBe(sp.cp(T));
      }
    }
  });

  it("is null for a species with a phase transition and for an object that is not a library species", () => {
    const withTransition = builtInLibrary().all().find((s) => s.transitions.length > 0)!;
    expect(speciesHeatCapacity(withTransition)).toBeNull();
    const n2 = species("N2(g)");
    expect(speciesHeatCapacity({ ...n2 } as Species)).toBeNull();
    expect(speciesHeatCapacity(new Proxy(n2, {}))).toBeNull();
    expect(speciesHeatCapacity(null as unknown as Species)).toBeNull();
  });
});
