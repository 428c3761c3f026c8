import { RxthermError, describeValue, finiteResult, optionsOf } from "../errors.js";
import { GAS_CONSTANT_J_PER_MOL_K } from "../units.js";
import { CELSIUS_OFFSET_K, REFERENCE_T_K, STRIDE, canonical, formCp, hAt, sAt, writeSegment } from "./internal/cpCompile.js";
import { leastSquares } from "../numeric/leastSquares.js";
import type { CpForm, CpRange } from "./types.js";

/**
 * One measured or tabulated heat capacity: temperature `T` in K and `cp` in J/(mol·K).
 *
 * @category Heat capacity
 */
export interface CpPoint {
  /** Temperature, K. */
  readonly T: number;
  /** Heat capacity, J/(mol·K). */
  readonly cp: number;
}

/** The forms {@link fitCp} can fit. @category Heat capacity */
export type FitCpFormName = "shomate" | "polynomial" | "nasa7" | "nasa9" | "constant";

/**
 * Options of {@link fitCp}.
 *
 * @category Heat capacity
 */
export interface FitCpOptions {
  /**
   * Standard enthalpy of formation (J/mol) and standard entropy (J/(mol·K)) at 298.15 K that the
   * fitted form's absolute constants must reproduce exactly (Shomate F, G and H; NASA-7 a6, a7;
   * NASA-9 b1, b2). They do not change the fitted Cp. Not available for "polynomial" and "constant",
   * which carry no constants.
   * @defaultValue undefined — Shomate F/G/H are left out; NASA a6, a7 (b1, b2) are set to 0
   */
  match?: { hf298?: number; s298?: number };
  /**
   * Like `match`, at another temperature: the absolute H (J/mol) and S (J/(mol·K)) the form must
   * give at `TK` — how the upper range of a two-range set is made to join the lower one.
   * Cannot be combined with `match`.
   * @defaultValue undefined
   */
  matchAt?: { TK: number; HJPerMol?: number; SJPerMolK?: number };
  /**
   * Lower bound of the returned range, K.
   * @defaultValue the lowest T of the points
   */
  TminK?: number;
  /**
   * Upper bound of the returned range, K.
   * @defaultValue the highest T of the points
   */
  TmaxK?: number;
  /**
   * Polynomial only: the temperature variable, K or °C.
   * @defaultValue "K"
   */
  temperatureUnit?: "K" | "C";
  /**
   * Polynomial only: the energy unit of the coefficients, giving Cp in J/(mol·K) or kJ/(mol·K).
   * @defaultValue "J"
   */
  energyUnit?: "J" | "kJ";
  /**
   * Polynomial only: the highest power of T (0 to 3).
   * @defaultValue 3
   */
  degree?: 0 | 1 | 2 | 3;
  /**
   * Polynomial only (T in K): also fit the e/T² term.
   * @defaultValue false
   */
  inverseSquare?: boolean;
}

/**
 * Result of {@link fitCp}.
 *
 * @category Heat capacity
 */
export interface FitCpResult {
  /** The fitted range, ready for {@link createHeatCapacity}. */
  readonly range: CpRange;
  /**
   * The fitted Cp coefficients in the form's order: Shomate [A, B, C, D, E]; polynomial [a, b, c, d, e]
   * up to the chosen degree (e last when fitted); NASA-7 [a1…a5]; NASA-9 [a1…a7]; constant [Cp].
   */
  readonly coefficients: readonly number[];
  /** Largest |fitted − given| Cp over the points, J/(mol·K). */
  readonly maxResidualJPerMolK: number;
  /** Root-mean-square residual over the points, J/(mol·K). */
  readonly rmsResidual: number;
}

