import { describe, expect, it } from "vitest";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import { citation, SOURCES } from "../../src/species/citation.js";
import { RxthermError } from "../../src/errors.js";
import { builtInSpeciesData } from "../../src/species/data/builtInSpeciesData.js";
import { validateSpeciesData } from "../../src/species/validateSpeciesData.js";

describe("builtInLibrary", () => {
  const lib = builtInLibrary();

  it("its data pass validateSpeciesData unchanged (they are trusted at run time, not re-validated)", () => {
    const data = builtInSpeciesData();
    const valid = validateSpeciesData(data);
    expect(valid).toEqual(data); // the schema neither adds nor drops anything: run time can use the data as they are
    expect(lib.keys().length).toBe(new Set(data.species.filter((e) => e.alternative !== true).map((e) => e.key)).size);
  });

  it("the @example: 73 species; methane by name; CH4 in two data sets, JANAF-based first", () => {
    expect(lib.keys().length).toBe(73);
    expect(lib.get("methane").key).toBe("CH4(g)");
    expect(lib.datasets("CH4(g)")).toEqual(["nist-janaf", "gri-mech-3.0"]);
  });

  it("holds at least 60 species, gases and condensed phases, water in both phases", () => {
    const all = lib.all();
    expect(all.length).toBeGreaterThanOrEqual(60);
    expect(all.filter((s) => s.phase === "g").length).toBeGreaterThan(20);
    expect(all.filter((s) => s.phase === "l").length).toBeGreaterThan(10);
    expect(all.filter((s) => s.phase === "cr").length).toBeGreaterThan(10);
    for (const k of ["H2O(l)", "H2O(g)", "C(gr)", "n-C8H18(l)", "CaCO3(cr)", "SiO2(cr)", "H2SO4(l)", "HCN(g)"]) expect(lib.has(k), k).toBe(true);
  });

  it("every value of every entry (defaults and variants) has a source id that resolves to a citation", () => {
    let n = 0;
    for (const key of lib.keys()) {
      for (const ds of lib.datasets(key)) {
        const sp = lib.get(key, { dataset: ds });
        for (const field of ["hf298", "s298", "cp"]) expect(sp.sources[field], `${key} ${ds} ${field}`).toBeTypeOf("string");
        for (const [field, id] of Object.entries(sp.sources)) {
          expect(citation(id).length, `${key} ${field}`).toBeGreaterThan(10);
          expect(lib.citation(id)).toBe(citation(id));
          n++;
        }
        for (const t of sp.transitions) expect(citation(t.source).length).toBeGreaterThan(10);
      }
    }
    expect(n).toBeGreaterThan(3 * 73);
  });

  it("is created once and shared (an immutable value)", () => {
    expect(builtInLibrary()).toBe(lib);
    expect(Object.isFrozen(lib.get("N2(g)"))).toBe(true);
    expect(() => { (lib.get("N2(g)") as any).hf298 = 5; }).toThrow(TypeError);
  });
});

describe("citation", () => {
  it("the @example: the CODATA Key Values citation", () => {
    expect(citation("codata-1989")).toBe("J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, Hemisphere Publishing, New York (1989).");
    expect(SOURCES["codata-1989"]).toBe(citation("codata-1989"));
  });

  it("knows memory and common practice", () => {
    expect(citation("memory")).toMatch(/from memory/i);
    expect(citation("common practice")).toMatch(/fact of the trade/);
  });

  it("throws INVALID_ARGUMENT for an unknown id, listing the known ones", () => {
    try {
      citation("nope");
      expect.unreachable();
    } catch (e) {
      expect((e as RxthermError).code).toBe("INVALID_ARGUMENT");
      expect((e as RxthermError).details["known"]).toContain("nist-janaf-1998");
    }
    expect(() => citation("__proto__")).toThrow(RxthermError);
    expect(() => citation("toString")).toThrow(RxthermError);
  });
});
