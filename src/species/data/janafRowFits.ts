/**
 * Built-in condensed species whose only published source is a NIST-JANAF table (Chase 1998): Cp
 * polynomials fitted by rxtherm to the tabulated rows (one polynomial a + bT + cT² + dT³ + e/T² per
 * phase, least squares on Cp and H − H298), with the table's ΔfH°, S° and transition enthalpies.
 * The rows are in tests/fixtures/janaf-condensed.json; a test checks every fit against them.
 * Data set `"nist-janaf"`. Plain data: nothing is computed at import.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const JANAF_ROW_FIT_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "Ca(OH)2(cr)",
    "formula": "Ca(OH)2",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -986.085,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 83.387,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 1000.0,
          "cp": {
            "form": "polynomial",
            "a": 105.4040499,
            "b": 0.009487643023,
            "e": -1882872.938,
            "c": 5.175243163e-06,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "NIST-JANAF table Ca-020, 298.15-1000 K (portlandite dehydrates to CaO + H2O below 1000 K at low water pressure); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.26 % in Cp and 0.020 kJ/mol in H-H298"
  },
  {
    "key": "Na2CO3(cr)",
    "formula": "Na2CO3",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -1130.768,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 138.797,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 723.15,
          "cp": {
            "form": "polynomial",
            "a": 92.49836293,
            "b": 0.003692146237,
            "e": 0.004682799154,
            "c": 0.0002017672683,
            "d": -1.891167982e-08,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 723.15,
          "TmaxK": 1123.15,
          "cp": {
            "form": "polynomial",
            "a": 45.73057589,
            "b": 0.13209558,
            "e": 1290611.711,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 723.15,
        "dHKJPerMol": 0.69,
        "label": "I <--> II",
        "source": "nist-janaf-1998"
      }
    ],
    "note": "NIST-JANAF table C-090, 298.15-1123.15 K (melting), with the I-II transition at 723.15 K; Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.15 % in Cp and 0.019 kJ/mol in H-H298"
  },
  {
    "key": "KCl(cr)",
    "formula": "KCl",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -436.684,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 82.554,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 1044.0,
          "cp": {
            "form": "polynomial",
            "a": 40.4295978,
            "b": 0.05473716152,
            "e": 0.001524068715,
            "c": -7.601676232e-05,
            "d": 4.786864443e-08,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "NIST-JANAF table Cl-036, 298.15-1044 K (melting at 1044 K, ΔfusH 26.284 kJ/mol; the liquid is not included); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.17 % in Cp and 0.011 kJ/mol in H-H298"
  },
  {
    "key": "CaCl2(cr)",
    "formula": "CaCl2",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -795.797,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 104.602,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 1045.0,
          "cp": {
            "form": "polynomial",
            "a": 58.04347697,
            "b": 0.07536771673,
            "e": 0.002176880221,
            "c": -0.0001011672732,
            "d": 5.341864956e-08,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "NIST-JANAF table Ca-009, 298.15-1045 K (melting at 1045 K, ΔfusH 28.543 kJ/mol; the liquid is not included); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.30 % in Cp and 0.029 kJ/mol in H-H298"
  },
  {
    "key": "NH4Cl(cr)",
    "formula": "NH4Cl",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -314.553,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 94.86,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 457.7,
          "cp": {
            "form": "polynomial",
            "a": 81.30669691,
            "b": 0.07986957758,
            "e": -1655629.258,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 457.7,
          "TmaxK": 1000.0,
          "cp": {
            "form": "polynomial",
            "a": 6.938210831,
            "b": 0.1707434099,
            "e": 1698968.045,
            "c": -3.46408822e-05,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 1200.0,
          "cp": {
            "form": "polynomial",
            "a": 134.646682,
            "b": 0.03620962393,
            "e": -26293374.21,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 1200.0,
          "TmaxK": 1300.0,
          "cp": {
            "form": "polynomial",
            "a": 119.6514683,
            "b": 0.0334583639,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 1300.0,
          "TmaxK": 1500.0,
          "cp": {
            "form": "polynomial",
            "a": 385.4911653,
            "b": -0.08170579487,
            "e": -196208292.5,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 457.7,
        "dHKJPerMol": 3.933,
        "label": "II <--> III",
        "source": "nist-janaf-1998"
      }
    ],
    "note": "NIST-JANAF table Cl-029, 298.15-1500 K with the II-III transition at 457.7 K (ammonium chloride sublimes and dissociates to NH3 + HCl near 610 K at 1 atm; the table describes the crystal only); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.24 % in Cp and 0.068 kJ/mol in H-H298"
  },
  {
    "key": "Na2SO4(cr)",
    "formula": "Na2SO4",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -1387.816,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 149.595,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 458.0,
          "cp": {
            "form": "polynomial",
            "a": 104.9724803,
            "b": 0.1162212146,
            "e": -1020999.972,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 458.0,
          "TmaxK": 514.0,
          "cp": {
            "form": "polynomial",
            "a": 92.86587161,
            "b": 0.1320353285,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 514.0,
          "TmaxK": 1157.0,
          "cp": {
            "form": "polynomial",
            "a": 123.7537099,
            "b": 0.08068281135,
            "e": 1890252.975,
            "c": -6.058358126e-06,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 458.0,
        "dHKJPerMol": 0.255,
        "label": "V <--> IV",
        "source": "nist-janaf-1998"
      },
      {
        "TK": 514.0,
        "dHKJPerMol": 10.907,
        "label": "IV <--> I",
        "source": "nist-janaf-1998"
      }
    ],
    "note": "NIST-JANAF table Na-025, crystal phases V, IV and I, 298.15-1157 K (melting), with the V-IV (458 K) and IV-I (514 K) transitions; Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.06 % in Cp and 0.009 kJ/mol in H-H298"
  },
  {
    "key": "NaOH(l)",
    "formula": "NaOH",
    "phase": "l",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -416.878,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 75.891,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 1700.0,
          "cp": {
            "form": "polynomial",
            "a": 89.58114268,
            "b": -0.005855345425,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 1700.0,
          "TmaxK": 2500.0,
          "cp": {
            "form": "polynomial",
            "a": 75.24463665,
            "b": -0.0003261389948,
            "e": 14370214.58,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "note": "NIST-JANAF table H-034, liquid 298.15-2500 K (below 596 K supercooled, as tabulated); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.05 % in Cp and 0.029 kJ/mol in H-H298"
  },
  {
    "key": "NaOH(cr)",
    "formula": "NaOH",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -425.931,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 64.445,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-janaf-1998",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 572.0,
          "cp": {
            "form": "polynomial",
            "a": 90.59116976,
            "b": -0.1768282546,
            "e": -432563.8761,
            "c": 0.0002988337489,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 572.0,
          "TmaxK": 596.0,
          "cp": {
            "form": "polynomial",
            "a": 86.0229694,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 596.0,
          "TmaxK": 1700.0,
          "cp": {
            "form": "polynomial",
            "a": 89.65626666,
            "b": -0.005902600033,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        },
        {
          "TminK": 1700.0,
          "TmaxK": 2500.0,
          "cp": {
            "form": "polynomial",
            "a": 75.24463665,
            "b": -0.0003261389948,
            "e": 14370214.58,
            "temperatureUnit": "K",
            "energyUnit": "J"
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 572.0,
        "dHKJPerMol": 7.209,
        "label": "I <--> II",
        "source": "nist-janaf-1998"
      },
      {
        "TK": 596.0,
        "dHKJPerMol": 6.611,
        "label": "II <--> liquid (melting)",
        "source": "nist-janaf-1998"
      }
    ],
    "note": "NIST-JANAF tables H-033 (crystal I to 572 K, II to 596 K) and H-034 (liquid from 596 K to 2500 K), chained with the I-II transition (7.209 kJ/mol) and melting (6.611 kJ/mol); above 596 K the entry is the liquid although keyed (cr); Cp fitted by rxtherm (least squares on Cp and H-H298, one polynomial per phase) to the NIST-JANAF rows, which it reproduces within 0.06 % in Cp and 0.063 kJ/mol in H-H298"
  }
];
