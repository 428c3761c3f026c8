/**
 * Shared test data of the species tests: a small valid species-data file for an invented demo
 * scenario (a pilot methanol reactor's heat-transfer oil and a fitted solvent), and a deep copy helper.
 */
import type { SpeciesDataInput } from "../../src/species/schema.js";

/** A valid data file; every number is invented for the demo scenario (not physical data). */
export function demoData(): SpeciesDataInput {
  return {
    sources: {
      pilot: "Pilot methanol reactor commissioning sheet (invented demo scenario)",
    },
    species: [
      {
        key: "C5H8O2(l)",
        formula: "C5H8O2",
        phase: "l",
        name: "demo solvent",
        hf298KJPerMol: -390,
        hf298Source: "pilot",
        s298JPerMolK: 230,
        s298Source: "pilot",
        heatCapacity: {
          source: "pilot",
          ranges: [{ TminK: 280, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 180 } }],
        },
      },
      {
        key: "C12H26(l)",
        formula: "C12H26",
        phase: "l",
        name: "demo heat-transfer oil",
        hf298KJPerMol: -350,
        hf298Source: "pilot",
        s298JPerMolK: 490,
        s298Source: "pilot",
        heatCapacity: {
          source: "pilot",
          ranges: [
            { TminK: 273.15, TmaxK: 400, cp: { form: "polynomial", a: 250, b: 0.4, temperatureUnit: "K", energyUnit: "J" } },
            { TminK: 400, TmaxK: 600, cp: { form: "tabulated", temperaturesK: [400, 500, 600], cpJPerMolK: [410, 450, 480] } },
          ],
        },
      },
    ],
  };
}

/** Deep copy through JSON (what a file round trip does). */
export function clone<T>(x: T): T {
  return JSON.parse(JSON.stringify(x)) as T;
}
