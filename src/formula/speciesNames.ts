/**
 * The names of the built-in species: the one list of them. Each row gives a species key (with its
 * phase), the formula text of the species data, the name and the other names (aliases).
 *
 * Two layers read it. The built-in species library takes the `name` and `aliases` of its species
 * from here (src/species/data/builtInSpeciesData.ts; the data files themselves carry no names), so
 * `builtInLibrary().get("methane")` and the flame functions, `availableHeat` and `flueGasDewPoint`
 * find a species by these names; and {@link combustion} (layer 3, which may not import the species
 * library) reads fuel names with {@link speciesByName} when no `library` is given. A name therefore
 * means the same species everywhere. Names are matched case-insensitively; a name may carry a phase
 * (`"ethanol(l)"`). A mixture such as natural gas is not a species and has no row.
 *
 * Names are common usage (IUPAC names among the aliases where they differ); the formulas are those
 * of the species data, whose sources are in `SOURCES`.
 *
 * @module
 */
import { deepFreeze } from "../errors.js";
import type { Phase } from "./types.js";

/**
 * One named species: its key, formula text, phase, name and aliases.
 *
 * @category Formula
 */
export interface SpeciesName {
  /** Species key with its phase, as in the built-in library: `"CH4(g)"`, `"n-C4H10(g)"`. */
  readonly key: string;
  /** Formula text (no isomer prefix, no phase): `"CH4"`, `"C4H10"`. */
  readonly formula: string;
  /** Phase label of the key. */
  readonly phase: Phase;
  /** The name: `"methane"`. */
  readonly name: string;
  /** Other names: `["butane"]` for n-butane; empty when none. */
  readonly aliases: readonly string[];
}