/**
 * Fit a heat-capacity form to (T, Cp) points by linear least squares, optionally fixing its absolute
 * constants to a given ΔfH° and S° at 298.15 K.
 *
 * Every form is linear in its Cp coefficients, so the fit minimises Σ(Cp_fit − Cp_i)² over the basis
 * of the form: Shomate [1, t, t², t³, t⁻²] with t = T/1000; polynomial [1, x, x², x³] up to `degree`
 * (plus x⁻² with `inverseSquare`), x = T in K or θ = T − 273.15 in °C; NASA-7 R·[1, T, …, T⁴];
 * NASA-9 R·[T⁻², T⁻¹, 1, T, …, T⁴]; constant [1]. The system is solved by Householder QR after
 * scaling each column to unit norm, never through the normal equations AᵀA (whose condition number
 * is the square of A's): with T up to several thousand K the columns 1…T⁴ span twenty orders of
 * magnitude.
 *
 * Constants: a form's absolute enthalpy is H(T) = ∫Cp dT + const, so making it equal ΔfH° at
 * 298.15 K fixes the constant. Shomate: F = ΔfH°/1000 − (A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t) at
 * t = 0.29815 (kJ/mol), H = ΔfH°/1000 (the WebBook convention, so that H − H°298 = … + F − H vanishes
 * at 298.15 K) and G = S° − (A·ln t + B·t + C·t²/2 + D·t³/3 − E/(2t²)). NASA-7:
 * a6 = ΔfH°/R − (a1·T + a2·T²/2 + a3·T³/3 + a4·T⁴/4 + a5·T⁵/5), a7 = S°/R − (a1·ln T + a2·T + a3·T²/2 +
 * a4·T³/3 + a5·T⁴/4) at T = 298.15 K; NASA-9 alike with b1 and b2. The constants never alter Cp.
 *
 * @param points - at least as many (T in K, Cp in J/(mol·K)) points as the form has Cp coefficients, at distinct temperatures
 * @param form - which form to fit
 * @param options - constants to match, range bounds, polynomial settings
 * @returns the range with the fitted form, its Cp coefficients and the residuals in J/(mol·K)
 * @throws RxthermError `INVALID_ARGUMENT` for a bad point (details `{ index, point }`), too few points or too
 *   few distinct temperatures (`{ form, points, coefficients }`), bad options, or `match` on a form without constants
 * @category Heat capacity
 * @example
 * // Cp of O2(g) from NIST-JANAF (table O-029), 298.15–3000 K
 * const fit = fitCp(
 *   [{ T: 298.15, cp: 29.376 }, { T: 500, cp: 31.091 }, { T: 1000, cp: 34.87 }, { T: 1500, cp: 36.544 },
 *    { T: 2000, cp: 37.741 }, { T: 2500, cp: 38.856 }, { T: 3000, cp: 39.864 }],
 *   "shomate", { match: { hf298: 0, s298: 205.147 } });
 * fit.maxResidualJPerMolK                                  // => 0.21 J/(mol·K) (rounded)
 * createHeatCapacity([fit.range]).absoluteEntropy(298.15)  // => 205.147 J/(mol·K)
 * @see G. H. Golub, C. F. Van Loan, Matrix Computations, 4th ed. (2013), §5.3: least squares by QR
 * @see NIST Chemistry WebBook, SRD 69: Shomate equation and the meaning of F, G, H
 */
