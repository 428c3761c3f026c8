/**
 * Every result of the public API survives JSON.stringify (a result with a bare BigInt makes it throw).
 * One call per exported function: a new export without an entry here fails the first test.
 * Exact fractions are written as their text ("25/2"); the integer helpers whose job is to return
 * BigInts are written with the documented jsonReplacer.
 */
import { describe, expect, it } from "vitest";
import * as rx from "../src/index.js";

const N2_SHOMATE = [
  { TminK: 100, TmaxK: 500, cp: { form: "shomate", A: 28.98641, B: 1.853978, C: -9.647459, D: 16.63537, E: 0.000117, F: -8.671914, G: 226.4168, H: 0 } },
  { TminK: 500, TmaxK: 2000, cp: { form: "shomate", A: 19.50583, B: 19.88705, C: -8.598535, D: 1.369784, E: 0.527601, F: -4.935202, G: 212.39, H: 0 } },
] as const;
const WGS = "CO(g) + H2O(g) -> CO2(g) + H2(g)";
const INLET = { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2.4, "N2(g)": 9 } };
const DEMO_DATA = {
  sources: { demo: "Pilot methanol plant lab notebook (invented demo scenario)" },
  species: [{
    key: "C9H20(l)", formula: "C9H20", phase: "l", name: "demo nonane", hf298KJPerMol: -275, hf298Source: "demo",
    s298JPerMolK: 394, s298Source: "demo",
    heatCapacity: { source: "demo", ranges: [{ TminK: 250, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 284 } }] },
  }],
};

/** Functions whose documented result is a bare BigInt (or BigInt arrays): JSON-safe through jsonReplacer. */
const BIGINT_RESULTS = new Set(["gcdBigInt", "lcmBigInt", "scaleToCoprimeIntegers", "divideByGcd", "integerNullSpace"]);

