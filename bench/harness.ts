/**
 * Tiny benchmark harness: runs a function in timed batches and reports the median time per
 * call, so a case and its baseline measured in the same process can be compared as a ratio.
 * Never used by tests; speed targets are checked here, not in unit tests.
 */

import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

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
  // The warm-up runs the very loop that is timed afterwards (timeBatch), so that the timed batches run
  // the code the engine optimized during the warm-up. A separate warm-up loop left the timed loop to be
  // compiled during the first batches: the first case of a file measured up to twice its steady cost.
  const t0 = performance.now();
  let calls = 0;
  let chunk = 1;
  while (performance.now() - t0 < warmupMs) {
    timeBatch(fn, chunk);
    calls += chunk;
    if (chunk < 1024) chunk *= 2;
  }
  if (inner <= 0) {
    // aim for ~10 ms per batch
    const perCallMs = (performance.now() - t0) / Math.max(calls, 1);
    inner = Math.max(1, Math.round(10 / Math.max(perCallMs, 1e-6)));
  }
  const samples: number[] = [];
  for (let b = 0; b < batches; b++) samples.push((timeBatch(fn, inner) * 1e6) / inner);
  samples.sort((a, b) => a - b);
  const medianNs = samples[Math.floor(samples.length / 2)] ?? NaN;
  return { name, medianNs, perSecond: 1e9 / medianNs };
}

/** Milliseconds taken by `inner` calls of `fn` (each result kept in the sink). */
function timeBatch(fn: () => unknown, inner: number): number {
  const s = performance.now();
  for (let i = 0; i < inner; i++) benchSink = fn();
  return performance.now() - s;
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

/** One point of a cost-growth curve: problem size and median time per call. */
export interface GrowthPoint {
  size: number;
  medianNs: number;
}

/**
 * Least-squares slope of log(time) against log(size): the empirical exponent k of time ∝ sizeᵏ
 * (1 is linear, 2 quadratic). Needs at least two points of different size.
 * @param points - sizes and median times
 */
export function growthSlope(points: readonly GrowthPoint[]): number {
  const xs = points.map((p) => Math.log(p.size));
  const ys = points.map((p) => Math.log(p.medianNs));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < xs.length; i++) {
    sxy += (xs[i]! - mx) * (ys[i]! - my);
    sxx += (xs[i]! - mx) ** 2;
  }
  return sxy / sxx;
}

/**
 * Measure `make(size)` for each size and print the curve with its fitted exponent and the ratio
 * of the largest to the smallest case.
 * @param title - heading
 * @param sizes - problem sizes, ascending
 * @param make - builds the work of one size (called once per size, outside the timing)
 * @param target - human-readable target for the exponent or the end-to-end ratio
 * @param unit - what the size counts, e.g. "species"
 */
export function reportGrowth(title: string, sizes: readonly number[], make: (size: number) => () => unknown, target: string, unit: string): GrowthPoint[] {
  const points: GrowthPoint[] = sizes.map((size) => ({ size, medianNs: measure(`${title} ${size}`, make(size), { batches: 11 }).medianNs }));
  const first = points[0]!;
  const last = points[points.length - 1]!;
  console.log(
    `${title}: ${points.map((p) => `${p.size} ${unit} ${formatTime(p.medianNs)}`).join(" | ")} | ${last.size}/${first.size} ${unit}: ${(last.medianNs / first.medianNs).toFixed(2)}× | fitted exponent ${growthSlope(points).toFixed(2)} | target ${target}`,
  );
  return points;
}

/**
 * Run a peer script of bench/peers/ (Python, from the system's packages) with a JSON case on stdin
 * and return its JSON answer, or null (with the reason printed) when the interpreter or its
 * packages are not installed. Peers are optional: `apt-get install python3-scipy python3-sympy`.
 * @param script - file name under bench/peers/
 * @param input - the case, serialised to JSON
 */
export function runPeer<T>(script: string, input: unknown): T | null {
  const path = fileURLToPath(new URL(`../../bench/peers/${script}`, import.meta.url));
  const r = spawnSync("/usr/bin/python3", [path], { input: JSON.stringify(input), encoding: "utf8", timeout: 300_000 });
  if (r.status !== 0) {
    const why = r.error ? r.error.message : (r.stderr.trim().split("\n").pop() ?? `exit ${r.status}`);
    console.log(`  (peer ${script} not run: ${why})`);
    return null;
  }
  return JSON.parse(r.stdout) as T;
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

/**
 * Measure cases in many short interleaved rounds (each round runs every case `inner` times, in turn)
 * and give each case's 10th-percentile time per call: on a shared machine the fastest rounds are the
 * ones nothing else interrupted, and interleaving puts every case under the same drift of the load.
 * @param cases - label and work of each case
 * @param rounds - number of rounds
 * @param inner - calls per case per round
 */
export function interleavedP10(cases: readonly (readonly [string, () => unknown])[], rounds = 300, inner = 40): BenchResult[] {
  const times: number[][] = cases.map(() => []);
  for (const [, fn] of cases) for (let i = 0; i < 200; i++) benchSink = fn();
  for (let r = 0; r < rounds; r++) {
    cases.forEach(([, fn], c) => {
      const s = performance.now();
      for (let i = 0; i < inner; i++) benchSink = fn();
      (times[c] as number[]).push(((performance.now() - s) * 1e6) / inner);
    });
  }
  return cases.map(([name], c) => {
    const t = (times[c] as number[]).sort((a, b) => a - b);
    const ns = t[Math.floor(t.length / 10)] ?? NaN;
    return { name, medianNs: ns, perSecond: 1e9 / ns };
  });
}
