/**
 * Private machinery of the heat-capacity models: form validation and the reduction of every
 * Cp form to one canonical shape, Cp(T) = Σ c_k·T^k for k = −2..4 (T in K, Cp in J/(mol·K)),
 * whose enthalpy and entropy antiderivatives are exact closed forms.
 *
 * Never re-exported from src/index.ts.
 */
import { RxthermError, describeValue, requireArray } from "../../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K } from "../../units.js";
import type { CpForm, CpRange } from "../types.js";

/** Offset between °C and K. */
export const CELSIUS_OFFSET_K = 273.15;
/** Reference temperature of the sensible-heat integrals, K. */
export const REFERENCE_T_K = 298.15;

// Layout of one compiled segment inside the packed coefficient array.
/** Cp coefficients c_{-2}, c_{-1}, c0..c4 at offsets 0..6. */
export const CP_M2 = 0, CP_M1 = 1, CP_0 = 2, CP_1 = 3, CP_2 = 4, CP_3 = 5, CP_4 = 6;
/** H antiderivative: constant, 1/T, ln T, T..T^5. */
export const H_0 = 7, H_INV = 8, H_LN = 9, H_1 = 10, H_2 = 11, H_3 = 12, H_4 = 13, H_5 = 14;
/** S antiderivative: constant, ln T, 1/T, 1/T², T..T^4. */
export const S_0 = 15, S_LN = 16, S_INV = 17, S_INV2 = 18, S_1 = 19, S_2 = 20, S_3 = 21, S_4 = 22;
/** Number of float64 slots per segment. */
export const STRIDE = 24;

/** Canonical Cp coefficients [c_{-2}, c_{-1}, c0, c1, c2, c3, c4], J/(mol·K) with T in K. */
export type Canonical = [number, number, number, number, number, number, number];

/**
 * Absolute integration constants of a form that carries them: absolute H(T) = antiderivative + hConst
 * (J/mol), absolute S(T) = antiderivative + sConst (J/(mol·K)), both with the canonical antiderivatives.
 */
export interface AbsoluteConstants {
  readonly hConstJPerMol: number;
  readonly sConstJPerMolK: number;
}

/** Throw INVALID_DATA with a path. */
export function invalidData(fn: string, label: string | undefined, path: (string | number)[], requirement: string, received: unknown): never {
  throw new RxthermError(
    "INVALID_DATA",
    `${fn}${label ? ` (${label})` : ""}: ${requirement} at ${path.join(".")}, got ${short(received)}`,
    { label, path, received, issues: [{ path, message: requirement }] },
  );
}

function short(v: unknown): string {
  if (Array.isArray(v)) return `[${v.length} items]`;
  return describeValue(v);
}

/**
 * Most points in one tabulated Cp range (`temperaturesK`, `cpJPerMolK`). Building the exact
 * H and S integrals of a table costs about 12 µs per point; a larger table is TOO_LARGE.
 *
 * @category Heat capacity
 * @example
 * MAX_CP_TABLE_POINTS // => 10000
 */
export const MAX_CP_TABLE_POINTS = 10_000;

/**
 * Most Cp ranges in one heat-capacity model (one species). More is TOO_LARGE.
 *
 * @category Heat capacity
 * @example
 * MAX_CP_RANGES // => 1000
 */
export const MAX_CP_RANGES = 1000;

function isFiniteNumber(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}

