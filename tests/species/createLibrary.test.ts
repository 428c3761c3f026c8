import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { createLibrary } from "../../src/species/createLibrary.js";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import { species } from "../../src/species/species.js";
import Decimal from "decimal.js";
import { RxthermError } from "../../src/errors.js";
import { clone, demoData } from "./helpers.js";

describe("createLibrary", () => {
  it("the @example: a user species from a small JSON, over the built-in set", () => {
    const lib = createLibrary({
      sources: { pilot: "Pilot methanol reactor data sheet (invented demo scenario)" },
      species: [{
        key: "C5H8O2(l)", formula: "C5H8O2", phase: "l", name: "demo solvent",
        hf298KJPerMol: -390, hf298Source: "pilot", s298JPerMolK: 230, s298Source: "pilot",
        heatCapacity: { source: "pilot", ranges: [{ TminK: 280, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 180 } }] },
      }],
    });
    // invented demo numbers: −390 000 J/mol + 180 J/(mol·K) × (350 − 298.15) K
    expect(lib.get("demo solvent").enthalpy(350)).toBeCloseTo(-380667, 6);
    expect(lib.has("CO2(g)")).toBe(true);
    expect(lib.citation("pilot")).toMatch(/invented demo scenario/);
    expect(lib.citation("nist-janaf-1998")).toMatch(/Chase/);
  });

  it("piecewise user data: polynomial then table, continuous enthalpy, exact integral", () => {
    const lib = createLibrary(demoData(), { base: null });
    const oil = lib.get("C12H26(l)");
    // ∫(250 + 0.4 T) dT from 298.15 to 400 K (invented demo polynomial), done by hand
    const h400 = 250 * (400 - 298.15) + 0.2 * (400 ** 2 - 298.15 ** 2);
    expect(oil.enthalpy(400) - oil.hf298).toBeCloseTo(h400, 6);
    // + trapezoid 410 → 450 over 400–500 K
    expect(oil.enthalpy(500) - oil.enthalpy(400)).toBeCloseTo(43000, 6);
    expect(lib.keys()).toEqual(["C12H26(l)", "C5H8O2(l)"]);
  });

  it("user entries win over built-in ones; the built-in entry stays selectable by its data set", () => {
    const d = clone(demoData()) as any;
    d.species = [{ ...d.species[0], key: "CH4(g)", formula: "CH4", phase: "g", name: "methane", hf298KJPerMol: -70 }];
    const lib = createLibrary(d);
    expect(lib.get("CH4(g)").hf298).toBe(-70000);
    expect(lib.get("methane").hf298).toBe(-70000);
    expect(lib.get("CH4(g)", { dataset: "nist-janaf" }).hf298).toBe(-74873.1);
    expect(lib.datasets("CH4(g)")).toEqual(["user", "gri-mech-3.0", "nist-janaf"]);
    // the built-in library itself is unchanged (libraries are immutable values)
    expect(builtInLibrary().get("CH4(g)").hf298).toBe(-74873.1);
    expect(species("CH4(g)").hf298).toBe(-74873.1);
  });

  it("an alternative user entry is selectable but does not replace the default", () => {
    const d = clone(demoData()) as any;
    d.species = [{ ...d.species[0], key: "CH4(g)", formula: "CH4", phase: "g", hf298KJPerMol: -70, dataset: "plant-lab", alternative: true }];
    const lib = createLibrary(d);
    expect(lib.get("CH4(g)").hf298).toBe(-74873.1);
    expect(lib.get("CH4(g)", { dataset: "plant-lab" }).hf298).toBe(-70000);
  });

  it("a rejected file throws INVALID_DATA with every issue and nothing from it enters any library", () => {
    const d = clone(demoData()) as any;
    d.species[1].heatCapacity.ranges[1].TminK = 420; // a gap
    const before = builtInLibrary().keys();
    try {
      createLibrary(d);
      expect.unreachable();
    } catch (e) {
      expect((e as RxthermError).code).toBe("INVALID_DATA");
      expect((e as RxthermError).details["issues"]).toEqual([
        { path: ["species", 1, "heatCapacity", "ranges", 1, "TminK"], message: "gap between ranges: 400 K to 420 K has no data" },
      ]);
    }
    expect(builtInLibrary().keys()).toEqual(before);
    expect(builtInLibrary().has("C5H8O2(l)")).toBe(false); // the valid entry of the rejected file did not enter
    expect(builtInLibrary().has("demo solvent")).toBe(false);
  });

  it("merges over another user library; the base is unchanged", () => {
    const a = createLibrary(demoData(), { base: null });
    const d = clone(demoData()) as any;
    d.species = [{ ...d.species[0], hf298KJPerMol: -400 }];
    const b = createLibrary(d, { base: a });
    expect(b.get("C5H8O2(l)").hf298).toBe(-400000);
    expect(a.get("C5H8O2(l)").hf298).toBe(-390000);
    expect(b.has("C12H26(l)")).toBe(true);
    expect(b.has("CO2(g)")).toBe(false);
  });

  it("does not mutate its input (frozen input accepted)", () => {
    const d = demoData();
    const text = JSON.stringify(d);
    const deepFreeze = (o: any): any => { Object.values(o).forEach((v) => typeof v === "object" && v !== null && deepFreeze(v)); return Object.freeze(o); };
    createLibrary(deepFreeze(d));
    expect(JSON.stringify(d)).toBe(text);
  });

  test.prop([fc.double({ min: -5000, max: 5000, noNaN: true }), fc.double({ min: 300.5, max: 399, noNaN: true })])(
    "for a constant-Cp user species, enthalpy(T) = ΔfH° + Cp·(T − 298.15) exactly up to rounding", (hfKJ, T) => {
      const d = clone(demoData()) as any;
      d.species[0].hf298KJPerMol = hfKJ;
      const sp = createLibrary(d, { base: null }).get("C5H8O2(l)");
      expect(sp.enthalpy(T)).toBeCloseTo(hfKJ * 1000 + 180 * (T - 298.15), 5);
      expect(new Decimal(sp.hf298Exact).equals(new Decimal(String(hfKJ)).times(1000))).toBe(true);
      expect(Number(sp.hf298Exact)).toBe(sp.hf298);
    },
  );
});

