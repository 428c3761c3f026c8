import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { completeCases, griLibrary, solveCase, type CompleteOutcome } from "./completeCases.js";
import { adiabaticFlameTemperature } from "../../src/flame/adiabaticFlameTemperature.js";
import { flameTemperatureSweep } from "../../src/flame/flameTemperatureSweep.js";
import { species } from "../../src/species/species.js";
import type { Library, Species } from "../../src/species/types.js";
import { builtInLibrary } from "../../src/species/builtInLibrary.js";

// Regression values: the library's own complete-combustion results from before the fast path (commit
// b185371), not published data; see tests/flame/completeCases.ts.
const fixture = JSON.parse(readFileSync(new URL("../fixtures/flame-complete-regression.json", import.meta.url), "utf8")) as {
  outcomes: CompleteOutcome[];
};

/** |a − b| within `rel` of the larger magnitude, or within `abs`. */
function close(a: number, b: number, rel: number, abs: number): boolean {
  return Math.abs(a - b) <= Math.max(abs, rel * Math.max(Math.abs(a), Math.abs(b)));
}

function expectSameOutcome(now: CompleteOutcome, before: CompleteOutcome, toleranceK: number): void {
  expect(now.label).toBe(before.label);
  expect(now.error).toBe(before.error);
  if (before.error !== undefined) return;
  // the documented tolerance of the temperature (options.toleranceK, 1e-6 K by default)
  expect(Math.abs(now.T! - before.T!), `${now.label}: T ${now.T} against ${before.T}`).toBeLessThanOrEqual(toleranceK);
  expect(close(now.P!, before.P!, 1e-9, 0)).toBe(true);
  expect(close(now.reactantEnergy!, before.reactantEnergy!, 1e-12, 1e-9)).toBe(true);
  expect(now.relativeResidual!).toBeLessThan(1e-8);
  for (const field of ["moles", "products", "oxidizer"] as const) {
    // same species in the same order; amounts (which move with T in rich mixtures) to 1e-9
    expect(Object.keys(now[field]!), `${now.label}: ${field}`).toEqual(Object.keys(before[field]!));
    for (const k of Object.keys(before[field]!)) {
      expect(close(now[field]![k]!, before[field]![k]!, 1e-9, 1e-15), `${now.label}: ${field} ${k}`).toBe(true);
    }
  }
  expect(now.extrapolated!.map((p) => [p.species, p.range])).toEqual(before.extrapolated!.map((p) => [p.species, p.range]));
  for (const p of now.extrapolated!) expect(Math.abs(p.T - (p.species === "CH4(g)" ? 250 : now.T!))).toBe(0);
}

/** A library whose species are plain objects delegating to the built-in ones (not the library's own class). */
function delegatingLibrary(): Library {
  const base = builtInLibrary();
  const wrap = (sp: Species): Species => ({
    key: sp.key, formula: sp.formula, phase: sp.phase, hf298: sp.hf298, hf298Exact: sp.hf298Exact, s298: sp.s298,
    range: sp.range, sources: sp.sources, aliases: sp.aliases, transitions: sp.transitions,
    cp: (T, o) => sp.cp(T, o), enthalpy: (T, o) => sp.enthalpy(T, o), entropy: (T, P, o) => sp.entropy(T, P, o),
    gibbs: (T, P, o) => sp.gibbs(T, P, o), evaluate: (T, P, o) => sp.evaluate(T, P, o),
    cpBatch: (T, out, o) => sp.cpBatch(T, out, o), enthalpyBatch: (T, out, o) => sp.enthalpyBatch(T, out, o),
    entropyBatch: (T, P, out, o) => sp.entropyBatch(T, P, out, o),
  });
  const cache = new Map<string, Species>();
  return {
    get: (key: string) => {
      const sp = base.get(key);
      let w = cache.get(sp.key);
      if (w === undefined) cache.set(sp.key, (w = wrap(sp)));
      return w;
    },
    has: (key: string) => base.has(key),
    all: () => base.all(),
  } as unknown as Library;
}

describe("adiabaticFlameTemperature, mode complete: the fast path gives the results of before", () => {
  const gri = griLibrary();
  const cases = completeCases();

  it(`every case of the regression grid (${cases.length} fuels × φ × preheat × process × oxidizer) matches the stored result`, () => {
    expect(fixture.outcomes.length).toBe(cases.length);
    for (let i = 0; i < cases.length; i++) {
      expectSameOutcome(solveCase(cases[i]!, gri), fixture.outcomes[i]!, cases[i]!.options?.toleranceK ?? 1e-6);
    }
  });

  it("a repeated call gives the identical result (no state carried from one call to the next)", () => {
    for (const c of cases.slice(0, 40)) {
      const a = solveCase(c, gri);
      solveCase(cases[(cases.indexOf(c) + 7) % cases.length]!, gri); // another problem in between
      expect(solveCase(c, gri)).toEqual(a);
    }
  });

  it("species of another implementation (a delegating library) give the same results as the library's own species", () => {
    const lib = delegatingLibrary();
    for (const fuel of ["CH4(g)", "C3H8(g)", "H2S(g)"]) {
      for (const equivalenceRatio of [0.7, 1, 1.3]) {
        for (const process of ["constant-pressure", "constant-volume"] as const) {
          const input = { fuel, mode: "complete", equivalenceRatio, process, oxidizerT: 600 } as const;
          const own = adiabaticFlameTemperature(input);
          const other = adiabaticFlameTemperature({ ...input, library: lib });
          expect(Math.abs(other.T - own.T)).toBeLessThanOrEqual(1e-6);
          expect(Object.keys(other.moles)).toEqual(Object.keys(own.moles));
          for (const k of Object.keys(own.moles)) expect(close(other.moles[k]!, own.moles[k]!, 1e-9, 1e-15)).toBe(true);
        }
      }
    }
  });

  it("a sweep (warm starts) gives the point-by-point results", () => {
    const values = [0.5, 0.8, 1, 1.1, 1.4, 1.8];
    const s = flameTemperatureSweep({ fuel: "C3H8(g)", mode: "complete", oxidizerT: 500 }, { parameter: "equivalenceRatio", values });
    values.forEach((equivalenceRatio, i) => {
      const p = adiabaticFlameTemperature({ fuel: "C3H8(g)", mode: "complete", oxidizerT: 500, equivalenceRatio });
      expect(Math.abs(s.T[i]! - p.T)).toBeLessThanOrEqual(1e-6);
    });
  });

  it("the energy balance closes with the species' own enthalpies (independent of the summed polynomial)", () => {
    for (const [fuel, equivalenceRatio, oxidizerT] of [["CH4(g)", 1, 298.15], ["C3H8(g)", 0.7, 800], ["H2(g)", 0.5, 298.15]] as const) {
      const r = adiabaticFlameTemperature({ fuel, mode: "complete", equivalenceRatio, oxidizerT });
      let h = 0;
      let scale = 0;
      for (const [k, n] of Object.entries(r.moles)) {
        h += n * species(k).enthalpy(r.T);
        scale += Math.abs(n * species(k).enthalpy(r.T));
      }
      expect(Math.abs(h - r.reactantEnergy) / scale).toBeLessThan(1e-9);
    }
  });
});
