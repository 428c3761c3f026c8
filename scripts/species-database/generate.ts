/**
 * Generator of the opt-in species database (`rxtherm/database`) from the Burcat–Ruscic 2005 edition
 * (A. Burcat, B. Ruscic, ANL-05/20 and TAE 960, 2005), copied verbatim in data/burcat-ruscic-2005.json.
 *
 * Writes two files:
 * - src/database/data/burcatRuscic2005.ts — every usable record in a compact form (one JSON text that
 *   the database parses on first use; NASA 7-coefficient sets as published, nothing refitted);
 * - docs/species-database.md — the records used, skipped and fixed, and why; the key scheme.
 *
 * Run: `npm run generate:database`. tests/database/generated.test.ts re-runs {@link generateSpeciesDatabase}
 * and fails when either file is not what it produces.
 */
import Decimal from "decimal.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { molarMass } from "../../src/formula/molarMass.js";
import { formatFormula } from "../../src/formula/formatFormula.js";

/** One record of the source file (the fields this generator reads). */
interface SourceRecord {
  label: string;
  name: string;
  cas: string;
  phase: "g" | "l" | "cr";
  elements: Record<string, number>;
  M_g_per_mol: number;
  Tlow_K: number;
  Tmid_K: number;
  Thigh_K: number;
  low: number[];
  high: number[];
  hf298_kJ_per_mol: number;
  hf298_note?: string[];
  source_code: string;
  date: string;
  selfcheck: string;
}

interface SourceFile {
  citation: string;
  count: number;
  records: SourceRecord[];
}

/**
 * One species of the database, as stored: key, formula text, phase, element list (symbol, count, ...),
 * charge, name, aliases, CAS number ("" when none), ΔfH°(298.15 K) in J/mol as exact decimal text,
 * S°(298.15 K) in J/(mol·K), Cp ranges [TminK, TmaxK, a1..a7], note.
 */
export type CompactRecord = [
  key: string, formula: string, phase: string, elements: (string | number)[], charge: number, name: string,
  aliases: string[], cas: string, hf298J: string, s298: number, ranges: number[][], note: string,
];

/** What the generator produced and why. */
export interface GeneratedDatabase {
  readonly records: CompactRecord[];
  readonly moduleText: string;
  readonly docsText: string;
}

/** Gas constant used by the source for its hf298/R (its `units` field), J/(mol·K). */
const R = 8.31446261815324;
const T0 = 298.15;
const CAS = /^\d{2,7}-\d{2}-\d$/;
const DEC = Decimal.clone({ precision: 40 });

/** Same species recorded twice by different methods: the record kept and why (deliberate picks). */
const DUPLICATE_PICKS: Readonly<Record<string, { keep: string; why: string }>> = {
  "CH4   ANHARMONIC": { keep: "CH4   RRHO", why: "same species as `CH4   RRHO`; this record departs from NIST-JANAF (table C-067) by 2.7 % in Cp at 1000 K and 7.7 % at 2000 K, the RRHO record stays within 0.5 % and is kept" },
  "NH3  RRHO   G3B3": { keep: "NH3 Anharmonic", why: "same species as `NH3 Anharmonic`; the calculated RRHO record departs from NIST-JANAF at high temperature (the file's known limits), the anharmonic record (Gurvich tables) is kept" },
  "CD4 * ANHARMONIC": { keep: "CD4    RRHO", why: "same species as `CD4    RRHO` (the name text says: data as for RRHO); the RRHO record is kept, as for CH4" },
  "PbBr2|J": { keep: "PbBr2|tpis", why: "same species as the other `PbBr2` record; the Gurvich record (1991, 200–6000 K) is kept over the JANAF 1973 record (300–5000 K)" },
};

/** Words of a label or name that say nothing about which species it is. */
const STOPWORDS = new Set(["ref", "element", "elemen", "solid", "liquid", "crystal", "condensed", "s", "l", "cr", "g", "gr"]);

/**
 * Parse the source file's text. It is JSON except that an incomplete coefficient set is written as
 * the bare token NaN (as Python's json module writes it); that token is read as null.
 */
