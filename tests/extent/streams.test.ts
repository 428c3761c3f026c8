import { fc, test } from "../_helpers/property.js";
import { describe, expect, it } from "vitest";
import { massFractions, massToMolarFlows, molarToMassFlows, moleFractions, totalFlow, totalMassFlow } from "../../src/extent/streams.js";
import { caught } from "../_helpers/caught.js";

// molar masses from IUPAC standard atomic weights (abridged): H2O 18.015, CH4 16.043, CO2 44.009 g/mol
describe("massToMolarFlows", () => {
  it("massToMolarFlows gives the documented example", () => {
    expect(massToMolarFlows({ "H2O(g)": 18.015 }, { massUnit: "g" })).toEqual({ "H2O(g)": 1 });
    expect(massToMolarFlows({ CH4: 16.043 })["CH4"]).toBeCloseTo(1000, 9); // kg → mol
  });
  it("errors: negative, non-finite, bad key, bad unit", () => {
    expect(caught(() => massToMolarFlows({ CH4: -1 })).code).toBe("NEGATIVE_FLOW");
    expect(caught(() => massToMolarFlows({ CH4: Number.NaN })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => massToMolarFlows({ Qx: 1 })).code).toBe("UNKNOWN_ELEMENT");
    expect(caught(() => massToMolarFlows({ CH4: 1 }, { massUnit: "lb" as "kg" })).code).toBe("INVALID_ARGUMENT");
  });
});

describe("molarToMassFlows", () => {
  it("molarToMassFlows gives the documented example", () => {
    expect(molarToMassFlows({ CH4: 1000 }).CH4).toBeCloseTo(16.043, 12);
  });
  test.prop([fc.dictionary(fc.constantFrom("CH4", "CO2", "N2", "H2O(g)", "C3H8"), fc.double({ min: 0, max: 1e6, noNaN: true }), { minKeys: 1 })])(
    "molarToMassFlows then massToMolarFlows returns the flows",
    (flows) => {
      const back = massToMolarFlows(molarToMassFlows(flows));
      for (const [k, v] of Object.entries(flows)) expect(back[k]).toBeCloseTo(v, 6);
    },
  );
});

describe("moleFractions", () => {
  it("moleFractions gives the documented example", () => {
    expect(moleFractions({ N2: 3, O2: 1 })).toEqual({ N2: 0.75, O2: 0.25 });
  });
  it("rejects an all-zero stream", () => {
    const e = caught(() => moleFractions({ N2: 0 }));
    expect(e.code).toBe("INVALID_ARGUMENT");
    expect(e.details.total).toBe(0);
  });
});

describe("massFractions", () => {
  it("massFractions gives the documented example", () => {
    const w = massFractions({ CH4: 1, CO2: 1 });
    expect(w.CH4).toBeCloseTo(16.043 / (16.043 + 44.009), 12);
    expect(w.CO2).toBeCloseTo(0.7328, 4);
  });
});

describe("totalFlow", () => {
  it("totalFlow gives the documented example", () => {
    expect(totalFlow({ N2: 3, O2: 1 })).toBe(4);
    expect(caught(() => totalFlow({ N2: -3 })).code).toBe("NEGATIVE_FLOW");
  });
});

describe("totalMassFlow", () => {
  it("totalMassFlow gives the documented example", () => {
    // H2 2.016 + ½ O2 (31.998) = 18.015 g (IUPAC abridged atomic weights)
    expect(totalMassFlow({ H2: 1, O2: 0.5 }, { massUnit: "g" })).toBeCloseTo(18.015, 12);
  });
});
