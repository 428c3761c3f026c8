/**
 * Heat-duty case files: the zod (mini) schema, the JSON Schema generated from it (published as
 * `docs/case-file.schema.json`), and the reader that validates a case and converts its units.
 *
 * @module
 */
import * as z from "zod/mini";
import { RxthermError } from "../errors.js";
import type { HeatDutyInput, HeatDutyOptions } from "../energy/heatDuty.js";
import type { Flows, Stream } from "../extent/types.js";
import { molarMass } from "../formula/molarMass.js";
import { builtInLibrary } from "../species/builtInLibrary.js";
import { englishMessages } from "../species/schema.js";
import type { Library } from "../species/types.js";
import { toMolPerSecond, type FlowUnit, type PowerUnit } from "../units.js";
import { FLOW_UNITS, POWER_UNITS, PRESSURE_PATTERN, TEMPERATURE_PATTERN, readPressure, readTemperature } from "./internal/quantity.js";

/** Molar flow units allowed for `extentUnit` (extents of reaction are amounts, never masses). */
const EXTENT_UNITS = ["mol/s", "mol/h", "kmol/s", "kmol/h", "lbmol/h"] as const;

/** One problem found in a case file: where (a JSON path such as `$.inlet[0].T`) and what. @category Command line */
export interface CaseFileIssue {
  /** JSON path of the bad field, `$` for the whole file. */
  readonly path: string;
  /** What is wrong, lowercase. */
  readonly message: string;
}

/** A case file read and converted to SI: the input and options of `heatDuty`, and how to print it. @category Command line */
export interface CaseFile {
  /** Title from the file, or `""`. */
  readonly title: string;
  /** Inlet and outlet streams in K, Pa and mol/s, with reactions and extents (mol/s) when given. */
  readonly input: HeatDutyInput & { readonly inlet: readonly Stream[]; readonly outlet: readonly Stream[] };
  /** Method and extrapolation. */
  readonly options: HeatDutyOptions;
  /** Unit the duty is printed in. */
  readonly dutyUnit: PowerUnit;
  /** Stream names, inlet then outlet (`inlet 1`... when the file gives none). */
  readonly names: { readonly inlet: readonly string[]; readonly outlet: readonly string[] };
}

let schema: z.ZodMiniType | undefined;

/**
 * The zod schema of a heat-duty case file, built on first use (so importing the command line costs no schema
 * construction).
 *
 * @returns the zod schema (strict objects: an unknown field is an error)
 * @category Command line
 * @example
 * caseFileSchema().safeParse({ inlet: [{ T: "25C", flows: { "N2(g)": 1 } }], outlet: [{ T: 500, flows: { "N2(g)": 1 } }] }).success // => true
 */
