/**
 * The species data-quality page (docs/species-data-quality.md), generated from the built-in data:
 * for each built-in species its sources, range, transitions and the deviation from NIST-JANAF rows
 * measured here (tests/fixtures/janaf*.json) or, where the project holds no rows, as reported by the
 * self-check of the reference file the entry came from. `npm run data-quality` writes the page;
 * tests/docs/speciesDataQuality.test.ts fails when the committed page is stale.
 *
 * Not part of the library (it reads the test fixtures with node:fs).
 */
import { readFileSync } from "node:fs";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";
import type { Species } from "../../src/species/types.js";

/** One NIST-JANAF row as the fixtures hold it (T in K, Cp J/(mol·K), H − H298 kJ/mol). */
export interface JanafRow {
  readonly T: number;
  readonly Cp?: number | null;
  readonly H_minus_H298?: number | null;
  readonly note?: string;
}

/** The NIST-JANAF rows of one built-in species: table ids and rows on the species' own H scale. */
export interface JanafTable {
  readonly key: string;
  readonly tables: string[];
  readonly rows: JanafRow[];
  /** Where each row sits at a transition: "upper" rows are evaluated just above T. */
  readonly upper: boolean[];
}

/** Worst deviations of a species from its NIST-JANAF rows. */
export interface JanafDeviation {
  readonly key: string;
  readonly tables: string[];
  readonly rows: number;
  /** Rows outside the species' range (not compared). */
  readonly outside: number;
  readonly worstCpPct: number;
  readonly worstCpAtK: number;
  readonly worstHKJ: number;
  readonly worstHAtK: number;
  /** True when every row is within Cp 0.5 % and H − H298 0.3 kJ/mol or 0.5 %. */
  readonly within: boolean;
}

const fixture = (name: string): any => JSON.parse(readFileSync(new URL(`../../tests/fixtures/${name}`, import.meta.url), "utf8"));

const GAS_KEYS: Record<string, string> = { "C(gr)": "C(cr)" }; // the JANAF fixtures name graphite C(gr)

/** Every NIST-JANAF table the project holds rows of, mapped to built-in keys. */
export function janafTables(): JanafTable[] {
  const byKey = new Map<string, { tables: string[]; rows: JanafRow[]; upper: boolean[] }>();
  const add = (key: string, table: string, rows: JanafRow[], shiftKJ = 0, firstUpper = false): void => {
    const t = byKey.get(key) ?? { tables: [], rows: [], upper: [] };
    if (!t.tables.includes(table)) t.tables.push(table);
    rows.forEach((r, i) => {
      if (r.Cp == null && r.H_minus_H298 == null) return;
      const upper = i === 0 ? firstUpper : rows[i - 1]!.T === r.T;
      if (t.rows.some((x, j) => x.T === r.T && t.upper[j] === upper)) return; // same row in two files
      t.rows.push({ ...r, ...(r.H_minus_H298 != null ? { H_minus_H298: r.H_minus_H298 + shiftKJ } : {}) });
      t.upper.push(upper);
    });
    byKey.set(key, t);
  };
  const keyOf = (name: string): string => GAS_KEYS[name] ?? (/\((cr|l|g)\)$/.test(name) ? name : `${name}(g)`);
  for (const file of ["janaf.json", "janaf-extended.json"]) {
    for (const [name, v] of Object.entries<any>(fixture(file).species)) add(keyOf(name), v.janaf_table, v.rows);
  }
  for (const [key, blocks] of Object.entries<any[]>(fixture("janaf-condensed.json").species)) {
    for (const b of blocks) {
      // NaOH(cr): the liquid table continues the crystal from its melting point, on the crystal's H scale
      // the liquid's first row sits just above the melting point
      const rows = b.melting !== undefined ? b.rows.filter((r: JanafRow) => r.T >= b.melting.T_K) : b.rows;
      add(key, b.table, rows, b.H_shift_kJ_per_mol ?? 0, b.melting !== undefined);
    }
  }
  return [...byKey].map(([key, t]) => ({ key, ...t })).sort((a, b) => (a.key < b.key ? -1 : 1));
}

/** Worst Cp and H − H298 deviations of a species from its NIST-JANAF rows. */
export function janafDeviation(sp: Species, table: JanafTable): JanafDeviation {
  let worstCpPct = 0, worstCpAtK = NaN, worstHKJ = 0, worstHAtK = NaN, outside = 0, within = true, n = 0;
  table.rows.forEach((r, i) => {
    if (r.T < sp.range[0] || r.T > sp.range[1]) {
      outside++;
      return;
    }
    n++;
    const T = table.upper[i] ? r.T + 1e-7 : r.T;
    if (r.Cp != null) {
      const d = ((sp.cp(T) - r.Cp) / r.Cp) * 100;
      if (Math.abs(d) > Math.abs(worstCpPct)) { worstCpPct = d; worstCpAtK = r.T; }
      if (Math.abs(d) > 0.5) within = false;
    }
    if (r.H_minus_H298 != null) {
      const d = (sp.enthalpy(T) - sp.hf298) / 1000 - r.H_minus_H298;
      if (Math.abs(d) > Math.abs(worstHKJ)) { worstHKJ = d; worstHAtK = r.T; }
      if (Math.abs(d) > 0.3 && Math.abs(d) > 0.005 * Math.abs(r.H_minus_H298)) within = false;
    }
  });
  return { key: sp.key, tables: table.tables, rows: n, outside, worstCpPct, worstCpAtK, worstHKJ, worstHAtK, within };
}

