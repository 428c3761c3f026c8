/**
 * Private: the immutable Library value behind createLibrary and the built-in set, with lookup
 * by key, by formula and by name, data-set variants, and close-match suggestions.
 *
 * @module
 * @internal
 */
import { RxthermError, editDistance } from "../../errors.js";
import type { Library, LibraryGetOptions, Species } from "../types.js";
import { queryFormula, sameComposition } from "./composition.js";

/** All entries of one key: the default and every data-set variant. */
export interface KeyRecord {
  readonly key: string;
  readonly byDataset: ReadonlyMap<string, Species>;
  readonly defaultSpecies: Species;
  /** Data-set label of the default entry. */
  readonly defaultDataset: string;
}

/** What an UNKNOWN_SPECIES message adds after the close matches: where else to look. */
export const DEFAULT_MISSING_HINT =
  "search by formula, name or CAS number with findSpecies(query, library), or look in the opt-in database (speciesDatabase() from rxtherm/database, about 1,300 species)";

/** Label used for an entry without a dataset. */
export const NO_DATASET = "user";

const PHASE_SUFFIX = /^(.*)\(([a-z]+)\)$/;

/** Immutable library value; build with {@link mergeLibrary}. */
export class SpeciesLibrary implements Library {
  private readonly records: ReadonlyMap<string, KeyRecord>;
  private readonly sourceTexts: Readonly<Record<string, string>>;
  /** lowercase name / alias → keys */
  private readonly names: ReadonlyMap<string, readonly string[]>;
  /** formula text and key-without-phase → keys */
  private readonly formulas: ReadonlyMap<string, readonly string[]>;
  private readonly sortedKeys: readonly string[];
  /** Where else to look, added to UNKNOWN_SPECIES messages. */
  private readonly missingHint: string;

  constructor(records: Map<string, KeyRecord>, sources: Record<string, string>, missingHint: string = DEFAULT_MISSING_HINT) {
    this.records = records;
    this.missingHint = missingHint;
    this.sourceTexts = Object.freeze({ ...sources });
    const names = new Map<string, string[]>();
    const formulas = new Map<string, string[]>();
    const push = (m: Map<string, string[]>, k: string, key: string): void => {
      const list = m.get(k);
      if (list === undefined) m.set(k, [key]);
      else if (!list.includes(key)) list.push(key);
    };
    for (const [key, rec] of records) {
      for (const sp of rec.byDataset.values()) {
        if (sp.name !== undefined) push(names, sp.name.toLowerCase(), key);
        for (const a of sp.aliases) push(names, a.toLowerCase(), key);
        push(formulas, stripPhase(key), key);
        const f = sp.formula.text;
        push(formulas, f, key);
      }
    }
    this.names = names;
    this.formulas = formulas;
    this.sortedKeys = Object.freeze([...records.keys()].sort());
    Object.freeze(this);
  }

  /** The key records (for merging). */
  recordMap(): ReadonlyMap<string, KeyRecord> {
    return this.records;
  }

  /** The hint of UNKNOWN_SPECIES messages (for merging). */
  hint(): string {
    return this.missingHint;
  }

  /** The source texts (for merging). */
  sourceMap(): Readonly<Record<string, string>> {
    return this.sourceTexts;
  }

  get(query: string, options?: LibraryGetOptions): Species {
    const rec = this.resolve(query);
    const dataset = options?.dataset;
    if (dataset === undefined) return rec.defaultSpecies;
    const sp = rec.byDataset.get(dataset);
    if (sp === undefined) {
      throw new RxthermError(
        "UNKNOWN_SPECIES",
        `library.get: ${rec.key} has no entry from the data set ${JSON.stringify(dataset)} (it has ${[...rec.byDataset.keys()].join(", ")})`,
        { species: rec.key, dataset, datasets: [...rec.byDataset.keys()] },
      );
    }
    return sp;
  }

  has(query: string, options?: LibraryGetOptions): boolean {
    try {
      this.get(query, options);
      return true;
    } catch (e) {
      if (e instanceof RxthermError) return false;
      throw e;
    }
  }

  keys(): string[] {
    return [...this.sortedKeys];
  }

  datasets(query: string): string[] {
    const rec = this.resolve(query);
    return [rec.defaultDataset, ...[...rec.byDataset.keys()].filter((d) => d !== rec.defaultDataset).sort()];
  }

  all(): Species[] {
    return this.sortedKeys.map((k) => this.records.get(k)!.defaultSpecies);
  }

  citation(id: string): string {
    if (typeof id === "string" && Object.prototype.hasOwnProperty.call(this.sourceTexts, id)) return this.sourceTexts[id]!;
    throw new RxthermError("INVALID_ARGUMENT", `library.citation does not know the source id ${JSON.stringify(id)}`, {
      id, known: Object.keys(this.sourceTexts).sort(),
    });
  }

