import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { MAX_REACTION_COEFFICIENT, MAX_REACTION_LENGTH, parseReaction } from "../../src/reaction/parseReaction.js";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { RxthermError } from "../../src/errors.js";
import { errorOf } from "./helpers.js";

const species = (text: string) => {
  const r = parseReaction(text);
  return [r.reactants.map((t) => `${t.exact} ${t.species}`), r.products.map((t) => `${t.exact} ${t.species}`)];
};

describe("parseReaction", () => {
  it("documented examples", () => {
    // propane combustion C3H8 + 5 O2 -> 3 CO2 + 4 H2O — common practice
    expect(parseReaction("C3H8 + 5 O2 -> 3 CO2 + 4 H2O").products[1]?.coefficient).toBe(4);
    // permanganate half-reaction, CRC Handbook Electrochemical Series — from memory
    expect(parseReaction("MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O").reactants.map((t) => t.species)).toEqual(["MnO4-", "H+", "e-"]);
    expect(parseReaction("C2H6 + 7/2 O2 = 2 CO2 + 3 H2O").reactants[1]?.exact).toBe("7/2");
  });
  it("documented limits", () => {
    expect(MAX_REACTION_LENGTH).toBe(4096);
    expect(MAX_REACTION_COEFFICIENT).toBe(1e9);
  });
  it("accepts every separator: ->, →, =, <=>, ⇌", () => {
    for (const arrow of ["->", "→", "=", "<=>", "⇌"]) {
      expect(species(`2 H2 + O2 ${arrow} 2 H2O`), arrow).toEqual([["2 H2", "1 O2"], ["2 H2O"]]);
    }
    expect(species("2H2+O2->2H2O")).toEqual([["2 H2", "1 O2"], ["2 H2O"]]);
  });
  it("reads integer, decimal and fraction coefficients exactly, spaced or glued", () => {
    expect(species("6.5 O2 + C4H10 -> 4 CO2 + 5 H2O")[0]).toEqual(["13/2 O2", "1 C4H10"]);
    expect(species("1/2O2 + H2 -> H2O")[0]).toEqual(["1/2 O2", "1 H2"]);
    expect(species("13 / 2 O2 + C4H10 -> 4CO2 + 5H2O")).toEqual([["13/2 O2", "1 C4H10"], ["4 CO2", "5 H2O"]]);
    expect(parseReaction("0.1 H2 + 0.05 O2 -> 0.1 H2O").reactants[0]?.exact).toBe("1/10");
    expect(species("2e- + Cu2+ -> Cu")[0]).toEqual(["2 e-", "1 Cu2+"]);
  });
  it("tells charge signs from term separators", () => {
    const r = parseReaction("Na+ + Cl- -> NaCl(s)");
    expect(r.reactants.map((t) => [t.species, t.formula.charge])).toEqual([["Na+", 1], ["Cl-", -1]]);
    expect(r.products[0]?.formula.phase).toBe("s");
    expect(parseReaction("Fe3+ + e- -> Fe2+").reactants.map((t) => t.formula.charge)).toEqual([3, -1]);
    expect(parseReaction("Na++Cl-=NaCl").reactants.map((t) => t.species)).toEqual(["Na+", "Cl-"]);
    expect(parseReaction("NH4+(aq) + OH-(aq) ⇌ NH3(aq) + H2O(l)").reactants.map((t) => [t.species, t.formula.charge])).toEqual([
      ["NH4+(aq)", 1],
      ["OH-(aq)", -1],
    ]);
    expect(parseReaction("Fe^+3 + e- -> Fe^{2+}").reactants[0]?.formula.charge).toBe(3);
    expect(parseReaction("Fe^{3+} + e- -> Fe^{2+}").reactants[0]?.formula.charge).toBe(3);
    const ions = parseReaction("MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O");
    expect(ions.reactants.map((t) => t.formula.charge)).toEqual([-1, 1, -1]);
    expect(ions.products.map((t) => t.formula.charge)).toEqual([2, 0]);
  });
  it("reads sign-then-number charges (Fe+2) when the separators are spaced", () => {
    const r = parseReaction("MnO4- + Fe+2 + H+ -> Mn+2 + Fe+3 + H2O");
    expect(r.reactants.map((t) => [t.species, t.formula.charge])).toEqual([["MnO4-", -1], ["Fe+2", 2], ["H+", 1]]);
    expect(r.products.map((t) => [t.species, t.formula.charge])).toEqual([["Mn+2", 2], ["Fe+3", 3], ["H2O", 0]]);
    expect(r.products[0]!.formula.charge).toBe(2); // @example
    expect(parseReaction("Fe+3 + e- -> Fe+2").products[0]!.formula.charge).toBe(2);
    expect(parseReaction("Mn+2(aq) + 2 e- -> Mn(s)").reactants[0]!.formula.charge).toBe(2);
    // unspaced separators keep their meaning: "+2O2" is a term with coefficient 2
    expect(species("H2+2O2 -> H2O2")[0]).toEqual(["1 H2", "2 O2"]);
  });
  it("hints at Fe2+ when a glued +digits was read as a separator and leaves a bare number", () => {
    const e = errorOf(() => parseReaction("Fe+2+e- -> Fe+"));
    expect(e.code).toBe("INVALID_REACTION");
    expect(e.details.reason).toBe("coefficient without a species");
    expect(e.details.hint).toContain("Fe2+");
    expect(e.message).toContain("Fe2+");
  });
  it("keeps a species written on both sides (a catalyst) as written", () => {
    expect(species("NO + O3 + NO2 -> NO2 + O2 + NO")[1]).toEqual(["1 NO2", "1 O2", "1 NO"]);
  });
  it("returns frozen results", () => {
    const r = parseReaction("H2 + Cl2 -> 2 HCl");
    expect(Object.isFrozen(r)).toBe(true);
    expect(Object.isFrozen(r.reactants)).toBe(true);
    expect(Object.isFrozen(r.products[0])).toBe(true);
  });

  describe("errors", () => {
    it("EMPTY_INPUT and INPUT_TOO_LONG", () => {
      expect(errorOf(() => parseReaction("   ")).code).toBe("EMPTY_INPUT");
      expect(errorOf(() => parseReaction(7 as never)).details).toEqual({ type: "number" });
      const e = errorOf(() => parseReaction(`${"H2 + ".repeat(1000)}O2 -> H2O`));
      expect(e.code).toBe("INPUT_TOO_LONG");
      expect(e.details).toEqual({ length: 5009, limit: MAX_REACTION_LENGTH });
    });
    it("INVALID_REACTION: no separator, two separators, empty side, empty term, coefficient alone", () => {
      expect(errorOf(() => parseReaction("H2 + O2")).details).toEqual({ column: 7, reason: "no separator" });
      expect(errorOf(() => parseReaction("A -> B -> C")).details).toEqual({ column: 7, reason: "more than one separator" });
      expect(errorOf(() => parseReaction("H2 <=> H + H = H2")).details).toEqual({ column: 13, reason: "more than one separator" });
      expect(errorOf(() => parseReaction(" -> H2O")).details).toEqual({ column: 0, reason: "empty reactants side" });
      expect(errorOf(() => parseReaction("H2O ->  ")).details).toEqual({ column: 6, reason: "empty products side" });
      expect(errorOf(() => parseReaction("H2 + + O2 -> H2O")).details).toEqual({ column: 5, reason: "empty term" });
      expect(errorOf(() => parseReaction("H2 + 2 -> H2O")).details).toEqual({ column: 5, reason: "coefficient without a species" });
      for (const t of ["H2 + O2", "A -> B -> C", " -> H2O", "H2 + + O2 -> H2O"]) expect(errorOf(() => parseReaction(t)).code).toBe("INVALID_REACTION");
    });
    it("INVALID_COUNT for a zero coefficient and COUNT_TOO_LARGE above the limit", () => {
      const e = errorOf(() => parseReaction("H2 + 0 O2 -> H2O"));
      expect(e.code).toBe("INVALID_COUNT");
      expect(e.details).toEqual({ column: 5, coefficient: "0" });
      expect(errorOf(() => parseReaction("H2 + 0/3 O2 -> H2O")).code).toBe("INVALID_COUNT");
      expect(errorOf(() => parseReaction("H2 + 2/0 O2 -> H2O")).code).toBe("INVALID_ARGUMENT");
      const big = errorOf(() => parseReaction("20000000000 H2 -> H2"));
      expect(big.code).toBe("COUNT_TOO_LARGE");
      expect(big.details).toMatchObject({ column: 0, coefficient: "20000000000" });
    });
    it("formula errors keep their code with the column re-based to the whole equation", () => {
      const e = errorOf(() => parseReaction("H2 + O2 -> H2Xy"));
      expect(e.code).toBe("UNKNOWN_ELEMENT");
      expect(e.details).toMatchObject({ column: 13, species: "H2Xy", speciesColumn: 11 });
      const g = errorOf(() => parseReaction("2 Ca(OH + CO2 -> CaCO3 + H2O"));
      expect(g.code).toBe("UNCLOSED_GROUP");
      expect(g.details).toMatchObject({ column: 4, species: "Ca(OH" });
    });
  });

  test.prop([fc.string({ maxLength: 40 })], { numRuns: 500 })("random text either parses or throws an RxthermError", (t) => {
    try {
      parseReaction(t);
    } catch (e) {
      expect(e).toBeInstanceOf(RxthermError);
    }
  });
  test.prop([fc.array(fc.constantFrom("H2", "O2", "+", " ", "->", "2", "/", ".", "e-", "Na+", "(aq)", "Fe3+", "=", "^", "(", "3"), { maxLength: 14 }).map((a) => a.join(""))], {
    numRuns: 500,
  })("random equation-like text either parses or throws an RxthermError", (t) => {
    try {
      parseReaction(t);
    } catch (e) {
      expect(e).toBeInstanceOf(RxthermError);
    }
  });
  test.prop([
    fc.array(fc.tuple(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 4 }), fc.constantFrom("H2", "O2", "CO2", "Na+", "Cl-", "e-", "SO4^2-", "H2O(l)", "Fe3+(aq)")), {
      minLength: 2,
      maxLength: 6,
    }),
  ])("formatReaction(parseReaction(text)) round-trips species and exact coefficients", (terms) => {
    const side = (list: typeof terms) => list.map(([n, d, s]) => `${n}/${d} ${s}`).join(" + ");
    const half = Math.ceil(terms.length / 2);
    const text = `${side(terms.slice(0, half))} -> ${side(terms.slice(half))}`;
    const r = parseReaction(text);
    const again = parseReaction(formatReaction(r));
    expect(again).toEqual(r);
  });
});