/** The deviation reported by the self-check of the reference file an entry came from, if any. */
function reportedDeviation(key: string): string | undefined {
  const burcat = fixture("species-burcat-ruscic-2005.json").species[key];
  const webbook = fixture("species-webbook-condensed.json").species[key];
  const checks: any[] = burcat !== undefined ? burcat.records.map((r: any) => r.selfcheck) : webbook !== undefined ? [webbook.selfcheck] : [];
  const parts: string[] = [];
  for (const c of checks) {
    const v = c?.vs_JANAF;
    if (v?.worst_dCp_pct === undefined || v.worst_dCp_pct === null) continue;
    parts.push(`${v.table}: Cp ${fmt(v.worst_dCp_pct, 2)} % at ${v.at_T_K} K, H − H298 ${fmt(v.worst_dH_minus_H298_kJ_per_mol, 3)} kJ/mol at ${v.at_T_K_H} K`);
  }
  return parts.length > 0 ? `${parts.join("; ")} (reference self-check)` : undefined;
}

function fmt(x: number, digits: number): string {
  const s = x.toFixed(digits);
  return Number(s) === 0 ? (0).toFixed(digits) : (x > 0 ? "+" : "") + s;
}

const cell = (s: string): string => s.replace(/\|/g, "\\|");

/** The whole page, Markdown. */
export function renderSpeciesDataQuality(): string {
  const lib = builtInLibrary();
  const tables = new Map(janafTables().map((t) => [t.key, t]));
  const lines: string[] = [];
  lines.push("# Built-in species: data quality");
  lines.push("");
  lines.push("Generated from the data by `npm run data-quality` (docs/data-quality/); a test fails when this page is stale.");
  lines.push("For the opt-in species database see [species-database.md](species-database.md). Sources: the full");
  lines.push("citation of every source id is in `SOURCES` (`citation(id)`), and [species.md](species.md) explains the set.");
  lines.push("");
  lines.push("**Deviation from NIST-JANAF**: *measured* rows are compared here against the NIST-JANAF 4th ed. (1998) rows the");
  lines.push("project holds (tests/fixtures/janaf.json, janaf-extended.json, janaf-condensed.json), Cp in % and H − H298 in");
  lines.push("kJ/mol, worst row shown; *reference self-check* values were measured by the compilers of the project's reference");
  lines.push("files against the full tables, which the project does not hold; *none* means no NIST-JANAF table exists for the");
  lines.push("species or none was available. Rows outside a species' range are not compared.");
  lines.push("");
  const all = lib.all();
  const fromMemory = all.filter((s) => Object.values(s.sources).includes("memory"));
  lines.push(`${all.length} species (${all.filter((s) => s.phase === "g").length} gases, ${all.length - all.filter((s) => s.phase === "g").length} condensed); ` +
    `${fromMemory.length} carry a value from memory: ${fromMemory.map((s) => `${s.key} (${Object.entries(s.sources).filter(([, id]) => id === "memory").map(([f]) => f).join(", ")})`).join(", ")}.`);
  lines.push("");
  let worst: { key: string; cp: number; cpAt: number; h: number; hAt: number } | undefined;
  lines.push("| species | data set | ΔfH° / S° / Cp sources | range, K | transitions (T K: ΔH kJ/mol) | deviation from NIST-JANAF |");
  lines.push("|---|---|---|---|---|---|");
  for (const sp of all) {
    const t = tables.get(sp.key);
    let dev: string;
    if (t !== undefined) {
      const d = janafDeviation(sp, t);
      dev = `measured, ${d.tables.join(" + ")}, ${d.rows} rows${d.outside > 0 ? ` (${d.outside} outside the range)` : ""}: Cp ${fmt(d.worstCpPct, 2)} % at ${d.worstCpAtK} K, H − H298 ${fmt(d.worstHKJ, 3)} kJ/mol at ${d.worstHAtK} K`;
      if (worst === undefined || Math.abs(d.worstCpPct) > Math.abs(worst.cp)) worst = { key: sp.key, cp: d.worstCpPct, cpAt: d.worstCpAtK, h: d.worstHKJ, hAt: d.worstHAtK };
    } else {
      dev = reportedDeviation(sp.key) ?? "none";
    }
    const src = [sp.sources["hf298"], sp.sources["s298"], sp.sources["cp"]].join(" / ");
    const tr = sp.transitions.map((x) => `${x.TK}: ${(x.dHJPerMol / 1000).toFixed(3)}`).join(", ") || "—";
    lines.push(`| ${cell(sp.key)} | ${sp.dataset ?? ""} | ${src} | ${sp.range[0]}–${sp.range[1]} | ${tr} | ${cell(dev)} |`);
  }
  lines.push("");
  if (worst !== undefined) {
    lines.push(`Worst measured Cp deviation: ${worst.key}, ${fmt(worst.cp, 2)} % at ${worst.cpAt} K.`);
    lines.push("");
  }
  lines.push("Notes on each entry (derivations, fitted forms, flagged weaknesses) are in its `note` field (`species(key).note`).");
  lines.push("");
  return lines.join("\n");
}