  /** Key record of a query: exact key, key with (s)/(cr) swapped, formula or name, with or without phase. */
  private resolve(query: string): KeyRecord {
    if (typeof query !== "string") {
      throw new RxthermError("INVALID_ARGUMENT", `library.get requires a species key as a string, got ${typeof query}`, { key: query });
    }
    const q = query.trim();
    const exact = this.records.get(q);
    if (exact !== undefined) return exact;
    // an alias written like a key (e.g. "C(gr)" for C(cr)) names one species
    const alias = this.names.get(q.toLowerCase());
    if (alias !== undefined && alias.length === 1 && PHASE_SUFFIX.test(q)) return this.records.get(alias[0]!)!;
    const m = PHASE_SUFFIX.exec(q);
    let candidates: string[];
    if (m !== null) {
      const base = m[1]!.trim();
      const label = m[2]!;
      const condensed = label === "s" || label === "cr";
      const swapped = this.records.get(`${base}(${label === "s" ? "cr" : "s"})`);
      if (condensed && swapped !== undefined) return swapped;
      const fromFormula = this.formulas.get(base) ?? [];
      const fromName = this.names.get(base.toLowerCase()) ?? [];
      candidates = unique([...fromFormula, ...fromName]).filter((k) => {
        const sp = this.records.get(k)!.defaultSpecies;
        return labelOf(k) === label || sp.phase === label || (condensed && (sp.phase === "cr" || sp.phase === "s"));
      });
    } else {
      candidates = [...(this.formulas.get(q) ?? [])];
      if (candidates.length === 0) candidates = [...(this.names.get(q.toLowerCase()) ?? [])];
    }
    if (candidates.length === 1) return this.records.get(candidates[0]!)!;
    if (candidates.length > 1) {
      const choices = [...candidates].sort();
      const bases = new Set(choices.map(stripPhase));
      if (bases.size === 1) {
        throw new RxthermError(
          "AMBIGUOUS_PHASE",
          `library.get: ${JSON.stringify(q)} exists in more than one phase; name the phase, one of ${choices.join(", ")}`,
          { key: q, choices },
        );
      }
      throw new RxthermError(
        "AMBIGUOUS_SPECIES",
        `library.get: ${JSON.stringify(q)} matches more than one species; use the full key, one of ${choices.join(", ")}`,
        { key: q, choices },
      );
    }
    const suggestions = this.suggest(q);
    throw new RxthermError(
      "UNKNOWN_SPECIES",
      `library.get: no species ${JSON.stringify(q)} in the library${suggestions.length > 0 ? ` (did you mean ${suggestions.join(", ")}?)` : ""}; ${this.missingHint}`,
      { key: q, suggestions },
    );
  }

  /**
   * Up to five keys: first those of the same composition when the query reads as a formula (element
   * order ignored, `"OCH2"` → `CH2O(g)`), then those whose key, formula or name is close to the query
   * (edit distance, case-insensitive).
   */
  private suggest(q: string): string[] {
    const target = q.toLowerCase();
    const scored: { key: string; d: number }[] = [];
    const m = PHASE_SUFFIX.exec(q);
    const f = queryFormula(m === null ? q : m[1]!.trim());
    if (f !== null) {
      for (const key of this.sortedKeys) if (sameComposition(this.records.get(key)!.defaultSpecies.formula, f)) scored.push({ key, d: -1 });
    }
    const consider = (text: string, key: string): void => {
      const d = editDistance(target, text.toLowerCase());
      const limit = Math.max(1, Math.min(3, Math.floor(text.length / 3)));
      if (d <= limit || (target.length >= 3 && text.toLowerCase().includes(target))) scored.push({ key, d });
    };
    for (const key of this.sortedKeys) {
      consider(key, key);
      consider(stripPhase(key), key);
    }
    for (const [name, keys] of this.names) for (const key of keys) consider(name, key);
    scored.sort((a, b) => a.d - b.d || (a.key < b.key ? -1 : 1));
    return unique(scored.map((s) => s.key)).slice(0, 5);
  }
}

/** Merge validated, built species over a base library; later entries win. */
export function mergeLibrary(
  base: SpeciesLibrary | null,
  entries: readonly { species: Species; alternative: boolean }[],
  sources: Record<string, string>,
  missingHint?: string,
): SpeciesLibrary {
  const records = new Map<string, KeyRecord>(base?.recordMap() ?? []);
  for (const { species, alternative } of entries) {
    const dataset = species.dataset ?? NO_DATASET;
    const prev = records.get(species.key);
    const byDataset = new Map(prev?.byDataset ?? []);
    byDataset.set(dataset, species);
    let def: Species;
    let defDataset: string;
    if (!alternative || prev === undefined) {
      def = species;
      defDataset = dataset;
    } else if (prev.defaultDataset === dataset) {
      // an alternative replacing the entry that was the default: it stays the default
      def = species;
      defDataset = dataset;
    } else {
      def = prev.defaultSpecies;
      defDataset = prev.defaultDataset;
    }
    records.set(species.key, Object.freeze({ key: species.key, byDataset, defaultSpecies: def, defaultDataset: defDataset }));
  }
  return new SpeciesLibrary(records, { ...(base?.sourceMap() ?? {}), ...sources }, missingHint ?? base?.hint());
}

function stripPhase(key: string): string {
  const m = PHASE_SUFFIX.exec(key);
  return m === null ? key : m[1]!;
}

function labelOf(key: string): string {
  const m = PHASE_SUFFIX.exec(key);
  return m === null ? "" : m[2]!;
}

function unique<T>(xs: T[]): T[] {
  return [...new Set(xs)];
}
