import { RxthermError, describeValue, knownKeys, rejectUnknownKeys } from "../errors.js";
import { type CombustionInput, combustion } from "./combustion.js";

/** The keys of the two readings' inputs (a misspelt one is an error, not a silent default). */
const SHARED = ["fuel", "oxidizer", "oxygenEnrichment", "humidity", "carbonToCO", "allowExtremeMixture", "library"] as const;
const O2_KEYS = /* @__PURE__ */ knownKeys<ExcessAirFromFlueO2Input>()(...SHARED, "dryO2");
const CO2_KEYS = /* @__PURE__ */ knownKeys<ExcessAirFromFlueCO2Input>()(...SHARED, "dryCO2");

/**
 * Input of {@link excessAirFromFlueO2}: the fuel and oxidizer as for {@link combustion}
 * (without excess air or equivalence ratio) and the analyser reading.
 *
 * @category Combustion
 */
export interface ExcessAirFromFlueO2Input extends Omit<CombustionInput, "excessAir" | "equivalenceRatio"> {
  /** O₂ mole fraction of the dry flue gas (0.03 for 3 %), as a dry-basis analyser reads it. */
  dryO2: number;
}

/**
 * Input of {@link excessAirFromFlueCO2}.
 *
 * @category Combustion
 */
export interface ExcessAirFromFlueCO2Input extends Omit<CombustionInput, "excessAir" | "equivalenceRatio"> {
  /** CO₂ mole fraction of the dry flue gas (0.10 for 10 %). */
  dryCO2: number;
}

/**
 * Excess air of a burner from the O₂ reading of a dry-basis flue-gas analyser.
 *
 * The dry flue gas of {@link combustion} is linear in the excess air e: its O₂ is
 * O(e) = O₀ + e·ΔO and its total D(e) = D₀ + e·ΔD (both computed from two evaluations of
 * `combustion`), so the reading x = O(e)/D(e) gives e = (x·D₀ − O₀)/(ΔO − x·ΔD) exactly —
 * for the real fuel, oxidizer and CO fraction, not only the rule of thumb
 * e ≈ O₂%/(20.9 − O₂%), which holds exactly for pure carbon in dry air and overstates the
 * excess air of hydrogen-rich fuels. Complete combustion assumed (or the given CO fraction);
 * air in-leakage upstream of the analyser reads as excess air.
 *
 * @param input - fuel, oxidizer options and the dry O₂ mole fraction (fraction, not %)
 * @returns excess air as a fraction (0.15 = 15 %)
 * @throws {@link RxthermError} `INVALID_ARGUMENT` when the reading is not in [stoichiometric O₂, oxidizer O₂) (details: `dryO2`, `range`)
 * @throws every error of {@link combustion} for the fuel and oxidizer
 * @example
 * excessAirFromFlueO2({ fuel: { C: 1 }, dryO2: 0.03 }) // => 0.16667 (= 0.03/(0.21 − 0.03), default 21/79 air)
 * @category Combustion
 * @see common practice (dry flue-gas O₂ balance; the 21/79 air of {@link AIR_21_79})
 */
export function excessAirFromFlueO2(input: ExcessAirFromFlueO2Input): number {
  return fromReading(input, "O2(g)", input?.dryO2, "dryO2", "excessAirFromFlueO2");
}

/**
 * Excess air of a burner from the CO₂ reading of a dry-basis flue-gas analyser.
 *
 * Same linear method as {@link excessAirFromFlueO2}: dry CO₂ C(e) = C₀ + e·ΔC and total
 * D(e) = D₀ + e·ΔD, so e = (C₀ − x·D₀)/(x·ΔD − ΔC). The dry CO₂ is largest at the
 * stoichiometric point and falls with excess air.
 *
 * @param input - fuel, oxidizer options and the dry CO₂ mole fraction (fraction, not %)
 * @returns excess air as a fraction
 * @throws {@link RxthermError} `INVALID_ARGUMENT` when the reading is above the stoichiometric dry CO₂ or at/below the oxidizer's own CO₂ (details: `dryCO2`, `range`)
 * @throws every error of {@link combustion} for the fuel and oxidizer
 * @example
 * excessAirFromFlueCO2({ fuel: { "CH4(g)": 1 }, oxidizer: AIR_21_79, dryCO2: 0.1 }) // => 0.155 (15.5 % excess air)
 * @category Combustion
 * @see common practice (dry flue-gas CO₂ balance)
 */
export function excessAirFromFlueCO2(input: ExcessAirFromFlueCO2Input): number {
  return fromReading(input, "CO2(g)", input?.dryCO2, "dryCO2", "excessAirFromFlueCO2");
}

function fromReading(
  input: ExcessAirFromFlueO2Input | ExcessAirFromFlueCO2Input,
  key: string,
  x: number | undefined,
  name: string,
  fn: string,
): number {
  if (input === null || typeof input !== "object") {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires an input object { fuel, ${name} }`, {});
  }
  rejectUnknownKeys(input, name === "dryO2" ? O2_KEYS : CO2_KEYS, fn, "input");
  if (typeof x !== "number" || !Number.isFinite(x) || x < 0 || x > 1) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${name} as a mole fraction in [0, 1], got ${describeValue(x)}${typeof x === "number" && x > 1 ? " — give a fraction, not %" : ""}`, {
      [name]: x,
    });
  }
  const base: CombustionInput = { ...input };
  delete (base as unknown as Record<string, unknown>)[name];
  const a = combustion({ ...base, excessAir: 0 });
  const b = combustion({ ...base, excessAir: 1 });
  const v0 = a.dryFlueGasTotal * (a.dry[key] ?? 0);
  const v1 = b.dryFlueGasTotal * (b.dry[key] ?? 0);
  const d0 = a.dryFlueGasTotal;
  const dv = v1 - v0;
  const dd = b.dryFlueGasTotal - d0;
  // reading at e = 0 and the limit as e → ∞
  const atStoich = v0 / d0;
  const atInfinity = dv / dd;
  const lo = Math.min(atStoich, atInfinity);
  const hi = Math.max(atStoich, atInfinity);
  // the stoichiometric reading is attainable (e = 0), the e → ∞ limit is not
  const inside = atInfinity > atStoich ? x >= atStoich && x < atInfinity : x <= atStoich && x > atInfinity;
  if (!inside) {
    throw new RxthermError(
      "INVALID_ARGUMENT",
      `${fn}: a dry ${key.replace("(g)", "")} reading of ${x} is impossible for this fuel and oxidizer at complete lean combustion; it must lie between ${atStoich} (stoichiometric) and ${atInfinity} (unlimited air)`,
      { [name]: x, range: [lo, hi] },
    );
  }
  const e = (x * d0 - v0) / (dv - x * dd);
  return Math.abs(e) < 1e-12 ? 0 : e;
}
