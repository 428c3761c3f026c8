/**
 * Safeguarded bracketed root finding in float64: Brent's method, or Newton's method with a
 * bisection fallback when the derivative is known. Used by the energy balances and the flame
 * solvers to find the temperature that closes an enthalpy balance.
 *
 * @module
 */
import { RxthermError, optionsOf, describeValue } from "../errors.js";

/**
 * Options of {@link findRoot}.
 *
 * @category Numeric
 */
export interface FindRootOptions {
  /**
   * Absolute tolerance on x, in the unit of x (K for temperatures). Brent's method stops when the
   * bracket around the root is narrower than `2·(toleranceX + 2·ε·|x|)` (ε = 2⁻⁵²); the Newton
   * variant stops when its last step, or the bracket, is that small.
   * @defaultValue 1e-10
   */
  toleranceX?: number;
  /**
   * Tolerance on |f(x)|: iteration also stops as soon as |f(x)| ≤ toleranceF, in the unit of f.
   * The default 0 means only an exact zero stops it early.
   * @defaultValue 0
   */
  toleranceF?: number;
  /**
   * Largest number of iterations (function evaluations after the bracket is found).
   * @defaultValue 200
   */
  maxIterations?: number;
  /**
   * Hard limits `[lower, upper]` inside which the bracket may be widened when f has the same sign
   * at both ends of the starting bracket; f is never evaluated outside them. Pass the starting
   * bracket itself to forbid widening.
   * @defaultValue [-Infinity, Infinity]
   */
  limits?: readonly [number, number];
  /**
   * Largest number of widening steps (each widens the bracket by 1.6 times its width on the
   * side where |f| is smaller).
   * @defaultValue 60
   */
  maxExpansions?: number;
  /**
   * The derivative f′(x). When given, the solver takes Newton steps and falls back to bisection
   * whenever a Newton step would leave the bracket or not shrink it fast enough.
   */
  derivative?: (x: number) => number;
}

/**
 * Result of {@link findRoot}.
 *
 * @category Numeric
 */
export interface RootResult {
  /** The root x, in the unit of the bracket. */
  readonly root: number;
  /** Iterations used after the bracket was found. */
  readonly iterations: number;
  /** f(root), in the unit of f. */
  readonly residual: number;
  /** Final bracket `[lower, upper]` that holds the root (f changes sign across it or is zero at an end). */
  readonly bracket: readonly [number, number];
  /** Number of widening steps the bracket needed (0 when the starting bracket already held a sign change). */
  readonly expansions: number;
}

const EPS = 2 ** -52;
const EXPANSION_FACTOR = 1.6;

/**
 * Find x with f(x) = 0 inside a bracket, safely.
 *
 * Without `derivative` this is Brent's method: inverse quadratic interpolation or the secant
 * step when they make good progress, bisection otherwise, so the bracket always shrinks and the
 * cost is at most about (log₂(width/tol))² evaluations, usually far fewer (superlinear order
 * ≈ 1.84 near a simple root). With `derivative` it is Newton's method kept inside the bracket:
 * a step that would leave the bracket or fail to halve the previous step is replaced by bisection.
 *
 * When f has the same sign at both ends of `bracket`, the bracket is widened step by step
 * (by 1.6× its width, toward the end with smaller |f|) without leaving `options.limits`.
 *
 * @param f - the function, x → f(x); must return a finite number at every point it is asked about
 * @param bracket - starting interval `[a, b]` (a ≠ b, either order), in the unit of x
 * @param options - tolerances, iteration and widening limits, optional derivative
 * @returns the root, iterations, residual f(root), the final bracket and the widening steps used
 * @throws RxthermError `INVALID_ARGUMENT` when the bracket or an option is not finite / out of its
 *   domain, the bracket lies outside `limits`, or f returns a non-finite value
 *   (details: `x`, `value`)
 * @throws RxthermError `NO_BRACKET` when no sign change is found inside `limits`
 *   (details: `bracket` tried, `fValues` at its ends, `limits`, `expansions`)
 * @throws RxthermError `NO_CONVERGENCE` when `maxIterations` is reached
 *   (details: `iterations`, `bracket`, `best`, `residual`)
 * @category Numeric
 * @example
 * findRoot((x) => x * x - 2, [0, 2]).root // => 1.41421356237 (√2 to within the default toleranceX 1e-10)
 * @see R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall 1973, chapter 4.
 */
