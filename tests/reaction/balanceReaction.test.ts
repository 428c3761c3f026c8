import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { balanceReaction } from "../../src/reaction/balanceReaction.js";
import { checkBalance } from "../../src/reaction/checkBalance.js";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { integerNullSpace } from "../../src/numeric/linearAlgebra.js";
import { gcdBigInt } from "../../src/numeric/rational.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { arbBalancedReaction, errorOf, independentResiduals, pairs } from "./helpers.js";

/**
 * Published / well-known balanced equations. Each expected coefficient set is written beside its
 * source; those written from memory are marked so, and every one is ALSO checked by an
 * independent float element count (independentResiduals) that does not use the code under test.
 */
const KNOWN: { input: string; expected: string; source: string }[] = [
  {
    input: "C8H18 + O2 -> CO2 + H2O",
    expected: "2 C8H18 + 25 O2 -> 16 CO2 + 18 H2O",
    source: "complete combustion of n-octane — common practice (from memory)",
  },
  {
    input: "MnO4- + H2C2O4 + H+ -> Mn2+ + CO2 + H2O",
    expected: "2 MnO4- + 5 H2C2O4 + 6 H+ -> 2 Mn2+ + 10 CO2 + 8 H2O",
    source: "permanganate titration of oxalic acid in acid (permanganometry) — from memory",
  },
  {
    input: "Cr2O7^2- + Fe2+ + H+ -> Cr3+ + Fe3+ + H2O",
    expected: "Cr2O7^2- + 6 Fe2+ + 14 H+ -> 2 Cr3+ + 6 Fe3+ + 7 H2O",
    source: "dichromate titration of iron(II) in acid (dichrometry) — from memory",
  },
  {
    input: "Cu + HNO3 -> Cu(NO3)2 + NO + H2O",
    expected: "3 Cu + 8 HNO3 -> 3 Cu(NO3)2 + 2 NO + 4 H2O",
    source: "copper in dilute nitric acid — from memory",
  },
  {
    input: "KMnO4 + HCl -> KCl + MnCl2 + Cl2 + H2O",
    expected: "2 KMnO4 + 16 HCl -> 2 KCl + 2 MnCl2 + 5 Cl2 + 8 H2O",
    source: "laboratory chlorine from potassium permanganate and hydrochloric acid — from memory",
  },
  {
    input: "K4Fe(CN)6 + KMnO4 + H2SO4 -> KHSO4 + Fe2(SO4)3 + MnSO4 + HNO3 + CO2 + H2O",
    expected: "10 K4Fe(CN)6 + 122 KMnO4 + 299 H2SO4 -> 162 KHSO4 + 5 Fe2(SO4)3 + 122 MnSO4 + 60 HNO3 + 60 CO2 + 188 H2O",
    source: "oxidation of hexacyanoferrate(II) by permanganate, a classic 9-species balancing case — from memory",
  },
  {
    input: "MnO4- + H+ + e- -> Mn2+ + H2O",
    expected: "MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O",
    source: "CRC Handbook of Chemistry and Physics, Electrochemical Series table (half-reaction as listed) — from memory",
  },
  {
    input: "Cr2O7^2- + H+ + e- -> Cr3+ + H2O",
    expected: "Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O",
    source: "CRC Handbook of Chemistry and Physics, Electrochemical Series table — from memory",
  },
  {
    input: "O2 + H+ + e- -> H2O",
    expected: "O2 + 4 H+ + 4 e- -> 2 H2O",
    source: "CRC Handbook of Chemistry and Physics, Electrochemical Series table (E° = 1.229 V couple) — from memory",
  },
  {
    input: "NH3 + O2 -> NO + H2O",
    expected: "4 NH3 + 5 O2 -> 4 NO + 6 H2O",
    source: "ammonia oxidation step of nitric acid manufacture (Ostwald process) — common practice (from memory)",
  },
  {
    input: "Al + Fe2O3 -> Al2O3 + Fe",
    expected: "2 Al + Fe2O3 -> Al2O3 + 2 Fe",
    source: "aluminothermic (thermite) reduction of iron(III) oxide — common practice (from memory)",
  },
  {
    input: "CO2 + H2O -> C6H12O6 + O2",
    expected: "6 CO2 + 6 H2O -> C6H12O6 + 6 O2",
    source: "overall equation of photosynthesis — common practice (from memory)",
  },
  {
    input: "Fe0.947O + O2 -> Fe2O3",
    // wüstite composition Fe0.947O as tabulated in NIST-JANAF 4th ed. (1998); coefficients by hand: Fe 4000·0.947 = 3788 = 2·1894, O 4000 + 2·841 = 5682 = 3·1894
    expected: "4000 Fe0.947O + 841 O2 -> 1894 Fe2O3",
    source: "arithmetic by hand (see comment)",
  },
];

