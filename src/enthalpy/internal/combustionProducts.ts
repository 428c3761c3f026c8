/**
 * Private: the complete-combustion products of a C/H/N/O/S species — CO2(g), H2O(l) or H2O(g),
 * SO2(g), N2(g) — with exact coefficients per mol of fuel, and the O2 it takes.
 *
 * @module
 * @internal
 */
import { RxthermError } from "../../errors.js";
import { rationalAdd, rationalFromNumber, rationalMul, rationalSub, rational, type Rational } from "../../numeric/rational.js";

/** Product keys of complete combustion. */
export const CO2_KEY = "CO2(g)";
export const SO2_KEY = "SO2(g)";
export const N2_KEY = "N2(g)";
export const O2_KEY = "O2(g)";
export const WATER_LIQUID_KEY = "H2O(l)";
export const WATER_GAS_KEY = "H2O(g)";

/** Elements a fuel may contain (noble gases are inert and pass through). */
const NOBLE = new Set(["He", "Ne", "Ar", "Kr", "Xe"]);

export interface CombustionProducts {
  /** Product key → exact mol per mol of fuel. */
  readonly products: ReadonlyMap<string, Rational>;
  /** O2 taken per mol of fuel (negative when the fuel carries more O than its products hold). */
  readonly oxygen: Rational;
  /** True when the species is already a combustion product or inert (nothing to burn). */
  readonly inert: boolean;
}

/**
 * Complete combustion of one mol of a species with these element counts.
 * @param water - phase of the product water: `"l"` (higher heating value) or `"g"` (lower)
 */
export function combustionProducts(fn: string, key: string, elements: Readonly<Record<string, number>>, water: "l" | "g"): CombustionProducts {
  const count = (el: string): Rational => rationalFromNumber(elements[el] ?? 0);
  for (const el of Object.keys(elements)) {
    if (!["C", "H", "N", "O", "S"].includes(el) && !NOBLE.has(el)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} handles fuels of C, H, N, O and S only; ${key} contains ${el}`, { species: key, element: el });
    }
  }
  const half = rational(1n, 2n);
  const c = count("C");
  const h = count("H");
  const n = count("N");
  const o = count("O");
  const s = count("S");
  const products = new Map<string, Rational>();
  if (c.num !== 0n) products.set(CO2_KEY, c);
  if (h.num !== 0n) products.set(water === "l" ? WATER_LIQUID_KEY : WATER_GAS_KEY, rationalMul(h, half));
  if (s.num !== 0n) products.set(SO2_KEY, s);
  if (n.num !== 0n) products.set(N2_KEY, rationalMul(n, half));
  // O atoms in products: 2 C + H/2 + 2 S; O2 = (that − O in fuel)/2
  const oProducts = rationalAdd(rationalAdd(rationalMul(c, rational(2n)), rationalMul(h, half)), rationalMul(s, rational(2n)));
  const oxygen = rationalMul(rationalSub(oProducts, o), half);
  const formulaOnly = Object.keys(elements).filter((e) => !NOBLE.has(e));
  const inert = formulaOnly.length === 0
    || isProductFormula(elements)
    || (c.num === 0n && h.num === 0n && s.num === 0n); // N2, O2, ... nothing oxidisable
  return { products, oxygen, inert };
}

/** CO2, H2O, SO2, N2, O2 (any phase). */
function isProductFormula(e: Readonly<Record<string, number>>): boolean {
  const keys = Object.keys(e).sort().join(",");
  return (keys === "C,O" && e.C === 1 && e.O === 2)
    || (keys === "H,O" && e.H === 2 && e.O === 1)
    || (keys === "O,S" && e.S === 1 && e.O === 2);
}
