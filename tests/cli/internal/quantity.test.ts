import { describe, expect, it } from "vitest";
import { readFlow, readFraction, readPositive, readPressure, readTemperature } from "../../../src/cli/internal/quantity.js";
import { readMixture } from "../../../src/cli/internal/command.js";

describe("command-line quantities", () => {
  it("temperatures with units (0 °C = 273.15 K, 32 °F = 0 °C, 491.67 R = 0 °C: common practice)", () => {
    expect(readTemperature("25C", "--T")).toBe(298.15);
    expect(readTemperature("25 °C", "--T")).toBe(298.15);
    expect(readTemperature("32F", "--T")).toBeCloseTo(273.15, 12);
    expect(readTemperature("491.67R", "--T")).toBeCloseTo(273.15, 12);
    expect(readTemperature("1800", "--T")).toBe(1800);
    expect(() => readTemperature("25 celsius", "--T")).toThrow(/unit "celsius"/);
    expect(() => readTemperature("-300C", "--T")).toThrow(/absolute/);
    expect(() => readTemperature("warm", "--T")).toThrow(/number with an optional unit/);
  });
  it("pressures with units (1 atm = 101 325 Pa, 1 bar = 100 kPa: NIST SP 811)", () => {
    expect(readPressure("1atm", "--P")).toBe(101325);
    expect(readPressure("2 bar", "--P")).toBe(200000);
    expect(readPressure("250kPa", "--P")).toBe(250000);
    expect(readPressure("14.696psi", "--P")).toBeCloseTo(101325, -1);
    expect(() => readPressure("0bar", "--P")).toThrow(/positive/);
    expect(() => readPressure("3 torr", "--P")).toThrow(/unit "torr"/);
  });
  it("fractions: 15% and 0.15; a bare number above 1 is refused as ambiguous", () => {
    expect(readFraction("15%", "--excess-air")).toBeCloseTo(0.15, 15);
    expect(readFraction("0.15", "--excess-air")).toBe(0.15);
    expect(readFraction("150%", "--excess-air")).toBe(1.5);
    expect(() => readFraction("15", "--excess-air")).toThrow(/ambiguous/);
    expect(() => readPositive("-1", "--equivalence-ratio")).toThrow(/positive/);
  });
  it("flows with units", () => {
    expect(readFlow("120Nm3/h", "--fuel-flow")).toEqual({ value: 120, unit: "Nm3/h" });
    expect(readFlow("2", "--fuel-flow")).toEqual({ value: 2, unit: "mol/s" });
    expect(() => readFlow("2 gal/min", "--fuel-flow")).toThrow(/must be one of/);
  });
  it("mixtures: key:amount pairs, one key alone, no duplicates or prototype keys", () => {
    expect(readMixture("CH4", "FUEL")).toBe("CH4");
    expect(readMixture("CH4:0.6, CO2(g):0.4", "FUEL")).toEqual({ CH4: 0.6, "CO2(g)": 0.4 });
    expect(() => readMixture("CH4:1,CH4:2", "FUEL")).toThrow(/twice/);
    expect(() => readMixture("__proto__:1", "FUEL")).toThrow(/not a species key/);
    expect(() => readMixture("CH4,N2", "FUEL")).toThrow(/key:amount/);
  });
});