/** Validate one form; throws INVALID_DATA naming the path. */
export function validateForm(fn: string, label: string | undefined, form: CpForm, path: (string | number)[], TminK: number, TmaxK: number, tolK: number): void {
  if (typeof form !== "object" || form === null) invalidData(fn, label, path, "a Cp form object is required", form);
  const f = form as unknown as Record<string, unknown>;
  const need = (key: string): void => {
    if (!isFiniteNumber(f[key])) invalidData(fn, label, [...path, key], "a finite number is required", f[key]);
  };
  const optional = (key: string): void => {
    if (f[key] !== undefined && !isFiniteNumber(f[key])) invalidData(fn, label, [...path, key], "a finite number (or nothing) is required", f[key]);
  };
  const coefficientArray = (n: number): void => {
    const a = f["a"];
    if (!Array.isArray(a) || a.length !== n) invalidData(fn, label, [...path, "a"], `exactly ${n} coefficients are required`, a);
    (a as unknown[]).forEach((v, i) => {
      if (!isFiniteNumber(v)) invalidData(fn, label, [...path, "a", i], "a finite number is required", v);
    });
  };
  switch (form.form) {
    case "shomate":
      for (const k of ["A", "B", "C", "D", "E"]) need(k);
      for (const k of ["F", "G", "H"]) optional(k);
      return;
    case "polynomial":
      need("a");
      for (const k of ["b", "c", "d", "e"]) optional(k);
      if (form.temperatureUnit !== "K" && form.temperatureUnit !== "C") {
        invalidData(fn, label, [...path, "temperatureUnit"], 'temperatureUnit "K" or "C" is required', form.temperatureUnit);
      }
      if (form.energyUnit !== "J" && form.energyUnit !== "kJ") {
        invalidData(fn, label, [...path, "energyUnit"], 'energyUnit "J" or "kJ" is required', form.energyUnit);
      }
      if (form.temperatureUnit === "C" && (form.e ?? 0) !== 0) {
        invalidData(fn, label, [...path, "e"], "a polynomial in °C cannot carry an inverse-square term (singular at 0 °C)", form.e);
      }
      return;
    case "nasa7":
      coefficientArray(7);
      return;
    case "nasa9":
      coefficientArray(9);
      return;
    case "constant":
      need("cpJPerMolK");
      return;
    case "tabulated": {
      const ts = f["temperaturesK"];
      const cs = f["cpJPerMolK"];
      if (!Array.isArray(ts) || ts.length < 2) invalidData(fn, label, [...path, "temperaturesK"], "at least two temperatures are required", ts);
      if (ts.length > MAX_CP_TABLE_POINTS) {
        throw new RxthermError("TOO_LARGE", `${fn}${label ? ` (${label})` : ""}: a Cp table holds at most ${MAX_CP_TABLE_POINTS} points, got ${ts.length}`, {
          label, path: [...path, "temperaturesK"], limit: MAX_CP_TABLE_POINTS, size: ts.length,
        });
      }
      if (!Array.isArray(cs) || cs.length !== (ts as unknown[]).length) {
        invalidData(fn, label, [...path, "cpJPerMolK"], "one Cp per tabulated temperature is required", cs);
      }
      const tArr = ts as unknown[];
      const cArr = cs as unknown[];
      for (let i = 0; i < tArr.length; i++) {
        const t = tArr[i];
        if (!isFiniteNumber(t) || t <= 0) invalidData(fn, label, [...path, "temperaturesK", i], "a finite temperature > 0 K is required", t);
        if (i > 0 && !(t > (tArr[i - 1] as number))) invalidData(fn, label, [...path, "temperaturesK", i], "strictly increasing temperatures are required", t);
        if (!isFiniteNumber(cArr[i])) invalidData(fn, label, [...path, "cpJPerMolK", i], "a finite number is required", cArr[i]);
      }
      const first = tArr[0] as number;
      const last = tArr[tArr.length - 1] as number;
      if (first > TminK + tolK || last < TmaxK - tolK) {
        invalidData(fn, label, [...path, "temperaturesK"], `the table must cover the range [${TminK}, ${TmaxK}] K`, [first, last]);
      }
      return;
    }
    default:
      invalidData(fn, label, [...path, "form"], 'a known form ("shomate", "polynomial", "nasa7", "nasa9", "constant", "tabulated") is required', (form as { form?: unknown }).form);
  }
}

