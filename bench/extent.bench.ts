/**
 * Benchmarks of the extent module: solveExtents (5 reactions, 15 species) exact and float,
 * and combustion of a 10-component gas, each beside a hand-written baseline in the same process.
 */
import { combustion } from "../src/extent/combustion.js";
import { solveExtents } from "../src/extent/solveExtents.js";
import { interleavedP10, measure, paired, report } from "./harness.js";

// invented reformer/shift/methanation/ammonia/SO2 feed: 15 species, 5 independent reactions
const FEED = {
  CH4: 30, H2O: 90, CO: 2, CO2: 3, H2: 10, N2: 20, NH3: 0, O2: 6, SO2: 1, SO3: 0,
  C2H6: 2, C2H4: 0, Ar: 0.3, He: 0.1, CH3OH: 0,
};
const REACTIONS = [
  "CH4 + H2O -> CO + 3 H2",
  "CO + H2O -> CO2 + H2",
  "C2H6 -> C2H4 + H2",
  "N2 + 3 H2 -> 2 NH3",
  "2 SO2 + O2 -> 2 SO3",
];
const SPECS = [
  { of: "CH4", conversion: 0.7 },
  { of: "CO", outlet: 6.5 },
  { of: "C2H6", conversion: 0.35 },
  { reaction: 3, extent: 1.2 },
  { of: "SO2", conversion: 0.95 },
] as const;

