/**
 * Demo section "reaction": oxidant dosing at an invented plant — the Harrowgate Mill effluent
 * plant — whose raw water carries dissolved iron(II) and hydrogen sulfide, plus the independent
 * reaction set of the mill's biogas reformer. The plant, its loads and dose margins are invented
 * for this demo; stoichiometry comes from exact balancing and molar masses from the IUPAC atomic
 * weights built into rxtherm.
 */
import { molarMass } from "../../src/formula/molarMass.js";
import { balanceReaction } from "../../src/reaction/balanceReaction.js";
import { checkBalance } from "../../src/reaction/checkBalance.js";
import { formatReaction } from "../../src/reaction/formatReaction.js";
import { independentReactions } from "../../src/reaction/independentReactions.js";
import { isRxthermError } from "../../src/errors.js";
import type { Reaction } from "../../src/reaction/types.js";

/** Coefficient of a species in a reaction (either side). */
function nu(r: Reaction, species: string): number {
  const t = [...r.reactants, ...r.products].find((x) => x.species === species);
  if (!t) throw new Error(`${species} not in reaction`);
  return t.coefficient;
}

export function run(): void {
  console.log("## Reactions — Harrowgate Mill effluent plant oxidant dosing (invented scenario)\n");

  // 1. permanganate oxidises iron(II) to iron(III) hydroxide near neutral pH
  const fe = balanceReaction("MnO4- + Fe2+ + H2O -> MnO2(s) + Fe(OH)3(s) + H+");
  console.log(`iron removal:     ${formatReaction(fe)}`);
  const feLoadKgPerH = 2.4; // invented: dissolved Fe in the raw water, kg/h
  const feMolPerH = (feLoadKgPerH * 1000) / molarMass("Fe");
  const kmno4KgPerH = ((feMolPerH * nu(fe, "MnO4-")) / nu(fe, "Fe2+")) * molarMass("KMnO4") / 1000;
  console.log(`  Fe load ${feLoadKgPerH} kg/h = ${feMolPerH.toFixed(1)} mol/h → KMnO4 ${kmno4KgPerH.toFixed(2)} kg/h (stoichiometric, before any dose margin)`);

  // 2. hydrogen peroxide against sulfide, per mole of H2S
  const s = balanceReaction("H2S + H2O2 -> S(s) + H2O", { per: "H2S" });
  console.log(`sulfide control:  ${formatReaction(s)}`);
  const h2sKgPerH = 0.35; // invented
  const h2o2KgPerH = ((h2sKgPerH / molarMass("H2S")) * nu(s, "H2O2")) * molarMass("H2O2");
  console.log(`  H2S ${h2sKgPerH} kg/h → H2O2 (100 %) ${h2o2KgPerH.toFixed(3)} kg/h`);

  // 3. the permanganate half-reaction, with electrons and charge
  console.log(`half-reaction:    ${formatReaction(balanceReaction("MnO4- + H+ + e- -> MnO2(s) + H2O"))}`);

  // 4. a shift-log line with a typo, caught by checkBalance
  const typo = "MnO4- + 3 Fe2+ + 7 H2O -> MnO2(s) + 3 Fe(OH)3(s) + 4 H+";
  const c = checkBalance(typo);
  console.log(`shift-log check:  "${typo}"`);
  console.log(`  balanced: ${c.balanced}; residuals ${JSON.stringify(c.residuals)}, charge ${c.charge}`);

  // 5. an ambiguous species list is reported, then pinned down
  try {
    balanceReaction("H2S + O2 -> S(s) + SO2 + H2O");
  } catch (e) {
    if (isRxthermError(e, "AMBIGUOUS_BALANCE")) {
      console.log(`flare H2S:        ambiguous — independent balances: ${(e.details.reactions as string[]).join("; ")}`);
    }
  }
  const flare = balanceReaction("H2S + O2 -> S(s) + SO2 + H2O", { fixed: { "S(s)": 2, SO2: 1 } });
  console.log(`  with S : SO2 fixed at 2 : 1 → ${formatReaction(flare)}`);

  // 6. the biogas reformer: which reactions are independent?
  // components first (CO, H2, H2O): each other species gets one reaction that forms it from them
  const species = ["CO", "H2", "H2O", "CO2", "CH4", "C(s)"];
  const set = independentReactions(species);
  console.log(`\nbiogas reformer species ${species.join(", ")}: ${set.length} independent reactions (components CO, H2, H2O)`);
  for (const r of set) console.log(`  ${formatReaction(r)}`);
  console.log("\nScreening stoichiometry only: real dosing needs jar tests, and chemical handling follows");
  console.log("local codes and licensed engineering practice.");
}