/** Canonical coefficients of an analytic (non-tabulated) form. */
export function canonical(form: Exclude<CpForm, { form: "tabulated" }>): Canonical {
  const R = GAS_CONSTANT_J_PER_MOL_K;
  switch (form.form) {
    case "shomate":
      // t = T/1000: A + B·t + C·t² + D·t³ + E/t²
      return [form.E * 1e6, 0, form.A, form.B / 1e3, form.C / 1e6, form.D / 1e9, 0];
    case "polynomial": {
      const s = form.energyUnit === "kJ" ? 1000 : 1;
      const a = form.a, b = form.b ?? 0, c = form.c ?? 0, d = form.d ?? 0, e = form.e ?? 0;
      if (form.temperatureUnit === "K") return [s * e, 0, s * a, s * b, s * c, s * d, 0];
      // θ = T − 273.15; expand a + bθ + cθ² + dθ³ in powers of T (binomial theorem).
      const k = CELSIUS_OFFSET_K;
      return [
        0, 0,
        s * (a - b * k + c * k * k - d * k * k * k),
        s * (b - 2 * c * k + 3 * d * k * k),
        s * (c - 3 * d * k),
        s * d,
        0,
      ];
    }
    case "nasa7": {
      const a = form.a;
      return [0, 0, R * a[0]!, R * a[1]!, R * a[2]!, R * a[3]!, R * a[4]!];
    }
    case "nasa9": {
      const a = form.a;
      return [R * a[0]!, R * a[1]!, R * a[2]!, R * a[3]!, R * a[4]!, R * a[5]!, R * a[6]!];
    }
    case "constant":
      return [0, 0, form.cpJPerMolK, 0, 0, 0, 0];
  }
}

/** Absolute integration constants carried by a form, or null when it carries none. */
export function absoluteConstants(form: CpForm): AbsoluteConstants | null {
  const R = GAS_CONSTANT_J_PER_MOL_K;
  switch (form.form) {
    case "shomate":
      // H(T) = 1000·(A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t + F); S = A·ln t + … + G, ln t = ln T − ln 1000.
      if (form.F === undefined || form.G === undefined) return null;
      return { hConstJPerMol: 1000 * form.F, sConstJPerMolK: form.G - form.A * Math.log(1000) };
    case "nasa7":
      return { hConstJPerMol: R * form.a[5]!, sConstJPerMolK: R * form.a[6]! };
    case "nasa9":
      return { hConstJPerMol: R * form.a[7]!, sConstJPerMolK: R * form.a[8]! };
    default:
      return null;
  }
}

/** Write the Cp, H and S antiderivative coefficients of `c` into `out` at offset `o` (constants 0). */
export function writeSegment(out: Float64Array, o: number, c: Canonical): void {
  const [m2, m1, c0, c1, c2, c3, c4] = c;
  out[o + CP_M2] = m2; out[o + CP_M1] = m1; out[o + CP_0] = c0; out[o + CP_1] = c1;
  out[o + CP_2] = c2; out[o + CP_3] = c3; out[o + CP_4] = c4;
  // ∫Cp dT = −c₋₂/T + c₋₁·ln T + c0·T + c1·T²/2 + c2·T³/3 + c3·T⁴/4 + c4·T⁵/5
  out[o + H_0] = 0; out[o + H_INV] = -m2; out[o + H_LN] = m1;
  out[o + H_1] = c0; out[o + H_2] = c1 / 2; out[o + H_3] = c2 / 3; out[o + H_4] = c3 / 4; out[o + H_5] = c4 / 5;
  // ∫Cp/T dT = −c₋₂/(2T²) − c₋₁/T + c0·ln T + c1·T + c2·T²/2 + c3·T³/3 + c4·T⁴/4
  out[o + S_0] = 0; out[o + S_LN] = c0; out[o + S_INV] = -m1; out[o + S_INV2] = -m2 / 2;
  out[o + S_1] = c1; out[o + S_2] = c2 / 2; out[o + S_3] = c3 / 3; out[o + S_4] = c4 / 4;
}

