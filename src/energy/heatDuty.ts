import { RxthermError, describeValue, finiteResult, knownKeys, optionsOf, rejectUnknownKeys } from "../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K } from "../units.js";
import type { Library, Species } from "../species/types.js";
import { noteExtrapolation, type ExtrapolatedPoint } from "../species/noteExtrapolation.js";
import type { Reaction } from "../reaction/types.js";
import type { Stream } from "../extent/types.js";
import { resolveStream, type Entry, type ResolvedStream } from "./internal/energyStreams.js";
import { prepareReaction } from "../enthalpy/preparedReaction.js";
import { standardEnthalpyExact } from "../enthalpy/exactSum.js";
import { HEAT_DUTY_PROTOTYPE } from "./internal/energyView.js";

/** The keys heatDuty reads (a misspelt one is an error, not a silent default). */
const INPUT_KEYS = /* @__PURE__ */ knownKeys<HeatDutyInput>()("inlet", "outlet", "library", "reactions", "extents");
const OPTION_KEYS = /* @__PURE__ */ knownKeys<HeatDutyOptions>()("method", "warnings", "extrapolate", "vessel");

/**
 * Streams and optional reactions of an energy balance, for {@link heatDuty}.
 *
 * @category Energy
 */
export interface HeatDutyInput {
  /** Inlet stream(s): temperature in K and species flows in mol/s (steady flow) or amounts in mol (batch). */
  inlet: Stream | readonly Stream[];
  /** Outlet stream(s), in the same amount unit as the inlet. */
  outlet: Stream | readonly Stream[];
  /** Species library; the built-in set when omitted. @defaultValue the built-in library */
  library?: Library;
  /**
   * Reactions whose standard enthalpies make up the heat of reaction in the reaction method
   * (with `extents`). Without them the heat of reaction is Σ Δnᵢ·ΔfH°ᵢ of the net change.
   */
  reactions?: readonly (Reaction | string)[];
  /** Extent of each reaction, mol/s or mol (same unit as the flows). Required with `reactions`. */
  extents?: readonly number[];
}

/**
 * Options of {@link heatDuty}.
 *
 * @category Energy
 */
export interface HeatDutyOptions {
  /**
   * Which method gives `duty`: `"formation"` (Q = Σout n·H(T) − Σin n·H(T), species enthalpies including
   * ΔfH°) or `"reaction"` (Q = heat of reaction at 298.15 K + sensible heat of the outlet − sensible heat
   * of the inlet). Both are always computed and reported; they agree to rounding.
   * @defaultValue "formation"
   */
  method?: "formation" | "reaction";
  /**
   * Report sanity warnings for likely unit slips: a stream temperature below 200 K (°C given as K?) or
   * above 4000 K, a total flow above 10⁶ (kmol given as mol?). A negative or zero absolute
   * temperature is always an error.
   * @defaultValue false
   */
  warnings?: boolean;
  /** Extend Cp forms beyond their data range instead of throwing `OUT_OF_RANGE`. @defaultValue false */
  extrapolate?: boolean;
  /**
   * For a closed batch: `"constant-pressure"` gives Q = ΔH; `"constant-volume"` (a rigid vessel) gives
   * Q = ΔU = ΔH − Δ(PV), with PV = n·R·T for the gases and the PV of condensed phases neglected.
   * Open steady-flow units always use ΔH (leave the default).
   * @defaultValue "constant-pressure"
   */
  vessel?: "constant-pressure" | "constant-volume";
}

/**
 * Enthalpy of one stream in a {@link HeatDutyResult}.
 *
 * @category Energy
 */
export interface StreamHeat {
  /** Stream temperature, K. */
  readonly T: number;
  /** Σ n·H°(T) including formation enthalpies, W (flows) or J (amounts). */
  readonly enthalpy: number;
  /** Sensible heat above 298.15 K, Σ n·(H°(T) − ΔfH°), W or J (negative below 298.15 K). */
  readonly sensible: number;
}

/**
 * A species that changes phase between inlet and outlet, in a {@link HeatDutyResult}.
 *
 * @category Energy
 */
