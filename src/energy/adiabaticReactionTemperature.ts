import { RxthermError, describeValue, knownKeys, optionsOf, rejectUnknownKeys } from "../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K } from "../units.js";
import type { Library, Species } from "../species/types.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import type { Reaction } from "../reaction/types.js";
import type { ExtentSpec, Flows, Stream } from "../extent/types.js";
import { solveExtents } from "../extent/solveExtents.js";
import { findRoot } from "../numeric/roots.js";
import { resolveSpeciesCached } from "../enthalpy/resolveInputs.js";
import { resolveStream } from "./internal/energyStreams.js";
import { attachView } from "../view/attachView.js";
import { ADIABATIC_VIEW } from "./internal/energyView.js";

/** The keys the adiabatic functions read (a misspelt one is an error, not a silent default). */
const INPUT_KEYS = /* @__PURE__ */ knownKeys<AdiabaticReactionInput>()("inlet", "reactions", "specs", "library");
const OPTION_KEYS = /* @__PURE__ */ knownKeys<AdiabaticReactionOptions>()("toleranceK", "maxIterations", "limitsK", "extrapolate", "vessel");

/**
 * Input of {@link adiabaticReactionTemperature} and {@link adiabaticTemperatureRise}.
 *
 * @category Energy
 */
export interface AdiabaticReactionInput {
  /** Feed stream(s): T in K, flows in mol/s (or a batch charge in mol). */
  inlet: Stream | readonly Stream[];
  /** Balanced reactions (text or parsed). */
  reactions: readonly (Reaction | string)[];
  /** One specification per reaction (conversion, outlet flow, extent...; see `solveExtents`). */
  specs: readonly ExtentSpec[];
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
}

/**
 * Options of {@link adiabaticReactionTemperature} and {@link adiabaticTemperatureRise}.
 *
 * @category Energy
 */
export interface AdiabaticReactionOptions {
  /** Convergence tolerance on the outlet temperature, K. @defaultValue 1e-9 */
  toleranceK?: number;
  /** Largest number of root-finder iterations. @defaultValue 100 */
  maxIterations?: number;
  /**
   * Hard temperature limits `[lower, upper]` of the search, K. By default the intersection of the
   * outlet species' data ranges (with `extrapolate`, 50 K to 10 000 K).
   */
  limitsK?: readonly [number, number];
  /** Extend Cp forms beyond their data range instead of throwing `OUT_OF_RANGE`. @defaultValue false */
  extrapolate?: boolean;
  /**
   * `"constant-pressure"` (flow reactor or open/vented batch): the enthalpy H is conserved.
   * `"constant-volume"` (rigid closed vessel): the internal energy U = H − n_gas·R·T is conserved,
   * which gives a higher temperature when gases are present.
   * @defaultValue "constant-pressure"
   */
  vessel?: "constant-pressure" | "constant-volume";
}

/**
 * Result of {@link adiabaticReactionTemperature}.
 *
 * @category Energy
 */
