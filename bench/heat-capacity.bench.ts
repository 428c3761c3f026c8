/**
 * Heat-capacity hot path: enthalpy evaluations of a Shomate (3 ranges) and a NASA-7 (2 ranges)
 * species, through the scalar API and the Float64Array batch API, each beside a hand-inlined
 * single-range polynomial loop over the same Float64Array, measured in the same process.
 * Target: ≥ 30 M evaluations/s and ≤ 2× the hand-inlined loop.
 *
 * Data: NIST Chemistry WebBook Shomate sets (N2) and GRI-Mech 3.0 NASA-7 sets (O2), as in
 * tests/fixtures/heat-capacity-*.json.
 */
import { paired, report, type BenchResult } from "./harness.js";
import { createHeatCapacity } from "../src/heat-capacity/createHeatCapacity.js";

const N = 4096;

const n2 = createHeatCapacity([
  { TminK: 100, TmaxK: 500, cp: { form: "shomate", A: 28.98641, B: 1.853978, C: -9.647459, D: 16.63537, E: 0.000117 } },
  { TminK: 500, TmaxK: 2000, cp: { form: "shomate", A: 19.50583, B: 19.88705, C: -8.598535, D: 1.369784, E: 0.527601 } },
  { TminK: 2000, TmaxK: 6000, cp: { form: "shomate", A: 35.51872, B: 1.128728, C: -0.196103, D: 0.014662, E: -4.55376 } },
], { label: "N2(g)" });
const o2 = createHeatCapacity([
  { TminK: 200, TmaxK: 1000, cp: { form: "nasa7", a: [3.78245636, -0.00299673416, 9.84730201e-6, -9.68129509e-9, 3.24372837e-12, -1063.94356, 3.65767573] } },
  { TminK: 1000, TmaxK: 3500, cp: { form: "nasa7", a: [3.28253784, 0.00148308754, -7.57966669e-7, 2.09470555e-10, -2.16717794e-14, -1088.45772, 5.45323129] } },
], { label: "O2(g)" });

/** Pseudo-random temperatures (fixed LCG seed) over [lo, hi], so every range is hit in no order. */
function temperatures(lo: number, hi: number, sorted: boolean): Float64Array {
  const ts = new Float64Array(N);
  let s = 12345;
  for (let i = 0; i < N; i++) {
    s = (s * 1103515245 + 12345) >>> 0;
    ts[i] = lo + ((hi - lo) * s) / 2 ** 32;
  }
  if (sorted) ts.sort();
  return ts;
}

/** Baseline: the Shomate enthalpy of ONE range, Horner-inlined with the coefficients in locals. */
function inlinedShomate(ts: Float64Array, out: Float64Array): Float64Array {
  // N2 500–2000 K, ∫Cp dT as a polynomial in T with 1/T term (J/mol)
  const A = 19.50583, B = 19.88705e-3, C = -8.598535e-6, D = 1.369784e-9, E = 0.527601e6;
  const h1 = A, h2 = B / 2, h3 = C / 3, h4 = D / 4, hinv = -E, h0 = -8000;
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = h0 + T * (h1 + T * (h2 + T * (h3 + T * h4))) + hinv / T;
  }
  return out;
}

/** Baseline: the NASA-7 enthalpy of ONE range, Horner-inlined. */
function inlinedNasa7(ts: Float64Array, out: Float64Array): Float64Array {
  const R = 8.314462618;
  const a1 = 3.28253784, a2 = 0.00148308754, a3 = -7.57966669e-7, a4 = 2.09470555e-10, a5 = -2.16717794e-14, a6 = -1088.45772;
  const h1 = R * a1, h2 = (R * a2) / 2, h3 = (R * a3) / 3, h4 = (R * a4) / 4, h5 = (R * a5) / 5, h0 = R * a6;
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = h0 + T * (h1 + T * (h2 + T * (h3 + T * (h4 + T * h5))));
  }
  return out;
}

/** Baseline: the N2 Shomate enthalpy over its three ranges, hand-inlined with if/else range selection. */
function inlinedShomate3(ts: Float64Array, out: Float64Array): Float64Array {
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    let v: number;
    if (T <= 500) v = -8700 + T * (28.98641 + T * (0.926989e-3 + T * (-3.215820e-6 + T * 4.158843e-9))) - 117 / T;
    else if (T <= 2000) v = -6000 + T * (19.50583 + T * (9.943525e-3 + T * (-2.866178e-6 + T * 3.42446e-10))) - 527601 / T;
    else v = -15000 + T * (35.51872 + T * (0.564364e-3 + T * (-6.5368e-8 + T * 3.6655e-12))) + 4553760 / T;
    out[i] = v;
  }
  return out;
}

/** Baseline: the O2 NASA-7 enthalpy over its two ranges, hand-inlined with if/else range selection. */
function inlinedNasa7x2(ts: Float64Array, out: Float64Array): Float64Array {
  for (let i = 0; i < ts.length; i++) {
    const T = ts[i]!;
    out[i] = T <= 1000
      ? -8846 + T * (31.449 + T * (-0.012458 + T * (2.7292e-8 + T * (-2.0124e-11 + T * 5.394e-15))))
      : -9050 + T * (27.293 + T * (0.0061655 + T * (-2.1007e-9 + T * (4.354e-13 - T * 3.604e-17))));
  }
  return out;
}

function line(title: string, [r, base]: [BenchResult, BenchResult]): void {
  report(title, r, base, "≥ 30 M evaluations/s and ≤ 2× baseline");
  console.log(`    → ${((r.perSecond * N) / 1e6).toFixed(1)} M evaluations/s (baseline ${((base.perSecond * N) / 1e6).toFixed(1)} M/s)`);
}

export function run(): void {
  const out = new Float64Array(N);
  for (const [label, model, lo, hi, inlined1, inlinedAll] of [
    ["Shomate N2, 3 ranges", n2, 300, 2500, inlinedShomate, inlinedShomate3],
    ["NASA-7 O2, 2 ranges", o2, 300, 3000, inlinedNasa7, inlinedNasa7x2],
  ] as const) {
    for (const sorted of [false, true]) {
      const ts = temperatures(lo, hi, sorted);
      const tag = `${label}, ${N} T ${sorted ? "sorted" : "shuffled"}`;
      const base1 = (): unknown => inlined1(ts, out);
      const baseAll = (): unknown => inlinedAll(ts, out);
      const batch = (): unknown => model.sensibleEnthalpyBatch(ts, out);
      const scalar = (): unknown => {
        for (let i = 0; i < N; i++) out[i] = model.sensibleEnthalpy(ts[i]!);
        return out;
      };
      const delta = (): unknown => {
        for (let i = 0; i < N; i++) out[i] = model.deltaH(298.15, ts[i]!);
        return out;
      };
      line(`${tag} batch vs 1-range`, paired("sensibleEnthalpyBatch", batch, "inlined 1-range loop", base1));
      line(`${tag} batch vs all-ranges`, paired("sensibleEnthalpyBatch", batch, "inlined all-ranges loop", baseAll));
      line(`${tag} scalar vs all-ranges`, paired("sensibleEnthalpy ×N", scalar, "inlined all-ranges loop", baseAll));
      line(`${tag} deltaH vs all-ranges`, paired("deltaH(298.15, T) ×N", delta, "inlined all-ranges loop", baseAll));
    }
  }
}