export interface PhaseChange {
  /** Key of the phase it leaves, e.g. `"H2O(l)"`. */
  readonly from: string;
  /** Key of the phase it enters, e.g. `"H2O(g)"`. */
  readonly to: string;
  /** Amount that changes phase, mol/s or mol. */
  readonly amount: number;
  /** Latent heat at 298.15 K, amount·(ΔfH°(to) − ΔfH°(from)), W or J. */
  readonly heat: number;
}

/**
 * Result of {@link heatDuty}; all heats in W for flows in mol/s, J for amounts in mol.
 *
 * @category Energy
 */
export interface HeatDutyResult {
  /** Heat added to the system (positive: heating, negative: cooling), by the chosen `method`. */
  readonly duty: number;
  /** The method that gave `duty`. */
  readonly method: "formation" | "reaction";
  /** Duty by the heat-of-formation method. */
  readonly formation: number;
  /** Duty by the heat-of-reaction method. */
  readonly reaction: number;
  /** Heat of reaction at 298.15 K, without the latent heat of phase changes. */
  readonly reactionHeat: number;
  /** Latent heat at 298.15 K of the species that change phase (sum of `phaseChanges`). */
  readonly latentHeat: number;
  /** Sensible heat of all inlet streams above 298.15 K. */
  readonly sensibleIn: number;
  /** Sensible heat of all outlet streams above 298.15 K. */
  readonly sensibleOut: number;
  /** Per-stream enthalpy and sensible heat, in input order. */
  readonly streams: { readonly inlet: readonly StreamHeat[]; readonly outlet: readonly StreamHeat[] };
  /** Species that change phase between inlet and outlet. */
  readonly phaseChanges: readonly PhaseChange[];
  /** Δ(PV) = R·(Σout n_gas·T − Σin n_gas·T) subtracted for `vessel: "constant-volume"`, else 0; J. */
  readonly pvTerm: number;
  /** Sanity warnings (only with `warnings: true`). */
  readonly warnings: readonly string[];
  /**
   * Each species evaluated outside its data range, with the stream temperature (possible only with
   * `extrapolate: true`); empty when every species was inside its range.
   */
  readonly extrapolated: readonly ExtrapolatedPoint[];
}

/**
 * Heat duty of a reactor, mixer, heater or any open steady-flow unit (flows in mol/s → W), or of a
 * closed batch at constant pressure (amounts in mol → J), by both the heat-of-formation and the
 * heat-of-reaction methods.
 *
 * First law with no shaft work and negligible kinetic and potential energy: Q = ΔH.
 * **Formation method:** Q = Σout nᵢ·H°ᵢ(T_out) − Σin nᵢ·H°ᵢ(T_in), each H°ᵢ(T) = ΔfH°ᵢ + ∫ Cp dT from
 * 298.15 K (reference: the elements at 298.15 K, 1 bar). **Reaction method:** Q = ΔH°rxn(298.15 K)
 * + Σout n·(H°(T) − ΔfH°) − Σin n·(H°(T) − ΔfH°): cool the feed to 298.15 K, react there, heat the
 * products; the heat of reaction is Σⱼ ξⱼ·ΔH°rxn,ⱼ (exact Hess sums) when `reactions` and `extents`
 * are given, otherwise Σ Δnᵢ·ΔfH°ᵢ of the net change. The two agree to rounding (they are the same
 * path-independent ΔH). The breakdown separates the latent heat at 298.15 K of any species that
 * changes phase between inlet and outlet (same formula, different phase key, e.g. H2O(l) → H2O(g)).
 * Ideal gases and ideal mixtures (no heats of mixing); pressure effects on H neglected. For a
 * rigid closed vessel pass `vessel: "constant-volume"`: the heat is then ΔU = ΔH − Δ(PV) with
 * PV = n·R·T for the gases (`pvTerm`).
 *
 * Before anything is computed the element balance is checked: streams whose elements do not balance
 * to 1e-9 relative (plus 1e-15 of the largest element flow, so round-off dust on a trace element is
 * ignored) throw `ELEMENT_IMBALANCE`, so no duty is ever reported for a wrong mass balance.
 *
 * @param input - inlet and outlet streams (T in K, flows in mol/s or amounts in mol), library, optional reactions and extents
 * @param options - which method gives `duty`, sanity warnings, extrapolation
 * @returns the duty in W (flows) or J (amounts) by both methods, with the breakdown
 * @throws RxthermError `ELEMENT_IMBALANCE` when inlet and outlet elements differ (details: `imbalance`, element → out − in)
 * @throws RxthermError `INVALID_ARGUMENT` for a temperature ≤ 0 K or not finite, a non-finite flow, extents without
 *   reactions (or of the wrong length), or reactions whose extents do not produce the stream change (details: `species`)
 * @throws RxthermError `NEGATIVE_FLOW` for a negative flow (details: `species`, `flow`)
 * @throws RxthermError `UNKNOWN_SPECIES`, `OUT_OF_RANGE`, `UNBALANCED_REACTION` from the data and reactions
 * @category Energy
 * @example
 * // heat 1 mol/s of N2 from 298.15 K to 500 K
 * heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } }).duty
 * // => 5910.7 (W, rounded; NIST-JANAF H°−H°298 of N2 at 500 K is 5.911 kJ/mol)
 * @see IUPAC Green Book, 3rd ed. (2007), §2.11 (standard reaction quantities); G. H. Hess, Pogg. Ann. 50 (1840) 385;
 *   G. Kirchhoff, Pogg. Ann. 103 (1858) 177.
 */
