// Tree shaking and bundle size of the SHIPPED dist (what an app's bundler sees after `npm install rxtherm`):
// small apps import from the package by name and are bundled with esbuild with every dependency inlined
// (decimal.js is NOT external; the dist carries the parts of zod mini its schemas use), minified, then gzipped. Limits from issue 13: an app that only
// uses molarMass under 30 KiB gzipped, one that uses the flame solver under 70 KiB (built-in data included).
import { build, type Metafile } from "esbuild";
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));
const KIB = 1024;

interface AppBundle {
  /** Minified bundle. */
  min: string;
  /** Unminified bundle (names kept), to look for what should be absent. */
  plain: string;
  minKiB: number;
  gzipKiB: number;
  /** Packages whose code ended up in the bundle. */
  packages: Set<string>;
}

/** zod's schema classes in the bundle (zod mini is inlined into the dist, so it is no package there). */
function hasZod(b: AppBundle): boolean {
  return b.packages.has("zod") || /"(ZodMiniObject|\$ZodObject)"/.test(b.plain);
}

let app: string;
beforeAll(() => {
  ensureBuilt();
  // an app folder whose node_modules/rxtherm is this package, as after `npm install rxtherm`
  app = mkdtempSync(join(tmpdir(), "rxtherm-app-"));
  mkdirSync(join(app, "node_modules"));
  symlinkSync(root, join(app, "node_modules", "rxtherm"), "dir");
}, 120000);
afterAll(() => { if (app) rmSync(app, { recursive: true, force: true }); });

describe("tree shaking of the shipped dist (package.json sideEffects: false, no work at import)", () => {
  it("a molarMass-only app is under 30 KiB gzipped, without zod and without the flame solver or species data", async () => {
    const b = await bundleApp(`import { molarMass } from "rxtherm"; console.log(molarMass("H2O"));`);
    report("molarMass only", b);
    expect(b.gzipKiB).toBeLessThan(30);
    expect(hasZod(b)).toBe(false);
    expect(b.plain).toContain("function molarMass(");
    expect(b.plain).not.toContain("function adiabaticFlameTemperature(");
    expect(b.plain).not.toContain("function equilibriumComposition(");
    expect(b.plain).not.toMatch(/webbook/i); // the built-in species data cite the NIST WebBook
    // nothing of the layers above formula/ survives: module-level constants there are pure, and the compiled
    // Cp helpers (hAt, writeSegment) are not held by a namespace object
    expect(b.plain).not.toMatch(/function (rationalAdd|solveLinearSystem|createHeatCapacity|balanceReaction|hAt|writeSegment)\(|DRY_AIR|Float64Array\(MAX_SLOTS\)/);
  }, 60000);

  it("a flame-solver app (built-in data included) is under 70 KiB gzipped and carries no zod", async () => {
    const b = await bundleApp(
      `import { adiabaticFlameTemperature } from "rxtherm"; console.log(adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 0.9 }).T);`,
    );
    report("flame solver", b);
    expect(b.gzipKiB).toBeLessThan(70);
    expect(hasZod(b)).toBe(false);
    expect(b.plain).toContain("function adiabaticFlameTemperature(");
    expect(b.plain).toMatch(/webbook/i); // the check above can fail: the data are there when used
  }, 60000);

  it("an app that validates user species data does bring zod (the checks above can fail)", async () => {
    const b = await bundleApp(`import { createLibrary } from "rxtherm"; console.log(createLibrary({ sources: {}, species: [] }));`);
    report("createLibrary (zod)", b);
    expect(hasZod(b)).toBe(true);
  }, 60000);

  it("the whole API, measured", async () => {
    const b = await bundleApp(`import * as rxtherm from "rxtherm"; console.log(rxtherm);`);
    report("whole API", b);
    expect(hasZod(b) && b.packages.has("decimal.js")).toBe(true);
    expect(b.gzipKiB).toBeGreaterThan(70); // the flame app above really is a subset
  }, 60000);
});

describe("browser bundle dist/browser/rxtherm.min.js", () => {
  it("is one self-contained ES module: no import of any other file or package, the whole API exported", async () => {
    const file = join(root, "dist/browser/rxtherm.min.js");
    const code = readFileSync(file, "utf8");
    const out = await build({
      entryPoints: [file], bundle: true, write: false, format: "esm", platform: "browser",
      packages: "external", metafile: true, logLevel: "silent",
    });
    const imports = Object.values(out.metafile.outputs).flatMap((o) => o.imports);
    expect(imports).toEqual([]);
    const api = await import(/* @vite-ignore */ new URL(`file://${file}`).href) as Record<string, unknown>;
    const main = await import(/* @vite-ignore */ new URL(`file://${join(root, "dist/index.js")}`).href) as Record<string, unknown>;
    expect(Object.keys(api).sort()).toEqual(Object.keys(main).sort());
    const gzip = gzipSync(code).length / KIB;
    console.log(`browser bundle: ${(code.length / KIB).toFixed(1)} KiB minified, ${gzip.toFixed(1)} KiB gzipped`);
  }, 60000);
});

/** Bundle an app the way its bundler would: dependencies inlined, minified for size, plain for names. */
async function bundleApp(code: string): Promise<AppBundle> {
  const run = async (minify: boolean) => build({
    stdin: { contents: code, resolveDir: app, loader: "js" },
    bundle: true, write: false, format: "esm", platform: "browser", target: "es2022",
    minify, metafile: true, logLevel: "silent",
  });
  const [min, plain] = await Promise.all([run(true), run(false)]);
  const text = min.outputFiles[0]!.text;
  return {
    min: text,
    plain: plain.outputFiles[0]!.text,
    minKiB: Buffer.byteLength(text) / KIB,
    gzipKiB: gzipSync(text).length / KIB,
    packages: packagesIn(min.metafile),
  };
}

function packagesIn(meta: Metafile): Set<string> {
  const found = new Set<string>();
  for (const output of Object.values(meta.outputs)) {
    for (const [input, { bytesInOutput }] of Object.entries(output.inputs)) {
      const m = /node_modules\/((?:@[^/]+\/)?[^/]+)\//.exec(input);
      if (m && bytesInOutput > 0) found.add(m[1]!);
    }
  }
  return found;
}

function report(name: string, b: AppBundle): void {
  console.log(`${name}: ${b.minKiB.toFixed(1)} KiB minified, ${b.gzipKiB.toFixed(1)} KiB gzipped; packages: ${[...b.packages].join(", ") || "none"}`);
}

/** Build the dist when it is missing or older than the source (CI builds it first; a local run may not have). */
function ensureBuilt(): void {
  const built = [join(root, "dist/index.js"), join(root, "dist/browser/rxtherm.min.js")];
  const oldest = Math.min(...built.map((f) => (existsSync(f) ? statSync(f).mtimeMs : 0)));
  const sources = [join(root, "package.json"), join(root, "tsup.config.ts"), join(root, "tsup.browser.config.ts"), ...listFiles(join(root, "src"))];
  if (sources.some((f) => statSync(f).mtimeMs > oldest)) {
    execFileSync("npm", ["run", "build"], { cwd: root, stdio: "ignore" });
  }
}

function listFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? listFiles(join(dir, e.name)) : [join(dir, e.name)]);
}
