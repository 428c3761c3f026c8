/**
 * Private: the database records read into species parts (the JSON text is parsed once, on first use).
 *
 * @module
 * @internal
 */
import type { Formula, Phase } from "../../formula/types.js";
import type { CpRange } from "../../heat-capacity/types.js";
import type { SpeciesParts } from "../../species/libraryFromParts.js";
import { BURCAT_RUSCIC_2005_RECORDS } from "../data/burcatRuscic2005.js";

/** Data-set label and source id of the database's entries (named after the published source). */
export const DATASET = "burcat-ruscic-2005";

type Compact = [
  key: string, formula: string, phase: Phase, elements: (string | number)[], charge: number, name: string,
  aliases: string[], cas: string, hf298J: string, s298: number, ranges: number[][], note: string,
];

let parsed: readonly SpeciesParts[] | undefined;

/** Every database species as parts (cached and shared; callers copy what they change). */
export function databaseParts(): readonly SpeciesParts[] {
  if (parsed === undefined) {
    const rows = JSON.parse(BURCAT_RUSCIC_2005_RECORDS) as Compact[];
    const sources = Object.freeze({ hf298: DATASET, s298: DATASET, cp: DATASET });
    parsed = rows.map((r) => toParts(r, sources));
  }
  return parsed;
}

function toParts(r: Compact, sources: Readonly<Record<string, string>>): SpeciesParts {
  const [key, text, phase, flat, charge, name, aliases, cas, hf298J, s298, ranges, note] = r;
  const elements: Record<string, number> = {};
  for (let i = 0; i < flat.length; i += 2) elements[flat[i] as string] = flat[i + 1] as number;
  // parts stay private to this module: only what the species exposes is frozen (the formula); the
  // species copies its aliases and the heat-capacity model copies the ranges
  const formula: Formula = Object.freeze({ text, elements: Object.freeze(elements), charge, phase });
  const cpRanges: CpRange[] = ranges.map((g) => ({ TminK: g[0]!, TmaxK: g[1]!, cp: { form: "nasa7" as const, a: g.slice(2) } }));
  return {
    key, formula, phase, name, aliases, ...(cas !== "" ? { cas } : {}),
    dataset: DATASET, note, hf298Exact: hf298J, s298, sources, ranges: cpRanges, transitions: [],
  };
}
