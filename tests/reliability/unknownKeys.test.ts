/**
 * A misspelt option or input key is an error naming the key and the nearest known one, never a silently
 * ignored setting (an `excesAir` typo would otherwise give the default's answer).
 */
import { describe, expect, it } from "vitest";
import {
  adiabaticReactionTemperature, adiabaticTemperatureRise, availableHeat, createLibrary, efficiencyCurve, equilibriumConstant,
  flueGasDewPoint, heatDuty, heatingValue, massToMolarFlows, molarToMassFlows, reactionEnthalpy, reactionEntropy, reactionGibbs,
  reconcileExtents, totalMassFlow, validateSpeciesData, wobbeIndex, species, findSpecies, combustion, excessAirFromFlueO2,
  excessAirFromFlueCO2, solveExtents, balanceReaction, adiabaticFlameTemperature, flameTemperatureSweep, equilibriumComposition,
} from "../../src/index.js";
import { caught } from "../_helpers/caught.js";

const N2 = { T: 298.15, flows: { "N2(g)": 1 } };
const ADIABATIC = {
  inlet: { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } }, reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"],
  specs: [{ of: "CH4(g)", conversion: 1 }],
};
const RXN = "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)";

/** [call, misspelt key as written, expected suggestion or null]. */
const CASES: [string, () => unknown, string, string | null][] = [
  ["heatDuty options", () => heatDuty({ inlet: N2, outlet: { ...N2, T: 500 } }, { extrapolte: true } as never), "options.extrapolte", "extrapolate"],
  ["heatDuty input", () => heatDuty({ inlet: N2, outlet: { ...N2, T: 500 }, reaction: [RXN] } as never), "input.reaction", "reactions"],
  ["adiabaticReactionTemperature options", () => adiabaticReactionTemperature(ADIABATIC, { tolerance: 1e-6 } as never), "options.tolerance", "toleranceK"],
  ["adiabaticTemperatureRise input", () => adiabaticTemperatureRise({ ...ADIABATIC, spec: [] } as never), "input.spec", "specs"],
  ["availableHeat input", () => availableHeat({ fuel: "CH4(g)", flueT: 450, excesAir: 0.15 } as never), "input.excesAir", "excessAir"],
  ["efficiencyCurve sweep", () => efficiencyCurve({ fuel: "CH4(g)" }, { parameter: "flueT", value: [400] } as never), "sweep.value", "values"],
  ["flueGasDewPoint input", () => flueGasDewPoint({ composition: { "H2O(g)": 0.1, "N2(g)": 0.9 }, P: 1e5, so3fraction: 0.02 } as never), "input.so3fraction", "so3Fraction"],
  ["reactionEnthalpy options", () => reactionEnthalpy(RXN, { temperature: 500 } as never), "options.temperature", null],
  ["reactionEntropy options", () => reactionEntropy(RXN, { t: 500 } as never), "options.t", "T"],
  ["reactionGibbs options", () => reactionGibbs(RXN, { extrapolat: true } as never), "options.extrapolat", "extrapolate"],
  ["equilibriumConstant options", () => equilibriumConstant(RXN, 1000, { metod: "vant-hoff" } as never), "options.metod", "method"],
  ["heatingValue options", () => heatingValue("CH4(g)", { bases: "lower" } as never), "options.bases", "basis"],
  ["wobbeIndex options", () => wobbeIndex("CH4(g)", { basic: "higher" } as never), "options.basic", "basis"],
  ["reconcileExtents options", () => reconcileExtents({ feed: { CO: 1, H2O: 1 }, reactions: ["CO + H2O -> CO2 + H2"], measured: { CO: 0.5 } }, { weight: {} } as never), "options.weight", "weights"],
  ["massToMolarFlows options", () => massToMolarFlows({ H2O: 18 }, { unit: "kg" } as never), "options.unit", null],
  ["molarToMassFlows options", () => molarToMassFlows({ H2O: 1 }, { massunit: "kg" } as never), "options.massunit", "massUnit"],
  ["totalMassFlow options", () => totalMassFlow({ H2O: 1 }, { massUnits: "kg" } as never), "options.massUnits", "massUnit"],
  ["createLibrary options", () => createLibrary({ sources: {}, species: [] }, { bases: null } as never), "options.bases", "base"],
  ["validateSpeciesData options", () => validateSpeciesData({ sources: {}, species: [] }, { allowBuiltinSources: true } as never), "options.allowBuiltinSources", "allowBuiltInSources"],
  ["combustion input", () => combustion({ fuel: "CH4(g)", excesAir: 0.15 } as never), "input.excesAir", "excessAir"],
  ["excessAirFromFlueO2 input", () => excessAirFromFlueO2({ fuel: "CH4(g)", dryO2: 0.03, excessAir: 0.1 } as never), "input.excessAir", null],
  ["excessAirFromFlueCO2 input", () => excessAirFromFlueCO2({ fuel: "CH4(g)", dryCo2: 0.1 } as never), "input.dryCo2", "dryCO2"],
  ["adiabaticFlameTemperature input", () => adiabaticFlameTemperature({ fuel: "CH4(g)", excesAir: 0.15 } as never), "input.excesAir", "excessAir"],
  ["adiabaticFlameTemperature options", () => adiabaticFlameTemperature({ fuel: "CH4(g)" }, { extrapolat: true } as never), "options.extrapolat", "extrapolate"],
  ["flameTemperatureSweep sweep", () => flameTemperatureSweep({ fuel: "CH4(g)" }, { parameter: "equivalenceRatio", values: [1], step: 1 } as never), "sweep.step", null],
  ["equilibriumComposition input", () => equilibriumComposition({ feed: { "CO2(g)": 1 }, species: ["CO2(g)", "CO(g)", "O2(g)"], T: 3000, p: 1e5 } as never), "input.p", "P"],
  ["equilibriumComposition options", () => equilibriumComposition({ feed: { "CO2(g)": 1 }, species: ["CO2(g)", "CO(g)", "O2(g)"], T: 3000 }, { initialTemperature: 2000 } as never), "options.initialTemperature", null],
  ["solveExtents input", () => solveExtents({ feed: { CO: 1, H2O: 1 }, reactions: ["CO + H2O -> CO2 + H2"], spec: [] } as never), "input.spec", "specs"],
  ["solveExtents options", () => solveExtents({ feed: { CO: 1, H2O: 1 }, reactions: ["CO + H2O -> CO2 + H2"], specs: [{ of: "CO", conversion: 0.5 }] }, { arithmetics: "float" } as never), "options.arithmetics", "arithmetic"],
  ["balanceReaction options", () => balanceReaction("C3H8 + O2 -> CO2 + H2O", { pre: "C3H8" } as never), "options.pre", "per"],
  ["species options", () => species("CH4(g)", undefined, { dataSet: "gri-mech-3.0" } as never), "options.dataSet", "dataset"],
  ["findSpecies query", () => findSpecies({ name: "acetone", phse: "g" } as never), "query.phse", "phase"],
];

describe("unknown option and input keys", () => {
  for (const [name, call, path, suggestion] of CASES) {
    it(`${name}: ${path} is INVALID_ARGUMENT${suggestion !== null ? ` suggesting "${suggestion}"` : ""}`, () => {
      const e = caught(call);
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(e.details).toMatchObject({ path });
      if (suggestion !== null) {
        expect(e.details).toMatchObject({ suggestion });
        expect(e.message).toContain(`did you mean "${suggestion}"?`);
      } else {
        expect(e.details).not.toHaveProperty("suggestion");
      }
    });
  }

  it("the same calls with the keys spelt right succeed (the checks above can fail for the right reason)", () => {
    expect(heatDuty({ inlet: N2, outlet: { ...N2, T: 500 } }, { extrapolate: true }).duty).toBeGreaterThan(0);
    expect(availableHeat({ fuel: "CH4(g)", flueT: 450, excessAir: 0.15 }).efficiencyLHV).toBeGreaterThan(0.9);
    expect(heatingValue("CH4(g)", { basis: "lower" })).toBeGreaterThan(0);
  });
});
