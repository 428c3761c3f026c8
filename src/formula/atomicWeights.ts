/**
 * Standard atomic weights of the 118 elements, and the atomic masses of the hydrogen isotopes
 * deuterium (D) and tritium (T), as used by {@link molarMass}.
 *
 * Source: IUPAC 2013 standard atomic weights (J. Meija et al., "Atomic weights of the elements
 * 2013 (IUPAC Technical Report)", Pure Appl. Chem. 88 (2016) 265–291): the abridged values of
 * Table 2 (five significant figures) and, for elements whose standard atomic weight is an
 * interval (H, Li, B, C, N, O, Mg, Si, S, Cl, Br, Tl), the conventional value of Table 3.
 * One later CIAAW revision is applied: the conventional atomic weight of argon, 39.95 (CIAAW 2017;
 * the 2013 abridged value was 39.948). No other later revision is applied. The resulting
 * edition is named in {@link ATOMIC_WEIGHTS_EDITION}.
 *
 * Elements with no stable isotope and no characteristic terrestrial isotopic composition
 * (Tc, Pm, Po, At, Rn, Fr, Ra, Ac, Np and Z ≥ 93) have no standard atomic weight; they carry the
 * mass number of their longest-lived (or conventional reference) isotope instead and are marked
 * with `kind: "massNumber"`. For the superheavy elements (Z ≥ 103) published compilations differ
 * on that isotope; the values here are those of the cross-checked reference compilation, except
 * lawrencium (266, the longest-lived isotope known; older tables give 262 — from memory).
 *
 * Element names follow IUPAC spelling (aluminium, caesium, sulfur).
 *
 * @module
 */
import { RxthermError, deepFreeze, describeValue } from "../errors.js";

/**
 * What an {@link ElementData.atomicWeight} is:
 * `"standard"` — an abridged or conventional IUPAC standard atomic weight;
 * `"massNumber"` — the element has no standard atomic weight, the number is the mass number of its
 * longest-lived (or reference) isotope;
 * `"isotope"` — the atomic mass of one nuclide (deuterium, tritium).
 *
 * @category Formula
 */
export type AtomicWeightKind = "standard" | "massNumber" | "isotope";

/**
 * One row of the atomic-weight table.
 *
 * @category Formula
 */
export interface ElementData {
  /** Atomic number (1 for D and T). */
  readonly Z: number;
  /** Symbol as written in formulas, case-sensitive (`"Co"` cobalt). */
  readonly symbol: string;
  /** IUPAC name in English, lowercase. */
  readonly name: string;
  /** Atomic weight (relative atomic mass, dimensionless), numerically the molar mass in g/mol. */
  readonly atomicWeight: number;
  /** What the number is; see {@link AtomicWeightKind}. */
  readonly kind: AtomicWeightKind;
  /** The later CIAAW revision applied to this value, when one is. */
  readonly revision?: string;
  /** Caveat about the value (disagreeing compilations, source). */
  readonly note?: string;
}

/**
 * The edition of the atomic weights in {@link ATOMIC_WEIGHTS}.
 *
 * @category Formula
 * @example
 * ATOMIC_WEIGHTS_EDITION // => "IUPAC 2013 abridged/conventional standard atomic weights, with the CIAAW 2017 conventional value for Ar"
 */
export const ATOMIC_WEIGHTS_EDITION =
  "IUPAC 2013 abridged/conventional standard atomic weights, with the CIAAW 2017 conventional value for Ar";

/**
 * The 118 elements in order of atomic number (`ATOMIC_WEIGHTS[Z - 1]`), with the atomic weight
 * used for molar masses. See the module notes for the source and edition.
 *
 * @category Formula
 * @example
 * ATOMIC_WEIGHTS[5] // => { Z: 6, symbol: "C", name: "carbon", atomicWeight: 12.011, kind: "standard" }
 * @see J. Meija et al., Atomic weights of the elements 2013, Pure Appl. Chem. 88 (2016) 265–291
 */