export function fitCp(points: readonly CpPoint[], form: FitCpFormName, options: FitCpOptions = {}): FitCpResult {
  options = optionsOf(options, "fitCp");
  const fn = "fitCp";
  if (!Array.isArray(points)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an array of points`, { points });
  points.forEach((p, index) => {
    if (typeof p !== "object" || p === null || typeof p.T !== "number" || !Number.isFinite(p.T) || p.T <= 0
      || typeof p.cp !== "number" || !Number.isFinite(p.cp)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires every point to have a finite T > 0 K and a finite cp`, { index, point: p });
    }
  });
  const basis = basisOf(fn, form, options);
  if (options.match !== undefined && options.matchAt !== undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} accepts match or matchAt, not both`, { match: options.match, matchAt: options.matchAt });
  }
  const matching = options.match ?? options.matchAt;
  if (matching !== undefined && (form === "polynomial" || form === "constant")) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot match H or S with the ${form} form, which carries no integration constants`, { form });
  }
  const m = points.length, n = basis.count;
  if (m < n) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} needs at least ${n} points for the ${form} form, got ${m}`, { form, points: m, coefficients: n });
  }
  let tLo = Infinity, tHi = -Infinity;
  for (const p of points) { tLo = Math.min(tLo, p.T); tHi = Math.max(tHi, p.T); }
  const TminK = options.TminK ?? tLo;
  const TmaxK = options.TmaxK ?? tHi;
  if (!(Number.isFinite(TminK) && Number.isFinite(TmaxK) && TminK > 0 && TmaxK > TminK)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires 0 < TminK < TmaxK, got [${TminK}, ${TmaxK}]`, { TminK, TmaxK });
  }

  const A = new Float64Array(m * n);
  const b = new Float64Array(m);
  const row = new Float64Array(n);
  points.forEach((p, i) => {
    basis.row(p.T, row);
    A.set(row, i * n);
    b[i] = p.cp / basis.yScale;
  });
  const { x } = leastSquares(A, b, m, n);
  if (x === null) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot determine the ${n} coefficients of the ${form} form: too few distinct temperatures`, {
      form, points: m, coefficients: n,
    });
  }
  const coefficients = Object.freeze(Array.from(x));
  const cpForm = buildForm(form, coefficients, options);
  let maxRes = 0, sumSq = 0;
  for (const p of points) {
    const r = formCp(cpForm, p.T) - p.cp;
    maxRes = Math.max(maxRes, Math.abs(r));
    sumSq += r * r;
  }
  finiteResult(cpForm, "fitCp"); // points such as Cp = 1e308 overflow the least-squares fit
  return Object.freeze({
    range: Object.freeze({ TminK, TmaxK, cp: cpForm }),
    coefficients,
    maxResidualJPerMolK: maxRes,
    rmsResidual: Math.sqrt(sumSq / m),
  });
}

interface Basis {
  readonly count: number;
  /** Divide Cp by this to get the fitted quantity (R for NASA forms, 1000 for kJ polynomials). */
  readonly yScale: number;
  row(T: number, out: Float64Array): void;
}

function basisOf(fn: string, form: FitCpFormName, o: FitCpOptions): Basis {
  switch (form) {
    case "shomate":
      return { count: 5, yScale: 1, row: (T, r) => { const t = T / 1000; r[0] = 1; r[1] = t; r[2] = t * t; r[3] = t * t * t; r[4] = 1 / (t * t); } };
    case "nasa7":
      return { count: 5, yScale: GAS_CONSTANT_J_PER_MOL_K, row: (T, r) => { r[0] = 1; r[1] = T; r[2] = T * T; r[3] = T * T * T; r[4] = T * T * T * T; } };
    case "nasa9":
      return {
        count: 7, yScale: GAS_CONSTANT_J_PER_MOL_K,
        row: (T, r) => { r[0] = 1 / (T * T); r[1] = 1 / T; r[2] = 1; r[3] = T; r[4] = T * T; r[5] = T * T * T; r[6] = T * T * T * T; },
      };
    case "constant":
      return { count: 1, yScale: 1, row: (_T, r) => { r[0] = 1; } };
    case "polynomial": {
      const degree = o.degree ?? 3;
      const unit = o.temperatureUnit ?? "K";
      const energy = o.energyUnit ?? "J";
      const inv = o.inverseSquare ?? false;
      if (![0, 1, 2, 3].includes(degree)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires degree 0, 1, 2 or 3, got ${describeValue(degree)}`, { degree });
      if (unit !== "K" && unit !== "C") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires temperatureUnit "K" or "C", got ${describeValue(unit)}`, { temperatureUnit: unit });
      if (energy !== "J" && energy !== "kJ") throw new RxthermError("INVALID_ARGUMENT", `${fn} requires energyUnit "J" or "kJ", got ${describeValue(energy)}`, { energyUnit: energy });
      if (inv && unit === "C") {
        throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot fit an inverse-square term to a polynomial in °C (singular at 0 °C)`, { temperatureUnit: unit, inverseSquare: inv });
      }
      const shift = unit === "C" ? CELSIUS_OFFSET_K : 0;
      return {
        count: degree + 1 + (inv ? 1 : 0),
        yScale: energy === "kJ" ? 1000 : 1,
        row: (T, r) => {
          const v = T - shift;
          let p = 1;
          for (let k = 0; k <= degree; k++) { r[k] = p; p *= v; }
          if (inv) r[degree + 1] = 1 / (v * v);
        },
      };
    }
    default:
      throw new RxthermError("INVALID_ARGUMENT", `${fn} cannot fit the form ${describeValue(form)}; use "shomate", "polynomial", "nasa7", "nasa9" or "constant"`, { form });
  }
}