/** key, formula text, name, aliases... — sorted by key. */
const ROWS: readonly (readonly string[])[] = [
  ["1-C4H8(g)", "C4H8", "1-butene", "but-1-ene"],
  ["Al(cr)", "Al", "aluminium", "aluminum"],
  ["Al2O3(cr)", "Al2O3", "corundum", "alumina", "aluminium oxide"],
  ["Ar(g)", "Ar", "argon"],
  ["C(cr)", "C", "graphite", "C(gr)", "C(s)", "carbon"],
  ["C2H2(g)", "C2H2", "acetylene", "ethyne"],
  ["C2H4(g)", "C2H4", "ethylene", "ethene"],
  ["C2H4O(g)", "C2H4O", "ethylene oxide", "oxirane"],
  ["C2H5OH(g)", "C2H5OH", "ethanol", "ethyl alcohol"],
  ["C2H5OH(l)", "C2H5OH", "ethanol", "ethyl alcohol"],
  ["C2H6(g)", "C2H6", "ethane"],
  ["C3H6(g)", "C3H6", "propylene", "propene"],
  ["C3H8(g)", "C3H8", "propane"],
  ["C6H6(g)", "C6H6", "benzene"],
  ["C6H6(l)", "C6H6", "benzene"],
  ["C7H8(g)", "C7H8", "toluene", "methylbenzene"],
  ["C7H8(l)", "C7H8", "toluene", "methylbenzene"],
  ["CH2O(g)", "CH2O", "formaldehyde", "methanal"],
  ["CH3CHO(g)", "CH3CHO", "acetaldehyde", "ethanal"],
  ["CH3COCH3(g)", "CH3COCH3", "acetone", "propanone"],
  ["CH3COCH3(l)", "CH3COCH3", "acetone", "propanone"],
  ["CH3COOH(g)", "CH3COOH", "acetic acid", "ethanoic acid"],
  ["CH3COOH(l)", "CH3COOH", "acetic acid", "ethanoic acid"],
  ["CH3Cl(g)", "CH3Cl", "chloromethane", "methyl chloride"],
  ["CH3OCH3(g)", "CH3OCH3", "dimethyl ether", "DME", "methoxymethane"],
  ["CH3OH(g)", "CH3OH", "methanol", "methyl alcohol"],
  ["CH3OH(l)", "CH3OH", "methanol", "methyl alcohol"],
  ["CH4(g)", "CH4", "methane"],
  ["CO(NH2)2(cr)", "CO(NH2)2", "urea", "carbamide"],
  ["CO(g)", "CO", "carbon monoxide"],
  ["CO2(g)", "CO2", "carbon dioxide"],
  ["COS(g)", "COS", "carbonyl sulfide", "carbon oxysulfide"],
  ["CS2(g)", "CS2", "carbon disulfide"],
  ["CS2(l)", "CS2", "carbon disulfide"],
  ["Ca(OH)2(cr)", "Ca(OH)2", "calcium hydroxide", "slaked lime", "portlandite"],
  ["CaCO3(cr)", "CaCO3", "calcite", "calcium carbonate", "limestone"],
  ["CaCl2(cr)", "CaCl2", "calcium chloride"],
  ["CaO(cr)", "CaO", "lime", "calcium oxide", "quicklime"],
  ["CaSO4(cr)", "CaSO4", "anhydrite", "calcium sulfate"],
  ["Cl2(g)", "Cl2", "chlorine"],
  ["Fe(cr)", "Fe", "iron"],
  ["Fe2O3(cr)", "Fe2O3", "hematite"],
  ["Fe3O4(cr)", "Fe3O4", "magnetite"],
  ["FeO(cr)", "FeO", "wustite", "iron(II) oxide", "ferrous oxide"],
  ["H(g)", "H", "atomic hydrogen"],
  ["H2(g)", "H2", "hydrogen"],
  ["H2O(g)", "H2O", "water vapor", "steam", "water"],
  ["H2O(l)", "H2O", "water", "liquid water"],
  ["H2O2(l)", "H2O2", "hydrogen peroxide"],
  ["H2S(g)", "H2S", "hydrogen sulfide"],
  ["H2SO4(g)", "H2SO4", "sulfuric acid"],
  ["H2SO4(l)", "H2SO4", "sulfuric acid"],
  ["HCN(g)", "HCN", "hydrogen cyanide"],
  ["HCl(g)", "HCl", "hydrogen chloride"],
  ["HF(g)", "HF", "hydrogen fluoride"],
  ["HNO3(g)", "HNO3", "nitric acid"],
  ["HNO3(l)", "HNO3", "nitric acid"],
  ["HO2(g)", "HO2", "hydroperoxyl radical"],
  ["He(g)", "He", "helium"],
  ["KCl(cr)", "KCl", "potassium chloride", "sylvite"],
  ["MgCO3(cr)", "MgCO3", "magnesite", "magnesium carbonate"],
  ["MgO(cr)", "MgO", "periclase", "magnesium oxide"],
  ["N(g)", "N", "atomic nitrogen"],
  ["N2(g)", "N2", "nitrogen"],
  ["N2O(g)", "N2O", "nitrous oxide"],
  ["NH3(g)", "NH3", "ammonia"],
  ["NH4Cl(cr)", "NH4Cl", "ammonium chloride", "sal ammoniac"],
  ["NH4NO3(cr)", "NH4NO3", "ammonium nitrate"],
  ["NO(g)", "NO", "nitric oxide", "nitrogen monoxide"],
  ["NO2(g)", "NO2", "nitrogen dioxide"],
  ["Na2CO3(cr)", "Na2CO3", "sodium carbonate", "soda ash"],
  ["Na2SO4(cr)", "Na2SO4", "sodium sulfate", "thenardite"],
  ["NaCl(cr)", "NaCl", "halite", "sodium chloride"],
  ["NaHCO3(cr)", "NaHCO3", "sodium bicarbonate", "sodium hydrogen carbonate"],
  ["NaOH(cr)", "NaOH", "sodium hydroxide", "caustic soda"],
  ["NaOH(l)", "NaOH", "sodium hydroxide", "caustic soda"],
  ["Ne(g)", "Ne", "neon"],
  ["O(g)", "O", "atomic oxygen"],
  ["O2(g)", "O2", "oxygen"],
  ["O3(g)", "O3", "ozone"],
  ["OH(g)", "OH", "hydroxyl radical"],
  ["S(cr)", "S", "sulfur", "rhombic sulfur"],
  ["SO(g)", "SO", "sulfur monoxide"],
  ["SO2(g)", "SO2", "sulfur dioxide"],
  ["SO3(g)", "SO3", "sulfur trioxide"],
  ["SiO2(cr)", "SiO2", "quartz", "silica"],
  ["c-C6H12(g)", "C6H12", "cyclohexane"],
  ["i-C4H10(g)", "C4H10", "isobutane", "2-methylpropane"],
  ["n-C4H10(g)", "C4H10", "n-butane", "butane"],
  ["n-C5H12(g)", "C5H12", "n-pentane", "pentane"],
  ["n-C6H14(g)", "C6H14", "n-hexane", "hexane"],
  ["n-C7H16(g)", "C7H16", "n-heptane", "heptane"],
  ["n-C7H16(l)", "C7H16", "n-heptane", "heptane"],
  ["n-C8H18(g)", "C8H18", "n-octane", "octane"],
  ["n-C8H18(l)", "C8H18", "n-octane", "octane"],
];

