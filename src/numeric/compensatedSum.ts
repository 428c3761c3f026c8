/**
 * Neumaier's compensated (Kahan–Babuška) sum of floats: the rounding error of each addition is
 * carried in a second accumulator, so long sums of flows of very different sizes stay accurate.
 *
 * @see A. Neumaier, "Rundungsfehleranalyse einiger Verfahren zur Summation endlicher Summen",
 *   ZAMM 54 (1974) 39–51
 * @internal
 */
export function compensatedSum(values: readonly number[]): number {
  let s = 0;
  let c = 0;
  for (const v of values) {
    const t = s + v;
    c += Math.abs(s) >= Math.abs(v) ? s - t + v : v - t + s;
    s = t;
  }
  return s + c;
}
