import { readFileSync } from "node:fs";
import { defineConfig } from "tsup";

const pkg = JSON.parse(readFileSync(new URL("./package.json", import.meta.url), "utf8")) as { version: string };

// ESM + CJS + .d.ts; no side effects at import (package.json "sideEffects": false).
export default defineConfig([
  {
    // rxtherm/database is its own entry: the main entry never bundles or loads its data
    // internal/exact-sums: the only code that imports decimal.js, as an entry of its own so that it lands in
    // its own chunk: a bundler can then leave decimal.js out of an app that never sums enthalpies exactly
    // (decimal.js does not declare itself free of side effects, so an import of it in index.js would stay)
    entry: { index: "src/index.ts", database: "src/database/index.ts", "internal/exact-sums": "src/enthalpy/exactSum.ts" },
    format: ["esm", "cjs"],
    // shared code in one chunk for both formats, so that rxtherm and rxtherm/database share one species layer
    splitting: true,
    dts: true,
    // keep the command line built by the second config (the two builds run side by side)
    clean: ["!cli.js", "!cli.js.map"],
    sourcemap: true,
    treeshake: true,
    target: "es2022",
    platform: "neutral",
    external: ["decimal.js"],
    // zod mini (the species-data schemas) goes inside, tree-shaken to the few kilobytes the schemas use:
    // loading the zod package from node_modules would cost more than the rest of the import together
    noExternal: ["zod"],
  },
  // the command line `rxtherm` (package.json "bin"): Node only, one ESM file with its shebang
  {
    entry: { cli: "src/cli/bin.ts" },
    format: ["esm"],
    dts: false,
    clean: false,
    sourcemap: true,
    treeshake: true,
    target: "node20",
    platform: "node",
    external: ["decimal.js"],
    noExternal: ["zod"],
    banner: { js: "#!/usr/bin/env node" },
    define: { RXTHERM_VERSION: JSON.stringify(pkg.version) },
  },
]);
