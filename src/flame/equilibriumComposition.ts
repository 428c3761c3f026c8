import { RxthermError, describeValue, knownKeys, optionsOf, rejectUnknownKeys, requireArray } from "../errors.js";
import { ATMOSPHERE_PA } from "../units.js";
import type { Flows } from "../extent/types.js";
import type { Library, Species } from "../species/types.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import { flameSpecies } from "./internal/flameLinks.js";
import {
  amount,
  energyAndSlope,
  fullElementResidual,
  prepareEngine,
  solveAtT,
  solveEnergy,
  type Engine,
} from "./internal/equilibriumEngine.js";
import { resolveLimits } from "./internal/flameInput.js";
import { attachView } from "../view/attachView.js";
import { EQUILIBRIUM_VIEW } from "./internal/flameView.js";
import type { EquilibriumResult } from "./types.js";
export type { EquilibriumResult } from "./types.js";

/** The keys equilibriumComposition reads (a misspelt one is an error, not a silent default). */
const INPUT_KEYS = /* @__PURE__ */ knownKeys<EquilibriumInput>()("feed", "elements", "species", "T", "H", "P", "library");
const OPTION_KEYS = /* @__PURE__ */ knownKeys<EquilibriumOptions>()("maxIterations", "elementTolerance", "toleranceK", "extrapolate", "initialT");

/**
 * What to bring to equilibrium, and at which conditions, for {@link equilibriumComposition}.
 *
 * Give the feed either as species amounts (`feed`) or as element amounts (`elements`), and
 * either the temperature `T` or the total enthalpy `H` (the temperature is then solved for).
 *
 * @category Flame
 */
export interface EquilibriumInput {
  /** Feed species key → mol. Only its element totals matter for the equilibrium; with `H` omitted it is not used otherwise. */
  feed?: Flows;
  /** Element symbol → mol of atoms, instead of `feed`. */
  elements?: Readonly<Record<string, number>>;
  /** The candidate product species (keys with phase), gases and optional pure condensed species. */
  species: readonly string[];
  /** Temperature, K. Exactly one of `T` and `H`. */
  T?: number;
  /** Total enthalpy of the system, J (same amount basis as the feed), H°(T) convention of the species data. Exactly one of `T` and `H`. */
  H?: number;
  /** Pressure, Pa. @defaultValue 101 325 Pa (1 atm) */
  P?: number;
  /** Species library. @defaultValue the built-in library */
  library?: Library;
}

/**
 * Solver settings of {@link equilibriumComposition}.
 *
 * @category Flame
 */
export interface EquilibriumOptions {
  /** Largest number of Newton iterations of one fixed-T solve. @defaultValue 300 */
  maxIterations?: number;
  /** Required relative element balance, max over elements of |Σ a·n − b| / b. @defaultValue 1e-12 */
  elementTolerance?: number;
  /** Tolerance on the solved temperature (with `H`), K. @defaultValue 1e-6 */
  toleranceK?: number;
  /**
   * Evaluate species data outside their temperature range (and search the temperature in
   * [200, 6000] K at least) instead of throwing; the result's `extrapolated` then lists each species and T outside its data.
   * @defaultValue false
   */
  extrapolate?: boolean;
  /** Starting temperature of the search with `H`, K. @defaultValue 2000 */
  initialT?: number;
}


