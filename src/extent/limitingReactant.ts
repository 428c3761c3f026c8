import { RxthermError, finiteResult } from "../errors.js";
import type { Reaction } from "../reaction/types.js";
import {
  type Rational,
  rationalAdd,
  rationalCompare,
  rationalDiv,
  rationalIsZero,
  rationalMul,
  rationalNeg,
  rationalSub,
  rationalToNumber,
} from "../numeric/rational.js";
import { buildSystem } from "./internal/extentSystem.js";
import type { Flows } from "./types.js";
import { attachView } from "../view/attachView.js";
import { LIMITING_VIEW } from "./internal/extentView.js";

/**
 * Result of {@link limitingReactant}. Amounts in the feed's unit (mol or mol/s).
 *
 * @category Stoichiometry
 */
export interface LimitingReactantResult {
  /** The limiting reactant (the first in equation order when several tie). */
  species: string;
  /** Every reactant that runs out at `maxExtent` (ties included). */
  limiting: string[];
  /** The largest extent the feed allows, mol or mol/s. */
  maxExtent: number;
  /** Fractional excess of each reactant: (fed − required)/required, required = |ν| · maxExtent (0 for the limiting one). */
  excess: Record<string, number>;
  /** Extent at which each reactant runs out: fed/|ν|, mol or mol/s. */
  runOut: Record<string, number>;
  /** Outlet flows if the reaction ran to `maxExtent`, mol or mol/s. */
  outletAtMaxExtent: Flows;
}

/**
 * The limiting reactant of a feed for one reaction, the largest extent, and the fractional
 * excess of every reactant.
 *
 * Each reactant i (coefficient νᵢ < 0) runs out at ξᵢ = nᵢ,feed / |νᵢ|; the limiting reactant
 * has the smallest ξᵢ, which is the largest extent the feed allows. The stoichiometric
 * requirement of reactant i is |νᵢ| · ξmax and its fractional excess, the trade's definition,
 * is (fed − required) / required. Computed in exact rationals from the decimal inputs.
 *
 * @param feed - species key → mol or mol/s (≥ 0); every reactant must be fed
 * @param reaction - a balanced reaction (equation text or {@link Reaction})
 * @returns the limiting species, the largest extent (mol or mol/s), excess fractions and run-out extents
 * @throws {@link RxthermError} `INVALID_ARGUMENT` when a reactant is not fed (details: `missing`) or a flow is not finite
 * @throws {@link RxthermError} `NEGATIVE_FLOW` for a negative feed flow
 * @throws {@link RxthermError} `UNBALANCED_REACTION` for an unbalanced reaction (details: `residuals`)
 * @throws formula and equation parse errors (their own codes)
 * @example
 * const r = limitingReactant({ CH4: 1, O2: 2.4 }, "CH4 + 2 O2 -> CO2 + 2 H2O");
 * r.species   // => "CH4"
 * r.maxExtent // => 1
 * r.excess    // => { CH4: 0, O2: 0.2 }   (20 % excess oxygen)
 * r.runOut    // => { CH4: 1, O2: 1.2 }
 * @category Stoichiometry
 * @see IUPAC Compendium of Chemical Terminology (the Gold Book), entry "extent of reaction, ξ"; limiting reactant and fractional excess: common practice
 */
export function limitingReactant(feed: Flows, reaction: Reaction | string): LimitingReactantResult {
  const fn = "limitingReactant";
  const sys = buildSystem(feed, [reaction], fn);
  const row = sys.nu[0] as Rational[];
  const reactants: number[] = [];
  row.forEach((c, s) => {
    if (c.num < 0n) reactants.push(s);
  });
  // equation order: the reaction's own species order
  const order = (sys.reactions[0]?.species ?? []).map((k) => sys.index.get(k) as number);
  reactants.sort((a, b) => order.indexOf(a) - order.indexOf(b));
  const missing = reactants.filter((s) => rationalIsZero(sys.feedQ[s] as Rational)).map((s) => sys.species[s] as string);
  if (missing.length > 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn}: reactant(s) ${missing.join(", ")} not in the feed, so the reaction cannot proceed`, {
      missing,
    });
  }
  const runOutQ = new Map<number, Rational>();
  for (const s of reactants) runOutQ.set(s, rationalDiv(sys.feedQ[s] as Rational, rationalNeg(row[s] as Rational)));
  let best: Rational | null = null;
  for (const v of runOutQ.values()) if (best === null || rationalCompare(v, best) < 0) best = v;
  const maxQ = best as Rational;
  const limiting = reactants.filter((s) => rationalCompare(runOutQ.get(s) as Rational, maxQ) === 0).map((s) => sys.species[s] as string);
  const excess: Record<string, number> = {};
  const runOut: Record<string, number> = {};
  for (const s of reactants) {
    const key = sys.species[s] as string;
    const required = rationalMul(rationalNeg(row[s] as Rational), maxQ);
    excess[key] = rationalToNumber(rationalDiv(rationalSub(sys.feedQ[s] as Rational, required), required));
    runOut[key] = rationalToNumber(runOutQ.get(s) as Rational);
  }
  const outletAtMaxExtent: Flows = {};
  sys.species.forEach((key, s) => {
    outletAtMaxExtent[key] = rationalToNumber(rationalAdd(sys.feedQ[s] as Rational, rationalMul(row[s] as Rational, maxQ)));
  });
  return attachView(finiteResult({
    species: limiting[0] as string,
    limiting,
    maxExtent: rationalToNumber(maxQ),
    excess,
    runOut,
    outletAtMaxExtent,
  }, "limitingReactant"), LIMITING_VIEW);
}
