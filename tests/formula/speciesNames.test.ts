import { describe, expect, it } from "vitest";
import { SPECIES_NAMES, speciesByName } from "../../src/formula/speciesNames.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import { WEBBOOK_SHOMATE_SPECIES } from "../../src/species/data/webbookShomate.js";
import { GRI_MECH_30_NASA7_SPECIES } from "../../src/species/data/griMech30Nasa7.js";
import { BURCAT_RUSCIC_2005_SPECIES } from "../../src/species/data/burcatRuscic2005.js";
import { WEBBOOK_CONDENSED_SPECIES } from "../../src/species/data/webbookCondensedShomate.js";
import { JANAF_ROW_FIT_SPECIES } from "../../src/species/data/janafRowFits.js";
import { PUBLISHED_EQUATION_SPECIES } from "../../src/species/data/publishedEquations.js";
import { FORMATION_TABLE_SPECIES } from "../../src/species/data/formationTables.js";

describe("speciesByName and SPECIES_NAMES (the one table of species names)", () => {
  it("the examples", () => {
    expect(SPECIES_NAMES.find((r) => r.name === "propane")!.key).toBe("C3H8(g)");
    expect(speciesByName("methane").map((r) => r.key)).toEqual(["CH4(g)"]);
    expect(speciesByName("water").map((r) => r.key)).toEqual(["H2O(g)", "H2O(l)"]);
    expect(speciesByName("natural gas")).toEqual([]);
  });

  it("reads names case-insensitively, with a phase, and aliases written like keys", () => {
    expect(speciesByName("  Propane ").map((r) => r.key)).toEqual(["C3H8(g)"]);
    expect(speciesByName("ethanol(l)").map((r) => r.key)).toEqual(["C2H5OH(l)"]);
    expect(speciesByName("water(g)").map((r) => r.key)).toEqual(["H2O(g)"]);
    expect(speciesByName("C(gr)").map((r) => r.key)).toEqual(["C(cr)"]);
    expect(speciesByName("graphite(s)").map((r) => r.key)).toEqual(["C(cr)"]);
    expect(speciesByName("butane").map((r) => r.key)).toEqual(["n-C4H10(g)"]);
    expect(speciesByName("CH4")).toEqual([]); // a formula is not a name
    expect(speciesByName("n-C4H10(g)").map((r) => r.key)).toEqual(["n-C4H10(g)"]); // a key names its species
    expect(speciesByName(7 as unknown as string)).toEqual([]);
  });

  it("is frozen, sorted by key, and its formulas and phases match the keys", () => {
    expect(Object.isFrozen(SPECIES_NAMES) && Object.isFrozen(SPECIES_NAMES[0]) && Object.isFrozen(SPECIES_NAMES[0]!.aliases)).toBe(true);
    const keys = SPECIES_NAMES.map((r) => r.key);
    expect(keys).toEqual([...keys].sort());
    expect(new Set(keys).size).toBe(keys.length);
    for (const r of SPECIES_NAMES) expect(r.key.endsWith(`(${r.phase})`), r.key).toBe(true);
  });

  it("the built-in library has exactly these keys, formulas, names and aliases, in every data set", () => {
    const lib = builtInLibrary();
    expect(lib.keys()).toEqual(SPECIES_NAMES.map((r) => r.key));
    for (const r of SPECIES_NAMES) {
      for (const d of lib.datasets(r.key)) {
        const sp = lib.get(r.key, { dataset: d });
        expect(sp.formula.elements, r.key).toEqual(parseFormula(r.formula).elements);
        expect(sp.name, r.key).toBe(r.name);
        expect(sp.aliases, r.key).toEqual(r.aliases);
      }
      for (const n of [r.name, ...r.aliases]) {
        const found = speciesByName(n).map((x) => x.key);
        expect(found, n).toContain(r.key);
        if (found.length === 1) expect(lib.get(n).key, n).toBe(r.key);
      }
    }
  });

  it("no species data file carries a name or alias of its own (single source)", () => {
    const files = [
      WEBBOOK_SHOMATE_SPECIES, GRI_MECH_30_NASA7_SPECIES, BURCAT_RUSCIC_2005_SPECIES, WEBBOOK_CONDENSED_SPECIES,
      JANAF_ROW_FIT_SPECIES, PUBLISHED_EQUATION_SPECIES, FORMATION_TABLE_SPECIES,
    ];
    for (const file of files) for (const e of file) expect("name" in e || "aliases" in e, e.key).toBe(false);
  });
});
