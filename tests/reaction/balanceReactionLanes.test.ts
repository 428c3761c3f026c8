import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fc, test } from "../_helpers/property.js";
import { balanceLanes } from "../../src/reaction/internal/balanceLanes.js";
import { balanceReaction } from "../../src/reaction/balanceReaction.js";
import { parseReaction } from "../../src/reaction/parseReaction.js";
import { balanceableText, equationText, reactionOutcome } from "./equationCases.js";

/** The balance computed in BigInt only: the reference of the fast path. */
function bigIntBalance(input: Parameters<typeof balanceReaction>[0]): unknown {
  balanceLanes.bigIntOnly = true;
  try {
    return reactionOutcome(() => balanceReaction(input));
  } finally {
    balanceLanes.bigIntOnly = false;
  }
}

describe("balanceReaction fast path agrees with the BigInt path", () => {
  test.prop([fc.oneof(balanceableText, equationText)], { numRuns: 400 })("every term and every error equals the BigInt path's", (text) => {
    expect(reactionOutcome(() => balanceReaction(text))).toEqual(bigIntBalance(text));
  });

  test.prop([balanceableText], { numRuns: 200 })("species lists give what the equation text gives", (text) => {
    let lists: { reactants: string[]; products: string[] };
    try {
      const p = parseReaction(text);
      lists = { reactants: p.reactants.map((t) => t.species), products: p.products.map((t) => t.species) };
    } catch {
      return;
    }
    expect(reactionOutcome(() => balanceReaction(lists))).toEqual(bigIntBalance(lists));
    const fromText = reactionOutcome(() => balanceReaction(text)) as { error?: string };
    if (fromText.error === undefined) expect(reactionOutcome(() => balanceReaction(lists))).toEqual(fromText);
  });

  it("outcomes recorded before the fast path was reworked are unchanged (parse and balance)", () => {
    // tests/reaction/golden/equations.json: written once from the code before the change (see its note)
    const golden = JSON.parse(readFileSync(new URL("./golden/equations.json", import.meta.url), "utf8")) as {
      cases: { text: string; parse: unknown; balance: unknown }[];
    };
    expect(golden.cases.length).toBe(140);
    for (const c of golden.cases) {
      expect(JSON.parse(JSON.stringify(reactionOutcome(() => parseReaction(c.text)))), c.text).toEqual(c.parse);
      expect(JSON.parse(JSON.stringify(reactionOutcome(() => balanceReaction(c.text)))), c.text).toEqual(c.balance);
    }
  });
});
