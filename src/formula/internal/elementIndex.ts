/**
 * Private fast element lookup for the formula scanner: symbol char codes → element index.
 * Index 0..117 is Z − 1; 118 is D (deuterium), 119 is T (tritium). Never re-exported.
 */
import { ATOMIC_WEIGHTS, HYDROGEN_ISOTOPES } from "../atomicWeights.js";

/** Number of element keys: 118 elements + D + T. */
export const ELEMENT_KEY_COUNT = 120;

/** Symbol of each index. */
export const INDEX_SYMBOLS: readonly string[] = /* @__PURE__ */ buildSymbols();

/** Atomic weight (g/mol) of each index. */
export const INDEX_WEIGHTS: readonly number[] = /* @__PURE__ */ buildWeights();

/**
 * Atomic weight of each index in integer micro-units (weight × 10⁶, exact: every tabulated weight has at most
 * six decimals), for exact integer sums of molar masses.
 */
export const INDEX_MICRO_WEIGHTS: readonly number[] = /* @__PURE__ */ buildMicroWeights();

/**
 * Lookup table: slot = (upper − 65) · 27 + (lower === 0 ? 0 : lower − 96), holding index + 1
 * (0 means "no such symbol").
 */
const TABLE: Uint8Array = /* @__PURE__ */ buildTable();

/**
 * Element index of a one-letter (`lower === 0`) or two-letter symbol from char codes, or −1.
 * `upper` must be in A–Z and `lower` 0 or in a–z.
 */
export function symbolIndex(upper: number, lower: number): number {
  return (TABLE[(upper - 65) * 27 + (lower === 0 ? 0 : lower - 96)] as number) - 1;
}

/** Element index of a symbol string, or −1. */
export function symbolIndexOf(symbol: string): number {
  if (symbol.length < 1 || symbol.length > 2) return -1;
  const u = symbol.charCodeAt(0);
  if (u < 65 || u > 90) return -1;
  if (symbol.length === 1) return symbolIndex(u, 0);
  const l = symbol.charCodeAt(1);
  if (l < 97 || l > 122) return -1;
  return symbolIndex(u, l);
}

function allRows() {
  return [...ATOMIC_WEIGHTS, ...HYDROGEN_ISOTOPES];
}

function buildSymbols(): string[] {
  return allRows().map((r) => r.symbol);
}

function buildWeights(): number[] {
  return allRows().map((r) => r.atomicWeight);
}

function buildMicroWeights(): number[] {
  return allRows().map((r) => Math.round(r.atomicWeight * 1e6));
}

function buildTable(): Uint8Array {
  const t = new Uint8Array(26 * 27);
  allRows().forEach((r, i) => {
    const u = r.symbol.charCodeAt(0);
    const l = r.symbol.length > 1 ? r.symbol.charCodeAt(1) : 0;
    t[(u - 65) * 27 + (l === 0 ? 0 : l - 96)] = i + 1;
  });
  return t;
}