export function findRoot(
  f: (x: number) => number,
  bracket: readonly [number, number],
  options: FindRootOptions = {},
): RootResult {
  options = optionsOf(options, "findRoot");
  if (typeof f !== "function") {
    throw new RxthermError("INVALID_ARGUMENT", `findRoot requires f to be a function, got ${describeValue(f)}`, { path: "f" });
  }
  const opts = resolveOptions(bracket, options);
  const evaluate = (x: number): number => {
    const v = f(x);
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new RxthermError("INVALID_ARGUMENT", `findRoot requires f to return a finite number, got ${describeValue(v)} at x = ${x}`, { x, value: v });
    }
    return v;
  };

  // ── find a bracket ────────────────────────────────────────────────────────
  let a = Math.min(bracket[0], bracket[1]);
  let b = Math.max(bracket[0], bracket[1]);
  let fa = evaluate(a);
  let fb = evaluate(b);
  let expansions = 0;
  const [lo, hi] = opts.limits;
  while (Math.sign(fa) === Math.sign(fb) && fa !== 0) {
    const canLower = a > lo;
    const canUpper = b < hi;
    if (expansions >= opts.maxExpansions || (!canLower && !canUpper)) {
      throw new RxthermError(
        "NO_BRACKET",
        `findRoot found no sign change of f in [${a}, ${b}] (f = ${fa}, ${fb}) within the limits [${lo}, ${hi}]`,
        { bracket: [a, b], fValues: [fa, fb], limits: [lo, hi], expansions },
      );
    }
    const width = b - a;
    expansions++;
    if ((Math.abs(fa) < Math.abs(fb) && canLower) || !canUpper) {
      const next = Math.max(lo, a - EXPANSION_FACTOR * width);
      b = a; fb = fa; // the old end stays inside; keep the bracket tight
      a = next; fa = evaluate(a);
    } else {
      const next = Math.min(hi, b + EXPANSION_FACTOR * width);
      a = b; fa = fb;
      b = next; fb = evaluate(b);
    }
  }
  if (fa === 0) return { root: a, iterations: 0, residual: 0, bracket: [a, a], expansions };
  if (fb === 0) return { root: b, iterations: 0, residual: 0, bracket: [b, b], expansions };
  if (Math.abs(fa) <= opts.toleranceF) return { root: a, iterations: 0, residual: fa, bracket: [a, b], expansions };
  if (Math.abs(fb) <= opts.toleranceF) return { root: b, iterations: 0, residual: fb, bracket: [a, b], expansions };

  return opts.derivative
    ? newtonInBracket(evaluate, opts.derivative, a, fa, b, fb, opts, expansions)
    : brent(evaluate, a, fa, b, fb, opts, expansions);
}

interface ResolvedOptions {
  toleranceX: number;
  toleranceF: number;
  maxIterations: number;
  limits: readonly [number, number];
  maxExpansions: number;
  derivative: ((x: number) => number) | undefined;
}

function resolveOptions(bracket: readonly [number, number], o: FindRootOptions): ResolvedOptions {
  const bad = (msg: string, details: Record<string, unknown>): RxthermError =>
    new RxthermError("INVALID_ARGUMENT", `findRoot requires ${msg}`, details);
  if (!Array.isArray(bracket) || bracket.length !== 2 || !Number.isFinite(bracket[0]) || !Number.isFinite(bracket[1]) || bracket[0] === bracket[1]) {
    throw bad(`a bracket of two different finite numbers, got ${describeValue(bracket)}`, { bracket });
  }
  const toleranceX = o.toleranceX ?? 1e-10;
  const toleranceF = o.toleranceF ?? 0;
  const maxIterations = o.maxIterations ?? 200;
  const maxExpansions = o.maxExpansions ?? 60;
  const limits = o.limits ?? [-Infinity, Infinity];
  if (typeof toleranceX !== "number" || !(toleranceX > 0) || !Number.isFinite(toleranceX)) throw bad(`toleranceX > 0, got ${describeValue(toleranceX)}`, { toleranceX });
  if (typeof toleranceF !== "number" || !(toleranceF >= 0) || !Number.isFinite(toleranceF)) throw bad(`toleranceF >= 0, got ${describeValue(toleranceF)}`, { toleranceF });
  if (!Number.isInteger(maxIterations) || maxIterations < 1) throw bad(`an integer maxIterations >= 1, got ${describeValue(maxIterations)}`, { maxIterations });
  if (!Number.isInteger(maxExpansions) || maxExpansions < 0) throw bad(`an integer maxExpansions >= 0, got ${describeValue(maxExpansions)}`, { maxExpansions });
  if (!Array.isArray(limits) || limits.length !== 2 || typeof limits[0] !== "number" || typeof limits[1] !== "number" || Number.isNaN(limits[0]) || Number.isNaN(limits[1]) || !(limits[0] < limits[1])) {
    throw bad(`limits [lower, upper] with lower < upper, got ${describeValue(limits)}`, { limits });
  }
  const a = Math.min(bracket[0], bracket[1]);
  const b = Math.max(bracket[0], bracket[1]);
  if (a < limits[0] || b > limits[1]) throw bad(`the bracket [${a}, ${b}] to lie inside the limits [${limits[0]}, ${limits[1]}]`, { bracket, limits });
  if (o.derivative !== undefined && typeof o.derivative !== "function") throw bad("derivative to be a function", {});
  return { toleranceX, toleranceF, maxIterations, limits: [limits[0], limits[1]], maxExpansions, derivative: o.derivative };
}

