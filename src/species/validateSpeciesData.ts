import { RxthermError, knownKeys, optionsOf } from "../errors.js";
import { createHeatCapacity, MAX_CP_RANGES, MAX_CP_TABLE_POINTS } from "../heat-capacity/createHeatCapacity.js";
import type { CpRange } from "../heat-capacity/types.js";
import { readSpeciesFormula } from "./internal/speciesFormula.js";
import { SOURCES } from "./citation.js";
import { englishMessages, speciesDataSchema, speciesEntrySchema, type SpeciesData, type SpeciesEntry } from "./schema.js";

/** The option keys validateSpeciesData reads (a misspelt one is an error, not a silent default). */
const OPTION_KEYS = /* @__PURE__ */ knownKeys<ValidateSpeciesDataOptions>()("allowBuiltInSources");

/**
 * One problem found by {@link validateSpeciesData}: where it is (a path into the data, as zod
 * writes it) and what is wrong.
 *
 * @category Species data
 */
export interface SpeciesDataIssue {
  /** Path into the data, e.g. `["species", 2, "heatCapacity", "ranges", 1, "TminK"]`. */
  readonly path: readonly (string | number)[];
  /** What is wrong, lowercase. */
  readonly message: string;
}

/**
 * Options of {@link validateSpeciesData}.
 *
 * @category Species data
 */
export interface ValidateSpeciesDataOptions {
  /**
   * Accept source ids of the built-in registry ({@link SOURCES}) besides the file's own `sources`.
   * @defaultValue true
   */
  allowBuiltInSources?: boolean;
}

/**
 * Largest |ΔfH°| in kJ/mol that {@link validateSpeciesData} accepts; larger values are taken for J/mol
 * written in the kJ/mol field.
 * @category Species data
 * @example
 * MAX_ABS_HF298_KJ_PER_MOL // => 20000
 */
export const MAX_ABS_HF298_KJ_PER_MOL = 20000;
/**
 * Largest Cp in J/(mol·K) that {@link validateSpeciesData} accepts; larger values are taken for wrong
 * units (e.g. J/(kg·K)).
 * @category Species data
 * @example
 * MAX_CP_J_PER_MOL_K // => 3000
 */
export const MAX_CP_J_PER_MOL_K = 3000;
/**
 * Largest S°298 in J/(mol·K) that {@link validateSpeciesData} accepts.
 * @category Species data
 * @example
 * MAX_S298_J_PER_MOL_K // => 5000
 */
export const MAX_S298_J_PER_MOL_K = 5000;
/**
 * Highest lowest-range temperature in K that {@link validateSpeciesData} accepts: Cp data must reach
 * 298.15 K or start by 300 K (the NASA-polynomial convention; such data are read down to 298.15 K).
 * @category Species data
 * @example
 * MAX_LOWEST_TMIN_K // => 300
 */
export const MAX_LOWEST_TMIN_K = 300;
/** Number of Cp samples per range in the positivity check (plus both ends). */
const CP_SAMPLES = 200;
/** Deepest nesting walked; a species file needs about 8 levels. */
const MAX_DEPTH = 32;
/** Names that must never be used as object keys (prototype pollution). */
const UNSAFE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

/**
 * Most species in one species-data document (the opt-in database holds about 1,300). More is
 * TOO_LARGE, checked before any schema work so that oversized data fail fast.
 *
 * @category Species
 * @example
 * MAX_SPECIES_PER_DATA // => 20000
 */
export const MAX_SPECIES_PER_DATA = 20_000;

/** TOO_LARGE before the schema runs: species count, ranges per species, points per Cp table. */
function checkSizes(data: unknown): void {
  const tooLarge = (path: (string | number)[], limit: number, size: number, what: string): never => {
    throw new RxthermError("TOO_LARGE", `validateSpeciesData accepts at most ${limit} ${what}, got ${size} at ${path.join(".")}`, {
      path, limit, size,
    });
  };
  if (typeof data !== "object" || data === null) return;
  const list = (data as Record<string, unknown>)["species"];
  if (!Array.isArray(list)) return;
  if (list.length > MAX_SPECIES_PER_DATA) tooLarge(["species"], MAX_SPECIES_PER_DATA, list.length, "species");
  list.forEach((e, i) => {
    const hc = typeof e === "object" && e !== null ? (e as Record<string, unknown>)["heatCapacity"] : undefined;
    const ranges = typeof hc === "object" && hc !== null ? (hc as Record<string, unknown>)["ranges"] : undefined;
    if (!Array.isArray(ranges)) return;
    if (ranges.length > MAX_CP_RANGES) tooLarge(["species", i, "heatCapacity", "ranges"], MAX_CP_RANGES, ranges.length, "Cp ranges per species");
    ranges.forEach((r, j) => {
      const cp = typeof r === "object" && r !== null ? (r as Record<string, unknown>)["cp"] : undefined;
      const ts = typeof cp === "object" && cp !== null ? (cp as Record<string, unknown>)["temperaturesK"] : undefined;
      if (Array.isArray(ts) && ts.length > MAX_CP_TABLE_POINTS) {
        tooLarge(["species", i, "heatCapacity", "ranges", j, "cp", "temperaturesK"], MAX_CP_TABLE_POINTS, ts.length, "points per Cp table");
      }
    });
  });
}