export function readSource(text: string): SourceFile {
  return JSON.parse(text.replace(/([,[:]\s*)NaN(?=\s*[,\]}])/g, "$1null")) as SourceFile;
}

/** Read the source file and produce the compact records, the data module and the docs page. */
export function generateSpeciesDatabase(source: SourceFile): GeneratedDatabase {
  const skipped: { label: string; phase: string; why: string }[] = [];
  const fixed: { label: string; what: string }[] = [];
  /** Records whose stated ΔfH° is replaced by the polynomial's H(298.15 K) (see the check below). */
  const statedOverride = new Map<SourceRecord, number>();
  const chained: { label: string; parts: number }[] = [];
  interface Work { rec: SourceRecord; parts: SourceRecord[]; formula: string; hill: string; elements: Record<string, number>; charge: number; paren: string; rest: string }
  const work: Work[] = [];

  for (let rec of source.records) {
    const dupKey = DUPLICATE_PICKS[rec.label] !== undefined ? rec.label : `${rec.label}|${rec.source_code}`;
    const pick = DUPLICATE_PICKS[dupKey];
    if (pick !== undefined) {
      skipped.push({ label: rec.label, phase: rec.phase, why: `duplicate: ${pick.why}` });
      continue;
    }
    const check = rec.selfcheck;
    if (check.startsWith("coefficients")) {
      skipped.push({ label: rec.label, phase: rec.phase, why: `self-check: ${check}` });
      continue;
    }
    if (check.startsWith("step at 1000 K")) {
      skipped.push({ label: rec.label, phase: rec.phase, why: `self-check: ${check} (the two published ranges do not join; not refitted)` });
      continue;
    }
    // the stated ΔfH° against the polynomial's own H(298.15 K), which the source's self-check does not test
    // when the stated value is corrupt (COS states −1.38e-8 kJ/mol; its polynomial and note give −138.4)
    if (holds298(rec)) {
      const hPoly = polyH(rec, T0) / 1000;
      if (Math.abs(rec.hf298_kJ_per_mol - hPoly) > 2) {
        const noted = Number(/[-+]?\d+(?:\.\d+)?/.exec((rec.hf298_note ?? []).join(" "))?.[0] ?? Number.NaN);
        if (Math.abs(noted - hPoly) <= 1) {
          statedOverride.set(rec, hPoly);
          fixed.push({ label: rec.label, what: `stated ΔfH° ${rec.hf298_kJ_per_mol} kJ/mol disagrees with the polynomial's H(298.15 K), ${hPoly.toFixed(3)} kJ/mol, which the record's note gives first (${(rec.hf298_note ?? []).join("; ")}); the polynomial's value is used, so that H(T) is the record's polynomial throughout` });
        } else {
          skipped.push({ label: rec.label, phase: rec.phase, why: `stated ΔfH° ${rec.hf298_kJ_per_mol.toFixed(3)} kJ/mol and the polynomial's H(298.15 K) ${hPoly.toFixed(3)} kJ/mol disagree by ${Math.abs(rec.hf298_kJ_per_mol - hPoly).toFixed(1)} kJ/mol inside the range` });
          continue;
        }
      }
    }
    const phaseFix = labelPhase(rec);
    if (phaseFix !== null) {
      fixed.push({ label: rec.label, what: `phase ${rec.phase} (the name text mentions both solid and liquid) read as ${phaseFix}, as the label's "(…)" says` });
      rec = { ...rec, phase: phaseFix };
    }
    const cpMin = lowestCp(rec);
    if (!(cpMin > 0)) {
      skipped.push({ label: rec.label, phase: rec.phase, why: `Cp from the polynomial falls to ${cpMin.toFixed(1)} J/(mol·K) inside the record's range (checked at 200 points per range)` });
      continue;
    }
    const reading = readIdentity(rec);
    if (reading === null) {
      skipped.push({ label: rec.label, phase: rec.phase, why: check === "ok" ? "no element list could be confirmed against the stated molar mass" : `self-check: ${check}; the label does not give a formula that matches the stated molar mass` });
      continue;
    }
    if (reading.fixedFrom !== null) fixed.push({ label: rec.label, what: `element list ${JSON.stringify(reading.fixedFrom)} replaced by ${reading.formula}, read from the label and confirmed by the stated molar mass ${rec.M_g_per_mol} g/mol` });
    const inRange = holds298(rec);
    if (check.startsWith("H(298.15)") && !statedOverride.has(rec)) {
      if (inRange) {
        skipped.push({ label: rec.label, phase: rec.phase, why: `self-check: ${check}, with 298.15 K inside the record's range: the stated ΔfH° and the polynomial disagree` });
        continue;
      }
      fixed.push({ label: rec.label, what: `self-check "${check}": the phase exists only below 298.15 K (range ${rec.Tlow_K}–${rec.Thigh_K} K), so ΔfH°(298.15 K) is taken from the polynomial like every phase whose range excludes 298.15 K; the stated value is that of the stable phase` });
    }
    // a record continued by one with the same label, phase and a touching range: one species
    const prev = work[work.length - 1];
    if (prev !== undefined && prev.rec.label === rec.label && prev.rec.phase === rec.phase && prev.parts[prev.parts.length - 1]!.Thigh_K === rec.Tlow_K) {
      prev.parts.push(rec);
      continue;
    }
    work.push({ rec, parts: [rec], ...reading });
  }
  for (const w of work) if (w.parts.length > 1) chained.push({ label: w.rec.label, parts: w.parts.length });

  // keys: formula + phase; a tag in front where several species share formula and phase
  const groups = new Map<string, Work[]>();
  for (const w of work) {
    const g = `${w.formula}(${w.rec.phase})`;
    groups.set(g, [...(groups.get(g) ?? []), w]);
  }
  const records: CompactRecord[] = [];
  const keyOf = new Map<Work, string>();
  for (const [g, ws] of groups) {
    if (ws.length === 1) {
      keyOf.set(ws[0]!, g);
      continue;
    }
    const used = new Set<string>();
    for (const w of ws) {
      let tag = slug([w.paren, w.rest].filter((x) => x !== "").join(" "));
      if (tag === "" || used.has(tag)) tag = slug(nameRest(w.rec.name).split(/\s+/).slice(0, 3).join(" ")) || tag;
      if (tag === "") tag = w.rec.source_code.toLowerCase() || "record";
      let t = tag;
      for (let i = 2; used.has(t); i++) t = `${tag}-${i}`;
      used.add(t);
      keyOf.set(w, `${t}-${g}`);
    }
  }
  for (const w of work) {
    const key = keyOf.get(w)!;
    const ranges = w.parts.flatMap(rangesOf);
    const first = w.parts[0]!;
    const holds = holds298(first);
    const override = statedOverride.get(first);
    const hf = holds && override === undefined ? new DEC(String(first.hf298_kJ_per_mol)).times(1000) : new DEC(polyH(first, T0).toPrecision(12));
    const hfText = hf.isZero() ? "0" : hf.toFixed();
    const s298 = Number(polyS(first, T0).toPrecision(12));
    const name = collapse(w.rec.name) || collapse(w.rec.label);
    const casList = w.rec.cas.split(/\s+/).filter((c) => CAS.test(c));
    const plainName = collapse(nameRest(w.rec.name)).replace(/\s*[([].*$/, "");
    const aliases = unique([collapse(w.rec.label), w.rest, collapse(nameRest(w.rec.name)), plainName, ...casList, w.hill]
      .filter((a) => a !== "" && a !== key && a !== name && a !== w.formula));
    const notes = [`Burcat–Ruscic 2005 record "${collapse(w.rec.label)}"${w.parts.length > 1 ? ` (${w.parts.length} records of one phase, chained)` : ""}, origin ${w.rec.source_code || "not stated"}, ${w.rec.date || "undated"}`];
    if (!holds) notes.push("ΔfH° and S° at 298.15 K are those of the polynomial extended to 298.15 K (the phase is outside its range there), so that H(T) and S(T) inside the range are the database's");
    else notes.push("S°(298.15 K) from the polynomial (a7)");
    const elements = Object.entries(w.elements).flat();
    records.push([key, w.formula, w.rec.phase, elements, w.charge, name, aliases, casList[0] ?? "", hfText, s298, ranges, notes.join("; ")]);
  }
  records.sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  return { records, moduleText: moduleText(source, records), docsText: docsText(source, records, skipped, fixed, chained) };
}

// ── identity: formula, charge, composition ───────────────────────────────────

/** Formula text, Hill formula, elements and charge of a record, or null when they cannot be confirmed. */
function readIdentity(rec: SourceRecord): { formula: string; hill: string; elements: Record<string, number>; charge: number; paren: string; rest: string; fixedFrom: Record<string, number> | null } | null {
  const label = collapse(rec.label);
  const [tok0 = "", ...restWords] = label.split(" ");
  // "C8H18(L),n-octan": a comma after the phase bracket starts the structure text
  const commaAt = tok0.indexOf("),");
  const head = commaAt >= 0 ? tok0.slice(0, commaAt + 1) : tok0;
  const afterComma = commaAt >= 0 ? [tok0.slice(commaAt + 2)] : [];
  const pm = /^(.*?)\(([^)]*)\)$/.exec(head);
  let token = pm !== null && pm[1] !== "" ? pm[1]! : head;
  let paren = pm !== null && pm[1] !== "" ? pm[2]! : "";
  // "1,1-C2H2F2", "T-C3H5", "1-C3H7I": a position or structure prefix in front of the formula
  const pre = /^([0-9A-Za-z,]+)-([A-Z].*)$/.exec(tok0);
  if (pre !== null && readToken(pre[2]!, null) !== null && readToken(token, null) === null) {
    token = pre[2]!;
    paren = pre[1]!;
  }
  const rest = collapse([...(pre !== null && token === pre[2] ? [] : afterComma), ...restWords].join(" "));
  let elements: Record<string, number> = {};
  let charge = 0;
  for (const [k, v] of Object.entries(rec.elements)) {
    if (k === "E") charge = -v;
    else elements[k] = v;
  }
  let fixedFrom: Record<string, number> | null = null;
  const massOk = (els: Record<string, number>): boolean => {
    try {
      return Object.keys(els).length > 0 && Math.abs(molarMass(parseFormula(hillOf(els, 0))) - rec.M_g_per_mol) <= 0.05;
    } catch {
      return false;
    }
  };
  if (!massOk(elements)) {
    // the element list is missing or wrong (e.g. "L" for aluminium): read the label, confirm by the molar mass
    const f = readToken(token, null);
    if (f === null || !massOk(f.elements)) return null;
    fixedFrom = { ...rec.elements };
    elements = f.elements;
    charge = f.charge;
  }
  const hill = hillOf(elements, charge);
  const read = readToken(token, elements);
  const formula = read !== null && sameElements(read.elements, elements) && read.charge === charge ? read.text : hill;
  return { formula, hill, elements, charge, paren: STOPWORDS.has(paren.toLowerCase()) ? "" : paren, rest, fixedFrom };
}

/** The phase the label's "(s)", "(cr)" or "(L)" states when it contradicts the file's phase field, else null. */
function labelPhase(rec: SourceRecord): "cr" | "l" | null {
  const m = /^[^\s(]+\(([A-Za-z]+)\)/.exec(rec.label.trim());
  const p = m === null ? "" : m[1]!.toLowerCase();
  if ((p === "s" || p === "cr") && rec.phase === "l") return "cr";
  if (p === "l" && rec.phase === "cr") return "l";
  return null;
}

/** Read a label token as a formula, fixing upper-case two-letter symbols (CL → Cl) when that makes it readable. */
function readToken(token: string, expected: Record<string, number> | null): { text: string; elements: Record<string, number>; charge: number } | null {
  const m = /^(.*?)([+-]+)$/.exec(token);
  const neutral = m === null ? token : m[1]!;
  const charge = m === null ? 0 : (m[2]!.startsWith("+") ? 1 : -1) * m[2]!.length;
  const candidates = [neutral];
  const symbols = expected === null ? TWO_LETTER : Object.keys(expected).filter((s) => s.length === 2);
  let fixedText = neutral;
  for (const s of symbols) fixedText = fixedText.split(s.toUpperCase()).join(s);
  if (fixedText !== neutral) candidates.push(fixedText);
  for (const c of candidates) {
    if (!/^[A-Za-z0-9()]+$/.test(c)) continue;
    try {
      const f = parseFormula(c);
      if (f.charge !== 0 || f.phase !== null) continue;
      const els: Record<string, number> = {};
      for (const [k, v] of Object.entries(f.elements)) els[k] = v;
      if (expected !== null && !sameElements(els, expected)) continue;
      return { text: charge === 0 ? c : `${c}^${Math.abs(charge) === 1 ? "" : Math.abs(charge)}${charge > 0 ? "+" : "-"}`, elements: els, charge };
    } catch {
      // not a formula
    }
  }
  return null;
}

const TWO_LETTER = ["Cl", "Br", "Al", "Mg", "Si", "Fe", "Ni", "Cr", "Mn", "Mo", "Pb", "Hg", "Zn", "Sn", "Ti", "Ge", "Ca", "Ba", "Ar", "He", "Ne", "Kr", "Xe"];

function sameElements(a: Record<string, number>, b: Record<string, number>): boolean {
  const ka = Object.keys(a);
  return ka.length === Object.keys(b).length && ka.every((k) => a[k] === b[k]);
}

/** Hill order (C, H, then alphabetical; alphabetical without carbon), charge as ^+ / ^2-. */
function hillOf(els: Record<string, number>, charge: number): string {
  return formatFormula({ text: "", elements: els, charge, phase: null });
}

// ── thermochemistry of a record ──────────────────────────────────────────────

/** The record's Cp ranges as [TminK, TmaxK, a1..a7]: the low set below Tmid, the high set above. */
function rangesOf(rec: SourceRecord): number[][] {
  if (rec.Thigh_K <= rec.Tmid_K) return [[rec.Tlow_K, rec.Thigh_K, ...rec.low]];
  if (rec.Tlow_K >= rec.Tmid_K) return [[rec.Tlow_K, rec.Thigh_K, ...rec.high]];
  return [[rec.Tlow_K, rec.Tmid_K, ...rec.low], [rec.Tmid_K, rec.Thigh_K, ...rec.high]];
}

/** Lowest Cp of the record's polynomial over its range, J/(mol·K) (200 points per range and both ends). */
function lowestCp(rec: SourceRecord): number {
  let min = Infinity;
  for (const [lo, hi, ...a] of rangesOf(rec)) {
    for (let i = 0; i <= 200; i++) {
      const T = lo! + ((hi! - lo!) * i) / 200;
      min = Math.min(min, R * (a[0]! + T * (a[1]! + T * (a[2]! + T * (a[3]! + T * a[4]!)))));
    }
  }
  return min;
}

/** 298.15 K inside the record's range (a start up to 300 K counts: the NASA convention). */
function holds298(rec: SourceRecord): boolean {
  return rec.Tlow_K <= 300 && rec.Thigh_K >= T0;
}

/** The coefficient set that holds (or extends to) T. */
function setAt(rec: SourceRecord, T: number): number[] {
  if (rec.Thigh_K <= rec.Tmid_K) return rec.low;
  if (rec.Tlow_K >= rec.Tmid_K) return rec.high;
  return T <= rec.Tmid_K ? rec.low : rec.high;
}

/** H(T) of the polynomial, J/mol: R·T·(a1 + a2T/2 + a3T²/3 + a4T³/4 + a5T⁴/5 + a6/T). */
function polyH(rec: SourceRecord, T: number): number {
  const a = setAt(rec, T);
  return R * T * (a[0]! + (a[1]! * T) / 2 + (a[2]! * T * T) / 3 + (a[3]! * T ** 3) / 4 + (a[4]! * T ** 4) / 5 + a[5]! / T);
}

/** S°(T) of the polynomial, J/(mol·K): R·(a1 ln T + a2T + a3T²/2 + a4T³/3 + a5T⁴/4 + a7). */
function polyS(rec: SourceRecord, T: number): number {
  const a = setAt(rec, T);
  return R * (a[0]! * Math.log(T) + a[1]! * T + (a[2]! * T * T) / 2 + (a[3]! * T ** 3) / 3 + (a[4]! * T ** 4) / 4 + a[6]!);
}

// ── text helpers ─────────────────────────────────────────────────────────────

function collapse(s: string): string {
  return s.replace(/\s+/g, " ").trim();
}

/** A name text without its leading formula word. */
function nameRest(name: string): string {
  const words = collapse(name).split(" ");
  return words.length > 1 ? words.slice(1).join(" ") : "";
}

/** Lower-case tag: letters, digits and commas, words joined by "-", stop words dropped, at most 24 characters. */
function slug(text: string): string {
  const words = text.toLowerCase().split(/[^a-z0-9,]+/).filter((w) => w !== "" && !STOPWORDS.has(w));
  let out = "";
  for (const w of words) {
    const next = out === "" ? w : `${out}-${w}`;
    if (next.length > 24) break;
    out = next;
  }
  return out;
}

function unique(xs: string[]): string[] {
  return [...new Set(xs)];
}

// ── outputs ──────────────────────────────────────────────────────────────────

function moduleText(source: SourceFile, records: CompactRecord[]): string {
  return `/**
 * The Burcat–Ruscic 2005 species database in compact form, GENERATED by
 * scripts/species-database/generate.ts from data/burcat-ruscic-2005.json: do not edit; run
 * \`npm run generate:database\` (docs/species-database.md says what was used, skipped and fixed).
 *
 * Source: ${source.citation}
 *
 * One JSON text (parsed on first use, which is faster than an object literal of this size): an array of
 * [key, formula, phase, elements, charge, name, aliases, cas, ΔfH°298 J/mol (exact text), S°298 J/(mol·K),
 * ranges [TminK, TmaxK, a1..a7] (NASA 7-coefficient, as published), note].
 *
 * @module
 * @internal
 */

/** Full citation of the source. */
export const BURCAT_RUSCIC_2005_CITATION = ${JSON.stringify(source.citation)};

/** Number of species in {@link BURCAT_RUSCIC_2005_RECORDS}. */
export const BURCAT_RUSCIC_2005_COUNT = ${records.length};

/** The records as one JSON text. */
export const BURCAT_RUSCIC_2005_RECORDS = ${JSON.stringify(JSON.stringify(records))};
`;
}

function docsText(source: SourceFile, records: CompactRecord[], skipped: { label: string; phase: string; why: string }[], fixed: { label: string; what: string }[], chained: { label: string; parts: number }[]): string {
  const byPhase = (p: string): number => records.filter((r) => r[2] === p).length;
  const tagged = records.filter((r) => !r[0].startsWith(r[1] + "(")).length;
  const reasons = new Map<string, number>();
  for (const s of skipped) {
    const r = s.why.startsWith("duplicate") ? "duplicate record of a species kept under another record"
      : s.why.includes("step at 1000 K") ? "self-check: the two ranges do not join at 1000 K (step in Cp above 0.2 % or in S above 0.1 J/(mol·K))"
        : s.why.includes("H(298.15)") ? "self-check: stated ΔfH° and polynomial disagree at 298.15 K inside the range"
          : s.why.includes("coefficients") ? "self-check: coefficients incomplete"
            : s.why.startsWith("Cp from the polynomial") ? "Cp of the polynomial not positive inside the range"
            : "no element list (a mixture or pseudo-species) that the label and molar mass could confirm";
    reasons.set(r, (reasons.get(r) ?? 0) + 1);
  }
  const usedRecords = records.length + chained.reduce((n, c) => n + c.parts - 1, 0);
  const lines = [
    "# Species database: Burcat–Ruscic 2005",
    "",
    "<!-- GENERATED by scripts/species-database/generate.ts (npm run generate:database): do not edit. tests/database/generated.test.ts checks that it is current. -->",
    "",
    `Source: ${source.citation}`,
    "",
    "`speciesDatabase()` from `rxtherm/database` is a `Library` of every usable record of that edition",
    "(NASA 7-coefficient polynomials as published, nothing refitted). Pass it wherever a library is",
    "accepted; see [species.md](species.md#the-opt-in-species-database) for use, layering and cautions.",
    "",
    "## Counts",
    "",
    "| | count |",
    "|---|---|",
    `| records in the edition | ${source.records.length} |`,
    `| records used | ${usedRecords} |`,
    `| records skipped | ${skipped.length} |`,
    `| species in the database | ${records.length} (${byPhase("g")} gas, ${byPhase("l")} liquid, ${byPhase("cr")} crystalline) |`,
    `| species whose records were chained (one phase split over touching ranges) | ${chained.length} |`,
    `| records fixed (see below) | ${fixed.length} |`,
    `| keys with a structure or isomer tag | ${tagged} |`,
    "",
    "Skipped, by reason:",
    "",
    "| reason | records |",
    "|---|---|",
    ...[...reasons].sort((a, b) => b[1] - a[1]).map(([r, n]) => `| ${r} | ${n} |`),
    "",
    "## Keys",
    "",
    "A key is the formula with its phase, `CO2(g)`, `H2O(l)`, `Fe2O3(cr)`. The formula is the one the",
    "record's label writes (`CH3OCH3`, `C2H5OH`, `HCl`; upper-case symbols such as `CL` read as `Cl`) when",
    "it has the record's composition, otherwise the Hill formula; ions carry their charge as `^+` / `^-`",
    "(`N2^+(g)`). Where several species share formula and phase, each key starts with a tag taken from",
    "the rest of the label (the isomer, structure, polymorph or electronic state), else from the name",
    "text: `acetone-C3H6O(g)`, `me-oxyrane-C3H6O(g)`, `a-Fe(cr)`, `singlet-CH2(g)`; a plain `C3H6O(g)`",
    "then fails with `AMBIGUOUS_SPECIES` listing them, and `findSpecies(\"C3H6O\", db)` returns them all.",
    "Every species is also found by its name text, the label, the CAS number, the Hill formula and the",
    "key without phase (aliases; case-insensitive).",
    "",
    "ΔfH°(298.15 K) is the record's stated value (its hf298/R × R). S°(298.15 K) is computed from the",
    "polynomial (a7). For a phase whose range excludes 298.15 K (a liquid above its melting point, a",
    "high-temperature polymorph, a solid below 298.15 K) both are those of the polynomial extended to",
    "298.15 K, so that H(T) and S(T) inside the range are the database's own. Records that start at",
    "300 K are read down to 298.15 K, as for the built-in set.",
    "",
    "## Records chained into one species",
    "",
    ...(chained.length === 0 ? ["None."] : chained.map((c) => `- \`${c.label}\`: ${c.parts} records`)),
    "",
    "## Records fixed",
    "",
    ...(fixed.length === 0 ? ["None."] : fixed.map((f) => `- \`${f.label}\`: ${f.what}`)),
    "",
    "## Records skipped",
    "",
    "| label | phase | why |",
    "|---|---|---|",
    ...skipped.map((s) => `| \`${s.label.replace(/\|/g, "\\|")}\` | ${s.phase} | ${s.why.replace(/\|/g, "\\|")} |`),
    "",
  ];
  return lines.join("\n");
}

// ── command line: write the two files ────────────────────────────────────────

if (process.argv[1] !== undefined && /generate\.ts$/.test(process.argv[1])) {
  const { readFileSync, writeFileSync } = await import("node:fs");
  const root = new URL("../../", import.meta.url);
  const source = readSource(readFileSync(new URL("data/burcat-ruscic-2005.json", root), "utf8"));
  const out = generateSpeciesDatabase(source);
  writeFileSync(new URL("src/database/data/burcatRuscic2005.ts", root), out.moduleText);
  writeFileSync(new URL("docs/species-database.md", root), out.docsText);
  console.log(`species database: ${out.records.length} species written`);
}
