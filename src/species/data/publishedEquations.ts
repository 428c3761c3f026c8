/**
 * Built-in species from published heat-capacity equations: calcite (Jacobs, Kerrick and Krupka
 * 1981), anhydrite (Robie, Russell-Robinson and Hemingway 1989), three liquids from Perry's
 * Chemical Engineers' Handbook (8th ed., Table 2-153) and urea (NIST WebBook). Values no source
 * could be found for are marked `memory` and listed in docs/species.md. Plain data: nothing is
 * computed at import.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const PUBLISHED_EQUATION_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "CaCO3(cr)",
    "formula": "CaCO3",
    "phase": "cr",
    "dataset": "jacobs-1981",
    "hf298KJPerMol": -1206.92,
    "hf298Source": "nbs-1982",
    "s298JPerMolK": 92.9,
    "s298Source": "nbs-1982",
    "heatCapacity": {
      "source": "jacobs-kerrick-krupka-1981",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 775,
          "cp": {
            "form": "nasa9",
            "a": [
              -541483.053471,
              3758.25996033,
              -2.53795701468,
              0.0208637263218,
              7.86472492043e-07,
              -9.3072520116e-09,
              2.3574728042e-12,
              0.0,
              0.0
            ]
          }
        }
      ]
    },
    "note": "Cp: the Jacobs-Kerrick-Krupka (1981) equation a + bT + c/T^2 + d/T^0.5 + eT^2 (298-775 K), re-expressed by rxtherm as a NASA-9 Cp/R polynomial (T^-2 to T^4) by least squares at 1 K steps (worst deviation 0.000 %); its Cp(298.15 K) is 1.9 % above the NBS 1982 value. ΔfH° and S°: NBS 1982. Calcination (CaCO3 -> CaO + CO2) runs above the range: hotter calciner duties extrapolate CaCO3 and say so"
  },
  {
    "key": "CaSO4(cr)",
    "formula": "CaSO4",
    "phase": "cr",
    "dataset": "robie-1989",
    "hf298KJPerMol": -1434.11,
    "hf298Source": "memory",
    "s298JPerMolK": 107.4,
    "s298Source": "robie-russell-robinson-hemingway-1989",
    "heatCapacity": {
      "source": "robie-russell-robinson-hemingway-1989",
      "ranges": [
        {
          "TminK": 300,
          "TmaxK": 1000,
          "cp": {
            "form": "nasa9",
            "a": [
              334480.419778,
              -4461.00721579,
              24.2654080945,
              -0.00253670692144,
              -3.24869338569e-06,
              6.23413866488e-09,
              -1.33534046503e-12,
              0.0,
              0.0
            ]
          }
        }
      ]
    },
    "note": "Cp: the Robie, Russell-Robinson and Hemingway (1989) equation a + bT + c/T^2 + d/T^0.5 + eT^2 (300-1000 K, read down to 298.15 K), re-expressed by rxtherm as a NASA-9 Cp/R polynomial (T^-2 to T^4) by least squares at 1 K steps (worst deviation 0.001 %); the reference copy of the equation was read from an OCR text (see its flag). S°: same paper. ΔfH°: from memory (no sourced value found): check before design use"
  },
  {
    "key": "CH3COCH3(l)",
    "formula": "CH3COCH3",
    "phase": "l",
    "dataset": "perry-2008",
    "hf298KJPerMol": -248.1,
    "hf298Source": "memory",
    "s298JPerMolK": 200.4,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "perry-2008",
      "ranges": [
        {
          "TminK": 178.45,
          "TmaxK": 329.44,
          "cp": {
            "form": "polynomial",
            "a": 135.6,
            "b": -0.177,
            "c": 0.0002837,
            "d": 6.890000000000001e-07,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "Cp: Perry's Chemical Engineers' Handbook, 8th ed., Table 2-153, saturated liquid 178.45-329.44 K; Cp as published (coefficients divided by 1000 for J/(mol K)). ΔfH° and S°: from memory (no sourced value found): check before design use"
  },
  {
    "key": "CH3COOH(l)",
    "formula": "CH3COOH",
    "phase": "l",
    "dataset": "perry-2008",
    "hf298KJPerMol": -484.5,
    "hf298Source": "memory",
    "s298JPerMolK": 159.8,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "perry-2008",
      "ranges": [
        {
          "TminK": 289.81,
          "TmaxK": 391.05,
          "cp": {
            "form": "polynomial",
            "a": 139.64,
            "b": -0.32080000000000003,
            "c": 0.0008985,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "Cp: Perry's Chemical Engineers' Handbook, 8th ed., Table 2-153, saturated liquid 289.81-391.05 K; Cp as published (coefficients divided by 1000 for J/(mol K)). ΔfH° and S°: from memory (no sourced value found): check before design use"
  },
  {
    "key": "CS2(l)",
    "formula": "CS2",
    "phase": "l",
    "dataset": "perry-2008",
    "hf298KJPerMol": 89.7,
    "hf298Source": "memory",
    "s298JPerMolK": 151.34,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "perry-2008",
      "ranges": [
        {
          "TminK": 161.11,
          "TmaxK": 552.0,
          "cp": {
            "form": "nasa7",
            "a": [
              10.295313591657349,
              -0.014673227315212577,
              6.741265500144795e-05,
              -1.7463545952203824e-07,
              2.415068889257939e-10,
              0.0,
              0.0
            ]
          }
        }
      ]
    },
    "note": "Cp: Perry's Chemical Engineers' Handbook, 8th ed., Table 2-153, saturated liquid 161.11-552.0 K; Cp as published, written as a NASA-7 Cp/R polynomial (the published coefficients divided by 1000 R; the T^4 term needs that form). ΔfH° and S°: from memory (no sourced value found): check before design use"
  },
  {
    "key": "CO(NH2)2(cr)",
    "formula": "CO(NH2)2",
    "phase": "cr",
    "dataset": "nist-webbook",
    "hf298KJPerMol": -333.39,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 104.93,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 240,
          "TmaxK": 400,
          "cp": {
            "form": "polynomial",
            "a": 38.43,
            "b": 0.0498,
            "c": 0.000705,
            "d": -8.61e-07,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "NIST WebBook condensed-phase data: Cp equation of Kozyro, Dalidovich et al. (1986), 240-400 K; ΔfH° (Johnson 1975) and S° (Kozyro et al. 1986). Urea melts near 406 K and decomposes"
  }
];