/**
 * Validate a species data file (parsed JSON) and return a clean, typed copy of it.
 *
 * Structure is checked by {@link speciesDataSchema} (zod); on top of it every entry must have:
 * a formula of known elements; a key that is the formula with its phase (`CO2(g)`), optionally
 * with an isomer prefix (`n-C4H10(g)`) or, for condensed phases, a polymorph label (`C(gr)`);
 * Cp ranges sorted and contiguous (no gap, no overlap), reaching 298.15 K (or starting by 300 K),
 * with Cp > 0 and below {@link MAX_CP_J_PER_MOL_K} at 200 sample points per range and both ends;
 * a plausible ΔfH° (|ΔfH°| ≤ 20 000 kJ/mol: a J/mol value in the kJ/mol field is caught) and
 * 0 < S° ≤ 5000 J/(mol·K); transitions strictly inside the range, in increasing T; and a source id
 * on every value that resolves to the file's `sources` (or the built-in registry). Within a file,
 * a key may have one default entry and any number of `alternative` entries, each with its own
 * `dataset` (an alternative for a key the file does not otherwise hold is still accepted: it becomes the
 * default when the base library lacks the key). No object anywhere may have the key `__proto__`, `constructor` or `prototype`, and nothing may be nested deeper than 32 levels.
 *
 * Every problem is collected before anything is returned; the input is never modified.
 *
 * @param data - the parsed JSON of a species data file
 * @param options - see {@link ValidateSpeciesDataOptions}
 * @returns the validated data (a copy)
 * @throws RxthermError `INVALID_DATA` listing every problem, details `{ issues: SpeciesDataIssue[] }`
 * @category Species data
 * @example
 * validateSpeciesData({ sources: { x: "X" }, species: [] }).species.length // => 0
 * @see zod 4 issue paths (`path`), which the issue list follows
 */
export function validateSpeciesData(data: unknown, options: ValidateSpeciesDataOptions = {}): SpeciesData {
  options = optionsOf(options, "validateSpeciesData", "options", OPTION_KEYS);
  checkSizes(data);
  const issues: SpeciesDataIssue[] = [];
  findUnsafeKeys(data, [], issues, new Set());
  if (issues.length > 0) throw fail(issues);

  const whole = speciesDataSchema.safeParse(data, englishMessages());
  let parsed: SpeciesData | undefined;
  let entries: { index: number; entry: SpeciesEntry }[] = [];
  let sources: Record<string, string> = {};
  if (whole.success) {
    parsed = whole.data;
    entries = parsed.species.map((entry, index) => ({ index, entry }));
    sources = parsed.sources;
  } else {
    for (const i of whole.error.issues) issues.push({ path: i.path.map(pathPart), message: lower(i.message) });
    // keep checking what did parse, so that one pass lists every problem
    const raw = (typeof data === "object" && data !== null ? data : {}) as Record<string, unknown>;
    const list = Array.isArray(raw["species"]) ? (raw["species"] as unknown[]) : [];
    list.forEach((e, index) => {
      const r = speciesEntrySchema.safeParse(e, englishMessages());
      if (r.success) entries.push({ index, entry: r.data });
    });
    const src = raw["sources"];
    if (typeof src === "object" && src !== null) {
      for (const [k, v] of Object.entries(src)) if (typeof v === "string") sources[k] = v;
    }
  }

  const allowBuiltIn = options.allowBuiltInSources ?? true;
  const known = (id: string): boolean =>
    Object.prototype.hasOwnProperty.call(sources, id) || (allowBuiltIn && Object.prototype.hasOwnProperty.call(SOURCES, id));
  const defaults = new Map<string, number>();
  const variants = new Map<string, number>();
  for (const { index, entry } of entries) {
    checkEntry(entry, ["species", index], issues, known);
    if (entry.alternative === true) {
      if (entry.dataset === undefined) issues.push({ path: ["species", index, "dataset"], message: "an alternative entry needs a dataset label to be selected by" });
    } else {
      const prev = defaults.get(entry.key);
      if (prev !== undefined) issues.push({ path: ["species", index, "key"], message: `${entry.key} already has a default entry at species.${prev}; mark one of them alternative` });
      else defaults.set(entry.key, index);
    }
    if (entry.dataset !== undefined) {
      const id = `${entry.key}\u0000${entry.dataset}`;
      const prev = variants.get(id);
      if (prev !== undefined) issues.push({ path: ["species", index, "dataset"], message: `${entry.key} appears twice in dataset ${entry.dataset} (also at species.${prev})` });
      else variants.set(id, index);
    }
  }
  if (issues.length > 0 || parsed === undefined) throw fail(issues);
  return parsed;
}

