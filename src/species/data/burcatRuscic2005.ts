/**
 * Built-in species from the Burcat–Ruscic database (A. Burcat and B. Ruscic, ANL-05/20 and TAE 960,
 * 2005 edition): NASA 7-coefficient polynomials copied digit for digit from the project's reference
 * files (species-extended.json, burcat-2005.json). ΔfH° and S° are the polynomials' values at
 * 298.15 K (rounded to 0.001), except where a NIST-JANAF ΔfH° is preferred (see each note); phases of
 * one substance are chained with the transition enthalpies the records imply. Data set
 * `"burcat-ruscic-2005"`. Plain data: nothing is computed at import.
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const BURCAT_RUSCIC_2005_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "n-C4H10(g)",
    "formula": "C4H10",
    "phase": "g",
    "cas": "106-97-8",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -125.789,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 309.882,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              6.14474013,
              0.000164500242,
              9.67848789e-05,
              -1.25486208e-07,
              4.97846257e-11,
              -17598.9467,
              -1.08058878
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              9.44547835,
              0.025785662,
              -9.23613194e-06,
              1.48631762e-09,
              -8.87891206e-14,
              -20138.3773,
              -26.3477585
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 12/00, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "i-C4H10(g)",
    "formula": "C4H10",
    "phase": "g",
    "cas": "75-28-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -134.989,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 295.491,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.4547914,
              0.00826058864,
              8.29886433e-05,
              -1.14647616e-07,
              4.64569994e-11,
              -18459.3929,
              4.92740653
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              9.76991697,
              0.0254997141,
              -9.14142587e-06,
              1.47328201e-09,
              -8.80799697e-14,
              -21405.2667,
              -30.032967
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 8/00, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "C3H6(g)",
    "formula": "C3H6",
    "phase": "g",
    "cas": "115-07-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 20.0,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 266.666,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.83464468,
              0.00329078952,
              5.05228001e-05,
              -6.66251176e-08,
              2.63707473e-11,
              788.717123,
              7.53408013
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              6.03870234,
              0.0162963931,
              -5.821308e-06,
              9.35936829e-10,
              -5.58603143e-14,
              -741.715057,
              -8.43825992
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 2/00, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "n-C5H12(g)",
    "formula": "C5H12",
    "phase": "g",
    "cas": "109-66-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -146.76,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 349.56,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              8.54851659,
              -0.00888170492,
              0.00014308389,
              -1.78592329e-07,
              6.97489761e-11,
              -20749.2614,
              -8.93518255
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              16.73727,
              0.0223922034,
              -6.17705543e-06,
              1.02144924e-09,
              -6.65183115e-14,
              -25761.6661,
              -64.5619087
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record 10/85, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "n-C6H14(g)",
    "formula": "C6H14",
    "phase": "g",
    "cas": "110-54-3",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -166.92,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 388.85,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              9.87121167,
              -0.00936699002,
              0.000169887865,
              -2.1501952e-07,
              8.45407091e-11,
              -23718.5495,
              -12.4999353
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              19.5158086,
              0.0267753942,
              -7.49783741e-06,
              1.19510646e-09,
              -7.51957473e-14,
              -29436.2466,
              -77.4895497
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 6/01, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "n-C7H16(g)",
    "formula": "C7H16",
    "phase": "g",
    "cas": "142-82-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -187.78,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 428.089,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              11.1532994,
              -0.00949419773,
              0.000195572075,
              -2.49753662e-07,
              9.84877715e-11,
              -26768.8904,
              -15.9096837
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              20.4565203,
              0.0348575357,
              -1.09226846e-05,
              1.67201776e-09,
              -9.8102485e-14,
              -32555.6365,
              -80.4405017
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 10/85, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "n-C8H18(g)",
    "formula": "C8H18",
    "phase": "g",
    "cas": "111-65-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -208.75,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 467.349,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              12.524548,
              -0.0101018826,
              0.00022199261,
              -2.84863722e-07,
              1.12410138e-10,
              -29843.4398,
              -19.7109989
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              20.9430708,
              0.0441691018,
              -1.53261633e-05,
              2.30544803e-09,
              -1.29765727e-13,
              -35575.5088,
              -81.0637726
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 4/85, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "C6H6(g)",
    "formula": "C6H6",
    "phase": "g",
    "cas": "71-43-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 82.88,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 269.157,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              0.504818632,
              0.0185020642,
              7.38345881e-05,
              -1.18135741e-07,
              5.07210429e-11,
              8552.47913,
              21.6412893
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              11.0809576,
              0.0207176746,
              -7.52145991e-06,
              1.22320984e-09,
              -7.36091279e-14,
              4306.41035,
              -40.041331
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 6/01, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "C7H8(g)",
    "formula": "C7H8",
    "phase": "g",
    "cas": "108-88-3",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 50.17,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 320.186,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.61200102,
              0.0211179855,
              8.53239986e-05,
              -1.32568501e-07,
              5.59411406e-11,
              4096.5482,
              20.2969771
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              12.939361,
              0.0266922277,
              -9.68422041e-06,
              1.57392386e-09,
              -9.46671699e-14,
              -676.971149,
              -46.7249759
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 1/93, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "C2H5OH(g)",
    "formula": "C2H5OH",
    "phase": "g",
    "cas": "64-17-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -234.949,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 280.591,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.8586957,
              -0.0037401726,
              6.9555378e-05,
              -8.8654796e-08,
              3.5168835e-11,
              -29996.132,
              4.8018545
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              6.5624365,
              0.015204222,
              -5.3896795e-06,
              8.6225011e-10,
              -5.1289787e-14,
              -31525.621,
              -9.4730202
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 8/88, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "CH3OCH3(g)",
    "formula": "CH3OCH3",
    "phase": "g",
    "cas": "115-10-6",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -184.053,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 267.38,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.3055789,
              -0.002142116,
              5.3085949e-05,
              -6.2313044e-08,
              2.3072397e-11,
              -23979.91,
              0.71342649
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.648388,
              0.01633822,
              -5.8680268e-06,
              9.4683462e-10,
              -5.6650169e-14,
              -25100.722,
              -5.9623267
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 9/88, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "CH3COCH3(g)",
    "formula": "CH3COCH3",
    "phase": "g",
    "cas": "67-64-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -214.813,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 295.658,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.5563892,
              -0.00283863547,
              7.05722951e-05,
              -8.78130984e-08,
              3.40290951e-11,
              -27832.5393,
              2.31960221
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              7.29796974,
              0.0175656913,
              -6.31678065e-06,
              1.02025553e-09,
              -6.10903592e-14,
              -29536.8927,
              -12.7591704
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record ATcT A, NASA-7 200-6000 K; no NIST-JANAF table"
  },
  {
    "key": "CH3COOH(g)",
    "formula": "CH3COOH",
    "phase": "g",
    "cas": "64-19-7",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -432.247,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 283.471,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.78950201,
              0.00999941719,
              3.42572245e-05,
              -5.09031329e-08,
              2.06222185e-11,
              -53475.2488,
              14.1053123
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              7.67084601,
              0.0135152602,
              -5.25874333e-06,
              8.93184479e-10,
              -5.53180543e-14,
              -55756.097,
              -15.4677315
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 6/00 (monomer), NASA-7 200-6000 K; no NIST-JANAF table; real acetic-acid vapour is partly dimerised near its boiling point"
  },
  {
    "key": "CH2O(g)",
    "formula": "CH2O",
    "phase": "g",
    "cas": "50-00-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -115.897,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 218.763,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.7937036,
              -0.0099081518,
              3.7321459e-05,
              -3.7927902e-08,
              1.3177015e-11,
              -14308.955,
              0.60288702
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.1694807,
              0.0061932742,
              -2.2505981e-06,
              3.6598245e-10,
              -2.201541e-14,
              -14478.425,
              6.0423533
            ]
          }
        }
      ]
    },
    "note": "Cp, S: Burcat-Ruscic 2005 record L 8/88, NASA-7 200-6000 K (Cp within 0.67 % and H-H298 within 0.27 kJ/mol of NIST-JANAF table C-061 per the reference self-check); ΔfH°: NIST-JANAF -115.897 kJ/mol preferred over the record's -108.579 kJ/mol (a different, older heat-of-formation evaluation, 7.3 kJ/mol apart)"
  },
  {
    "key": "C2H4O(g)",
    "formula": "C2H4O",
    "phase": "g",
    "cas": "75-21-8",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -52.634,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 242.869,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.7590532,
              -0.009441218,
              8.0309721e-05,
              -1.0080788e-07,
              4.0039921e-11,
              -7560.8143,
              7.8497475
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.4887641,
              0.01204619,
              -4.3336931e-06,
              7.0028311e-10,
              -4.1949088e-14,
              -9180.4251,
              -7.0799605
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 8/88, NASA-7 200-6000 K; Cp deviates from NIST-JANAF table C-129 by up to -1.32 % (at 400 K) and H-H298 by up to 0.41 kJ/mol per the reference self-check"
  },
  {
    "key": "HF(g)",
    "formula": "HF",
    "phase": "g",
    "cas": "7664-39-3",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -273.298,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 173.774,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.481148,
              0.00021334107,
              -6.898528e-07,
              8.5966803e-10,
              -2.3549086e-13,
              -33913.127,
              1.0259567
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.9204304,
              0.00085796097,
              -1.6306811e-07,
              1.3780358e-11,
              -2.9021238e-16,
              -33685.882,
              4.2144066
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record RUS 89, NASA-7 200-6000 K; against NIST-JANAF table F-005 Cp deviates by up to 2.53 % and H-H298 by up to 1.54 kJ/mol at 6000 K per the reference self-check (close agreement at process temperatures)"
  },
  {
    "key": "CH3Cl(g)",
    "formula": "CH3Cl",
    "phase": "g",
    "cas": "74-87-3",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -83.68,
    "hf298Source": "nist-janaf-1998",
    "s298JPerMolK": 234.395,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.96611858,
              -0.00505692958,
              4.02006413e-05,
              -4.82781901e-08,
              1.8672158e-11,
              -11072.9538,
              5.70446517
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.97883949,
              0.00791729094,
              -2.81713927e-06,
              4.51715634e-10,
              -2.69086155e-14,
              -11676.1879,
              2.58272676
            ]
          }
        }
      ]
    },
    "note": "Cp, S: Burcat-Ruscic 2005 record tpis 91, NASA-7 200-6000 K (Cp within 0.53 % of NIST-JANAF table C-063 per the reference self-check); ΔfH°: NIST-JANAF -83.68 kJ/mol preferred over the record's -81.87 kJ/mol (a different heat-of-formation evaluation)"
  },
  {
    "key": "COS(g)",
    "formula": "COS",
    "phase": "g",
    "cas": "463-58-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -138.399,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 231.474,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.4625321,
              0.011947992,
              -1.379437e-05,
              8.0707736e-09,
              -1.8327653e-12,
              -17803.987,
              10.792556
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.2392,
              0.0024100584,
              -9.6064522e-07,
              1.7778347e-10,
              -1.2235704e-14,
              -18480.455,
              -3.0910517
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record J 3/61, NASA-7 300-5000 K (read down to 298.15 K); ΔfH° from the polynomial (the printed ΔfH°/R of this record is corrupt), within 0.01 kJ/mol of NIST-JANAF table C-094"
  },
  {
    "key": "CS2(g)",
    "formula": "CS2",
    "phase": "g",
    "cas": "75-15-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 116.699,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 237.888,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.17230835,
              0.0181263444,
              -3.0808009e-05,
              2.65150564e-08,
              -8.9280152e-12,
              12806.3739,
              11.9826948
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.94905043,
              0.0016928815,
              -6.74333823e-07,
              1.16460519e-10,
              -6.37363519e-15,
              12017.1256,
              -6.17036834
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 6/95, NASA-7 200-6000 K; against NIST-JANAF table C-099 Cp deviates by up to 9.3 % at 6000 K and H-H298 by up to -2.46 kJ/mol at 4300 K per the reference self-check: prefer another source above about 3000 K"
  },
  {
    "key": "O(g)",
    "formula": "O",
    "phase": "g",
    "cas": "17778-80-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 249.174,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 161.06,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
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
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.54363697,
              -2.73162486e-05,
              -4.1902952e-09,
              4.95481845e-12,
              -4.79553694e-16,
              29226.012,
              4.92229457
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 1/90, NASA-7 200-6000 K (the GRI-Mech 3.0 set, same low-T coefficients, stops at 3500 K); Cp within 0.1 % of NIST-JANAF table O-001"
  },
  {
    "key": "H2SO4(g)",
    "formula": "H2SO4",
    "phase": "g",
    "cas": "7664-93-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -732.696,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 311.331,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.53388173,
              0.0310347679,
              -4.10421795e-05,
              2.95752341e-08,
              -8.81459071e-12,
              -90545.9072,
              3.93961412
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              11.3355392,
              0.00560829109,
              -1.94574192e-06,
              3.07136054e-10,
              -1.81109544e-14,
              -92108.7435,
              -29.6094003
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record T 8/03, NASA-7 200-6000 K"
  },
  {
    "key": "HNO3(g)",
    "formula": "HNO3",
    "phase": "g",
    "cas": "7697-37-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -134.299,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 266.814,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.69329154,
              0.0190167702,
              -8.25176697e-06,
              -6.06113827e-09,
              4.65236978e-12,
              -17419.8909,
              17.1839838
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              8.03098942,
              0.00446958589,
              -1.72459491e-06,
              2.91556153e-10,
              -1.80102702e-14,
              -19313.8183,
              -16.2616537
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record T 8/03, NASA-7 200-6000 K"
  },
  {
    "key": "SO(g)",
    "formula": "SO",
    "phase": "g",
    "cas": "13827-32-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 5.008,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 221.943,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.1490233,
              0.0011839347,
              2.5740686e-06,
              -4.4443419e-09,
              1.8735159e-12,
              -404.07571,
              8.31987915
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.0142873,
              0.00027022817,
              8.2896667e-08,
              -3.4323741e-11,
              3.1121444e-15,
              -710.51956,
              3.49973505
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record J 6/77, NASA-7 300-5000 K (read down to 298.15 K)"
  },
  {
    "key": "O3(g)",
    "formula": "O3",
    "phase": "g",
    "cas": "10028-15-6",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 141.799,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 239.009,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.40738221,
              0.00205379063,
              1.38486052e-05,
              -2.23311542e-08,
              9.76073226e-12,
              15864.4979,
              8.2824758
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              12.3302914,
              -0.0119324783,
              7.98741278e-06,
              -1.77194552e-09,
              1.26075824e-13,
              12675.5831,
              -40.8823374
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 5/90, NASA-7 200-6000 K"
  },
  {
    "key": "HO2(g)",
    "formula": "HO2",
    "phase": "g",
    "cas": "3170-83-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 12.552,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 229.104,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.301788,
              -0.0047490201,
              2.1157953e-05,
              -2.4275961e-08,
              9.292067e-12,
              294.80876,
              3.716701
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.1722659,
              0.0018812098,
              -3.4629297e-07,
              1.9468516e-11,
              1.7609153e-16,
              61.818851,
              2.9577974
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 5/89, NASA-7 200-6000 K"
  },
  {
    "key": "CH3CHO(g)",
    "formula": "CH3CHO",
    "phase": "g",
    "cas": "75-07-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -166.189,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 263.951,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.7294595,
              -0.0031932858,
              4.7534921e-05,
              -5.7458611e-08,
              2.1931112e-11,
              -21572.878,
              4.1030159
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.4041108,
              0.011723059,
              -4.2263137e-06,
              6.8372451e-10,
              -4.0984863e-14,
              -22593.122,
              -3.4807917
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 8/88, NASA-7 200-6000 K"
  },
  {
    "key": "1-C4H8(g)",
    "formula": "C4H8",
    "phase": "g",
    "cas": "106-98-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -0.544,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 307.921,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.181138,
              0.03085338,
              5.0865247e-06,
              -2.4654888e-08,
              1.1110193e-11,
              -1790.4004,
              21.075639
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.0535841,
              0.034350507,
              -1.5883197e-05,
              3.3089662e-09,
              -2.5361045e-13,
              -2139.7231,
              15.55636
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record T 6/83, NASA-7 300-5000 K (read down to 298.15 K)"
  },
  {
    "key": "c-C6H12(g)",
    "formula": "C6H12",
    "phase": "g",
    "cas": "110-82-7",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -123.3,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 297.389,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4.04357527,
              -0.00619608335,
              0.000176622274,
              -2.22968474e-07,
              8.63668578e-11,
              -16920.3544,
              8.52527441
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              13.214597,
              0.0358243434,
              -1.32110852e-05,
              2.17202521e-09,
              -1.31730622e-13,
              -22809.2102,
              -55.3518322
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record g 6/90, NASA-7 200-6000 K"
  },
  {
    "key": "Ne(g)",
    "formula": "Ne",
    "phase": "g",
    "cas": "7440-01-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 0.0,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 146.329,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.5,
              0.0,
              0.0,
              0.0,
              0.0,
              -745.37498,
              3.3553227
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.5,
              0.0,
              0.0,
              0.0,
              0.0,
              -745.375,
              3.3553227
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record L 10/90, NASA-7 200-6000 K"
  },
  {
    "key": "C(cr)",
    "formula": "C",
    "phase": "cr",
    "cas": "7782-42-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 0.0,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 5.734,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              -0.31087207,
              0.0044035369,
              1.9039412e-06,
              -6.3854697e-09,
              2.9896425e-12,
              -108.65079,
              1.1138295
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.4556924,
              0.0017170638,
              -6.975841e-07,
              1.3528316e-10,
              -9.6764905e-15,
              -695.12804,
              -8.5256842
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 4/83, NASA-7 200-5000 K; Cp within 0.47 % and H-H298 within 0.05 kJ/mol of NIST-JANAF table C-002 per the reference self-check; reference state of carbon (ΔfH° = 0)"
  },
  {
    "key": "S(cr)",
    "formula": "S",
    "phase": "cr",
    "cas": "7704-34-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 0.0,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 32.07,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 368.3,
          "cp": {
            "form": "nasa7",
            "a": [
              0.371369513,
              0.0153373501,
              -3.35441107e-05,
              2.89249499e-08,
              0.0,
              -553.21385,
              -1.59624498
            ]
          }
        },
        {
          "TminK": 368.3,
          "TmaxK": 388.36,
          "cp": {
            "form": "nasa7",
            "a": [
              2.08033146,
              0.00244137555,
              0.0,
              0.0,
              0.0,
              -685.306695,
              -8.60715486
            ]
          }
        },
        {
          "TminK": 388.36,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              -38.449885,
              0.25707392,
              -0.00055555365,
              5.1325813e-07,
              -1.725365e-10,
              4293.3552,
              167.53043
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 5000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.39062,
              0.00071182514,
              -3.9087832e-07,
              8.7327456e-11,
              -6.8755181e-15,
              -633.5844,
              -14.788307
            ]
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 368.3,
        "dHKJPerMol": 0.400998,
        "label": "S(cr,beta)",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 388.36,
        "dHKJPerMol": 1.726768,
        "label": "S(l)",
        "source": "burcat-ruscic-2005"
      }
    ],
    "note": "Burcat-Ruscic 2005 records tpis 89 (rhombic alpha to 368.3 K, monoclinic beta to 388.36 K) and J 9/77 (liquid to 5000 K), chained with the transition enthalpies the records imply; the liquid record is an older fit: its Cp differs from NIST-JANAF by up to 4.2 % between 430 and 700 K (the lambda transition near 432 K is not resolved). Above 388.36 K the entry is the liquid although keyed (cr)"
  },
  {
    "key": "Al(cr)",
    "formula": "Al",
    "phase": "cr",
    "cas": "7429-90-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -0.0,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 28.3,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 933.61,
          "cp": {
            "form": "nasa7",
            "a": [
              1.01040191,
              0.0120769743,
              -2.62083556e-05,
              2.64282413e-08,
              -9.01916513e-12,
              -654.454196,
              -5.00471254
            ]
          }
        },
        {
          "TminK": 933.61,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.81862551,
              0.0,
              0.0,
              0.0,
              0.0,
              -94.9651808,
              -17.5229704
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.81862551,
              0.0,
              0.0,
              0.0,
              0.0,
              -94.9651808,
              -17.5229704
            ]
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 933.61,
        "dHKJPerMol": 10.699939,
        "label": "AL(L) REF ELEMENT",
        "source": "burcat-ruscic-2005"
      }
    ],
    "note": "Burcat-Ruscic 2005 records CODA 89A, crystal 200-933.61 K chained to the liquid (933.61-6000 K) with the melting enthalpy the records imply; the crystal Cp deviates from NIST-JANAF table Al-001 by up to 2.9 % near 900 K per the reference self-check. Above 933.61 K the entry is the liquid although keyed (cr)"
  },
  {
    "key": "MgCO3(cr)",
    "formula": "MgCO3",
    "phase": "cr",
    "cas": "546-93-0",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -1111.709,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 65.862,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              1.3491924,
              0.036934112,
              -4.4492952e-05,
              3.1815906e-08,
              -9.75453e-12,
              -135416.85,
              -9.0618732
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record J 12/66, NASA-7 300-1000 K (read down to 298.15 K); Cp within 0.21 % of NIST-JANAF table C-079 per the reference self-check. Magnesite decomposes to MgO + CO2 well below 1000 K when CO2 is removed"
  },
  {
    "key": "NH4NO3(cr)",
    "formula": "NH4NO3",
    "phase": "cr",
    "cas": "6484-52-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -365.598,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 150.809,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 256.2,
          "TmaxK": 298.15,
          "cp": {
            "form": "nasa7",
            "a": [
              -129.54715,
              1.81866355,
              -0.00894421296,
              2.02563499e-05,
              -1.74314429e-08,
              -38965.5352,
              467.032673
            ]
          }
        },
        {
          "TminK": 298.15,
          "TmaxK": 305.38,
          "cp": {
            "form": "nasa7",
            "a": [
              5.86564933,
              0.0364302887,
              0.0,
              0.0,
              0.0,
              -47339.3723,
              -26.1436244
            ]
          }
        },
        {
          "TminK": 305.38,
          "TmaxK": 357.25,
          "cp": {
            "form": "nasa7",
            "a": [
              7.23313821,
              0.0233327039,
              0.0,
              0.0,
              0.0,
              -46941.7938,
              -29.2985169
            ]
          }
        },
        {
          "TminK": 357.25,
          "TmaxK": 399.0,
          "cp": {
            "form": "nasa7",
            "a": [
              60.2320522,
              -0.176799354,
              0.0,
              4.52882972e-07,
              0.0,
              -54786.3351,
              -275.780621
            ]
          }
        },
        {
          "TminK": 399.0,
          "TmaxK": 442.85,
          "cp": {
            "form": "nasa7",
            "a": [
              12.9532588,
              0.015635317,
              0.0,
              0.0,
              0.0,
              -47837.0128,
              -58.4851082
            ]
          }
        },
        {
          "TminK": 442.85,
          "TmaxK": 900.0,
          "cp": {
            "form": "nasa7",
            "a": [
              19.3637388,
              0.0,
              0.0,
              0.0,
              0.0,
              -48437.933,
              -89.0300528
            ]
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 305.38,
        "dHKJPerMol": 1.699991,
        "label": "NH4NO3(III)",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 357.25,
        "dHKJPerMol": 1.349993,
        "label": "NH4NO3(II)",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 399.0,
        "dHKJPerMol": 4.434974,
        "label": "NH4NO3(I)",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 442.85,
        "dHKJPerMol": 5.859967,
        "label": "NH4NO3(L)",
        "source": "burcat-ruscic-2005"
      }
    ],
    "note": "Burcat-Ruscic 2005 records G 10/02: crystal IV (to 305.38 K), III (to 357.25 K), II (to 399 K), I (to 442.85 K) and liquid to 900 K, chained with the transition enthalpies the records imply. Above 442.85 K the entry is the liquid although keyed (cr). Ammonium nitrate can decompose violently when heated, confined or contaminated: these data describe no decomposition; follow local codes and licensed engineering practice"
  },
  {
    "key": "CH3OH(l)",
    "formula": "CH3OH",
    "phase": "l",
    "cas": "67-56-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -238.909,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 127.269,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 175.61,
          "TmaxK": 390.0,
          "cp": {
            "form": "nasa7",
            "a": [
              12.1754995,
              -0.0419673868,
              0.000142400437,
              -1.60999972e-07,
              2.14794684e-10,
              -31540.1115,
              -46.882736
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 12/84 (TRC data), NASA-7 175.61-390 K (saturated liquid)"
  },
  {
    "key": "C2H5OH(l)",
    "formula": "C2H5OH",
    "phase": "l",
    "cas": "64-17-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -277.508,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 160.099,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 159.0,
          "TmaxK": 390.0,
          "cp": {
            "form": "nasa7",
            "a": [
              7.56212501,
              0.0605917882,
              -0.000459385998,
              1.40542149e-06,
              -1.08065385e-09,
              -36533.1092,
              -31.7590773
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 12/84 (TRC data), NASA-7 159-390 K (saturated liquid)"
  },
  {
    "key": "n-C7H16(l)",
    "formula": "C7H16",
    "phase": "l",
    "cas": "142-82-5",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -224.349,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 328.558,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 182.58,
          "TmaxK": 380.0,
          "cp": {
            "form": "nasa7",
            "a": [
              69.8058594,
              -0.630275879,
              0.00308862295,
              -6.40121661e-06,
              5.09570496e-09,
              -36823.8127,
              -261.086466
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 10/75, NASA-7 182.58-380 K (saturated liquid)"
  },
  {
    "key": "n-C8H18(l)",
    "formula": "C8H18",
    "phase": "l",
    "cas": "111-65-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -250.259,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 361.068,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 216.37,
          "TmaxK": 400.0,
          "cp": {
            "form": "nasa7",
            "a": [
              93.7687938,
              -0.858272117,
              0.00394831328,
              -7.58573055e-06,
              5.41151011e-09,
              -42354.6607,
              -354.100158
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 10/84, NASA-7 216.37-400 K (saturated liquid)"
  },
  {
    "key": "C6H6(l)",
    "formula": "C6H6",
    "phase": "l",
    "cas": "71-43-2",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 49.08,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 173.439,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 278.68,
          "TmaxK": 500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              63.6157438,
              -0.599984368,
              0.00266582586,
              -5.05955979e-06,
              3.63735942e-09,
              -1666.78,
              -243.685622
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 10/86, NASA-7 278.68-500 K (saturated liquid)"
  },
  {
    "key": "C7H8(l)",
    "formula": "C7H8",
    "phase": "l",
    "cas": "108-88-3",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 12.18,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 221.029,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 178.15,
          "TmaxK": 500.0,
          "cp": {
            "form": "nasa7",
            "a": [
              29.3676022,
              -0.194722686,
              0.000974773096,
              -1.91472689e-06,
              1.48097019e-09,
              -4163.18442,
              -112.019966
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record P 10/86, NASA-7 178.15-500 K (saturated liquid); its ΔfH° (12.18 kJ/mol) is within 0.2 kJ/mol of the NIST WebBook value"
  },
  {
    "key": "H2SO4(l)",
    "formula": "H2SO4",
    "phase": "l",
    "cas": "7664-93-9",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -814.006,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 156.906,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 300.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              9.9421525,
              0.021786369,
              3.4974458e-06,
              -3.3548857e-09,
              1.1699586e-12,
              -101859.79,
              -44.398695
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record J 9/77 (NIST-JANAF), NASA-7 300-1000 K (read down to 298.15 K); within 0.02 % of NIST-JANAF table H-075 per the reference self-check. Hot concentrated acid is corrosive and releases SO3: follow local codes"
  },
  {
    "key": "H2O2(l)",
    "formula": "H2O2",
    "phase": "l",
    "cas": "7722-84-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -187.777,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 109.603,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 272.74,
          "TmaxK": 423.0,
          "cp": {
            "form": "nasa7",
            "a": [
              10.7394015,
              2.99630938e-05,
              -7.13210384e-08,
              7.09751854e-11,
              -2.53463009e-14,
              -25787.1465,
              -48.0128553
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record RUS /89, NASA-7 272.74 K up; the record is printed to 6000 K but describes the liquid only, so the range is cut at 423 K (the normal boiling point, from memory). Concentrated peroxide decomposes exothermically: follow local codes"
  },
  {
    "key": "CH3OH(g)",
    "formula": "CH3OH",
    "phase": "g",
    "cas": "67-56-1",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": -200.999,
    "hf298Source": "burcat-ruscic-2005",
    "s298JPerMolK": 240.654,
    "s298Source": "burcat-ruscic-2005",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 200.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.65851051,
              -0.0162983419,
              6.91938156e-05,
              -7.58372926e-08,
              2.8042755e-11,
              -25611.9736,
              -0.897330508
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              3.52726795,
              0.0103178783,
              -3.62892944e-06,
              5.77448016e-10,
              -3.42182632e-14,
              -26002.8834,
              5.16758693
            ]
          }
        }
      ]
    },
    "note": "Burcat-Ruscic 2005 record T 06/02, NASA-7 200-6000 K; the default methanol vapour: its Cp(298.15 K) is 44.0 J/(mol K), close to the NIST-JANAF value (about 44.1, from memory), where the GRI-Mech 3.0 set gives 2.5 % less"
  },
  {
    "key": "Fe(cr)",
    "formula": "Fe",
    "phase": "cr",
    "cas": "7439-89-6",
    "dataset": "burcat-ruscic-2005",
    "hf298KJPerMol": 0,
    "hf298Source": "common practice",
    "s298JPerMolK": 27.321,
    "s298Source": "nist-webbook",
    "heatCapacity": {
      "source": "burcat-ruscic-2005",
      "ranges": [
        {
          "TminK": 298,
          "TmaxK": 600.0,
          "cp": {
            "form": "shomate",
            "A": 18.42868,
            "B": 24.64301,
            "C": -8.91372,
            "D": 9.664706,
            "E": -0.012643,
            "F": -6.573022,
            "G": 42.51488,
            "H": 0.0
          },
          "source": "nist-webbook"
        },
        {
          "TminK": 600.0,
          "TmaxK": 1000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              2.41337476,
              -0.00157780744,
              2.14701339e-05,
              -3.80171438e-08,
              2.20426984e-11,
              -774.380998,
              -10.6560296
            ]
          }
        },
        {
          "TminK": 1000.0,
          "TmaxK": 1042.0,
          "cp": {
            "form": "nasa7",
            "a": [
              4690.80173,
              -9.90659991,
              0.00269427446,
              5.54445321e-06,
              -3.01659823e-09,
              -1415475.86,
              -24929.4387
            ]
          }
        },
        {
          "TminK": 1042.0,
          "TmaxK": 1184.0,
          "cp": {
            "form": "nasa7",
            "a": [
              659.678809,
              -1.14058217,
              0.000496306997,
              0.0,
              0.0,
              -252106.802,
              -3656.65236
            ]
          }
        },
        {
          "TminK": 1184.0,
          "TmaxK": 1665.0,
          "cp": {
            "form": "nasa7",
            "a": [
              61.010999,
              -0.160945061,
              0.000168369493,
              -7.74563702e-08,
              1.3309129e-11,
              -16533.5454,
              -313.710668
            ]
          }
        },
        {
          "TminK": 1665.0,
          "TmaxK": 1809.0,
          "cp": {
            "form": "nasa7",
            "a": [
              -435.904698,
              0.768489448,
              -0.000446898892,
              8.67070913e-08,
              0.0,
              187925.534,
              2450.57619
            ]
          }
        },
        {
          "TminK": 1809.0,
          "TmaxK": 6000.0,
          "cp": {
            "form": "nasa7",
            "a": [
              5.53538332,
              0.0,
              0.0,
              0.0,
              0.0,
              -1274.28941,
              -29.4772271
            ]
          }
        }
      ]
    },
    "transitions": [
      {
        "TK": 1184.0,
        "dHKJPerMol": 0.899969,
        "label": "alpha-gamma",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 1665.0,
        "dHKJPerMol": 0.837005,
        "label": "gamma-delta",
        "source": "burcat-ruscic-2005"
      },
      {
        "TK": 1809.0,
        "dHKJPerMol": 13.806914,
        "label": "melting",
        "source": "burcat-ruscic-2005"
      }
    ],
    "note": "alpha iron to 600 K: the first range of the NIST WebBook Shomate fit of NIST-JANAF table Fe-004 (the Burcat-Ruscic alpha polynomial is 1.3 % high in Cp at 500 K); from 600 K the Burcat-Ruscic 2005 records J 3/78 (the NIST-JANAF reference-state table Fe-003): alpha to 1042 K, beta (paramagnetic bcc) to 1184 K, gamma to 1665 K, delta to 1809 K, liquid to 6000 K, chained with the transition enthalpies those records imply. The polynomials smooth the Cp peak at the Curie point (1042 K): Cp is 3.3 % under NIST-JANAF at 1000 K while H - H298 stays within 0.25 kJ/mol. Above 1809 K the entry is the liquid although keyed (cr); reference state of iron (ΔfH° = 0)"
  }
];
