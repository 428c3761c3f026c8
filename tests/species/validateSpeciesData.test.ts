import { describe, expect, it } from "vitest";
import { test, fc } from "../_helpers/property.js";
import { validateSpeciesData } from "../../src/species/validateSpeciesData.js";
import { RxthermError } from "../../src/errors.js";
import { clone, demoData } from "./helpers.js";

/** The issues of a rejected file (fails the test if the file is accepted). */
function issuesOf(data: unknown): { path: readonly (string | number)[]; message: string }[] {
  try {
    validateSpeciesData(data);
  } catch (e) {
    expect(e).toBeInstanceOf(RxthermError);
    expect((e as RxthermError).code).toBe("INVALID_DATA");
    return (e as RxthermError).details["issues"] as { path: (string | number)[]; message: string }[];
  }
  throw new Error("expected INVALID_DATA");
}
type Json = Record<string, any>;
const mutate = (f: (d: Json) => void): Json => {
  const d = clone(demoData()) as Json;
  f(d);
  return d;
};

describe("validateSpeciesData", () => {
  it("validateSpeciesData(valid file) returns a copy with the same content", () => {
    const input = demoData();
    const frozen = JSON.stringify(input);
    const out = validateSpeciesData(input);
    expect(out).toEqual(input);
    expect(out).not.toBe(input);
    expect(JSON.stringify(input)).toBe(frozen); // input not mutated
  });

  it("the @example: an empty file is valid", () => {
    expect(validateSpeciesData({ sources: { x: "X" }, species: [] }).species.length).toBe(0);
  });

  it("rejects missing fields, naming each path", () => {
    const issues = issuesOf(mutate((d) => { delete d.species[0].s298JPerMolK; delete d.species[1].hf298Source; }));
    expect(issues.map((i) => i.path.join("."))).toEqual(expect.arrayContaining(["species.0.s298JPerMolK", "species.1.hf298Source"]));
  });

  it("rejects wrong units: a units block other than the fixed ones, a J/mol value in the kJ field, Cp in J/(kg·K), unknown unit fields", () => {
    expect(issuesOf(mutate((d) => { d.units = { hf298: "kcal/mol" }; }))[0]!.path).toEqual(["units", "hf298"]);
    expect(issuesOf(mutate((d) => { d.species[0].hf298KJPerMol = -390000; }))[0]!.message).toMatch(/kJ\/mol/);
    const kg = issuesOf(mutate((d) => { d.species[0].heatCapacity.ranges[0].cp.cpJPerMolK = 4180; }));
    expect(kg[0]!.path).toEqual(["species", 0, "heatCapacity", "ranges", 0]);
    expect(kg[0]!.message).toMatch(/wrong units/);
    const field = issuesOf(mutate((d) => { d.species[0].hf298JPerMol = -390000; }));
    expect(field[0]!.path).toEqual(["species", 0]);
    expect(field[0]!.message).toMatch(/hf298JPerMol/);
    expect(issuesOf(mutate((d) => { d.species[0].s298JPerMolK = -3; }))[0]!.path).toEqual(["species", 0, "s298JPerMolK"]);
  });

  it("rejects gapped and overlapping ranges", () => {
    const gap = issuesOf(mutate((d) => { d.species[1].heatCapacity.ranges[1].TminK = 410; }));
    expect(gap.some((i) => i.path.join(".") === "species.1.heatCapacity.ranges.1.TminK" && /gap/.test(i.message))).toBe(true);
    const overlap = issuesOf(mutate((d) => { d.species[1].heatCapacity.ranges[1].TminK = 390; d.species[1].heatCapacity.ranges[1].cp.temperaturesK[0] = 390; }));
    expect(overlap.some((i) => /overlap/.test(i.message))).toBe(true);
  });

  it("rejects ranges that do not reach 298.15 K", () => {
    const issues = issuesOf(mutate((d) => { d.species[0].heatCapacity.ranges[0].TminK = 320; }));
    expect(issues[0]!.message).toMatch(/298\.15 K/);
  });

  it("rejects a Cp that turns negative inside a range (found by sampling)", () => {
    // Cp = 100 − 0.3·T is positive at 280 K (16) but negative above 333 K
    const issues = issuesOf(mutate((d) => {
      d.species[0].heatCapacity.ranges[0].cp = { form: "polynomial", a: 100, b: -0.3, temperatureUnit: "K", energyUnit: "J" };
    }));
    expect(issues[0]!.path).toEqual(["species", 0, "heatCapacity", "ranges", 0]);
    expect(issues[0]!.message).toMatch(/not positive/);
  });

  it("rejects unknown elements and formula/key mismatches", () => {
    expect(issuesOf(mutate((d) => { d.species[0].formula = "Xq5H8O2"; d.species[0].key = "Xq5H8O2(l)"; }))[0]!.message).toMatch(/unknown element/);
    expect(issuesOf(mutate((d) => { d.species[0].key = "C5H8O3(l)"; }))[0]!.message).toMatch(/does not match the formula/);
    expect(issuesOf(mutate((d) => { d.species[0].key = "C5H8O2(g)"; }))[0]!.message).toMatch(/phase/);
    expect(issuesOf(mutate((d) => { d.species[0].key = "C5H8O2"; }))[0]!.path).toEqual(["species", 0, "key"]);
  });

  it("accepts isomer prefixes and condensed polymorph labels in keys", () => {
    const d = mutate((x) => { x.species[0].key = "n-C5H8O2(l)"; x.species[1].phase = "cr"; x.species[1].key = "C12H26(alpha)"; });
    expect(validateSpeciesData(d).species[0]!.key).toBe("n-C5H8O2(l)");
  });

  it("rejects unknown source ids, at every place a source id appears", () => {
    const issues = issuesOf(mutate((d) => {
      d.species[0].hf298Source = "nope";
      d.species[1].heatCapacity.ranges[1].source = "nada";
      d.species[1].transitions = [{ TK: 450, dHKJPerMol: 1, source: "zip" }];
    }));
    expect(issues.map((i) => i.path.join("."))).toEqual([
      "species.0.hf298Source", "species.1.heatCapacity.ranges.1.source", "species.1.transitions.0.source",
    ]);
  });

  it("accepts the built-in source ids (memory, common practice, nist-janaf-1998) unless told not to", () => {
    const d = mutate((x) => { x.species[0].hf298Source = "memory"; x.species[0].s298Source = "common practice"; });
    expect(validateSpeciesData(d).species[0]!.hf298Source).toBe("memory");
    expect(() => validateSpeciesData(d, { allowBuiltInSources: false })).toThrow(/source id "memory"/);
  });

  it("rejects prototype-polluting keys anywhere (parsed JSON keeps __proto__ as an own key)", () => {
    for (const bad of ["__proto__", "constructor", "prototype"]) {
      const text = JSON.stringify(demoData()).replace('"pilot":', `"${bad}": "x", "pilot":`);
      const issues = issuesOf(JSON.parse(text));
      expect(issues).toEqual([{ path: ["sources", bad], message: `the key "${bad}" is not allowed (prototype pollution)` }]);
      const deep = JSON.parse(JSON.stringify(demoData()).replace('"form":"constant"', `"form":"constant","${bad}":{"polluted":true}`));
      expect(issuesOf(deep)[0]!.path).toEqual(["species", 0, "heatCapacity", "ranges", 0, "cp", bad]);
    }
    expect(({} as Record<string, unknown>)["polluted"]).toBeUndefined();
  });

  it("rejects two default entries for one key and an alternative without a dataset", () => {
    const dup = issuesOf(mutate((d) => { d.species.push(clone(d.species[0])); }));
    expect(dup[0]!.message).toMatch(/already has a default entry/);
    const alt = issuesOf(mutate((d) => { d.species.push({ ...clone(d.species[0]), alternative: true }); }));
    expect(alt[0]!.message).toMatch(/needs a dataset/);
  });

  it("rejects transitions outside the range", () => {
    const issues = issuesOf(mutate((d) => { d.species[1].transitions = [{ TK: 700, dHKJPerMol: 1, source: "pilot" }]; }));
    expect(issues[0]!.path).toEqual(["species", 1, "transitions", 0, "TK"]);
  });

  it("lists every problem of a file in one error, with the count in the message", () => {
    try {
      validateSpeciesData(mutate((d) => { d.species[0].hf298Source = "nope"; d.species[1].formula = 7; d.sources.bad = 3; }));
      expect.unreachable();
    } catch (e) {
      const err = e as RxthermError;
      const issues = err.details["issues"] as { path: (string | number)[] }[];
      expect(issues.map((i) => i.path.join(".")).sort()).toEqual(["sources.bad", "species.0.hf298Source", "species.1.formula"]);
      expect(err.message).toMatch(/^\[rxtherm\] validateSpeciesData found 3 problems/);
    }
  });

  it("rejects absurdly deep nesting with INVALID_DATA instead of overflowing the stack", () => {
    let deep: unknown = 1;
    for (let i = 0; i < 100000; i++) deep = { a: deep };
    const issues = issuesOf({ sources: {}, species: [], description: deep });
    expect(issues[0]!.message).toMatch(/nested deeper than 32/);
  });

  it("rejects non-objects", () => {
    for (const bad of [null, 42, "x", [], { species: [] }]) expect(issuesOf(bad).length).toBeGreaterThan(0);
  });

  test.prop([fc.double({ min: 1, max: 2999, noNaN: true }), fc.double({ min: 0.1, max: 4000, noNaN: true })])(
    "a constant positive Cp and a positive S° are accepted; the values come back unchanged", (cp, s) => {
      const d = mutate((x) => { x.species[0].heatCapacity.ranges[0].cp.cpJPerMolK = cp; x.species[0].s298JPerMolK = s; });
      const out = validateSpeciesData(d);
      expect(out.species[0]!.s298JPerMolK).toBe(s);
    },
  );

  test.prop([fc.double({ min: -1000, max: 0, noNaN: true })])("a constant Cp ≤ 0 is always rejected", (cp) => {
    const issues = issuesOf(mutate((x) => { x.species[0].heatCapacity.ranges[0].cp.cpJPerMolK = cp; }));
    expect(issues[0]!.message).toMatch(/not positive/);
  });
});

describe("docs/species.md example file", () => {
  it("the JSON example of the data-file format is valid", async () => {
    const { readFileSync } = await import("node:fs");
    const md = readFileSync(new URL("../../docs/species.md", import.meta.url), "utf8");
    const block = /```json\n([\s\S]*?)```/.exec(md)![1]!;
    const out = validateSpeciesData(JSON.parse(block));
    expect(out.species[0]!.key).toBe("C6H10O5(s)");
  });
});
