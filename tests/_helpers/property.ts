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
  const run = predicate as unknown as (...v: unknown[]) => boolean | void | Promise<boolean | void>;
  if (run.constructor.name === "AsyncFunction") {
    await fc.assert(fc.asyncProperty(...arbs, async (...v: unknown[]) => (await run(...v)) !== false), params as never);
  } else {
    fc.assert(fc.property(...arbs, (...v: unknown[]) => run(...v) !== false), params as never);
  }
}

/** `test.prop(arbitraries, params)(name, predicate, timeout)`: one vitest test running a fast-check property. */
export const test = {
  prop<const A extends readonly fc.Arbitrary<unknown>[]>(arbitraries: A, params?: fc.Parameters<ArbValues<A>>) {
    return (name: string, predicate: (...values: ArbValues<A>) => boolean | void | Promise<boolean | void>, timeout?: number): void => {
      it(name, () => checkProperty(arbitraries, predicate as never, params as never), timeout);
    };
  },
};
