import { RxthermError, describeValue } from "../errors.js";
import { slipHintDetails, withSlipHint } from "../units.js";

/**
 * Saturation (vapour) pressure of water between its triple point and critical point.
 *
 * The IAPWS-IF97 saturation-pressure equation (region 4): with ϑ = T + n₉/(T − n₁₀),
 * A = ϑ² + n₁ϑ + n₂, B = n₃ϑ² + n₄ϑ + n₅, C = n₆ϑ² + n₇ϑ + n₈,
 * p_sat = [2C / (−B + √(B² − 4AC))]⁴ MPa. Used by {@link combustion} for humid air.
 *
 * @param temperatureK - temperature in K, 273.15 ≤ T ≤ 647.096
 * @returns saturation pressure in Pa
 * @throws {@link RxthermError} `OUT_OF_RANGE` outside 273.15–647.096 K (details: `T`, `range`)
 * @example
 * waterSaturationPressure(300) // => 3536.58941… (Pa)
 * @category Stoichiometry
 * @see IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam, eq. 30 and table 34 (coefficients), table 35 (check values)
 */
export function waterSaturationPressure(temperatureK: number): number {
  if (typeof temperatureK !== "number" || !Number.isFinite(temperatureK) || temperatureK < 273.15 || temperatureK > 647.096) {
    throw new RxthermError("OUT_OF_RANGE", `waterSaturationPressure requires 273.15 <= T <= 647.096 K, got ${describeValue(temperatureK)}${withSlipHint(temperatureK)}`, {
      path: "temperatureK",
      T: typeof temperatureK === "number" ? temperatureK : describeValue(temperatureK),
      range: [273.15, 647.096],
      ...slipHintDetails(temperatureK),
    });
  }
  const T = temperatureK;
  const theta = T + N9 / (T - N10);
  const A = theta * theta + N1 * theta + N2;
  const B = N3 * theta * theta + N4 * theta + N5;
  const C = N6 * theta * theta + N7 * theta + N8;
  const x = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return x * x * x * x * 1e6;
}

/**
 * Saturation temperature of water at a pressure between its triple point and critical point — the
 * inverse of {@link waterSaturationPressure}, and the water dew point of a gas whose water partial
 * pressure is `pressurePa`.
 *
 * The IAPWS-IF97 saturation-temperature equation (region 4, backward): with β = (p/1 MPa)^¼,
 * E = β² + n₃β + n₆, F = n₁β² + n₄β + n₇, G = n₂β² + n₅β + n₈, D = 2G/(−F − √(F² − 4EG)),
 * T_sat = [n₁₀ + D − √((n₁₀ + D)² − 4(n₉ + n₁₀D))]/2 K. Same coefficients as the saturation-pressure
 * equation; the two are consistent to far better than a millikelvin.
 *
 * @param pressurePa - pressure in Pa, 611.213 ≤ p ≤ 22 064 000 (triple point to critical point)
 * @returns saturation temperature in K
 * @throws {@link RxthermError} `OUT_OF_RANGE` outside 611.213 Pa – 22.064 MPa (details: `P`, `range`)
 * @example
 * waterSaturationTemperature(101325) // => 373.1243… (K, the normal boiling point on the IF97 line)
 * @category Stoichiometry
 * @see IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam, eq. 31 and table 34 (coefficients), table 35 (check values)
 */
export function waterSaturationTemperature(pressurePa: number): number {
  if (typeof pressurePa !== "number" || !Number.isFinite(pressurePa) || pressurePa < P_TRIPLE_PA || pressurePa > P_CRITICAL_PA) {
    throw new RxthermError("OUT_OF_RANGE", `waterSaturationTemperature requires ${P_TRIPLE_PA} <= p <= ${P_CRITICAL_PA} Pa, got ${describeValue(pressurePa)}`, {
      path: "pressurePa",
      P: typeof pressurePa === "number" ? pressurePa : describeValue(pressurePa),
      range: [P_TRIPLE_PA, P_CRITICAL_PA],
    });
  }
  const beta = Math.sqrt(Math.sqrt(pressurePa / 1e6));
  const E = beta * beta + N3 * beta + N6;
  const F = N1 * beta * beta + N4 * beta + N7;
  const G = N2 * beta * beta + N5 * beta + N8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  const s = N10 + D;
  return (s - Math.sqrt(s * s - 4 * (N9 + N10 * D))) / 2;
}

/** Triple-point pressure of the IF97 saturation line, Pa (IAPWS R7-97: p_sat(273.16 K) = 611.213 Pa). */
const P_TRIPLE_PA = 611.213;
/** Critical pressure, Pa (IAPWS R7-97: 22.064 MPa). */
const P_CRITICAL_PA = 22.064e6;

// IAPWS-IF97 region 4 coefficients n1..n10 (IAPWS R7-97(2012), table 34) — written from memory; they
// reproduce the release's table 35 check values to 9 significant digits (tests/extent/waterSaturationPressure.test.ts)
const N1 = 0.11670521452767e4;
const N2 = -0.72421316703206e6;
const N3 = -0.17073846940092e2;
const N4 = 0.12020824702470e5;
const N5 = -0.32325550322333e7;
const N6 = 0.14915108613530e2;
const N7 = -0.48232657361591e4;
const N8 = 0.40511340542057e6;
const N9 = -0.23855557567849;
const N10 = 0.65017534844798e3;
