import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { checkMarkdownLinks, checkSiteLinks, markdownAnchors, markdownFiles } from "../../docs/site/checkLinks.js";

const root = fileURLToPath(new URL("../..", import.meta.url));
const scratch = mkdtempSync(join(tmpdir(), "rxtherm-links-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("documentation links", () => {
  it("every relative link of README.md, DEVELOPERS.md, CHANGELOG.md and docs/*.md resolves", () => {
    const files = markdownFiles(root);
    expect(files.map((f) => f.slice(root.length))).toEqual(expect.arrayContaining(["README.md", "docs/flame.md", "docs/errors.md"]));
    expect(checkMarkdownLinks(files, root)).toEqual([]);
  });

  it("checkMarkdownLinks reports a missing file and a missing heading, and ignores code and external links", () => {
    writeFileSync(join(scratch, "b.md"), "# Heat duty, at 25 °C\n\n## Heat duty, at 25 °C\n");
    writeFileSync(join(scratch, "a.md"), [
      "[ok](b.md) [ok](b.md#heat-duty-at-25-c) [ok](b.md#heat-duty-at-25-c-1) [web](https://example.org/x.md)",
      "[gone](c.md) [bad anchor](b.md#cp) `[code](nowhere.md)`",
      "```", "[fenced](nowhere.md)", "```",
    ].join("\n"));
    expect(checkMarkdownLinks([join(scratch, "a.md")], scratch)).toEqual([
      { file: "a.md", link: "c.md", reason: "no such file" },
      { file: "a.md", link: "b.md#cp", reason: "no heading with anchor #cp" },
    ]);
  });

  it("checkSiteLinks reports a dead page link and a dead anchor of a generated site", () => {
    const site = join(scratch, "site");
    mkdirSync(join(site, "functions"), { recursive: true });
    writeFileSync(join(site, "index.html"), '<a href="functions/molarMass.html#returns">x</a><a href="functions/gone.html">y</a><a href="https://typedoc.org/">z</a>');
    writeFileSync(join(site, "functions", "molarMass.html"), '<h4 id="parameters">p</h4><a href="../index.html#top">t</a><link href="../assets/style.css">');
    expect(checkSiteLinks(site)).toEqual([
      { file: "functions/molarMass.html", link: "../index.html#top", reason: "no anchor #top" },
      { file: "functions/molarMass.html", link: "../assets/style.css", reason: "no such file" },
      { file: "index.html", link: "functions/molarMass.html#returns", reason: "no anchor #returns" },
      { file: "index.html", link: "functions/gone.html", reason: "no such file" },
    ]);
  });

  it("markdownAnchors: lowercase, punctuation dropped, spaces to '-', repeats numbered", () => {
    expect([...markdownAnchors("# Deno and packaging\n## Cp(T), ∫Cp dT\n## Deno and packaging\n")])
      .toEqual(["deno-and-packaging", "cpt-cp-dt", "deno-and-packaging-1"]);
  });
});
