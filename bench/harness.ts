/**
 * Tiny benchmark harness: runs a function in timed batches and reports the median time per
 * call, so a case and its baseline measured in the same process can be compared as a ratio.
 * Never used by tests; speed targets are checked here, not in unit tests.
 */

/** Result of one measured case. */
export interface BenchResult {
  name: string;
  /** Median nanoseconds per call over the batches. */
  medianNs: number;
  /** Calls per second from the median. */
  perSecond: number;
}

/** Sink that keeps results alive so the JIT cannot drop the work. */
export let benchSink: unknown = undefined;

/**
 * Measure `fn` (called `inner` times per batch) over `batches` batches after a warm-up.
 * @param name - label printed in the report
 * @param fn - the work; its return value is kept in a sink
 * @param options - inner calls per batch, batch count, warm-up milliseconds
 */
export function measure(
  name: string,
  fn: () => unknown,
  options: { inner?: number; batches?: number; warmupMs?: number } = {},
): BenchResult {
  const warmupMs = options.warmupMs ?? 200;
  const batches = options.batches ?? 25;
  let inner = options.inner ?? 0;
  const t0 = performance.now();
  let calls = 0;
  while (performance.now() - t0 < warmupMs) {
    benchSink = fn();
    calls++;
  }
  if (inner <= 0) {
    // aim for ~10 ms per batch
    const perCallMs = (performance.now() - t0) / Math.max(calls, 1);
    inner = Math.max(1, Math.round(10 / Math.max(perCallMs, 1e-6)));
  }
  const samples: number[] = [];
  for (let b = 0; b < batches; b++) {
    const s = performance.now();
    for (let i = 0; i < inner; i++) benchSink = fn();
    samples.push(((performance.now() - s) * 1e6) / inner);
  }
  samples.sort((a, b) => a - b);
  const medianNs = samples[Math.floor(samples.length / 2)] ?? NaN;
  return { name, medianNs, perSecond: 1e9 / medianNs };
}

/** Format a time in ns/µs/ms for the report. */
export function formatTime(ns: number): string {
  if (ns < 1e3) return `${ns.toFixed(1)} ns`;
  if (ns < 1e6) return `${(ns / 1e3).toFixed(2)} µs`;
  return `${(ns / 1e6).toFixed(2)} ms`;
}

/**
 * Print a case, its baseline and the ratio case/baseline, with the target it is held to.
 * @param title - heading
 * @param result - the measured library case
 * @param baseline - the baseline measured in the same process
 * @param target - human-readable target, e.g. "median < 50 µs"
 */
export function report(title: string, result: BenchResult, baseline: BenchResult | null, target: string): void {
  const ratio = baseline ? ` | baseline ${baseline.name}: ${formatTime(baseline.medianNs)} | ratio ${(result.medianNs / baseline.medianNs).toFixed(2)}×` : "";
  console.log(`${title}: ${result.name} ${formatTime(result.medianNs)} (${fmtRate(result.perSecond)}/s)${ratio} | target ${target}`);
}

function fmtRate(r: number): string {
  if (r >= 1e6) return `${(r / 1e6).toFixed(2)} M`;
  if (r >= 1e3) return `${(r / 1e3).toFixed(1)} k`;
  return r.toFixed(0);
}

/**
 * Measure a case and its baseline in alternating rounds and keep the round with the median ratio:
 * on a shared machine the load drifts between measurements, and pairing keeps both under the same load.
 * @param caseName - label of the library case
 * @param fn - the library case
 * @param baseName - label of the baseline
 * @param baseFn - the baseline
 * @param rounds - number of alternating rounds
 */
export function paired(caseName: string, fn: () => unknown, baseName: string, baseFn: () => unknown, rounds = 5): [BenchResult, BenchResult] {
  const pairs: [BenchResult, BenchResult][] = [];
  for (let r = 0; r < rounds; r++) {
    const b = measure(baseName, baseFn, { batches: 9, warmupMs: 100 });
    const c = measure(caseName, fn, { batches: 9, warmupMs: 100 });
    pairs.push([c, b]);
  }
  pairs.sort((x, y) => x[0].medianNs / x[1].medianNs - y[0].medianNs / y[1].medianNs);
  return pairs[Math.floor(pairs.length / 2)]!;
}
