/**
 * Every kind of result a user looks at displays itself: a Node-style consumer (any kernel or app that takes
 * a MIME bundle) gets text/plain, text/markdown and text/html through the exported JUPYTER_DISPLAY symbol,
 * and the results stay plain data (JSON, deep equality) with nothing enumerable added.
 */
import { describe, expect, it } from "vitest";
import {
  JUPYTER_DISPLAY, RESULT_VIEW, adiabaticFlameTemperature, adiabaticReactionTemperature, adiabaticTemperatureRise,
  balanceReaction, checkBalance, combustion, equilibriumComposition, flameTemperatureSweep, heatDuty,
  limitingReactant, mimeBundle, availableHeat, efficiencyCurve, flueGasDewPoint, hessCombine, reconcileExtents, parseFormula, parseReaction, reactionEnthalpy, show, solveExtents, species,
  toHtml, toMarkdown, toText,
} from "../../src/index.js";
import { caught } from "../_helpers/caught.js";

const GAS = { "CH4(g)": 0.9, "C2H6(g)": 0.06, "N2(g)": 0.04 }; // invented biogas-boiler fuel gas (demo scenario)

const KINDS: Record<string, () => object> = {
  formula: () => parseFormula("CuSO4·5H2O(s)"),
  reaction: () => parseReaction("CH4 + 2 O2 -> CO2 + 2 H2O"),
  balanced: () => balanceReaction("C8H18 + O2 -> CO2 + H2O", { per: "C8H18" }),
  balanceCheck: () => checkBalance("C4H10 + 5 O2 -> 3 CO2 + 4 H2O"),
  extents: () => solveExtents({
    feed: { CH4: 10, H2O: 30, N2: 1 }, reactions: ["CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2"],
    specs: [{ of: "CH4", conversion: 0.8 }, { of: "CO2", outlet: 5 }],
  }),
  limiting: () => limitingReactant({ H2: 3, N2: 2 }, "N2 + 3 H2 -> 2 NH3"),
  combustion: () => combustion({ fuel: GAS, excessAir: 0.15 }),
  species: () => species("CO2(g)"),
  reactionEnthalpy: () => reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"),
  heatDuty: () => heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } }),
  adiabatic: () => adiabaticReactionTemperature({
    inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } }, reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"],
    specs: [{ of: "CH4(g)", conversion: 1 }],
  }),
  adiabaticRise: () => adiabaticTemperatureRise({
    inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } }, reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"],
    specs: [{ of: "CH4(g)", conversion: 1 }],
  }),
  flame: () => adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 1, mode: "complete" }),
  equilibrium: () => equilibriumComposition({ feed: { "CO2(g)": 1 }, T: 3000, P: 101325, species: ["CO2(g)", "CO(g)", "O2(g)", "O(g)"] }),
  sweep: () => flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] }),
  availableHeat: () => availableHeat({ fuel: GAS, excessAir: 0.15, flueT: 450 }),
  efficiencyCurve: () => efficiencyCurve({ fuel: GAS, excessAir: 0.15 }, { parameter: "flueT", values: [400, 450, 500] }),
  dewPoint: () => flueGasDewPoint({ composition: { "H2O(g)": 0.18, "CO2(g)": 0.09, "N2(g)": 0.729, "SO2(g)": 0.001 }, P: 101325 }),
  hess: () => hessCombine("C(cr) + 0.5 O2(g) -> CO(g)", [
    { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: -393510 }, { reaction: "CO(g) + 0.5 O2(g) -> CO2(g)", enthalpy: -282980 },
  ]),
  reconcile: () => reconcileExtents({
    feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 },
  }),
};

