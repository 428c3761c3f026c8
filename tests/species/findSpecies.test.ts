import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { findSpecies } from "../../src/species/findSpecies.js";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import { createLibrary } from "../../src/species/createLibrary.js";
import { species } from "../../src/species/species.js";
import { caught } from "../_helpers/caught.js";

const keys = (xs: { key: string }[]): string[] => xs.map((s) => s.key);

describe("findSpecies", () => {
  it("the @example: isomers by formula, a name case-insensitively, an object query, and nothing found", () => {
    expect(keys(findSpecies("C4H10"))).toEqual(["i-C4H10(g)", "n-C4H10(g)"]);
    expect(keys(findSpecies("acetone"))).toEqual(["CH3COCH3(g)", "CH3COCH3(l)"]);
    expect(findSpecies({ formula: "OH2", phase: "l" })[0]!.key).toBe("H2O(l)");
    expect(findSpecies("unobtainium")).toEqual([]);
  });

  it("findSpecies(formula) ignores element order and matches structural formulas by composition", () => {
    expect(keys(findSpecies("C3H6O"))).toEqual(keys(findSpecies("OC3H6")));
    expect(keys(findSpecies("C3H6O"))).toContain("CH3COCH3(g)"); // acetone is written CH3COCH3
    expect(keys(findSpecies("H2O(l)"))).toEqual(["H2O(l)"]);
    expect(keys(findSpecies("ACETONE"))).toEqual(["CH3COCH3(g)", "CH3COCH3(l)"]);
  });

  it("an exact key comes first, then exact names, then formula matches, then partial names", () => {
    expect(findSpecies("CO2(g)")[0]!.key).toBe("CO2(g)");
    const butane = keys(findSpecies("butane"));
    expect(butane[0]).toBe("n-C4H10(g)"); // alias "butane" matches exactly; "isobutane" only contains the text
    expect(butane).toContain("i-C4H10(g)");
    const water = keys(findSpecies("water"));
    expect(water.slice(0, 2).sort()).toEqual(["H2O(g)", "H2O(l)"]);
  });

  it("finds by CAS number (67-64-1 is acetone in the Burcat–Ruscic 2005 database, ANL-05/20)", () => {
    const lib = createLibrary({
      sources: { demo: "Pilot acetone recovery unit data sheet (invented demo scenario)" },
      species: [{
        key: "C3H6O(l)", formula: "C3H6O", phase: "l", name: "demo acetone", cas: "67-64-1",
        hf298KJPerMol: -248, hf298Source: "demo", s298JPerMolK: 200, s298Source: "demo",
        heatCapacity: { source: "demo", ranges: [{ TminK: 280, TmaxK: 320, cp: { form: "constant", cpJPerMolK: 125 } }] },
      }],
    }, { base: null });
    expect(keys(findSpecies("67-64-1", lib))).toEqual(["C3H6O(l)"]);
    expect(keys(findSpecies({ cas: "67-64-1", phase: "l" }, lib))).toEqual(["C3H6O(l)"]);
    expect(findSpecies({ cas: "67-64-1", phase: "g" }, lib)).toEqual([]);
    expect(findSpecies("64-17-5", lib)).toEqual([]);
  });

  it("object queries need every field to match; phase s and cr are one", () => {
    expect(keys(findSpecies({ name: "calcite", phase: "s" }))).toEqual(["CaCO3(cr)"]);
    expect(findSpecies({ formula: "CaCO3", phase: "g" })).toEqual([]);
    expect(findSpecies({ formula: "not a formula!" })).toEqual([]);
  });

  it("bad queries throw INVALID_ARGUMENT", () => {
    expect(caught(() => findSpecies("")).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findSpecies({})).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findSpecies({ name: "" })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findSpecies(42 as unknown as string)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => findSpecies(null as unknown as string)).code).toBe("INVALID_ARGUMENT");
  });

  it("does not change a frozen query object", () => {
    const q = Object.freeze({ formula: "CO2" });
    expect(keys(findSpecies(q))).toEqual(["CO2(g)"]);
  });

  test.prop([fc.constantFrom(...builtInLibrary().keys())])("every built-in key finds itself first, and its formula finds it", (key) => {
    expect(findSpecies(key)[0]!.key).toBe(key);
    const sp = species(key);
    expect(keys(findSpecies({ formula: sp.formula.text }))).toContain(key);
  });
});

describe("UNKNOWN_SPECIES messages point to findSpecies and the database", () => {
  it("a missing key: close keys (same composition first), findSpecies and rxtherm/database", () => {
    const e = caught(() => species("OCH2"));
    expect(e.code).toBe("UNKNOWN_SPECIES");
    expect(e.message).toContain("did you mean CH2O(g)?");
    expect(e.message).toContain("findSpecies");
    expect(e.message).toContain("rxtherm/database");
    expect((e.details as { suggestions: string[] }).suggestions[0]).toBe("CH2O(g)");
  });

});

describe("findSpecies: the library argument", () => {
  it("a library that is not a Library is INVALID_ARGUMENT with details.path, never a TypeError", () => {
    for (const lib of [42, "lib", {}, new Map(), Object.create(null), Symbol("x"), builtInLibrary]) {
      const e = caught(() => findSpecies("CO2", lib as never));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.message).toMatch(/findSpecies requires library to be a Library/);
      expect(e.details.path).toBe("library");
    }
    expect(keys(findSpecies("CO2(g)", undefined))[0]).toBe("CO2(g)");
    expect(keys(findSpecies("CO2(g)", null as never))[0]).toBe("CO2(g)");
  });
});
