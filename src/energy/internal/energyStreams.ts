/**
 * Private: stream validation and species resolution shared by the energy balances.
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue } from "../../errors.js";
import type { Library, Species } from "../../species/types.js";
import type { Stream } from "../../extent/types.js";
import { resolveSpeciesCached } from "../../enthalpy/resolveInputs.js";

/** One species' inlet and outlet amounts in an energy balance. */
export interface Entry {
  readonly species: Species;
  nIn: number;
  nOut: number;
  delta: number;
}

export interface ResolvedStream {
  readonly T: number;
  readonly species: Species[];
  readonly flows: number[];
}

/** Validate a stream, resolve its species, and add it to the net change (sign −1 inlet, +1 outlet). */
export function resolveStream(
  fn: string, s: Stream, label: string, library: Library | undefined,
  net: Map<string, Entry> | null, sign: number, warnings: string[] | null,
): ResolvedStream {
  if (s === null || typeof s !== "object" || s.flows === null || typeof s.flows !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${label} to be a stream { T, flows }`, { stream: label });
  }
  const T = s.T;
  if (typeof T !== "number" || !Number.isFinite(T) || T <= 0) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${label}.T to be an absolute temperature above 0 K, got ${describeValue(T)}`, { stream: label, T });
  }
  const species: Species[] = [];
  const flows: number[] = [];
  let total = 0;
  for (const key in s.flows) {
    const n = s.flows[key];
    if (typeof n !== "number" || !Number.isFinite(n)) throw new RxthermError("INVALID_ARGUMENT", `${fn} requires finite flows, got ${describeValue(n)} for ${key} in ${label}`, { stream: label, species: key, flow: n });
    if (n < 0) throw new RxthermError("NEGATIVE_FLOW", `${fn} requires non-negative flows, got ${n} for ${key} in ${label}`, { stream: label, species: key, flow: n });
    if (n === 0) continue;
    const sp = resolveSpeciesCached(fn, key, library);
    species.push(sp);
    flows.push(n);
    total += n;
    if (net) {
      const e = net.get(sp.key);
      if (e) {
        if (sign < 0) e.nIn += n; else e.nOut += n;
        e.delta += sign * n;
      } else net.set(sp.key, { species: sp, nIn: sign < 0 ? n : 0, nOut: sign > 0 ? n : 0, delta: sign * n });
    }
  }
  if (warnings) {
    if (T < 200) warnings.push(`${label}.T = ${T} K is below 200 K: was it given in °C instead of K?`);
    if (T > 4000) warnings.push(`${label}.T = ${T} K is above 4000 K: check the temperature unit`);
    if (total > 1e6) warnings.push(`${label} total flow ${total} is above 10^6: was it given in kmol or lbmol instead of mol?`);
  }
  return { T, species, flows };
}
