/**
 * The zod schema of species data files (JSON) and the JSON Schema generated from it.
 *
 * Written with zod mini, whose functions tree-shake: the published dist carries only the parts these
 * schemas use (a few kilobytes) instead of loading the zod package at import, which took longer than
 * everything else the import does. The schemas work with full zod too (composition, `z.toJSONSchema`).
 *
 * Units are carried by the field names and are fixed: formation enthalpy in kJ/mol
 * (`hf298KJPerMol`, as the tables print it), entropy and Cp in J/(mol·K), temperatures in K.
 * The schema checks the structure; {@link validateSpeciesData} adds the checks a structural
 * schema cannot express (contiguous ranges, Cp > 0, formula ↔ key, source ids, unsafe keys).
 *
 * The schemas are built on first use, not at import: an app that never validates data (one that
 * only computes molar masses or flame temperatures with the built-in data) neither pays zod's
 * schema construction at start-up nor carries zod in its bundle. The exported constants stand
 * in for the schemas (every property and method is the schema's own); {@link speciesDataSchemas}
 * returns the built schema objects themselves.
 *
 * @module
 */
import * as z from "zod/mini";
import type { $ZodIssue, ParseContext } from "zod/v4/core";
import en from "zod/v4/locales/en.js";

/** Every schema, built together on first use so that they share their parts. */
function buildSchemas() {
  const d = (text: string) => z.describe(text);
  // zod numbers reject NaN and ±Infinity
  const finite = z.number();
  const positiveK = z.number().check(z.positive(), d("temperature in K (> 0)"));
  const sourceId = z.string().check(z.minLength(1), d("id of a citation in the file's `sources` or in the built-in registry"));
  const text1 = () => z.string().check(z.minLength(1));

  const shomate = z.strictObject({
    form: z.literal("shomate"),
    A: finite, B: finite, C: finite, D: finite, E: finite,
    F: z.optional(z.number().check(d("kJ/mol"))),
    G: z.optional(z.number().check(d("J/(mol·K)"))),
    H: z.optional(z.number().check(d("kJ/mol"))),
  }).check(d("Shomate: Cp = A + B·t + C·t² + D·t³ + E/t², t = T/1000 K, Cp in J/(mol·K)"));

  const polynomial = z.strictObject({
    form: z.literal("polynomial"),
    a: finite, b: z.optional(finite), c: z.optional(finite), d: z.optional(finite), e: z.optional(finite),
    temperatureUnit: z.enum(["K", "C"]).check(d("the temperature variable: K or °C")),
    energyUnit: z.enum(["J", "kJ"]).check(d("Cp in J/(mol·K) or kJ/(mol·K)")),
  }).check(d("Cp = a + b·T + c·T² + d·T³ + e/T²"));

  const nasa7 = z.strictObject({
    form: z.literal("nasa7"),
    a: z.array(finite).check(z.length(7), d("a1..a7, T in K")),
  }).check(d("NASA 7-coefficient polynomial: Cp/R = a1 + a2·T + a3·T² + a4·T³ + a5·T⁴"));

  const nasa9 = z.strictObject({
    form: z.literal("nasa9"),
    a: z.array(finite).check(z.length(9), d("a1..a7 then b1, b2, T in K")),
  }).check(d("NASA 9-coefficient polynomial: Cp/R = a1/T² + a2/T + a3 + a4·T + a5·T² + a6·T³ + a7·T⁴"));

  const constant = z.strictObject({
    form: z.literal("constant"),
    cpJPerMolK: finite,
  }).check(d("constant Cp in J/(mol·K)"));

  const tabulated = z.strictObject({
    form: z.literal("tabulated"),
    temperaturesK: z.array(positiveK).check(z.minLength(2)),
    cpJPerMolK: z.array(finite).check(z.minLength(2)),
  }).check(d("(T, Cp) points interpolated linearly"));

  const cpForm = z.discriminatedUnion("form", [shomate, polynomial, nasa7, nasa9, constant, tabulated]);

  const cpRange = z.strictObject({
    TminK: positiveK,
    TmaxK: positiveK,
    cp: cpForm,
    source: z.optional(sourceId),
    note: z.optional(z.string()),
  });

  const transition = z.strictObject({
    TK: positiveK,
    dHKJPerMol: z.number().check(d("transition enthalpy, kJ/mol")),
    label: z.optional(z.string()),
    source: sourceId,
  });

  const speciesEntry = z.strictObject({
    key: z.string().check(z.minLength(1), z.maxLength(64),
      d("formula with phase, e.g. CO2(g); isomers may carry a prefix, e.g. n-C4H10(g)")),
    formula: z.string().check(z.minLength(1), z.maxLength(64)),
    phase: z.enum(["g", "l", "s", "aq", "cr"]),
    name: z.optional(text1()),
    aliases: z.optional(z.array(text1())),
    cas: z.optional(z.string().check(z.regex(/^\d{2,7}-\d{2}-\d$/))),
    dataset: z.optional(z.string().check(z.minLength(1), z.maxLength(32), z.regex(/^[a-z0-9][a-z0-9._-]*$/),
      d("label of the data set this entry comes from, e.g. nist-janaf, gri-mech-3.0"))),
    alternative: z.optional(z.boolean().check(d("true: selectable only by its dataset, not the default for its key"))),
    hf298KJPerMol: z.number().check(d("standard enthalpy of formation at 298.15 K, kJ/mol")),
    hf298Source: sourceId,
    hf298UncertaintyKJPerMol: z.optional(z.number().check(z.nonnegative())),
    s298JPerMolK: z.number().check(d("standard molar entropy at 298.15 K and 1 bar, J/(mol·K)")),
    s298Source: sourceId,
    heatCapacity: z.strictObject({
      source: sourceId,
      ranges: z.array(cpRange).check(z.minLength(1)),
    }),
    transitions: z.optional(z.array(transition)),
    note: z.optional(z.string()),
  });

  const unitsBlock = z.strictObject({
    hf298: z.optional(z.literal("kJ/mol")),
    s298: z.optional(z.literal("J/(mol K)")),
    cp: z.optional(z.literal("J/(mol K)")),
    temperature: z.optional(z.literal("K")),
  });

  const speciesData = z.strictObject({
    $schema: z.optional(z.string()),
    description: z.optional(z.string()),
    units: z.optional(unitsBlock),
    sources: z.record(text1(), text1()),
    species: z.array(speciesEntry),
  });

  return { cpForm, cpRange, transition, speciesEntry, unitsBlock, speciesData };
}