function buildForm(form: FitCpFormName, c: readonly number[], o: FitCpOptions): CpForm {
  const R = GAS_CONSTANT_J_PER_MOL_K;
  switch (form) {
    case "constant":
      return Object.freeze({ form: "constant", cpJPerMolK: c[0]! });
    case "polynomial": {
      const degree = o.degree ?? 3;
      const names = ["a", "b", "c", "d"] as const;
      const f: Record<string, unknown> = { form: "polynomial", temperatureUnit: o.temperatureUnit ?? "K", energyUnit: o.energyUnit ?? "J" };
      for (let k = 0; k <= degree; k++) f[names[k]!] = c[k]!;
      if (o.inverseSquare) f["e"] = c[degree + 1]!;
      return Object.freeze(f) as unknown as CpForm;
    }
    case "shomate": {
      const [A, B, C, D, E] = c as [number, number, number, number, number];
      const base = { form: "shomate" as const, A, B, C, D, E };
      const target = matchTarget(o);
      if (target === null) return Object.freeze(base);
      const { h, s } = rawAntiderivatives(canonical(base), target.T);
      // absolute H = raw + 1000·F; absolute S = raw + G − A·ln 1000 (see canonical / absoluteConstants)
      const out: { form: "shomate"; A: number; B: number; C: number; D: number; E: number; F?: number; G?: number; H?: number } = { ...base };
      if (target.H !== undefined) {
        out.F = (target.H - h) / 1000;
        if (o.match !== undefined) out.H = target.H / 1000;
      }
      if (target.S !== undefined) out.G = target.S - s + A * Math.log(1000);
      return Object.freeze(out);
    }
    case "nasa7":
    case "nasa9": {
      const a = [...c];
      // constants 0 while the antiderivatives at the match temperature are evaluated
      const tmp: CpForm = { form, a: [...a, 0, 0] };
      const target = matchTarget(o);
      let hc = 0, sc = 0;
      if (target !== null) {
        const { h, s } = rawAntiderivatives(canonical(tmp as Exclude<CpForm, { form: "tabulated" }>), target.T);
        if (target.H !== undefined) hc = (target.H - h) / R;
        if (target.S !== undefined) sc = (target.S - s) / R;
      }
      return Object.freeze({ form, a: Object.freeze([...a, hc, sc]) });
    }
  }
}

function matchTarget(o: FitCpOptions): { T: number; H?: number; S?: number } | null {
  const check = (name: string, v: number | undefined): void => {
    if (v !== undefined && (typeof v !== "number" || !Number.isFinite(v))) {
      throw new RxthermError("INVALID_ARGUMENT", `fitCp requires ${name} to be a finite number, got ${describeValue(v)}`, { [name]: v });
    }
  };
  if (o.match !== undefined) {
    check("match.hf298", o.match.hf298);
    check("match.s298", o.match.s298);
    const t: { T: number; H?: number; S?: number } = { T: REFERENCE_T_K };
    if (o.match.hf298 !== undefined) t.H = o.match.hf298;
    if (o.match.s298 !== undefined) t.S = o.match.s298;
    return t;
  }
  if (o.matchAt !== undefined) {
    const TK = o.matchAt.TK;
    if (typeof TK !== "number" || !Number.isFinite(TK) || TK <= 0) {
      throw new RxthermError("INVALID_ARGUMENT", `fitCp requires matchAt.TK to be a finite temperature > 0 K, got ${describeValue(TK)}`, { TK });
    }
    check("matchAt.HJPerMol", o.matchAt.HJPerMol);
    check("matchAt.SJPerMolK", o.matchAt.SJPerMolK);
    const t: { T: number; H?: number; S?: number } = { T: TK };
    if (o.matchAt.HJPerMol !== undefined) t.H = o.matchAt.HJPerMol;
    if (o.matchAt.SJPerMolK !== undefined) t.S = o.matchAt.SJPerMolK;
    return t;
  }
  return null;
}

/** The constant-free H and S antiderivatives of canonical coefficients at T. */
function rawAntiderivatives(c: ReturnType<typeof canonical>, T: number): { h: number; s: number } {
  const k = new Float64Array(STRIDE);
  writeSegment(k, 0, c);
  return { h: hAt(k, 0, T), s: sAt(k, 0, T) };
}
