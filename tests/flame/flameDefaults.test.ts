import { describe, expect, it } from "vitest";
import { DEFAULT_FLAME_PRODUCTS } from "../../src/flame/flameDefaults.js";
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
