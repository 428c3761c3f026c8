import { describe, expect, it } from "vitest";
import {
  JUPYTER_DISPLAY, efficiencyChart, efficiencyCurve, compositionChart, cpChart, dutyChart, enthalpyChart, flameChart, flameTemperatureSweep, heatDuty,
  mimeBundle, species, toText,
} from "../../src/index.js";
import { MAX_CHART_POINTS, MAX_CHART_SERIES } from "../../src/display/cpChart.js";
import { caught } from "../_helpers/caught.js";

const SWEEP = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] });

describe("cpChart(species, options)", () => {
  it("doc example: two species, 25 points each, unit in the y title", () => {
    const chart = cpChart(["N2(g)", "CO2(g)"], { TminK: 300, TmaxK: 1500, points: 25 });
    expect(chart.data.values.length).toBe(50);
    expect(chart.encoding.y.title).toBe("Cp° (J/(mol·K))");
    expect(chart.encoding.x.title).toBe("T (K)");
    expect(chart.$schema).toBe("https://vega.github.io/schema/vega-lite/v5.json");
  });

  it("samples the species' own Cp: N2 at 1000 K is 32.70 J/(mol·K)", () => {
    const chart = cpChart("N2(g)", { TminK: 500, TmaxK: 1000, points: 2 });
    expect(chart.data.values[1]).toEqual({ species: "N2(g)", T: 1000, value: species("N2(g)").cp(1000) });
    expect(chart.data.values[1]!.value as number).toBeCloseTo(32.70, 1); // NIST-JANAF 4th ed. 1998, Cp°(N2, 1000 K) = 32.697 J/(mol·K)
  });

  it("ends exactly on the window edges (grid from the index)", () => {
    const T = cpChart("N2(g)", { TminK: 300, TmaxK: 1100, points: 7 }).data.values.map((v) => v.T as number);
    expect(T[0]).toBe(300);
    expect(T.at(-1)).toBe(1100);
    expect(T.every((t, i) => i === 0 || t > T[i - 1]!)).toBe(true);
  });

  it("is plain JSON with a Vega-Lite MIME bundle and a text fallback", () => {
    const chart = cpChart("N2(g)", { points: 3 });
    expect(JSON.parse(JSON.stringify(chart))).toEqual(chart);
    const bundle = mimeBundle(chart);
    expect(Object.keys(bundle)).toEqual(["application/vnd.vegalite.v5+json", "text/plain"]);
    expect(bundle["application/vnd.vegalite.v5+json"]).toEqual(JSON.parse(JSON.stringify(chart)));
    expect(chart[JUPYTER_DISPLAY as unknown as keyof typeof chart]).toBeTypeOf("function");
    expect(toText(chart)).toContain("Cp° (J/(mol·K))");
  });

  it("rejects bad windows, point counts and species without data in the window", () => {
    expect(caught(() => cpChart([])).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => cpChart("N2(g)", { TminK: 900, TmaxK: 800 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => cpChart("N2(g)", { points: 1 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => cpChart("N2(g)", { TminK: -5 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => cpChart("N2(g)", { TminK: 7000, TmaxK: 8000 })).code).toBe("OUT_OF_RANGE");
    expect(caught(() => cpChart("Xx(g)")).code).toBe("UNKNOWN_SPECIES");
  });

  it("caps points and series (TOO_LARGE) and names the bad place of hostile input", () => {
    const big = caught(() => cpChart("N2(g)", { points: 1e308 }));
    expect([big.code, big.details["path"], big.details["limit"]]).toEqual(["TOO_LARGE", "options.points", MAX_CHART_POINTS]);
    expect(cpChart("N2(g)", { points: MAX_CHART_POINTS }).data.values.length).toBe(MAX_CHART_POINTS);
    expect(caught(() => cpChart(new Array(MAX_CHART_SERIES + 1).fill("N2(g)"))).code).toBe("TOO_LARGE");
    const np = caught(() => enthalpyChart("N2(g)", { TminK: Object.create(null) as number }));
    expect([np.code, np.details["path"]]).toEqual(["INVALID_ARGUMENT", "options.TminK"]);
    expect(caught(() => cpChart(["N2(g)", null as never])).details["path"]).toBe("input[1]");
    expect(caught(() => cpChart(12 as never)).details["path"]).toBe("input");
    expect(caught(() => cpChart("N2(g)", null as never)).details["path"]).toBe("options");
    expect(caught(() => enthalpyChart("N2(g)", null as never)).details["path"]).toBe("options");
    expect(cpChart(species("N2(g)"), { points: 2 }).data.values.length).toBe(2);
  });
});

describe("enthalpyChart(species, options)", () => {
  it("doc example: sensible enthalpy of N2 at 1000 K is 21.46 kJ/mol", () => {
    const chart = enthalpyChart("N2(g)", { TminK: 298.15, TmaxK: 1000, points: 2 });
    expect(chart.data.values[0]!.value).toBe(0);
    expect(chart.data.values[1]!.value as number).toBeCloseTo(21.46, 2); // NIST-JANAF 4th ed. 1998, H°−H°298(N2, 1000 K) = 21.463 kJ/mol
  });

  it("absolute: true draws H°(T) with the formation enthalpy", () => {
    const chart = enthalpyChart("CO2(g)", { TminK: 298.15, TmaxK: 1000, points: 2, absolute: true });
    expect(chart.data.values[0]!.value).toBeCloseTo(-393.522, 3); // NIST-JANAF 4th ed. 1998, ΔfH°(CO2, g) = −393.522 kJ/mol
    expect(chart.encoding.y.title).toBe("H° (kJ/mol)");
  });
});

describe("efficiencyChart(curve)", () => {
  const CURVE = efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15 }, { parameter: "flueT", values: [400, 450, 500] });
  it("draws the curve's own efficiencies in % on both bases against flue temperature (the @example)", () => {
    const c = efficiencyChart(CURVE);
    expect(c.encoding.x.title).toBe("flue-gas temperature (K)");
    const lhv = c.data.values.filter((v) => v.basis === "LHV").map((v) => v.efficiency);
    expect(lhv).toEqual(CURVE.efficiencyLHV.map((e) => e * 100));
    expect(c.data.values.filter((v) => v.basis === "HHV")).toHaveLength(3);
    expect(Object.keys(mimeBundle(c))).toContain("application/vnd.vegalite.v5+json");
  });
  it("excess air in %; a value that is not a curve is INVALID_ARGUMENT", () => {
    const ea = efficiencyCurve({ fuel: "CH4(g)", flueT: 450 }, { parameter: "excessAir", values: [0.1, 0.2] });
    expect(efficiencyChart(ea).data.values.map((v) => v.x).slice(0, 2)).toEqual([10, 20]);
    expect(caught(() => efficiencyChart({ ...CURVE, parameter: "T" } as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => efficiencyChart({ ...CURVE, efficiencyHHV: [1] } as never)).details).toMatchObject({ path: "curve.efficiencyHHV" });
  });
});

describe("flameChart(sweep) and compositionChart(sweep)", () => {
  it("doc examples", () => {
    expect(flameChart(SWEEP).encoding.x.title).toBe("equivalence ratio φ (–)");
    expect(compositionChart(SWEEP, { species: ["CO2(g)", "H2O(g)"] }).data.values.length).toBe(4);
  });

  it("uses the sweep's own temperatures", () => {
    expect(flameChart(SWEEP).data.values.map((v) => v.T)).toEqual([...SWEEP.T]);
  });

  it("shows excess air in % and pressure in kPa", () => {
    const s = flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "excessAir", values: [0.1, 0.2] });
    const c = flameChart(s);
    expect(c.encoding.x.title).toBe("excess air (%)");
    expect(c.data.values.map((v) => v.x)).toEqual([10, 20]);
  });

  it("draws by default the species that reach 0.1 %, and a log axis on request", () => {
    const c = compositionChart(SWEEP, { logScale: true });
    const drawn = new Set(c.data.values.map((v) => v.species));
    expect(drawn.has("CO2(g)")).toBe(true);
    expect(c.encoding.y.scale).toEqual({ type: "log" });
  });

  it("rejects what is not a sweep, unknown species and a bad threshold", () => {
    expect(caught(() => flameChart({} as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => compositionChart(SWEEP, { species: ["XYZ(g)"] })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => compositionChart(SWEEP, { minFraction: 2 })).code).toBe("INVALID_ARGUMENT");
  });

  it("rejects sweeps with non-finite, missing, holey or mismatched columns, naming the place", () => {
    const path = (f: () => unknown): unknown => caught(f).details["path"];
    expect(path(() => flameChart({ ...SWEEP, parameter: Object.create(null) as never }))).toBe("sweep.parameter");
    expect(path(() => flameChart({ ...SWEEP, parameter: "toString" as never }))).toBe("sweep.parameter");
    expect(path(() => flameChart({ ...SWEEP, values: [0.8, Symbol("x") as never] }))).toBe("sweep.values[1]");
    expect(path(() => flameChart({ ...SWEEP, values: [0.8, 10n ** 30n as never] }))).toBe("sweep.values[1]");
    expect(path(() => flameChart({ ...SWEEP, T: [NaN, 2000] }))).toBe("sweep.T[0]");
    expect(path(() => flameChart({ ...SWEEP, T: [2000] }))).toBe("sweep.T");
    expect(path(() => flameChart({ ...SWEEP, values: [], T: [] }))).toBe("sweep.values");
    expect(path(() => flameChart({ ...SWEEP, values: [0.8, , ] as never }))).toBe("sweep.values[1]");
    expect(caught(() => flameChart({ ...SWEEP, values: new Array(200_000).fill(1) })).code).toBe("TOO_LARGE");
    expect(path(() => flameChart({ ...SWEEP, parameter: "excessAir", values: [1e308, 1] }))).toBe("sweep.values[0]");
    expect(path(() => compositionChart({ ...SWEEP, products: null as never }))).toBe("sweep.products");
    expect(path(() => compositionChart({ ...SWEEP, products: { ...SWEEP.products, "CO2(g)": 1 as never } }))).toBe("sweep.products.CO2(g)");
    expect(path(() => compositionChart({ ...SWEEP, products: { ...SWEEP.products, "CO2(g)": [0.1, Infinity] } }))).toBe("sweep.products.CO2(g)[1]");
    expect(path(() => compositionChart(SWEEP, null as never))).toBe("options");
    expect(path(() => compositionChart(SWEEP, { species: "" as never }))).toBe("options.species");
    expect(path(() => compositionChart(SWEEP, { species: [] }))).toBe("options.species");
    expect(path(() => compositionChart(SWEEP, { species: ["CO2(g)", Symbol("x") as never] }))).toBe("options.species[1]");
    expect(path(() => compositionChart(SWEEP, { species: [Object.create(null) as never] }))).toBe("options.species[0]");
  });
});

describe("dutyChart(duty)", () => {
  const q = heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } });

  it("doc example: the parts in balance order", () => {
    expect(dutyChart(q).data.values.map((v) => v.part)).toEqual(["sensible in", "reaction", "latent", "sensible out", "duty"]);
  });

  it("its parts sum to the duty", () => {
    // an invented pilot-reactor feed preheater with reaction: methane partly burnt (demo scenario)
    const r = heatDuty({
      inlet: { T: 400, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } },
      outlet: { T: 900, flows: { "CH4(g)": 0.5, "O2(g)": 1, "N2(g)": 7.52, "CO2(g)": 0.5, "H2O(g)": 1 } },
    });
    const v = dutyChart(r).data.values;
    const parts = v.filter((x) => x.kind === "part").reduce((s, x) => s + (x.heat as number), 0);
    expect(parts).toBeCloseTo(v.at(-1)!.heat as number, 6);
    expect(v.at(-1)!.heat as number).toBeCloseTo(r.reaction / 1000, 9);
  });

  it("rejects what is not a duty result", () => {
    expect(caught(() => dutyChart({} as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => dutyChart({ ...q, latentHeat: Symbol("x") as never })).details["path"]).toBe("duty.latentHeat");
    expect(caught(() => dutyChart({ ...q, pvTerm: NaN })).details["path"]).toBe("duty.pvTerm");
  });
});
