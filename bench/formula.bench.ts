/**
 * parseFormula throughput on a mix of typical formulas, beside a naive regex-tokenizer parser written
 * here (same process, same inputs). Target: ≥ 1 million typical formulas per second, no cache.
 */
import { measure, report } from "./harness.js";
import { parseFormula } from "../src/formula/parseFormula.js";
import { molarMass } from "../src/formula/molarMass.js";

const MIX = [
  "CH4", "C6H12O6", "CuSO4·5H2O", "Ca(OH)2", "SO4^2-", "H2O(g)", "CO2", "NH4+", "K4[Fe(CN)6]", "C2H5OH",
  "O2", "N2", "H2SO4", "Fe2O3", "CaCO3(s)", "C8H18(l)",
];
const DECIMAL_MIX = ["Fe0.947O", "CaSO4·0.5H2O", "(Fe0.947O)3", "Li1.2Mn0.6Ni0.2O2"];

/**
 * Naive baseline: a regex tokenizer and a recursive-descent evaluator over the tokens, floats only, no
 * charges beyond ^n± and no phases beyond a trailing lowercase bracket. What a quick hand-written parser looks like.
 */
function naiveParse(text: string): Record<string, number> {
  let body = text.trim();
  const phase = /\((g|l|s|aq|cr)\)$/.exec(body);
  if (phase) body = body.slice(0, phase.index);
  body = body.replace(/\^?\d*[+-]+\d*$/, "");
  const tokens = body.match(/[A-Z][a-z]?|\d+(?:\.\d+)?|[()[\]{}]|[·*]/g) ?? [];
  let pos = 0;
  const parseSeq = (): Record<string, number> => {
    const acc: Record<string, number> = {};
    while (pos < tokens.length) {
      const t = tokens[pos] as string;
      if (t === ")" || t === "]" || t === "}" || t === "·" || t === "*") break;
      let part: Record<string, number>;
      if (t === "(" || t === "[" || t === "{") {
        pos++;
        part = parseSeq();
        pos++;
      } else {
        pos++;
        part = { [t]: 1 };
      }
      const n = pos < tokens.length && /^\d/.test(tokens[pos] as string) ? Number(tokens[pos++]) : 1;
      for (const k in part) acc[k] = (acc[k] ?? 0) + (part[k] as number) * n;
    }
    return acc;
  };
  const total = parseSeq();
  while (pos < tokens.length && (tokens[pos] === "·" || tokens[pos] === "*")) {
    pos++;
    const m = /^\d/.test(tokens[pos] ?? "") ? Number(tokens[pos++]) : 1;
    const part = parseSeq();
    for (const k in part) total[k] = (total[k] ?? 0) + (part[k] as number) * m;
  }
  return total;
}

export function run(): void {
  const n = MIX.length;
  let i = 0;
  const inner = 10_000;
  const lib = measure("parseFormula (typical mix)", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) s += parseFormula(MIX[(i++) % n] as string).charge;
    return s;
  }, { inner: 1 });
  let j = 0;
  const base = measure("naive regex parser", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) s += Object.keys(naiveParse(MIX[(j++) % n] as string)).length;
    return s;
  }, { inner: 1 });
  const perCall = (r: typeof lib) => ({ ...r, medianNs: r.medianNs / inner, perSecond: r.perSecond * inner });
  report("parse throughput", perCall(lib), perCall(base), "≥ 1 M formulas/s (median ≤ 1000 ns per formula)");

  const dn = DECIMAL_MIX.length;
  let d = 0;
  const dec = measure("parseFormula (decimal counts, exact path)", () => {
    let s = 0;
    for (let k = 0; k < 1000; k++) s += parseFormula(DECIMAL_MIX[(d++) % dn] as string).charge;
    return s;
  }, { inner: 1 });
  let e = 0;
  const decBase = measure("naive regex parser (decimal mix, float)", () => {
    let s = 0;
    for (let k = 0; k < 1000; k++) s += Object.keys(naiveParse(DECIMAL_MIX[(e++) % dn] as string)).length;
    return s;
  }, { inner: 1 });
  const per1000 = (r: typeof lib) => ({ ...r, medianNs: r.medianNs / 1000, perSecond: r.perSecond * 1000 });
  report("decimal path", per1000(dec), per1000(decBase), "informational (exact decimal arithmetic)");

  let m = 0;
  const mm = measure("molarMass(text) (typical mix)", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) s += molarMass(MIX[(m++) % n] as string);
    return s;
  }, { inner: 1 });
  let p = 0;
  const pOnly = measure("parseFormula alone (same mix)", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) s += parseFormula(MIX[(p++) % n] as string).charge;
    return s;
  }, { inner: 1 });
  report("molar mass", perCall(mm), perCall(pOnly), "informational (cost of the exact mass sum over parsing)");

  // Cost of handing out frozen results (issue 11): parseFormula freezes its `elements` and the
  // formula itself. Here the same two freezes on a fresh formula-shaped object, beside building
  // the object alone; the difference is what freezing adds to each parseFormula call.
  const sink: unknown[] = new Array(1024);
  let f = 0;
  const frozen = measure("build + freeze a formula-shaped result", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) {
      const elements: Record<string, number> = { C: f & 7, H: 4 };
      const r = Object.freeze({ text: "CH4", elements: Object.freeze(elements), charge: (f++) & 1, phase: null });
      sink[k & 1023] = r; // the result escapes, as parseFormula's does
      s += r.charge;
    }
    return s;
  }, { inner: 1 });
  let g = 0;
  const plain = measure("build the same result unfrozen", () => {
    let s = 0;
    for (let k = 0; k < inner; k++) {
      const elements: Record<string, number> = { C: g & 7, H: 4 };
      const r = { text: "CH4", elements, charge: (g++) & 1, phase: null };
      sink[k & 1023] = r;
      s += r.charge;
    }
    return s;
  }, { inner: 1 });
  report("freezing cost", perCall(frozen), perCall(plain), "informational (the difference is added to each parseFormula call)");
}
