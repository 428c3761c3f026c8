/**
 * The default equilibrium product set of {@link adiabaticFlameTemperature} and
 * {@link flameTemperatureSweep}: the twelve gases of C/H/O/N/Ar combustion products, including
 * the dissociation products (CO, H2, OH, H, O, NO, N) that matter above ~1800 K. Product species
 * holding an element absent from the reactants (Ar in 21/79 air, C in a hydrogen flame) are
 * dropped automatically. Extend it for other elements, e.g.
 * `[...DEFAULT_FLAME_PRODUCTS, "SO2(g)"]` for a fuel with sulphur.
 *
 * @category Flame
 * @example
 * DEFAULT_FLAME_PRODUCTS.length // => 12
 */
export const DEFAULT_FLAME_PRODUCTS: readonly string[] = /* @__PURE__ */ Object.freeze([
  "CO2(g)", "CO(g)", "H2O(g)", "H2(g)", "O2(g)", "OH(g)", "H(g)", "O(g)", "N2(g)", "NO(g)", "N(g)", "Ar(g)",
]);
