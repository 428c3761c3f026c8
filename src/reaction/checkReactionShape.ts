/**
 * The shared shape check of a caller-built Reaction object: the one guard used by the reaction
 * functions and by the modules above that take reactions, so a bad term is INVALID_ARGUMENT with
 * its path instead of a TypeError or garbage passed through. Not re-exported.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, requireArray, requireRecord } from "../errors.js";
import type { Reaction } from "./types.js";

/** Most terms on one side of a reaction object. */
const MAX_TERMS = 1000;

/**
 * Check that `reaction` is `{ reactants: Term[], products: Term[] }` whose terms carry a species
 * key (text), a formula (`elements` a plain record of finite counts > 0, an integer `charge`) and a
 * finite coefficient > 0 or its `exact` text. Throws INVALID_ARGUMENT naming `fn` and the path.
 */
export function checkReactionShape(reaction: unknown, fn: string, path = "reaction"): asserts reaction is Reaction {
  if (typeof reaction !== "object" || reaction === null) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be an equation text or a Reaction object, got ${describeValue(reaction)}`, { path });
  }
  const r = reaction as Record<string, unknown>;
  for (const side of ["reactants", "products"] as const) {
    const terms = requireArray(r[side], fn, `${path}.${side}`, MAX_TERMS);
    terms.forEach((t, i) => checkTerm(t, fn, `${path}.${side}[${i}]`));
  }
}

function checkTerm(term: unknown, fn: string, path: string): void {
  const bad = (sub: string, what: string, value: unknown): never => {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path}${sub} ${what}, got ${describeValue(value)}`, { path: `${path}${sub}` });
  };
  if (typeof term !== "object" || term === null) bad("", "to be a term { species, formula, coefficient }", term);
  const t = term as Record<string, unknown>;
  if (typeof t["species"] !== "string") bad(".species", "to be a species key (text)", t["species"]);
  const f = t["formula"] as Record<string, unknown> | null;
  if (typeof f !== "object" || f === null) bad(".formula", "to be a parsed formula", f);
  const elements = requireRecord(f!["elements"], fn, `${path}.formula.elements`);
  for (const [el, n] of Object.entries(elements)) {
    if (typeof n !== "number" || !Number.isFinite(n) || n <= 0) bad(`.formula.elements.${el}`, "to be a finite count > 0", n);
  }
  if (f!["text"] !== undefined && typeof f!["text"] !== "string") bad(".formula.text", "to be text", f!["text"]);
  const phase = f!["phase"];
  if (phase !== undefined && phase !== null && typeof phase !== "string") bad(".formula.phase", "to be a phase or null", phase);
  const q = f!["charge"];
  if (q !== undefined && (typeof q !== "number" || !Number.isInteger(q))) bad(".formula.charge", "to be an integer", q);
  const exact = t["exact"];
  if (exact !== undefined && typeof exact !== "string") bad(".exact", "to be the coefficient as text", exact);
  const c = t["coefficient"];
  if ((typeof c !== "number" || !Number.isFinite(c) || c <= 0) && typeof exact !== "string") {
    bad(".coefficient", "to be a finite number > 0", c);
  }
}
