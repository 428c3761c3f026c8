import { describe, expect, it } from "vitest";
import { DEFAULT_FLAME_PRODUCTS, SULFUR_FLAME_PRODUCTS } from "../../src/flame/flameDefaults.js";
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import { flameTemperatureSweep } from "../../src/flame/flameTemperatureSweep.js";
import { species } from "../../src/species/species.js";

describe("DEFAULT_FLAME_PRODUCTS", () => {
  it("DEFAULT_FLAME_PRODUCTS lists the twelve C/H/O/N/Ar product gases (the @example value)", () => {
    expect(DEFAULT_FLAME_PRODUCTS.length).toBe(12); // @example
    expect(Object.isFrozen(DEFAULT_FLAME_PRODUCTS)).toBe(true);
  });
  it("DEFAULT_FLAME_PRODUCTS resolve in the built-in library as gases", () => {
    for (const k of DEFAULT_FLAME_PRODUCTS) expect(species(k).phase).toBe("g");
  });
});

describe("SULFUR_FLAME_PRODUCTS", () => {
  it("SULFUR_FLAME_PRODUCTS lists the sulfur gases of the built-in data (the @example value)", () => {
    expect(SULFUR_FLAME_PRODUCTS).toEqual(["SO2(g)", "SO3(g)", "H2S(g)"]); // @example
    for (const k of SULFUR_FLAME_PRODUCTS) expect(species(k).phase).toBe("g");
  });
  it("a sulfur-bearing fuel burns in the flame functions without naming products", () => {
    const fuel = { "CH4(g)": 0.97, "H2S(g)": 0.03 }; // invented sour gas
    const eq = adiabaticFlameTemperature({ fuel, excessAir: 0.1 });
    // sulfur balance: 0.03 mol S leaves as SO2 + SO3 + H2S
    const s = (eq.moles["SO2(g)"] ?? 0) + (eq.moles["SO3(g)"] ?? 0) + (eq.moles["H2S(g)"] ?? 0);
    expect(s).toBeCloseTo(0.03, 10);
    expect(eq.moles["SO2(g)"]!).toBeGreaterThan(0.029);
    const named = adiabaticFlameTemperature({ fuel: "hydrogen sulfide", excessAir: 0.1 });
    expect(named.products["SO2(g)"]).toBeGreaterThan(0.1);
    const sweep = flameTemperatureSweep({ fuel }, { parameter: "equivalenceRatio", values: [0.8, 1] });
    expect(sweep.T.length).toBe(2);
    // a fuel without sulfur keeps the twelve default products
    expect(Object.keys(adiabaticFlameTemperature({ fuel: "CH4(g)" }).moles).some((k) => k.includes("S"))).toBe(false);
  });
});