/** Baseline: the same 5×5 system written out by hand and solved by float Gauss elimination. */
function handSolve(): number[] {
  // ν columns of the key species; A ξ = b
  const A = [
    [-1, 0, 0, 0, 0],
    [1, -1, 0, 0, 0],
    [0, 0, -1, 0, 0],
    [0, 0, 0, 1, 0],
    [0, 0, 0, 0, -2],
  ];
  const b = [-0.7 * 30, 6.5 - 2, -0.35 * 2, 1.2, -0.95 * 1];
  const n = 5;
  const M = A.map((r, i) => [...r, b[i] as number]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let i = c + 1; i < n; i++) if (Math.abs(M[i]![c]!) > Math.abs(M[p]![c]!)) p = i;
    [M[c], M[p]] = [M[p]!, M[c]!];
    for (let i = c + 1; i < n; i++) {
      const f = M[i]![c]! / M[c]![c]!;
      for (let k = c; k <= n; k++) M[i]![k]! -= f * M[c]![k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let v = M[i]![n]!;
    for (let k = i + 1; k < n; k++) v -= M[i]![k]! * x[k]!;
    x[i] = v / M[i]![i]!;
  }
  return x;
}

// invented 16-reaction network (reforming, shift, cracking, methanol, sulfur and nitrogen side reactions)
const FEED16: Record<string, number> = {
  CH4: 30, H2O: 90, CO: 2, CO2: 3, H2: 10, N2: 20, NH3: 0, O2: 6, SO2: 1, SO3: 0, C2H6: 4, C2H4: 0, C3H8: 5, C3H6: 0,
  C4H10: 3, C4H8: 0, CH3OH: 0, CH3OCH3: 0, C2H5OH: 0, H2S: 0.5, COS: 0.2, HCN: 0.3, C2H2: 0.4, Ar: 0.3,
};
const REACTIONS16 = [
  "CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2", "C2H6 -> C2H4 + H2", "N2 + 3 H2 -> 2 NH3", "2 SO2 + O2 -> 2 SO3",
  "C3H8 -> C3H6 + H2", "C3H8 -> C2H4 + CH4", "C4H10 -> C4H8 + H2", "C4H10 -> C2H6 + C2H4", "CO + 2 H2 -> CH3OH",
  "2 CH3OH -> CH3OCH3 + H2O", "C2H4 + H2O -> C2H5OH", "2 H2S + 3 O2 -> 2 SO2 + 2 H2O", "COS + H2O -> CO2 + H2S",
  "HCN + 3 H2 -> CH4 + NH3", "C2H2 + H2 -> C2H4",
];
const SPECS16 = [
  { of: "CH4", conversion: 0.3 }, { reaction: 1, extent: 4 }, { reaction: 2, extent: 0.5 }, { of: "N2", conversion: 0.05 },
  { of: "SO2", conversion: 0.9 }, { reaction: 5, extent: 1.5 }, { reaction: 6, extent: 1.2 }, { reaction: 7, extent: 1 },
  { reaction: 8, extent: 0.7 }, { reaction: 9, extent: 0.4 }, { reaction: 10, extent: 0.1 }, { reaction: 11, extent: 0.2 },
  { of: "H2S", conversion: 0.8 }, { of: "COS", conversion: 0.6 }, { of: "HCN", conversion: 0.5 }, { of: "C2H2", conversion: 0.95 },
] as const;
/** The same specs as a user's float arithmetic leaves them: each value one or two ulps off its decimal (0.30000000000000004). */
const SPECS16_ROUNDOFF = SPECS16.map((s) =>
  Object.fromEntries(Object.entries(s).map(([k, v]) => [k, typeof v === "number" && k !== "reaction" ? v * (1 + 2 ** -52) : v])),
) as unknown as typeof SPECS16;

const GAS = {
  "CH4(g)": 0.87, "C2H6(g)": 0.05, "C3H8(g)": 0.02, "C4H10(g)": 0.005, "H2(g)": 0.01,
  "CO(g)": 0.005, "CO2(g)": 0.015, "N2(g)": 0.02, "H2S(g)": 0.0001, "He(g)": 0.0049,
};

// element table of GAS written out by hand (C, H, O, N, S per molecule)
const GAS_ELEMENTS: Record<string, [number, number, number, number, number]> = {
  "CH4(g)": [1, 4, 0, 0, 0], "C2H6(g)": [2, 6, 0, 0, 0], "C3H8(g)": [3, 8, 0, 0, 0], "C4H10(g)": [4, 10, 0, 0, 0],
  "H2(g)": [0, 2, 0, 0, 0], "CO(g)": [1, 0, 1, 0, 0], "CO2(g)": [1, 0, 2, 0, 0], "N2(g)": [0, 0, 0, 2, 0],
  "H2S(g)": [0, 2, 0, 0, 1], "He(g)": [0, 0, 0, 0, 0],
};

/** Baseline: the same flue-gas balance by a hand-written element tally over a fixed table (no parsing, no checks). */
function handCombustion(): Record<string, number> {
  let C = 0, H = 0, O = 0, N = 0, S = 0;
  for (const [k, n] of Object.entries(GAS)) {
    const e = GAS_ELEMENTS[k]!;
    C += n * e[0]; H += n * e[1]; O += n * e[2]; N += n * e[3]; S += n * e[4];
  }
  const o2 = C + H / 4 + S - O / 2;
  const air = (1.15 * o2) / 0.209476;
  const flue: Record<string, number> = {
    "CO2(g)": C + air * 0.000412, "H2O(g)": H / 2, "SO2(g)": S, "N2(g)": N / 2 + air * 0.780772,
    "O2(g)": air * 0.209476 - o2, "Ar(g)": air * 0.00934, "He(g)": GAS["He(g)"],
  };
  let total = 0;
  for (const v of Object.values(flue)) total += v;
  const wet: Record<string, number> = {};
  for (const [k, v] of Object.entries(flue)) wet[k] = v / total;
  return wet;
}

export function run(): void {
  const exact = measure("solveExtents exact (5 rx, 15 sp)", () => solveExtents({ feed: FEED, reactions: REACTIONS, specs: SPECS }));
  const float = measure("solveExtents float (5 rx, 15 sp)", () =>
    solveExtents({ feed: FEED, reactions: REACTIONS, specs: SPECS }, { arithmetic: "float" }),
  );
  // the exact path keeps the last feed conversion; alternating feeds measure it without that memo
  const FEED_B = { ...FEED, CH4: 30.5, Ar: 0.35 };
  let flip = false;
  const exactNewFeed = measure("solveExtents exact, feed changes every call", () => {
    flip = !flip;
    return solveExtents({ feed: flip ? FEED : FEED_B, reactions: REACTIONS, specs: SPECS });
  });
  const base = measure("hand 5×5 float Gauss", handSolve);
  report("solveExtents", exact, base, "median < 20 µs");
  report("solveExtents", exactNewFeed, base, "median < 20 µs");
  report("solveExtents", float, base, "median < 20 µs");
  const rounded16 = measure("solveExtents 16 rx, rounded specs", () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16 }));
  const roundoff16 = measure("solveExtents 16 rx, specs with float round-off", () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16_ROUNDOFF }));
  const roundoff16y = measure("the same, reading the yield and selectivity tables", () => {
    const r = solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16_ROUNDOFF });
    return [r.yield, r.selectivity];
  });
  report("solveExtents round-off specs", roundoff16, rounded16, "ratio ≤ 1.5× the rounded case");
  report("solveExtents round-off specs", roundoff16y, rounded16, "(tables are computed on first access)");
  // the same ratio from alternating rounds (the round with the median ratio): steadier on a shared machine
  const [ro16, rd16] = paired(
    "solveExtents 16 rx, specs with float round-off",
    () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16_ROUNDOFF }),
    "solveExtents 16 rx, rounded specs",
    () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16 }),
    9,
  );
  report("solveExtents round-off specs, paired rounds", ro16, rd16, "ratio ≤ 1.5× the rounded case");
  // and as the 10th percentile of 300 short interleaved rounds (the time printed is that p10, not a median)
  const [p10ro, p10rd] = interleavedP10([
    ["solveExtents 16 rx, specs with float round-off (p10)", () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16_ROUNDOFF })],
    ["solveExtents 16 rx, rounded specs (p10)", () => solveExtents({ feed: FEED16, reactions: REACTIONS16, specs: SPECS16 })],
  ]);
  report("solveExtents round-off specs, p10 of 300 interleaved rounds", p10ro!, p10rd!, "ratio ≤ 1.5× the rounded case");
  const comb = measure("combustion 10-component gas, 15 % excess", () => combustion({ fuel: GAS, excessAir: 0.15 }));
  const cbase = measure("hand element tally", handCombustion);
  report("combustion", comb, cbase, "median < 10 µs");
}
