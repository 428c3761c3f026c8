import { readFileSync, writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { speciesDataJsonSchema, speciesDataSchema } from "../../src/species/schema.js";
import { demoData } from "./helpers.js";

const FILE = new URL("../../docs/species-data.schema.json", import.meta.url);

describe("speciesDataSchema", () => {
  it("the @example: an empty file parses", () => {
    expect(speciesDataSchema.safeParse({ sources: {}, species: [] }).success).toBe(true);
  });

  it("rejects unknown fields (strict objects) and unknown Cp forms", () => {
    expect(speciesDataSchema.safeParse({ sources: {}, species: [], extra: 1 }).success).toBe(false);
    const d = demoData() as any;
    d.species[0].heatCapacity.ranges[0].cp = { form: "cubic", a: 1 };
    const r = speciesDataSchema.safeParse(d);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["species", 0, "heatCapacity", "ranges", 0, "cp", "form"]);
  });

  it("accepts every Cp form of the heat-capacity layer", () => {
    const forms = [
      { form: "shomate", A: 30, B: 1, C: 0, D: 0, E: 0 },
      { form: "polynomial", a: 30, b: 0.01, temperatureUnit: "C", energyUnit: "J" },
      { form: "nasa7", a: [3.5, 0, 0, 0, 0, -1000, 3] },
      { form: "nasa9", a: [0, 0, 3.5, 0, 0, 0, 0, -1000, 3] },
      { form: "constant", cpJPerMolK: 29 },
      { form: "tabulated", temperaturesK: [200, 400], cpJPerMolK: [29, 30] },
    ];
    for (const cp of forms) {
      const d = demoData() as any;
      d.species[0].heatCapacity.ranges[0].cp = cp;
      expect(speciesDataSchema.safeParse(d).success, cp.form).toBe(true);
    }
  });
});

describe("speciesDataJsonSchema", () => {
  it("the @example: sources and species are required", () => {
    expect(speciesDataJsonSchema().required).toEqual(["sources", "species"]);
  });

  it("docs/species-data.schema.json is up to date (regenerate: UPDATE_SCHEMA=1 npx vitest run tests/species/schema.test.ts)", () => {
    const text = JSON.stringify(speciesDataJsonSchema(), null, 2) + "\n";
    if (process.env["UPDATE_SCHEMA"] === "1") writeFileSync(FILE, text);
    expect(readFileSync(FILE, "utf8")).toBe(text);
  });

  it("describes the Cp forms as a oneOf/anyOf keyed by form", () => {
    const text = JSON.stringify(speciesDataJsonSchema());
    for (const f of ["shomate", "polynomial", "nasa7", "nasa9", "constant", "tabulated"]) expect(text).toContain(`"const":"${f}"`);
  });
});

describe("schema parts (the @examples)", async () => {
  const m = await import("../../src/species/schema.js");
  it("cpFormSchema, cpRangeSchema, transitionSchema, speciesEntrySchema, unitsBlockSchema", () => {
    expect(m.cpFormSchema.safeParse({ form: "constant", cpJPerMolK: 29.1 }).success).toBe(true);
    expect(m.cpRangeSchema.safeParse({ TminK: 0, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 29 } }).success).toBe(false);
    expect(m.transitionSchema.safeParse({ TK: 847, dHKJPerMol: 0.7291, source: "nist-webbook" }).success).toBe(true);
    expect(m.speciesEntrySchema.safeParse({ key: "N2(g)" }).success).toBe(false);
    expect(m.unitsBlockSchema.safeParse({ hf298: "kcal/mol" }).success).toBe(false);
    expect(m.unitsBlockSchema.safeParse({ hf298: "kJ/mol", s298: "J/(mol K)" }).success).toBe(true);
  });
});

describe("validation limits (the @examples)", async () => {
  const v = await import("../../src/species/validateSpeciesData.js");
  it("MAX_ABS_HF298_KJ_PER_MOL, MAX_CP_J_PER_MOL_K, MAX_S298_J_PER_MOL_K, MAX_LOWEST_TMIN_K", () => {
    expect([v.MAX_ABS_HF298_KJ_PER_MOL, v.MAX_CP_J_PER_MOL_K, v.MAX_S298_J_PER_MOL_K, v.MAX_LOWEST_TMIN_K]).toEqual([20000, 3000, 5000, 300]);
  });
});

describe("schemas built on first use (the exported constants stand in for them)", async () => {
  const m = await import("../../src/species/schema.js");
  const { z } = await import("zod");
  it("behave as zod schemas (zod mini): instanceof, shape, options, composition and JSON Schema", () => {
    expect(m.speciesDataSchema instanceof z.core.$ZodObject).toBe(true);
    expect((m.cpFormSchema as object) instanceof z.core.$ZodType).toBe(true);
    expect((m.cpFormSchema as object) instanceof z.core.$ZodObject).toBe(false);
    expect(Object.keys(m.speciesDataSchema.shape)).toEqual(["$schema", "description", "units", "sources", "species"]);
    expect(m.cpFormSchema.def.options).toHaveLength(6);
    expect("safeParse" in m.speciesEntrySchema).toBe(true);
    // a user's own schema (full zod) built from ours checks with our rules and paths
    const mine = z.object({ ranges: z.array(m.cpRangeSchema), extra: z.optional(m.unitsBlockSchema) });
    const bad = mine.safeParse({ ranges: [{ TminK: 300, TmaxK: 400, cp: { form: "constant", cpJPerMolK: "29" } }] });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]!.path).toEqual(["ranges", 0, "cp", "cpJPerMolK"]);
    expect(z.object(m.speciesEntrySchema.shape).partial().safeParse({ key: "N2(g)" }).success).toBe(true);
    const json = JSON.stringify(z.toJSONSchema(z.array(m.transitionSchema)));
    expect(json).toContain("transition enthalpy, kJ/mol"); // the description inside survives
  });
  it("cannot be modified through the stand-in", () => {
    expect(() => { (m.speciesDataSchema as any).safeParse = () => ({ success: true }); }).toThrow(TypeError);
    expect(m.speciesDataSchema.safeParse({}).success).toBe(false);
  });
});
