/**
 * One test per hardening case: no hang on JSON rationals, no shared-state corruption through
 * returned objects, no stale caches, typed errors for bad values, no non-finite results, size limits.
 */
import { describe, expect, it } from "vitest";
import {
  ATOMIC_WEIGHTS, AIR_21_79, DEFAULT_FLAME_PRODUCTS, DRY_AIR, ERROR_CODES, FORMULA_LIMITS, HYDROGEN_ISOTOPES, MAX_CP_RANGES,
  MAX_CP_TABLE_POINTS, MAX_SPECIES_PER_DATA, MAX_SWEEP_POINTS, SOURCES, COMBUSTION_REFERENCE_SPECIES,
  adiabaticFlameTemperature, adiabaticReactionTemperature, balanceReaction, builtInLibrary, combustion, createHeatCapacity,
  createLibrary, flameTemperatureSweep, formatReaction, gcdBigInt, heatDuty, limitingReactant, matrixRank, molarMass,
  moleFractions, nullSpace, parseFormula, parseReaction, rationalFrom, rationalToString, reactionEnthalpy, scaleReaction,
  solveExtents, solveLinearSystem, species, toPascal, validateSpeciesData,
} from "../../src/index.js";
import * as rx from "../../src/index.js";
import { caught } from "../_helpers/caught.js";

const CH4_AIR = { fuel: "CH4(g)" } as const;

