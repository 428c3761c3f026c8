/**
 * Species batch evaluation (issue 9): `enthalpyBatch`, `cpBatch` and `entropyBatch` of a built-in
 * species over a sorted Float64Array, each beside a hand-written loop of ONE Shomate range with its
 * coefficients in locals (no range checks, no range selection), measured in the same process in
 * alternating rounds. Target: within 1.5× of the hand loop for sorted temperatures.
 *
 * Data: N2(g), NIST Chemistry WebBook Shomate set (three ranges, 100–6000 K), as in the built-in library.
 */
import { paired, report } from "./harness.js";
import { species } from "../src/species/species.js";

const N = 4096;

/** N sorted temperatures spread over [lo, hi] (fixed LCG seed). */
function sortedTemperatures(lo: number, hi: number): Float64Array {
  const ts = new Float64Array(N);
  let s = 12345;
  for (let i = 0; i < N; i++) {
    s = (s * 1103515245 + 12345) >>> 0;
    ts[i] = lo + ((hi - lo) * s) / 2 ** 32;
  }
  return ts.sort();
}

// N2 Shomate 500–2000 K (NIST Chemistry WebBook): the coefficients of the one range the hand loops use
const A = 19.50583, B = 19.88705, C = -8.598535, D = 1.369784, E = 0.527601;

/** H° = ΔfH° + ∫Cp dT of ONE range, Horner form, constant folded in (J/mol). */
function handEnthalpy(ts: Float64Array, out: Float64Array): Float64Array {
  const h1 = A, h2 = B / 2e3, h3 = C / 3e6, h4 = D / 4e9, hinv = -E * 1e6, h0 = -8000;
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = h0 + T * (h1 + T * (h2 + T * (h3 + T * h4))) + hinv / T;
  }
  return out;
}

/** Cp of ONE range (J/(mol·K)). */
function handCp(ts: Float64Array, out: Float64Array): Float64Array {
  const c0 = A, c1 = B / 1e3, c2 = C / 1e6, c3 = D / 1e9, cm2 = E * 1e6;
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = c0 + T * (c1 + T * (c2 + T * c3)) + cm2 / (T * T);
  }
  return out;
}

/** S° of ONE range (J/(mol·K)): A ln T + B T + C T²/2 + D T³/3 − E/(2T²) + const. */
function handEntropy(ts: Float64Array, out: Float64Array): Float64Array {
  const s1 = B / 1e3, s2 = C / 2e6, s3 = D / 3e9, sm2 = -E * 1e6 / 2, s0 = 100;
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = s0 + A * Math.log(T) + T * (s1 + T * (s2 + T * s3)) + sm2 / (T * T);
  }
  return out;
}

export function run(): void {
  const n2 = species("N2(g)");
  const out = new Float64Array(N);
  for (const [label, lo, hi] of [["one range, 600–1900 K", 600, 1900], ["three ranges, 300–3000 K", 300, 3000]] as const) {
    const ts = sortedTemperatures(lo, hi);
    const tag = `N2(g), ${N} sorted T, ${label}`;
    const cases: [string, () => unknown, string, () => unknown][] = [
      ["enthalpyBatch", () => n2.enthalpyBatch(ts, out), "hand 1-range enthalpy loop", () => handEnthalpy(ts, out)],
      ["cpBatch", () => n2.cpBatch(ts, out), "hand 1-range Cp loop", () => handCp(ts, out)],
      ["entropyBatch", () => n2.entropyBatch(ts, undefined, out), "hand 1-range entropy loop", () => handEntropy(ts, out)],
    ];
    for (const [name, fn, baseName, baseFn] of cases) {
      const [r, b] = paired(name, fn, baseName, baseFn);
      report(`${tag}: ${name}`, r, b, "ratio ≤ 1.5× the hand loop");
      console.log(`    → ${((r.perSecond * N) / 1e6).toFixed(1)} M evaluations/s (hand loop ${((b.perSecond * N) / 1e6).toFixed(1)} M/s)`);
    }
    const scalar = (): unknown => {
      for (let i = 0; i < N; i++) out[i] = n2.enthalpy(ts[i]!);
      return out;
    };
    const [r, b] = paired("enthalpy(T) ×N", scalar, "hand 1-range enthalpy loop", () => handEnthalpy(ts, out));
    report(`${tag}: scalar for comparison`, r, b, "(no target)");
  }
}