describe("balanceReaction", () => {
  it.each(KNOWN)("balances $input", ({ input, expected }) => {
    const r = balanceReaction(input);
    expect(formatReaction(r)).toBe(expected);
    // independent check of the expected coefficients: plain float element count
    const res = independentResiduals(pairs(r));
    for (const [k, v] of Object.entries(res)) expect(v, k).toBe(0);
  });

  it("10-species ionic form of the hexacyanoferrate(II)/permanganate reaction keeps the 10 : 122 (= 5 : 61) ratio of the molecular equation (from memory, see KNOWN)", () => {
    const r = balanceReaction("K4Fe(CN)6 + MnO4- + H2SO4 -> K+ + Fe3+ + Mn2+ + NO3- + CO2 + H2O + HSO4-");
    expect(formatReaction(r)).toBe("5 K4Fe(CN)6 + 61 MnO4- + 188 H2SO4 -> 20 K+ + 5 Fe3+ + 61 Mn2+ + 30 NO3- + 30 CO2 + 94 H2O + 188 HSO4-");
    for (const [k, v] of Object.entries(independentResiduals(pairs(r)))) expect(v, k).toBe(0);
  });

  it("documented examples: octane, per-mole normalisation and an ionic equation", () => {
    expect(formatReaction(balanceReaction("C8H18 + O2 -> CO2 + H2O"))).toBe("2 C8H18 + 25 O2 -> 16 CO2 + 18 H2O");
    const per = balanceReaction("C8H18 + O2 -> CO2 + H2O", { per: "C8H18" });
    expect(per.reactants[1]?.exact).toBe("25/2");
    expect(per.reactants[1]?.coefficient).toBe(12.5);
    expect(formatReaction(per)).toBe("C8H18 + 25/2 O2 -> 8 CO2 + 9 H2O");
    // MnO4- + 8 H+ + 5 Fe2+ -> Mn2+ + 5 Fe3+ + 4 H2O: permanganate titration of iron(II) — from memory
    expect(formatReaction(balanceReaction("MnO4- + H+ + Fe2+ -> Mn2+ + Fe3+ + H2O"))).toBe("MnO4- + 8 H+ + 5 Fe2+ -> Mn2+ + 5 Fe3+ + 4 H2O");
  });

  it("ignores coefficients written in the text and keeps species order, sides and phases", () => {
    const r = balanceReaction("7 CH4(g) + 3 O2(g) -> 9 CO2(g) + H2O(l)");
    expect(formatReaction(r)).toBe("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"); // methane combustion, common practice
    expect(r.products[1]?.formula.phase).toBe("l");
  });

  it("stays exact when the numbers outgrow float64 (BigInt path)", () => {
    // CnH(2n+2) + (3n+1)/2 O2 -> n CO2 + (n+1) H2O, alkane combustion — common practice; n = 4·10^8
    const r = balanceReaction("C400000000H800000002 + O2 -> CO2 + H2O");
    expect([...r.reactants, ...r.products].map((t) => t.exact)).toEqual(["2", "1200000001", "800000000", "800000002"]);
    expect(checkBalance(r).balanced).toBe(true);
  });

  it("accepts { reactants, products } species lists", () => {
    const r = balanceReaction({ reactants: ["N2", "H2"], products: ["NH3"] });
    expect(formatReaction(r)).toBe("N2 + 3 H2 -> 2 NH3"); // ammonia synthesis, common practice
  });

  it("fixed coefficients: scale a 1-D balance, and pin down an ambiguous one", () => {
    expect(formatReaction(balanceReaction("CH4 + O2 -> CO2 + H2O", { fixed: { O2: 1 } }))).toBe("1/2 CH4 + O2 -> 1/2 CO2 + H2O");
    // H2 + O2 -> H2O + H2O2 has two independent balances; fixing H2O and H2O2 picks one
    expect(formatReaction(balanceReaction("H2 + O2 -> H2O + H2O2", { fixed: { H2O: 2, H2O2: 1 } }))).toBe("3 H2 + 2 O2 -> 2 H2O + H2O2");
    // partial combustion with a chosen CO:CO2 split, then normalised per mole of fuel
    const r = balanceReaction("C3H8 + O2 -> CO + CO2 + H2O", { fixed: { CO: 1, CO2: 2 }, per: "C3H8" });
    expect(formatReaction(r)).toBe("C3H8 + 9/2 O2 -> CO + 2 CO2 + 4 H2O");
  });

  it("does not mutate a frozen input", () => {
    const input = Object.freeze({ reactants: Object.freeze(["H2", "O2"]), products: Object.freeze(["H2O"]) });
    const opts = Object.freeze({ fixed: Object.freeze({ O2: 2 }) });
    expect(formatReaction(balanceReaction(input, opts))).toBe("4 H2 + 2 O2 -> 4 H2O");
    expect(input.reactants).toEqual(["H2", "O2"]);
  });

  describe("errors", () => {
    it("NOT_BALANCEABLE names the element on one side only", () => {
      const e = errorOf(() => balanceReaction("H2 + O2 + N2 -> H2O"));
      expect(e.code).toBe("NOT_BALANCEABLE");
      expect(e.details).toEqual({ elements: ["N"], species: ["N2"] });
      const e2 = errorOf(() => balanceReaction("NaCl -> Na"));
      expect(e2.code).toBe("NOT_BALANCEABLE");
      expect(e2.details.elements).toEqual(["Cl"]);
      const e3 = errorOf(() => balanceReaction("Fe3+ -> Fe"));
      expect(e3.code).toBe("NOT_BALANCEABLE");
      expect(e3.details.elements).toEqual(["charge"]);
    });
    it("WRONG_SIDE names the species that belongs on the other side", () => {
      const e = errorOf(() => balanceReaction("H2O + H2 -> O2"));
      expect(e.code).toBe("WRONG_SIDE");
      expect(e.details).toEqual({ species: ["H2"], suggestion: "2 H2O -> 2 H2 + O2" });
    });
    it("AMBIGUOUS_BALANCE lists an independent set of balanced reactions", () => {
      const e = errorOf(() => balanceReaction("H2 + O2 -> H2O + H2O2"));
      expect(e.code).toBe("AMBIGUOUS_BALANCE");
      expect(e.details.dimension).toBe(2);
      const reactions = e.details.reactions as string[];
      expect(reactions).toEqual(["2 H2 + O2 -> 2 H2O", "H2 + O2 -> H2O2"]);
      for (const t of reactions) expect(checkBalance(t).balanced).toBe(true);
      // one fixed coefficient is not enough to pin a 2-D family
      const e2 = errorOf(() => balanceReaction("H2 + O2 -> H2O + H2O2", { fixed: { H2: 3 } }));
      expect(e2.code).toBe("AMBIGUOUS_BALANCE");
      expect(e2.details.undetermined).toBe(1);
    });
    it("INCONSISTENT_CONSTRAINTS when fixed coefficients contradict", () => {
      const e = errorOf(() => balanceReaction("H2 + O2 -> H2O", { fixed: { H2: 1, O2: 1 } }));
      expect(e.code).toBe("INCONSISTENT_CONSTRAINTS");
      expect(e.details).toEqual({ species: ["H2", "O2"] });
      const e2 = errorOf(() => balanceReaction("H2 + O2 -> H2O + H2O2", { fixed: { H2: 1, O2: 1, H2O: 1 } }));
      expect(e2.code).toBe("INCONSISTENT_CONSTRAINTS");
      expect(e2.details.species).toEqual(expect.arrayContaining(["H2"]));
    });
    it("INVALID_ARGUMENT for unknown fixed/per species or a non-positive value", () => {
      expect(errorOf(() => balanceReaction("H2 + O2 -> H2O", { fixed: { N2: 1 } })).details).toEqual({ species: "N2", value: "1" });
      expect(errorOf(() => balanceReaction("H2 + O2 -> H2O", { fixed: { H2: -1 } })).code).toBe("INVALID_ARGUMENT");
      expect(errorOf(() => balanceReaction("H2 + O2 -> H2O", { per: "CH4" })).details).toEqual({ species: "CH4" });
      expect(errorOf(() => balanceReaction(42 as unknown as string)).code).toBe("INVALID_ARGUMENT");
    });
    it("INVALID_REACTION for an empty side or a repeated species; formula errors keep their code", () => {
      expect(errorOf(() => balanceReaction({ reactants: [], products: ["H2O"] })).code).toBe("INVALID_REACTION");
      const e = errorOf(() => balanceReaction("H2O -> H2O + H2"));
      expect(e.code).toBe("INVALID_REACTION");
      expect(e.details.species).toEqual(["H2O"]);
      const f = errorOf(() => balanceReaction({ reactants: ["H2"], products: ["Xy2"] }));
      expect(f.code).toBe("UNKNOWN_ELEMENT");
      expect(f.details).toMatchObject({ side: "products", index: 0, species: "Xy2" });
    });
  });

  describe("properties", () => {
    test.prop([arbBalancedReaction], { numRuns: 200 })(
      "random balanced reactions with a 1-D null space are recovered exactly (coprime positive integers, elements and charge conserved)",
      (rx) => {
        const species = [...rx.reactants, ...rx.products].map(([, s]) => s);
        const signs = [...rx.reactants.map(() => -1), ...rx.products.map(() => 1)];
        const elements = [...new Set(species.flatMap((s) => Object.keys(parseFormula(s).elements)))];
        const matrix = elements.map((el) => species.map((s, j) => (signs[j] as number) * (parseFormula(s).elements[el] ?? 0)));
        const ns = integerNullSpace(matrix);
        fc.pre(ns.length === 1);
        const r = balanceReaction({ reactants: rx.reactants.map(([, s]) => s), products: rx.products.map(([, s]) => s) });
        const got = [...r.reactants, ...r.products].map((t) => BigInt(t.exact));
        // expected: the construction's coefficients reduced to coprime integers
        const built = [...rx.reactants, ...rx.products].map(([nu]) => BigInt(nu));
        const g = built.reduce((a, b) => gcdBigInt(a, b), 0n);
        expect(got).toEqual(built.map((b) => b / g));
        expect(got.every((x) => x > 0n)).toBe(true);
        expect(got.reduce((a, b) => gcdBigInt(a, b), 0n)).toBe(1n);
        expect(checkBalance(r).balanced).toBe(true);
      },
    );
    test.prop([arbBalancedReaction], { numRuns: 100 })("whatever balanceReaction returns is balanced; failures are RxthermErrors", (rx) => {
      try {
        const r = balanceReaction({ reactants: rx.reactants.map(([, s]) => s), products: rx.products.map(([, s]) => s) });
        expect(checkBalance(r).balanced).toBe(true);
        expect([...r.reactants, ...r.products].every((t) => t.coefficient > 0 && Number.isInteger(t.coefficient))).toBe(true);
      } catch (e) {
        expect((e as { code?: string }).code).toMatch(/^(AMBIGUOUS_BALANCE|NOT_BALANCEABLE|WRONG_SIDE)$/);
      }
    });
  });
});