/**
 * Chemical-equilibrium composition of a reacting ideal-gas mixture (with optional pure
 * condensed species) at given T and P, or at given H and P.
 *
 * Method: minimisation of the total Gibbs energy subject to the element balances, by the
 * element-potential (Lagrange-multiplier) method — Newton iterations on the element potentials,
 * ln(total moles) and the condensed amounts, with the gas amounts carried in ln-space so trace
 * species (down to ~1e-300 mol) are represented without clipping; steps are damped after
 * Gordon and McBride (a major species rises by at most a factor e² per step, a trace species
 * rises to at most mole fraction 1e-4), and a cold restart follows a failed warm start. The
 * element rows are scaled by each element's own amount, so an element present at 1e-12 of the
 * feed converges like a major one, continuous with the answer without it. Elements absent from the feed are removed and product
 * species holding them excluded (listed in `excluded`); a product that no non-negative composition
 * of the feed species can hold (CH4 beside HCl, CO and He fed as such) is held at exactly 0 when
 * the solve needs it; a condensed species enters when it
 * lowers G and leaves when its amount vanishes. With `H` the temperature is found by bracketed
 * Newton on H(T) using the equilibrium heat capacity (composition shift included).
 *
 * Gases are ideal, the standard state is 1 bar (100 000 Pa) and condensed phases are pure with
 * no pressure effect. Species data come from the library; a temperature outside the common data
 * range of the products (gases and condensed) throws `OUT_OF_RANGE` unless `extrapolate` is set.
 *
 * Failure is never silent: before a result is returned one final check confirms that every
 * feed element balances to `elementTolerance` (relative to its own amount) and, with `H`, that
 * the energy residual is within `toleranceK` times the frozen heat capacity; otherwise
 * `NO_CONVERGENCE` is thrown (`converged` in the result is therefore always true).
 *
 * @param input - feed (species or element amounts), product set, T or H, P, library
 * @param options - iteration limit, element tolerance, T tolerance, extrapolation
 * @returns amounts (mol), gas mole fractions, iterations, element residual, enthalpy (J), element potentials
 * @throws RxthermError `INVALID_ARGUMENT` when neither or both of feed/elements or T/H are given, an amount is negative or not finite, T ≤ 0, P ≤ 0, or the product set has no gas
 * @throws RxthermError `ELEMENTS_NOT_COVERED` when no product holds some feed element, or the product set cannot hold the feed's element ratios (details: `elements` or `elementResidual`)
 * @throws RxthermError `NO_CONVERGENCE` when the Newton iterations stall, or the final check finds an element or energy residual above its tolerance (details: `T`, `elementResidual` or `energyResidual`, `reason`)
 * @throws RxthermError `NO_BRACKET` with `H` when no temperature in the data range closes the enthalpy balance
 * @throws RxthermError `OUT_OF_RANGE` at a T outside the products' data range without `extrapolate`
 * @throws RxthermError `UNKNOWN_SPECIES` / `AMBIGUOUS_PHASE` for keys the library cannot resolve
 * @category Flame
 * @example
 * // steam at 3000 K and 1 atm: partly dissociated
 * const r = equilibriumComposition({
 *   feed: { "H2O(g)": 1 },
 *   species: ["H2O(g)", "H2(g)", "O2(g)", "OH(g)", "H(g)", "O(g)"],
 *   T: 3000,
 * });
 * r.moleFractions["H2O(g)"] // => 0.6435 (to 4 digits, built-in data)
 * @see W. B. White, S. M. Johnson, G. B. Dantzig, J. Chem. Phys. 28 (1958) 751 (Gibbs minimisation);
 *   W. R. Smith, R. W. Missen, Chemical Reaction Equilibrium Analysis, Wiley 1982, ch. 6 (element potentials);
 *   S. Gordon, B. J. McBride, NASA Reference Publication 1311, Part I (1994) (step-size control)
 */