/** Cp of the segment at offset o. */
export function cpAt(k: Float64Array, o: number, T: number): number {
  const inv = 1 / T;
  return k[o + CP_0]! + T * (k[o + CP_1]! + T * (k[o + CP_2]! + T * (k[o + CP_3]! + T * k[o + CP_4]!)))
    + inv * (k[o + CP_M1]! + inv * k[o + CP_M2]!);
}

/** H antiderivative (with the segment's constant) of the segment at offset o, J/mol. */
export function hAt(k: Float64Array, o: number, T: number): number {
  let v = k[o + H_0]! + T * (k[o + H_1]! + T * (k[o + H_2]! + T * (k[o + H_3]! + T * (k[o + H_4]! + T * k[o + H_5]!))))
    + k[o + H_INV]! / T;
  const l = k[o + H_LN]!;
  if (l !== 0) v += l * Math.log(T);
  return v;
}

/** S antiderivative (with the segment's constant) of the segment at offset o, J/(mol·K). */
export function sAt(k: Float64Array, o: number, T: number): number {
  const inv = 1 / T;
  return k[o + S_0]! + k[o + S_LN]! * Math.log(T)
    + T * (k[o + S_1]! + T * (k[o + S_2]! + T * (k[o + S_3]! + T * k[o + S_4]!)))
    + inv * (k[o + S_INV]! + inv * k[o + S_INV2]!);
}

