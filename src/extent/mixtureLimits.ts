/**
 * Plausibility limits of excess air and equivalence ratio, shared by every function that takes
 * them ({@link combustion}, the flame functions, `availableHeat`), so that a likely unit slip
 * (`excessAir: 12` meant as 12 %) is an error unless the caller says the value is meant.
 *
 * @module
 */
import { RxthermError, describeValue } from "../errors.js";

/**
 * Largest excess air (fraction) accepted without `allowExtremeMixture: true`: 3 = 300 % excess.
 * Fired equipment runs at a few to some tens of percent; a value above 3 is far more often a
 * percentage typed as a fraction (12 for 12 %) than a real mixture.
 *
 * @category Combustion
 * @example
 * MAX_EXCESS_AIR // => 3
 * @see common practice
 */
export const MAX_EXCESS_AIR = 3;

/**
 * Equivalence ratios φ accepted without `allowExtremeMixture: true`: 0.05 ≤ φ ≤ 20.
 *
 * @category Combustion
 * @example
 * EQUIVALENCE_RATIO_LIMITS // => [0.05, 20]
 * @see common practice
 */
export const EQUIVALENCE_RATIO_LIMITS: readonly [number, number] = /* @__PURE__ */ Object.freeze([0.05, 20]) as readonly [number, number];

/**
 * Throw `INVALID_ARGUMENT` when excess air is above {@link MAX_EXCESS_AIR} or an equivalence ratio
 * lies outside {@link EQUIVALENCE_RATIO_LIMITS}, unless `allowExtremeMixture` is true. Values that
 * are not finite numbers are left to the caller's own checks.
 *
 * @param fn - name of the calling function (for the message)
 * @param values - the excess air and/or equivalence ratio as given by the caller
 * @param allowExtremeMixture - the caller's opt-in (`true` accepts any value in the physical domain)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` (details: `path`, `excessAir` or `equivalenceRatio`, `limit`, `hint`), also when `values` is not an object
 * @category Combustion
 * @example
 * checkMixtureLimits("combustion", { excessAir: 0.15 }, false) // => undefined (no error)
 * @see common practice
 */
export function checkMixtureLimits(
  fn: string,
  values: { excessAir?: number | undefined; equivalenceRatio?: number | undefined },
  allowExtremeMixture: boolean | undefined,
): void {
  if (allowExtremeMixture === true) return;
  const name = typeof fn === "string" ? describeValue(fn) : "checkMixtureLimits";
  if (values === null || typeof values !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${name} requires the mixture values { excessAir?, equivalenceRatio? } as an object, got ${describeValue(values)}`, {
      path: "values",
      value: describeValue(values),
    });
  }
  const { excessAir, equivalenceRatio } = values;
  if (typeof excessAir === "number" && excessAir > MAX_EXCESS_AIR) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${name}: excessAir ${excessAir} means ${excessAir * 100} % excess air; excessAir is a fraction (0.2 = 20 %) — was ${excessAir} % meant (excessAir: ${excessAir / 100})? pass allowExtremeMixture: true if ${excessAir * 100} % is meant`,
      { path: "values.excessAir", excessAir, limit: MAX_EXCESS_AIR, hint: `was ${excessAir} % meant? excessAir: ${excessAir / 100}` },
    );
  }
  if (typeof equivalenceRatio === "number" && (equivalenceRatio < EQUIVALENCE_RATIO_LIMITS[0] || equivalenceRatio > EQUIVALENCE_RATIO_LIMITS[1])) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${name}: equivalenceRatio ${equivalenceRatio} is outside ${EQUIVALENCE_RATIO_LIMITS[0]}–${EQUIVALENCE_RATIO_LIMITS[1]}, far beyond any burner setting; check the value or pass allowExtremeMixture: true if it is meant`,
      { path: "values.equivalenceRatio", equivalenceRatio, limit: [...EQUIVALENCE_RATIO_LIMITS], hint: "check the equivalence ratio (fuel/oxidizer over its stoichiometric value)" },
    );
  }
}