export function caseFileSchema(): z.ZodMiniType {
  if (schema !== undefined) return schema;
  const d = (text: string) => z.describe(text);
  const temperature = z.union([
    z.number().check(z.positive(), d("temperature in K")),
    z.string().check(z.regex(new RegExp(TEMPERATURE_PATTERN), "expected a temperature such as \"25C\", \"77F\" or \"298.15K\" (a bare number is K)"), d("temperature with unit: K, C, °C, F, °F or R, e.g. \"25C\"")),
  ]);
  const pressure = z.union([
    z.number().check(z.positive(), d("pressure in Pa")),
    z.string().check(z.regex(new RegExp(PRESSURE_PATTERN), "expected a pressure such as \"2bar\", \"1atm\", \"30psi\" or \"250kPa\" (a bare number is Pa)"), d("pressure with unit: Pa, kPa, MPa, bar, atm or psi, e.g. \"2bar\"")),
  ]);
  const flowUnit = () => z.enum(FLOW_UNITS as [FlowUnit, ...FlowUnit[]]);
  const stream = z.strictObject({
    name: z.optional(z.string()).check(d("label printed in the results")),
    T: temperature,
    P: z.optional(pressure).check(d("pressure (default 1 bar; enthalpies of ideal gases do not depend on it)")),
    flowUnit: z.optional(flowUnit()).check(d("unit of this stream's flows (default: the file's flowUnit)")),
    flows: z.record(z.string().check(z.minLength(1)), z.number().check(z.nonnegative())).check(d("species key with phase → flow, e.g. {\"CH4(g)\": 72}")),
  });
  schema = z.strictObject({
    $schema: z.optional(z.string()).check(d("URL or path of this JSON Schema, for editors")),
    title: z.optional(z.string()),
    description: z.optional(z.string()),
    flowUnit: z.optional(flowUnit()).check(d("unit of the stream flows (default mol/s); mass units use each species' molar mass, Nm³ the ideal gas at 0 °C, 101.325 kPa")),
    inlet: z.array(stream).check(z.minLength(1), d("streams entering the unit")),
    outlet: z.array(stream).check(z.minLength(1), d("streams leaving the unit")),
    reactions: z.optional(z.array(z.string().check(z.minLength(1)))).check(d("balanced reactions, for the heat-of-reaction method by extents")),
    extents: z.optional(z.array(z.number())).check(d("extent of each reaction, in extentUnit")),
    extentUnit: z.optional(z.enum(EXTENT_UNITS)).check(d("unit of the extents (default mol/s)")),
    method: z.optional(z.enum(["formation", "reaction"])).check(d("method that gives the duty (default formation; both are computed)")),
    extrapolate: z.optional(z.boolean()).check(d("allow temperatures outside the species' data ranges (default false)")),
    dutyUnit: z.optional(z.enum(POWER_UNITS as [PowerUnit, ...PowerUnit[]])).check(d("unit of the printed duty (default kW)")),
  }).check(d("rxtherm heat-duty case file: streams in and out of a unit, for rxtherm duty"));
  return schema;
}

/**
 * The JSON Schema (draft 2020-12) of heat-duty case files, generated from {@link caseFileSchema}; the copy in
 * `docs/case-file.schema.json` is checked against it by the tests.
 *
 * @returns the JSON Schema object
 * @category Command line
 * @example
 * caseFileJsonSchema().required // => ["inlet", "outlet"]
 */
export function caseFileJsonSchema(): Record<string, unknown> {
  const json = z.toJSONSchema(caseFileSchema(), { target: "draft-2020-12" }) as Record<string, unknown>;
  return { ...json, title: "rxtherm heat-duty case file" };
}

/**
 * Read a heat-duty case file: parse the JSON, validate it against {@link caseFileSchema}, check every species
 * key against the library, and convert temperatures, pressures and flows to K, Pa and mol/s.
 *
 * @param text - the file's text (JSON)
 * @param library - species library for the key check and molar masses; the built-in set when omitted
 * @returns the case in SI units, ready for `heatDuty`
 * @throws RxthermError `INVALID_CASE` listing every problem with its JSON path (`details.issues`, {@link CaseFileIssue})
 * @category Command line
 * @example
 * readCaseFile('{"inlet":[{"T":"25C","flows":{"N2(g)":3.6}}],"outlet":[{"T":"500K","flows":{"N2(g)":3.6}}],"flowUnit":"kmol/h"}')
 *   .input.inlet // => [{ T: 298.15, P: 100000, flows: { "N2(g)": 1 } }]
 */
