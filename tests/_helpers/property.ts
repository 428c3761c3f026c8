/**
 * Property tests on fast-check with vitest's `it`: `test.prop([arbitraries], params?)(name, predicate, timeout?)`.
 *
 * A thin local twin of the usual vitest integration, written because importing that package costs
 * about 2.5 s of CPU per test file (it loads the whole test runner again), which dominated the suite's
 * run time. The predicate receives one value per arbitrary; it fails by throwing (an `expect`) or by
 * returning `false`. Predicates declared `async` run as async properties.
 */
import fc from "fast-check";
import { it } from "vitest";

export { fc };

type ArbValues<A extends readonly fc.Arbitrary<unknown>[]> = { [K in keyof A]: A[K] extends fc.Arbitrary<infer T> ? T : never };

/** Run a property: resolves when it holds, rejects with fast-check's counterexample report otherwise. */
export async function checkProperty(
  arbitraries: readonly fc.Arbitrary<unknown>[],
  predicate: (...values: never[]) => boolean | void | Promise<boolean | void>,
  params?: fc.Parameters<never>,
): Promise<void> {
  const arbs = arbitraries as unknown as [fc.Arbitrary<unknown>];
  params = withEnvironment(params);
  const run = predicate as unknown as (...v: unknown[]) => boolean | void | Promise<boolean | void>;
  if (run.constructor.name === "AsyncFunction") {
    await fc.assert(fc.asyncProperty(...arbs, async (...v: unknown[]) => (await run(...v)) !== false), params as never);
  } else {
    fc.assert(fc.property(...arbs, (...v: unknown[]) => run(...v) !== false), params as never);
  }
}

/**
 * Exploration knobs from the environment: `RXTHERM_FC_RUNS` multiplies every property's run count
 * (default 1), `RXTHERM_FC_SEED` replays one seed. Seeds are random by default, so every run explores.
 */
function withEnvironment<T>(params?: fc.Parameters<T>): fc.Parameters<T> | undefined {
  const env = typeof process === "undefined" ? {} : process.env;
  const factor = Number(env["RXTHERM_FC_RUNS"] ?? 1);
  const seed = env["RXTHERM_FC_SEED"];
  if (factor === 1 && seed === undefined) return params;
  const out: fc.Parameters<T> = { ...params };
  if (Number.isFinite(factor) && factor > 0) out.numRuns = Math.ceil((params?.numRuns ?? 100) * factor);
  if (seed !== undefined) out.seed = Number(seed);
  return out;
}

/** `test.prop(arbitraries, params)(name, predicate, timeout)`: one vitest test running a fast-check property. */
export const test = {
  prop<const A extends readonly fc.Arbitrary<unknown>[]>(arbitraries: A, params?: fc.Parameters<ArbValues<A>>) {
    return (name: string, predicate: (...values: ArbValues<A>) => boolean | void | Promise<boolean | void>, timeout?: number): void => {
      it(name, () => checkProperty(arbitraries, predicate as never, params as never), timeout);
    };
  },
};