describe("README species section", () => {
  it("prints the values shown in the README", () => {
    const co2 = species("CO2(g)");
    // NIST WebBook Shomate fit of CO2 (NIST-JANAF 4th ed. 1998 based); values printed in README.md
    expect(co2.enthalpy(1000).toFixed(1)).toBe("-360120.5");
    expect(co2.cp(1000).toFixed(2)).toBe("54.30"); // NIST-JANAF C-095 lists 54.308 J/(mol·K) at 1000 K (from memory)
    expect(co2.entropy(1000, 5e5).toFixed(2)).toBe("255.93");
    expect(species("CH4", undefined, { dataset: "gri-mech-3.0" }).cp(1500).toFixed(2)).toBe("90.41");
    expect(species("CH4").cp(1500).toFixed(2)).toBe("86.68");
    const lib = createLibrary({
      sources: { "biogas-lab": "Biogas boiler commissioning report, table 3 (invented demo scenario)" },
      species: [{
        key: "C6H10O5(s)", formula: "C6H10O5", phase: "s", name: "digestate solids",
        hf298KJPerMol: -960, hf298Source: "biogas-lab", s298JPerMolK: 240, s298Source: "biogas-lab",
        heatCapacity: { source: "biogas-lab", ranges: [
          { TminK: 280, TmaxK: 450, cp: { form: "polynomial", a: 120, b: 0.35, temperatureUnit: "K", energyUnit: "J" } },
        ] },
      }],
    });
    // invented demo numbers: −960 000 + 120·(400 − 298.15) + 0.175·(400² − 298.15²)
    expect(lib.get("digestate solids").enthalpy(400).toFixed(1)).toBe("-935334.3");
  });
});
