/** Shared test helpers for the formula tests: error capture and formula-text generators. */
import { fc } from "../_helpers/property.js";
import Decimal from "decimal.js";
import { ATOMIC_WEIGHTS } from "../../src/formula/atomicWeights.js";

export { caught as errorOf } from "../_helpers/caught.js";

export const SYMBOLS: readonly string[] = [...ATOMIC_WEIGHTS.map((r) => r.symbol), "D", "T"];

/** Independent exact decimal arithmetic for the oracle (not the library's private constructor). */
const OracleDecimal = Decimal.clone({ precision: 200 });

/** A generated formula: its text and the exact element totals computed by a tree walk. */
export interface Generated {
  text: string;
  expected: Map<string, Decimal>;
}

type Node =
  | { kind: "atom"; symbol: string; count: string }
  | { kind: "group"; open: string; close: string; children: Node[]; count: string };

const integerCount = fc.oneof(fc.constant(""), fc.integer({ min: 2, max: 60 }).map(String));
const groupCount = fc.oneof(fc.constant(""), fc.integer({ min: 2, max: 9 }).map(String));
const decimalCount = fc
  .tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 1, max: 999 }))
  .map(([a, b]) => `${a}.${String(b).padStart(3, "0")}`);
const atom = fc.record({
  kind: fc.constant("atom" as const),
  symbol: fc.constantFrom(...SYMBOLS),
  count: fc.oneof({ weight: 4, arbitrary: integerCount }, { weight: 1, arbitrary: decimalCount }),
});
const brackets = fc.constantFrom(["(", ")"], ["[", "]"], ["{", "}"]);

const tree = fc.letrec<{ node: Node }>((tie) => ({
  node: fc.oneof(
    { depthSize: "small", withCrossShrink: true },
    atom,
    fc.record({
      kind: fc.constant("group" as const),
      pair: brackets,
      children: fc.array(tie("node"), { minLength: 1, maxLength: 3 }),
      count: groupCount,
    }).map((g) => ({ kind: "group" as const, open: g.pair[0] as string, close: g.pair[1] as string, children: g.children, count: g.count })),
  ),
})).node;

function render(n: Node): string {
  if (n.kind === "atom") return n.symbol + n.count;
  return n.open + n.children.map(render).join("") + n.close + n.count;
}

function total(n: Node, mult: Decimal, into: Map<string, Decimal>): void {
  const m = mult.times(new OracleDecimal(n.count === "" ? 1 : n.count));
  if (n.kind === "atom") {
    into.set(n.symbol, (into.get(n.symbol) ?? new OracleDecimal(0)).plus(m));
  } else for (const c of n.children) total(c, m, into);
}

/** A body: one to four top-level nodes; optionally adduct parts with multipliers. */
export const generatedFormula: fc.Arbitrary<Generated> = fc
  .array(
    fc.tuple(fc.oneof(fc.constant(""), fc.integer({ min: 2, max: 12 }).map(String), fc.constant("0.5")),
      fc.array(tree, { minLength: 1, maxLength: 4 }), fc.constantFrom("·", "*", " · ", "•")),
    { minLength: 1, maxLength: 3 },
  )
  .filter((parts) => {
    // a decimal count written just before water reads as a hydrate by design (CuSO4.5H2O, docs/formula.md):
    // leave those texts to the example tests, the oracle reads every "a.b" as a decimal
    const text = parts.map(([m, nodes]) => m + nodes.map(render).join("")).join("·");
    if (/[A-Za-z][1-9]\.[1-9]\d*[HD]2O(?![0-9a-z.])/.test(text)) return false;
    // the first top-level node must not start a text that reads like "Fe3+" etc. (no charge here anyway);
    // a leading multiplier on the first part needs a separator
    return parts.length > 1 || parts[0]?.[0] === "";
  })
  .map((parts) => {
    const expected = new Map<string, Decimal>();
    let text = "";
    parts.forEach(([mult, nodes, sep], k) => {
      if (k > 0) text += sep;
      // "." decimals directly after a count: keep separators that are never decimal points
      text += mult + nodes.map(render).join("");
      const m = new OracleDecimal(mult === "" ? 1 : mult);
      for (const n of nodes) total(n, m, expected);
    });
    return { text, expected };
  });

/** The expected totals as the numbers parseFormula promises: the double nearest to each exact total. */
export function expectedNumbers(g: Generated): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of g.expected) out[k] = Number(v.toString());
  return out;
}

export const chargeSuffix = fc.constantFrom("", "+", "-", "--", "+++", "^2-", "^-", "^{3+}", "-2", "+3", "^4+", "⁺", "²⁻");
export const phaseSuffix = fc.constantFrom("", "(g)", "(l)", "(s)", "(aq)", "(cr)");
