/**
 * Random solveExtents problems whose numbers carry float round-off (0.30000000000000004,
 * 0.1 + 0.2, x·(1 + 2⁻⁵²), arbitrary doubles with 17 significant digits), and a snapshot of a
 * call's whole outcome (every eager field, every lazy table, or the error), so two runs can be
 * compared exactly. Shared by the lane comparison test and its golden file.
 */
import fc from "fast-check";
import { RxthermError } from "../../src/errors.js";
import { solveExtents, type SolveExtentsInput } from "../../src/extent/solveExtents.js";
import type { ExtentSpec, Flows } from "../../src/extent/types.js";

/** Invented networks (stoichiometry: common practice), each with the species it may feed. */
export const NETWORKS: readonly { readonly reactions: readonly string[]; readonly feed: readonly string[] }[] = [
  {
    // the 16-reaction network of bench/extent.bench.ts
    reactions: [
      "CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2", "C2H6 -> C2H4 + H2", "N2 + 3 H2 -> 2 NH3", "2 SO2 + O2 -> 2 SO3",
      "C3H8 -> C3H6 + H2", "C3H8 -> C2H4 + CH4", "C4H10 -> C4H8 + H2", "C4H10 -> C2H6 + C2H4", "CO + 2 H2 -> CH3OH",
      "2 CH3OH -> CH3OCH3 + H2O", "C2H4 + H2O -> C2H5OH", "2 H2S + 3 O2 -> 2 SO2 + 2 H2O", "COS + H2O -> CO2 + H2S",
      "HCN + 3 H2 -> CH4 + NH3", "C2H2 + H2 -> C2H4",
    ],
    feed: ["CH4", "H2O", "CO", "CO2", "H2", "N2", "NH3", "O2", "SO2", "SO3", "C2H6", "C2H4", "C3H8", "C3H6", "C4H10", "C4H8", "CH3OH", "CH3OCH3", "C2H5OH", "H2S", "COS", "HCN", "C2H2", "Ar"],
  },
  {
    // the 5-reaction network of bench/extent.bench.ts
    reactions: ["CH4 + H2O -> CO + 3 H2", "CO + H2O -> CO2 + H2", "C2H6 -> C2H4 + H2", "N2 + 3 H2 -> 2 NH3", "2 SO2 + O2 -> 2 SO3"],
    feed: ["CH4", "H2O", "CO", "CO2", "H2", "N2", "NH3", "O2", "SO2", "SO3", "C2H6", "C2H4", "Ar", "He", "CH3OH"],
  },
  {
    // fractional coefficients
    reactions: ["C2H6 + 7/2 O2 -> 2 CO2 + 3 H2O", "H2 + 1/2 O2 -> H2O", "CO + 1/2 O2 -> CO2"],
    feed: ["C2H6", "O2", "H2", "CO", "CO2", "H2O", "N2"],
  },
  {
    // ethylene oxide: partial against total oxidation
    reactions: ["2 C2H4 + O2 -> 2 C2H4O", "C2H4 + 3 O2 -> 2 CO2 + 2 H2O"],
    feed: ["C2H4", "O2", "N2", "CO2"],
  },
  {
    reactions: ["CH4 + 2 O2 -> CO2 + 2 H2O"],
    feed: ["CH4", "O2", "N2"],
  },
];

/** A decimal with a few digits in [min, max], as a person types it. */
const shortDecimal = (min: number, max: number): fc.Arbitrary<number> =>
  fc.constantFrom(1, 10, 100, 1000).chain((d) => fc.integer({ min: Math.ceil(min * d), max: Math.floor(max * d) }).map((n) => n / d));

/**
 * A number in [min, max] as float arithmetic leaves it: a short decimal nudged by a few ulps, a
 * sum, a quotient times 0.7, a double spread evenly over the range (16–17 significant digits), or
 * any double (fast-check's, which favours extremes such as 5e-324).
 */
