/**
 * Machinery of the hostile-input suite: the hostile values, the places in a valid call where
 * one is put, a deep snapshot of the inputs, and the checks on one call (only RxthermError is
 * thrown, no NaN or ±Infinity in a result, inputs unchanged, the call ends within a time bound).
 */
import { RxthermError } from "../../src/errors.js";
import type { EntryPoint } from "./entryPoints.js";

/** A hostile value with a label for the report; `make` builds it afresh (some are mutable). */
export interface Hostile {
  readonly label: string;
  readonly make: () => unknown;
}

const holey = (): unknown[] => {
  const a: unknown[] = [];
  a[2] = 1;
  return a;
};

export const HOSTILE_VALUES: readonly Hostile[] = [
  { label: "null", make: () => null },
  { label: "undefined", make: () => undefined },
  { label: "NaN", make: () => NaN },
  { label: "Infinity", make: () => Infinity },
  { label: "-Infinity", make: () => -Infinity },
  { label: "5e-324", make: () => 5e-324 },
  { label: "-5e-324", make: () => -5e-324 },
  { label: "1e308", make: () => 1e308 },
  { label: "-1e308", make: () => -1e308 },
  { label: "-1", make: () => -1 },
  { label: "-0", make: () => -0 },
  { label: "0", make: () => 0 },
  { label: "12", make: () => 12 },
  { label: "empty string", make: () => "" },
  { label: "garbage string", make: () => "xyz(" },
  { label: "long string", make: () => "C".repeat(5000) },
  { label: "symbol", make: () => Symbol("hostile") },
  { label: "bigint", make: () => 10n ** 30n },
  { label: "true", make: () => true },
  { label: "empty array", make: () => [] },
  { label: "array with holes", make: holey },
  { label: "huge array", make: () => new Array(200_000).fill(1) },
  { label: "empty object", make: () => ({}) },
  { label: "null-prototype object", make: () => Object.assign(Object.create(null), { H: 1 }) },
  { label: "inherited keys", make: () => Object.create({ Zz: 1, H: 2 }) },
  { label: "__proto__ key", make: () => JSON.parse('{"__proto__": 1, "H2": 1}') },
  { label: "proxy", make: () => new Proxy({ H2: 1 }, {}) },
  { label: "frozen object", make: () => Object.freeze({ H2: 1 }) },
  { label: "JSON rational", make: () => ({ num: 25, den: 2 }) },
  { label: "JSON rational with zero den", make: () => ({ num: 1, den: 0 }) },
  { label: "function", make: () => () => 1 },
  { label: "Map", make: () => new Map([["H2", 1]]) },
  { label: "Date", make: () => new Date(0) },
];

/** Where a hostile value goes: an argument index followed by keys into it. */
export type Path = readonly (string | number)[];

/** Every place in the valid arguments (depth ≤ 4): whole arguments, fields, array entries. */
export function pathsOf(args: readonly unknown[]): Path[] {
  const out: Path[] = [];
  const walk = (v: unknown, path: Path, depth: number): void => {
    out.push(path);
    if (depth === 0 || typeof v !== "object" || v === null || ArrayBuffer.isView(v)) return;
    if (Object.getPrototypeOf(v) !== Object.prototype && !Array.isArray(v)) return; // Species, Library, Rational...
    for (const k of Object.keys(v)) walk((v as Record<string, unknown>)[k], [...path, Array.isArray(v) ? Number(k) : k], depth - 1);
  };
  args.forEach((a, i) => walk(a, [i], 4));
  // an options argument that was not passed at all is a place too
  out.push([args.length]);
  return out;
}

/** A copy of `args` (shallow along `path`) with `value` put at `path`; frozen parts are copied. */
export function withValue(args: readonly unknown[], path: Path, value: unknown): unknown[] {
  const root = [...args];
  let holder: Record<string | number, unknown> = root as unknown as Record<number, unknown>;
  for (let i = 1; i < path.length; i++) {
    const key = path[i - 1] as string | number;
    const cur = holder[key];
    const copy = Array.isArray(cur) ? [...cur] : { ...(cur as object) };
    holder[key] = copy;
    holder = copy as Record<string | number, unknown>;
  }
  holder[path[path.length - 1] as string | number] = value;
  return root;
}

