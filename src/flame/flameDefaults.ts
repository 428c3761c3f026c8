/**
 * The default equilibrium product set of {@link adiabaticFlameTemperature} and
 * {@link flameTemperatureSweep}: the twelve gases of C/H/O/N/Ar combustion products, including
 * the dissociation products (CO, H2, OH, H, O, NO, N) that matter above ~1800 K. Product species
 * holding an element absent from the reactants (Ar in 21/79 air, C in a hydrogen flame) are
 * dropped automatically. When the reactants hold sulfur and no `products` are given, the flame
 * functions add {@link SULFUR_FLAME_PRODUCTS}; extend the list yourself for other elements.
 *
 * @category Flame
 * @example
 * DEFAULT_FLAME_PRODUCTS.length // => 12
 */
export const DEFAULT_FLAME_PRODUCTS: readonly string[] = /* @__PURE__ */ Object.freeze([
  "CO2(g)", "CO(g)", "H2O(g)", "H2(g)", "O2(g)", "OH(g)", "H(g)", "O(g)", "N2(g)", "NO(g)", "N(g)", "Ar(g)",
]);

/**
 * The sulfur gases of the built-in data that the flame functions add to
 * {@link DEFAULT_FLAME_PRODUCTS} when the fuel, oxidizer or diluent holds sulfur and no `products`
 * are given: SO2 (the main product of lean flames), SO3 (a few percent of the sulfur at lean
 * flame-cooling temperatures) and H2S (rich flames). COS, SO and S2 are not in the built-in data;
 * pass your own `products` with a library that holds them.
 *
 * @category Flame
 * @example
 * SULFUR_FLAME_PRODUCTS // => ["SO2(g)", "SO3(g)", "H2S(g)"]
 */
export const SULFUR_FLAME_PRODUCTS: readonly string[] = /* @__PURE__ */ Object.freeze(["SO2(g)", "SO3(g)", "H2S(g)"]);
