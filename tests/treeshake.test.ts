import { build } from "esbuild";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));

/** Bundle a one-line import of the public entry the way an app's bundler would. */
async function bundle(code: string): Promise<string> {
  const out = await build({
    stdin: { contents: code, resolveDir: root, loader: "ts" },
    bundle: true,
    write: false,
    format: "esm",
    platform: "neutral",
    treeShaking: true,
    external: ["decimal.js", "zod"],
    logLevel: "silent",
  });
  return out.outputFiles[0]?.text ?? "";
}

describe("tree shaking (package.json sideEffects: false, no work at import)", () => {
  it("importing molarMass leaves out the flame solver, the species data and the zod schema", async () => {
    const js = await bundle(`import { molarMass } from "./src/index.ts"; console.log(molarMass("H2O"));`);
    expect(js).toContain("function molarMass");
    expect(js).not.toContain("adiabaticFlameTemperature");
    expect(js).not.toContain("equilibriumComposition");
    expect(js).not.toMatch(/webbook/i); // built-in species data cite the NIST WebBook
    expect(js).not.toContain('from "zod"');
  }, 60000);
  it("importing the flame solver does bring it in (the check above can fail)", async () => {
    const js = await bundle(`import { adiabaticFlameTemperature } from "./src/index.ts"; console.log(adiabaticFlameTemperature);`);
    expect(js).toContain("adiabaticFlameTemperature");
  }, 60000);
});
