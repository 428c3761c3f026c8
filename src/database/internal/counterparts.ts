/**
 * Private: which database species is the same species as a built-in one. Used to layer the built-in
 * set over the database, and by the test that reports how far the two disagree.
 *
 * @module
 * @internal
 */
import { findSpecies } from "../../species/findSpecies.js";
import type { Library, Species } from "../../species/types.js";

/**
 * Built-in key → database species, for every built-in species with exactly one database species of
 * the same composition and phase, or, among several, exactly one that shares its name, an alias or
 * its CAS number (case-insensitive), or else exactly one written with the same formula text (`HCN`, not
 * `HNC`). Species the rule cannot pair are left out.
 */
export function counterparts(builtIn: Library, database: Library): Map<string, Species> {
  const out = new Map<string, Species>();
  for (const b of builtIn.all()) {
    let found = findSpecies({ formula: b.formula.text, phase: b.phase }, database);
    if (found.length > 1) {
      const names = new Set([b.name, ...b.aliases].filter((n): n is string => n !== undefined).map((n) => n.toLowerCase()));
      const byName = found.filter((d) => (b.cas !== undefined && d.cas === b.cas)
        || [d.name, ...d.aliases].some((n) => n !== undefined && names.has(n.toLowerCase())));
      found = byName.length > 0 ? byName : found.filter((d) => d.formula.text === b.formula.text);
    }
    if (found.length === 1) out.set(b.key, found[0]!);
  }
  return out;
}
