/**
 * Private: the exact decimal sums of reaction enthalpies (Σ ν·ΔfH° over exact rationals and decimal
 * texts, one final rounded division), the only code of the main entry that uses decimal.js. It is a
 * module of its own, and the dist builds it as a chunk of its own, so that a bundled app that never
 * sums enthalpies exactly (a flame-temperature or molar-mass app) leaves decimal.js out.
 *
 * @module
 * @internal
 */
import Decimal from "decimal.js";
import type { Rational } from "../numeric/rational.js";
import type { PreparedReaction } from "./preparedReaction.js";

/** Private decimal constructor: 34 significant digits, round half even (never Decimal.set). */
export const ExactDecimal = /* @__PURE__ */ Decimal.clone({ precision: 34, rounding: Decimal.ROUND_HALF_EVEN });

/** Exact Σ ν·x for decimal texts x (J/mol), as a Decimal (one final rounded division). */
export function exactWeightedSum(nuExact: readonly Rational[], values: readonly string[]): Decimal {
  // Σ (p/q)·h = (Σ p·(L/q)·h) / L with L the lcm of the denominators: only the last step rounds.
  let lcm = 1n;
  for (const r of nuExact) lcm = (lcm / gcd(lcm, r.den)) * r.den;
  let sum = new ExactDecimal(0);
  for (let i = 0; i < nuExact.length; i++) {
    const r = nuExact[i] as Rational;
    const factor = (r.num * (lcm / r.den)).toString();
    sum = sum.plus(new ExactDecimal(values[i] as string).times(factor));
  }
  return lcm === 1n ? sum : sum.div(lcm.toString());
}

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a < 0n ? -a : a;
}

const standardSums = new WeakMap<PreparedReaction, Decimal>();

/** Exact Σ ν·ΔfH°(298.15 K) of a prepared reaction in J/mol, computed once and cached. */
export function standardEnthalpyExact(p: PreparedReaction): Decimal {
  let sum = standardSums.get(p);
  if (sum === undefined) {
    sum = exactWeightedSum(p.nuExact, p.species.map((s) => s.hf298Exact));
    standardSums.set(p, sum);
  }
  return sum;
}