let english: ParseContext<$ZodIssue> | undefined;
/**
 * Parse options that give English issue messages (full zod's default; zod mini ships without
 * messages). Passed per call, never installed in zod's configuration, which all copies of zod in
 * a process share: a user's own locale setting stays untouched.
 * @internal
 */
export function englishMessages(): ParseContext<$ZodIssue> {
  english ??= { error: en().localeError };
  return english;
}

type Schemas = ReturnType<typeof buildSchemas>;
let built: Schemas | undefined;
/** The schemas, built on the first call and shared afterwards. */
function schemas(): Schemas {
  built ??= buildSchemas();
  return built;
}

/**
 * Zod schema of one Cp form (discriminated by `form`).
 *
 * Built on first use (see the module notes); every zod property and method works as on any schema.
 *
 * @category Species data
 * @example
 * cpFormSchema.safeParse({ form: "constant", cpJPerMolK: 29.1 }).success // => true
 */
export const cpFormSchema = /* @__PURE__ */ lazySchema(() => schemas().cpForm);

/**
 * Zod schema of one Cp range: a form valid over [TminK, TmaxK], with an optional source id
 * overriding the species' `heatCapacity.source` for this range.
 *
 * Built on first use (see the module notes).
 *
 * @category Species data
 * @example
 * cpRangeSchema.safeParse({ TminK: 0, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 29 } }).success // => false (TminK > 0 required)
 */
