/**
 * The single error class of rxtherm and its machine-readable codes, and the shared input guards that
 * end in it (internal: not re-exported from the package entry).
 *
 * Callers branch on {@link RxthermError.code}, never on the message text. Every code is
 * listed in {@link ERROR_CODES} with a one-line meaning, and in `docs/errors.md`.
 *
 * @module
 */

/**
 * Every error code rxtherm throws, with what it means. The keys form {@link RxthermErrorCode}.
 *
 * @category Errors
 * @example
 * ERROR_CODES.NOT_BALANCEABLE // => "no set of positive coefficients closes every element and the charge"
 */
export const ERROR_CODES = Object.freeze({
  // input text (formulas, equations)
  EMPTY_INPUT: "the text is empty or only whitespace",
  INPUT_TOO_LONG: "the text is longer than the documented limit",
  UNEXPECTED_CHARACTER: "a character that the grammar does not allow at this column",
  UNKNOWN_ELEMENT: "an element symbol that is not one of the 118 elements (or D, T)",
  UNCLOSED_GROUP: "an opening bracket without its closing bracket",
  UNMATCHED_CLOSE: "a closing bracket without its opening bracket, or of the wrong kind",
  INVALID_COUNT: "a count or coefficient that is zero, negative or malformed",
  COUNT_TOO_LARGE: "a count or coefficient above the documented limit",
  NESTING_TOO_DEEP: "brackets nested deeper than the documented limit",
  INVALID_CHARGE: "a charge written in a way the grammar does not accept",
  INVALID_PHASE: "a phase suffix other than (g), (l), (s), (aq), (cr)",
  INVALID_REACTION: "an equation without exactly one arrow, or with an empty side",
  // balancing
  NOT_BALANCEABLE: "no set of positive coefficients closes every element and the charge",
  WRONG_SIDE: "a species would need a negative coefficient: it belongs on the other side",
  AMBIGUOUS_BALANCE: "more than one independent balanced reaction exists among the species",
  UNBALANCED_REACTION: "a reaction given to a routine that requires balance does not balance",
  INCONSISTENT_CONSTRAINTS: "fixed coefficients that contradict the element balance or each other",
  // data and library
  INVALID_DATA: "species data that fail schema validation (issues listed with paths)",
  UNKNOWN_SPECIES: "no species with this key, formula or name in the library",
  AMBIGUOUS_PHASE: "a key without a phase that matches more than one phase",
  AMBIGUOUS_SPECIES: "a formula or name that matches more than one species (isomers): use the full key",
  MISSING_DATA: "the species lacks the data the computation needs",
  OUT_OF_RANGE: "a temperature outside the species' data range, without extrapolation",
  // extents, streams, balances
  INVALID_ARGUMENT: "an argument outside its documented domain",
  SPEC_COUNT_MISMATCH: "the number of specifications differs from the number of independent reactions",
  SINGULAR_SPECS: "the specifications do not determine the extents (a singular system)",
  CONFLICTING_SPECS: "specifications that contradict each other",
  NEGATIVE_FLOW: "an outlet or feed flow that would be negative",
  NOT_IN_SPAN: "a target reaction that is not a combination of the known reactions",
  ELEMENT_IMBALANCE: "streams whose elements do not balance",
  // solvers and flames
  NO_BRACKET: "a root finder could not bracket the solution inside the allowed interval",
  NO_CONVERGENCE: "an iterative solver did not converge within its iteration limit",
  NOTHING_TO_BURN: "a fuel with nothing oxidisable in it",
  NO_OXIDIZER: "an oxidizer with no oxygen in it",
  ELEMENTS_NOT_COVERED: "a product set that cannot hold every element of the feed",
  // command line
  INVALID_CASE: "a heat-duty case file that fails validation (issues listed with JSON paths)",
  // hardening
  TOO_LARGE: "user data with more rows, points or species than the documented limit",
} as const);

/**
 * Machine-readable error code; see {@link ERROR_CODES} for the meaning of each.
 *
 * @category Errors
 */
export type RxthermErrorCode = keyof typeof ERROR_CODES;

/**
 * Extra facts about an error: the column of a parse error, the species and range of a data
 * error, the issue list of a validation error, and so on. Which keys appear depends on the code.
 *
 * @category Errors
 */
export type RxthermErrorDetails = Readonly<Record<string, unknown>>;

/** The process-wide brand every build of rxtherm shares (`Symbol.for`, not a module-local symbol). */
const ERROR_BRAND: unique symbol = /* @__PURE__ */ Symbol.for("rxtherm.error") as never;

/**
 * The one error class rxtherm throws. `code` is stable and machine-readable, `details` holds
 * the facts (column, species, range, issues...), and the message starts with `[rxtherm]`.
 *
 * @category Errors
 * @example
 * try {
 *   parseFormula("Xy2");
 * } catch (e) {
 *   if (e instanceof RxthermError) e.code; // => "UNKNOWN_ELEMENT"
 * }
 */
