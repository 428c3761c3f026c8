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
 * @param _key - the property name (unused)
 * @param value - the value being written
 * @returns the decimal text of a BigInt, any other value unchanged
 * @category Numeric
 * @example
 * JSON.stringify({ coefficients: scaleToCoprimeIntegers(["1", "25/2"]) }, jsonReplacer)
 * // => '{"coefficients":["2","25"]}'
 */
export function jsonReplacer(_key: string, value: unknown): unknown {
  return typeof value === "bigint" ? value.toString() : value;
}