const CALLS: Record<string, () => unknown> = {
  RxthermError: () => new rx.RxthermError("INVALID_ARGUMENT", "demo", { T: 5 }),
  isRxthermError: () => rx.isRxthermError(new Error("x")),
  toKelvin: () => rx.toKelvin(25, "C"),
  fromKelvin: () => rx.fromKelvin(300, "F"),
  toPascal: () => rx.toPascal(2, "bar"),
  fromPascal: () => rx.fromPascal(2e5, "psi"),
  toJoule: () => rx.toJoule(1, "Btu"),
  fromJoule: () => rx.fromJoule(4184, "kcal"),
  toMol: () => rx.toMol(1, "kmol"),
  toWatt: () => rx.toWatt(1, "MW"),
  fromWatt: () => rx.fromWatt(1e6, "Btu/h"),
  toMolPerSecond: () => rx.toMolPerSecond({ value: 100, unit: "kg/h", molarMassGPerMol: 44.01 }),
  fromMolPerSecond: () => rx.fromMolPerSecond(1, "lbmol/h"),
  fromJoulePerMol: () => rx.fromJoulePerMol(-890310.1, "Btu/lb", { molarMassGPerMol: 16.043 }),
  jsonReplacer: () => rx.jsonReplacer("k", 12n),
  celsiusSlipHint: () => rx.celsiusSlipHint(25),
  rational: () => rx.rational(25, 2),
  rationalFrom: () => rx.rationalFrom("13/2"),
  rationalFromInteger: () => rx.rationalFromInteger(7n),
  rationalFromDecimalString: () => rx.rationalFromDecimalString("0.947"),
  rationalFromNumber: () => rx.rationalFromNumber(0.1),
  rationalAdd: () => rx.rationalAdd(rx.rational(1, 3), rx.rational(1, 6)),
  rationalSub: () => rx.rationalSub(rx.rational(1, 2), rx.rational(1, 3)),
  rationalMul: () => rx.rationalMul(rx.rational(2, 3), rx.rational(3, 4)),
  rationalDiv: () => rx.rationalDiv(rx.rational(1, 2), rx.rational(3, 1)),
  rationalNeg: () => rx.rationalNeg(rx.rational(1, 2)),
  rationalCompare: () => rx.rationalCompare(rx.rational(1, 2), rx.rational(1, 3)),
  rationalIsZero: () => rx.rationalIsZero(rx.rational(0)),
  rationalToNumber: () => rx.rationalToNumber(rx.rational(13, 2)),
  rationalToString: () => rx.rationalToString(rx.rational(13, 2)),
  gcdBigInt: () => rx.gcdBigInt(12n, 18n),
  lcmBigInt: () => rx.lcmBigInt(4n, 6n),
  scaleToCoprimeIntegers: () => rx.scaleToCoprimeIntegers(["1", "25/2", "8", "9"]),
  divideByGcd: () => rx.divideByGcd([4n, 6n]),
  reducedRowEchelon: () => rx.reducedRowEchelon([[1, 2, 3], [2, 4, 7]]),
  matrixRank: () => rx.matrixRank([[1, 2], [2, 4]]),
  nullSpace: () => rx.nullSpace([[1, 1, -1]]),
  integerNullSpace: () => rx.integerNullSpace([[1, 1, -1]]),
  solveLinearSystem: () => rx.solveLinearSystem([[1, 1], [1, -1]], [3, 1]),
  findRoot: () => rx.findRoot((x) => x * x - 2, [0, 2]),
  parseFormula: () => rx.parseFormula("CuSO4·5H2O"),
  safeParseFormula: () => rx.safeParseFormula("Ca(OH"),
  formatFormula: () => rx.formatFormula(rx.parseFormula("C2H5OH")),
  molarMass: () => rx.molarMass("CaCO3"),
  elementMassFractions: () => rx.elementMassFractions("H2O"),
  elementData: () => rx.elementData("Fe"),
  parseReaction: () => rx.parseReaction("CH4 + 2 O2 -> CO2 + 2 H2O"),
  balanceReaction: () => rx.balanceReaction("C8H18 + O2 -> CO2 + H2O", { per: "C8H18" }),
  checkBalance: () => rx.checkBalance("C4H10 + 5 O2 -> 3 CO2 + 4 H2O"),
  independentReactions: () => rx.independentReactions(["CO", "H2", "H2O", "CO2", "CH4"]),
  formatReaction: () => rx.formatReaction(rx.parseReaction("2 H2 + O2 -> 2 H2O")),
  scaleReaction: () => rx.scaleReaction(rx.parseReaction("2 H2 + O2 -> 2 H2O"), "1/2"),
  reverseReaction: () => rx.reverseReaction(rx.parseReaction("2 H2 + O2 -> 2 H2O")),
  solveExtents: () => rx.solveExtents({ feed: { CH4: 10, H2O: 30 }, reactions: ["CH4 + H2O -> CO + 3 H2"], specs: [{ of: "CH4", conversion: 0.8 }] }),
  limitingReactant: () => rx.limitingReactant({ CH4: 1, O2: 3 }, "CH4 + 2 O2 -> CO2 + 2 H2O"),
  reconcileExtents: () => rx.reconcileExtents({ feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 } }),
  massToMolarFlows: () => rx.massToMolarFlows({ "H2O(g)": 18.015 }, { massUnit: "g" }),
  molarToMassFlows: () => rx.molarToMassFlows({ "H2O(g)": 1 }),
  moleFractions: () => rx.moleFractions({ N2: 1, O2: 3 }),
  massFractions: () => rx.massFractions({ "CH4(g)": 1, "N2(g)": 1 }),
  totalFlow: () => rx.totalFlow({ A: 1, B: 3 }),
  totalMassFlow: () => rx.totalMassFlow({ "CH4(g)": 1 }),
  combustion: () => rx.combustion({ fuel: { "CH4(g)": 1 }, excessAir: 0.15 }),
  excessAirFromFlueO2: () => rx.excessAirFromFlueO2({ fuel: { "CH4(g)": 1 }, dryO2: 0.03 }),
  excessAirFromFlueCO2: () => rx.excessAirFromFlueCO2({ fuel: { "CH4(g)": 1 }, oxidizer: rx.AIR_21_79, dryCO2: 0.1 }),
  waterSaturationPressure: () => rx.waterSaturationPressure(300),
  waterSaturationTemperature: () => rx.waterSaturationTemperature(101325),
  checkMixtureLimits: () => rx.checkMixtureLimits("combustion", { excessAir: 0.15 }, false),
  createHeatCapacity: () => rx.createHeatCapacity(N2_SHOMATE as never, { label: "N2(g)" }),
  boundaryJumps: () => rx.boundaryJumps(rx.createHeatCapacity(N2_SHOMATE as never)),
  fitCp: () => rx.fitCp([{ T: 300, cp: 29.1 }, { T: 500, cp: 29.6 }, { T: 800, cp: 30.9 }, { T: 1000, cp: 31.8 }], "polynomial", { degree: 1 }),
  species: () => rx.species("CO2(g)"),
  findSpecies: () => rx.findSpecies("C4H10"),
  noteExtrapolation: () => rx.noteExtrapolation([], [rx.species("CaCO3(cr)"), rx.species("CaO(cr)")], 1150),
  createLibrary: () => rx.createLibrary(DEMO_DATA),
  builtInLibrary: () => rx.builtInLibrary(),
  validateSpeciesData: () => rx.validateSpeciesData(DEMO_DATA),
  speciesDataJsonSchema: () => rx.speciesDataJsonSchema(),
  citation: () => rx.citation("nist-janaf-1998"),
  reactionEnthalpy: () => rx.reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"),
  reactionEntropy: () => rx.reactionEntropy("H2(g) + 0.5 O2(g) -> H2O(g)"),
  reactionGibbs: () => rx.reactionGibbs("H2(g) + 0.5 O2(g) -> H2O(g)"),
  equilibriumConstant: () => rx.equilibriumConstant(WGS, 1000),
  hessCombine: () => rx.hessCombine("C(gr) + 1/2 O2(g) -> CO(g)", [
    { reaction: "C(gr) + O2(g) -> CO2(g)", enthalpy: -393509 }, { reaction: "CO(g) + 1/2 O2(g) -> CO2(g)", enthalpy: -282984 },
  ]),
  reactionEnthalpyFromCombustion: () => rx.reactionEnthalpyFromCombustion("C2H4(g) + H2(g) -> C2H6(g)", {
    "C2H4(g)": -1411200, "H2(g)": -285830, "C2H6(g)": -1560700,
  }),
  formationEnthalpyFromCombustion: () => rx.formationEnthalpyFromCombustion("CH4(g)", -890310.1),
  heatingValue: () => rx.heatingValue("CH4(g)"),
  wobbeIndex: () => rx.wobbeIndex("CH4(g)"),
  heatDuty: () => rx.heatDuty({
    inlet: INLET, outlet: { T: 800, flows: { "CH4(g)": 0.1, "O2(g)": 0.6, "N2(g)": 9, "CO2(g)": 0.9, "H2O(g)": 1.8 } },
  }),
  adiabaticReactionTemperature: () => rx.adiabaticReactionTemperature({
    inlet: INLET, reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"], specs: [{ of: "CH4(g)", conversion: 0.9 }],
  }),
  adiabaticTemperatureRise: () => rx.adiabaticTemperatureRise({
    inlet: { T: 298.15, flows: { "H2(g)": 0.02, "O2(g)": 0.01, "N2(g)": 0.97 } },
    reactions: ["2 H2(g) + O2(g) -> 2 H2O(g)"], specs: [{ of: "H2(g)", conversion: 1 }],
  }),
  availableHeat: () => rx.availableHeat({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 }),
  efficiencyCurve: () => rx.efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 }, { parameter: "flueT", values: [400, 450, 500] }),
  flueGasDewPoint: () => rx.flueGasDewPoint({ composition: { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 }, P: 101325 }),
  equilibriumComposition: () => rx.equilibriumComposition({ feed: { "CO(g)": 1, "H2O(g)": 2 }, species: ["CO(g)", "H2O(g)", "CO2(g)", "H2(g)"], T: 700, P: 2e6 }),
  adiabaticFlameTemperature: () => rx.adiabaticFlameTemperature({ fuel: "CH4(g)", excessAir: 0.1 }),
  flameTemperatureSweep: () => rx.flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [0.9, 1] }),
  show: () => rx.show({ T: 500, flows: { "N2(g)": 3.76, "O2(g)": 1 } }),
  mimeBundle: () => rx.mimeBundle(rx.species("CO2(g)")),
  toText: () => rx.toText(rx.parseFormula("H2O")),
  toMarkdown: () => rx.toMarkdown({ "CH4(g)": 1, "O2(g)": 2 }),
  toHtml: () => rx.toHtml(rx.species("N2(g)")),
  cpChart: () => rx.cpChart(["N2(g)", "CO2(g)"], { TminK: 300, TmaxK: 1500, points: 25 }),
  enthalpyChart: () => rx.enthalpyChart("N2(g)", { TminK: 298.15, TmaxK: 1000, points: 2 }),
  flameChart: () => rx.flameChart(rx.flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] })),
  compositionChart: () => rx.compositionChart(
    rx.flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] }), { species: ["CO2(g)", "H2O(g)"] },
  ),
  efficiencyChart: () => rx.efficiencyChart(rx.efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15 }, { parameter: "flueT", values: [400, 500] })),
  dutyChart: () => rx.dutyChart(rx.heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } })),
};

