/**
 * Built-in species from the NIST Chemistry WebBook Shomate fits (gas-phase data derived from
 * NIST-JANAF 4th ed., Chase 1998), copied digit for digit from the project's reference file.
 * These are the default data set (`"nist-janaf"`) wherever GRI-Mech 3.0 covers the same species.
 * Hematite (Fe2O3) with all three WebBook ranges is in `webbookCondensedShomate.ts`.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const WEBBOOK_SHOMATE_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "N2(g)",
    "formula": "N2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 191.609,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 100,
          "TmaxK": 500,
          "cp": {
            "form": "shomate",
            "A": 28.98641,
            "B": 1.853978,
            "C": -9.647459,
            "D": 16.63537,
            "E": 0.000117,
            "F": -8.671914,
            "G": 226.4168,
            "H": 0.0
          }
        },
        {
          "TminK": 500,
          "TmaxK": 2000,
          "cp": {
            "form": "shomate",
            "A": 19.50583,
            "B": 19.88705,
            "C": -8.598535,
            "D": 1.369784,
            "E": 0.527601,
            "F": -4.935202,
            "G": 212.39,
            "H": 0.0
          }
        },
        {
          "TminK": 2000,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 35.51872,
            "B": 1.128728,
            "C": -0.196103,
            "D": 0.014662,
            "E": -4.55376,
            "F": -18.97091,
            "G": 224.981,
            "H": 0.0
          }
        }
      ]
    }
  },
  {
    "key": "O2(g)",
    "formula": "O2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 205.147,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 100,
          "TmaxK": 700,
          "cp": {
            "form": "shomate",
            "A": 31.32234,
            "B": -20.23531,
            "C": 57.86644,
            "D": -36.50624,
            "E": -0.007374,
            "F": -8.903471,
            "G": 246.7945,
            "H": 0.0
          }
        },
        {
          "TminK": 700,
          "TmaxK": 2000,
          "cp": {
            "form": "shomate",
            "A": 30.03235,
            "B": 8.772972,
            "C": -3.988133,
            "D": 0.788313,
            "E": -0.741599,
            "F": -11.32468,
            "G": 236.1663,
            "H": 0.0
          }
        },
        {
          "TminK": 2000,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 20.91111,
            "B": 10.72071,
            "C": -2.020498,
            "D": 0.146449,
            "E": 9.245722,
            "F": 5.337651,
            "G": 237.6185,
            "H": 0.0
          }
        }
      ]
    }
  },
  {
    "key": "H2(g)",
    "formula": "H2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 130.68,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1000,
          "cp": {
            "form": "shomate",
            "A": 33.066178,
            "B": -11.363417,
            "C": 11.432816,
            "D": -2.772874,
            "E": -0.158558,
            "F": -9.980797,
            "G": 172.707974,
            "H": 0.0
          }
        },
        {
          "TminK": 1000,
          "TmaxK": 2500,
          "cp": {
            "form": "shomate",
            "A": 18.563083,
            "B": 12.257357,
            "C": -2.859786,
            "D": 0.268238,
            "E": 1.97799,
            "F": -1.147438,
            "G": 156.288133,
            "H": 0.0
          }
        },
        {
          "TminK": 2500,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 43.41356,
            "B": -4.293079,
            "C": 1.272428,
            "D": -0.096876,
            "E": -20.533862,
            "F": -38.515158,
            "G": 162.081354,
            "H": 0.0
          }
        }
      ]
    }
  },
  {
    "key": "H2O(g)",
    "formula": "H2O",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -241.8264,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 188.834,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1700,
          "cp": {
            "form": "shomate",
            "A": 30.092,
            "B": 6.832514,
            "C": 6.793435,
            "D": -2.53448,
            "E": 0.082139,
            "F": -250.881,
            "G": 223.3967,
            "H": -241.8264
          },
          "note": "WebBook fit starts at 500 K; many users extrapolate it down to 298 K"
        },
        {
          "TminK": 1700,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 41.96426,
            "B": 8.622053,
            "C": -1.49978,
            "D": 0.098119,
            "E": -11.15764,
            "F": -272.1797,
            "G": 219.7809,
            "H": -241.8264
          }
        }
      ]
    },
    "note": "the WebBook fit starts at 500 K; its first range is used down to 298 K (Cp 33.59 vs NIST-JANAF 33.58 J/(mol K) at 298.15 K, see tests)"
  },
  {
    "key": "H2O(l)",
    "formula": "H2O",
    "phase": "l",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -285.8304,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 69.954,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 273.16,
          "TmaxK": 298,
          "cp": {
            "form": "tabulated",
            "temperaturesK": [
              273.16,
              283.15,
              293.15,
              298
            ],
            "cpJPerMolK": [
              76.02,
              75.58,
              75.38,
              75.33
            ]
          },
          "source": "memory",
          "note": "isobaric Cp of liquid water at 0.1 MPa recalled from the IAPWS-95 formulation (steam tables); joins the WebBook fit at 298 K"
        },
        {
          "TminK": 298,
          "TmaxK": 500,
          "cp": {
            "form": "shomate",
            "A": -203.606,
            "B": 1523.29,
            "C": -3196.413,
            "D": 2474.455,
            "E": 3.855326,
            "F": -256.5478,
            "G": -488.7163,
            "H": -285.8304
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "CO(g)",
    "formula": "CO",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -110.5271,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 197.653,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1300,
          "cp": {
            "form": "shomate",
            "A": 25.56759,
            "B": 6.09613,
            "C": 4.054656,
            "D": -2.671301,
            "E": 0.131021,
            "F": -118.0089,
            "G": 227.3665,
            "H": -110.5271
          }
        },
        {
          "TminK": 1300,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 35.1507,
            "B": 1.300095,
            "C": -0.205921,
            "D": 0.01355,
            "E": -3.28278,
            "F": -127.8375,
            "G": 231.712,
            "H": -110.5271
          }
        }
      ]
    }
  },
  {
    "key": "CO2(g)",
    "formula": "CO2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -393.5224,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 213.795,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 24.99735,
            "B": 55.18696,
            "C": -33.69137,
            "D": 7.948387,
            "E": -0.136638,
            "F": -403.6075,
            "G": 228.2431,
            "H": -393.5224
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 58.16639,
            "B": 2.720074,
            "C": -0.492289,
            "D": 0.038844,
            "E": -6.447293,
            "F": -425.9186,
            "G": 263.6125,
            "H": -393.5224
          }
        }
      ]
    }
  },
  {
    "key": "CH4(g)",
    "formula": "CH4",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -74.8731,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 186.251,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1300,
          "cp": {
            "form": "shomate",
            "A": -0.703029,
            "B": 108.4773,
            "C": -42.52157,
            "D": 5.862788,
            "E": 0.678565,
            "F": -76.84376,
            "G": 158.7163,
            "H": -74.8731
          }
        },
        {
          "TminK": 1300,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 85.81217,
            "B": 11.26467,
            "C": -2.114146,
            "D": 0.13819,
            "E": -26.42221,
            "F": -153.5327,
            "G": 224.4143,
            "H": -74.8731
          }
        }
      ]
    }
  },
  {
    "key": "Ar(g)",
    "formula": "Ar",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 154.845,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 20.786,
            "B": 2.825911e-07,
            "C": -1.464191e-07,
            "D": 1.092131e-08,
            "E": -3.661371e-08,
            "F": -6.19735,
            "G": 179.999,
            "H": 0.0
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "He(g)",
    "formula": "He",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 126.152,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 20.78603,
            "B": 4.850638e-10,
            "C": -1.582916e-10,
            "D": 1.525102e-11,
            "E": 3.196347e-11,
            "F": -6.197341,
            "G": 151.3064,
            "H": 0.0
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "H(g)",
    "formula": "H",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 217.9994,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 114.717,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 20.78603,
            "B": 4.850638e-10,
            "C": -1.582916e-10,
            "D": 1.525102e-11,
            "E": 3.196347e-11,
            "F": 211.802,
            "G": 139.8711,
            "H": 217.9994
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "N(g)",
    "formula": "N",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 472.6832,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 153.279,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 21.13581,
            "B": -0.388842,
            "C": 0.043545,
            "D": 0.024685,
            "E": -0.025678,
            "F": 466.311,
            "G": 178.8263,
            "H": 472.6832
          },
          "note": "partially-confirmed: A-E seen in 2 independent files; F, G, H seen in one file only"
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "OH(g)",
    "formula": "OH",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 38.98706,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 183.708,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1300,
          "cp": {
            "form": "shomate",
            "A": 32.27768,
            "B": -11.36291,
            "C": 13.60545,
            "D": -3.846486,
            "E": -0.001335,
            "F": 29.75113,
            "G": 225.5783,
            "H": 38.98706
          },
          "note": "partially-confirmed: H (=dHf) seen in one file; A-G in two"
        },
        {
          "TminK": 1300,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 28.74701,
            "B": 4.714489,
            "C": -0.814725,
            "D": 0.054748,
            "E": -2.747829,
            "F": 26.41439,
            "G": 214.1166,
            "H": 38.98706
          },
          "note": "partially-confirmed: H (=dHf) seen in one file; A-G in two"
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "NO(g)",
    "formula": "NO",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 90.29114,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 210.758,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 23.83491,
            "B": 12.58878,
            "C": -1.139011,
            "D": -1.497459,
            "E": 0.214194,
            "F": 83.35783,
            "G": 237.1219,
            "H": 90.29114
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 35.99169,
            "B": 0.95717,
            "C": -0.148032,
            "D": 0.009974,
            "E": -3.004088,
            "F": 73.10787,
            "G": 246.1619,
            "H": 90.29114
          }
        }
      ]
    }
  },
  {
    "key": "NO2(g)",
    "formula": "NO2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 33.09502,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 240.034,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 16.10857,
            "B": 75.89525,
            "C": -54.3874,
            "D": 14.30777,
            "E": 0.239423,
            "F": 26.17464,
            "G": 240.5386,
            "H": 33.09502
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 56.82541,
            "B": 0.738053,
            "C": -0.144721,
            "D": 0.009777,
            "E": -5.459911,
            "F": 2.846456,
            "G": 290.5056,
            "H": 33.09502
          }
        }
      ]
    }
  },
  {
    "key": "N2O(g)",
    "formula": "N2O",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 82.04824,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 219.957,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1400,
          "cp": {
            "form": "shomate",
            "A": 27.67988,
            "B": 51.14898,
            "C": -30.64454,
            "D": 6.847911,
            "E": -0.157906,
            "F": 71.24934,
            "G": 238.6164,
            "H": 82.04824
          }
        },
        {
          "TminK": 1400,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 60.30274,
            "B": 1.034566,
            "C": -0.192997,
            "D": 0.01254,
            "E": -6.860254,
            "F": 48.6139,
            "G": 272.5002,
            "H": 82.04824
          },
          "note": "single-source"
        }
      ]
    }
  },
  {
    "key": "NH3(g)",
    "formula": "NH3",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -45.89806,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 192.774,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1400,
          "cp": {
            "form": "shomate",
            "A": 19.99563,
            "B": 49.77119,
            "C": -15.37599,
            "D": 1.921168,
            "E": 0.189174,
            "F": -53.30667,
            "G": 203.8591,
            "H": -45.89806
          }
        },
        {
          "TminK": 1400,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 52.02427,
            "B": 18.48801,
            "C": -3.765128,
            "D": 0.248541,
            "E": -12.45799,
            "F": -85.53895,
            "G": 223.8022,
            "H": -45.89806
          },
          "note": "partially-confirmed: A-E in 3 files; F, G seen in one file"
        }
      ]
    }
  },
  {
    "key": "SO2(g)",
    "formula": "SO2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -296.8422,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 248.212,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 21.43049,
            "B": 74.35094,
            "C": -57.75217,
            "D": 16.35534,
            "E": 0.086731,
            "F": -305.7688,
            "G": 254.8872,
            "H": -296.8422
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 57.48188,
            "B": 1.009328,
            "C": -0.07629,
            "D": 0.005174,
            "E": -4.045401,
            "F": -324.414,
            "G": 302.7798,
            "H": -296.8422
          }
        }
      ]
    }
  },
  {
    "key": "SO3(g)",
    "formula": "SO3",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -395.7654,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 256.766,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 24.02503,
            "B": 119.4607,
            "C": -94.38686,
            "D": 26.96237,
            "E": -0.117517,
            "F": -407.8526,
            "G": 253.5186,
            "H": -395.7654
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 81.99008,
            "B": 0.622236,
            "C": -0.12244,
            "D": 0.008294,
            "E": -6.703688,
            "F": -437.659,
            "G": 330.9264,
            "H": -395.7654
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "H2S(g)",
    "formula": "H2S",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -20.50202,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 205.757,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1400,
          "cp": {
            "form": "shomate",
            "A": 26.88412,
            "B": 18.67809,
            "C": 3.434203,
            "D": -3.378702,
            "E": 0.135882,
            "F": -28.91211,
            "G": 233.3747,
            "H": -20.50202
          }
        },
        {
          "TminK": 1400,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 51.22136,
            "B": 4.147486,
            "C": -0.643566,
            "D": 0.041621,
            "E": -10.46385,
            "F": -55.87606,
            "G": 243.69,
            "H": -20.50202
          },
          "note": "single-source"
        }
      ]
    }
  },
  {
    "key": "HCl(g)",
    "formula": "HCl",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -92.31201,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 186.901,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": 32.12392,
            "B": -13.45805,
            "C": 19.86852,
            "D": -6.853936,
            "E": -0.049672,
            "F": -101.6206,
            "G": 228.6866,
            "H": -92.31201
          }
        },
        {
          "TminK": 1200,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 31.91923,
            "B": 3.203184,
            "C": -0.541539,
            "D": 0.035925,
            "E": -3.438525,
            "F": -108.015,
            "G": 218.2768,
            "H": -92.31201
          }
        }
      ]
    }
  },
  {
    "key": "Cl2(g)",
    "formula": "Cl2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 0.0,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 223.079,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1000,
          "cp": {
            "form": "shomate",
            "A": 33.0506,
            "B": 12.2294,
            "C": -12.0651,
            "D": 4.38533,
            "E": -0.159494,
            "F": -10.8348,
            "G": 259.029,
            "H": 0.0
          },
          "note": "single-source"
        },
        {
          "TminK": 1000,
          "TmaxK": 3000,
          "cp": {
            "form": "shomate",
            "A": 42.6773,
            "B": -5.00957,
            "C": 1.904621,
            "D": -0.165641,
            "E": -2.09848,
            "F": -17.2898,
            "G": 269.84,
            "H": 0.0
          },
          "note": "single-source"
        },
        {
          "TminK": 3000,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": -42.5535,
            "B": 41.6857,
            "C": -7.12683,
            "D": 0.387839,
            "E": 101.144,
            "F": 132.764,
            "G": 264.786,
            "H": 0.0
          },
          "note": "single-source"
        }
      ]
    }
  },
  {
    "key": "C2H2(g)",
    "formula": "C2H2",
    "phase": "g",
    "dataset": "nist-janaf",
    "hf298KJPerMol": 226.7314,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 200.958,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1100,
          "cp": {
            "form": "shomate",
            "A": 40.68697,
            "B": 40.73279,
            "C": -16.1784,
            "D": 3.669741,
            "E": -0.658411,
            "F": 210.7067,
            "G": 235.0052,
            "H": 226.7314
          }
        },
        {
          "TminK": 1100,
          "TmaxK": 6000,
          "cp": {
            "form": "shomate",
            "A": 67.47244,
            "B": 11.7511,
            "C": -2.02147,
            "D": 0.136195,
            "E": -9.806418,
            "F": 185.455,
            "G": 253.5337,
            "H": 226.7314
          },
          "note": "partially-confirmed: F, G seen in one file; A-E in three"
        }
      ]
    }
  },
  {
    "key": "C2H4(g)",
    "formula": "C2H4",
    "phase": "g",
    "dataset": "nist-janaf",
    "alternative": true,
    "hf298KJPerMol": 52.46694,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 219.33,
    "s298Source": "nist-janaf-1998",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 1200,
          "cp": {
            "form": "shomate",
            "A": -6.38788,
            "B": 184.4019,
            "C": -112.9718,
            "D": 28.49593,
            "E": 0.31554,
            "F": 48.17332,
            "G": 163.1568,
            "H": 52.46694
          },
          "note": "1200-6000 K range omitted: only A-E (106.5104, 13.73260, -2.628481, 0.174595, -26.14469) were found"
        }
      ]
    },
    "note": "WebBook 1200-6000 K range omitted (F, G not confirmed)"
  },
  {
    "key": "Al2O3(cr)",
    "formula": "Al2O3",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -1675.69,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 50.828,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 2327,
          "cp": {
            "form": "shomate",
            "A": 102.429,
            "B": 38.7498,
            "C": -15.9109,
            "D": 2.628181,
            "E": -3.007551,
            "F": -1717.93,
            "G": 146.997,
            "H": -1675.69
          }
        }
      ]
    },
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K"
  },
  {
    "key": "SiO2(cr)",
    "formula": "SiO2",
    "phase": "cr",
    "dataset": "nist-janaf",
    "hf298KJPerMol": -910.8568,
    "hf298Source": "nist-webbook",
    "s298JPerMolK": 41.46,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "nist-webbook",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 847,
          "cp": {
            "form": "shomate",
            "A": -6.076591,
            "B": 251.6755,
            "C": -324.7964,
            "D": 168.5604,
            "E": 0.002548,
            "F": -917.6893,
            "G": -27.96962,
            "H": -910.8568
          },
          "note": "alpha quartz; the Cp step (76.5 -> 67.4 J/mol/K) and H step (+0.729 kJ/mol) at 847 K are the alpha-beta transition, not an error"
        },
        {
          "TminK": 847,
          "TmaxK": 1996,
          "cp": {
            "form": "shomate",
            "A": 58.7534,
            "B": 10.27925,
            "C": -0.131384,
            "D": 0.02521,
            "E": 0.025601,
            "F": -929.3292,
            "G": 105.8092,
            "H": -910.8568
          },
          "note": "beta quartz"
        }
      ]
    },
    "transitions": [
      {
        "TK": 847,
        "dHKJPerMol": 0.7291,
        "label": "alpha-beta quartz",
        "source": "nist-webbook"
      }
    ],
    "note": "S298 evaluated from the WebBook Shomate fit (its G constant) at 298.15 K; the alpha-beta transition enthalpy is the step between the two WebBook ranges at 847 K"
  }
];
