import { readFileSync, writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { caseFileJsonSchema, caseFileSchema, readCaseFile } from "../../src/cli/caseFile.js";
import { caught } from "../_helpers/caught.js";

const SCHEMA_FILE = new URL("../../docs/case-file.schema.json", import.meta.url);
const heater = (over: Record<string, unknown> = {}) =>
  JSON.stringify({ inlet: [{ T: "25C", flows: { "N2(g)": 3.6 } }], outlet: [{ T: "500K", flows: { "N2(g)": 3.6 } }], flowUnit: "kmol/h", ...over });

describe("caseFileSchema / caseFileJsonSchema", () => {
  it("the @examples", () => {
    const ok = { inlet: [{ T: "25C", flows: { "N2(g)": 1 } }], outlet: [{ T: 500, flows: { "N2(g)": 1 } }] };
    expect(caseFileSchema().safeParse(ok).success).toBe(true);
    expect(caseFileJsonSchema().required).toEqual(["inlet", "outlet"]);
  });

  it("docs/case-file.schema.json is generated from the zod schema (regenerate: UPDATE_SCHEMA=1 npx vitest run tests/cli/caseFile.test.ts)", () => {
    const text = JSON.stringify(caseFileJsonSchema(), null, 2) + "\n";
    if (process.env["UPDATE_SCHEMA"] === "1") writeFileSync(SCHEMA_FILE, text);
    expect(readFileSync(SCHEMA_FILE, "utf8")).toBe(text);
  });

  it("the published schema and the validator agree on the demo case files", () => {
    const schema = JSON.parse(readFileSync(SCHEMA_FILE, "utf8"));
    const props = Object.keys(schema.properties).sort();
    for (const name of ["biogas-boiler", "methanol-reactor"]) {
      const text = readFileSync(new URL(`./cases/${name}.json`, import.meta.url), "utf8");
      for (const key of Object.keys(JSON.parse(text))) expect(props).toContain(key);
      expect(() => readCaseFile(text)).not.toThrow();
    }
    expect(schema.additionalProperties).toBe(false);
  });
});

describe("readCaseFile(text)", () => {
  it("the @example: kmol/h, °C and K become mol/s and K", () => {
    const c = readCaseFile(heater());
    expect(c.input.inlet).toEqual([{ T: 298.15, P: 100000, flows: { "N2(g)": 1 } }]);
    expect(c.input.outlet).toEqual([{ T: 500, P: 100000, flows: { "N2(g)": 1 } }]);
    expect(c.dutyUnit).toBe("kW");
    expect(c.names).toEqual({ inlet: ["inlet 1"], outlet: ["outlet 1"] });
  });

  it("mass and normal-volume flows use each species' molar mass and 22.414 L/mol", () => {
    const c = readCaseFile(JSON.stringify({
      inlet: [{ T: 300, flowUnit: "kg/h", flows: { "CH4(g)": 57.7548 } }],
      outlet: [{ T: 300, flowUnit: "Nm3/h", flows: { "CH4(g)": 3600 * 0.02241396954 } }],
    }));
    // CH4 12.011 + 4·1.008 = 16.043 g/mol (IUPAC 2013 conventional atomic weights); ideal-gas molar volume at 273.15 K, 101.325 kPa 22.413 969 54 L/mol (CODATA 2018)
    expect(c.input.inlet[0]!.flows["CH4(g)"]).toBeCloseTo(1, 6);
    expect(c.input.outlet[0]!.flows["CH4(g)"]).toBeCloseTo(1, 9);
  });

  it("extents are converted from extentUnit", () => {
    const c = readCaseFile(heater({ reactions: ["N2(g) -> N2(g)"], extents: [3.6], extentUnit: "kmol/h" }));
    expect(c.input.extents).toEqual([1]);
  });

  it("every problem is listed with its JSON path (INVALID_CASE)", () => {
    const e = caught(() => readCaseFile(JSON.stringify({
      inlet: [{ T: "hot", flows: { "N2(g)": -1 } }], outlet: [], flowUnit: "gal/min", extra: true,
    })));
    expect(e.code).toBe("INVALID_CASE");
    const paths = (e.details["issues"] as { path: string }[]).map((i) => i.path).sort();
    expect(paths).toEqual(["$", "$.flowUnit", "$.inlet[0].T", '$.inlet[0].flows["N2(g)"]', "$.outlet"]);
  });

  it("unknown or ambiguous species keys and extents without reactions are pointed at", () => {
    const e = caught(() => readCaseFile(JSON.stringify({
      inlet: [{ T: 300, flows: { H2O: 1, "Xq(g)": 1 } }], outlet: [{ T: 300, flows: { "H2O(g)": 1 } }], extents: [1],
    })));
    expect(e.code).toBe("INVALID_CASE");
    const issues = e.details["issues"] as { path: string; message: string }[];
    expect(issues.map((i) => i.path)).toEqual(['$.inlet[0].flows.H2O', '$.inlet[0].flows["Xq(g)"]', "$.extents"]);
    expect(issues[0]!.message).toMatch(/H2O\(g\), H2O\(l\)/);
    expect(caught(() => readCaseFile(heater({ reactions: ["N2(g) -> N2(g)"], extents: [1, 2] }))).message).toMatch(/2 extents for 1 reactions/);
  });

  it("text that is not JSON is an INVALID_CASE at $", () => {
    const e = caught(() => readCaseFile("{ inlet: "));
    expect(e.code).toBe("INVALID_CASE");
    expect((e.details["issues"] as { path: string }[])[0]!.path).toBe("$");
  });

  it("does not mutate or keep the parsed text's objects", () => {
    const text = heater();
    readCaseFile(text);
    expect(readCaseFile(text)).toEqual(readCaseFile(text));
  });
});
