/**
 * Private: the table views of a reaction and of a balance check.
 *
 * @module
 * @internal
 */
import { viewDescriptors } from "../../view/attachView.js";
import type { ResultView } from "../../view/types.js";
import type { Reaction, Term } from "../types.js";

/** The view of a reaction: one row per term (side, species, coefficient as number and exact text). */
export function reactionView(r: Reaction, equation: string): ResultView {
  const row = (side: string) => (t: Term) => [side, t.species, t.coefficient, t.exact ?? String(t.coefficient)];
  return {
    title: `reaction ${equation}`,
    tables: [{
      columns: [{ label: "side" }, { label: "species" }, { label: "coefficient", unit: "mol/mol reaction" }, { label: "exact" }],
      rows: [...r.reactants.map(row("reactant")), ...r.products.map(row("product"))],
    }],
  };
}

/** The fields of a balance check that its view reads (the type lives with checkBalance, which imports this file). */
interface BalanceCheckFields {
  readonly balanced: boolean;
  readonly residuals: Record<string, number>;
  readonly charge: number;
  readonly exactResiduals: Record<string, string>;
  readonly exactCharge: string;
  readonly unbalancedElements: readonly string[];
}

/** The view of a balance check: products − reactants for each element and the charge. */
export function balanceCheckView(b: BalanceCheckFields): ResultView {
  const rows = Object.keys(b.residuals).map((el) => [el, b.residuals[el] ?? 0, b.exactResiduals[el] ?? ""]);
  rows.push(["charge", b.charge, b.exactCharge]);
  return {
    title: b.balanced ? "balance check: balanced" : `balance check: not balanced (${[...b.unbalancedElements, ...(b.exactCharge !== "0" ? ["charge"] : [])].join(", ")})`,
    tables: [{
      columns: [{ label: "element" }, { label: "products − reactants", unit: "atoms or e" }, { label: "exact" }],
      rows,
    }],
  };
}

/** Display methods of a balance check, built once. */
export const BALANCE_CHECK_VIEW = /* @__PURE__ */ viewDescriptors(balanceCheckView);
