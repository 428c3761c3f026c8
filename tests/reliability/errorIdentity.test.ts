/**
 * One error identity across builds: an error thrown by the CommonJS build must be recognised by
 * `isRxthermError` and `instanceof RxthermError` of the ESM build in the same process, and the
 * other way round. The two builds are bundled here with esbuild (the bundler tsup uses) from
 * src/index.ts; when `npm run build` has made dist/ (CI builds before testing), dist/index.cjs
 * and dist/index.js are checked as well.
 */
import { existsSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "esbuild";
import { afterAll, describe, expect, it } from "vitest";
import { RxthermError, isRxthermError } from "../../src/errors.js";

type Api = typeof import("../../src/index.js");

const ROOT = resolve(__dirname, "../..");
const dir = mkdtempSync(join(tmpdir(), "rxtherm-identity-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function bundle(format: "cjs" | "esm"): Promise<string> {
  const outfile = join(dir, format === "cjs" ? "index.cjs" : "index.mjs");
  await build({ entryPoints: [join(ROOT, "src/index.ts")], bundle: true, format, platform: "node", outfile, logLevel: "silent" });
  return outfile;
}

function thrownBy(f: () => unknown): unknown {
  try {
    f();
  } catch (e) {
    return e;
  }
  throw new Error("expected a throw");
}

async function checkPair(cjs: Api, esm: Api): Promise<void> {
  expect(cjs.RxthermError).not.toBe(esm.RxthermError); // two distinct classes, one identity
  const fromCjs = thrownBy(() => cjs.parseFormula("Xy2"));
  const fromEsm = thrownBy(() => esm.parseFormula("Xy2"));
  expect(esm.isRxthermError(fromCjs, "UNKNOWN_ELEMENT")).toBe(true);
  expect(fromCjs instanceof esm.RxthermError).toBe(true);
  expect(cjs.isRxthermError(fromEsm, "UNKNOWN_ELEMENT")).toBe(true);
  expect(fromEsm instanceof cjs.RxthermError).toBe(true);
  // and the source build used by the tests agrees with both
  expect(fromCjs instanceof RxthermError && isRxthermError(fromEsm)).toBe(true);
  expect(new Error("x") instanceof esm.RxthermError).toBe(false);
  expect(esm.isRxthermError({ code: "UNKNOWN_ELEMENT" })).toBe(false);
}

describe("RxthermError identity across builds", () => {
  it("a CommonJS-build error is an RxthermError of the ESM build and vice versa (esbuild bundles of src/)", async () => {
    const cjsFile = await bundle("cjs");
    const esmFile = await bundle("esm");
    const cjs = createRequire(import.meta.url)(cjsFile) as Api;
    const esm = (await import(pathToFileURL(esmFile).href)) as Api;
    await checkPair(cjs, esm);
  }, 60_000);

  it.runIf(existsSync(join(ROOT, "dist/index.cjs")) && existsSync(join(ROOT, "dist/index.js")))(
    "dist/index.cjs and dist/index.js agree (after npm run build)",
    async () => {
      const cjs = createRequire(import.meta.url)(join(ROOT, "dist/index.cjs")) as Api;
      const esm = (await import(pathToFileURL(join(ROOT, "dist/index.js")).href)) as Api;
      await checkPair(cjs, esm);
    },
    60_000,
  );

  it("the brand is the process-wide Symbol.for(\"rxtherm.error\")", () => {
    const e = new RxthermError("INVALID_ARGUMENT", "x");
    expect((e as unknown as Record<symbol, unknown>)[Symbol.for("rxtherm.error")]).toBe(true);
    writeFileSync(join(dir, "touch"), ""); // the temp folder is usable (cleanup runs after all)
  });
});