/** Brent's zero finder; f(a) and f(b) have opposite signs and neither is zero. */
function brent(
  f: (x: number) => number, a: number, fa: number, b: number, fb: number,
  o: ResolvedOptions, expansions: number,
): RootResult {
  // b: best estimate; a: previous estimate; c: the end that keeps the sign change with b.
  let c = a;
  let fc = fa;
  let step = b - a;
  let previousStep = step;
  for (let iteration = 1; iteration <= o.maxIterations; iteration++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a; fc = fa; step = b - a; previousStep = step;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + o.toleranceX;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol || fb === 0 || Math.abs(fb) <= o.toleranceF) {
      return { root: b, iterations: iteration - 1, residual: fb, bracket: ordered(b, c), expansions };
    }
    if (Math.abs(previousStep) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // interpolation: secant when only two distinct points, inverse quadratic otherwise
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * half * q - Math.abs(tol * q), Math.abs(previousStep * q))) {
        previousStep = step;
        step = p / q;
      } else {
        step = half; previousStep = half;
      }
    } else {
      step = half; previousStep = half;
    }
    a = b; fa = fb;
    b += Math.abs(step) > tol ? step : (half > 0 ? tol : -tol);
    fb = f(b);
  }
  throw noConvergence(o.maxIterations, ordered(b, c), b, fb);
}

/** Newton's method kept inside [lo, hi], bisecting when a step misbehaves. */
function newtonInBracket(
  f: (x: number) => number, df: (x: number) => number,
  a: number, fa: number, b: number, fb: number,
  o: ResolvedOptions, expansions: number,
): RootResult {
  // orient so that f(neg) < 0 < f(pos)
  let neg = fa < 0 ? a : b;
  let pos = fa < 0 ? b : a;
  let x = Math.abs(fa) < Math.abs(fb) ? a : b;
  let fx = x === a ? fa : fb;
  let previousStep = Math.abs(b - a);
  let step = previousStep;
  for (let iteration = 1; iteration <= o.maxIterations; iteration++) {
    const dfx = df(x);
    const lower = Math.min(neg, pos);
    const upper = Math.max(neg, pos);
    const tol = 2 * EPS * Math.abs(x) + o.toleranceX;
    let candidate = Number.isFinite(dfx) && dfx !== 0 ? x - fx / dfx : NaN;
    // a Newton step must stay inside the bracket (ends included: a converged step may round onto x)
    // and at least halve the step before last; otherwise bisect
    if (!(candidate >= lower && candidate <= upper) || Math.abs(2 * fx) > Math.abs(previousStep * dfx)) {
      candidate = 0.5 * (lower + upper); // bisection
      previousStep = step;
      step = candidate - x;
    } else {
      previousStep = step;
      step = candidate - x;
    }
    x = candidate;
    fx = f(x);
    if (fx === 0 || Math.abs(fx) <= o.toleranceF) return { root: x, iterations: iteration, residual: fx, bracket: [x, x], expansions };
    if (fx < 0) neg = x; else pos = x;
    if (Math.abs(step) <= tol || Math.abs(pos - neg) <= 2 * tol) {
      return { root: x, iterations: iteration, residual: fx, bracket: ordered(neg, pos), expansions };
    }
  }
  throw noConvergence(o.maxIterations, ordered(neg, pos), x, fx);
}

function ordered(p: number, q: number): [number, number] {
  return p <= q ? [p, q] : [q, p];
}

function noConvergence(iterations: number, bracket: [number, number], best: number, residual: number): RxthermError {
  return new RxthermError(
    "NO_CONVERGENCE",
    `findRoot did not converge in ${iterations} iterations (bracket [${bracket[0]}, ${bracket[1]}])`,
    { iterations, bracket, best, residual },
  );
}
