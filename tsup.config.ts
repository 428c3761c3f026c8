import { defineConfig } from "tsup";

// ESM + CJS + .d.ts; no side effects at import (package.json "sideEffects": false).
export default defineConfig({
  entry: { index: "src/index.ts" },
  format: ["esm", "cjs"],
  dts: true,
  clean: true,
  sourcemap: true,
  treeshake: true,
  target: "es2022",
  platform: "neutral",
  external: ["decimal.js", "zod"],
});
