/**
 * The charts render with the Vega-Lite reference compiler and the Vega renderer (dev dependencies `vega-lite`
 * and `vega`, exact-pinned) to SVG, headless: marks are present and the axis titles carry their units.
 */
import { describe, expect, it } from "vitest";
import { compile } from "vega-lite";
import { View, parse } from "vega";
import { cpChart, dutyChart, flameChart, flameTemperatureSweep, heatDuty } from "../../src/index.js";
import type { ChartSpec } from "../../src/index.js";

async function svgOf(chart: ChartSpec): Promise<string> {
  const vg = compile(JSON.parse(JSON.stringify(chart)) as never).spec;
  const view = new View(parse(vg), { renderer: "none" });
  const svg = await view.toSVG();
  view.finalize();
  return svg;
}

describe("charts render to SVG with vega-lite and vega", () => {
  it("cpChart: one line path per species, axis titles with units", async () => {
    const svg = await svgOf(cpChart(["N2(g)", "CO2(g)", "H2O(g)"], { TmaxK: 1500, points: 20 }));
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg.match(/class="mark-line role-mark marks"/g)?.length).toBe(3); // one line mark per species
    expect(svg.match(/aria-roledescription="line mark"/g)?.length).toBe(3);
    expect(svg).toContain("T (K)");
    expect(svg).toContain("Cp° (J/(mol·K))");
    expect(svg).toContain("CO2(g)"); // legend entry
  });

  it("flameChart: line and points, axis titles with units", async () => {
    const sweep = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.7, 0.85, 1] });
    const svg = await svgOf(flameChart(sweep));
    expect(svg).toContain('class="mark-line role-mark layer_0_marks"');
    expect(svg.match(/aria-roledescription="point"/g)?.length).toBe(3); // one point per swept value
    expect(svg).toContain("equivalence ratio φ (–)");
    expect(svg).toContain("adiabatic flame temperature (K)");
  });

  it("dutyChart: one bar per part of the balance", async () => {
    const q = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } });
    const svg = await svgOf(dutyChart(q));
    expect(svg).toContain('class="mark-rect role-mark marks"');
    expect(svg.match(/aria-roledescription="bar"/g)?.length).toBe(5);
    expect(svg).toContain("heat (kJ or kW)");
  });
});
