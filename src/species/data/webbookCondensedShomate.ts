/**
 * Built-in condensed species from the NIST Chemistry WebBook Shomate fits of NIST-JANAF tables (Chase
 * 1998), copied digit for digit from the project's reference file species-extended.json. Data set
 * `"nist-janaf"`. Plain data: nothing is computed at import.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const WEBBOOK_CONDENSED_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "CaO(cr)",
    "formula": "CaO",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -635.0894,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 38.192,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 3200,
          "cp": {
            "form": "shomate",
            "A": 49.95403,
            "B": 4.887916,
            "C": -0.352056,
            "D": 0.046187,
            "E": -0.825097,
            "F": -652.9718,
            "G": 92.56096,
            "H": -635.0894
          }
        }
      ]
    },
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Ca-027, 298-3200 K; S298 evaluated from the fit's G constant at 298.15 K"
  },
  {
    "key": "MgO(cr)",
    "formula": "MgO",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -601.2408,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 26.854,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 3105,
          "cp": {
            "form": "shomate",
            "A": 47.25995,
            "B": 5.681621,
            "C": -0.872665,
            "D": 0.1043,
            "E": -1.053955,
            "F": -619.1316,
            "G": 76.46176,
            "H": -601.2408
          }
        }
      ]
    },
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Mg-008, 298-3105 K; S298 evaluated from the fit's G constant at 298.15 K (0.07 J/(mol K) below the JANAF 26.924)"
  },
  {
    "key": "NaCl(cr)",
    "formula": "NaCl",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -411.1203,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 72.109,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1073,
          "cp": {
            "form": "shomate",
            "A": 50.72389,
            "B": 6.672267,
            "C": -2.517167,
            "D": 10.15934,
            "E": -0.200675,
            "F": -427.2115,
            "G": 130.3973,
            "H": -411.1203
          }
        }
      ]
    },
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Cl-053, 298-1073 K (melting near 1074 K); S298 evaluated from the fit's G constant at 298.15 K"
  },
  {
    "key": "FeO(cr)",
    "formula": "FeO",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -272.0441,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 60.747,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1650,
          "cp": {
            "form": "shomate",
            "A": 45.7512,
            "B": 18.78553,
            "C": -5.952201,
            "D": 0.852779,
            "E": -0.081265,
            "F": -286.7429,
            "G": 110.312,
            "H": -272.0441
          }
        }
      ]
    },
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Fe-018, 298-1650 K (stoichiometric FeO; real wustite is Fe(1-x)O); S298 evaluated from the fit's G constant at 298.15 K"
  },
  {
    "key": "Fe3O4(cr)",
    "formula": "Fe3O4",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -1120.894,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 145.245,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 900,
          "cp": {
            "form": "shomate",
            "A": 104.2096,
            "B": 178.5108,
            "C": 10.6151,
            "D": 1.132534,
            "E": -0.994202,
            "F": -1163.336,
            "G": 212.0585,
            "H": -1120.894
          }
        },
        {
          "TminK": 900,
          "TmaxK": 3000,
          "cp": {
            "form": "shomate",
            "A": 200.832,
            "B": 1.586435e-07,
            "C": -6.661682e-08,
            "D": 9.452452e-09,
            "E": 3.18602e-08,
            "F": -1174.135,
            "G": 388.079,
            "H": -1120.894
          }
        }
      ]
    },
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Fe-032, 298-900 K and 900-3000 K (the Cp step at 900 K is the magnetic lambda point; the upper range is a constant-Cp fit and the JANAF table stops at 1870 K); S298 evaluated from the fit's G constant at 298.15 K"
  },
  {
    "key": "Fe2O3(cr)",
    "formula": "Fe2O3",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -825.5032,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 87.332,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 950,
          "cp": {
            "form": "shomate",
            "A": 93.43834,
            "B": 108.3577,
            "C": -50.86447,
            "D": 25.58683,
            "E": -1.61133,
            "F": -863.2094,
            "G": 161.0719,
            "H": -825.5032
          }
        },
        {
          "TminK": 950,
          "TmaxK": 1050,
          "cp": {
            "form": "shomate",
            "A": 150.624,
            "B": 0,
            "C": 0,
            "D": 0,
            "E": 0,
            "F": -875.6066,
            "G": 252.8814,
            "H": -825.5032
          }
        },
        {
          "TminK": 1050,
          "TmaxK": 2500,
          "cp": {
            "form": "shomate",
            "A": 110.9362,
            "B": 32.04714,
            "C": -9.192333,
            "D": 0.901506,
            "E": 5.433677,
            "F": -843.1471,
            "G": 228.3548,
            "H": -825.5032
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 950,
        "dHKJPerMol": 0.663111,
        "label": "hematite I-II (magnetic) transition",
        "source": "nist-webbook"
      }
    ],
    "note": "NIST WebBook Shomate fit of NIST-JANAF table Fe-030, 298-950 K, 950-1050 K and 1050-2500 K; the 0.66 kJ/mol step between the first two ranges is the JANAF I-II (magnetic) transition and is carried as a transition; S298 evaluated from the fit's G constant at 298.15 K"
  }
];
