import { describe, expect, it } from "vitest";
import { noteExtrapolation, type ExtrapolatedPoint } from "../../src/species/noteExtrapolation.js";
import { species } from "../../src/species/species.js";

describe("noteExtrapolation", () => {
  it("the @example: CaCO3 at 1150 K is outside its 298–775 K data, CaO (to 3200 K) is not", () => {
    const list: ExtrapolatedPoint[] = [];
    // ranges: Jacobs, Kerrick and Krupka (1981) calcite Cp equation; NIST WebBook Shomate fit of lime
    expect(noteExtrapolation(list, [species("CaCO3(cr)"), species("CaO(cr)")], 1150)).toBe(list);
    expect(list).toEqual([{ species: "CaCO3(cr)", T: 1150, range: [298, 775] }]);
  });

  it("noteExtrapolation lists a species once per temperature, and nothing inside the range", () => {
    const list: ExtrapolatedPoint[] = [];
    const co2 = species("CO2(g)");
    noteExtrapolation(list, co2, 7000);
    noteExtrapolation(list, co2, 7000);
    noteExtrapolation(list, co2, 250);
    noteExtrapolation(list, co2, 1000);
    expect(list.map((p) => p.T)).toEqual([7000, 250]);
  });

  it("data starting at 300 K are read down to 298.15 K: 298.15 K counts as inside, 298 K does not", () => {
    const c3h8 = species("C3H8(g)"); // GRI-Mech 3.0: 300–5000 K as published
    expect(c3h8.range).toEqual([298.15, 5000]);
    expect(noteExtrapolation([], c3h8, 298.15)).toEqual([]);
    expect(noteExtrapolation([], c3h8, 298)).toHaveLength(1);
  });
});