export const ATOMIC_WEIGHTS: readonly ElementData[] = /* @__PURE__ */ deepFreeze([
  { Z: 1, symbol: "H", name: "hydrogen", atomicWeight: 1.008, kind: "standard" },
  { Z: 2, symbol: "He", name: "helium", atomicWeight: 4.0026, kind: "standard" },
  { Z: 3, symbol: "Li", name: "lithium", atomicWeight: 6.94, kind: "standard" },
  { Z: 4, symbol: "Be", name: "beryllium", atomicWeight: 9.0122, kind: "standard" },
  { Z: 5, symbol: "B", name: "boron", atomicWeight: 10.81, kind: "standard" },
  { Z: 6, symbol: "C", name: "carbon", atomicWeight: 12.011, kind: "standard" },
  { Z: 7, symbol: "N", name: "nitrogen", atomicWeight: 14.007, kind: "standard" },
  { Z: 8, symbol: "O", name: "oxygen", atomicWeight: 15.999, kind: "standard" },
  { Z: 9, symbol: "F", name: "fluorine", atomicWeight: 18.998, kind: "standard" },
  { Z: 10, symbol: "Ne", name: "neon", atomicWeight: 20.18, kind: "standard" },
  { Z: 11, symbol: "Na", name: "sodium", atomicWeight: 22.99, kind: "standard" },
  { Z: 12, symbol: "Mg", name: "magnesium", atomicWeight: 24.305, kind: "standard" },
  { Z: 13, symbol: "Al", name: "aluminium", atomicWeight: 26.982, kind: "standard" },
  { Z: 14, symbol: "Si", name: "silicon", atomicWeight: 28.085, kind: "standard" },
  { Z: 15, symbol: "P", name: "phosphorus", atomicWeight: 30.974, kind: "standard" },
  { Z: 16, symbol: "S", name: "sulfur", atomicWeight: 32.06, kind: "standard" },
  { Z: 17, symbol: "Cl", name: "chlorine", atomicWeight: 35.45, kind: "standard" },
  { Z: 18, symbol: "Ar", name: "argon", atomicWeight: 39.95, kind: "standard", revision: "CIAAW 2017 (conventional value; IUPAC 2013 abridged value was 39.948)" },
  { Z: 19, symbol: "K", name: "potassium", atomicWeight: 39.098, kind: "standard" },
  { Z: 20, symbol: "Ca", name: "calcium", atomicWeight: 40.078, kind: "standard" },
  { Z: 21, symbol: "Sc", name: "scandium", atomicWeight: 44.956, kind: "standard" },
  { Z: 22, symbol: "Ti", name: "titanium", atomicWeight: 47.867, kind: "standard" },
  { Z: 23, symbol: "V", name: "vanadium", atomicWeight: 50.942, kind: "standard" },
  { Z: 24, symbol: "Cr", name: "chromium", atomicWeight: 51.996, kind: "standard" },
  { Z: 25, symbol: "Mn", name: "manganese", atomicWeight: 54.938, kind: "standard" },
  { Z: 26, symbol: "Fe", name: "iron", atomicWeight: 55.845, kind: "standard" },
  { Z: 27, symbol: "Co", name: "cobalt", atomicWeight: 58.933, kind: "standard" },
  { Z: 28, symbol: "Ni", name: "nickel", atomicWeight: 58.693, kind: "standard" },
  { Z: 29, symbol: "Cu", name: "copper", atomicWeight: 63.546, kind: "standard" },
  { Z: 30, symbol: "Zn", name: "zinc", atomicWeight: 65.38, kind: "standard" },
  { Z: 31, symbol: "Ga", name: "gallium", atomicWeight: 69.723, kind: "standard" },
  { Z: 32, symbol: "Ge", name: "germanium", atomicWeight: 72.63, kind: "standard" },
  { Z: 33, symbol: "As", name: "arsenic", atomicWeight: 74.922, kind: "standard" },
  { Z: 34, symbol: "Se", name: "selenium", atomicWeight: 78.971, kind: "standard" },
  { Z: 35, symbol: "Br", name: "bromine", atomicWeight: 79.904, kind: "standard" },
  { Z: 36, symbol: "Kr", name: "krypton", atomicWeight: 83.798, kind: "standard" },
  { Z: 37, symbol: "Rb", name: "rubidium", atomicWeight: 85.468, kind: "standard" },
  { Z: 38, symbol: "Sr", name: "strontium", atomicWeight: 87.62, kind: "standard" },
  { Z: 39, symbol: "Y", name: "yttrium", atomicWeight: 88.906, kind: "standard" },
  { Z: 40, symbol: "Zr", name: "zirconium", atomicWeight: 91.224, kind: "standard" },
  { Z: 41, symbol: "Nb", name: "niobium", atomicWeight: 92.906, kind: "standard" },
  { Z: 42, symbol: "Mo", name: "molybdenum", atomicWeight: 95.95, kind: "standard" },
  { Z: 43, symbol: "Tc", name: "technetium", atomicWeight: 97, kind: "massNumber" },
  { Z: 44, symbol: "Ru", name: "ruthenium", atomicWeight: 101.07, kind: "standard" },
  { Z: 45, symbol: "Rh", name: "rhodium", atomicWeight: 102.91, kind: "standard" },
  { Z: 46, symbol: "Pd", name: "palladium", atomicWeight: 106.42, kind: "standard" },
  { Z: 47, symbol: "Ag", name: "silver", atomicWeight: 107.87, kind: "standard" },
  { Z: 48, symbol: "Cd", name: "cadmium", atomicWeight: 112.41, kind: "standard" },
  { Z: 49, symbol: "In", name: "indium", atomicWeight: 114.82, kind: "standard" },
  { Z: 50, symbol: "Sn", name: "tin", atomicWeight: 118.71, kind: "standard" },
  { Z: 51, symbol: "Sb", name: "antimony", atomicWeight: 121.76, kind: "standard" },
  { Z: 52, symbol: "Te", name: "tellurium", atomicWeight: 127.6, kind: "standard" },
  { Z: 53, symbol: "I", name: "iodine", atomicWeight: 126.9, kind: "standard" },
  { Z: 54, symbol: "Xe", name: "xenon", atomicWeight: 131.29, kind: "standard" },
  { Z: 55, symbol: "Cs", name: "caesium", atomicWeight: 132.91, kind: "standard" },
  { Z: 56, symbol: "Ba", name: "barium", atomicWeight: 137.33, kind: "standard" },
  { Z: 57, symbol: "La", name: "lanthanum", atomicWeight: 138.91, kind: "standard" },
  { Z: 58, symbol: "Ce", name: "cerium", atomicWeight: 140.12, kind: "standard" },
  { Z: 59, symbol: "Pr", name: "praseodymium", atomicWeight: 140.91, kind: "standard" },
  { Z: 60, symbol: "Nd", name: "neodymium", atomicWeight: 144.24, kind: "standard" },
  { Z: 61, symbol: "Pm", name: "promethium", atomicWeight: 145, kind: "massNumber" },
  { Z: 62, symbol: "Sm", name: "samarium", atomicWeight: 150.36, kind: "standard" },
  { Z: 63, symbol: "Eu", name: "europium", atomicWeight: 151.96, kind: "standard" },
  { Z: 64, symbol: "Gd", name: "gadolinium", atomicWeight: 157.25, kind: "standard" },
  { Z: 65, symbol: "Tb", name: "terbium", atomicWeight: 158.93, kind: "standard" },
  { Z: 66, symbol: "Dy", name: "dysprosium", atomicWeight: 162.5, kind: "standard" },
  { Z: 67, symbol: "Ho", name: "holmium", atomicWeight: 164.93, kind: "standard" },
  { Z: 68, symbol: "Er", name: "erbium", atomicWeight: 167.26, kind: "standard" },
  { Z: 69, symbol: "Tm", name: "thulium", atomicWeight: 168.93, kind: "standard" },
  { Z: 70, symbol: "Yb", name: "ytterbium", atomicWeight: 173.05, kind: "standard" },
  { Z: 71, symbol: "Lu", name: "lutetium", atomicWeight: 174.97, kind: "standard" },
  { Z: 72, symbol: "Hf", name: "hafnium", atomicWeight: 178.49, kind: "standard" },
  { Z: 73, symbol: "Ta", name: "tantalum", atomicWeight: 180.95, kind: "standard" },
  { Z: 74, symbol: "W", name: "tungsten", atomicWeight: 183.84, kind: "standard" },
  { Z: 75, symbol: "Re", name: "rhenium", atomicWeight: 186.21, kind: "standard" },
  { Z: 76, symbol: "Os", name: "osmium", atomicWeight: 190.23, kind: "standard" },
  { Z: 77, symbol: "Ir", name: "iridium", atomicWeight: 192.22, kind: "standard" },
  { Z: 78, symbol: "Pt", name: "platinum", atomicWeight: 195.08, kind: "standard" },
  { Z: 79, symbol: "Au", name: "gold", atomicWeight: 196.97, kind: "standard" },
  { Z: 80, symbol: "Hg", name: "mercury", atomicWeight: 200.59, kind: "standard" },
  { Z: 81, symbol: "Tl", name: "thallium", atomicWeight: 204.38, kind: "standard" },
  { Z: 82, symbol: "Pb", name: "lead", atomicWeight: 207.2, kind: "standard" },
  { Z: 83, symbol: "Bi", name: "bismuth", atomicWeight: 208.98, kind: "standard" },
  { Z: 84, symbol: "Po", name: "polonium", atomicWeight: 209, kind: "massNumber" },
  { Z: 85, symbol: "At", name: "astatine", atomicWeight: 210, kind: "massNumber" },
  { Z: 86, symbol: "Rn", name: "radon", atomicWeight: 222, kind: "massNumber" },
  { Z: 87, symbol: "Fr", name: "francium", atomicWeight: 223, kind: "massNumber" },
  { Z: 88, symbol: "Ra", name: "radium", atomicWeight: 226, kind: "massNumber" },
  { Z: 89, symbol: "Ac", name: "actinium", atomicWeight: 227, kind: "massNumber" },
  { Z: 90, symbol: "Th", name: "thorium", atomicWeight: 232.04, kind: "standard" },
  { Z: 91, symbol: "Pa", name: "protactinium", atomicWeight: 231.04, kind: "standard" },
  { Z: 92, symbol: "U", name: "uranium", atomicWeight: 238.03, kind: "standard" },
  { Z: 93, symbol: "Np", name: "neptunium", atomicWeight: 237, kind: "massNumber" },
  { Z: 94, symbol: "Pu", name: "plutonium", atomicWeight: 244, kind: "massNumber" },
  { Z: 95, symbol: "Am", name: "americium", atomicWeight: 243, kind: "massNumber" },
  { Z: 96, symbol: "Cm", name: "curium", atomicWeight: 247, kind: "massNumber" },
  { Z: 97, symbol: "Bk", name: "berkelium", atomicWeight: 247, kind: "massNumber" },
  { Z: 98, symbol: "Cf", name: "californium", atomicWeight: 251, kind: "massNumber" },
  { Z: 99, symbol: "Es", name: "einsteinium", atomicWeight: 252, kind: "massNumber" },
  { Z: 100, symbol: "Fm", name: "fermium", atomicWeight: 257, kind: "massNumber" },
  { Z: 101, symbol: "Md", name: "mendelevium", atomicWeight: 258, kind: "massNumber" },
  { Z: 102, symbol: "No", name: "nobelium", atomicWeight: 259, kind: "massNumber" },
  { Z: 103, symbol: "Lr", name: "lawrencium", atomicWeight: 266, kind: "massNumber", note: "compilations differ: 262 in older tables; 266 is the longest-lived isotope known (from memory)" },
  { Z: 104, symbol: "Rf", name: "rutherfordium", atomicWeight: 267, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 105, symbol: "Db", name: "dubnium", atomicWeight: 270, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 106, symbol: "Sg", name: "seaborgium", atomicWeight: 269, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 107, symbol: "Bh", name: "bohrium", atomicWeight: 270, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 108, symbol: "Hs", name: "hassium", atomicWeight: 270, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 109, symbol: "Mt", name: "meitnerium", atomicWeight: 278, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 110, symbol: "Ds", name: "darmstadtium", atomicWeight: 281, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 111, symbol: "Rg", name: "roentgenium", atomicWeight: 281, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 112, symbol: "Cn", name: "copernicium", atomicWeight: 285, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 113, symbol: "Nh", name: "nihonium", atomicWeight: 286, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 114, symbol: "Fl", name: "flerovium", atomicWeight: 289, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 115, symbol: "Mc", name: "moscovium", atomicWeight: 289, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 116, symbol: "Lv", name: "livermorium", atomicWeight: 291, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 117, symbol: "Ts", name: "tennessine", atomicWeight: 293, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
  { Z: 118, symbol: "Og", name: "oganesson", atomicWeight: 294, kind: "massNumber", note: "mass number of a long-lived isotope; compilations differ for the superheavy elements" },
]);

/**
 * Deuterium (D) and tritium (T), accepted as element keys in formulas (`D2O`, `HTO`), with their
 * atomic masses in u (numerically g/mol): D 2.014102, T 3.016049 (atomic masses of ²H and ³H
 * rounded to 7 significant figures, Atomic Mass Evaluation — values written from memory).
 *
 * @category Formula
 * @example
 * HYDROGEN_ISOTOPES[0].atomicWeight // => 2.014102 (g/mol, deuterium)
 */
export const HYDROGEN_ISOTOPES: readonly ElementData[] = /* @__PURE__ */ deepFreeze([
  { Z: 1, symbol: "D", name: "deuterium", atomicWeight: 2.014102, kind: "isotope", note: "atomic mass of hydrogen-2 (Atomic Mass Evaluation, from memory)" },
  { Z: 1, symbol: "T", name: "tritium", atomicWeight: 3.016049, kind: "isotope", note: "atomic mass of hydrogen-3 (Atomic Mass Evaluation, from memory)" },
]);

/**
 * The table row of an element symbol (case-sensitive), or of `D` / `T`.
 *
 * Looks the symbol up in {@link ATOMIC_WEIGHTS} and {@link HYDROGEN_ISOTOPES}.
 *
 * @param symbol - element symbol, case-sensitive (`"Co"` is cobalt; `"CO"` is not a symbol)
 * @returns the row, whose `atomicWeight` is in g/mol
 * @throws {@link RxthermError} `UNKNOWN_ELEMENT` when the symbol is not one of the 118 elements, D or T
 *   (`details.symbol`, and `details.suggestion` when a change of case makes a symbol)
 * @category Formula
 * @example
 * elementData("Fe").atomicWeight // => 55.845
 * @see J. Meija et al., Atomic weights of the elements 2013, Pure Appl. Chem. 88 (2016) 265–291
 */
export function elementData(symbol: string): ElementData {
  const map = bySymbol();
  const row = map.get(symbol);
  if (row !== undefined) return row;
  const shown = typeof symbol === "string" ? symbol : describeValue(symbol);
  let suggestion: string | undefined;
  if (typeof symbol === "string" && symbol.length >= 1 && symbol.length <= 2) {
    const fixed = symbol.charAt(0).toUpperCase() + symbol.slice(1).toLowerCase();
    if (map.has(fixed)) suggestion = fixed;
  }
  throw new RxthermError(
    "UNKNOWN_ELEMENT",
    `elementData requires one of the 118 element symbols or D, T (case matters), got "${shown}"` +
      (suggestion !== undefined ? ` (did you mean "${suggestion}"?)` : ""),
    suggestion !== undefined ? { symbol: shown, suggestion } : { symbol: shown },
  );
}

let symbolMap: Map<string, ElementData> | undefined;

function bySymbol(): Map<string, ElementData> {
  if (symbolMap === undefined) {
    const m = new Map<string, ElementData>();
    for (const row of ATOMIC_WEIGHTS) m.set(row.symbol, row);
    for (const row of HYDROGEN_ISOTOPES) m.set(row.symbol, row);
    symbolMap = m;
  }
  return symbolMap;
}
