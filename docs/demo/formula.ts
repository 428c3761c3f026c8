/**
 * Demo section "formula": the raw-material list of an invented pilot plant — the Brackenfold pilot
 * water-treatment and catalyst line — turned into Hill formulas, molar masses and element mass fractions.
 * The materials and their roles are invented for this demo; the numbers come from the IUPAC atomic weights
 * built into rxtherm.
 */
import { ATOMIC_WEIGHTS_EDITION } from "../../src/formula/atomicWeights.js";
import { elementMassFractions } from "../../src/formula/elementMassFractions.js";
import { formatFormula } from "../../src/formula/formatFormula.js";
import { molarMass } from "../../src/formula/molarMass.js";
import { parseFormula } from "../../src/formula/parseFormula.js";
import { safeParseFormula } from "../../src/formula/safeParseFormula.js";

const RAW_MATERIALS: [string, string][] = [
  ["coagulant", "Al2(SO4)3·18H2O(s)"],
  ["pH trim", "Ca(OH)2(s)"],
  ["disinfectant", "NaOCl(aq)"],
  ["catalyst precursor", "Cu(NO3)2·3H2O(s)"],
  ["catalyst support", "Al2O3(s)"],
  ["oxygen-deficient oxide", "Fe0.947O(s)"],
  ["fuel for the dryer", "CH4(g)"],
  ["complexing agent", "K4[Fe(CN)6]·3H2O(s)"],
  ["heavy-water tracer", "D2O(l)"],
];

export function run(): void {
  console.log("## Formulas — Brackenfold pilot line raw materials (invented scenario)");
  console.log(`atomic weights: ${ATOMIC_WEIGHTS_EDITION}\n`);
  console.log("role                    as written                Hill formula          M (g/mol)   largest mass fraction");
  for (const [role, text] of RAW_MATERIALS) {
    const f = parseFormula(text);
    const hill = formatFormula(f, { phase: false });
    const m = molarMass(f);
    const w = elementMassFractions(f);
    const [topEl, topW] = Object.entries(w).sort((a, b) => b[1] - a[1])[0] as [string, number];
    console.log(
      `${role.padEnd(24)}${text.padEnd(26)}${hill.padEnd(22)}${m.toFixed(3).padStart(9)}   ${topEl} ${(100 * topW).toFixed(1)} %`,
    );
  }
  console.log("\nions in the treated water (electron mass neglected):");
  for (const ion of ["SO4^2-(aq)", "Ca2+(aq)", "NO3-(aq)", "Al3+(aq)"]) {
    const f = parseFormula(ion);
    console.log(`  ${ion.padEnd(12)} charge ${String(f.charge).padStart(2)}  M = ${molarMass(f).toFixed(3)} g/mol  canonical ${formatFormula(f)}`);
  }
  console.log("\na typo on the order form is caught with its column:");
  const typo = safeParseFormula("Cu(NO3)2·3H2o");
  if (!typo.success) console.log(`  ${typo.error.code}: ${typo.error.message.split("\n")[0]}`);
  const trap = parseFormula("CU(NO3)2");
  console.log(`case matters: "CU(NO3)2" is read as ${Object.keys(trap.elements).join(", ")} (carbon and uranium), M = ${molarMass(trap).toFixed(3)} g/mol`);
}
