/**
 * Runs every benchmark file in bench/ (files named *.bench.ts) in one process and prints
 * each case beside its baseline. Usage: `npm run bench` or `npm run bench -- formula`.
 *
 * Each bench file is first bundled with esbuild into plain ES2022 JavaScript (as the
 * published package is), then imported and run. Running the TypeScript source through an
 * on-the-fly loader instead adds wrapper calls around every imported function and inflates
 * hot-loop timings several-fold, which would misreport the library's speed.
 */
import { build } from "esbuild";
import { mkdirSync, readdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { cpus, loadavg } from "node:os";

const here = dirname(fileURLToPath(import.meta.url));
const outDir = resolve(here, "..", ".out", "bench");
const filter = process.argv[2];
const files = readdirSync(here).filter((f) => f.endsWith(".bench.ts") && (!filter || f.includes(filter))).sort();
mkdirSync(outDir, { recursive: true });
await build({
  entryPoints: files.map((f) => join(here, f)),
  outdir: outDir,
  bundle: true,
  format: "esm",
  platform: "node",
  target: "es2022",
  packages: "external",
  outExtension: { ".js": ".mjs" },
  logLevel: "warning",
});
console.log(
  `rxtherm benchmarks — node ${process.version}, ${cpus().length} cores, load average ${loadavg()[0]?.toFixed(1)}, ${new Date().toISOString()}`,
);
for (const f of files) {
  console.log(`\n## ${f}`);
  const mod = (await import(pathToFileURL(join(outDir, f.replace(/\.ts$/, ".mjs"))).href)) as { run?: () => void | Promise<void> };
  if (typeof mod.run === "function") await mod.run();
}
