import { defineConfig } from "tsup";

// The self-contained browser bundle: one minified ES module with decimal.js and zod inlined, for a
// page that loads it with <script type="module"> and no bundler (package.json "./browser").
// Built by `npm run build` after the main dist (a separate config, so the main build's clean step
// never races with it). Types: the main entry's dist/index.d.ts (same API).
export default defineConfig({
  entry: { rxtherm: "src/index.ts" },
  outDir: "dist/browser",
  outExtension: () => ({ js: ".min.js" }),
  format: ["esm"],
  platform: "browser",
  target: "es2022",
  minify: true,
  sourcemap: false, // keeps the package small; debug with the ESM dist and its source maps
  treeshake: true,
  dts: false,
  clean: true,
  noExternal: ["decimal.js", "zod"],
});