export function heatDuty(input: HeatDutyInput, options: HeatDutyOptions = {}): HeatDutyResult {
  options = optionsOf(options, "heatDuty");
  const fn = "heatDuty";
  if (input === null || typeof input !== "object") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object with inlet and outlet`, { input });
  rejectUnknownKeys(input, INPUT_KEYS, fn, "input");
  rejectUnknownKeys(options, OPTION_KEYS, fn, "options");
  const library = input.library;
  const extrapolate = options.extrapolate === true;
  const ro = extrapolate ? EXTRAPOLATE : undefined;
  const method = options.method ?? "formation";
  const vessel = options.vessel ?? "constant-pressure";
  if (vessel !== "constant-pressure" && vessel !== "constant-volume") throw new RxthermError("INVALID_ARGUMENT", `${fn} option vessel must be "constant-pressure" or "constant-volume", got ${describeValue(vessel)}`, { vessel });
  if (method !== "formation" && method !== "reaction") throw new RxthermError("INVALID_ARGUMENT", `${fn} option method must be "formation" or "reaction", got ${describeValue(method)}`, { method });
  const inlets = asStreams(fn, input.inlet, "inlet");
  const outlets = asStreams(fn, input.outlet, "outlet");
  const warnings: string[] = [];

  // ── resolve and validate everything before computing ──
  const net = new Map<string, Entry>();
  const inResolved = inlets.map((s, i) => resolveStream(fn, s, `inlet[${i}]`, library, net, -1, options.warnings === true ? warnings : null));
  const outResolved = outlets.map((s, i) => resolveStream(fn, s, `outlet[${i}]`, library, net, 1, options.warnings === true ? warnings : null));
  checkElements(fn, net);

  // ── reaction heat at 298.15 K ──
  let heat298: number;
  if (input.reactions !== undefined || input.extents !== undefined) {
    heat298 = heatFromReactions(fn, input.reactions, input.extents, library, net);
  } else {
    heat298 = 0;
    for (const e of net.values()) heat298 += e.delta * e.species.hf298;
  }

  // ── stream enthalpies ──
  const extrapolated: ExtrapolatedPoint[] = [];
  const streamHeat = (r: ResolvedStream): StreamHeat => {
    let h = 0;
    let sensible = 0;
    for (let i = 0; i < r.species.length; i++) {
      const s = r.species[i]!;
      const n = r.flows[i]!;
      const H = s.enthalpy(r.T, ro); // throws OUT_OF_RANGE outside the range unless extrapolating
      noteExtrapolation(extrapolated, s, r.T);
      h += n * H;
      sensible += n * (H - s.hf298);
    }
    return { T: r.T, enthalpy: h, sensible };
  };
  const inHeat = inResolved.map(streamHeat);
  const outHeat = outResolved.map(streamHeat);
  let hIn = 0, hOut = 0, sIn = 0, sOut = 0;
  for (const s of inHeat) { hIn += s.enthalpy; sIn += s.sensible; }
  for (const s of outHeat) { hOut += s.enthalpy; sOut += s.sensible; }
  // rigid closed vessel: Q = ΔU = ΔH − Δ(PV), PV = nRT for the gases
  let pvTerm = 0;
  if (vessel === "constant-volume") {
    const gasNT = (rs: readonly ResolvedStream[]): number => {
      let sum = 0;
      for (const r of rs) for (let i = 0; i < r.species.length; i++) if (r.species[i]!.phase === "g") sum += r.flows[i]! * r.T;
      return sum;
    };
    pvTerm = GAS_CONSTANT_J_PER_MOL_K * (gasNT(outResolved) - gasNT(inResolved));
  }
  const formation = clean(hOut - hIn - pvTerm);
  const reaction = clean(heat298 + sOut - sIn - pvTerm);

  // ── latent heat of phase changes ──
  const phaseChanges = findPhaseChanges(net);
  let latentHeat = 0;
  for (const p of phaseChanges) latentHeat += p.heat;

  // checked as a plain object, then made on the display prototype (non-enumerable display methods)
  const plain = finiteResult({
    duty: method === "formation" ? formation : reaction,
    method,
    formation,
    reaction,
    reactionHeat: clean(heat298 - latentHeat),
    latentHeat: clean(latentHeat),
    sensibleIn: clean(sIn),
    sensibleOut: clean(sOut),
    streams: { inlet: inHeat, outlet: outHeat },
    phaseChanges,
    pvTerm: clean(pvTerm),
    warnings,
    extrapolated,
  }, "heatDuty");
  return Object.assign(Object.create(HEAT_DUTY_PROTOTYPE) as HeatDutyResult, plain);
}

const EXTRAPOLATE = /* @__PURE__ */ Object.freeze({ extrapolate: true });

function clean(x: number): number {
  return x === 0 ? 0 : x;
}

function asStreams(fn: string, s: Stream | readonly Stream[] | undefined, label: string): readonly Stream[] {
  if (s === undefined || s === null) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${label} stream(s)`, { [label]: s });
  return Array.isArray(s) ? (s as readonly Stream[]) : [s as Stream];
}