// ── private helpers ──────────────────────────────────────────────────────────

function fail(issues: SpeciesDataIssue[]): RxthermError {
  const shown = issues.slice(0, 3).map((i) => `${i.path.join(".") || "(root)"}: ${i.message}`).join("; ");
  const more = issues.length > 3 ? `; and ${issues.length - 3} more` : "";
  return new RxthermError(
    "INVALID_DATA",
    `validateSpeciesData found ${issues.length} problem${issues.length === 1 ? "" : "s"} in the species data: ${shown}${more}`,
    { issues: Object.freeze(issues.map((i) => Object.freeze({ path: Object.freeze([...i.path]), message: i.message }))) },
  );
}

function pathPart(p: PropertyKey): string | number {
  return typeof p === "number" ? p : String(p);
}

function lower(message: string): string {
  return message.length > 0 ? message[0]!.toLowerCase() + message.slice(1) : message;
}

/** Walk every own key of every object and array; report the unsafe ones. */
function findUnsafeKeys(value: unknown, path: (string | number)[], issues: SpeciesDataIssue[], seen: Set<object>): void {
  if (typeof value !== "object" || value === null) return;
  if (path.length > MAX_DEPTH) {
    issues.push({ path: path.slice(0, 8), message: `the data are nested deeper than ${MAX_DEPTH} levels` });
    return;
  }
  if (seen.has(value)) {
    issues.push({ path, message: "the data contain a cycle (not JSON)" });
    return;
  }
  seen.add(value);
  if (Array.isArray(value)) {
    value.forEach((v, i) => findUnsafeKeys(v, [...path, i], issues, seen));
  } else {
    for (const k of Object.getOwnPropertyNames(value)) {
      if (UNSAFE_KEYS.has(k)) {
        issues.push({ path: [...path, k], message: `the key "${k}" is not allowed (prototype pollution)` });
        continue;
      }
      findUnsafeKeys((value as Record<string, unknown>)[k], [...path, k], issues, seen);
    }
  }
  seen.delete(value);
}

