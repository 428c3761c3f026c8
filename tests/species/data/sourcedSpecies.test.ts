import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { BURCAT_RUSCIC_2005_SPECIES } from "../../../src/species/data/burcatRuscic2005.js";
import { WEBBOOK_CONDENSED_SPECIES } from "../../../src/species/data/webbookCondensedShomate.js";
import { JANAF_ROW_FIT_SPECIES } from "../../../src/species/data/janafRowFits.js";
import { PUBLISHED_EQUATION_SPECIES } from "../../../src/species/data/publishedEquations.js";
import { FORMATION_TABLE_SPECIES } from "../../../src/species/data/formationTables.js";
import { builtInLibrary } from "../../../src/species/builtInLibrary.js";
import { GAS_CONSTANT_J_PER_MOL_K as R } from "../../../src/units.js";
import { janafDeviation, janafTables } from "../../../docs/data-quality/speciesDataQuality.js";

// Reference files copied into tests/fixtures/ (each names its published source):
// species-burcat-ruscic-2005.json — Burcat and Ruscic, ANL-05/20 / TAE 960 (2005), NASA-7 records as published;
// species-webbook-condensed.json — NIST Chemistry WebBook Shomate fits of NIST-JANAF tables (Chase 1998);
// janaf-condensed.json — NIST-JANAF 4th ed. (1998) rows of condensed phases;
// species-equations.json — Jacobs, Kerrick and Krupka (1981) calcite; Robie, Russell-Robinson and Hemingway (1989)
// anhydrite; Perry's Chemical Engineers' Handbook 8th ed. Table 2-153 liquids; NIST WebBook urea.
const fixture = (name: string): any => JSON.parse(readFileSync(new URL(`../../fixtures/${name}`, import.meta.url), "utf8"));
const burcat = fixture("species-burcat-ruscic-2005.json").species as Record<string, any>;
const webbook = fixture("species-webbook-condensed.json").species as Record<string, any>;
const equations = fixture("species-equations.json").species as Record<string, any>;

const n7h = (a: readonly number[], T: number) => R * T * (a[0]! + (a[1]! * T) / 2 + (a[2]! * T ** 2) / 3 + (a[3]! * T ** 3) / 4 + (a[4]! * T ** 4) / 5 + a[5]! / T);
const n7s = (a: readonly number[], T: number) => R * (a[0]! * Math.log(T) + a[1]! * T + (a[2]! * T ** 2) / 2 + (a[3]! * T ** 3) / 3 + (a[4]! * T ** 4) / 4 + a[6]!);
const round3 = (x: number) => Math.round(x * 1000) / 1000;

