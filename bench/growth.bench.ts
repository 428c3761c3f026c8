/**
 * Cost-growth curves: how the time of a call grows with the size of the problem, with the fitted
 * exponent k of time ∝ sizeᵏ (least squares on log–log) and the end-to-end ratio.
 * - balanceReaction vs species count (an ash-forming fuel burnt to one oxide per element, one balance);
 * - independentReactions vs species count (6 elements, 80 → 320 species; target ≤ 5.5× end to end);
 * - solveExtents vs reaction count (alkane dehydrogenations, one conversion spec each);
 * - heatDuty vs stream size (gas species of the built-in set, 300 K in, 800 K out).
 * The equilibrium curve (time vs product species) is in flame.bench.ts.
 */
import { balanceReaction } from "../src/reaction/balanceReaction.js";
import { independentReactions } from "../src/reaction/independentReactions.js";
import { solveExtents } from "../src/extent/solveExtents.js";
import { heatDuty } from "../src/energy/heatDuty.js";
import { builtInLibrary } from "../src/species/builtInLibrary.js";
import { reportGrowth } from "./harness.js";

/** Oxide formed by each element of the invented ash-forming fuel (common practice: the usual oxides). */
const OXIDES: readonly [string, string][] = [
  ["Na", "Na2O"], ["K", "K2O"], ["Mg", "MgO"], ["Ca", "CaO"], ["Al", "Al2O3"], ["Si", "SiO2"], ["Fe", "Fe2O3"],
  ["Ti", "TiO2"], ["Zn", "ZnO"], ["Cu", "CuO"], ["B", "B2O3"], ["Ba", "BaO"], ["Li", "Li2O"], ["Sr", "SrO"],
  ["Mn", "MnO2"], ["Cr", "Cr2O3"], ["Ni", "NiO"], ["V", "V2O5"], ["Zr", "ZrO2"], ["Mo", "MoO3"], ["W", "WO3"],
  ["Sn", "SnO2"],
];

/** "fuel + O2 -> CO2 + H2O + N2 + SO2 + oxides" with `n` species in all (n ≥ 6). */
function ashFuelReaction(n: number): string {
  const metals = OXIDES.slice(0, n - 6);
  const fuel = "C12H20N2S" + metals.map(([el], i) => `${el}${(i % 3) + 1}`).join("");
  return `${fuel} + O2 -> CO2 + H2O + N2 + SO2${metals.map(([, ox]) => ` + ${ox}`).join("")}`;
}

/** n species over C, H, O, N, S, Cl: a few small molecules, then homologous series. */
function speciesSet(n: number): string[] {
  const out = ["CO2", "H2O", "N2", "SO2", "HCl", "O2"];
  for (let i = 1; out.length < n; i++) {
    for (const x of [`C${i}H${2 * i + 2}`, `C${i}H${2 * i}O`, `C${i}H${2 * i + 1}N`, `C${i}H${2 * i + 1}Cl`, `C${i}H${2 * i}S`]) {
      if (out.length < n) out.push(x);
    }
  }
  return out;
}

/** R dehydrogenations C(k)H(2k+2) -> C(k)H(2k) + H2, k = 2 … R+1, each alkane fed 1 mol/s, 40 % conversion. */
function dehydrogenation(R: number): () => unknown {
  const feed: Record<string, number> = {};
  const reactions: string[] = [];
  const specs: { of: string; conversion: number }[] = [];
  for (let k = 2; k < R + 2; k++) {
    const alkane = `C${k}H${2 * k + 2}`;
    feed[alkane] = 1;
    reactions.push(`${alkane} -> C${k}H${2 * k} + H2`);
    specs.push({ of: alkane, conversion: 0.4 });
  }
  return () => solveExtents({ feed, reactions, specs });
}

/** A gas stream of n built-in species heated from 300 K to 800 K (no reaction). */
function streamDuty(n: number): () => unknown {
  const lib = builtInLibrary();
  const gases = lib.all().filter((s) => s.phase === "g" && s.range[0] <= 300 && s.range[1] >= 800).map((s) => s.key);
  if (gases.length < n) throw new Error(`growth bench: only ${gases.length} gas species cover 300–800 K`);
  const flows: Record<string, number> = {};
  for (const key of gases.slice(0, n)) flows[key] = 1;
  return () => heatDuty({ inlet: { T: 300, flows }, outlet: { T: 800, flows } }).duty;
}

export function run(): void {
  reportGrowth("balanceReaction", [8, 12, 16, 20, 28], (n) => {
    const text = ashFuelReaction(n);
    return () => balanceReaction(text);
  }, "near linear in species (exponent ≲ 1.5)", "species");
  reportGrowth("independentReactions", [80, 160, 320], (n) => {
    const s = speciesSet(n);
    return () => independentReactions(s);
  }, "320/80 ≤ 5.5× (near linear)", "species");
  reportGrowth("solveExtents", [4, 8, 16, 32], dehydrogenation, "near linear to quadratic in reactions", "reactions");
  const available = builtInLibrary().all().filter((s) => s.phase === "g" && s.range[0] <= 300 && s.range[1] >= 800).length;
  const sizes = [5, 10, 20, 40].filter((n) => n <= available);
  reportGrowth("heatDuty", sizes, streamDuty, "linear in stream size", "species");
}
