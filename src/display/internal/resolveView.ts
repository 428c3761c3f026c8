/**
 * Private: find the table view of anything the display functions accept — a result that carries one,
 * a stream `{ T, flows }`, or bare flows (species → number).
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue } from "../../errors.js";
import { RESULT_VIEW } from "../../view/displaySymbols.js";
import { FLOW_UNIT, recordTable } from "../../view/recordTable.js";
import type { ResultView } from "../../view/types.js";

/** The view of `value`; throws INVALID_ARGUMENT naming `fn` for anything else. */
export function resolveView(value: unknown, fn: string): ResultView {
  if (value !== null && typeof value === "object") {
    const method = (value as { [RESULT_VIEW]?: unknown })[RESULT_VIEW];
    if (typeof method === "function") return (method as () => ResultView).call(value);
    if (isFlows(value)) {
      return { title: "flows", tables: [recordTable(undefined, [{ label: "amount", unit: FLOW_UNIT, values: value }])] };
    }
    const s = value as { T?: unknown; flows?: unknown; P?: unknown };
    if (typeof s.T === "number" && Number.isFinite(s.T) && isFlows(s.flows) && (s.P === undefined || (typeof s.P === "number" && Number.isFinite(s.P)))) {
      const p = typeof s.P === "number" ? `, ${s.P / 1000} kPa` : "";
      return { title: `stream at ${s.T} K${p}`, tables: [recordTable(undefined, [{ label: "amount", unit: FLOW_UNIT, values: s.flows }])] };
    }
  }
  throw new RxthermError(
    "INVALID_ARGUMENT",
    `${fn} requires an rxtherm result (formula, reaction, species, extents, combustion, enthalpy, duty, flame, chart...), a stream or flows, got ${describe(value)}`,
    { got: describe(value) },
  );
}

/** True for a non-empty plain record of finite numbers. */
function isFlows(v: unknown): v is Record<string, number> {
  if (v === null || typeof v !== "object" || Array.isArray(v)) return false;
  const values = Object.values(v);
  return values.length > 0 && values.every((x) => typeof x === "number" && Number.isFinite(x));
}

function describe(v: unknown): string {
  if (v === null) return "null";
  if (Array.isArray(v)) return "an array";
  return typeof v === "object" ? "an object of another kind" : `${typeof v} ${describeValue(v).slice(0, 40)}`;
}
