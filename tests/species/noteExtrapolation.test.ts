import { describe, expect, it } from "vitest";
import { noteExtrapolation, type ExtrapolatedPoint } from "../../src/species/noteExtrapolation.js";
import { species } from "../../src/species/species.js";
import { caught } from "../_helpers/caught.js";

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

  it("a hostile T, species or list is INVALID_ARGUMENT with details.path, and nothing is appended", () => {
    const co2 = species("CO2(g)");
    for (const T of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, 0, -5, "1000", Symbol("T"), Object.create(null)]) {
      const list: ExtrapolatedPoint[] = [];
      const e = caught(() => noteExtrapolation(list, co2, T as never));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details.path).toBe("T");
      expect(list).toEqual([]);
    }
    for (const sp of [null, 5, {}, { key: "X", range: [1, Number.NaN] }, Object.create(null)]) {
      const list: ExtrapolatedPoint[] = [];
      expect(caught(() => noteExtrapolation(list, sp as never, 7000)).details.path).toBe("species");
      expect(caught(() => noteExtrapolation(list, [co2, sp] as never, 7000)).details.path).toBe("species[1]");
      expect(list).toEqual([]);
    }
    for (const bad of [Number.NaN, null, {}, "list"]) {
      expect(caught(() => noteExtrapolation(bad as never, co2, 1000)).details.path).toBe("list");
    }
    for (const point of [null, Number.NaN, { species: "CO2(g)", T: Number.NaN, range: [200, 6000] }, { species: "CO2(g)", T: 7000, range: [200] }]) {
      expect(caught(() => noteExtrapolation([point] as never, co2, 1000)).details.path).toBe("list[0]");
    }
  });
});
