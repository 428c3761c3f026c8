/**
 * Every public function of src/index.ts with one valid call (built afresh on each use), for the
 * hostile-input suite. Demo inputs are invented scenarios or the functions' own documented examples.
 */
import * as rx from "../../src/index.js";

/** A public function and a factory for valid arguments. `slow` entries get fewer runs. */
export interface EntryPoint {
  readonly name: string;
  readonly args: () => unknown[];
  readonly call: (args: unknown[]) => unknown;
  readonly slow?: boolean;
}

type AnyFn = (...a: unknown[]) => unknown;
const api = rx as unknown as Record<string, AnyFn>;

function e(name: string, args: () => unknown[], slow = false): EntryPoint {
  const fn = api[name];
  if (typeof fn !== "function") throw new Error(`no public function ${name}`);
  return { name, args, call: (a) => fn(...a), slow };
}

const O2_SHOMATE = () => [
  { TminK: 100, TmaxK: 700, cp: { form: "shomate", A: 31.32234, B: -20.23531, C: 57.86644, D: -36.50624, E: -0.007374, F: -8.903471, G: 246.7945 } },
  { TminK: 700, TmaxK: 2000, cp: { form: "shomate", A: 30.03235, B: 8.772972, C: -3.988133, D: 0.788313, E: -0.741599, F: -11.32468, G: 236.1663 } },
];
const DEMO_LIBRARY_DATA = () => ({
  sources: { pilot: "Pilot methanol reactor data sheet (invented demo scenario)" },
  species: [{
    key: "C5H8O2(l)", formula: "C5H8O2", phase: "l", name: "demo solvent",
    hf298KJPerMol: -390, hf298Source: "pilot", s298JPerMolK: 230, s298Source: "pilot",
    heatCapacity: { source: "pilot", ranges: [{ TminK: 280, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 180 } }] },
  }],
});
const METHANE = "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)";

