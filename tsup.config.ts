import { defineConfig } from "tsup";

// ESM + CJS + .d.ts; no side effects at import (package.json "sideEffects": false).
export default defineConfig({
  // rxtherm/database is its own entry: the main entry never bundles or loads its data
  entry: { index: "src/index.ts", database: "src/database/index.ts" },
  format: ["esm", "cjs"],
  // shared code in one chunk for both formats, so that rxtherm and rxtherm/database share one species layer
  splitting: true,
  dts: true,
  clean: true,
  sourcemap: true,
  treeshake: true,
  target: "es2022",
  platform: "neutral",
  external: ["decimal.js", "zod"],
});
