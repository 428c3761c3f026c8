/**
 * Test hook of {@link balanceReaction} (private, not re-exported): with `bigIntOnly` set, the
 * balancer skips its float64-integer fast path and solves in BigInt only. The BigInt path is the
 * reference the fast path must agree with exactly; tests set the flag to get that reference and
 * compare. Library code never sets it.
 *
 * @module
 * @internal
 */
export const balanceLanes: { bigIntOnly: boolean } = { bigIntOnly: false };
