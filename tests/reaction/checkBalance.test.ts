import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { checkBalance } from "../../src/reaction/checkBalance.js";
import { balanceReaction } from "../../src/reaction/balanceReaction.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { scaleReaction } from "../../src/reaction/scaleReaction.js";
import { arbBalancedReaction, errorOf } from "./helpers.js";

describe("checkBalance", () => {
  it("documented examples: propane balanced; the same coefficients with butane are caught", () => {
    // C3H8 + 5 O2 -> 3 CO2 + 4 H2O: complete combustion of propane — common practice
    expect(checkBalance("C3H8 + 5 O2 -> 3 CO2 + 4 H2O").balanced).toBe(true);
    const bad = checkBalance("C4H10 + 5 O2 -> 3 CO2 + 4 H2O");
    expect(bad.residuals).toEqual({ C: -1, H: -2, O: 0 });
    expect(bad.balanced).toBe(false);
    expect(bad.unbalancedElements).toEqual(["C", "H"]);
  });
  it("reports the charge residual (electrons count −1)", () => {
    // MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O: CRC Handbook, Electrochemical Series — from memory
    const ok = checkBalance("MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O");
    expect(ok).toMatchObject({ balanced: true, charge: 0, exactCharge: "0" });
    const short = checkBalance("MnO4- + 8 H+ + 4 e- -> Mn2+ + 4 H2O");
    expect(short.balanced).toBe(false);
    expect(short.charge).toBe(-1); // products +2, reactants −1 + 8 − 4 = +3
    expect(Object.values(short.residuals).every((v) => v === 0)).toBe(true);
  });
  it("is exact with fractional coefficients and decimal counts", () => {
    const r = checkBalance("Fe0.947O + 0.21025 O2 -> 0.4735 Fe2O3"); // 0.947/2 = 0.4735; O: 1 + 0.4205 = 1.4205 = 3·0.4735
    expect(r.balanced).toBe(true);
    expect(r.exactResiduals).toEqual({ Fe: "0", O: "0" });
    const third = checkBalance("1/3 O3 -> 1/2 O2");
    expect(third.balanced).toBe(true);
    const off = checkBalance("1/3 O3 -> 1/3 O2");
    expect(off.exactResiduals).toEqual({ O: "-1/3" });
  });
  it("rejects something that is not a reaction", () => {
    expect(errorOf(() => checkBalance({} as never)).code).toBe("INVALID_ARGUMENT");
    expect(errorOf(() => checkBalance("H2 + O2")).code).toBe("INVALID_REACTION");
    const e = errorOf(() => checkBalance({ reactants: [{ species: "H2", coefficient: 1 }], products: [] } as never));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details).toEqual({ path: "reaction.reactants[0].formula" }); // the shared reaction shape check names the path
  });
  test.prop([arbBalancedReaction, fc.integer({ min: 1, max: 50 }), fc.integer({ min: 1, max: 50 })])(
    "a balanced reaction stays balanced under exact scaling; changing one coefficient breaks it",
    (rx, p, q) => {
      const text = `${rx.reactants.map(([n, s]) => `${n} ${s}`).join(" + ")} -> ${rx.products.map(([n, s]) => `${n} ${s}`).join(" + ")}`;
      const r = parseReaction(text);
      expect(checkBalance(r).balanced).toBe(true);
      expect(checkBalance(scaleReaction(r, `${p}/${q}`)).balanced).toBe(true);
      const bumped = text.replace(/^(\d+) /, (_, n: string) => `${Number(n) + 1} `);
      expect(checkBalance(bumped).balanced).toBe(false);
    },
  );
  it("agrees with balanceReaction on a 9-species redox (from memory, see balanceReaction tests)", () => {
    const r = balanceReaction("K4Fe(CN)6 + KMnO4 + H2SO4 -> KHSO4 + Fe2(SO4)3 + MnSO4 + HNO3 + CO2 + H2O");
    expect(checkBalance(r)).toMatchObject({ balanced: true, residuals: { K: 0, Fe: 0, C: 0, N: 0, Mn: 0, O: 0, H: 0, S: 0 } });
  });
});