export function readCaseFile(text: string, library?: Library): CaseFile {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw invalid([{ path: "$", message: `not valid JSON: ${(e as Error).message}` }]);
  }
  const parsed = caseFileSchema().safeParse(data, englishMessages());
  if (!parsed.success) {
    throw invalid(parsed.error.issues.map((i) => ({ path: jsonPath(i.path), message: i.message.charAt(0).toLowerCase() + i.message.slice(1) })));
  }
  const c = parsed.data as CaseData;
  const lib = library ?? builtInLibrary();
  const issues: CaseFileIssue[] = [];
  const streams = (side: "inlet" | "outlet"): Stream[] =>
    c[side].map((s, i) => {
      const at = `$.${side}[${i}]`;
      const unit = s.flowUnit ?? c.flowUnit ?? "mol/s";
      const flows: Flows = {};
      for (const [key, value] of Object.entries(s.flows)) {
        const where = `${at}.flows${segment(key)}`;
        let M: number | undefined;
        try {
          M = molarMass(lib.get(key).formula);
        } catch (e) {
          issues.push({ path: where, message: plain(e) });
          continue;
        }
        flows[key] = toMolPerSecond({ value, unit, molarMassGPerMol: M });
      }
      const T = convert(issues, `${at}.T`, () => (typeof s.T === "number" ? s.T : readTemperature(s.T, "T")));
      const P = s.P === undefined ? 1e5 : convert(issues, `${at}.P`, () => (typeof s.P === "number" ? s.P : readPressure(s.P!, "P")));
      return { T, P, flows };
    });
  const inlet = streams("inlet");
  const outlet = streams("outlet");
  if (c.extents !== undefined && c.reactions === undefined) issues.push({ path: "$.extents", message: "extents need reactions" });
  if (c.extents !== undefined && c.reactions !== undefined && c.extents.length !== c.reactions.length) {
    issues.push({ path: "$.extents", message: `${c.extents.length} extents for ${c.reactions.length} reactions` });
  }
  if (issues.length > 0) throw invalid(issues);
  const input: HeatDutyInput & { inlet: Stream[]; outlet: Stream[] } = { inlet, outlet, ...(library ? { library } : {}) };
  if (c.reactions !== undefined) input.reactions = c.reactions;
  if (c.extents !== undefined) {
    const unit = c.extentUnit ?? "mol/s";
    input.extents = c.extents.map((x) => toMolPerSecond({ value: x, unit }));
  }
  const name = (side: "inlet" | "outlet") => c[side].map((s, i) => s.name ?? `${side} ${i + 1}`);
  return {
    title: c.title ?? "",
    input,
    options: { method: c.method ?? "formation", extrapolate: c.extrapolate ?? false },
    dutyUnit: c.dutyUnit ?? "kW",
    names: { inlet: name("inlet"), outlet: name("outlet") },
  };
}

interface CaseData {
  title?: string;
  flowUnit?: FlowUnit;
  inlet: { name?: string; T: number | string; P?: number | string; flowUnit?: FlowUnit; flows: Record<string, number> }[];
  outlet: CaseData["inlet"];
  reactions?: string[];
  extents?: number[];
  extentUnit?: (typeof EXTENT_UNITS)[number];
  method?: "formation" | "reaction";
  extrapolate?: boolean;
  dutyUnit?: PowerUnit;
}

function invalid(issues: CaseFileIssue[]): RxthermError {
  const list = issues.map((i) => `\n  ${i.path}: ${i.message}`).join("");
  return new RxthermError("INVALID_CASE", `readCaseFile: the case file has ${issues.length} problem${issues.length === 1 ? "" : "s"}:${list}`, { issues });
}

/** `["inlet", 0, "flows", "CH4(g)"]` → `$.inlet[0].flows["CH4(g)"]`. */
function jsonPath(path: readonly PropertyKey[]): string {
  return "$" + path.map(segment).join("");
}
function segment(p: PropertyKey): string {
  if (typeof p === "number") return `[${p}]`;
  return /^[A-Za-z_$][\w$]*$/.test(String(p)) ? `.${String(p)}` : `[${JSON.stringify(String(p))}]`;
}

function convert(issues: CaseFileIssue[], path: string, f: () => number): number {
  try {
    return f();
  } catch (e) {
    issues.push({ path, message: plain(e) });
    return Number.NaN;
  }
}

/** An error's message without the library tag. */
function plain(e: unknown): string {
  return (e instanceof Error ? e.message : String(e)).replace(/^\[rxtherm\] /, "");
}
