/**
 * Cost of the display machinery, each case beside a baseline in the same process:
 * - how a result gets its (non-enumerable) display methods: a shared prototype (used on the hot paths,
 *   parseFormula and reactions) against a plain object literal, and `attachView` (defineProperties, used
 *   where a result is made once per solve) against the same literal;
 * - rendering the HTML tables of a flame result against solving it (display is paid only when asked).
 */
import { measure, report } from "./harness.js";
import { attachView, viewDescriptors, viewPrototype } from "../src/view/attachView.js";
import { adiabaticFlameTemperature } from "../src/flame/adiabaticFlameTemperature.js";
import { toHtml } from "../src/display/toHtml.js";

const D = viewDescriptors((r: { text: string }) => ({ title: r.text, tables: [] }));
const PROTO = viewPrototype(D);
const TEXTS = ["CH4", "H2O", "CO2", "NH3"];

export function run(): void {
  let i = 0;
  const literal = measure("object literal (4 fields) ×1000", () => {
    let s = 0;
    for (let k = 0; k < 1000; k++) {
      const o = { text: TEXTS[(i++) & 3] as string, elements: { C: k }, charge: 0, phase: null };
      s += o.text.length;
    }
    return s;
  }, { inner: 1 });
  let j = 0;
  const proto = measure("Object.create(display prototype) + 4 fields ×1000", () => {
    let s = 0;
    for (let k = 0; k < 1000; k++) {
      const o = Object.create(PROTO) as { text: string; elements: object; charge: number; phase: null };
      o.text = TEXTS[(j++) & 3] as string;
      o.elements = { C: k };
      o.charge = 0;
      o.phase = null;
      s += o.text.length;
    }
    return s;
  }, { inner: 1 });
  report("display prototype (hot paths)", proto, literal, "informational: a few ns per result (parseFormula takes ~300 ns)");
  let m = 0;
  const attached = measure("attachView(literal) ×1000", () => {
    let s = 0;
    for (let k = 0; k < 1000; k++) s += attachView({ text: TEXTS[(m++) & 3] as string, elements: { C: k }, charge: 0, phase: null }, D).text.length;
    return s;
  }, { inner: 1 });
  report("attachView (once per solve)", attached, literal, "informational: why hot paths use the prototype");

  const input = { fuel: "CH4(g)", equivalenceRatio: 1 } as const;
  const solve = measure("adiabaticFlameTemperature (equilibrium)", () => adiabaticFlameTemperature(input));
  const flame = adiabaticFlameTemperature(input);
  const html = measure("toHtml(flame result)", () => toHtml(flame));
  report("render on demand", html, solve, "informational (paid only when displayed)");
}