/** ELEMENT_IMBALANCE unless Σin = Σout for every element (1e-9 relative). */
function checkElements(fn: string, net: Map<string, Entry>): void {
  // element totals in scratch arrays indexed by a module-wide element slot (no per-call maps)
  const used: number[] = [];
  for (const e of net.values()) {
    const v = elementVector(e.species);
    for (let k = 0; k < v.slots.length; k++) {
      const slot = v.slots[k]!;
      if (!slotUsed[slot]) { slotUsed[slot] = 1; used.push(slot); scratchIn[slot] = 0; scratchOut[slot] = 0; }
      scratchIn[slot] = scratchIn[slot]! + e.nIn * v.counts[k]!;
      scratchOut[slot] = scratchOut[slot]! + e.nOut * v.counts[k]!;
    }
  }
  // 1e-9 relative per element, plus 1e-15 of the largest element flow so that round-off dust on a
  // trace element (1e-300 mol) does not count as an imbalance
  let largest = 0;
  for (const slot of used) largest = Math.max(largest, Math.abs(scratchIn[slot]!), Math.abs(scratchOut[slot]!));
  let imbalance: Record<string, number> | null = null;
  for (const slot of used) {
    const a = scratchIn[slot]!;
    const b = scratchOut[slot]!;
    slotUsed[slot] = 0;
    if (Math.abs(b - a) > 1e-9 * Math.max(Math.abs(a), Math.abs(b)) + 1e-15 * largest) (imbalance ??= {})[slotSymbols[slot]!] = b - a;
  }
  if (imbalance) {
    throw new RxthermError(
      "ELEMENT_IMBALANCE",
      `${fn} requires the inlet and outlet elements to balance; out − in: ${Object.entries(imbalance).map(([e, v]) => `${e} ${v}`).join(", ")}`,
      { imbalance },
    );
  }
}

const MAX_SLOTS = 256;
const slotOf = new Map<string, number>();
const slotSymbols: string[] = [];
const scratchIn = /* @__PURE__ */ new Float64Array(MAX_SLOTS);
const scratchOut = /* @__PURE__ */ new Float64Array(MAX_SLOTS);
const slotUsed = /* @__PURE__ */ new Uint8Array(MAX_SLOTS);
const vectors = new WeakMap<Species, { slots: Int32Array; counts: Float64Array }>();