export class RxthermError extends Error {
  /**
   * Recognises an rxtherm error from any copy of the library loaded in the same process (the
   * ESM and the CommonJS build, or two bundled copies): every RxthermError carries the
   * process-wide brand `Symbol.for("rxtherm.error")`, and `instanceof` checks that brand.
   *
   * @param value - any value
   * @returns true when `value` is an rxtherm error of any build
   */
  static override [Symbol.hasInstance](value: unknown): boolean {
    return typeof value === "object" && value !== null && (value as Record<symbol, unknown>)[ERROR_BRAND] === true;
  }

  /** Machine-readable code; see {@link ERROR_CODES}. */
  readonly code: RxthermErrorCode;
  /** Code-dependent facts about the failure. */
  readonly details: RxthermErrorDetails;

  /**
   * @param code - the error code
   * @param message - human-readable text, lowercase, naming the function and the requirement
   * @param details - code-dependent facts (column, species, range...)
   */
  constructor(code: RxthermErrorCode, message: string, details: RxthermErrorDetails = {}) {
    super(`[rxtherm] ${message}`);
    this.name = "RxthermError";
    this.code = code;
    this.details = Object.freeze({ ...details });
    Object.defineProperty(this, ERROR_BRAND, { value: true });
  }
}

/**
 * True when `value` is an {@link RxthermError}, optionally with the given code.
 *
 * @category Errors
 * @example
 * isRxthermError(new RxthermError("OUT_OF_RANGE", "x"), "OUT_OF_RANGE") // => true
 */
export function isRxthermError(value: unknown, code?: RxthermErrorCode): value is RxthermError {
  return value instanceof RxthermError && (code === undefined || value.code === code);
}

// ── input guards ───────────────────────────────────────────────────────────────
// Shared checks of values that come from outside, each ending in a typed error: a safe text for any
// value (for messages), the options, record and array checks, the key lists of input objects, finite
// results, and deep freezing of what the library hands out. Not re-exported from the package entry.

/**
 * Text for any value in an error message or its details. Never throws: Symbols, BigInts,
 * null-prototype objects, proxies and revoked proxies all get a short description.
 */
export function describeValue(v: unknown): string {
  switch (typeof v) {
    case "bigint":
      return `${v.toString()}n`;
    case "symbol":
      return "a symbol";
    case "function":
      return "a function";
    case "number":
    case "boolean":
    case "undefined":
      return String(v);
    case "string":
      return v.length > 60 ? `${v.slice(0, 60)}…` : v;
    default:
      if (v === null) return "null";
      try {
        return Array.isArray(v) ? "an array" : "an object";
      } catch {
        return "an object";
      }
  }
}

/**
 * The options argument of `fn`: `undefined` becomes `{}`; anything that is not an object
 * (null, a number, an array...) is INVALID_ARGUMENT with `details.path` = `path`. With `known`
 * (from {@link knownKeys}), a key `fn` does not read is INVALID_ARGUMENT too ({@link rejectUnknownKeys}).
 */
