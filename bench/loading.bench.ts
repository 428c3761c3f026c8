/**
 * Loading cost: a fresh Node process that imports the library and evaluates its first species,
 * beside a bare `node -e 0` start measured in the same run (interleaved), and the size of the
 * main entry's bundle with and without the opt-in species database. The library is bundled with
 * esbuild first as the published dist is (decimal.js stays an external package; the few parts of zod
 * mini that the species-data schemas use go inside), so the numbers are those of the published ES
 * module, not of an on-the-fly TypeScript loader.
 */
import { build } from "esbuild";
import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
const outDir = join(root, ".out", "loading");

async function bundle(name: string, contents: string): Promise<{ file: string; bytes: number; gzip: number }> {
  const file = join(outDir, `${name}.mjs`);
  const res = await build({
    stdin: { contents, resolveDir: root, loader: "ts" },
    bundle: true, write: false, format: "esm", platform: "neutral", target: "es2022",
    treeShaking: true, minify: true, external: ["decimal.js"], logLevel: "silent",
  });
  const text = res.outputFiles[0]!.contents;
  writeFileSync(file, text);
  return { file, bytes: text.length, gzip: gzipSync(text).length };
}

/** Wall time of one fresh node process, ms. */
function spawnMs(args: string[]): number {
  const t0 = performance.now();
  execFileSync(process.execPath, args, { cwd: root, stdio: "ignore" });
  return performance.now() - t0;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

export async function run(): Promise<void> {
  mkdirSync(outDir, { recursive: true });
  const main = await bundle("main", `export * from "./src/index.ts";`);
  const withDb = await bundle("main-and-database", `export * from "./src/index.ts"; export * from "./src/database/index.ts";`);
  const db = await bundle("database", `export * from "./src/database/index.ts";`);
  const kb = (b: number): string => `${(b / 1024).toFixed(1)} KiB`;
  console.log(`bundle size (minified, decimal.js external, zod mini inside): main entry ${kb(main.bytes)} (gzip ${kb(main.gzip)}); main + database ${kb(withDb.bytes)} (gzip ${kb(withDb.gzip)}); database entry alone ${kb(db.bytes)} (gzip ${kb(db.gzip)})`);

  const firstUse = join(outDir, "first-use.mjs");
  writeFileSync(firstUse, `import { species } from ${JSON.stringify(main.file)}; globalThis.v = species("CO2(g)").enthalpy(1000);\n`);
  const dbUse = join(outDir, "database-use.mjs");
  writeFileSync(dbUse, `import { species } from ${JSON.stringify(main.file)}; import { speciesDatabase } from ${JSON.stringify(db.file)};\n` +
    `const t0 = performance.now(); const lib = speciesDatabase(); const t1 = performance.now(); globalThis.v = species("CO2(g)", lib).enthalpy(1000);\n` +
    `process.stdout.write(String(t1 - t0) + " " + String(performance.now() - t1));\n`);
  const runs = 15;
  const bare: number[] = [];
  const lib: number[] = [];
  for (let i = 0; i < 2; i++) { spawnMs(["-e", "0"]); spawnMs([firstUse]); } // warm the file cache
  for (let i = 0; i < runs; i++) {
    bare.push(spawnMs(["-e", "0"]));
    lib.push(spawnMs([firstUse]));
  }
  const b = median(bare), l = median(lib);
  console.log(`import + first species evaluation: node ${l.toFixed(1)} ms | baseline bare \`node -e 0\`: ${b.toFixed(1)} ms | added ${(l - b).toFixed(1)} ms, ratio ${(l / b).toFixed(2)}× | target added < 35 ms`);

  // the same split inside one process: the import, then the first species evaluation
  const split = join(outDir, "split.mjs");
  writeFileSync(split, `const t0 = performance.now(); const m = await import(${JSON.stringify(main.file)}); const t1 = performance.now();\n` +
    `globalThis.v = m.species("CO2(g)").enthalpy(1000); const t2 = performance.now(); process.stdout.write((t1 - t0) + " " + (t2 - t1));\n`);
  const imp: number[] = [];
  const first: number[] = [];
  for (let i = 0; i < 9; i++) {
    const [a, c] = execFileSync(process.execPath, [split], { cwd: root, encoding: "utf8" }).split(" ").map(Number);
    imp.push(a!); first.push(c!);
  }
  console.log(`in one process: import of the main entry ${median(imp).toFixed(1)} ms (decimal.js included), first species evaluation ${median(first).toFixed(1)} ms`);

  const dbBuild: number[] = [];
  const dbFirst: number[] = [];
  for (let i = 0; i < 9; i++) {
    const [a, c] = execFileSync(process.execPath, [dbUse], { cwd: root, encoding: "utf8" }).split(" ").map(Number);
    dbBuild.push(a!); dbFirst.push(c!);
  }
  console.log(`speciesDatabase() first call (1,306 species, in a fresh process): ${median(dbBuild).toFixed(1)} ms; first evaluation of a database species after it: ${median(dbFirst).toFixed(2)} ms`);
}