describe("JSON-safe results", () => {
  const exported = Object.entries(rx).filter(([, v]) => typeof v === "function").map(([k]) => k).sort();

  it("has one call for every exported function (add one for a new export)", () => {
    expect(Object.keys(CALLS).sort()).toEqual(exported);
  });

  for (const name of Object.keys(CALLS).sort()) {
    it(`JSON.stringify(${name}(...)) works${BIGINT_RESULTS.has(name) ? " with jsonReplacer" : ""}`, () => {
      const result = CALLS[name]!();
      if (BIGINT_RESULTS.has(name)) {
        expect(() => JSON.stringify(result)).toThrow(TypeError); // a bare BigInt, by design
        expect(() => JSON.parse(JSON.stringify(result, rx.jsonReplacer))).not.toThrow();
      } else {
        expect(() => JSON.parse(JSON.stringify(result) ?? "null")).not.toThrow();
      }
    });
  }

  it("exact fractions are written as their text", () => {
    expect(JSON.stringify(rx.rational(25, 2))).toBe('"25/2"');
    expect(JSON.stringify({ x: rx.rationalFrom(-3n) })).toBe('{"x":"-3"}');
    expect(JSON.stringify(rx.nullSpace([[2, 1, -1]]))).toBe('[["-1/2","1","0"],["1/2","0","1"]]');
    expect(JSON.parse(JSON.stringify(rx.solveLinearSystem([[3, 0], [0, 7]], [1, 2])))).toMatchObject({ kind: "unique", solution: ["1/3", "2/7"] });
  });

  it("the text form leaves the fields as they are (num and den stay enumerable BigInts)", () => {
    const r = rx.rational(6, 4);
    expect(Object.keys(r)).toEqual(["num", "den"]);
    expect(r).toEqual({ num: 3n, den: 2n });
    expect(Object.isFrozen(r)).toBe(true);
  });

  it("the jsonReplacer @example", () => {
    expect(JSON.stringify({ coefficients: rx.scaleToCoprimeIntegers(["1", "25/2"]) }, rx.jsonReplacer)).toBe('{"coefficients":["2","25"]}');
  });
});
