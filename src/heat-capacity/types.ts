/**
 * Heat-capacity forms. Each form gives Cp°(T) in J/(mol·K) over one temperature range;
 * {@link CpRange} attaches the range; a species holds one or more contiguous ranges.
 *
 * @category Heat capacity
 */
export type CpForm =
  | ShomateForm
  | PolynomialForm
  | Nasa7Form
  | Nasa9Form
  | ConstantCpForm
  | TabulatedCpForm;

/**
 * Shomate equation (NIST Chemistry WebBook): Cp = A + B·t + C·t² + D·t³ + E/t², t = T/1000 K,
 * Cp in J/(mol·K). F and H (kJ/mol) and G (J/(mol·K)) give H − H°298 = A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t + F − H
 * (kJ/mol) and S = A·ln t + B·t + C·t²/2 + D·t³/3 − E/(2t²) + G.
 *
 * @category Heat capacity
 */
export interface ShomateForm {
  readonly form: "shomate";
  readonly A: number; readonly B: number; readonly C: number; readonly D: number; readonly E: number;
  /** kJ/mol */ readonly F?: number;
  /** J/(mol·K) */ readonly G?: number;
  /** kJ/mol */ readonly H?: number;
}

/**
 * Polynomial Cp = a + b·T + c·T² + d·T³ + e/T², with T in K or in °C and the coefficients
 * giving Cp in J/(mol·K) or kJ/(mol·K).
 *
 * @category Heat capacity
 */
export interface PolynomialForm {
  readonly form: "polynomial";
  readonly a: number; readonly b?: number; readonly c?: number; readonly d?: number; readonly e?: number;
  /** Temperature variable of the polynomial: `"K"` or `"C"` (°C). */
  readonly temperatureUnit: "K" | "C";
  /** Energy unit of the Cp the polynomial gives: `"J"` → J/(mol·K), `"kJ"` → kJ/(mol·K). */
  readonly energyUnit: "J" | "kJ";
}

/**
 * NASA 7-coefficient polynomial for one range: Cp/R = a1 + a2·T + a3·T² + a4·T³ + a5·T⁴,
 * H/(RT) = a1 + a2·T/2 + a3·T²/3 + a4·T³/4 + a5·T⁴/5 + a6/T, S/R = a1·ln T + a2·T + a3·T²/2 + a4·T³/3 + a5·T⁴/4 + a7.
 *
 * @category Heat capacity
 */
export interface Nasa7Form {
  readonly form: "nasa7";
  /** a1..a7 (dimensionless with T in K). */
  readonly a: readonly number[];
}

/**
 * NASA 9-coefficient polynomial for one range: Cp/R = a1·T⁻² + a2·T⁻¹ + a3 + a4·T + a5·T² + a6·T³ + a7·T⁴,
 * with integration constants b1 (enthalpy) and b2 (entropy).
 *
 * @category Heat capacity
 */
export interface Nasa9Form {
  readonly form: "nasa9";
  /** a1..a7 followed by b1, b2 (nine numbers, T in K). */
  readonly a: readonly number[];
}

/**
 * Constant heat capacity in J/(mol·K).
 *
 * @category Heat capacity
 */
export interface ConstantCpForm {
  readonly form: "constant";
  readonly cpJPerMolK: number;
}

/**
 * Tabulated (T, Cp) points, interpolated linearly between points and integrated exactly as that
 * piecewise-linear interpolant.
 *
 * @category Heat capacity
 */
export interface TabulatedCpForm {
  readonly form: "tabulated";
  /** Strictly increasing temperatures in K. */
  readonly temperaturesK: readonly number[];
  /** Cp at each temperature, J/(mol·K). */
  readonly cpJPerMolK: readonly number[];
}

/**
 * One Cp form valid over [TminK, TmaxK].
 *
 * @category Heat capacity
 */
export interface CpRange {
  /** Lower bound of validity, K. */
  readonly TminK: number;
  /** Upper bound of validity, K. */
  readonly TmaxK: number;
  /** The form valid over this range. */
  readonly cp: CpForm;
}

/**
 * Options of every evaluation that may leave the data range.
 *
 * @category Heat capacity
 */
export interface RangeOptions {
  /**
   * Evaluate outside the data range by extending the nearest range's form instead of throwing `OUT_OF_RANGE`.
   * @defaultValue false
   */
  extrapolate?: boolean;
}
