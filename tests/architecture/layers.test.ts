/**
 * Import direction: the folder tree under src/ is the layer table.
 *
 * LAYERS below is the one machine-readable copy of the layer table in DEVELOPERS.md. A module may
 * import from itself and from modules of a strictly lower layer (layer 0 — errors.ts, units.ts and
 * numeric/ — is one foundation and may import within itself). No module imports another module's
 * private files (anything under an `internal/` folder). Every top-level entry under src/ must be listed.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";

/** Top-level entry under src/ (folder name or file name) → layer. */
export const LAYERS: Readonly<Record<string, number>> = Object.freeze({
  "errors.ts": 0,
  "units.ts": 0,
  numeric: 0,
  view: 0,
  formula: 1,
  reaction: 2,
  extent: 3,
  "heat-capacity": 3,
  species: 4,
  enthalpy: 5,
  energy: 6,
  flame: 6,
  display: 7,
  cli: 8,
  "index.ts": 9,
  database: 9,
  "database.ts": 9,
});

const SRC = resolve(__dirname, "../../src");

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/\.(ts|mts|tsx)$/.test(name)) out.push(p);
  }
  return out;
}

/** Module of a file under src/: its top-level folder, or its own name for a top-level file. */
function moduleOf(file: string): string {
  return relative(SRC, file).split(/[\\/]/)[0]!;
}

const IMPORT_RE = /(?:^|[\s;])(?:import|export)\s[^;]*?from\s*["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

interface Edge { from: string; to: string; spec: string }

function edges(): Edge[] {
  const list: Edge[] = [];
  for (const file of walk(SRC)) {
    const text = readFileSync(file, "utf8");
    for (const m of text.matchAll(IMPORT_RE)) {
      const spec = (m[1] ?? m[2])!;
      if (!spec.startsWith(".")) continue;
      const target = resolve(dirname(file), spec).replace(/\.js$/, ".ts");
      list.push({ from: relative(SRC, file), to: relative(SRC, target), spec });
    }
  }
  return list;
}

describe("architecture: import direction", () => {
  const all = edges();

  it("finds the imports it checks (the scanner works)", () => {
    expect(all.length).toBeGreaterThan(200);
    expect(all.some((e) => e.from === "index.ts")).toBe(true);
  });

  it("lists every top-level entry of src/ in the layer table", () => {
    const unlisted = readdirSync(SRC).filter((n) => !(n in LAYERS));
    expect(unlisted).toEqual([]);
  });

  it("has no import into a higher layer or across modules of one layer (layer 0 excepted)", () => {
    const bad = all.filter((e) => {
      const a = moduleOf(resolve(SRC, e.from));
      const b = moduleOf(resolve(SRC, e.to));
      if (a === b) return false;
      const la = LAYERS[a];
      const lb = LAYERS[b];
      if (la === undefined || lb === undefined) return true;
      if (la === 0 && lb === 0) return false;
      return lb >= la;
    }).map((e) => `${e.from} → ${e.to}`);
    expect(bad).toEqual([]);
  });

  it("has no import of another module's private files (internal/)", () => {
    const bad = all.filter((e) => {
      const a = moduleOf(resolve(SRC, e.from));
      const b = moduleOf(resolve(SRC, e.to));
      return a !== b && /(^|[\\/])internal[\\/]/.test(e.to);
    }).map((e) => `${e.from} → ${e.to}`);
    expect(bad).toEqual([]);
  });

  it("has no import of index.ts from inside the library", () => {
    expect(all.filter((e) => e.to === "index.ts").map((e) => e.from)).toEqual([]);
  });

  it("has no import cycle between files", () => {
    const graph = new Map<string, string[]>();
    for (const e of all) graph.set(e.from, [...(graph.get(e.from) ?? []), e.to]);
    const state = new Map<string, 1 | 2>();
    const cycles: string[] = [];
    const visit = (n: string, stack: string[]): void => {
      state.set(n, 1);
      for (const m of graph.get(n) ?? []) {
        const s = state.get(m);
        if (s === 1) cycles.push([...stack.slice(stack.indexOf(m)), m].join(" → "));
        else if (s === undefined) visit(m, [...stack, m]);
      }
      state.set(n, 2);
    };
    for (const n of graph.keys()) if (!state.has(n)) visit(n, [n]);
    expect(cycles).toEqual([]);
  });
});
