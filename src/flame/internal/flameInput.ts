/**
 * Private: input checking shared by the flame functions — solver limits, the equivalence ratio
 * from φ or excess air, the prepared flame problem and its first point.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue, knownKeys, rejectUnknownKeys } from "../../errors.js";
import { ATMOSPHERE_PA, STANDARD_TEMPERATURE_K } from "../../units.js";
import { AIR_21_79 } from "../../extent/combustion.js";
import { checkMixtureLimits } from "../../extent/mixtureLimits.js";
import type { EngineLimits } from "./equilibriumEngine.js";
import { prepareFlame, type FlamePoint, type FlameSetup } from "./flameProblem.js";
import type { AdiabaticFlameInput, AdiabaticFlameOptions } from "../types.js";

/** The keys the flame functions read (a misspelt one is an error, not a silent default). */
const FLAME_INPUT_KEYS = /* @__PURE__ */ knownKeys<AdiabaticFlameInput>()(
  "fuel", "oxidizer", "equivalenceRatio", "excessAir", "T", "fuelT", "oxidizerT", "P", "mode", "process", "products", "diluent",
  "diluentT", "library", "allowExtremeMixture",
);

/** The option keys of the flame functions. */
export const FLAME_OPTION_KEYS = /* @__PURE__ */ knownKeys<AdiabaticFlameOptions>()("toleranceK", "maxIterations", "elementTolerance", "extrapolate");

/** The solver settings when no option sets them (shared: the limits are only read). */
const DEFAULT_LIMITS: EngineLimits = /* @__PURE__ */ Object.freeze({ maxIterations: 300, elementTolerance: 1e-12, toleranceK: 1e-6, extrapolate: false });

/** Resolve and check the solver settings. */
export function resolveLimits(
  fn: string,
  options: { maxIterations?: number; elementTolerance?: number; toleranceK?: number; extrapolate?: boolean },
): EngineLimits {
  if (options.maxIterations === undefined && options.elementTolerance === undefined && options.toleranceK === undefined && options.extrapolate !== true) {
    return DEFAULT_LIMITS;
  }
  const maxIterations = options.maxIterations ?? 300;
  const elementTolerance = options.elementTolerance ?? 1e-12;
  const toleranceK = options.toleranceK ?? 1e-6;
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires maxIterations to be a positive integer, got ${describeValue(maxIterations)}`, { maxIterations });
  }
  if (!(elementTolerance > 0) || !Number.isFinite(elementTolerance)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires elementTolerance > 0, got ${describeValue(elementTolerance)}`, { elementTolerance });
  }
  if (!(toleranceK > 0) || !Number.isFinite(toleranceK)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires toleranceK > 0, got ${describeValue(toleranceK)}`, { toleranceK });
  }
  return { maxIterations, elementTolerance, toleranceK, extrapolate: options.extrapolate === true };
}

/** Validate an input, prepare the problem and the first point. */
export function prepareFlameInput(fn: string, input: AdiabaticFlameInput, options: AdiabaticFlameOptions): { setup: FlameSetup; point: FlamePoint } {
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object`, { input });
  }
  rejectUnknownKeys(input, FLAME_INPUT_KEYS, fn, "input");
  const lim = resolveLimits(fn, options);
  const mode = input.mode ?? "equilibrium";
  if (mode !== "complete" && mode !== "equilibrium") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires mode "complete" or "equilibrium", got ${describeValue(mode)}`, { mode });
  }
  const process = input.process ?? "constant-pressure";
  if (process !== "constant-pressure" && process !== "constant-volume") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires process "constant-pressure" or "constant-volume", got ${describeValue(process)}`, { process });
  }
  const point = flamePointOf(fn, input);
  // the default products (with the sulfur gases when a stream holds sulfur) are chosen with the reactants
  const products = input.products;
  if (products !== undefined && (!Array.isArray(products) || products.length === 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires products to be a non-empty list of species keys`, { products });
  }
  const setup = prepareFlame({
    fn,
    fuel: input.fuel,
    oxidizer: input.oxidizer ?? "air",
    air: AIR_21_79,
    diluent: input.diluent,
    mode,
    constantVolume: process === "constant-volume",
    products,
    library: input.library,
    lim,
  });
  return { setup, point };
}

/** The settings of one point (φ, stream temperatures, pressure), checked. */
export function flamePointOf(fn: string, input: AdiabaticFlameInput): FlamePoint {
  const phi = equivalenceRatioOf(fn, input.equivalenceRatio, input.excessAir, input.allowExtremeMixture);
  const T = positive(fn, "T", input.T ?? STANDARD_TEMPERATURE_K);
  const fuelT = positive(fn, "fuelT", input.fuelT ?? T);
  const oxidizerT = positive(fn, "oxidizerT", input.oxidizerT ?? T);
  const diluentT = positive(fn, "diluentT", input.diluentT ?? oxidizerT);
  const P = positive(fn, "P", input.P ?? ATMOSPHERE_PA);
  return { phi, fuelT, oxidizerT, diluentT, P };
}

/** φ from the equivalence ratio or the excess air (exactly one, or neither → 1). */
export function equivalenceRatioOf(fn: string, equivalenceRatio: number | undefined, excessAir: number | undefined, allowExtremeMixture?: boolean): number {
  if (equivalenceRatio !== undefined && excessAir !== undefined) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} takes either equivalenceRatio or excessAir, not both`, { equivalenceRatio, excessAir });
  }
  checkMixtureLimits(fn, { excessAir, equivalenceRatio }, allowExtremeMixture);
  if (excessAir !== undefined) {
    if (typeof excessAir !== "number" || !Number.isFinite(excessAir) || !(excessAir > -1)) {
      throw new RxthermError("INVALID_ARGUMENT", `${fn} requires excessAir > −1 (a fraction: 0.2 = 20 % excess), got ${describeValue(excessAir)}`, { excessAir });
    }
    return 1 / (1 + excessAir);
  }
  const phi = equivalenceRatio ?? 1;
  if (typeof phi !== "number" || !Number.isFinite(phi) || !(phi > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires equivalenceRatio > 0, got ${describeValue(phi)}`, { equivalenceRatio: phi });
  }
  return phi;
}

function positive(fn: string, name: string, v: number): number {
  if (typeof v !== "number" || !Number.isFinite(v) || !(v > 0)) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${name} > 0, got ${describeValue(v)}`, { [name]: v });
  }
  return v;
}