export interface AdiabaticReactionResult {
  /** Adiabatic outlet temperature, K. */
  readonly T: number;
  /** The outlet stream at T (flows from the extents; pressure of the first inlet stream when given). */
  readonly outlet: Stream;
  /** Extent of each reaction, mol/s or mol. */
  readonly extents: number[];
  /** Root-finder iterations. */
  readonly iterations: number;
  /** Balance residual at the solution, W or J: Σout n·H(T) − Σin n·H(T_in) (or the same in U for a rigid vessel). */
  readonly residual: number;
  /** Inlet enthalpy Σin n·H°(T_in) including formation enthalpies, W or J. */
  readonly inletEnthalpy: number;
  /** The balance used: `"constant-pressure"` (H conserved) or `"constant-volume"` (U conserved). */
  readonly vessel: "constant-pressure" | "constant-volume";
  /**
   * Each species evaluated outside its data range, with the temperature: inlet species at their
   * stream temperatures, outlet species at the solution T (possible only with `extrapolate: true`);
   * empty when every species was inside its range.
   */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/**
 * Adiabatic outlet temperature of a reactor: the T at which the products carry exactly the
 * enthalpy of the feed (Q = 0, no shaft work).
 *
 * The outlet composition comes from `solveExtents` (one spec per reaction — conversion, outlet
 * flow or extent), so the feed may be non-stoichiometric, diluted and only partly converted; then
 * Σout nᵢ·H°ᵢ(T) = Σin nᵢ·H°ᵢ(T_in) is solved for T with the safeguarded Newton/bisection root finder
 * ({@link findRoot}) using Σ nᵢ·Cp,ᵢ(T) as the derivative. Each H°(T) includes ΔfH° (heat-of-formation
 * method), standard state 1 bar, ideal gases, no dissociation (see the flame module for equilibrium
 * products). The phases are those of the keys: water formed as H2O(g) stays vapour.
 *
 * **Caution:** a screening estimate from ideal-gas, standard-state data — not a substitute for
 * calorimetry of the real mixture or for a hazard study; follow local codes and licensed
 * engineering practice.
 *
 * @param input - feed stream(s), reactions, specs, library
 * @param options - tolerance (K), iterations, temperature limits (K), extrapolation
 * @returns T in K, the outlet stream, extents, iterations, residual and inlet enthalpy
 * @throws RxthermError `NO_BRACKET` when no temperature inside the limits closes the balance (details from {@link findRoot})
 * @throws RxthermError `NO_CONVERGENCE` when the root finder runs out of iterations
 * @throws RxthermError `INVALID_ARGUMENT`, `NEGATIVE_FLOW`, `UNBALANCED_REACTION`, `SPEC_COUNT_MISMATCH`,
 *   `SINGULAR_SPECS`, `UNKNOWN_SPECIES`, `OUT_OF_RANGE` from the streams, extents and data
 * @category Energy
 * @example
 * adiabaticReactionTemperature({
 *   inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } },
 *   reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"],
 *   specs: [{ of: "CH4(g)", conversion: 1 }],
 * }).T // => 2327.2 (K, rounded; complete combustion, no dissociation)
 * @see IUPAC Green Book, 3rd ed. (2007), §2.11; R. P. Brent (1973) for the root finder.
 */
export function adiabaticReactionTemperature(input: AdiabaticReactionInput, options: AdiabaticReactionOptions = {}): AdiabaticReactionResult {
  options = optionsOf(options, "adiabaticReactionTemperature");
  return attachView(solveAdiabatic("adiabaticReactionTemperature", input, options).result, ADIABATIC_VIEW);
}

/**
 * Result of {@link adiabaticTemperatureRise}.
 *
 * @category Energy
 */
export interface AdiabaticTemperatureRiseResult extends AdiabaticReactionResult {
  /** Adiabatic temperature rise ΔT_ad = T − T_start, K. */
  readonly deltaT: number;
  /** Starting temperature, K: the batch temperature, or the adiabatic mixing temperature of several inlet streams. */
  readonly startT: number;
}

/**
 * Adiabatic temperature rise ΔT_ad of a batch (or feed) if the specified reactions run to the
 * specified extents with no heat removed — the first screening number for thermal runaway.
 *
 * ΔT_ad = T_ad − T_start, with T_ad from {@link adiabaticReactionTemperature} and T_start the batch
 * temperature (for several inlet streams at different temperatures, their adiabatic mixing
 * temperature without reaction). The full Cp(T) of every outlet species is integrated; no heat
 * goes to the vessel wall (a thermal-inertia φ-factor of 1), no boiling or pressure relief is
 * modelled, and only the given reactions occur (decomposition of products is not included). For a
 * closed rigid vessel pass `vessel: "constant-volume"` (internal energy conserved).
 *
 * **Process-safety caution:** a screening estimate, no substitute for calorimetry (e.g. adiabatic
 * or reaction calorimetry) of the real mixture, for the vessel's relief design or for a hazard
 * study. Defer to local codes and licensed engineering practice.
 *
 * @param input - batch charge (or feed streams), reactions, specs, library
 * @param options - tolerance (K), iterations, temperature limits (K), extrapolation
 * @returns ΔT_ad in K, the starting and final temperatures (K) and everything in {@link AdiabaticReactionResult}
 * @throws RxthermError the errors of {@link adiabaticReactionTemperature}
 * @category Energy
 * @example
 * adiabaticTemperatureRise({
 *   inlet: { T: 298.15, flows: { "H2(g)": 0.02, "O2(g)": 0.01, "N2(g)": 0.97 } },
 *   reactions: ["2 H2(g) + O2(g) -> 2 H2O(g)"],
 *   specs: [{ of: "H2(g)", conversion: 1 }],
 * }).deltaT // => 166.5 (K, rounded)
 * @see T. Grewer, Thermal Hazards of Chemical Reactions, Elsevier 1994 (adiabatic temperature rise as a screening criterion).
 */
export function adiabaticTemperatureRise(input: AdiabaticReactionInput, options: AdiabaticReactionOptions = {}): AdiabaticTemperatureRiseResult {
  options = optionsOf(options, "adiabaticTemperatureRise");
  const { result, startT } = solveAdiabatic("adiabaticTemperatureRise", input, options);
  return attachView({ ...result, deltaT: result.T - startT, startT }, ADIABATIC_VIEW);
}

function solveAdiabatic(fn: string, input: AdiabaticReactionInput, options: AdiabaticReactionOptions): { result: AdiabaticReactionResult; startT: number } {
  if (input === null || typeof input !== "object") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { inlet, reactions, specs }`, { input });
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  rejectUnknownKeys(options, OPTION_KEYS, fn, "options");
  const library = input.library;
  const extrapolate = options.extrapolate === true;
  const ro = extrapolate ? EXTRAPOLATE : undefined;
  const toleranceK = options.toleranceK ?? 1e-9;
  const vessel = options.vessel ?? "constant-pressure";
  if (vessel !== "constant-pressure" && vessel !== "constant-volume") throw new RxthermError("INVALID_ARGUMENT", `${fn} option vessel must be "constant-pressure" or "constant-volume", got ${describeValue(vessel)}`, { vessel });
  const rigid = vessel === "constant-volume";
  if (!(toleranceK > 0) || !Number.isFinite(toleranceK)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires toleranceK > 0, got ${describeValue(toleranceK)}`, { toleranceK });
  const inlets: readonly Stream[] = input.inlet === undefined || input.inlet === null
    ? []
    : Array.isArray(input.inlet) ? (input.inlet as readonly Stream[]) : [input.inlet as Stream];
  if (inlets.length === 0) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires at least one inlet stream`, {});
  const resolved = inlets.map((s, i) => resolveStream(fn, s, `inlet[${i}]`, library, null, -1, null));
  let hIn = 0;
  let uIn = 0; // Σ n·(H − R·T) over the gases, Σ n·H over condensed phases
  let nTotal = 0;
  let weightedT = 0;
  const extrapolated: ExtrapolatedPoint[] = [];
  for (const r of resolved) {
    for (let i = 0; i < r.species.length; i++) {
      noteExtrapolation(extrapolated, r.species[i]!, r.T);
      const h = r.flows[i]! * r.species[i]!.enthalpy(r.T, ro);
      hIn += h;
      uIn += r.species[i]!.phase === "g" ? h - r.flows[i]! * GAS_CONSTANT_J_PER_MOL_K * r.T : h;
      nTotal += r.flows[i]!;
      weightedT += r.flows[i]! * r.T;
    }
  }
  const feed: Flows = {};
  for (const s of inlets) for (const [k, n] of Object.entries(s.flows)) feed[k] = (feed[k] ?? 0) + n;
  const ext = solveExtents({ feed, reactions: input.reactions, specs: input.specs });
  const outKeys: string[] = [];
  const outSpecies: Species[] = [];
  const outFlows: number[] = [];
  for (const [k, n] of Object.entries(ext.outlet)) {
    if (n <= 0) continue;
    outKeys.push(k);
    outSpecies.push(resolveSpeciesCached(fn, k, library));
    outFlows.push(n);
  }
  const limits = options.limitsK === undefined ? defaultLimits(outSpecies, extrapolate) : limitsOf(options.limitsK, fn);
  let outGas = 0;
  for (let i = 0; i < outSpecies.length; i++) if (outSpecies[i]!.phase === "g") outGas += outFlows[i]!;
  const rOutGas = rigid ? GAS_CONSTANT_J_PER_MOL_K * outGas : 0;
  const target = rigid ? uIn : hIn;
  const balance = (T: number): number => {
    let h = 0;
    for (let i = 0; i < outSpecies.length; i++) h += outFlows[i]! * outSpecies[i]!.enthalpy(T, ro);
    return h - rOutGas * T - target;
  };
  const slope = (T: number): number => {
    let c = 0;
    for (let i = 0; i < outSpecies.length; i++) c += outFlows[i]! * outSpecies[i]!.cp(T, ro);
    return c - rOutGas;
  };
  const start = clamp(nTotal > 0 ? weightedT / nTotal : resolved[0]!.T, limits);
  const width = Math.max(1, Math.min(100, (limits[1] - limits[0]) / 10));
  const bracket: [number, number] = start + width <= limits[1] ? [start, start + width] : [start - width, start];
  const root = findRoot(balance, bracket, {
    toleranceX: toleranceK,
    maxIterations: options.maxIterations ?? 100,
    limits,
    derivative: slope,
  });
  const outletFlows: Flows = {};
  outKeys.forEach((k, i) => { outletFlows[k] = outFlows[i]!; });
  const P = inlets[0]!.P;
  const outlet: Stream = P === undefined ? { T: root.root, flows: outletFlows } : { T: root.root, flows: outletFlows, P };
  noteExtrapolation(extrapolated, outSpecies, root.root);
  const result: AdiabaticReactionResult = {
    T: root.root, outlet, extents: [...ext.extents], iterations: root.iterations, residual: root.residual, inletEnthalpy: hIn, vessel, extrapolated,
  };
  // starting temperature: the batch T, or the adiabatic mixing temperature of the inlet streams
  let startT = resolved[0]!.T;
  if (resolved.some((r) => r.T !== startT)) {
    const mixSpecies = resolved.flatMap((r) => r.species);
    const mixFlows = resolved.flatMap((r) => r.flows);
    const mixLimits = options.limitsK === undefined ? defaultLimits(mixSpecies, extrapolate) : limitsOf(options.limitsK, fn);
    const mix = findRoot((T) => {
      let h = 0;
      for (let i = 0; i < mixSpecies.length; i++) {
        const s = mixSpecies[i]!;
        h += mixFlows[i]! * (s.enthalpy(T, ro) - (rigid && s.phase === "g" ? GAS_CONSTANT_J_PER_MOL_K * T : 0));
      }
      return h - target;
    }, [Math.min(...resolved.map((r) => r.T)), Math.max(...resolved.map((r) => r.T))], { toleranceX: toleranceK, limits: mixLimits });
    startT = mix.root;
    noteExtrapolation(extrapolated, mixSpecies, startT);
  }
  return { result, startT };
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });

function defaultLimits(species: readonly Species[], extrapolate: boolean): [number, number] {
  if (extrapolate) return [50, 10000];
  let lo = 0;
  let hi = Infinity;
  for (const s of species) {
    lo = Math.max(lo, s.range[0]);
    hi = Math.min(hi, s.range[1]);
  }
  if (!(lo < hi)) throw new RxthermError("OUT_OF_RANGE", `the outlet species have no common temperature range (${lo} K to ${hi} K)`, { range: [lo, hi] });
  return [lo, hi];
}

function clamp(x: number, [lo, hi]: readonly [number, number]): number {
  return Math.min(hi, Math.max(lo, x));
}

/** options.limitsK checked: a pair [low, high] of finite temperatures with 0 < low < high (K). */
function limitsOf(limits: unknown, fn: string): readonly [number, number] {
  const ok = Array.isArray(limits) && limits.length === 2 && typeof limits[0] === "number" && typeof limits[1] === "number" &&
    Number.isFinite(limits[0]) && Number.isFinite(limits[1]) && limits[0] > 0 && limits[1] > limits[0];
  if (!ok) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires options.limitsK to be [low, high] in K with 0 < low < high, got ${describeValue(limits)}`, {
      path: "options.limitsK",
      value: describeValue(limits),
    });
  }
  return limits as unknown as readonly [number, number];
}
