/**
 * Built-in species from the GRI-Mech 3.0 thermodynamic data (NASA 7-coefficient polynomials),
 * copied digit for digit from the project's reference file. Where the WebBook Shomate set covers
 * the same species these entries are alternatives (`dataset: "gri-mech-3.0"`), and so are atomic oxygen
 * (the Burcat–Ruscic set reaches 6000 K, this one 3500 K) and methanol vapour (the Burcat–Ruscic Cp is
 * the one close to NIST-JANAF near 298 K); otherwise they are the default, and so is ethylene, whose
 * WebBook set stops at 1200 K.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const GRI_MECH_30_NASA7_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "N2(g)",
    "formula": "N2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 0.0014,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 191.512,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.298677,
              0.0014082404,
              -3.963222e-06,
              5.641515e-09,
              -2.444854e-12,
              -1020.8999,
              3.950372
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.92664,
              0.0014879768,
              -5.68476e-07,
              1.0097038e-10,
              -6.753351e-15,
              -922.7977,
              5.980528
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label N2, date code 121286"
  },
  {
    "key": "O2(g)",
    "formula": "O2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 0.0,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 205.148,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.78245636,
              -0.00299673416,
              9.84730201e-06,
              -9.68129509e-09,
              3.24372837e-12,
              -1063.94356,
              3.65767573
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.28253784,
              0.00148308754,
              -7.57966669e-07,
              2.09470555e-10,
              -2.16717794e-14,
              -1088.45772,
              5.45323129
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label O2, date code TPIS89"
  },
  {
    "key": "H2(g)",
    "formula": "H2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 0.0,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 130.68,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.34433112,
              0.00798052075,
              -1.9478151e-05,
              2.01572094e-08,
              -7.37611761e-12,
              -917.935173,
              0.683010238
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.3372792,
              -4.94024731e-05,
              4.99456778e-07,
              -1.79566394e-10,
              2.00255376e-14,
              -950.158922,
              -3.20502331
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label H2, date code TPIS78"
  },
  {
    "key": "H2O(g)",
    "formula": "H2O",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -241.8246,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 188.828,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.19864056,
              -0.0020364341,
              6.52040211e-06,
              -5.48797062e-09,
              1.77197817e-12,
              -30293.7267,
              -0.849032208
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.03399249,
              0.00217691804,
              -1.64072518e-07,
              -9.7041987e-11,
              1.68200992e-14,
              -30004.2971,
              4.9667701
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label H2O, date code L 8/89; Self-check: H(T)-H(298.15) vs JANAF +0.13% at 1500 K, +0.34% at 2000 K, +0.63% at 2500 K, +0.88% at 3000 K (GRI-Mech H2O high-T fit); within 0.01% up to 1000 K."
  },
  {
    "key": "CO(g)",
    "formula": "CO",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -110.5294,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 197.656,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.57953347,
              -0.00061035368,
              1.01681433e-06,
              9.07005884e-10,
              -9.04424499e-13,
              -14344.086,
              3.50840928
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.71518561,
              0.00206252743,
              -9.98825771e-07,
              2.30053008e-10,
              -2.03647716e-14,
              -14151.8724,
              7.81868772
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label CO, date code TPIS79"
  },
  {
    "key": "CO2(g)",
    "formula": "CO2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -393.5078,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 213.786,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.35677352,
              0.00898459677,
              -7.12356269e-06,
              2.45919022e-09,
              -1.43699548e-13,
              -48371.9697,
              9.90105222
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.85746029,
              0.00441437026,
              -2.21481404e-06,
              5.23490188e-10,
              -4.72084164e-14,
              -48759.166,
              2.27163806
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label CO2, date code L 7/88"
  },
  {
    "key": "CH4(g)",
    "formula": "CH4",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -74.5996,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 186.37,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.14987613,
              -0.0136709788,
              4.91800599e-05,
              -4.84743026e-08,
              1.66693956e-11,
              -10246.6476,
              -4.64130376
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              0.074851495,
              0.0133909467,
              -5.73285809e-06,
              1.22292535e-09,
              -1.0181523e-13,
              -9468.34459,
              18.437318
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label CH4, date code L 8/88; Self-check: Cp exceeds the NIST-JANAF/WebBook-Shomate value by +0.1% at 300 K, +2.5% at 1000 K, +4.3% at 1500 K; H(1000)-H(298.15) is +1.2% vs the WebBook Shomate set (38.65 vs 38.18 kJ/mol). Both public copies agree, so this is a property of the GRI-Mech data set, not a transcription error. Do not use it to test against JANAF-based data to better than ~3%."
  },
  {
    "key": "OH(g)",
    "formula": "OH",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 39.3469,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 183.739,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.99201543,
              -0.00240131752,
              4.61793841e-06,
              -3.88113333e-09,
              1.3641147e-12,
              3615.08056,
              -0.103925458
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.09288767,
              0.000548429716,
              1.26505228e-07,
              -8.79461556e-11,
              1.17412376e-14,
              3858.657,
              4.4766961
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label OH, date code RUS 78"
  },
  {
    "key": "H(g)",
    "formula": "H",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 217.9972,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 114.717,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.5,
              7.05332819e-13,
              -1.99591964e-15,
              2.30081632e-18,
              -9.27732332e-22,
              25473.6599,
              -0.446682853
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.50000001,
              -2.30842973e-11,
              1.61561948e-14,
              -4.73515235e-18,
              4.98197357e-22,
              25473.6599,
              -0.446682914
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label H, date code L 7/88"
  },
  {
    "key": "O(g)",
    "formula": "O",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 249.1736,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 161.06,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.1682671,
              -0.00327931884,
              6.64306396e-06,
              -6.12806624e-09,
              2.11265971e-12,
              29122.2592,
              2.05193346
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.56942078,
              -8.59741137e-05,
              4.19484589e-08,
              -1.00177799e-11,
              1.22833691e-15,
              29217.5791,
              4.78433864
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label O, date code L 1/90"
  },
  {
    "key": "NO(g)",
    "formula": "NO",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 91.2645,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 210.744,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.2184763,
              -0.004638976,
              1.1041022e-05,
              -9.3361354e-09,
              2.803577e-12,
              9844.623,
              2.2808464
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.2606056,
              0.0011911043,
              -4.2917048e-07,
              6.9457669e-11,
              -4.0336099e-15,
              9920.9746,
              6.3693027
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label NO, date code RUS 78"
  },
  {
    "key": "Ar(g)",
    "formula": "Ar",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 0.0,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 154.732,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.5,
              0.0,
              0.0,
              0.0,
              0.0,
              -745.375,
              4.366
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.5,
              0.0,
              0.0,
              0.0,
              0.0,
              -745.375,
              4.366
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label AR, date code 120186"
  },
  {
    "key": "C2H6(g)",
    "formula": "C2H6",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "hf298KJPerMol": -83.8511,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 229.22,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.29142492,
              -0.0055015427,
              5.99438288e-05,
              -7.08466285e-08,
              2.68685771e-11,
              -11522.2055,
              2.66682316
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.0718815,
              0.0216852677,
              -1.00256067e-05,
              2.21412001e-09,
              -1.9000289e-13,
              -11426.3932,
              15.1156107
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label C2H6, date code L 8/88"
  },
  {
    "key": "C3H8(g)",
    "formula": "C3H8",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "hf298KJPerMol": -103.8533,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 270.18,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              0.93355381,
              0.026424579,
              6.1059727e-06,
              -2.1977499e-08,
              9.5149253e-12,
              -13958.52,
              19.201691
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              7.5341368,
              0.018872239,
              -6.2718491e-06,
              9.1475649e-10,
              -4.7838069e-14,
              -16467.516,
              -17.892349
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label C3H8, date code L 4/85"
  },
  {
    "key": "C2H4(g)",
    "formula": "C2H4",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "hf298KJPerMol": 52.4997,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 219.321,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.95920148,
              -0.00757052247,
              5.70990292e-05,
              -6.91588753e-08,
              2.69884373e-11,
              5089.77593,
              4.09733096
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.03611116,
              0.0146454151,
              -6.71077915e-06,
              1.47222923e-09,
              -1.25706061e-13,
              4939.88614,
              10.3053693
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label C2H4, date code L 1/91"
  },
  {
    "key": "C2H2(g)",
    "formula": "C2H2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 228.1987,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 200.915,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              0.808681094,
              0.0233615629,
              -3.55171815e-05,
              2.80152437e-08,
              -8.50072974e-12,
              26428.9807,
              13.9397051
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.14756964,
              0.00596166664,
              -2.37294852e-06,
              4.67412171e-10,
              -3.61235213e-14,
              25935.9992,
              -1.23028121
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label C2H2, date code L 1/91; Self-check: Cp -0.5% at 1000 K, -0.8% at 1500 K vs WebBook Shomate."
  },
  {
    "key": "CH3OH(g)",
    "formula": "CH3OH",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -200.9389,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 239.809,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.71539582,
              -0.0152309129,
              6.52441155e-05,
              -7.10806889e-08,
              2.61352698e-11,
              -25642.7656,
              -1.50409823
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 3500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.78970791,
              0.0140938292,
              -6.36500835e-06,
              1.38171085e-09,
              -1.1706022e-13,
              -25374.8747,
              14.5023623
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label CH3OH, date code L 8/88"
  },
  {
    "key": "NH3(g)",
    "formula": "NH3",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": -45.8982,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 192.773,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.2860274,
              -0.004660523,
              2.1718513e-05,
              -2.2808887e-08,
              8.2638046e-12,
              -6741.7285,
              -0.62537277
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.6344521,
              0.005666256,
              -1.7278676e-06,
              2.3867161e-10,
              -1.2578786e-14,
              -6544.6958,
              6.5662928
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label NH3, date code J 6/77"
  },
  {
    "key": "HCN(g)",
    "formula": "HCN",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "hf298KJPerMol": 130.8152,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 201.823,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.2589886,
              0.01005117,
              -1.3351763e-05,
              1.0092349e-08,
              -3.0089028e-12,
              14712.633,
              8.9164419
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.8022392,
              0.0031464228,
              -1.0632185e-06,
              1.6619757e-10,
              -9.799757e-15,
              14407.292,
              1.5754601
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label HCN, date code GRI/98"
  },
  {
    "key": "N2O(g)",
    "formula": "N2O",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 81.5995,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 220.008,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.2571502,
              0.011304728,
              -1.3671319e-05,
              9.6819806e-09,
              -2.9307182e-12,
              8741.7744,
              10.757992
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.8230729,
              0.0026270251,
              -9.5850874e-07,
              1.6000712e-10,
              -9.7752303e-15,
              8073.4048,
              -2.2017207
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label N2O, date code L 7/88; Self-check: Cp +0.6% at 1000 K, +1.0% at 1500 K vs WebBook Shomate; H(1000)-H(298.15) +0.29%."
  },
  {
    "key": "NO2(g)",
    "formula": "NO2",
    "phase": "g",
    "dataset": "gri-mech-3.0",
    "alternative": true,
    "hf298KJPerMol": 34.193,
    "hf298Source": "gri-mech-3.0",
    "s298JPerMolK": 240.17,
    "s298Source": "gri-mech-3.0",
    "heatCapacity": {
      "source": "gri-mech-3.0",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.9440312,
              -0.001585429,
              1.6657812e-05,
              -2.0475426e-08,
              7.8350564e-12,
              2896.6179,
              6.3119917
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.8847542,
              0.0021723956,
              -8.2806906e-07,
              1.574751e-10,
              -1.0510895e-14,
              2316.4983,
              -0.11741695
            ]
          }
        }
      ]
    },
    "note": "hf298 and s298 evaluated from the GRI-Mech 3.0 polynomial at 298.15 K (R = 8.31446261815324 J/(mol K)); GRI-Mech label NO2, date code L 7/88; Self-check: Cp +0.55% at 298.15 K and +1.6% at 1000 K vs the WebBook Shomate set; H(1000)-H(298.15) +1.2%. Data-set difference, both copies agree."
  }
];