/** A deep snapshot of a value (structure, numbers incl. NaN and −0, bigints, symbols by identity). */
export function snapshot(v: unknown, seen = new Map<object, number>()): unknown {
  if (typeof v === "number") return Object.is(v, -0) ? "-0" : Number.isNaN(v) ? "NaN" : v;
  if (typeof v === "bigint") return `${v}n`;
  if (typeof v !== "object" || v === null) return v;
  if (seen.has(v)) return `<cycle ${seen.get(v)}>`;
  seen.set(v, seen.size);
  if (ArrayBuffer.isView(v)) return Array.from(v as unknown as ArrayLike<number>, (x) => snapshot(x, seen));
  if (v instanceof Map) return { map: [...v.entries()].map(([k, x]) => [snapshot(k, seen), snapshot(x, seen)]) };
  const proto = Object.getPrototypeOf(v) as object | null;
  if (proto !== Object.prototype && proto !== null && !Array.isArray(v)) return { opaque: v }; // compared by identity
  const out: Record<string, unknown> = { frozen: Object.isFrozen(v), length: Array.isArray(v) ? v.length : undefined };
  for (const k of Reflect.ownKeys(v)) {
    const d = Object.getOwnPropertyDescriptor(v, k);
    out[String(k)] = d && "value" in d ? snapshot(d.value, seen) : "<accessor>";
  }
  return out;
}

/** Paths of NaN or ±Infinity inside a result (plain objects, arrays and typed arrays; depth ≤ 6). */
export function nonFinite(v: unknown, path = "result", depth = 6, out: string[] = []): string[] {
  if (typeof v === "number") {
    if (!Number.isFinite(v)) out.push(`${path} = ${v}`);
    return out;
  }
  if (depth === 0 || typeof v !== "object" || v === null) return out;
  if (ArrayBuffer.isView(v)) {
    const a = v as unknown as ArrayLike<number>;
    for (let i = 0; i < a.length; i++) if (typeof a[i] === "number" && !Number.isFinite(a[i])) out.push(`${path}[${i}] = ${a[i]}`);
    return out;
  }
  // class instances (Species, HeatCapacity, Library) keep private sentinels such as ±Infinity
  // bounds; their public numbers are checked through their own methods by their own tests
  const proto = Object.getPrototypeOf(v) as unknown;
  if (proto !== Object.prototype && proto !== null && !Array.isArray(v)) return out;
  for (const k of Object.keys(v)) nonFinite((v as Record<string, unknown>)[k], `${path}.${k}`, depth - 1, out);
  return out;
}

/** What went wrong in one call, or null. */
export interface Finding {
  readonly entry: string;
  readonly path: string;
  readonly value: string;
  readonly problem: string;
}

/** The wall-clock bound of one call: a hang detector, not a speed target. */
export const CALL_TIME_BOUND_MS = 2000;

/** Run `entry` with `value` at `path` and check the four promises. */
export function probe(entry: EntryPoint, path: Path, hostile: Hostile): Finding | null {
  const args = withValue(entry.args(), path, hostile.make());
  const before = snapshot(args);
  const at = (problem: string): Finding => ({ entry: entry.name, path: path.join("."), value: hostile.label, problem });
  const t0 = performance.now();
  let result: unknown;
  let threw: unknown = undefined;
  try {
    result = entry.call(args);
  } catch (e) {
    threw = e ?? "a nullish throw";
  }
  const ms = performance.now() - t0;
  if (ms > CALL_TIME_BOUND_MS) return at(`took ${ms.toFixed(0)} ms (bound ${CALL_TIME_BOUND_MS} ms)`);
  if (threw !== undefined) {
    if (!(threw instanceof RxthermError)) {
      const name = (threw as { constructor?: { name?: string } })?.constructor?.name ?? typeof threw;
      return at(`threw ${name}: ${String((threw as Error)?.message ?? threw).slice(0, 160)}`);
    }
    try {
      String(threw.message); // the message was built without crashing, and it reads
      JSON.stringify(threw.details, (_k, x: unknown) => (typeof x === "bigint" || typeof x === "symbol" ? String(x) : x));
    } catch (e) {
      return at(`error details do not serialise: ${String(e)}`);
    }
  } else {
    const bad = nonFinite(result);
    if (bad.length > 0) return at(`returned non-finite ${bad.slice(0, 3).join(", ")}`);
  }
  const after = snapshot(args);
  if (JSON.stringify(before, replacer) !== JSON.stringify(after, replacer)) return at("changed its input");
  return null;
}

function replacer(_k: string, x: unknown): unknown {
  if (typeof x === "symbol") return x.toString();
  if (typeof x === "function") return "<function>";
  if (typeof x === "object" && x !== null && "opaque" in x) return "<opaque>";
  return x;
}
