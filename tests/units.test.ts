import { describe, expect, it } from "vitest";
import { fromKelvin, toJoule, toKelvin, toMol, toPascal } from "../src/units.js";
import { isRxthermError } from "../src/errors.js";

// Conversion factors: NIST SP 811 (2008) Appendix B; 0 °C = 273.15 K by definition of the Celsius scale.
describe("units", () => {
  it("toKelvin / fromKelvin", () => {
    expect(toKelvin(25, "C")).toBe(298.15);
    expect(toKelvin(32, "F")).toBeCloseTo(273.15, 12);
    expect(toKelvin(491.67, "R")).toBeCloseTo(273.15, 12);
    expect(fromKelvin(373.15, "C")).toBe(100);
    expect(fromKelvin(373.15, "F")).toBe(212);
  });
  it("rejects a negative absolute temperature and non-finite input", () => {
    expect(() => toKelvin(-300, "C")).toThrow(/negative absolute/);
    try { toKelvin(Number.NaN, "K"); } catch (e) { expect(isRxthermError(e, "INVALID_ARGUMENT")).toBe(true); }
  });
  it("pressure, energy and amount factors (NIST SP 811)", () => {
    expect(toPascal(1, "atm")).toBe(101325);
    expect(toPascal(1, "bar")).toBe(100000);
    expect(toPascal(1, "psi")).toBeCloseTo(6894.757, 3);
    expect(toJoule(1, "kcal")).toBe(4184);
    expect(toJoule(1, "Btu")).toBeCloseTo(1055.056, 3);
    expect(toMol(1, "lbmol")).toBe(453.59237);
  });
});
