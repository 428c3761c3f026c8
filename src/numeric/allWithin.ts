/**
 * True when every value of `values` lies in [lo, hi] (false as soon as one is outside, or NaN).
 * Unrolled by four: this up-front check is what lets the batch APIs promise that nothing is written
 * when a temperature is bad, and unrolling halves its cost next to the evaluation loop.
 *
 * @param values - the values to check
 * @param lo - lowest allowed value
 * @param hi - highest allowed value
 * @returns whether every value lies in [lo, hi]
 * @internal
 */
export function allWithin(values: Float64Array, lo: number, hi: number): boolean {
  const n = values.length;
  const m = n - (n & 3);
  let j = 0;
  for (; j < m; j += 4) {
    const a = values[j]!, b = values[j + 1]!, c = values[j + 2]!, d = values[j + 3]!;
    if (!(a >= lo && a <= hi && b >= lo && b <= hi && c >= lo && c <= hi && d >= lo && d <= hi)) return false;
  }
  for (; j < n; j++) {
    const a = values[j]!;
    if (!(a >= lo && a <= hi)) return false;
  }
  return true;
}
