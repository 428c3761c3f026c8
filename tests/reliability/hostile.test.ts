/**
 * Hostile-input property suite: every public function of src/index.ts is called with one valid
 * argument list in which one place (a whole argument, a field, an array entry, or an options
 * argument that was left out) holds a hostile value — null, undefined, NaN, ±Infinity, 5e-324,
 * ±1e308, negatives, huge arrays, arrays with holes, Symbols, BigInts, null-prototype and
 * inherited-key objects, proxies, frozen objects, JSON-roundtripped rationals, functions, Maps.
 * fast-check draws the place and the value. Each call must:
 * - throw nothing but RxthermError (whose message and details can be read),
 * - return no NaN or ±Infinity anywhere in a plain result,
 * - leave its inputs unchanged (deep snapshot before and after),
 * - end within CALL_TIME_BOUND_MS (a hang detector, not a speed target).
 *
 * RXTHERM_HOSTILE_RUNS sets the cases per entry point (default 25; slow flame entries a quarter);
 * RXTHERM_HOSTILE_RUNS=all runs every place × value exhaustively (about 20,000 calls, minutes).
 */
import fc from "fast-check";
import { afterAll, describe, expect, it } from "vitest";
import * as rx from "../../src/index.js";
import { deepFreeze } from "../../src/errors.js";
import { ENTRY_POINTS } from "./entryPoints.js";
import { CALL_TIME_BOUND_MS, HOSTILE_VALUES, nonFinite, pathsOf, probe, snapshot, type Finding } from "./hostile.js";

const setting = process.env["RXTHERM_HOSTILE_RUNS"];
const exhaustive = setting === "all";
const RUNS = exhaustive ? 0 : Number(setting ?? 25);
const tally: { name: string; cases: number; ms: number }[] = [];

afterAll(() => {
  const cases = tally.reduce((a, t) => a + t.cases, 0);
  const ms = tally.reduce((a, t) => a + t.ms, 0);
  console.log(`hostile-input suite: ${tally.length} entry points, ${cases} calls, ${(ms / 1000).toFixed(1)} s` +
    `${exhaustive ? " (exhaustive)" : ` (${RUNS} runs per entry point, slow ones ${Math.max(1, Math.round(RUNS / 4))})`}`);
});

describe("hostile inputs: the suite covers the public API", () => {
  it("ENTRY_POINTS lists every public function of src/index.ts", () => {
    const fns = Object.entries(rx).filter(([k, v]) => typeof v === "function" && k !== "RxthermError").map(([k]) => k).sort();
    expect(ENTRY_POINTS.map((e) => e.name).sort()).toEqual(fns);
  });

  it("every valid argument list passes the checks (the harness itself works)", () => {
    for (const ep of ENTRY_POINTS) {
      if (ep.name === "safeParseFormula" || ep.name === "isRxthermError") continue; // return values, never throw
      const args = ep.args();
      expect(() => ep.call(args), ep.name).not.toThrow();
      expect(nonFinite(ep.call(ep.args())), ep.name).toEqual([]);
    }
  });

  it("every entry point accepts deeply frozen valid arguments and leaves them as they were", () => {
    for (const ep of ENTRY_POINTS) {
      const args = deepFreeze(ep.args());
      const before = JSON.stringify(snapshot(args), (_k, x: unknown) => (typeof x === "function" ? "<fn>" : x));
      ep.call(args);
      expect(JSON.stringify(snapshot(args), (_k, x: unknown) => (typeof x === "function" ? "<fn>" : x)), ep.name).toBe(before);
    }
  });

  it("the probe catches what it is meant to catch (a TypeError, a NaN, a mutation, a slow call)", () => {
    const h = HOSTILE_VALUES[0]!;
    const typeError = probe({ name: "t", args: () => [1], call: () => (null as unknown as { x: number }).x }, [0], h);
    expect(typeError?.problem).toMatch(/^threw TypeError/);
    const nan = probe({ name: "n", args: () => [1], call: () => ({ v: NaN }) }, [0], h);
    expect(nan?.problem).toMatch(/non-finite result\.v/);
    const mutate = probe({ name: "m", args: () => [{ a: 1 }], call: (a) => { (a[0] as { a: number }).a = 2; } }, [1], h);
    expect(mutate?.problem).toBe("changed its input");
    const slow = probe({ name: "s", args: () => [], call: () => { const t = performance.now(); while (performance.now() - t < CALL_TIME_BOUND_MS + 50); } }, [0], h);
    expect(slow?.problem).toMatch(/^took/);
  });
});

describe("hostile inputs: only RxthermError, finite results, inputs unchanged, no hang", () => {
  for (const ep of ENTRY_POINTS) {
    it(`${ep.name}`, () => {
      const paths = pathsOf(ep.args());
      const t0 = performance.now();
      let cases = 0;
      if (exhaustive) {
        const findings: Finding[] = [];
        for (const p of paths) for (const v of HOSTILE_VALUES) {
          cases++;
          const f = probe(ep, p, v);
          if (f) findings.push(f);
        }
        expect(findings).toEqual([]);
      } else {
        fc.assert(
          fc.property(fc.constantFrom(...paths), fc.constantFrom(...HOSTILE_VALUES), (p, v) => {
            cases++;
            const f = probe(ep, p, v);
            if (f !== null) throw new Error(`${f.entry}(${f.path} = ${f.value}) ${f.problem}`);
          }),
          { numRuns: ep.slow ? Math.max(1, Math.round(RUNS / 4)) : RUNS },
        );
      }
      tally.push({ name: ep.name, cases, ms: performance.now() - t0 });
    }, exhaustive ? 600_000 : 120_000);
  }
});
