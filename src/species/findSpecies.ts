import { RxthermError, knownKeys, rejectUnknownKeys } from "../errors.js";
import type { Formula } from "../formula/types.js";
import { builtInLibrary } from "./builtInLibrary.js";
import { queryFormula, sameComposition } from "./internal/composition.js";
import { libraryOf } from "./species.js";
import type { Library, Species } from "./types.js";

/**
 * What {@link findSpecies} looks for: every given field must match.
 *
 * @category Species
 */
export interface SpeciesQuery {
  /** A formula, matched by element composition and charge (element order does not matter): `"C3H6O"`, `"OC3H6"`. */
  formula?: string;
  /** A name, case-insensitive: the species' name or one of its aliases, whole or in part (`"acetone"`, `"butane"`). */
  name?: string;
  /** A CAS registry number, e.g. `"67-64-1"`. */
  cas?: string;
  /** A phase: `"g"`, `"l"`, `"cr"` (also matching `"s"`), `"s"`, `"aq"`. */
  phase?: string;
}

const CAS = /^\d{2,7}-\d{2}-\d$/;
const PHASE_SUFFIX = /^(.*)\(([a-z]+)\)$/;

/**
 * Find species by formula, name or CAS number, in the built-in library or in `library` (for example
 * the opt-in database, `speciesDatabase()` from `rxtherm/database`).
 *
 * A text query is read as whatever it matches: a key (`"CO2(g)"`), a CAS number (`"67-64-1"`), a
 * formula (`"C3H6O"` gives every isomer and phase of that composition; element order does not matter,
 * and a phase suffix such as `"H2O(l)"` narrows it), or a name (`"acetone"`, case-insensitive; a
 * text of three or more characters also finds names and keys that contain it). An object query
 * `{ formula, name, cas, phase }` requires every given field to match.
 *
 * Order, best first: exact key; exact CAS number, name or alias; same formula; names that start with
 * the text; names that contain it, or (for a text that is not a formula) keys that contain it; then shorter keys first, then alphabetical. Only each key's
 * default entry is searched (data-set variants are reached with `library.get(key, { dataset })`).
 * Nothing is evaluated: this is a look-up, it costs a pass over the library's keys.
 *
 * @param query - a text, or `{ formula?, name?, cas?, phase? }` with at least one field
 * @param library - where to look; the built-in library when omitted
 * @returns the matching species, best match first; an empty array when nothing matches
 * @throws RxthermError `INVALID_ARGUMENT` for an empty text, an object without any field, or a query that
 *   is neither a string nor an object (details `{ query }`), or a `library` that is not a {@link Library}
 *   (details `{ path: "library" }`)
 * @category Species
 * @example
 * findSpecies("C4H10").map((s) => s.key) // => ["i-C4H10(g)", "n-C4H10(g)"]
 * findSpecies("acetone").map((s) => s.key) // => ["CH3COCH3(g)", "CH3COCH3(l)"]
 * findSpecies({ formula: "OH2", phase: "l" })[0]!.key // => "H2O(l)"
 * findSpecies("unobtainium") // => []
 * @see CAS Registry Number format (checksum not verified): Chemical Abstracts Service, https://www.cas.org/cas-data/cas-registry
 */
export function findSpecies(query: string | SpeciesQuery, library?: Library): Species[] {
  const lib = library === null ? builtInLibrary() : libraryOf(library, "findSpecies", "library");
  const match = typeof query === "string" ? textMatcher(query) : objectMatcher(query);
  const scored: { sp: Species; score: number }[] = [];
  for (const sp of lib.all()) {
    const score = match(sp);
    if (score >= 0) scored.push({ sp, score });
  }
  scored.sort((a, b) => a.score - b.score || a.sp.key.length - b.sp.key.length || (a.sp.key < b.sp.key ? -1 : a.sp.key > b.sp.key ? 1 : 0));
  return scored.map((s) => s.sp);
}