describe("display of every result kind", () => {
  for (const [kind, make] of Object.entries(KINDS)) {
    it(`${kind}: result[JUPYTER_DISPLAY]() gives text, Markdown and an HTML table with units in the headers`, () => {
      const r = make() as Record<PropertyKey, unknown>;
      const bundle = (r[JUPYTER_DISPLAY] as () => Record<string, string>).call(r);
      expect(Object.keys(bundle)).toEqual(["text/plain", "text/markdown", "text/html"]);
      expect(bundle["text/html"]).toMatch(/^<div class="rxtherm"><strong>/);
      expect(bundle["text/html"]).toContain('<table class="rxtherm-table">');
      expect(bundle["text/html"]).toMatch(/<th[^>]*>[^<]*\([^)<]+\)<\/th>/); // a header with its unit
      expect(bundle["text/plain"]).not.toContain("Float64Array");
      expect(mimeBundle(r)).toEqual(bundle);
      expect(toText(r)).toBe(bundle["text/plain"]);
      expect(toMarkdown(r)).toBe(bundle["text/markdown"]);
      expect(toHtml(r)).toBe(bundle["text/html"]);
    });

    it(`${kind}: the display methods are invisible to JSON, keys and deep equality`, () => {
      const r = make() as Record<PropertyKey, unknown>;
      expect(Object.keys(r)).not.toContain(String(JUPYTER_DISPLAY));
      expect(Object.getOwnPropertySymbols(r).every((s) => !Object.getOwnPropertyDescriptor(r, s)?.enumerable)).toBe(true);
      if (kind !== "species") {
        const copy = JSON.parse(JSON.stringify(r, (_k, v) => (typeof v === "bigint" ? String(v) : v))) as unknown;
        expect(copy).toEqual(JSON.parse(JSON.stringify(make(), (_k, v) => (typeof v === "bigint" ? String(v) : v))));
        expect(make()).toEqual(r);
      }
      expect(typeof (r[RESULT_VIEW] as () => unknown).call(r)).toBe("object");
    });
  }

  it("the fired-equipment, Hess and reconciliation tables show the numbers of the results", () => {
    const a = availableHeat({ fuel: GAS, excessAir: 0.15, flueT: 450 });
    const text = toText(a);
    // the efficiency row shows the result's own value, in %
    expect(text).toContain((a.efficiencyLHV * 100).toPrecision(4));
    expect(text).toContain("flue gas");
    const h = toText(hessCombine("C(cr) + 0.5 O2(g) -> CO(g)", [
      { reaction: "C(cr) + O2(g) -> CO2(g)", enthalpy: -393510 }, { reaction: "CO(g) + 0.5 O2(g) -> CO2(g)", enthalpy: -282980 },
    ]));
    // CODATA Key Values 1989: ΔfH°(CO2, g) −393.51, ΔfH°(CO, g) −110.53 kJ/mol, so the CO combustion is −282.98
    expect(h).toContain("-110.53");
    expect(h).toContain("CO(g) + 1/2 O2(g) -> CO2(g)");
    const r = toText(reconcileExtents({ feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 } }));
    expect(r).toContain("102"); // C closure: (3 + 7.2) / 10 (invented plant data of the reconcileExtents example)
    expect(r).toContain("not measured (taken at their reconciled flow): H2O");
  });

  it("a result computed inside every data range shows no extrapolation note; an extrapolated one names species, T and range", () => {
    for (const kind of ["flame", "equilibrium", "reactionEnthalpy", "heatDuty", "adiabatic", "availableHeat", "efficiencyCurve"]) {
      expect(toText((KINDS[kind] as () => object)())).not.toContain("extrapolated");
    }
    const r = reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)", { T: 250, extrapolate: true });
    expect(r.extrapolated.length).toBeGreaterThan(0);
    // NIST WebBook Shomate CH4(g): 298–6000 K, so 250 K is outside
    expect(toText(r)).toContain("CH4(g) at 250 K (data 298–6000 K)");
  });

  it("a formula stays deep-equal (and strict-equal) to a plain record", () => {
    expect(parseFormula("H2O(g)")).toStrictEqual({ text: "H2O(g)", elements: { H: 2, O: 1 }, charge: 0, phase: "g" });
  });

  it("species(\"CO2(g)\") shows a readable table: ΔfH°298 −393.522 kJ/mol", () => {
    const text = toText(species("CO2(g)"));
    expect(text.split("\n")[0]).toBe("species CO2(g) (carbon dioxide)");
    expect(text).toContain("-393.522"); // NIST-JANAF 4th ed. 1998, ΔfH°(CO2, g, 298.15 K) = −393.522 kJ/mol
    expect(text).toContain("ΔfH°298 (kJ/mol)");
  });

  it("the formula view gives the molar mass of CuSO4·5H2O, 249.677 g/mol", () => {
    expect(toText(parseFormula("CuSO4·5H2O"))).toContain("249.677"); // IUPAC 2013 standard atomic weights (CIAAW 2017), the same sum as molarMass
  });

  it("the heat-duty view shows the breakdown, and 5.91 kJ for N2 from 298.15 to 500 K", () => {
    const md = toMarkdown(KINDS.heatDuty!());
    expect(md).toContain("| sensible out (heat the products from 298.15 K) | 5.91073 |"); // NIST-JANAF H°−H°298(N2, 500 K) = 5.911 kJ/mol
    expect(md).toContain("| duty | 5.91073 |");
  });

  it("flame and combustion views carry the safety caution", () => {
    expect(toText(KINDS.flame!())).toContain("licensed engineering practice");
    expect(toText(KINDS.combustion!())).toContain("licensed engineering practice");
    expect(toText(KINDS.adiabaticRise!())).toContain("ΔT_ad (K)");
  });
});

describe("show(value)", () => {
  it("show(stream) gives the doc example title and all forms", () => {
    const d = show({ T: 500, flows: { "N2(g)": 3.76, "O2(g)": 1 } });
    expect(d.view.title).toBe("stream at 500 K"); // @example of show
    expect(String(d).split("\n")[0]).toBe("stream at 500 K");
    expect(d.toMarkdown()).toContain("| N2(g) | 3.76 |");
    expect(d.toHtml()).toContain("amount (mol or mol/s)");
    expect(Object.keys(d[JUPYTER_DISPLAY]())).toEqual(["text/plain", "text/markdown", "text/html"]);
  });

  it("show(result) uses the result's own view", () => {
    const r = KINDS.combustion!();
    expect(show(r).view.title).toBe("combustion air and flue gas");
  });

  it("doc examples of mimeBundle, toText, toMarkdown and toHtml", () => {
    expect(Object.keys(mimeBundle(species("CO2(g)")))).toEqual(["text/plain", "text/markdown", "text/html"]);
    expect(toText(parseFormula("H2O")).split("\n")[0]).toBe("formula H2O");
    expect(toMarkdown({ "CH4(g)": 1, "O2(g)": 2 }).split("\n")[2]).toBe("| species | amount (mol or mol/s) |");
    expect(toHtml(species("N2(g)")).startsWith('<div class="rxtherm">')).toBe(true);
  });

  it("rejects values it cannot display with INVALID_ARGUMENT naming the function", () => {
    for (const bad of [null, 3, "CO2", [], {}, { a: "x" }]) {
      const e = caught(() => show(bad));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.message).toContain("show requires");
    }
    expect(caught(() => toHtml(undefined)).message).toContain("toHtml requires");
  });

  it("does not mutate its input", () => {
    const flows = Object.freeze({ "N2(g)": 1 });
    expect(() => show(flows).toString()).not.toThrow();
    const r = Object.freeze(KINDS.flame!());
    expect(() => toHtml(r)).not.toThrow();
  });
});