export function equilibriumComposition(input: EquilibriumInput, options: EquilibriumOptions = {}): EquilibriumResult {
  options = optionsOf(options, "equilibriumComposition", "options", OPTION_KEYS);
  const fn = "equilibriumComposition";
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object`, { input });
  }
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  const lim = resolveLimits(fn, options);
  const P = input.P ?? ATMOSPHERE_PA;
  if (typeof P !== "number" || !(P > 0) || !Number.isFinite(P)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires P > 0 Pa, got ${describeValue(P)}`, { P });
  }
  const hasT = input.T !== undefined;
  const hasH = input.H !== undefined;
  if (hasT === hasH) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires exactly one of T and H`, { T: input.T, H: input.H });
  }
  if (hasT && (typeof input.T !== "number" || !(input.T > 0) || !Number.isFinite(input.T))) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires T > 0 K, got ${describeValue(input.T)}`, { T: input.T });
  }
  if (hasH && (typeof input.H !== "number" || !Number.isFinite(input.H))) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a finite H in J, got ${describeValue(input.H)}`, { H: input.H });
  }
  if (!Array.isArray(input.species) || input.species.length === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a non-empty list of product species`, { species: input.species });
  }
  const { totals: feedElements, directions } = elementTotals(fn, input);
  requireArray(input.species, fn, "input.species");
  input.species.forEach((key, i) => {
    if (typeof key !== "string") {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires species keys as text, got ${describeValue(key)} at index ${i}`, { path: `input.species[${i}]` });
    }
  });
  const products = input.species.map((key) => ({ key, species: flameSpecies(fn, key, input.library) }));
  const engine = prepareEngine(fn, products, feedElements, directions);
  let T: number;
  let temperatureIterations = 0;
  let energyResidual = 0;
  if (hasT) {
    T = input.T!;
    solveAtT(engine, T, "P", P, lim);
  } else {
    const initial = options.initialT ?? 2000;
    if (!(initial > 0) || !Number.isFinite(initial)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires initialT > 0 K, got ${describeValue(initial)}`, { initialT: initial });
    }
    const sol = solveEnergy(engine, input.H!, "P", P, initial, lim);
    T = sol.T;
    temperatureIterations = sol.outerIterations;
    energyResidual = sol.residual;
  }
  return attachView(buildResult(engine, T, P, temperatureIterations, energyResidual), EQUILIBRIUM_VIEW);
}

/** Assemble the public result from a converged engine. */
function buildResult(e: Engine, T: number, P: number, temperatureIterations: number, energyResidual: number): EquilibriumResult {
  const moles: Record<string, number> = {};
  const moleFractions: Record<string, number> = {};
  const condensed: Record<string, number> = {};
  let gasMoles = 0;
  for (let j = 0; j < e.keys.length; j++) {
    const n = amount(e, j);
    moles[e.keys[j]!] = n;
    if (e.gasAll[j]) gasMoles += n;
    else if (n > 0) condensed[e.keys[j]!] = n;
  }
  for (let j = 0; j < e.keys.length; j++) if (e.gasAll[j]) moleFractions[e.keys[j]!] = moles[e.keys[j]!]! / gasMoles;
  const elementPotentials: Record<string, number> = {};
  e.rows.forEach((r, i) => {
    elementPotentials[e.elements[r]!] = e.state.pi[i]!;
  });
  return {
    T, P, moles, moleFractions, condensed, gasMoles,
    converged: true,
    iterations: e.iterations,
    temperatureIterations,
    elementResidual: fullElementResidual(e),
    enthalpy: energyAndSlope(e, T, "P", false).value,
    energyResidual,
    elementPotentials,
    excluded: [...e.excluded],
    extrapolated: noteExtrapolation([], e.species, T),
  };
}

/**
 * Element totals (symbol → mol of atoms) of the feed or of the given element amounts, and the
 * element counts of each feed species of positive amount (null for element amounts).
 */
function elementTotals(fn: string, input: EquilibriumInput): { totals: Map<string, number>; directions: Readonly<Record<string, number>>[] | null } {
  const hasFeed = input.feed !== undefined;
  const hasEl = input.elements !== undefined;
  if (hasFeed === hasEl) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires exactly one of feed and elements`, {});
  }
  const totals = new Map<string, number>();
  const directions: Readonly<Record<string, number>>[] = [];
  const src = (hasFeed ? input.feed : input.elements) as Record<string, number>;
  if (src === null || typeof src !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${hasFeed ? "feed" : "elements"} to be an object of amounts`, {});
  }
  for (const [key, n] of Object.entries(src)) {
    if (typeof n !== "number" || !Number.isFinite(n) || n < 0) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every amount to be a finite number ≥ 0, got ${describeValue(n)} for ${key}`, { species: key, amount: n });
    }
    if (n === 0) continue;
    if (hasFeed) {
      const s: Species = flameSpecies(fn, key, input.library);
      for (const [el, c] of Object.entries(s.formula.elements)) totals.set(el, (totals.get(el) ?? 0) + n * c);
      directions.push(s.formula.elements);
    } else {
      totals.set(key, (totals.get(key) ?? 0) + n);
    }
  }
  if (totals.size === 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires a feed with a positive amount of some element`, {});
  }
  return { totals, directions: hasFeed ? directions : null };
}
