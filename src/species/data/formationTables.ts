/**
 * Built-in formation data for common fuels, solvents, process chemicals and minerals, written
 * from memory of the published tables (NBS 1982, CODATA 1989, NIST-JANAF, NIST WebBook) and
 * therefore marked with the source id `memory`: check them against the printed tables before
 * design use. Cp is a constant value at 298.15 K over a stated narrow range (graphite: a short table).
 *
 * @module
 */
import type { SpeciesEntryInput } from "../schema.js";

/** Species entries in the species-data file format (see `src/species/schema.ts`). */
export const FORMATION_TABLE_SPECIES: readonly SpeciesEntryInput[] = [
  {
    "key": "C(gr)",
    "formula": "C",
    "phase": "cr",
    "name": "graphite",
    "aliases": [
      "carbon"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 0,
    "hf298Source": "common practice",
    "s298JPerMolK": 5.74,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 298.15,
          "TmaxK": 1000,
          "cp": {
            "form": "tabulated",
            "temperaturesK": [
              298.15,
              400,
              500,
              600,
              700,
              800,
              900,
              1000
            ],
            "cpJPerMolK": [
              8.517,
              11.817,
              14.623,
              16.844,
              18.537,
              19.827,
              20.824,
              21.61
            ]
          }
        }
      ]
    },
    "note": "reference state of carbon (ΔfH° = 0 by definition); Cp interpolated linearly between table points recalled from the NIST-JANAF graphite table"
  },
  {
    "key": "n-C4H10(g)",
    "formula": "C4H10",
    "phase": "g",
    "name": "n-butane",
    "aliases": [
      "butane"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -126.15,
    "hf298Source": "memory",
    "s298JPerMolK": 310.23,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 97.45
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "i-C4H10(g)",
    "formula": "C4H10",
    "phase": "g",
    "name": "isobutane",
    "aliases": [
      "2-methylpropane"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -134.52,
    "hf298Source": "memory",
    "s298JPerMolK": 294.75,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 96.82
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "C3H6(g)",
    "formula": "C3H6",
    "phase": "g",
    "name": "propylene",
    "aliases": [
      "propene"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 20.42,
    "hf298Source": "memory",
    "s298JPerMolK": 267.05,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 63.89
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "C6H6(g)",
    "formula": "C6H6",
    "phase": "g",
    "name": "benzene",
    "dataset": "memory",
    "hf298KJPerMol": 82.93,
    "hf298Source": "memory",
    "s298JPerMolK": 269.31,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 81.67
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "C7H8(g)",
    "formula": "C7H8",
    "phase": "g",
    "name": "toluene",
    "aliases": [
      "methylbenzene"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 50.0,
    "hf298Source": "memory",
    "s298JPerMolK": 320.77,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 103.64
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "C2H5OH(g)",
    "formula": "C2H5OH",
    "phase": "g",
    "name": "ethanol",
    "aliases": [
      "ethyl alcohol"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -235.1,
    "hf298Source": "memory",
    "s298JPerMolK": 282.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 65.44
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "CH3COOH(g)",
    "formula": "CH3COOH",
    "phase": "g",
    "name": "acetic acid",
    "aliases": [
      "ethanoic acid"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -432.25,
    "hf298Source": "memory",
    "s298JPerMolK": 282.5,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 66.5
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K; the real vapour dimerises; these are ideal-gas monomer values"
  },
  {
    "key": "CH3COCH3(g)",
    "formula": "CH3COCH3",
    "phase": "g",
    "name": "acetone",
    "aliases": [
      "propanone"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -217.1,
    "hf298Source": "memory",
    "s298JPerMolK": 295.3,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 74.5
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "CH2O(g)",
    "formula": "CH2O",
    "phase": "g",
    "name": "formaldehyde",
    "aliases": [
      "methanal"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -108.57,
    "hf298Source": "memory",
    "s298JPerMolK": 218.77,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 35.4
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "HF(g)",
    "formula": "HF",
    "phase": "g",
    "name": "hydrogen fluoride",
    "dataset": "memory",
    "hf298KJPerMol": -271.1,
    "hf298Source": "memory",
    "s298JPerMolK": 173.779,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 29.133
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K; ideal-gas monomer values; the real vapour associates"
  },
  {
    "key": "CH3Cl(g)",
    "formula": "CH3Cl",
    "phase": "g",
    "name": "chloromethane",
    "aliases": [
      "methyl chloride"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -80.83,
    "hf298Source": "memory",
    "s298JPerMolK": 234.58,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 40.75
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "C2H4O(g)",
    "formula": "C2H4O",
    "phase": "g",
    "name": "ethylene oxide",
    "aliases": [
      "oxirane"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -52.63,
    "hf298Source": "memory",
    "s298JPerMolK": 242.53,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 47.91
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K"
  },
  {
    "key": "CH3OH(l)",
    "formula": "CH3OH",
    "phase": "l",
    "name": "methanol",
    "aliases": [
      "methyl alcohol"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -238.66,
    "hf298Source": "memory",
    "s298JPerMolK": 126.8,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 337,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 81.6
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–337 K); the error grows away from 298 K"
  },
  {
    "key": "C2H5OH(l)",
    "formula": "C2H5OH",
    "phase": "l",
    "name": "ethanol",
    "aliases": [
      "ethyl alcohol"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -277.69,
    "hf298Source": "memory",
    "s298JPerMolK": 160.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 351,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 111.46
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–351 K); the error grows away from 298 K"
  },
  {
    "key": "n-C8H18(l)",
    "formula": "C8H18",
    "phase": "l",
    "name": "n-octane",
    "aliases": [
      "octane"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -249.9,
    "hf298Source": "memory",
    "s298JPerMolK": 361.1,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 398,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 254.6
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–398 K); the error grows away from 298 K"
  },
  {
    "key": "n-C7H16(l)",
    "formula": "C7H16",
    "phase": "l",
    "name": "n-heptane",
    "aliases": [
      "heptane"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -224.4,
    "hf298Source": "memory",
    "s298JPerMolK": 328.57,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 371,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 224.72
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–371 K); the error grows away from 298 K"
  },
  {
    "key": "C6H6(l)",
    "formula": "C6H6",
    "phase": "l",
    "name": "benzene",
    "dataset": "memory",
    "hf298KJPerMol": 49.0,
    "hf298Source": "memory",
    "s298JPerMolK": 173.3,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 279,
          "TmaxK": 353,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 136.0
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (279–353 K); the error grows away from 298 K"
  },
  {
    "key": "C7H8(l)",
    "formula": "C7H8",
    "phase": "l",
    "name": "toluene",
    "aliases": [
      "methylbenzene"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 12.4,
    "hf298Source": "memory",
    "s298JPerMolK": 220.96,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 383,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 157.3
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–383 K); the error grows away from 298 K"
  },
  {
    "key": "CH3COOH(l)",
    "formula": "CH3COOH",
    "phase": "l",
    "name": "acetic acid",
    "aliases": [
      "ethanoic acid"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -484.5,
    "hf298Source": "memory",
    "s298JPerMolK": 159.8,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 290,
          "TmaxK": 391,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 124.3
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (290–391 K); the error grows away from 298 K"
  },
  {
    "key": "CH3COCH3(l)",
    "formula": "CH3COCH3",
    "phase": "l",
    "name": "acetone",
    "aliases": [
      "propanone"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -248.1,
    "hf298Source": "memory",
    "s298JPerMolK": 200.4,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 329,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 124.7
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–329 K); the error grows away from 298 K"
  },
  {
    "key": "H2SO4(l)",
    "formula": "H2SO4",
    "phase": "l",
    "name": "sulfuric acid",
    "dataset": "memory",
    "hf298KJPerMol": -813.989,
    "hf298Source": "memory",
    "s298JPerMolK": 156.904,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 284,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 138.91
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (284–400 K); the error grows away from 298 K; pure acid; mixing with water releases much heat (not included)"
  },
  {
    "key": "HNO3(l)",
    "formula": "HNO3",
    "phase": "l",
    "name": "nitric acid",
    "dataset": "memory",
    "hf298KJPerMol": -174.1,
    "hf298Source": "memory",
    "s298JPerMolK": 155.6,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 356,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 109.87
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–356 K); the error grows away from 298 K; pure acid"
  },
  {
    "key": "H2O2(l)",
    "formula": "H2O2",
    "phase": "l",
    "name": "hydrogen peroxide",
    "dataset": "memory",
    "hf298KJPerMol": -187.78,
    "hf298Source": "memory",
    "s298JPerMolK": 109.6,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 373.15,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 89.1
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–373.15 K); the error grows away from 298 K; pure peroxide; decomposes exothermically"
  },
  {
    "key": "CS2(l)",
    "formula": "CS2",
    "phase": "l",
    "name": "carbon disulfide",
    "dataset": "memory",
    "hf298KJPerMol": 89.7,
    "hf298Source": "memory",
    "s298JPerMolK": 151.34,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 319,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 75.7
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–319 K); the error grows away from 298 K"
  },
  {
    "key": "S(cr)",
    "formula": "S",
    "phase": "cr",
    "name": "sulfur",
    "aliases": [
      "rhombic sulfur"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 0,
    "hf298Source": "memory",
    "s298JPerMolK": 31.8,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 368,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 22.64
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–368 K); the error grows away from 298 K; rhombic; turns monoclinic near 368 K"
  },
  {
    "key": "Fe(cr)",
    "formula": "Fe",
    "phase": "cr",
    "name": "iron",
    "dataset": "memory",
    "hf298KJPerMol": 0,
    "hf298Source": "memory",
    "s298JPerMolK": 27.28,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 25.1
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "Al(cr)",
    "formula": "Al",
    "phase": "cr",
    "name": "aluminium",
    "aliases": [
      "aluminum"
    ],
    "dataset": "memory",
    "hf298KJPerMol": 0,
    "hf298Source": "memory",
    "s298JPerMolK": 28.33,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 24.35
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "CaCO3(cr)",
    "formula": "CaCO3",
    "phase": "cr",
    "name": "calcite",
    "aliases": [
      "calcium carbonate",
      "limestone"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -1206.92,
    "hf298Source": "memory",
    "s298JPerMolK": 92.9,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 81.88
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "CaO(cr)",
    "formula": "CaO",
    "phase": "cr",
    "name": "lime",
    "aliases": [
      "calcium oxide",
      "quicklime"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -635.09,
    "hf298Source": "memory",
    "s298JPerMolK": 39.75,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 42.8
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "Ca(OH)2(cr)",
    "formula": "Ca(OH)2",
    "phase": "cr",
    "name": "calcium hydroxide",
    "aliases": [
      "slaked lime",
      "portlandite"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -986.09,
    "hf298Source": "memory",
    "s298JPerMolK": 83.39,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 87.49
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "MgO(cr)",
    "formula": "MgO",
    "phase": "cr",
    "name": "periclase",
    "aliases": [
      "magnesium oxide"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -601.7,
    "hf298Source": "memory",
    "s298JPerMolK": 26.94,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 37.15
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "MgCO3(cr)",
    "formula": "MgCO3",
    "phase": "cr",
    "name": "magnesite",
    "aliases": [
      "magnesium carbonate"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -1095.8,
    "hf298Source": "memory",
    "s298JPerMolK": 65.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 75.52
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "Fe3O4(cr)",
    "formula": "Fe3O4",
    "phase": "cr",
    "name": "magnetite",
    "dataset": "memory",
    "hf298KJPerMol": -1118.4,
    "hf298Source": "memory",
    "s298JPerMolK": 146.4,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 143.43
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "NaCl(cr)",
    "formula": "NaCl",
    "phase": "cr",
    "name": "halite",
    "aliases": [
      "sodium chloride"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -411.153,
    "hf298Source": "memory",
    "s298JPerMolK": 72.13,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 50.5
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "CaSO4(cr)",
    "formula": "CaSO4",
    "phase": "cr",
    "name": "anhydrite",
    "aliases": [
      "calcium sulfate"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -1434.11,
    "hf298Source": "memory",
    "s298JPerMolK": 106.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 99.66
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "Na2CO3(cr)",
    "formula": "Na2CO3",
    "phase": "cr",
    "name": "sodium carbonate",
    "aliases": [
      "soda ash"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -1130.68,
    "hf298Source": "memory",
    "s298JPerMolK": 134.98,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 112.3
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "NaHCO3(cr)",
    "formula": "NaHCO3",
    "phase": "cr",
    "name": "sodium bicarbonate",
    "aliases": [
      "sodium hydrogen carbonate"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -950.81,
    "hf298Source": "memory",
    "s298JPerMolK": 101.7,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 87.61
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "NaOH(cr)",
    "formula": "NaOH",
    "phase": "cr",
    "name": "sodium hydroxide",
    "aliases": [
      "caustic soda"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -425.609,
    "hf298Source": "memory",
    "s298JPerMolK": 64.455,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 59.54
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  },
  {
    "key": "NH4NO3(cr)",
    "formula": "NH4NO3",
    "phase": "cr",
    "name": "ammonium nitrate",
    "dataset": "memory",
    "hf298KJPerMol": -365.56,
    "hf298Source": "memory",
    "s298JPerMolK": 151.08,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 305,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 139.3
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–305 K); the error grows away from 298 K; phase IV; changes crystal form near 305 K; an explosive hazard"
  },
  {
    "key": "CO(NH2)2(cr)",
    "formula": "CO(NH2)2",
    "phase": "cr",
    "name": "urea",
    "aliases": [
      "carbamide"
    ],
    "dataset": "memory",
    "hf298KJPerMol": -333.51,
    "hf298Source": "memory",
    "s298JPerMolK": 104.6,
    "s298Source": "memory",
    "heatCapacity": {
      "source": "memory",
      "ranges": [
        {
          "TminK": 273.15,
          "TmaxK": 400,
          "cp": {
            "form": "constant",
            "cpJPerMolK": 93.14
          }
        }
      ]
    },
    "note": "constant Cp°(298.15 K) over a narrow range (273.15–400 K); the error grows away from 298 K"
  }
];