const PHASE_SUFFIX = /^(.*)\(([a-z]+)\)$/;

/**
 * The named built-in species, one row per key, sorted by key (deeply frozen). The built-in library
 * has exactly these keys; its species carry exactly these names and aliases.
 *
 * @category Formula
 * @example
 * SPECIES_NAMES.find((r) => r.name === "propane")!.key // => "C3H8(g)"
 */
export const SPECIES_NAMES: readonly SpeciesName[] = /* @__PURE__ */ deepFreeze(
  ROWS.map(([key, formula, name, ...aliases]) => ({
    key: key!, formula: formula!, phase: PHASE_SUFFIX.exec(key!)![2] as Phase, name: name!, aliases,
  })),
);

let byName: Map<string, SpeciesName[]> | undefined;

/** lowercase name or alias → rows (built on first use). */
function nameIndex(): Map<string, SpeciesName[]> {
  if (byName === undefined) {
    const m = new Map<string, SpeciesName[]>();
    for (const row of SPECIES_NAMES) {
      for (const n of [row.name, ...row.aliases]) {
        const k = n.toLowerCase();
        const list = m.get(k);
        if (list === undefined) m.set(k, [row]);
        else if (!list.includes(row)) list.push(row);
      }
    }
    byName = m;
  }
  return byName;
}

/**
 * The named species a text names: by name or alias, case-insensitive (surrounding spaces ignored),
 * optionally with a phase (`"ethanol(l)"`; `(s)` and `(cr)` both mean a crystal), or by its key
 * (`"n-C4H10(g)"`). The same reading as the built-in library's look-up by key and name. Several rows come back when a name covers several
 * phases (`"water"`: `H2O(g)` and `H2O(l)`); none when the text names no species (formulas are not
 * names: read those with `parseFormula`).
 *
 * @param text - a name such as `"methane"`, `"Propane"`, `"n-butane"`, `"ethanol(l)"`, or a key
 * @returns the matching rows, sorted by key; empty when none matches
 * @category Formula
 * @example
 * speciesByName("methane").map((r) => r.key) // => ["CH4(g)"]
 * speciesByName("water").map((r) => r.key) // => ["H2O(g)", "H2O(l)"]
 * speciesByName("natural gas") // => []
 */
export function speciesByName(text: string): SpeciesName[] {
  if (typeof text !== "string") return [];
  const q = text.trim();
  const row = SPECIES_NAMES.find((r) => r.key === q);
  if (row !== undefined) return [row];
  const index = nameIndex();
  const whole = index.get(q.toLowerCase());
  // an alias written like a key ("C(gr)") names its species as it stands
  if (whole !== undefined && (whole.length === 1 || PHASE_SUFFIX.exec(q) === null)) return [...whole];
  const m = PHASE_SUFFIX.exec(q);
  if (m === null) return [];
  const label = m[2]!;
  const condensed = label === "s" || label === "cr";
  const rows = index.get(m[1]!.trim().toLowerCase()) ?? [];
  return rows.filter((r) => r.phase === label || (condensed && (r.phase === "cr" || r.phase === "s")));
}