/** Index of the segment that holds T (the lower one at a shared boundary; the end ones beyond). */
export function segmentIndex(upper: Float64Array, n: number, T: number): number {
  const last = n - 1;
  if (n <= 8) {
    let i = 0;
    while (i < last && T > upper[i]!) i++;
    return i;
  }
  let lo = 0, hi = last;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (T > upper[mid]!) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Sorted, validated copy of the ranges with their original indices. */
export interface PreparedRange {
  readonly index: number;
  readonly range: CpRange;
}

/** Deep, frozen copy of a form (inputs are never kept by reference). */
export function copyForm(form: CpForm): CpForm {
  switch (form.form) {
    case "nasa7":
    case "nasa9":
      return Object.freeze({ ...form, a: Object.freeze([...form.a]) });
    case "tabulated":
      return Object.freeze({ ...form, temperaturesK: Object.freeze([...form.temperaturesK]), cpJPerMolK: Object.freeze([...form.cpJPerMolK]) });
    default:
      return Object.freeze({ ...form });
  }
}

/** Validate ranges (each form, contiguity) and return sorted frozen copies. */
export function prepareRanges(fn: string, label: string | undefined, ranges: readonly CpRange[], tolK: number): CpRange[] {
  if (!Array.isArray(ranges) || ranges.length === 0) invalidData(fn, label, ["ranges"], "at least one Cp range is required", ranges);
  if (ranges.length > MAX_CP_RANGES) {
    throw new RxthermError("TOO_LARGE", `${fn}${label ? ` (${label})` : ""}: a heat-capacity model holds at most ${MAX_CP_RANGES} ranges, got ${ranges.length}`, {
      label, path: ["ranges"], limit: MAX_CP_RANGES, size: ranges.length,
    });
  }
  requireArray(ranges, fn, "ranges");
  const prepared: PreparedRange[] = [];
  ranges.forEach((r, i) => {
    if (typeof r !== "object" || r === null) invalidData(fn, label, ["ranges", i], "a range object is required", r);
    if (!isFiniteNumber(r.TminK) || r.TminK <= 0) invalidData(fn, label, ["ranges", i, "TminK"], "a finite temperature > 0 K is required", r.TminK);
    if (!isFiniteNumber(r.TmaxK) || !(r.TmaxK > r.TminK)) invalidData(fn, label, ["ranges", i, "TmaxK"], "a finite temperature above TminK is required", r.TmaxK);
    validateForm(fn, label, r.cp, ["ranges", i, "cp"], r.TminK, r.TmaxK, tolK);
    prepared.push({ index: i, range: r });
  });
  prepared.sort((x, y) => x.range.TminK - y.range.TminK);
  for (let j = 1; j < prepared.length; j++) {
    const prev = prepared[j - 1]!;
    const next = prepared[j]!;
    const d = next.range.TminK - prev.range.TmaxK;
    if (Math.abs(d) > tolK) {
      const problem = d > 0 ? "gap" : "overlap";
      throw new RxthermError(
        "INVALID_DATA",
        `${fn}${label ? ` (${label})` : ""}: ranges must be contiguous, found a ${problem} between ${prev.range.TmaxK} K and ${next.range.TminK} K`,
        {
          label, path: ["ranges", next.index, "TminK"], problem, boundary: [prev.range.TmaxK, next.range.TminK], ranges: [prev.index, next.index],
          issues: [{ path: ["ranges", next.index, "TminK"], message: `ranges must be contiguous (${problem})` }],
        },
      );
    }
  }
  return prepared.map((p) => Object.freeze({ TminK: p.range.TminK, TmaxK: p.range.TmaxK, cp: copyForm(p.range.cp) }));
}

/** Canonical coefficients of each piece of a range: one for an analytic form, one per table interval. */
export function rangePieces(r: CpRange): { lo: number; hi: number; c: Canonical }[] {
  const form = r.cp;
  if (form.form !== "tabulated") return [{ lo: r.TminK, hi: r.TmaxK, c: canonical(form) }];
  const ts = form.temperaturesK;
  const cs = form.cpJPerMolK;
  const pieces: { lo: number; hi: number; c: Canonical }[] = [];
  for (let i = 0; i + 1 < ts.length; i++) {
    const t0 = ts[i]!, t1 = ts[i + 1]!;
    const lo = Math.max(t0, r.TminK), hi = Math.min(t1, r.TmaxK);
    if (!(hi > lo)) continue;
    const m = (cs[i + 1]! - cs[i]!) / (t1 - t0);
    const q = cs[i]! - m * t0;
    pieces.push({ lo, hi, c: [0, 0, q, m, 0, 0, 0] });
  }
  if (pieces.length === 0) {
    // the range lies within one table interval beyond the ends (covered within tolerance)
    const i = ts[0]! >= r.TmaxK ? 0 : ts.length - 2;
    const t0 = ts[i]!, t1 = ts[i + 1]!;
    const m = (cs[i + 1]! - cs[i]!) / (t1 - t0);
    pieces.push({ lo: r.TminK, hi: r.TmaxK, c: [0, 0, cs[i]! - m * t0, m, 0, 0, 0] });
  }
  return pieces;
}

/** Cp of one form at T (J/(mol·K)); a table is interpolated linearly and extended from its end intervals. */
export function formCp(form: CpForm, T: number): number {
  if (form.form === "tabulated") {
    const ts = form.temperaturesK, cs = form.cpJPerMolK;
    let i = 0;
    while (i < ts.length - 2 && T > ts[i + 1]!) i++;
    const t0 = ts[i]!, t1 = ts[i + 1]!;
    return cs[i]! + ((cs[i + 1]! - cs[i]!) / (t1 - t0)) * (T - t0);
  }
  const k = new Float64Array(STRIDE);
  writeSegment(k, 0, canonical(form));
  return cpAt(k, 0, T);
}

/** Absolute H (J/mol) and S (J/(mol·K)) of one form at T from its own constants, or null without constants. */
export function formAbsolute(form: CpForm, T: number): { H: number; S: number } | null {
  const c = absoluteConstants(form);
  if (c === null || form.form === "tabulated") return null;
  const k = new Float64Array(STRIDE);
  writeSegment(k, 0, canonical(form));
  return { H: hAt(k, 0, T) + c.hConstJPerMol, S: sAt(k, 0, T) + c.sConstJPerMolK };
}
