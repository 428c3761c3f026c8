/**
 * The library runs in browsers and Deno: Node built-ins may be imported only by the command line's Node entry
 * (src/cli/bin.ts). Everything else under src/cli/ gets files and streams through the CliIO it is given.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, resolve } from "node:path";
import { builtinModules } from "node:module";
import { describe, expect, it } from "vitest";

const SRC = resolve(__dirname, "../../src");
const BUILTIN = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (name.endsWith(".ts")) out.push(p);
  }
  return out;
}

describe("Node built-ins under src/", () => {
  it("are imported by src/cli/bin.ts only", () => {
    const offenders: string[] = [];
    let binImports = 0;
    for (const file of walk(SRC)) {
      const text = readFileSync(file, "utf8");
      for (const m of text.matchAll(/(?:from\s*|import\(\s*|require\(\s*)["']([^"']+)["']/g)) {
        if (!BUILTIN.has(m[1]!)) continue;
        if (relative(SRC, file) === join("cli", "bin.ts")) binImports++;
        else offenders.push(`${relative(SRC, file)}: ${m[1]}`);
      }
    }
    expect(offenders).toEqual([]);
    expect(binImports).toBeGreaterThan(0); // the scanner sees the one allowed import
  });
});