// ── private helpers ──────────────────────────────────────────────────────────

/** The keys of a query object (a misspelt one is an error, not a silently broader search). */
const QUERY_KEYS = /* @__PURE__ */ knownKeys<SpeciesQuery>()("formula", "name", "cas", "phase");

/** A matcher returns a score (lower is better) or −1 for no match. */
type Matcher = (sp: Species) => number;

function invalid(message: string, query: unknown): RxthermError {
  return new RxthermError("INVALID_ARGUMENT", `findSpecies ${message}`, { query });
}

function textMatcher(raw: string): Matcher {
  if (typeof raw !== "string" || raw.trim() === "") throw invalid("requires a non-empty text or a query object", raw);
  const q = raw.trim();
  const lower = q.toLowerCase();
  const m = PHASE_SUFFIX.exec(q);
  const phase = m === null ? null : m[2]!;
  const formula = queryFormula(m === null ? q : m[1]!.trim());
  const partial = lower.length >= 3;
  return (sp) => {
    if (sp.key === q) return 0;
    if (sp.key.toLowerCase() === lower) return 1;
    if (CAS.test(q)) return sp.cas === q || sp.aliases.includes(q) ? 1 : -1;
    const name = nameScore(sp, lower, partial);
    if (name === 0) return 1;
    if (formula !== null && sameComposition(sp.formula, formula) && (phase === null || phaseMatches(sp.phase, phase))) return 2;
    if (name > 0) return 2 + name;
    if (partial && formula === null && sp.key.toLowerCase().includes(lower)) return 5;
    return -1;
  };
}

function objectMatcher(q: SpeciesQuery): Matcher {
  if (typeof q !== "object" || q === null) throw invalid("requires a text or a query object { formula, name, cas, phase }", q);
  rejectUnknownKeys(q, QUERY_KEYS, "findSpecies", "query");
  const { formula, name, cas, phase } = q;
  for (const [field, v] of Object.entries({ formula, name, cas, phase })) {
    if (v !== undefined && (typeof v !== "string" || v.trim() === "")) throw invalid(`requires ${field} to be a non-empty text`, q);
  }
  if (formula === undefined && name === undefined && cas === undefined && phase === undefined) {
    throw invalid("requires at least one of formula, name, cas, phase", q);
  }
  let f: Formula | null = null;
  if (formula !== undefined) {
    f = queryFormula(formula.trim());
    if (f === null) return () => -1; // not a formula: nothing has it
  }
  const lowerName = name?.trim().toLowerCase();
  const casText = cas?.trim();
  const phaseText = phase?.trim();
  return (sp) => {
    let score = 0;
    if (f !== null && !sameComposition(sp.formula, f)) return -1;
    if (casText !== undefined && sp.cas !== casText && !sp.aliases.includes(casText)) return -1;
    if (phaseText !== undefined && !phaseMatches(sp.phase, phaseText)) return -1;
    if (lowerName !== undefined) {
      const s = nameScore(sp, lowerName, true);
      if (s < 0) return -1;
      score += s;
    }
    return score;
  };
}

/** 0 exact name or alias, 1 a name that starts with the text, 2 one that contains it, −1 none. */
function nameScore(sp: Species, lower: string, partial: boolean): number {
  let best = -1;
  const consider = (text: string | undefined): void => {
    if (text === undefined) return;
    const t = text.toLowerCase();
    if (t === lower) best = 0;
    else if (partial && best !== 0) {
      if (t.startsWith(lower)) best = best === -1 ? 1 : Math.min(best, 1);
      else if (best === -1 && t.includes(lower)) best = 2;
    }
  };
  consider(sp.name);
  for (const a of sp.aliases) consider(a);
  return best;
}

function phaseMatches(have: string, want: string): boolean {
  return have === want || ((want === "s" || want === "cr") && (have === "s" || have === "cr"));
}