/** The species' element counts as (slot, count) arrays, cached per Species object. */
function elementVector(s: Species): { slots: Int32Array; counts: Float64Array } {
  let v = vectors.get(s);
  if (v === undefined) {
    const els = Object.entries(s.formula.elements);
    const slots = new Int32Array(els.length);
    const counts = new Float64Array(els.length);
    els.forEach(([el, c], k) => {
      let slot = slotOf.get(el);
      if (slot === undefined) {
        slot = slotSymbols.length;
        if (slot >= MAX_SLOTS) throw new RxthermError("INVALID_ARGUMENT", `heatDuty supports at most ${MAX_SLOTS} distinct element symbols`, { element: el });
        slotOf.set(el, slot);
        slotSymbols.push(el);
      }
      slots[k] = slot;
      counts[k] = c;
    });
    v = { slots, counts };
    vectors.set(s, v);
  }
  return v;
}

/** Σ ξⱼ·ΔH°rxn,ⱼ(298.15 K), after checking that the extents produce the net stream change. */
function heatFromReactions(
  fn: string, reactions: readonly (Reaction | string)[] | undefined, extents: readonly number[] | undefined,
  library: Library | undefined, net: Map<string, Entry>,
): number {
  if (!Array.isArray(reactions) || !Array.isArray(extents) || reactions.length !== extents.length) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires reactions and extents together, one extent per reaction`, {
      reactions: Array.isArray(reactions) ? reactions.length : reactions, extents: Array.isArray(extents) ? extents.length : extents,
    });
  }
  const change = new Map<string, number>();
  let heat = 0;
  reactions.forEach((r, j) => {
    const xi = extents[j];
    if (typeof xi !== "number" || !Number.isFinite(xi)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite extents, got ${describeValue(xi)} at index ${j}`, { index: j, extent: xi });
    const p = prepareReaction(fn, r, library);
    const dh = standardEnthalpyExact(p).toNumber();
    heat += xi * dh;
    p.species.forEach((s, i) => change.set(s.key, (change.get(s.key) ?? 0) + xi * p.nu[i]!));
  });
  const keys = new Set([...change.keys(), ...net.keys()]);
  for (const key of keys) {
    const fromStreams = net.get(key)?.delta ?? 0;
    const fromReactions = change.get(key) ?? 0;
    const e = net.get(key);
    const scale = Math.max(1e-300, e ? Math.max(e.nIn, e.nOut) : 0, Math.abs(fromReactions));
    if (Math.abs(fromStreams - fromReactions) > 1e-9 * scale) {
      throw new RxthermError(
        "INVALID_ARGUMENT",
        `${fn}: the reactions and extents change ${key} by ${fromReactions}, but the streams change it by ${fromStreams}`,
        { species: key, streamChange: fromStreams, reactionChange: fromReactions },
      );
    }
  }
  return heat;
}

/** Pair up species of one formula whose amount falls in one phase and rises in another. */
function findPhaseChanges(net: Map<string, Entry>): PhaseChange[] {
  const groups = new Map<string, Entry[]>();
  for (const e of net.values()) {
    if (e.delta === 0) continue;
    const g = formulaIdentity(e.species);
    const list = groups.get(g);
    if (list) list.push(e); else groups.set(g, [e]);
  }
  const out: PhaseChange[] = [];
  for (const list of groups.values()) {
    if (list.length < 2) continue;
    const falling = list.filter((e) => e.delta < 0).map((e) => ({ e, left: -e.delta }));
    const rising = list.filter((e) => e.delta > 0).map((e) => ({ e, left: e.delta }));
    for (const f of falling) {
      for (const r of rising) {
        const amount = Math.min(f.left, r.left);
        if (amount <= 0) continue;
        f.left -= amount;
        r.left -= amount;
        out.push({ from: f.e.species.key, to: r.e.species.key, amount, heat: amount * (r.e.species.hf298 - f.e.species.hf298) });
      }
    }
  }
  return out;
}

const identityCache = new WeakMap<Species, string>();
function formulaIdentity(s: Species): string {
  let id = identityCache.get(s);
  if (id === undefined) {
    const els = s.formula.elements;
    id = Object.keys(els).sort().map((k) => `${k}${els[k]}`).join("") + `^${s.formula.charge}`;
    identityCache.set(s, id);
  }
  return id;
}