export function optionsOf<T extends object>(options: T | undefined, fn: string, path = "options", known?: ReadonlySet<string>): T {
  if (options === undefined) return {} as T;
  if (typeof options !== "object" || options === null || Array.isArray(options)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be an object when given, got ${describeValue(options)}`, {
      path,
      value: describeValue(options),
    });
  }
  if (known !== undefined) rejectUnknownKeys(options, known, fn, path);
  return options;
}

/**
 * The keys a function reads from an input or options object, checked complete against its type:
 * `knownKeys<HeatDutyOptions>()("method", "extrapolate", …)` fails to compile when a key of the type
 * is missing from the list (or a listed key is not one of the type's).
 */
export function knownKeys<T>() {
  return <const K extends readonly (keyof T & string)[]>(
    ...keys: K & ([Exclude<keyof T & string, K[number]>] extends [never] ? unknown : { missing: Exclude<keyof T & string, K[number]> })
  ): ReadonlySet<string> => new Set<string>(keys);
}

/**
 * Reject keys that `fn` does not read: a misspelt option (`excesAir`) would otherwise be ignored and
 * the result computed with the default, silently. INVALID_ARGUMENT with `details.path`, `details.key`
 * and, when a known key is within two edits, `details.suggestion` ("did you mean …?").
 */
export function rejectUnknownKeys(value: object, known: ReadonlySet<string>, fn: string, path: string): void {
  for (const key in value) {
    if (!Object.prototype.hasOwnProperty.call(value, key) || known.has(key)) continue;
    let best: string | undefined;
    let bestD = 3;
    for (const k of known) {
      const d = editDistance(key.toLowerCase(), k.toLowerCase());
      if (d < bestD) { bestD = d; best = k; }
    }
    throw new RxthermError("INVALID_ARGUMENT",
      `${fn} does not read ${path}.${describeValue(key)}${best !== undefined ? ` (did you mean "${best}"?)` : ""}; it reads ${[...known].join(", ")}`,
      { path: `${path}.${describeValue(key)}`, key: describeValue(key), ...(best !== undefined ? { suggestion: best } : {}), known: [...known] });
  }
}

/** Levenshtein distance (two-row dynamic programme). */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      cur[j] = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    prev = cur;
  }
  return prev[b.length]!;
}

/**
 * A record of user data (flows, element counts...): a non-array object whose prototype is
 * `Object.prototype` or `null`, so no key can come from a prototype. Otherwise INVALID_ARGUMENT
 * with `details.path`.
 */
export function requireRecord(value: unknown, fn: string, path: string): Readonly<Record<string, unknown>> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be an object, got ${describeValue(value)}`, {
      path,
      value: describeValue(value),
    });
  }
  const proto = Object.getPrototypeOf(value) as unknown;
  if (proto !== Object.prototype && proto !== null) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be a plain object (no inherited keys)`, { path });
  }
  return value as Readonly<Record<string, unknown>>;
}

/** Freeze `value` and every object reachable from it (arrays, plain objects); returns `value`. */
export function deepFreeze<T>(value: T): T {
  if (typeof value !== "object" || value === null || Object.isFrozen(value)) return value;
  Object.freeze(value);
  for (const key of Object.keys(value)) deepFreeze((value as Record<string, unknown>)[key]);
  return value;
}

/**
 * True when `value` and everything reachable from it (to a depth of 8) is frozen, so that a
 * cache may key on its identity: nothing reachable can change later. Library results
 * (parsed and balanced reactions, formulas) are frozen this way; a user-built object usually is
 * not, and is then read afresh on every call.
 */
export function isDeepFrozen(value: unknown, depth = 8): boolean {
  if (typeof value !== "object" || value === null) return true;
  if (!Object.isFrozen(value) || depth === 0) return false;
  for (const key of Object.keys(value)) {
    if (!isDeepFrozen((value as Record<string, unknown>)[key], depth - 1)) return false;
  }
  return true;
}

/** Largest array a function takes from a caller before TOO_LARGE (rows, points, values). */
export const MAX_INPUT_ARRAY_LENGTH = 100_000;

/**
 * An array given by the caller: a real array without holes, of at most `maxLength` entries.
 * INVALID_ARGUMENT (not an array, or a hole at `details.path`) or TOO_LARGE.
 */
export function requireArray(value: unknown, fn: string, path: string, maxLength = MAX_INPUT_ARRAY_LENGTH): readonly unknown[] {
  if (!Array.isArray(value)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} to be an array, got ${describeValue(value)}`, {
      path,
      value: describeValue(value),
    });
  }
  if (value.length > maxLength) {
    throw new RxthermError("TOO_LARGE", `${fn} accepts at most ${maxLength} entries in ${path}, got ${value.length}`, {
      path,
      limit: maxLength,
      size: value.length,
    });
  }
  for (let i = 0; i < value.length; i++) {
    if (!(i in value)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${path} without holes, but entry ${i} is missing`, { path: `${path}[${i}]` });
    }
  }
  return value;
}

/**
 * Return `result` after checking that no number in it (plain objects and arrays, depth ≤ 5) is
 * NaN or ±Infinity; otherwise INVALID_ARGUMENT naming the result path: the inputs spanned more
 * than float64 holds (e.g. 1e308 flows, 5e-324 amounts). The last check before a result is returned.
 */
export function finiteResult<T>(result: T, fn: string): T {
  const bad = firstNonFinite(result, "", 5);
  if (bad !== null) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn} cannot represent its result: ${bad.path || "the value"} would be ${bad.value} (inputs outside the range float64 arithmetic can carry)`,
      { path: bad.path, value: String(bad.value) },
    );
  }
  return result;
}

function firstNonFinite(v: unknown, path: string, depth: number): { path: string; value: number } | null {
  if (typeof v === "number") return Number.isFinite(v) ? null : { path, value: v };
  if (depth === 0 || typeof v !== "object" || v === null) return null;
  if (ArrayBuffer.isView(v)) {
    const a = v as unknown as ArrayLike<number>;
    for (let i = 0; i < a.length; i++) if (typeof a[i] === "number" && !Number.isFinite(a[i])) return { path: `${path}[${i}]`, value: a[i] as number };
    return null;
  }
  const proto = Object.getPrototypeOf(v) as unknown;
  if (proto !== Object.prototype && proto !== null && !Array.isArray(v)) return null; // class instances check themselves
  for (const k of Object.keys(v)) {
    const r = firstNonFinite((v as Record<string, unknown>)[k], path ? `${path}.${k}` : k, depth - 1);
    if (r !== null) return r;
  }
  return null;
}
