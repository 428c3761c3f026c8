// Deno smoke test (run by .ci/run, not by vitest): import the built ESM entry and use it.
// @ts-nocheck -- run by Deno against dist/, outside the project's tsc program
import { parseFormula, molarMass, balanceReaction } from "../../dist/index.js";

const f = parseFormula("CuSO4·5H2O");
if (f.elements.Cu !== 1 || f.elements.O !== 9) throw new Error("deno smoke: parseFormula failed");
const m = molarMass("H2O"); // IUPAC standard atomic weights: 2 × 1.008 + 15.999 = 18.015 g/mol
if (Math.abs(m - 18.015) > 1e-9) throw new Error(`deno smoke: molarMass(H2O) = ${m}`);
const r = balanceReaction("C3H8 + O2 -> CO2 + H2O");
const coeffs = [...r.reactants, ...r.products].map((t) => t.coefficient).join(" ");
if (coeffs !== "1 5 3 4") throw new Error(`deno smoke: balance gave ${coeffs}`);
console.log("deno smoke: ok", Deno.version.deno);
