import { describe, expect, it } from "vitest";
import { fc, test } from "../_helpers/property.js";
import { columnHeader, formatCell, viewMimeBundle, viewToHtml, viewToMarkdown, viewToText } from "../../src/view/renderView.js";
import type { ResultView } from "../../src/view/types.js";

// an invented demo table (a biogas boiler's flue gas), not a published value
const VIEW: ResultView = {
  title: "biogas boiler <flue> & stack",
  tables: [{
    caption: "flue gas",
    columns: [{ label: "species" }, { label: "flow", unit: "mol/s" }, { label: "y", unit: "mol/mol", digits: 3 }],
    rows: [["CO2(g)", 1.25, 0.1234], ["H2O|x", -0, null]],
  }],
  notes: ["a *note*"],
};

describe("formatCell(cell, digits)", () => {
  it("rounds to significant digits, trims zeros and never prints -0", () => {
    expect(formatCell(-0)).toBe("0");
    expect(formatCell(1.5)).toBe("1.5");
    expect(formatCell(2225.0000001)).toBe("2225");
    expect(formatCell(0.123456789, 3)).toBe("0.123");
    expect(formatCell(123456789)).toBe("123457000");
    expect(formatCell(1.4e-8, 4)).toBe("1.4e-8");
    expect(formatCell(2.5e12)).toBe("2.5e12");
    expect(formatCell(null)).toBe("");
    expect(formatCell("x")).toBe("x");
    expect(formatCell(Infinity)).toBe("∞");
  });

  test.prop([fc.double({ min: -1e12, max: 1e12, noNaN: true })])("formatCell(x) reads back within 6 significant digits", (x) => {
    const back = Number(formatCell(x));
    expect(Math.abs(back - x)).toBeLessThanOrEqual(Math.abs(x) * 5e-6 + 1e-300);
  });
});

describe("view renderers", () => {
  it("columnHeader(column) puts the unit in brackets", () => {
    expect(columnHeader({ label: "T", unit: "K" })).toBe("T (K)");
    expect(columnHeader({ label: "species" })).toBe("species");
  });

  it("viewToText(view) aligns numbers right and writes the notes", () => {
    const text = viewToText(VIEW).split("\n");
    expect(text[0]).toBe("biogas boiler <flue> & stack");
    expect(text).toContain("species  flow (mol/s)  y (mol/mol)");
    expect(text).toContain("CO2(g)           1.25        0.123");
    expect(text).toContain("H2O|x               0");
    expect(text.at(-1)).toBe("note: a *note*");
  });

  it("viewToMarkdown(view) writes a pipe table with escaped pipes and alignment row", () => {
    const md = viewToMarkdown(VIEW).split("\n");
    expect(md[0]).toBe("**biogas boiler <flue> & stack**");
    expect(md).toContain("| species | flow (mol/s) | y (mol/mol) |");
    expect(md).toContain("|:---|---:|---:|");
    expect(md).toContain("| H2O\\|x | 0 |  |");
    expect(md.at(-1)).toBe("> a \\*note\\*");
  });

  it("viewToHtml(view) escapes text and marks units in the header cells", () => {
    const html = viewToHtml(VIEW);
    expect(html.startsWith('<div class="rxtherm"><strong>biogas boiler &lt;flue&gt; &amp; stack</strong>')).toBe(true);
    expect(html).toContain('<th style="text-align:right">flow (mol/s)</th>');
    expect(html).toContain("<caption>flue gas</caption>");
    expect(html).not.toContain("<flue>");
  });

  it("viewMimeBundle(view) holds text/plain, text/markdown and text/html", () => {
    expect(Object.keys(viewMimeBundle(VIEW))).toEqual(["text/plain", "text/markdown", "text/html"]);
  });
});
