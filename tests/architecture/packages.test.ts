/**
 * Which package imports the library code may use: decimal.js, and zod only as `zod/mini` (plus its
 * English messages and types). Full `zod` loads ~100 module files at import (50–65 ms measured by
 * `npm run bench -- loading`). The command line may also import `node:` modules.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

const src = join(__dirname, "..", "..", "src");

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? files(p) : p.endsWith(".ts") ? [p] : [];
  });
}

const ALLOWED = new Set(["decimal.js", "zod/mini", "zod/v4/core", "zod/v4/locales/en.js"]);

describe("package imports under src/", () => {
  it("are decimal.js (in enthalpy/exactSum.ts only) and zod mini", () => {
    const bad: string[] = [];
    for (const f of files(src)) {
      const rel = relative(src, f);
      for (const m of readFileSync(f, "utf8").matchAll(/^\s*(?:import|export)(?!\s+type\b)[^;]*?from\s+"([^".][^"]*)"/gm)) {
        const spec = m[1]!;
        // decimal.js only in the one module the dist keeps in a chunk of its own (tsup.config.ts)
        if (spec === "decimal.js" && rel !== join("enthalpy", "exactSum.ts")) { bad.push(`${rel}: decimal.js (only enthalpy/exactSum.ts may import it)`); continue; }
        if (ALLOWED.has(spec)) continue;
        if (spec.startsWith("node:") && rel.startsWith("cli")) continue;
        bad.push(`${rel}: ${spec}`);
      }
    }
    expect(bad).toEqual([]);
  });
});