/** The semantic checks of one structurally valid entry. */
function checkEntry(e: SpeciesEntry, at: (string | number)[], issues: SpeciesDataIssue[], known: (id: string) => boolean): void {
  const add = (path: (string | number)[], message: string): void => {
    issues.push({ path: [...at, ...path], message });
  };
  // formula and key
  const reading = readSpeciesFormula(e.formula, e.phase);
  if (!reading.ok) add(["formula"], `the formula ${JSON.stringify(e.formula)} is not readable: ${reading.problem}`);
  const m = /^(?:([a-z0-9,]+)-)?(.+)\(([a-z]+)\)$/.exec(e.key);
  if (m === null) {
    add(["key"], `the key ${JSON.stringify(e.key)} must be the formula with its phase, e.g. ${e.formula}(${e.phase})`);
  } else {
    const keyFormula = m[2]!;
    const label = m[3]!;
    const condensed = e.phase === "cr" || e.phase === "s";
    if (keyFormula !== e.formula) add(["key"], `the key ${e.key} does not match the formula ${e.formula}`);
    if (label !== e.phase && !(condensed && /^[a-z]{1,12}$/.test(label) && label !== "g" && label !== "l" && label !== "aq")) {
      add(["key"], `the phase label (${label}) of the key ${e.key} does not match the phase ${e.phase}`);
    }
  }
  // values and units
  if (Math.abs(e.hf298KJPerMol) > MAX_ABS_HF298_KJ_PER_MOL) {
    add(["hf298KJPerMol"], `|ΔfH°| = ${Math.abs(e.hf298KJPerMol)} kJ/mol is implausible: the field is in kJ/mol (a J/mol value?)`);
  }
  if (!(e.s298JPerMolK > 0) || e.s298JPerMolK > MAX_S298_J_PER_MOL_K) {
    add(["s298JPerMolK"], `S° = ${e.s298JPerMolK} J/(mol·K) is outside (0, ${MAX_S298_J_PER_MOL_K}]: the field is in J/(mol·K)`);
  }
  // sources
  const src = (path: (string | number)[], id: string | undefined): void => {
    if (id !== undefined && !known(id)) add(path, `the source id ${JSON.stringify(id)} is not in the file's sources`);
  };
  src(["hf298Source"], e.hf298Source);
  src(["s298Source"], e.s298Source);
  src(["heatCapacity", "source"], e.heatCapacity.source);
  e.heatCapacity.ranges.forEach((r, i) => src(["heatCapacity", "ranges", i, "source"], r.source));
  (e.transitions ?? []).forEach((t, i) => src(["transitions", i, "source"], t.source));
  // ranges: order, contiguity, reference temperature, Cp > 0
  const ranges = e.heatCapacity.ranges;
  let rangesOk = true;
  ranges.forEach((r, i) => {
    const p = ["heatCapacity", "ranges", i];
    if (!(r.TminK < r.TmaxK)) {
      add([...p, "TmaxK"], `TmaxK (${r.TmaxK}) must be above TminK (${r.TminK})`);
      rangesOk = false;
    }
    if (i > 0) {
      const prev = ranges[i - 1]!;
      if (r.TminK > prev.TmaxK) {
        add([...p, "TminK"], `gap between ranges: ${prev.TmaxK} K to ${r.TminK} K has no data`);
        rangesOk = false;
      } else if (r.TminK < prev.TmaxK) {
        add([...p, "TminK"], `overlapping ranges: this range starts at ${r.TminK} K, below the end of the previous one (${prev.TmaxK} K)`);
        rangesOk = false;
      }
    }
    if (r.cp.form === "polynomial" && r.cp.temperatureUnit === "C" && (r.cp.e ?? 0) !== 0) {
      add([...p, "cp", "e"], "a polynomial in °C may not carry the e/T² term (singular at 0 °C)");
      rangesOk = false;
    }
    if (r.cp.form === "tabulated") {
      const t = r.cp.temperaturesK;
      if (t.length !== r.cp.cpJPerMolK.length) {
        add([...p, "cp", "cpJPerMolK"], `${r.cp.cpJPerMolK.length} Cp values for ${t.length} temperatures`);
        rangesOk = false;
      }
      if (t.some((x, j) => j > 0 && !(x > t[j - 1]!))) {
        add([...p, "cp", "temperaturesK"], "tabulated temperatures must increase strictly");
        rangesOk = false;
      } else if (!(t[0]! <= r.TminK && t[t.length - 1]! >= r.TmaxK)) {
        add([...p, "cp", "temperaturesK"], `the table (${t[0]}–${t[t.length - 1]} K) must cover the range ${r.TminK}–${r.TmaxK} K`);
        rangesOk = false;
      }
    }
  });
  const first = ranges[0]!;
  const last = ranges[ranges.length - 1]!;
  if (first.TminK > MAX_LOWEST_TMIN_K || last.TmaxK < 298.15) {
    add(["heatCapacity", "ranges"], `the Cp data (${first.TminK}–${last.TmaxK} K) must reach 298.15 K, the reference temperature of ΔfH° and S°`);
    rangesOk = false;
  }
  if (rangesOk) {
    ranges.forEach((r, i) => {
      const p = ["heatCapacity", "ranges", i];
      let model;
      try {
        model = createHeatCapacity([r as CpRange]);
      } catch (err) {
        add(p, err instanceof RxthermError ? err.message.replace(/^\[rxtherm\] /, "") : String(err));
        return;
      }
      for (let j = 0; j <= CP_SAMPLES; j++) {
        const T = j === CP_SAMPLES ? r.TmaxK : r.TminK + ((r.TmaxK - r.TminK) * j) / CP_SAMPLES;
        const cp = model.cp(T);
        if (!(cp > 0)) {
          add(p, `Cp is not positive at ${round(T)} K (${round(cp)} J/(mol·K))`);
          return;
        }
        if (cp > MAX_CP_J_PER_MOL_K) {
          add(p, `Cp = ${round(cp)} J/(mol·K) at ${round(T)} K is implausible: Cp is in J/(mol·K) (wrong units?)`);
          return;
        }
      }
    });
  }
  // transitions
  const lo = first.TminK, hi = last.TmaxK;
  (e.transitions ?? []).forEach((t, i) => {
    if (!(t.TK > lo && t.TK < hi)) add(["transitions", i, "TK"], `the transition at ${t.TK} K is not inside the Cp range ${lo}–${hi} K`);
    const prev = e.transitions![i - 1];
    if (prev !== undefined && !(t.TK > prev.TK)) add(["transitions", i, "TK"], "transitions must be listed in increasing temperature");
  });
}

function round(x: number): number {
  return Number(x.toPrecision(6));
}
