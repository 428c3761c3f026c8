import { build } from "esbuild";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../..", import.meta.url));

/** Bundle a module the way an app's bundler would (decimal.js and zod stay packages). */
async function bundle(code: string): Promise<string> {
  const out = await build({
    stdin: { contents: code, resolveDir: root, loader: "ts" },
    bundle: true, write: false, format: "esm", platform: "neutral", treeShaking: true,
    external: ["decimal.js", "zod"], logLevel: "silent",
  });
  return out.outputFiles[0]?.text ?? "";
}

// "C3H6O OXETANE" is the name text of a database record that no built-in species has
describe("rxtherm/database stays out of the main entry (bundle and import cost)", () => {
  it("the whole main entry bundles without the database's data", async () => {
    const js = await bundle(`export * from "./src/index.ts";`);
    expect(js).not.toContain("OXETANE");
    expect(js).not.toContain("BURCAT_RUSCIC_2005_RECORDS");
    // the size says the same whatever the main entry's own code grows to: adding the database adds its data
    const both = await bundle(`export * from "./src/index.ts"; export * from "./src/database/index.ts";`);
    expect(both.length - js.length).toBeGreaterThan(450_000);
  }, 60000);

  it("the database entry does bring its data (the check above can fail)", async () => {
    const js = await bundle(`export { speciesDatabase } from "./src/database/index.ts";`);
    expect(js).toContain("OXETANE");
    expect(js.length).toBeGreaterThan(500_000);
  }, 60000);

  it("importing species and findSpecies from the main entry leaves out the database", async () => {
    const js = await bundle(`import { species, findSpecies } from "./src/index.ts"; console.log(species("CO2(g)"), findSpecies("CO2"));`);
    expect(js).toContain("findSpecies");
    expect(js).not.toContain("OXETANE");
  }, 60000);
});