describe("item 1: a rational given as plain numbers converts exactly or fails, never loops", () => {
  it("balanceReaction with fixed { num: 25, den: 2 } (JSON's form of 25/2)", () => {
    const r = balanceReaction("C8H18 + O2 -> CO2 + H2O", { fixed: { O2: { num: 25, den: 2 } } } as never);
    // 2 C8H18 + 25 O2 -> 16 CO2 + 18 H2O, halved: common practice (octane combustion stoichiometry)
    expect(formatReaction(r)).toBe("C8H18 + 25/2 O2 -> 8 CO2 + 9 H2O");
  });
  it("scaleReaction, nullSpace, solveLinearSystem accept JSON rationals and integer text parts", () => {
    expect(formatReaction(scaleReaction(parseReaction("2 H2 + O2 -> 2 H2O"), { num: 1, den: 2 } as never))).toBe("H2 + 1/2 O2 -> H2O");
    expect(nullSpace([[{ num: 1, den: 2 }, 1]] as never).map((v) => v.map(rationalToString))).toEqual([["-2", "1"]]);
    expect(rationalToString((solveLinearSystem([[{ num: "1", den: "2" }]] as never, [1]) as { solution: rx.Rational[] }).solution[0]!)).toBe("2");
  });
  it("rationalFrom({}), matrixRank([[{}]]), gcdBigInt(1, 2) fail with INVALID_ARGUMENT", () => {
    expect(caught(() => rationalFrom({} as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => rationalFrom({ num: 1.5, den: 2 } as never)).details).toEqual({ num: "1.5" });
    expect(caught(() => rationalFrom({ num: 1, den: 0 } as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => matrixRank([[{}]] as never)).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => gcdBigInt(1 as never, 2 as never)).code).toBe("INVALID_ARGUMENT");
  });
});

describe("item 2: built-in and shared objects cannot be changed through what is handed out", () => {
  it("species formula elements are frozen; a write does not change later flames", () => {
    const before = adiabaticFlameTemperature(CH4_AIR).T;
    const elements = species("CO2(g)").formula.elements as Record<string, number>;
    expect(Object.isFrozen(elements)).toBe(true);
    expect(() => { elements["C"] = 5; }).toThrow(TypeError); // strict-mode write to a frozen object
    expect(adiabaticFlameTemperature(CH4_AIR).T).toBe(before);
  });
  it("parseFormula, parseReaction and balanceReaction results are deeply frozen", () => {
    const f = parseFormula("H2O");
    expect(Object.isFrozen(f) && Object.isFrozen(f.elements)).toBe(true);
    for (const r of [parseReaction("CH4 + 2 O2 -> CO2 + 2 H2O"), balanceReaction("C3H8 + O2 -> CO2 + H2O")]) {
      expect(Object.isFrozen(r) && Object.isFrozen(r.reactants) && Object.isFrozen(r.products)).toBe(true);
      for (const t of [...r.reactants, ...r.products]) expect(Object.isFrozen(t) && Object.isFrozen(t.formula.elements)).toBe(true);
    }
  });
  it("every exported constant is deeply frozen (FORMULA_LIMITS can no longer be raised)", () => {
    const deepFrozen = (v: unknown): boolean =>
      typeof v !== "object" || v === null || (Object.isFrozen(v) && Object.values(v).every(deepFrozen));
    for (const c of [FORMULA_LIMITS, ERROR_CODES, HYDROGEN_ISOTOPES, ATOMIC_WEIGHTS, DRY_AIR, AIR_21_79, DEFAULT_FLAME_PRODUCTS, SOURCES, COMBUSTION_REFERENCE_SPECIES]) {
      expect(deepFrozen(c)).toBe(true);
    }
    // and the rest: every non-function, non-schema export
    for (const [k, v] of Object.entries(rx)) {
      if (typeof v === "function" || /Schema$/.test(k)) continue;
      expect(deepFrozen(v), k).toBe(true);
    }
    expect(() => { (FORMULA_LIMITS as { maxLength: number }).maxLength = 1e9; }).toThrow(TypeError);
    expect(caught(() => parseFormula("C".repeat(FORMULA_LIMITS.maxLength + 1))).code).toBe("INPUT_TOO_LONG");
  });
});

describe("item 3: results follow the object as passed, not a cached first reading", () => {
  it("reactionEnthalpy re-reads a user-built reaction edited in place", () => {
    const vapour = parseReaction("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)");
    const liquid = parseReaction("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)");
    const r = { reactants: [...vapour.reactants], products: [...vapour.products] };
    expect(reactionEnthalpy(r).value).toBe(reactionEnthalpy(vapour).value);
    r.products[1] = liquid.products[1]!;
    // −890.3 kJ/mol with liquid water against −802.3 with vapour: NIST-JANAF 4th ed. 1998 (built-in ΔfH°)
    expect(reactionEnthalpy(r).value).toBe(reactionEnthalpy(liquid).value);
    expect(reactionEnthalpy(r).value).toBeCloseTo(-890310.1, 1);
  });
  it("solveExtents rejects a reaction edited to be unbalanced after a first call (same array)", () => {
    const base = parseReaction("CH4 + 2 O2 -> CO2 + 2 H2O");
    const r = { reactants: [...base.reactants], products: [...base.products] };
    const reactions = [r];
    const input = { feed: { CH4: 1, O2: 3 }, reactions, specs: [{ of: "CH4", conversion: 0.5 }] };
    expect(solveExtents(input).extents).toEqual([0.5]);
    r.products.pop();
    expect(caught(() => solveExtents(input)).code).toBe("UNBALANCED_REACTION");
  });
});

describe("item 7: bad values get RxthermError with a code and the offending path", () => {
  it("options passed as null", () => {
    const calls: (() => unknown)[] = [
      () => reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)", null as never),
      () => molarMass("H2O", null as never),
      () => adiabaticFlameTemperature(CH4_AIR, null as never),
      () => heatDuty({ inlet: { T: 300, flows: { "N2(g)": 1 } }, outlet: { T: 400, flows: { "N2(g)": 1 } } }, null as never),
      () => balanceReaction("H2 + O2 -> H2O", null as never),
      () => solveExtents({ feed: { CH4: 1, O2: 3 }, reactions: ["CH4 + 2 O2 -> CO2 + 2 H2O"], specs: [{ of: "CH4", conversion: 0.5 }] }, null as never),
    ];
    for (const f of calls) expect(caught(f).details).toMatchObject({ path: "options" });
  });
  it("a library or base that is not a Library", () => {
    expect(caught(() => reactionEnthalpy("H2(g) + 0.5 O2(g) -> H2O(g)", { library: builtInLibrary as never })).details).toMatchObject({ path: "options.library" });
    expect(caught(() => heatDuty({ inlet: { T: 300, flows: { "N2(g)": 1 } }, outlet: { T: 400, flows: { "N2(g)": 1 } }, library: 5 as never })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => species("CH4(g)", new Map() as never)).details).toMatchObject({ path: "library" });
    expect(caught(() => createLibrary({ sources: {}, species: [] }, { base: 5 as never })).details).toMatchObject({ path: "options.base" });
  });
  it("limitsK that is not a pair, arrays with holes, fuel.ultimate null, inherited keys", () => {
    const inlet = { T: 298.15, flows: { "CH4(g)": 1, "O2(g)": 2, "N2(g)": 7.52 } };
    expect(caught(() => adiabaticReactionTemperature({ inlet, reactions: ["CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)"], specs: [{ of: "CH4(g)", conversion: 1 }] }, { limitsK: 5000 as never })).details)
      .toMatchObject({ path: "options.limitsK" });
    // eslint-disable-next-line no-sparse-arrays
    expect(caught(() => solveExtents({ feed: { CH4: 1, O2: 3 }, reactions: [, "CH4 + 2 O2 -> CO2 + 2 H2O"] as never, specs: [{ of: "CH4", conversion: 0.5 }] })).details)
      .toMatchObject({ path: "reactions[0]" });
    // eslint-disable-next-line no-sparse-arrays
    expect(caught(() => balanceReaction({ reactants: ["CH4", "O2"], products: ["CO2", , "H2O"] as never })).details).toMatchObject({ path: "input.products[1]" });
    expect(caught(() => combustion({ fuel: { ultimate: null } as never })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => molarMass({ elements: Object.create({ Zz: 1 }), charge: 0, phase: null, text: "" } as never)).details).toMatchObject({ path: "formula.elements" });
  });
  it("Symbol, BigInt and null-prototype values do not crash the message builder", () => {
    for (const bad of [Symbol("x"), 10n, Object.create(null)]) {
      const e = caught(() => reactionEnthalpy("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)", { T: bad as never }));
      expect(e.code).toBe("INVALID_ARGUMENT");
      expect(typeof e.message).toBe("string");
    }
    expect(caught(() => heatDuty({ inlet: { T: Object.create(null), flows: { "N2(g)": 1 } }, outlet: { T: 400, flows: { "N2(g)": 1 } } } as never)).code).toBe("INVALID_ARGUMENT");
  });
});

