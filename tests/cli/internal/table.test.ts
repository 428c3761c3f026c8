import { describe, expect, it } from "vitest";
import { fields, fixed, num, short, table } from "../../../src/cli/internal/table.js";

describe("text output", () => {
  it("table aligns text left and numbers right, two spaces apart, no trailing spaces", () => {
    expect(table(["species", "mol %"], [["CO2(g)", "8.4"], ["N2", "71.56"]], ["left", "right"])).toBe(
      "species  mol %\n-------  -----\nCO2(g)     8.4\nN2       71.56",
    );
    expect(table(["a", "b"], [["°C", ""]], ["left", "left"])).toBe("a   b\n--  -\n°C");
  });
  it("fields pads the labels", () => {
    expect(fields([["T", "300 K"], ["duty", "-1 kW"]])).toBe("T     300 K\nduty  -1 kW");
  });
  it("num keeps significant digits, goes scientific outside 1e-4..1e9, never prints -0", () => {
    expect(num(2094.18158, 5)).toBe("2094.2");
    expect(num(0.0033390, 5)).toBe("0.0033390");
    expect(num(7.3689e-5, 5)).toBe("7.3689e-5");
    expect(num(-1e-30 * 0, 5)).toBe("0");
    expect(fixed(-0.0001, 2)).toBe("0.00");
    expect(short(2.0000000000001)).toBe("2");
    expect(short(25.5)).toBe("25.5");
  });
});
