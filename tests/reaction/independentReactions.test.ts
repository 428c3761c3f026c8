import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { independentReactions } from "../../src/reaction/independentReactions.js";
import { checkBalance } from "../../src/reaction/checkBalance.js";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { matrixRank } from "../../src/numeric/linearAlgebra.js";
import { gcdBigInt } from "../../src/numeric/rational.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { errorOf } from "./helpers.js";

describe("independentReactions", () => {
  it("documented example: syngas species give water-gas shift and methanation (common practice)", () => {
    expect(independentReactions(["CO", "H2", "H2O", "CO2", "CH4"]).map((r) => formatReaction(r))).toEqual([
      "CO + H2O -> H2 + CO2",
      "CO + 3 H2 -> H2O + CH4",
    ]);
  });
  it("steam reforming species: 5 species, 3 elements → 2 reactions (Gibbs stoichiometry rule — common practice)", () => {
    const rs = independentReactions(["CH4", "H2O", "CO", "CO2", "H2"]);
    expect(rs).toHaveLength(2);
    for (const r of rs) expect(checkBalance(r).balanced).toBe(true);
  });
  it("counts a charge row: H2O, H+, OH- have one reaction, the self-ionisation of water (common practice)", () => {
    expect(independentReactions(["H2O", "H+", "OH-"]).map((r) => formatReaction(r))).toEqual(["H2O -> H+ + OH-"]);
  });
  it("returns no reaction when the species are independent", () => {
    expect(independentReactions(["H2", "O2", "N2"])).toEqual([]);
  });
  it("errors: empty list, repeated species, bad formula", () => {
    expect(errorOf(() => independentReactions([])).code).toBe("INVALID_ARGUMENT");
    const e = errorOf(() => independentReactions(["H2", "H2"]));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ species: "H2", index: 1 });
    const f = errorOf(() => independentReactions(["H2", "Qq"]));
    expect(f.code).toBe("UNKNOWN_ELEMENT");
    expect(f.details).toMatchObject({ index: 1, species: "Qq" });
  });
  const arbSpecies = fc.uniqueArray(
    fc.constantFrom("CH4", "C2H6", "C2H4", "C3H8", "CO", "CO2", "H2", "H2O", "O2", "N2", "NH3", "NO", "NO2", "N2O", "CH3OH", "HCHO", "HCOOH", "C", "O3", "H2O2", "HCN", "H+", "OH-", "NO3-", "NH4+"),
    { minLength: 1, maxLength: 14 },
  );
  test.prop([arbSpecies])("count = species − rank(elements + charge); each is balanced with coprime integers; together independent", (species) => {
    const fs = species.map(parseFormula);
    const els = [...new Set(fs.flatMap((f) => Object.keys(f.elements)))];
    const rows = els.map((el) => fs.map((f) => f.elements[el] ?? 0));
    rows.push(fs.map((f) => f.charge));
    const rs = independentReactions(species);
    expect(rs.length).toBe(species.length - matrixRank(rows));
    for (const r of rs) {
      expect(checkBalance(r).balanced).toBe(true);
      const coeffs = [...r.reactants, ...r.products].map((t) => BigInt(t.exact));
      expect(coeffs.every((c) => c > 0n)).toBe(true);
      expect(coeffs.reduce((a, b) => gcdBigInt(a, b), 0n)).toBe(1n);
    }
    // stoichiometric matrix (reactions × species) has full row rank
    const nu = rs.map((r) => species.map((s) => {
      const p = r.products.find((t) => t.species === s);
      const q = r.reactants.find((t) => t.species === s);
      return p ? p.coefficient : q ? -q.coefficient : 0;
    }));
    if (nu.length) expect(matrixRank(nu)).toBe(nu.length);
  });
});