export const cpRangeSchema = /* @__PURE__ */ lazySchema(() => schemas().cpRange);

/**
 * Zod schema of a phase transition inside a species' Cp ranges (e.g. alpha → beta quartz):
 * H steps up by `dHKJPerMol` (kJ/mol) at `TK` (K), S by ΔH/T.
 *
 * Built on first use (see the module notes).
 *
 * @category Species data
 * @example
 * transitionSchema.safeParse({ TK: 847, dHKJPerMol: 0.7291, source: "nist-webbook" }).success // => true
 */
export const transitionSchema = /* @__PURE__ */ lazySchema(() => schemas().transition);

/**
 * Zod schema of one species entry of a data file.
 *
 * Built on first use (see the module notes).
 *
 * @category Species data
 * @example
 * speciesEntrySchema.safeParse({ key: "N2(g)" }).success // => false (the values and their sources are missing)
 */
export const speciesEntrySchema = /* @__PURE__ */ lazySchema(() => schemas().speciesEntry);

/**
 * Zod schema of the optional `units` block: if present it must state exactly the units the
 * field names carry (a file written in other units is rejected, not converted).
 *
 * Built on first use (see the module notes).
 *
 * @category Species data
 * @example
 * unitsBlockSchema.safeParse({ hf298: "kcal/mol" }).success // => false
 */
export const unitsBlockSchema = /* @__PURE__ */ lazySchema(() => schemas().unitsBlock);

/**
 * Zod schema of a whole species data file: `sources` (id → full citation) and `species`.
 *
 * Built on first use (see the module notes).
 *
 * @category Species data
 * @example
 * speciesDataSchema.safeParse({ sources: {}, species: [] }).success // => true
 */
export const speciesDataSchema = /* @__PURE__ */ lazySchema(() => schemas().speciesData);

/** One species entry as written in a data file (input shape). @category Species data */
export type SpeciesEntryInput = z.input<typeof speciesEntrySchema>;
/** A whole species data file (input shape). @category Species data */
export type SpeciesDataInput = z.input<typeof speciesDataSchema>;
/** One validated species entry. @category Species data */
export type SpeciesEntry = z.output<typeof speciesEntrySchema>;
/** A validated species data file. @category Species data */
export type SpeciesData = z.output<typeof speciesDataSchema>;

/**
 * JSON Schema (draft 2020-12) of species data files, generated from {@link speciesDataSchema}
 * with zod's `z.toJSONSchema`. The same document is kept in `docs/species-data.schema.json`
 * (a test checks it is up to date). The JSON Schema covers the structure only; the semantic
 * checks of {@link validateSpeciesData} (contiguous ranges, Cp > 0, sources...) come on top.
 *
 * @returns a fresh JSON Schema object
 * @category Species data
 * @example
 * speciesDataJsonSchema().required // => ["sources", "species"]
 */
export function speciesDataJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(schemas().speciesData, { target: "draft-2020-12" }) as Record<string, unknown>;
  return { ...schema, title: "rxtherm species data file" };
}

/**
 * A stand-in for a schema that is built by `build` on first use: every property read, method
 * call, `in` test, key listing and `instanceof` check goes to the built schema. zod's methods
 * close over their own schema, so calling them through the stand-in behaves exactly as on it.
 */
function lazySchema<T extends object>(build: () => T): T {
  return new Proxy({} as T, {
    get: (_, key) => {
      const target = build();
      const value: unknown = Reflect.get(target, key, target);
      return value;
    },
    has: (_, key) => Reflect.has(build(), key),
    ownKeys: () => Reflect.ownKeys(build()),
    getOwnPropertyDescriptor: (_, key) => {
      const d = Reflect.getOwnPropertyDescriptor(build(), key);
      // a proxy may only report a property as non-configurable if its own target has it so
      return d === undefined ? undefined : { ...d, configurable: true };
    },
    getPrototypeOf: () => Reflect.getPrototypeOf(build()),
    set: () => false,
    defineProperty: () => false,
    deleteProperty: () => false,
  });
}
