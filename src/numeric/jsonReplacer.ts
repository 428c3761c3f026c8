/**
 * A `JSON.stringify` replacer for the BigInt values of the integer helpers.
 *
 * @module
 */

/**
 * Replacer for `JSON.stringify` that writes a BigInt as its decimal text (`12n` → `"12"`).
 *
 * Every result object of rxtherm is JSON-safe as it is — exact fractions ({@link Rational})
 * carry a `toJSON` that gives their text (`"25/2"`). Only the integer helpers whose job is to
 * return BigInts ({@link gcdBigInt}, {@link lcmBigInt}, {@link scaleToCoprimeIntegers},
 * {@link divideByGcd}, {@link integerNullSpace}) hand back bare BigInts, which `JSON.stringify`
 * refuses; pass this replacer for those. Text, not a number, so no digit is lost above 2^53.
 *
 * Non-finite numbers (NaN, ±Infinity) become `null`, which is what `JSON.stringify` writes for
 * them anyway; the replacer itself thus never hands back a non-finite number.
 *
 * @param _key - the property name (unused)
 * @param value - the value being written
 * @returns the decimal text of a BigInt, `null` for NaN and ±Infinity, any other value unchanged
 * @category Numeric
 * @example
 * JSON.stringify({ coefficients: scaleToCoprimeIntegers(["1", "25/2"]) }, jsonReplacer)
 * // => '{"coefficients":["2","25"]}'
 * jsonReplacer("x", Number.NaN) // => null
 */
export function jsonReplacer(_key: string, value: unknown): unknown {
  if (typeof value === "bigint") return value.toString();
  if (typeof value === "number" && !Number.isFinite(value)) return null;
  return value;
}
