/**
 * Test hook of the exact path of {@link solveExtents} (private, not re-exported): with
 * `bigIntOnly` set, the exact path skips its fast lanes and solves in BigInt rationals only. The
 * BigInt lane is the reference every fast lane must agree with exactly; tests set the flag to get
 * that reference and compare. Library code never sets it.
 *
 * @module
 * @internal
 */
export const exactLanes: { bigIntOnly: boolean } = { bigIntOnly: false };
