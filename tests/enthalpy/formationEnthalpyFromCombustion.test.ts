import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { formationEnthalpyFromCombustion } from "../../src/enthalpy/formationEnthalpyFromCombustion.js";
import { heatingValue } from "../../src/enthalpy/heatingValue.js";
import { species } from "../../src/species/species.js";
import { caught } from "./_helpers.js";

describe("formationEnthalpyFromCombustion", () => {
  it("formationEnthalpyFromCombustion(CH4) inverts the heat of combustion (the documented example)", () => {
    expect(formationEnthalpyFromCombustion("CH4(g)", -890310.1)).toBe(-74873.1);
  });

  it("formationEnthalpyFromCombustion(glucose) from its published heat of combustion", () => {
    // NIST Chemistry WebBook, α-D-glucose (from memory): ΔcH°solid = −2803 kJ/mol, ΔfH°solid = −1274 kJ/mol (±2)
    const hf = formationEnthalpyFromCombustion("C6H12O6(cr)", -2803000);
    expect(Math.abs(hf - -1274000)).toBeLessThan(3000);
  });

  test.prop([fc.constantFrom("CH4(g)", "C2H6(g)", "C3H8(g)", "NH3(g)", "H2S(g)", "CO(g)", "C2H4(g)")])(
    "formationEnthalpyFromCombustion(heatingValue) returns the tabulated ΔfH°", (key) => {
      const hf = formationEnthalpyFromCombustion(key.replace(/^[a-z]-/, ""), -heatingValue(key));
      expect(hf).toBeCloseTo(species(key).hf298, 6);
    },
  );

  it("formationEnthalpyFromCombustion rejects foreign elements, inert species and bad numbers", () => {
    const e = caught(() => formationEnthalpyFromCombustion("CH3Cl(g)", -764000));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toMatchObject({ element: "Cl" });
    expect(caught(() => formationEnthalpyFromCombustion("N2(g)", -1)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => formationEnthalpyFromCombustion("CH4(g)", Number.POSITIVE_INFINITY)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => formationEnthalpyFromCombustion("CH4(g)", -1, { water: "x" as never })).code).toBe("INVALID_ARGUMENT");
  });
});
