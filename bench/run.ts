/**
 * Runs every benchmark file in bench/ (files named *.bench.ts) in one process and prints
 * each case beside its baseline. Usage: `npm run bench` or `npm run bench -- formula`.
 */
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2];
const files = readdirSync(here).filter((f) => f.endsWith(".bench.ts") && (!filter || f.includes(filter))).sort();
console.log(`rxtherm benchmarks — node ${process.version}, ${new Date().toISOString()}`);
for (const f of files) {
  console.log(`\n## ${f}`);
  const mod = (await import(pathToFileURL(join(here, f)).href)) as { run?: () => void | Promise<void> };
  if (typeof mod.run === "function") await mod.run();
}
