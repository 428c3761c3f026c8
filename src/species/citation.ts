import { RxthermError, describeValue } from "../errors.js";

/**
 * The source registry: id → full citation, for every source id a built-in species value carries.
 * User data files bring their own `sources` block and may also refer to these ids.
 *
 * `memory` marks values written from memory of the published tables (to be checked against the
 * printed source before design use); `common practice` marks facts of the trade with no single source
 * (e.g. ΔfH° = 0 for an element in its reference state).
 *
 * @category Species data
 * @example
 * SOURCES["codata-1989"] // => "J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, Hemisphere Publishing, New York (1989)."
 */
export const SOURCES: Readonly<Record<string, string>> = /* @__PURE__ */ Object.freeze({
  "nist-janaf-1998":
    "M. W. Chase Jr., NIST-JANAF Thermochemical Tables, Fourth Edition, Journal of Physical and Chemical Reference Data, Monograph 9 (1998).",
  "nist-webbook":
    "P. J. Linstrom and W. G. Mallard (eds.), NIST Chemistry WebBook, NIST Standard Reference Database Number 69, National Institute of Standards and Technology, Gaithersburg MD: Shomate equation coefficients and ΔfH°(298.15 K) (gas-phase fits derived from NIST-JANAF, 4th ed., 1998).",
  "gri-mech-3.0":
    "G. P. Smith, D. M. Golden, M. Frenklach, N. W. Moriarty, B. Eiteneer, M. Goldenberg, C. T. Bowman, R. K. Hanson, S. Song, W. C. Gardiner Jr., V. V. Lissianski, Z. Qin, GRI-Mech 3.0, Gas Research Institute (1999): thermodynamic data file thermo30.dat (NASA 7-coefficient polynomials).",
  "codata-1989":
    "J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, Hemisphere Publishing, New York (1989).",
  "nbs-1982":
    "D. D. Wagman, W. H. Evans, V. B. Parker, R. H. Schumm, I. Halow, S. M. Bailey, K. L. Churney, R. L. Nuttall, The NBS tables of chemical thermodynamic properties, Journal of Physical and Chemical Reference Data 11, Supplement 2 (1982).",
  "burcat-ruscic-2005":
    "A. Burcat and B. Ruscic, Third Millennium Ideal Gas and Condensed Phase Thermochemical Database for Combustion with Updates from Active Thermochemical Tables, Argonne National Laboratory report ANL-05/20 and Technion report TAE 960 (2005 edition): NASA 7-coefficient polynomials.",
  "jacobs-kerrick-krupka-1981":
    "G. K. Jacobs, D. M. Kerrick, K. M. Krupka, The high-temperature heat capacity of natural calcite (CaCO3) (1981): least-squares Cp equation fitted to DSC data from 350 to 775 K and joined to low-temperature data, valid 298-775 K.",
  "robie-russell-robinson-hemingway-1989":
    "R. A. Robie, S. Russell-Robinson, B. S. Hemingway, Heat capacities and entropies from 8 to 1000 K of langbeinite, anhydrite and of gypsum to 325 K, Thermochimica Acta 139 (1989) 67-81.",
  "perry-2008":
    "D. W. Green and R. H. Perry (eds.), Perry's Chemical Engineers' Handbook, 8th ed., McGraw-Hill, New York (2008): Table 2-153, heat capacities of inorganic and organic liquids.",
  memory:
    "Written from memory of the published tables (NIST-JANAF 1998, NBS 1982, CODATA 1989, NIST Chemistry WebBook, IAPWS-95 for water); not checked against the printed source: verify before design use.",
  "common practice": "A fact of the trade with no single source (e.g. ΔfH° = 0 for an element in its reference state).",
});

/**
 * The full citation of a source id from the built-in registry {@link SOURCES}.
 *
 * @param id - a source id such as `"nist-janaf-1998"`, `"gri-mech-3.0"`, `"memory"`
 * @returns the full citation text
 * @throws RxthermError `INVALID_ARGUMENT` when the id is not in the registry (details `{ id, known }`)
 * @category Species data
 * @example
 * citation("codata-1989") // => "J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, Hemisphere Publishing, New York (1989)."
 * @see {@link Library.citation} for the sources of user data files
 */
export function citation(id: string): string {
  if (typeof id === "string" && Object.prototype.hasOwnProperty.call(SOURCES, id)) return SOURCES[id]!;
  throw new RxthermError("INVALID_ARGUMENT", `citation does not know the source id ${describeValue(id)}`, {
    id: describeValue(id), known: Object.keys(SOURCES),
  });
}