/** Every public function; the suite checks that this list covers src/index.ts. */
export const ENTRY_POINTS: readonly EntryPoint[] = [
  // errors, units
  e("isRxthermError", () => [new rx.RxthermError("OUT_OF_RANGE", "x"), "OUT_OF_RANGE"]),
  e("toKelvin", () => [25, "C"]),
  e("fromKelvin", () => [373.15, "C"]),
  e("toPascal", () => [1, "atm"]),
  e("toJoule", () => [1, "kcal"]),
  e("toMol", () => [1, "lbmol"]),
  e("fromPascal", () => [250000, "bar"]),
  e("fromJoule", () => [1055.05585262, "Btu"]),
  e("toWatt", () => [1, "MMBtu/h"]),
  e("fromWatt", () => [-521756.75, "kW"]),
  e("toMolPerSecond", () => [{ value: 57.753, unit: "kg/h", molarMassGPerMol: 16.0425 }]),
  e("fromMolPerSecond", () => [1, "kg/h", { molarMassGPerMol: 16.0425 }]),
  e("fromJoulePerMol", () => [890310.1, "MJ/kg", { molarMassGPerMol: 16.0425 }]),
  e("celsiusSlipHint", () => [25]),
  // numeric
  e("rational", () => [6n, -4n]),
  e("rationalFrom", () => [{ num: 25, den: 2 }]),
  e("rationalFromInteger", () => [7]),
  e("rationalFromDecimalString", () => ["6.5"]),
  e("rationalFromNumber", () => [0.947]),
  e("rationalAdd", () => [rx.rational(1n, 3n), rx.rational(1n, 6n)]),
  e("rationalSub", () => [rx.rational(1n, 2n), rx.rational(1n, 3n)]),
  e("rationalMul", () => [rx.rational(2n, 3n), rx.rational(9n, 4n)]),
  e("rationalDiv", () => [rx.rational(3n), rx.rational(4n)]),
  e("rationalNeg", () => [rx.rational(13n, 2n)]),
  e("rationalCompare", () => [rx.rational(1n, 3n), rx.rational(1n, 2n)]),
  e("rationalIsZero", () => [rx.rational(0n)]),
  e("rationalToNumber", () => [rx.rational(13n, 2n)]),
  e("rationalToString", () => [rx.rational(-26n, 4n)]),
  e("gcdBigInt", () => [12n, -18n]),
  e("lcmBigInt", () => [4n, 6n]),
  e("scaleToCoprimeIntegers", () => [["1", "25/2", "8", "9"]]),
  e("divideByGcd", () => [[4n, -6n, 8n]]),
  e("reducedRowEchelon", () => [[[1, 2, 3], [2, 4, 7]]]),
  e("matrixRank", () => [[[1, 0, 1], [0, 1, 1], [1, 1, 2]]]),
  e("nullSpace", () => [[[2, 0, 2], [0, 2, 1]]]),
  e("integerNullSpace", () => [[[2, 0, 2], [0, 2, 1]]]),
  e("solveLinearSystem", () => [[[1, 1], [1, -1]], [3, { num: 1, den: 1 }]]),
  e("findRoot", () => [(x: number) => x * x - 2, [0, 2], { toleranceX: 1e-12 }]),
  e("jsonReplacer", () => ["coefficients", 12n]),
  // formula
  e("parseFormula", () => ["CuSO4·5H2O"]),
  e("safeParseFormula", () => ["Ca(OH"]),
  e("formatFormula", () => [rx.parseFormula("CH3COOH"), { order: "hill" }]),
  e("molarMass", () => [{ elements: { H: 2, O: 1 }, charge: 0 }, {}]),
  e("elementMassFractions", () => ["H2O"]),
  e("elementData", () => ["Fe"]),
  // reaction
  e("parseReaction", () => ["C3H8 + 5 O2 -> 3 CO2 + 4 H2O"]),
  e("balanceReaction", () => ["C8H18 + O2 -> CO2 + H2O", { fixed: { O2: { num: 25, den: 2 } } }]),
  e("checkBalance", () => ["C3H8 + 5 O2 -> 3 CO2 + 4 H2O"]),
  e("independentReactions", () => [["CO", "H2", "H2O", "CO2", "CH4"]]),
  e("formatReaction", () => [rx.parseReaction("C2H6 + 3.5 O2 -> 2 CO2 + 3 H2O"), {}]),
  e("scaleReaction", () => [rx.parseReaction("2 H2 + O2 -> 2 H2O"), { num: 1, den: 2 }]),
  e("reverseReaction", () => [rx.parseReaction("N2 + 3 H2 -> 2 NH3")]),
  // extent and combustion
  e("solveExtents", () => [{ feed: { CH4: 1, O2: 2.4, N2: 9 }, reactions: ["CH4 + 2 O2 -> CO2 + 2 H2O"], specs: [{ of: "CH4", conversion: 0.9 }] }, {}]),
  e("limitingReactant", () => [{ CH4: 1, O2: 2.4 }, "CH4 + 2 O2 -> CO2 + 2 H2O"]),
  e("reconcileExtents", () => [{ feed: { CO: 10, H2O: 15, CO2: 0, H2: 0 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 3, CO2: 7.2, H2: 6.8 } }, {}]),
  e("massToMolarFlows", () => [{ "H2O(g)": 18.015 }, { massUnit: "g" }]),
  e("molarToMassFlows", () => [{ CH4: 1000 }, {}]),
  e("moleFractions", () => [{ N2: 3, O2: 1 }]),
  e("massFractions", () => [{ CH4: 1, CO2: 1 }]),
  e("totalFlow", () => [{ N2: 3, O2: 1 }]),
  e("totalMassFlow", () => [{ H2: 1, O2: 0.5 }, { massUnit: "g" }]),
  e("combustion", () => [{ fuel: { "CH4(g)": 1 }, oxidizer: { "N2(g)": 0.79, "O2(g)": 0.21 }, excessAir: 0.1 }]),
  e("excessAirFromFlueO2", () => [{ fuel: { C: 1 }, dryO2: 0.03 }]),
  e("excessAirFromFlueCO2", () => [{ fuel: { "CH4(g)": 1 }, oxidizer: { "N2(g)": 0.79, "O2(g)": 0.21 }, dryCO2: 0.1 }]),
  e("waterSaturationPressure", () => [300]),
  e("waterSaturationTemperature", () => [101325]),
  e("checkMixtureLimits", () => ["combustion", { excessAir: 0.15 }, false]),
  // heat capacity
  e("createHeatCapacity", () => [O2_SHOMATE(), { label: "O2(g)" }]),
  e("boundaryJumps", () => [rx.createHeatCapacity(O2_SHOMATE() as never)]),
  e("fitCp", () => [[{ T: 298.15, cp: 29.376 }, { T: 500, cp: 31.091 }, { T: 1000, cp: 34.87 }, { T: 1500, cp: 36.544 }, { T: 2000, cp: 37.741 }], "shomate", {}]),
  // species and library
  e("species", () => ["CH4(g)", rx.builtInLibrary()]),
  e("findSpecies", () => [{ formula: "OH2", phase: "l" }, rx.builtInLibrary()]),
  // noteExtrapolation appends to the list it is given (documented): a valid but out-of-range T (12 K,
  // 1e308 K) must append. So the call hands it a fresh copy of the list argument, built inside the call;
  // the list's hostile values (non-arrays, holes, huge arrays) still reach the function unchanged.
  {
    name: "noteExtrapolation",
    args: () => [[{ species: "CaCO3(cr)", T: 1150, range: [298, 775] }], [rx.species("CaCO3(cr)"), rx.species("CaO(cr)")], 500],
    call: (a) => rx.noteExtrapolation((Array.isArray(a[0]) ? a[0].slice() : a[0]) as rx.ExtrapolatedPoint[], a[1] as rx.Species[], a[2] as number),
  },
  e("createLibrary", () => [DEMO_LIBRARY_DATA(), {}]),
  e("builtInLibrary", () => []),
  e("validateSpeciesData", () => [DEMO_LIBRARY_DATA(), {}]),
  e("speciesDataJsonSchema", () => []),
  e("citation", () => ["codata-1989"]),
  // enthalpy
  e("reactionEnthalpy", () => [METHANE, { T: 1000 }]),
  e("reactionEntropy", () => ["H2(g) + 0.5 O2(g) -> H2O(g)", { T: 500 }]),
  e("reactionGibbs", () => ["H2(g) + 0.5 O2(g) -> H2O(g)", { T: 500 }]),
  e("equilibriumConstant", () => ["CO(g) + H2O(g) -> CO2(g) + H2(g)", 1000, {}]),
  e("hessCombine", () => ["C(gr) + 0.5 O2(g) -> CO(g)", [
    { reaction: "C(gr) + O2(g) -> CO2(g)", enthalpy: -393510 }, { reaction: "CO(g) + 0.5 O2(g) -> CO2(g)", enthalpy: -282980 },
  ]]),
  e("reactionEnthalpyFromCombustion", () => ["C2H4(g) + H2(g) -> C2H6(g)", { "C2H4(g)": -1411200, "H2(g)": -285830, "C2H6(g)": -1560700 }]),
  e("formationEnthalpyFromCombustion", () => ["CH4(g)", -890310.1]),
  e("heatingValue", () => [{ "CH4(g)": 0.9, "C2H6(g)": 0.1 }, { basis: "lower", per: "kg" }]),
  e("wobbeIndex", () => ["CH4(g)", {}]),
  // energy
  e("heatDuty", () => [{ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } }, {}]),
  e("adiabaticReactionTemperature", () => [{
    inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } }, reactions: [METHANE], specs: [{ of: "CH4(g)", conversion: 1 }],
  }, {}]),
  e("adiabaticTemperatureRise", () => [{
    inlet: { T: 298.15, flows: { "H2(g)": 0.02, "O2(g)": 0.01, "N2(g)": 0.97 } }, reactions: ["2 H2(g) + O2(g) -> 2 H2O(g)"], specs: [{ of: "H2(g)", conversion: 1 }],
  }, {}]),
  // fired equipment
  e("availableHeat", () => [{ fuel: { "CH4(g)": 0.9, "C2H6(g)": 0.1 }, excessAir: 0.15, airT: 298.15, flueT: 450, coPpm: 50, per: "mol" }]),
  e("efficiencyCurve", () => [{ fuel: "CH4(g)", excessAir: 0.15, flueT: 450 }, { parameter: "flueT", values: [400, 450, 500] }]),
  e("flueGasDewPoint", () => [{ composition: { "H2O(g)": 0.1, "SO3(g)": 1e-5, "N2(g)": 0.89999 }, P: 101325 }]),
  // flame
  e("equilibriumComposition", () => [{ feed: { "H2O(g)": 1 }, species: ["H2O(g)", "H2(g)", "O2(g)", "OH(g)"], T: 3000 }, {}], true),
  e("adiabaticFlameTemperature", () => [{ fuel: "CH4(g)", equivalenceRatio: 0.9, mode: "complete" }, {}], true),
  e("flameTemperatureSweep", () => [{ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] }, {}], true),
  // display
  e("show", () => [{ T: 500, flows: { "N2(g)": 3.76, "O2(g)": 1 } }]),
  e("mimeBundle", () => [rx.species("CO2(g)")]),
  e("toText", () => [rx.parseFormula("H2O")]),
  e("toMarkdown", () => [{ "CH4(g)": 1, "O2(g)": 2 }]),
  e("toHtml", () => [rx.species("N2(g)")]),
  e("cpChart", () => [["N2(g)", "CO2(g)"], { TminK: 300, TmaxK: 1500, points: 25 }]),
  e("enthalpyChart", () => ["N2(g)", { TminK: 298.15, TmaxK: 1000, points: 2 }]),
  e("flameChart", () => [rx.flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] })], true),
  e("compositionChart", () => [
    rx.flameTemperatureSweep({ fuel: "CH4(g)", mode: "complete" }, { parameter: "equivalenceRatio", values: [0.8, 1] }), { species: ["CO2(g)", "H2O(g)"] },
  ], true),
  e("efficiencyChart", () => [rx.efficiencyCurve({ fuel: "CH4(g)", excessAir: 0.15 }, { parameter: "flueT", values: [400, 500] })], true),
  e("dutyChart", () => [rx.heatDuty({ inlet: { T: 298.15, flows: { "N2(g)": 1 } }, outlet: { T: 500, flows: { "N2(g)": 1 } } })]),
];
