/**
 * True when `values` are in non-decreasing order and lie in [lo, hi] (false at the first value out of
 * order, or NaN). For a sorted array this is the cheapest full check of its range: one comparison per
 * value (each with the one before), then the first against `lo` and the last against `hi` — about a
 * third less work than the two comparisons per value of `allWithin`. Unrolled by eight.
 *
 * @param values - the values to check
 * @param lo - lowest allowed value
 * @param hi - highest allowed value
 * @returns whether the values are sorted and every one lies in [lo, hi] (true for an empty array)
 * @internal
 */
export function sortedWithin(values: Float64Array, lo: number, hi: number): boolean {
  const n = values.length;
  if (n === 0) return true;
  let prev = values[0]!;
  if (!(prev >= lo)) return false;
  const m = n - ((n - 1) & 7);
  let j = 1;
  for (; j < m; j += 8) {
    const a = values[j]!, b = values[j + 1]!, c = values[j + 2]!, d = values[j + 3]!;
    const e = values[j + 4]!, f = values[j + 5]!, g = values[j + 6]!, h = values[j + 7]!;
    if (!(prev <= a && a <= b && b <= c && c <= d && d <= e && e <= f && f <= g && g <= h)) return false;
    prev = h;
  }
  for (; j < n; j++) {
    const a = values[j]!;
    if (!(prev <= a)) return false;
    prev = a;
  }
  return prev <= hi;
}
