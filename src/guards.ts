/**
 * Small shared guards for values that come from outside: a safe text for any value (for error
 * messages), the check of an options argument, and deep freezing of what the library hands out.
 * Layer 0; not re-exported from the package entry point.
 *
 * @module
 * @internal
 */
import { RxthermError } from "./errors.js";

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