describe("built-in species against the reference files they came from", () => {
  it("Burcat–Ruscic 2005 entries copy every NASA-7 record exactly, with ΔfH°, S° and transitions from the polynomials", () => {
    expect(Object.keys(burcat).sort()).toEqual(BURCAT_RUSCIC_2005_SPECIES.map((e) => e.key).sort());
    for (const e of BURCAT_RUSCIC_2005_SPECIES) {
      const ref = burcat[e.key];
      const cap: number | undefined = ref.tmax_cap_K;
      // expected ranges: each record's low set to 1000 K and high set above it, cut at the documented cap
      const expected: { TminK: number; TmaxK: number; cp: { form: string; a: number[] } }[] = [];
      for (const r of ref.records) {
        if (r.Tlow_K < r.Tmid_K) expected.push({ TminK: r.Tlow_K, TmaxK: Math.min(r.Tmid_K, r.Thigh_K), cp: { form: "nasa7", a: r.low } });
        if (r.Thigh_K > r.Tmid_K) expected.push({ TminK: Math.max(r.Tlow_K, r.Tmid_K), TmaxK: r.Thigh_K, cp: { form: "nasa7", a: r.high } });
      }
      const capped = cap === undefined ? expected : expected.filter((x) => x.TminK < cap).map((x) => ({ ...x, TmaxK: Math.min(x.TmaxK, cap) }));
      if (ref.lead !== undefined) {
        // Fe(cr): the first WebBook Shomate range up to `until_K`, then the records from there (see the entry's note)
        const { range: w, until_K: until } = ref.lead;
        const rest = capped.filter((x) => x.TmaxK > until).map((x) => ({ ...x, TminK: Math.max(x.TminK, until) }));
        const lead = { TminK: w.Tmin_K, TmaxK: until, cp: { form: "shomate", A: w.A, B: w.B, C: w.C, D: w.D, E: w.E, F: w.F, G: w.G, H: w.H }, source: "nist-webbook" };
        expect(e.heatCapacity.ranges, e.key).toEqual([lead, ...rest]);
        expect([e.hf298KJPerMol, e.hf298Source]).toEqual([0, "common practice"]);
        expect(e.s298JPerMolK).toBeCloseTo(27.321, 2); // NIST-JANAF Fe-004 S°(298.15 K)
        continue;
      }
      expect(e.heatCapacity.ranges, e.key).toEqual(capped);
      const a298 = capped.find((x) => x.TminK <= 298.15 && 298.15 <= x.TmaxK)?.cp.a ?? capped[0]!.cp.a;
      if (ref.hf298_override !== undefined) {
        // NIST-JANAF ΔfH° preferred over the record's (CH2O: C-061; CH3Cl: C-063), named in the entry
        expect([e.hf298KJPerMol, e.hf298Source]).toEqual(ref.hf298_override);
      } else {
        expect(e.hf298KJPerMol, e.key).toBe(round3(n7h(a298, 298.15) / 1000));
      }
      expect(e.s298JPerMolK, e.key).toBe(round3(n7s(a298, 298.15)));
      // species-extended.json prints ΔfH° from the polynomial: the same digits
      for (const r of ref.records) if (r.file === "species-extended.json" && r.selfcheck?.H_298_from_polynomial_kJ_per_mol !== undefined && ref.hf298_override === undefined) {
        expect(e.hf298KJPerMol, e.key).toBeCloseTo(r.selfcheck.H_298_from_polynomial_kJ_per_mol, 3);
      }
      // transitions: the H step between consecutive records at their common temperature
      for (const t of e.transitions ?? []) {
        const below = capped.filter((x) => x.TmaxK === t.TK).at(-1)!.cp.a;
        const above = capped.find((x) => x.TminK === t.TK)!.cp.a;
        expect(t.dHKJPerMol, `${e.key} ${t.TK}`).toBeCloseTo((n7h(above, t.TK) - n7h(below, t.TK)) / 1000, 5);
      }
    }
  });

  it("Burcat–Ruscic 2005 records used are clean (the database import self-check says ok)", () => {
    for (const [key, ref] of Object.entries(burcat)) {
      for (const r of ref.records) if (r.file === "burcat-2005.json") expect(r.selfcheck, `${key} ${r.label}`).toBe("ok");
    }
  });

  it("WebBook condensed Shomate entries copy every range exactly (A–H, limits; ΔfH° = H)", () => {
    expect(Object.keys(webbook).sort()).toEqual(WEBBOOK_CONDENSED_SPECIES.map((e) => e.key).sort());
    for (const e of WEBBOOK_CONDENSED_SPECIES) {
      const ref = webbook[e.key];
      expect(e.heatCapacity.ranges.length).toBe(ref.ranges.length);
      ref.ranges.forEach((rr: any, i: number) => {
        const r = e.heatCapacity.ranges[i]!;
        expect([r.TminK, r.TmaxK]).toEqual([rr.Tmin_K, rr.Tmax_K]);
        for (const c of ["A", "B", "C", "D", "E", "F", "G", "H"]) expect((r.cp as any)[c], `${e.key} ${c}`).toBe(rr[c]);
      });
      expect(e.hf298KJPerMol).toBe(ref.ranges[0].H);
      // S° from the first range's G constant at 298.15 K, within 0.03 J/(mol·K) of the reference self-check value
      expect(Math.abs(e.s298JPerMolK - ref.selfcheck.S_298_J_per_molK)).toBeLessThan(0.03);
    }
  });

  it("fits of NIST-JANAF rows reproduce every row within 0.3 % in Cp and 0.1 kJ/mol in H − H298", () => {
    const tables = new Map(janafTables().map((t) => [t.key, t]));
    const lib = builtInLibrary();
    for (const e of JANAF_ROW_FIT_SPECIES) {
      const d = janafDeviation(lib.get(e.key), tables.get(e.key)!); // NIST-JANAF 4th ed. 1998 rows (janaf-condensed.json)
      expect(d.outside, e.key).toBe(0);
      expect(Math.abs(d.worstCpPct), e.key).toBeLessThanOrEqual(0.3);
      expect(Math.abs(d.worstHKJ), e.key).toBeLessThanOrEqual(0.1);
      expect(e.hf298Source).toBe("nist-janaf-1998");
    }
    // the transitions carry the tabulated jumps: NIST-JANAF C-090 Na2CO3 I-II at 723.15 K, 63.214 − 62.524 kJ/mol
    const [tr] = lib.get("Na2CO3(cr)").transitions;
    expect(tr!.TK).toBe(723.15);
    expect(tr!.dHJPerMol).toBeCloseTo(690, 6);
  });

  it("every built-in species with NIST-JANAF rows in the project is within Cp 0.5 % and H − H298 0.3 kJ/mol (or 0.5 %)", () => {
    const lib = builtInLibrary();
    const checked: string[] = [];
    for (const t of janafTables()) {
      if (!lib.has(t.key)) continue;
      const sp = lib.get(t.key);
      if (t.key === "Fe(cr)") {
        // NIST-JANAF Fe-003: the Burcat–Ruscic polynomials smooth the Cp peak at the Curie point (1042 K);
        // documented in the entry's note and on the data-quality page. H − H298 is checked at every row,
        // Cp at every row but the one beside the Curie point.
        const d = janafDeviation(sp, { ...t, rows: t.rows.map((r) => (r.T === 1000 ? { ...r, Cp: null } : r)) });
        expect(d.within, "Fe(cr)").toBe(true);
        expect(janafDeviation(sp, t).worstCpAtK).toBe(1000);
      } else {
        const d = janafDeviation(sp, t);
        expect(d.within, `${t.key}: Cp ${d.worstCpPct} % at ${d.worstCpAtK} K, H ${d.worstHKJ} kJ/mol at ${d.worstHAtK} K`).toBe(true);
      }
      checked.push(t.key);
    }
    expect(checked.length).toBe(26); // 8 gases of janaf.json, 13 tables of janaf-extended.json (3 repeated), 8 condensed tables
  });

  it("published-equation entries reproduce their equations: polynomials exactly, refitted forms within 0.01 %", () => {
    const lib = builtInLibrary();
    for (const e of PUBLISHED_EQUATION_SPECIES) {
      const ref = equations[e.key];
      expect(ref, e.key).toBeDefined();
      const sp = lib.get(e.key);
      const [lo, hi] = ref.T_range_K ?? ref.data.T_range_K;
      let published: (T: number) => number;
      if (ref.form === "usgs_5term") {
        const c = ref.data.coefficients;
        published = (T) => c.a + c.b * T + c.c_T_minus2 / T ** 2 + c.d_T_minus_half / Math.sqrt(T) + c.e_T2 * T ** 2;
      } else {
        const c = ref.coefficients_SI;
        published = (T) => [c.a0, c.a1, c.a2, c.a3, c.a4].reduce((s: number, x: number | undefined, k: number) => s + (x ?? 0) * T ** k, 0);
      }
      // as published: exact up to float rounding (CS2(l) is written as a NASA-7 Cp/R polynomial: the
      // division by R rounds at 1e-11); refitted USGS-form equations within 0.01 %
      const tol = ref.form === "usgs_5term" ? 1e-4 : 1e-10;
      for (let i = 0; i <= 50; i++) {
        const T = Math.max(lo, sp.range[0]) + ((Math.min(hi, sp.range[1]) - Math.max(lo, sp.range[0])) * i) / 50;
        expect(Math.abs(sp.cp(T) / published(T) - 1), `${e.key} at ${T} K`).toBeLessThan(tol);
      }
      if (ref.dfH298_kJ_per_mol !== undefined) expect(e.hf298KJPerMol).toBe(ref.dfH298_kJ_per_mol);
      if (ref.S298_J_per_mol_K !== undefined) expect(e.s298JPerMolK).toBe(ref.S298_J_per_mol_K);
    }
  });

  it("values with no source found are marked memory and confined to condensed phases (at most two entries wholly from memory)", () => {
    const lib = builtInLibrary();
    const withMemory = lib.all().filter((s) => Object.values(s.sources).includes("memory"));
    expect(withMemory.filter((s) => s.phase === "g")).toEqual([]);
    const wholly = withMemory.filter((s) => s.sources["hf298"] === "memory" && s.sources["s298"] === "memory" && s.sources["cp"] === "memory");
    expect(wholly.map((s) => s.key).sort()).toEqual(FORMATION_TABLE_SPECIES.map((e) => e.key).sort());
    expect(wholly.length).toBeLessThanOrEqual(2);
    // every gas has a temperature-dependent Cp reaching at least 1500 K
    for (const s of lib.all().filter((x) => x.phase === "g")) expect(s.range[1], s.key).toBeGreaterThanOrEqual(1500);
  });
});