describe("item 8: no non-finite or garbage results", () => {
  it("entropy at 5e-324 Pa is finite: ln P − ln P°", () => {
    const n2 = species("N2(g)");
    const s = n2.entropy(1000, 5e-324);
    expect(Number.isFinite(s)).toBe(true);
    // S(T, P) = S(T, P°) − R·(ln P − ln P°), R = 8.314462618 J/(mol·K) (CODATA 2018)
    expect(s).toBeCloseTo(n2.entropy(1000) - 8.314462618 * (Math.log(5e-324) - Math.log(1e5)), 6);
  });
  it("createHeatCapacity rejects Cp 1e308 (NaN integrals) and a negative Cp", () => {
    expect(caught(() => createHeatCapacity([{ TminK: 300, TmaxK: 1000, cp: { form: "constant", cpJPerMolK: 1e308 } }])).code).toBe("INVALID_DATA");
    expect(caught(() => createHeatCapacity([{ TminK: 300, TmaxK: 1000, cp: { form: "constant", cpJPerMolK: -5 } }])).details)
      .toMatchObject({ path: ["ranges", 0, "cp"] });
  });
  it("limitingReactant, combustion and flows at the ends of float64 fail instead of returning Infinity", () => {
    expect(caught(() => limitingReactant({ CH4: 1, O2: 5e-324 }, "CH4 + 2 O2 -> CO2 + 2 H2O")).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => combustion({ fuel: { "CH4(g)": 1 }, excessAir: 1e308 })).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => toPascal(1e308, "bar")).code).toBe("INVALID_ARGUMENT");
    expect(caught(() => moleFractions({ N2: 1e308, O2: 1e308 })).code).toBe("INVALID_ARGUMENT");
  });
  it("moleFractions rejects a __proto__ key and a key that is not a formula", () => {
    expect(caught(() => moleFractions(JSON.parse('{"__proto__": 1, "N2": 1}') as never)).details).toMatchObject({ species: "__proto__" });
    expect(caught(() => moleFractions({ xyz: 1 })).code).toBe("UNKNOWN_ELEMENT");
  });
  it("flameTemperatureSweep rejects null points and null pressures instead of using the defaults", () => {
    expect(caught(() => flameTemperatureSweep(CH4_AIR, { parameter: "equivalenceRatio", values: [0.9, null as never] })).details)
      .toMatchObject({ path: "sweep.values[1]" });
    expect(caught(() => flameTemperatureSweep(CH4_AIR, { parameter: "P", values: [null as never] })).code).toBe("INVALID_ARGUMENT");
  });
});

describe("item 11: size limits on user data (TOO_LARGE)", () => {
  it("Cp tables, range lists, species lists and sweeps have documented caps", () => {
    const n = MAX_CP_TABLE_POINTS + 1;
    const table = { form: "tabulated" as const, temperaturesK: Array.from({ length: n }, (_, i) => 300 + i * 0.05), cpJPerMolK: new Array<number>(n).fill(30) };
    const t0 = performance.now();
    expect(caught(() => createHeatCapacity([{ TminK: 300, TmaxK: 800, cp: table }])).details).toMatchObject({ limit: MAX_CP_TABLE_POINTS, size: n });
    expect(performance.now() - t0).toBeLessThan(2000); // fails fast (hang guard, not a speed target)
    const ranges = Array.from({ length: MAX_CP_RANGES + 1 }, (_, i) => ({ TminK: 300 + i, TmaxK: 301 + i, cp: { form: "constant" as const, cpJPerMolK: 30 } }));
    expect(caught(() => createHeatCapacity(ranges)).code).toBe("TOO_LARGE");
    expect(caught(() => validateSpeciesData({ sources: {}, species: new Array(MAX_SPECIES_PER_DATA + 1).fill({}) })).code).toBe("TOO_LARGE");
    expect(caught(() => flameTemperatureSweep(CH4_AIR, { parameter: "equivalenceRatio", values: new Array<number>(MAX_SWEEP_POINTS + 1).fill(1) })).code).toBe("TOO_LARGE");
  });
  it("the documented limit values (the @example lines)", () => {
    expect([MAX_CP_TABLE_POINTS, MAX_CP_RANGES, MAX_SPECIES_PER_DATA, MAX_SWEEP_POINTS]).toEqual([10000, 1000, 20000, 1000]);
  });
});
