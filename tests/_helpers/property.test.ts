import { describe, expect, it } from "vitest";
import { checkProperty, fc } from "./property.js";

describe("checkProperty (the local property-test helper)", () => {
  it("resolves when the property holds for every generated value", async () => {
    await expect(checkProperty([fc.integer(), fc.integer()], (a: number, b: number) => a + b === b + a)).resolves.toBeUndefined();
  });
  it("rejects with the counterexample when the predicate returns false", async () => {
    await expect(checkProperty([fc.integer({ min: 0, max: 100 })], (a: number) => a < 50)).rejects.toThrow(/Counterexample/);
  });
  it("rejects when the predicate throws (a failed expect)", async () => {
    await expect(checkProperty([fc.integer({ min: 0, max: 100 })], (a: number) => { expect(a).toBeLessThan(50); })).rejects.toThrow(/Counterexample/);
  });
  it("awaits async predicates and rejects when one fails", async () => {
    await expect(checkProperty([fc.integer({ min: 0, max: 100 })], async (a: number) => { await Promise.resolve(); expect(a).toBeLessThan(50); })).rejects.toThrow(/Counterexample/);
  });
  it("passes the parameters on (numRuns)", async () => {
    let runs = 0;
    await checkProperty([fc.integer()], () => { runs++; }, { numRuns: 17 } as never);
    expect(runs).toBe(Math.ceil(17 * Number(process.env["RXTHERM_FC_RUNS"] ?? 1)));
  });
});