export const roundOffNumber = (min: number, max: number): fc.Arbitrary<number> => {
  const clamp = (x: number) => Math.min(Math.max(x, min), max);
  return fc.oneof(
    shortDecimal(min, max),
    fc.tuple(shortDecimal(min, max), fc.integer({ min: -3, max: 3 })).map(([x, m]) => clamp(x * (1 + m * 2 ** -52))),
    fc.tuple(shortDecimal(min, max), fc.constantFrom(0.1, 0.2, 0.7)).map(([x, y]) => clamp(x + y - y)),
    fc.tuple(shortDecimal(min, max), fc.integer({ min: 1, max: 9 })).map(([x, k]) => clamp((x / k) * k)),
    fc.integer({ min: 0, max: 2 ** 53 - 1 }).map((n) => clamp(min + ((max - min) * n) / 2 ** 53)),
    fc.double({ min, max, noNaN: true, noDefaultInfinity: true }),
  );
};

/** Feed: a value per feed species, a few of them zero. */
const feedValue = fc.oneof({ weight: 1, arbitrary: fc.constant(0) }, { weight: 15, arbitrary: roundOffNumber(5, 200) });

/** One spec as a recipe: its kind and two numbers in [0, 1) that pick species, and a value. */
const specRecipe = fc.record({
  kind: fc.constantFrom("extent", "extent", "conversion", "conversionInReaction", "outlet", "yield", "selectivity"),
  pick: fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }),
  pick2: fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }),
  fraction: roundOffNumber(0, 1),
  amount: roundOffNumber(0, 20),
});

interface Parsed {
  reactants: string[];
  products: string[];
}

function sides(eq: string): Parsed {
  const [l, r] = eq.split("->") as [string, string];
  const names = (s: string) => s.split(" + ").map((t) => t.trim().replace(/^[\d/]+\s+/, ""));
  return { reactants: names(l), products: names(r) };
}

function at<T>(list: readonly T[], u: number): T {
  return list[Math.floor(u * list.length)] as T;
}

/** A random problem: a network, a subset-free feed, one spec per reaction built from recipes. */
export const roundOffCase: fc.Arbitrary<SolveExtentsInput> = fc
  .integer({ min: 0, max: NETWORKS.length - 1 })
  .chain((n) => {
    const net = NETWORKS[n]!;
    return fc.record({
      n: fc.constant(n),
      feed: fc.array(feedValue, { minLength: net.feed.length, maxLength: net.feed.length }),
      specs: fc.array(specRecipe, { minLength: net.reactions.length, maxLength: net.reactions.length }),
    });
  })
  .map(({ n, feed, specs }) => {
    const net = NETWORKS[n]!;
    const flows: Flows = Object.fromEntries(net.feed.map((k, i) => [k, feed[i] as number]));
    const parsed = net.reactions.map(sides);
    const out: ExtentSpec[] = specs.map((s, j) => {
      const rx = parsed[j]!;
      switch (s.kind) {
        case "conversion":
          return { of: at(rx.reactants, s.pick), conversion: s.fraction };
        case "conversionInReaction":
          return { of: at(rx.reactants, s.pick), conversion: s.fraction, reaction: j };
        case "outlet":
          return { of: at([...rx.reactants, ...rx.products], s.pick), outlet: s.amount };
        case "yield":
          return { of: at(rx.products, s.pick), yield: s.fraction, basis: at(rx.reactants, s.pick2) };
        case "selectivity": {
          const other = parsed[(j + 1 + Math.floor(s.pick2 * Math.max(1, parsed.length - 1))) % parsed.length]!;
          return { of: at(rx.products, s.pick), selectivity: s.amount, over: at(other.products, s.pick2) };
        }
        default:
          return { reaction: j, extent: s.amount / 8 };
      }
    });
    return { feed: flows, reactions: net.reactions, specs: out };
  });

/** The whole outcome of a call as plain data: every field and table, or the error (code, message, details). */
export function outcome(input: SolveExtentsInput): unknown {
  let r;
  try {
    r = solveExtents(input);
  } catch (e) {
    if (e instanceof RxthermError) return { error: e.code, message: e.message, details: e.details };
    throw e;
  }
  const table = (read: () => unknown) => {
    try {
      return read();
    } catch (e) {
      if (e instanceof RxthermError) return { error: e.code, message: e.message };
      throw e;
    }
  };
  return {
    extents: r.extents,
    outlet: r.outlet,
    change: r.change,
    roundOffZeros: r.roundOffZeros,
    conversion: table(() => r.conversion),
    conversionByReaction: table(() => r.conversionByReaction),
    yield: table(() => r.yield),
    selectivity: table(() => r.selectivity),
  };
}
