/**
 * Reaction benchmarks: exact balancing of a 10-species redox equation and an independent
 * reaction set for 30 species over 6 elements, each beside a naive float64 baseline (the same
 * Gauss–Jordan elimination in doubles, then rounding to whole numbers) measured in this process.
 * Both sides include parsing the species with the library's own parser, so the ratio shows the
 * cost of exactness, not of parsing.
 */
import { measure, report, runPeer } from "./harness.js";
import { balanceReaction } from "../src/reaction/balanceReaction.js";
import { independentReactions } from "../src/reaction/independentReactions.js";
import { parseReaction } from "../src/reaction/parseReaction.js";
import { parseFormula } from "../src/formula/parseFormula.js";
import type { Formula } from "../src/formula/types.js";

// 10 species, 8 elements + charge: hexacyanoferrate(II) oxidised by permanganate in sulfuric acid.
const REDOX10 = "K4Fe(CN)6 + MnO4- + H2SO4 -> K+ + Fe3+ + Mn2+ + NO3- + CO2 + H2O + HSO4-";

// 9 species, 8 elements: hexacyanoferrate(II) oxidised by permanganate in sulfuric acid, neutral salts.
const REDOX9 = "K4Fe(CN)6 + KMnO4 + H2SO4 -> KHSO4 + Fe2(SO4)3 + MnSO4 + HNO3 + CO2 + H2O";

// 30 species over C, H, O, N, S, Cl
const SPECIES30 = [
  "CH4", "C2H6", "C2H4", "C2H2", "C3H8", "C3H6", "CO", "CO2", "H2", "H2O", "O2", "N2", "NH3", "NO", "NO2",
  "N2O", "HCN", "H2S", "SO2", "SO3", "COS", "CS2", "HCl", "Cl2", "COCl2", "CH3Cl", "CH3OH", "HCHO", "HCOOH", "NH4Cl",
];

/** Naive baseline: float64 Gauss–Jordan with partial pivoting and a tolerance, null space, then rounding. */
function floatNullSpace(matrix: number[][], n: number): number[][] {
  const a = matrix.map((r) => r.slice());
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < n && r < a.length; c++) {
    let p = r;
    for (let i = r + 1; i < a.length; i++) if (Math.abs(a[i]![c]!) > Math.abs(a[p]![c]!)) p = i;
    if (Math.abs(a[p]![c]!) < 1e-9) continue;
    [a[p], a[r]] = [a[r]!, a[p]!];
    const pv = a[r]![c]!;
    for (let j = 0; j < n; j++) a[r]![j]! /= pv;
    for (let i = 0; i < a.length; i++) {
      if (i === r) continue;
      const f = a[i]![c]!;
      if (f !== 0) for (let j = 0; j < n; j++) a[i]![j]! -= f * a[r]![j]!;
    }
    pivots.push(c);
    r++;
  }
  const free: number[] = [];
  for (let c = 0; c < n; c++) if (!pivots.includes(c)) free.push(c);
  return free.map((f) => {
    const x = new Array<number>(n).fill(0);
    x[f] = 1;
    pivots.forEach((pc, i) => (x[pc] = -a[i]![f]!));
    // round to whole numbers: smallest multiplier up to 1000 that makes every entry near-integer
    for (let k = 1; k <= 1000; k++) {
      if (x.every((v) => Math.abs(v * k - Math.round(v * k)) < 1e-6)) return x.map((v) => Math.round(v * k));
    }
    return x;
  });
}

function floatMatrix(formulas: Formula[], signs: number[]): number[][] {
  const els = [...new Set(formulas.flatMap((f) => Object.keys(f.elements)))];
  const rows = els.map((el) => formulas.map((f, j) => signs[j]! * (f.elements[el] ?? 0)));
  if (formulas.some((f) => f.charge !== 0)) rows.push(formulas.map((f, j) => signs[j]! * f.charge));
  return rows;
}

function floatBalance(text: string): number[] {
  const r = parseReaction(text);
  const fs = [...r.reactants, ...r.products].map((t) => t.formula);
  const signs = fs.map((_, j) => (j < r.reactants.length ? -1 : 1));
  const ns = floatNullSpace(floatMatrix(fs, signs), fs.length);
  return ns[0] ?? [];
}

function floatIndependent(species: string[]): number[][] {
  const fs = species.map((s) => parseFormula(s));
  return floatNullSpace(floatMatrix(fs, fs.map(() => 1)), fs.length);
}

export function run(): void {
  // sanity: both paths agree on the answer before timing
  const exact = balanceReaction(REDOX10);
  const exactCoeffs = [...exact.reactants, ...exact.products].map((t) => t.coefficient).join(",");
  const floatCoeffs = floatBalance(REDOX10).join(",");
  console.log(`10-species redox: exact ${exactCoeffs} | float baseline ${floatCoeffs}`);
  console.log(`30 species: ${independentReactions(SPECIES30).length} exact reactions, ${floatIndependent(SPECIES30).length} float`);

  const parseOnly = measure("parseReaction only", () => parseReaction(REDOX10));
  const base = measure("float64 elimination + rounding", () => floatBalance(REDOX10));
  const bal = measure("balanceReaction (exact)", () => balanceReaction(REDOX10));
  report("balance 10-species redox", bal, base, "median < 50 µs");
  report("  of which parsing", parseOnly, bal, "(share of the exact case)");

  const bal9 = measure("balanceReaction (exact)", () => balanceReaction(REDOX9));
  const base9 = measure("float64 elimination + rounding", () => floatBalance(REDOX9));
  report("balance 9-species redox", bal9, base9, "≥ 150× the computer-algebra peer below");
  // the same null space by a general-purpose computer-algebra system (bench/peers/nullspace.py)
  const r9 = parseReaction(REDOX9);
  const fs9 = [...r9.reactants, ...r9.products].map((t) => t.formula);
  const matrix = floatMatrix(fs9, fs9.map((_, j) => (j < r9.reactants.length ? -1 : 1)));
  const peer = runPeer<{ vector: number[]; usPerSolve: number }>("nullspace.py", { matrix, repeat: 100 });
  if (peer) {
    console.log(`  peer: computer-algebra null space ${peer.usPerSolve.toFixed(0)} µs (vector ${peer.vector.join(",")}) | library ${(bal9.medianNs / 1e3).toFixed(2)} µs | peer/library ${((peer.usPerSolve * 1e3) / bal9.medianNs).toFixed(0)}× | target ≥ 150×`);
  }

  const base30 = measure("float64 null space + rounding", () => floatIndependent(SPECIES30));
  const ind30 = measure("independentReactions (exact)", () => independentReactions(SPECIES30));
  report("independent reactions, 30 species / 6 elements", ind30, base30, "median < 1 ms");
}
