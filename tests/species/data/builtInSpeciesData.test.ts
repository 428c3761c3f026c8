import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { builtInSpeciesData } from "../../../src/species/data/builtInSpeciesData.js";
import { validateSpeciesData } from "../../../src/species/validateSpeciesData.js";
import { SOURCES } from "../../../src/species/citation.js";

// The project's reference files (tests/fixtures/species-shomate.json: NIST Chemistry WebBook Shomate
// coefficients from NIST-JANAF 4th ed. 1998; tests/fixtures/species-nasa7.json: GRI-Mech 3.0 thermo30.dat).
const shomate = JSON.parse(readFileSync(new URL("../../fixtures/species-shomate.json", import.meta.url), "utf8")) as {
  species: Record<string, { dHf298_kJ_per_mol: number; S298_J_per_molK?: number; ranges: Record<string, number>[] }>;
};
const nasa7 = JSON.parse(readFileSync(new URL("../../fixtures/species-nasa7.json", import.meta.url), "utf8")) as {
  species: Record<string, { Tlow_K: number; Tmid_K: number; Thigh_K: number; low: number[]; high: number[] }>;
};
const data = builtInSpeciesData();
const entry = (key: string, dataset: string) => data.species.find((e) => e.key === key && e.dataset === dataset);

describe("builtInSpeciesData", () => {
  it("passes its own validation", () => {
    expect(validateSpeciesData(data).species.length).toBe(data.species.length);
  });

  it("holds every species of the WebBook Shomate reference file, digits copied exactly", () => {
    const names = Object.keys(shomate.species);
    expect(names.length).toBe(27);
    for (const name of names) {
      const ref = shomate.species[name]!;
      const key = name === "H2O(l)" ? "H2O(l)" : data.species.find((e) => e.dataset === "nist-janaf" && e.formula === name)!.key;
      const e = entry(key, "nist-janaf")!;
      expect(e, name).toBeDefined();
      expect(e.hf298KJPerMol).toBe(ref.dHf298_kJ_per_mol);
      if (ref.S298_J_per_molK !== undefined) expect(e.s298JPerMolK).toBe(ref.S298_J_per_molK);
      const ranges = e.heatCapacity.ranges.filter((r) => r.cp.form === "shomate");
      // Fe2O3 holds all three WebBook ranges (tests/fixtures/species-webbook-condensed.json); this file has the first
      expect(ranges.length).toBe(name === "Fe2O3" ? 3 : ref.ranges.length);
      ref.ranges.forEach((rr, i) => {
        const r = ranges[i]!;
        for (const c of ["A", "B", "C", "D", "E", "F", "G", "H"]) expect((r.cp as Record<string, unknown>)[c], `${name} ${c}`).toBe(rr[c]);
        expect(r.TmaxK).toBe(rr["Tmax_K"]);
        // the one documented change: H2O(g)'s first range is read from 298 K instead of 500 K
        expect(r.TminK).toBe(name === "H2O" && i === 0 ? 298 : rr["Tmin_K"]);
      });
    }
  });

  it("holds every species of the GRI-Mech 3.0 reference file, digits copied exactly; alternatives where the Shomate set has the species", () => {
    const names = Object.keys(nasa7.species);
    expect(names.length).toBe(21);
    for (const name of names) {
      const ref = nasa7.species[name]!;
      const e = entry(`${name}(g)`, "gri-mech-3.0")!;
      expect(e, name).toBeDefined();
      const [lo, hi] = e.heatCapacity.ranges;
      expect(lo!.cp).toEqual({ form: "nasa7", a: ref.low });
      expect(hi!.cp).toEqual({ form: "nasa7", a: ref.high });
      expect([lo!.TminK, lo!.TmaxK, hi!.TmaxK]).toEqual([ref.Tlow_K, ref.Tmid_K, ref.Thigh_K]);
      // an alternative wherever another set has the species (WebBook Shomate; Burcat–Ruscic 2005 for O and CH3OH)
      const hasOther = data.species.some((x) => x.key === `${name}(g)` && x.dataset !== "gri-mech-3.0");
      // except ethylene: the WebBook set stops at 1200 K, GRI-Mech 3.0 reaches 3500 K and is the default
      expect(e.alternative === true, name).toBe(hasOther && name !== "C2H4");
    }
  });

  it("marks every value with a source id from the registry; memory values say so", () => {
    for (const e of data.species) {
      for (const id of [e.hf298Source, e.s298Source, e.heatCapacity.source, ...e.heatCapacity.ranges.map((r) => r.source ?? e.heatCapacity.source)]) {
        expect(Object.prototype.hasOwnProperty.call(SOURCES, id), `${e.key}: ${id}`).toBe(true);
      }
      if (e.dataset === "memory") expect([e.hf298Source, e.s298Source]).not.toContain("nist-webbook");
    }
  });

  it("is plain data: calling it twice gives equal, independent objects", () => {
    const a = builtInSpeciesData(), b = builtInSpeciesData();
    expect(a).toEqual(b);
    expect(a.species).not.toBe(b.species);
  });
});
