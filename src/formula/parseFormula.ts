import {
  decimalCompare, decimalPlus, decimalTimes, decimalToNumber, exactDecimal, exactDecimalOfNumber, type ExactDecimalValue,
} from "../numeric/exactDecimal.js";
import { RxthermError, type RxthermErrorCode, describeValue } from "../errors.js";
import { ELEMENT_KEY_COUNT, INDEX_SYMBOLS, symbolIndex } from "./internal/elementIndex.js";
import type { Formula, Phase } from "./types.js";
import { FORMULA_PROTOTYPE } from "./internal/formulaView.js";

/**
 * The documented limits of the formula grammar. Text beyond them is refused with a clear error
 * instead of being parsed slowly or inexactly.
 *
 * - `maxLength` — longest accepted text, in UTF-16 code units (`INPUT_TOO_LONG`);
 * - `maxNestingDepth` — deepest bracket nesting (`NESTING_TOO_DEEP`);
 * - `maxCount` — largest count, as written and after multiplying out groups and adduct parts
 *   (`COUNT_TOO_LARGE`);
 * - `minCount` — smallest count, as written and after multiplying out (`INVALID_COUNT`);
 * - `maxDecimalPlaces` — most digits after the decimal point of a written count (`INVALID_COUNT`);
 * - `maxCharge` — largest charge magnitude (`INVALID_CHARGE`).
 *
 * @category Formula
 * @example
 * FORMULA_LIMITS.maxNestingDepth // => 16
 */
export const FORMULA_LIMITS = /* @__PURE__ */ Object.freeze({
  maxLength: 4096,
  maxNestingDepth: 16,
  maxCount: 1e9,
  minCount: 1e-6,
  maxDecimalPlaces: 24,
  maxCharge: 99,
} as const);

/**
 * Parse a chemical formula such as `CuSO4·5H2O`, `[Fe(CN)6]^4-`, `Fe0.947O` or `H2O(g)`.
 *
 * Grammar (case matters: `Co` is cobalt, `CO` carbon monoxide):
 * - **Elements**: any of the 118 symbols, plus `D` (deuterium) and `T` (tritium) as their own keys.
 * - **Counts**: a positive integer (`H2`) or an exact decimal (`Fe0.947O`, `O6.5`) after an element or a
 *   closing bracket; Unicode subscript digits are accepted (`H₂O`). Decimals are read exactly with a private
 *   decimal.js constructor (1000 significant digits, half-even), so nested multipliers multiply exactly:
 *   `(Fe0.947O)3` gives Fe 2.841, never 2.8409999999999997. Each count in the result is the double nearest
 *   to the exact decimal. A `.` between two digits is a decimal point (`Li1.2Mn0.6Ni0.2O2`), except where the
 *   digits after it are a whole number followed by water, `H2O` or `D2O`: `CuSO4.5H2O` is the pentahydrate, as
 *   plant documents write it. `·` or `*` (`CuSO4·5H2O`) are never ambiguous.
 * - **Groups**: `()`, `[]`, `{}` nested up to {@link FORMULA_LIMITS} `.maxNestingDepth` deep; each closing bracket must
 *   match the kind of the last open one.
 * - **Adducts**: parts joined by `·` (U+00B7), `•`, `∙`, `⋅`, `*` or `.`, each with an optional leading
 *   multiplier (`CuSO4·5H2O`, `CaSO4·0.5H2O`, `3CdSO4·8H2O`); spaces are allowed around the separator.
 *   A leading multiplier on a formula without a separator (`2H2O`) is refused: coefficients belong to equations.
 * - **Charge**, at the end: `SO4^2-`, `SO4^-2`, `Fe^{3+}`, `SO4-2`, `Fe+3`, `SO4--`, `NH4+`, `Fe3+`, and
 *   superscripts (`Fe³⁺`, `SO₄²⁻`); `−` (U+2212) counts as a minus sign. In `Fe3+`, where a single element
 *   symbol is followed by digits and one sign, the digits are the charge (Fe³⁺, O²⁻, N³⁻); after anything longer
 *   (`NH4+`, `H2PO4-`) the digits are the count of the last element. Write `O2^-` for superoxide, `N3^-` for azide.
 * - **Electron**: `e-` (also `e^-`, `e⁻`): no elements, charge −1.
 * - **Phase**, last: `(g)`, `(l)`, `(s)`, `(aq)`, `(cr)`; `(gr)` (graphite) is read as `cr`. A bracket whose
 *   content starts with a lowercase letter is a phase, not a group.
 * - Whitespace at either end is ignored; inside a formula it is allowed only around an adduct separator.
 * - The texts `NaN` and `Infinity` (non-finite numbers printed as text) are refused.
 *
 * Method: one left-to-right scan over char codes with an explicit bracket stack; no regular expressions and no
 * backtracking. Groups are multiplied out afterwards: each group's cumulative multiplier is computed once from its
 * parent's, and each atom is multiplied once by its group's, so the cost is linear in the length. Integer counts use
 * plain numbers; a text with a decimal count is scanned a second time in exact decimal mode.
 *
 * @param text - the formula text
 * @returns the formula: `text` (trimmed), `elements` (symbol → atoms per formula unit, in order of first
 *   appearance), `charge` (elementary charges), `phase` (or null)
 * @throws {@link RxthermError} with `details.column` (0-based UTF-16 index into `text`), `details.input` and a caret
 *   excerpt in the message:
 *   `EMPTY_INPUT` (empty or blank text);
 *   `INPUT_TOO_LONG` (more than {@link FORMULA_LIMITS} `.maxLength` characters);
 *   `UNKNOWN_ELEMENT` (not a symbol; `details.symbol`, and `details.suggestion` when a change of case makes one);
 *   `UNCLOSED_GROUP` (column of the opening bracket);
 *   `UNMATCHED_CLOSE` (a closing bracket with no opening one or of the wrong kind; `details.expected`);
 *   `INVALID_COUNT` (zero, leading zero, negative, too many decimals, below `minCount`);
 *   `COUNT_TOO_LARGE` (above `maxCount`, as written or multiplied out);
 *   `NESTING_TOO_DEEP`; `INVALID_CHARGE`; `INVALID_PHASE` (`details.phase`);
 *   `UNEXPECTED_CHARACTER` (anything else, including `NaN`/`Infinity` text);
 *   `INVALID_ARGUMENT` when `text` is not a string.
 * @category Formula
 * @example
 * parseFormula("CuSO4·5H2O").elements // => { Cu: 1, S: 1, O: 9, H: 10 }
 * parseFormula("SO4^2-").charge        // => -2
 * parseFormula("(Fe0.947O)3").elements // => { Fe: 2.841, O: 3 }
 * parseFormula("H2O(g)").phase         // => "g"
 * @see IUPAC, Nomenclature of Inorganic Chemistry (Red Book, 2005), IR-4 (formulae) and IR-3 (element symbols)
 */
export function parseFormula(text: string): Formula {
  if (typeof text !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `parseFormula requires a string, got ${describe(text)}`, {
      input: describe(text),
    });
  }
  if (text.length > FORMULA_LIMITS.maxLength) {
    fail("INPUT_TOO_LONG", text, FORMULA_LIMITS.maxLength,
      `parseFormula accepts at most ${FORMULA_LIMITS.maxLength} characters, got ${text.length}`,
      { limit: FORMULA_LIMITS.maxLength, length: text.length });
  }
  let start = 0;
  let end = text.length;
  while (start < end && isSpace(text.charCodeAt(start))) start++;
  while (end > start && isSpace(text.charCodeAt(end - 1))) end--;
  if (start === end) {
    fail("EMPTY_INPUT", text, 0, "parseFormula requires a formula, got empty text", {});
  }
  const first = text.charCodeAt(start);
  if (first === 78 /* N */ || first === 73 /* I */ || first === 43 || first === 45) {
    const t = text.slice(start, end);
    if (t === "NaN" || t === "Infinity" || t === "+Infinity" || t === "-Infinity") {
      fail("UNEXPECTED_CHARACTER", text, start,
        `parseFormula got "${t}", the text of a non-finite number, not a formula`, {});
    }
  }
  const fast = scan(text, start, end, false);
  if (fast !== null) return fast;
  return scan(text, start, end, true) as Formula;
}

// ───────────────────────────── private scanner ─────────────────────────────

/** Exact 1 (decimal counts are exact BigInt decimals, numeric/exactDecimal.ts). */
const ONE: ExactDecimalValue = { m: 1n, e: 0 };

/** An exact integer count. */
function exactInteger(v: number): ExactDecimalValue {
  return { m: BigInt(v), e: 0 };
}

/** d > x, exactly (x a limit such as FORMULA_LIMITS.maxCount). */
function above(d: ExactDecimalValue, x: number): boolean {
  return decimalCompare(d, exactDecimalOfNumber(x)) > 0;
}

/** d < x, exactly. */
function below(d: ExactDecimalValue, x: number): boolean {
  return decimalCompare(d, exactDecimalOfNumber(x)) < 0;
}

/** Phase of a suffix word, or null (a switch, so that words like "constructor" never match). */
function phaseOf(word: string): Phase | null {
  switch (word) {
    case "g": return "g";
    case "l": return "l";
    case "s": return "s";
    case "aq": return "aq";
    case "cr":
    case "gr": return "cr";
    default: return null;
  }
}

// Scratch buffers reused across calls (the scanner never calls user code, so no re-entrancy).
const SYMS: number[] = [];
const COLS: number[] = [];
const CNTS: number[] = [];
const DCNTS: ExactDecimalValue[] = [];
const EGROUP: number[] = []; // entry → id of its innermost group (adduct parts are root groups)
const G_START: number[] = []; // by depth: entry count when the bracket opened
const G_CLOSE: number[] = []; // by depth: expected closing char code
const G_COL: number[] = []; // by depth: column of the opening bracket
const G_ID: number[] = []; // by depth: group id
const GPARENT: number[] = []; // by group id: parent group id, −1 for an adduct part
const GMUL: number[] = []; // by group id: multiplier (fast mode)
const GDMUL: (ExactDecimalValue | null)[] = []; // by group id: multiplier (exact mode), null for 1
const GMCOL: number[] = []; // by group id: column of the multiplier, −1 when none is written
const CUM: number[] = []; // by group id: product of the multipliers from the root (fast mode)
const ACC: number[] = /* @__PURE__ */ new Array<number>(ELEMENT_KEY_COUNT).fill(0); // by element index: running total
const ORDER: number[] = []; // element indexes in order of first appearance
const DCUM: ExactDecimalValue[] = []; // by group id: the same in exact mode

// Results of readCount / readCharge (scratch, to avoid allocating tuples on the hot path).
let countValue = 0;
let countExact: ExactDecimalValue | null = null;
let countIsInteger = true;
let chargeNext = 0;

/**
 * Scan `s[start, end)`. Returns null in fast mode when a decimal count appears (the caller
 * re-scans in exact mode).
 */
function scan(s: string, start: number, end: number, exact: boolean): Formula | null {
  let n = 0; // entries
  let depth = 0;
  let groups = 0;
  let partStart = 0;
  let gCount = 1; // group 0 is the first adduct part
  let cur = 0;
  GPARENT[0] = -1;
  GMUL[0] = 1;
  GDMUL[0] = null;
  GMCOL[0] = -1;
  let sawSeparator = false;
  let leadCol = -1;
  let lastElemCountEnd = -1;
  let lastElemCountInteger = false;
  let i = start;
  let c = s.charCodeAt(i);

  // electron
  if (c === 101 /* e */ && i + 1 < end && isChargeStart(s.charCodeAt(i + 1))) {
    const q = readCharge(s, i + 1, end);
    if (q !== -1) {
      fail("INVALID_CHARGE", s, i + 1, "parseFormula reads e as the electron, whose charge is -1 (write e-)", {});
    }
    return finish(s, start, end, -1, 0, 0, exact, chargeNext, i + 1);
  }

  if (isDigit(c) || isSubDigit(c)) {
    leadCol = i;
    i = readCount(s, i, end, exact, true);
    if (i < 0) return null;
    GMUL[0] = countValue;
    GDMUL[0] = countExact;
    GMCOL[0] = leadCol;
  }

  let tailAt = end;
  while (i < end) {
    c = s.charCodeAt(i);
    if (c >= 65 && c <= 90) {
      // element symbol
      const col = i;
      const c2 = i + 1 < end ? s.charCodeAt(i + 1) : 0;
      let idx: number;
      if (c2 >= 97 && c2 <= 122) {
        idx = symbolIndex(c, c2);
        if (idx < 0) unknownElement(s, col, 2, end);
        i += 2;
      } else {
        idx = symbolIndex(c, 0);
        if (idx < 0) unknownElement(s, col, 1, end);
        i += 1;
      }
      let cnt = 1;
      let dcnt: ExactDecimalValue | null = null;
      lastElemCountEnd = -1;
      if (i < end) {
        const c3 = s.charCodeAt(i);
        if (isDigit(c3) || isSubDigit(c3)) {
          i = readCount(s, i, end, exact);
          if (i < 0) return null;
          cnt = countValue;
          dcnt = countExact;
          lastElemCountEnd = i;
          lastElemCountInteger = countIsInteger;
        }
      }
      SYMS[n] = idx;
      COLS[n] = col;
      EGROUP[n] = cur;
      if (exact) DCNTS[n] = dcnt ?? exactInteger(cnt);
      else CNTS[n] = cnt;
      n++;
      continue;
    }
    if (c === 40 || c === 91 || c === 123) {
      if (c === 40 && i + 1 < end && isLower(s.charCodeAt(i + 1))) {
        // a phase suffix, unless the word is no phase and more text follows (then a mis-cased group)
        let j = i + 1;
        while (j < end && isLower(s.charCodeAt(j))) j++;
        const word = s.slice(i + 1, j);
        if (j < end && s.charCodeAt(j) === 41) {
          if (phaseOf(word) !== null) {
            tailAt = i;
            break;
          }
          if (j + 1 === end) {
            fail("INVALID_PHASE", s, i,
              `parseFormula accepts the phases (g), (l), (s), (aq), (cr), got "(${word})"`, { phase: word });
          }
        }
      }
      if (depth >= FORMULA_LIMITS.maxNestingDepth) {
        fail("NESTING_TOO_DEEP", s, i,
          `parseFormula accepts brackets nested at most ${FORMULA_LIMITS.maxNestingDepth} deep`,
          { limit: FORMULA_LIMITS.maxNestingDepth });
      }
      G_START[depth] = n;
      G_CLOSE[depth] = c === 40 ? 41 : c === 91 ? 93 : 125;
      G_COL[depth] = i;
      G_ID[depth] = gCount;
      GPARENT[gCount] = cur;
      GMUL[gCount] = 1;
      GDMUL[gCount] = null;
      GMCOL[gCount] = -1;
      cur = gCount++;
      depth++;
      i++;
      lastElemCountEnd = -1;
      continue;
    }
    if (c === 41 || c === 93 || c === 125) {
      if (depth === 0) {
        fail("UNMATCHED_CLOSE", s, i,
          `parseFormula found a closing "${String.fromCharCode(c)}" with no opening bracket`, {});
      }
      const expected = G_CLOSE[depth - 1] as number;
      const openCol = G_COL[depth - 1] as number;
      if (c !== expected) {
        fail("UNMATCHED_CLOSE", s, i,
          `parseFormula found "${String.fromCharCode(c)}" where "${String.fromCharCode(expected)}" closes the bracket opened at column ${openCol}`,
          { expected: String.fromCharCode(expected), openColumn: openCol });
      }
      const gs = G_START[depth - 1] as number;
      if (gs === n) {
        fail("UNEXPECTED_CHARACTER", s, i, "parseFormula found an empty bracket group", { openColumn: openCol });
      }
      depth--;
      groups++;
      i++;
      lastElemCountEnd = -1;
      if (i < end) {
        const c3 = s.charCodeAt(i);
        if (isDigit(c3) || isSubDigit(c3)) {
          GMCOL[cur] = i;
          i = readCount(s, i, end, exact);
          if (i < 0) return null;
          GMUL[cur] = countValue;
          GDMUL[cur] = countExact;
        }
      }
      cur = GPARENT[cur] as number;
      continue;
    }
    if (isSeparator(c)) {
      if (depth > 0) {
        fail("UNEXPECTED_CHARACTER", s, i,
          "parseFormula accepts an adduct separator only outside brackets", { openColumn: G_COL[depth - 1] });
      }
      if (n === partStart) {
        fail("UNEXPECTED_CHARACTER", s, i, "parseFormula expected a formula before the adduct separator", {});
      }
      sawSeparator = true;
      i++;
      while (i < end && isSpace(s.charCodeAt(i))) i++;
      cur = gCount++;
      GPARENT[cur] = -1;
      GMUL[cur] = 1;
      GDMUL[cur] = null;
      GMCOL[cur] = -1;
      if (i < end) {
        const c3 = s.charCodeAt(i);
        if (isDigit(c3) || isSubDigit(c3)) {
          GMCOL[cur] = i;
          i = readCount(s, i, end, exact, true);
          if (i < 0) return null;
          GMUL[cur] = countValue;
          GDMUL[cur] = countExact;
        }
      }
      partStart = n;
      lastElemCountEnd = -1;
      continue;
    }
    if (isChargeStart(c)) {
      tailAt = i;
      break;
    }
    if (isSpace(c)) {
      let j = i;
      while (j < end && isSpace(s.charCodeAt(j))) j++;
      if (j < end && isSeparator(s.charCodeAt(j))) {
        i = j;
        continue;
      }
      fail("UNEXPECTED_CHARACTER", s, i,
        "parseFormula allows spaces inside a formula only around an adduct separator", {});
    }
    if (isDigit(c) || isSubDigit(c)) {
      fail("UNEXPECTED_CHARACTER", s, i,
        "parseFormula expected an element symbol or a bracket here (a count follows an element symbol or a closing bracket)", {});
    }
    if (isLower(c)) unknownElement(s, i, 1, end);
    fail("UNEXPECTED_CHARACTER", s, i,
      `parseFormula does not accept the character "${s.charAt(i)}" (U+${c.toString(16).toUpperCase().padStart(4, "0")}) here`, {});
  }

  // end of the body
  if (depth > 0) {
    if (tailAt === end) {
      const openCol = G_COL[depth - 1] as number;
      fail("UNCLOSED_GROUP", s, openCol,
        `parseFormula found "${s.charAt(openCol)}" without its closing "${String.fromCharCode(G_CLOSE[depth - 1] as number)}"`, {});
    }
    fail("UNEXPECTED_CHARACTER", s, tailAt,
      "parseFormula requires a charge or phase to come after the last closing bracket", { openColumn: G_COL[depth - 1] });
  }
  if (n === partStart) {
    fail("UNEXPECTED_CHARACTER", s, tailAt,
      tailAt === end ? "parseFormula expected an element symbol or an opening bracket at the end of the text"
        : "parseFormula expected an element symbol or an opening bracket before this", {});
  }
  if (leadCol >= 0 && !sawSeparator) {
    fail("UNEXPECTED_CHARACTER", s, leadCol,
      "parseFormula does not accept a leading count on a formula (write the coefficient in the equation: \"2 H2O\"); leading multipliers are for adduct parts such as 3CdSO4·8H2O", {});
  }

  let charge = 0;
  i = tailAt;
  if (i < end && isChargeStart(s.charCodeAt(i))) {
    const cs = s.charCodeAt(i);
    if (
      n === 1 && groups === 0 && !sawSeparator && lastElemCountEnd === i && lastElemCountInteger &&
      (cs === 43 || cs === 45 || cs === 0x2212) &&
      (i + 1 === end || s.charCodeAt(i + 1) === 40)
    ) {
      // Fe3+, O2-: digits after a lone symbol followed by one sign are the charge
      const magnitude = exact ? decimalToNumber(DCNTS[0] as ExactDecimalValue) : (CNTS[0] as number);
      if (magnitude > FORMULA_LIMITS.maxCharge) {
        fail("INVALID_CHARGE", s, i - 1,
          `parseFormula accepts charges up to ${FORMULA_LIMITS.maxCharge} in magnitude, got ${magnitude}`, { limit: FORMULA_LIMITS.maxCharge });
      }
      charge = cs === 43 ? magnitude : -magnitude;
      if (exact) DCNTS[0] = ONE;
      else CNTS[0] = 1;
      i++;
    } else {
      charge = readCharge(s, i, end);
      i = chargeNext;
    }
  }
  return finish(s, start, end, charge, n, gCount, exact, i, tailAt);
}

/** Parse the optional phase after position `i`, check the end, build the result. */
function finish(
  s: string, start: number, end: number, charge: number, n: number, gCount: number, exact: boolean, at: number,
  chargeCol: number,
): Formula {
  let i = at;
  let phase: Phase | null = null;
  if (i + 1 < end && s.charCodeAt(i) === 40 && isLower(s.charCodeAt(i + 1))) {
    let j = i + 1;
    while (j < end && isLower(s.charCodeAt(j))) j++;
    const word = s.slice(i + 1, j);
    const p = phaseOf(word);
    if (j < end && s.charCodeAt(j) === 41 && p !== null) {
      phase = p;
      i = j + 1;
    } else {
      fail("INVALID_PHASE", s, i, `parseFormula accepts the phases (g), (l), (s), (aq), (cr), got "${s.slice(i, Math.min(j + 1, end))}"`, { phase: word });
    }
  }
  if (i < end) {
    const c = s.charCodeAt(i);
    if (phase === null && charge !== 0 && (isUpper(c) || c === 40 || c === 91 || c === 123)) {
      // "C-1H4": a sign followed by more formula is a negative count, not a charge
      fail("INVALID_COUNT", s, chargeCol,
        "parseFormula requires counts to be positive; a charge must end the formula (before an optional phase)", {});
    }
    fail("UNEXPECTED_CHARACTER", s, i,
      phase !== null ? "parseFormula requires the phase suffix to end the formula"
        : "parseFormula requires a charge to end the formula (only a phase suffix may follow it)", {});
  }
  // Multiply out: each group's cumulative multiplier is its own times its parent's (parents have smaller
  // ids), then each atom is multiplied once by its group's — linear in atoms + groups.
  const elements: Record<string, number> = {};
  if (!exact) {
    for (let g = 0; g < gCount; g++) {
      const parent = GPARENT[g] as number;
      const m = parent < 0 ? (GMUL[g] as number) : (GMUL[g] as number) * (CUM[parent] as number);
      if (m > FORMULA_LIMITS.maxCount) tooLarge(s, GMCOL[g] as number, null, m);
      CUM[g] = m;
    }
    // accumulate by element index, then create the keys once each, in order of first appearance
    let distinct = 0;
    for (let k = 0; k < n; k++) {
      const idx = SYMS[k] as number;
      const g = EGROUP[k] as number;
      const one = (CNTS[k] as number) * (CUM[g] as number);
      if (one > FORMULA_LIMITS.maxCount) {
        clearAccumulator(distinct);
        tooLarge(s, multiplierColumn(g, COLS[k] as number), INDEX_SYMBOLS[idx] as string, one);
      }
      const prev = ACC[idx] as number;
      if (prev === 0) ORDER[distinct++] = idx;
      const v = prev + one;
      if (v > FORMULA_LIMITS.maxCount) {
        clearAccumulator(distinct);
        tooLarge(s, COLS[k] as number, INDEX_SYMBOLS[idx] as string, v);
      }
      ACC[idx] = v;
    }
    for (let d = 0; d < distinct; d++) {
      const idx = ORDER[d] as number;
      elements[INDEX_SYMBOLS[idx] as string] = ACC[idx] as number;
      ACC[idx] = 0;
    }
  } else {
    for (let g = 0; g < gCount; g++) {
      const parent = GPARENT[g] as number;
      const own = GDMUL[g] ?? ONE;
      const m = parent < 0 ? own : decimalTimes(own, DCUM[parent] as ExactDecimalValue);
      if (above(m, FORMULA_LIMITS.maxCount)) tooLarge(s, GMCOL[g] as number, null, decimalToNumber(m));
      if (below(m, FORMULA_LIMITS.minCount)) tooSmall(s, GMCOL[g] as number, null, decimalToNumber(m));
      DCUM[g] = m;
    }
    const sums = new Map<string, ExactDecimalValue>();
    for (let k = 0; k < n; k++) {
      const sym = INDEX_SYMBOLS[SYMS[k] as number] as string;
      const g = EGROUP[k] as number;
      const one = decimalTimes(DCNTS[k] as ExactDecimalValue, DCUM[g] as ExactDecimalValue);
      if (above(one, FORMULA_LIMITS.maxCount)) tooLarge(s, multiplierColumn(g, COLS[k] as number), sym, decimalToNumber(one));
      if (below(one, FORMULA_LIMITS.minCount)) tooSmall(s, multiplierColumn(g, COLS[k] as number), sym, decimalToNumber(one));
      const prev = sums.get(sym);
      const v = prev === undefined ? one : decimalPlus(prev, one);
      if (above(v, FORMULA_LIMITS.maxCount)) tooLarge(s, COLS[k] as number, sym, decimalToNumber(v));
      sums.set(sym, v);
    }
    for (const [sym, v] of sums) elements[sym] = decimalToNumber(v);
    // release the exact values
    DCNTS.length = 0;
    DCUM.length = 0;
    GDMUL.length = 0;
  }
  // Frozen, so an edit to a returned formula can never reach a later result; the prototype carries the
  // (non-enumerable) display methods
  Object.freeze(elements);
  // the prototype carries the (non-enumerable) display methods; no per-result cost beyond the allocation
  const f = Object.create(FORMULA_PROTOTYPE) as { text: string; elements: Record<string, number>; charge: number; phase: Phase | null };
  f.text = start === 0 && end === s.length ? s : s.slice(start, end);
  f.elements = elements;
  f.charge = charge;
  f.phase = phase;
  return Object.freeze(f);
}

/** Zero the running totals of the first `distinct` elements (before throwing, so no state leaks into the next call). */
function clearAccumulator(distinct: number): void {
  for (let d = 0; d < distinct; d++) ACC[ORDER[d] as number] = 0;
}

/** Column of the innermost written multiplier around group `g` (for errors), or `fallback`. */
function multiplierColumn(g: number, fallback: number): number {
  for (let k = g; k >= 0; k = GPARENT[k] as number) {
    if ((GMCOL[k] as number) >= 0) return GMCOL[k] as number;
  }
  return fallback;
}

/**
 * Read a count at `i` (ASCII digits with an optional decimal part, or subscript digits). Sets
 * countValue / countExact / countIsInteger and returns the next index; returns −1 in fast mode
 * when the count is a decimal.
 */
function readCount(s: string, i: number, end: number, exact: boolean, leading = false): number {
  const col = i;
  let c = s.charCodeAt(i);
  let v = 0;
  if (isSubDigit(c)) {
    if (c === 0x2080) zeroCount(s, col, end);
    while (i < end && isSubDigit((c = s.charCodeAt(i)))) {
      v = v * 10 + (c - 0x2080);
      i++;
    }
    return integerCount(s, col, i, v, exact);
  }
  if (c === 48 /* 0 */ && !(i + 2 < end && s.charCodeAt(i + 1) === 46 && isDigit(s.charCodeAt(i + 2)))) {
    zeroCount(s, col, end);
  }
  while (i < end && isDigit((c = s.charCodeAt(i)))) {
    v = v * 10 + (c - 48);
    i++;
  }
  if (i + 1 < end && c === 46 && isDigit(s.charCodeAt(i + 1)) && (leading || v === 0 || !isHydrateDot(s, i, end))) {
    if (!exact) return -1;
    i++;
    const fracStart = i;
    while (i < end && isDigit(s.charCodeAt(i))) i++;
    if (i - fracStart > FORMULA_LIMITS.maxDecimalPlaces) {
      fail("INVALID_COUNT", s, col,
        `parseFormula accepts counts with at most ${FORMULA_LIMITS.maxDecimalPlaces} decimal places`, { limit: FORMULA_LIMITS.maxDecimalPlaces });
    }
    const d = exactDecimal(s.slice(col, i)) as ExactDecimalValue; // digits "." digits: always valid text
    if (d.m === 0n) {
      fail("INVALID_COUNT", s, col, `parseFormula requires counts above zero, got ${s.slice(col, i)}`, {});
    }
    if (above(d, FORMULA_LIMITS.maxCount)) tooLarge(s, col, null, decimalToNumber(d));
    if (below(d, FORMULA_LIMITS.minCount)) tooSmall(s, col, null, decimalToNumber(d));
    countValue = decimalToNumber(d);
    countExact = d;
    countIsInteger = false;
    return i;
  }
  return integerCount(s, col, i, v, exact);
}

function integerCount(s: string, col: number, next: number, v: number, exact: boolean): number {
  if (v > FORMULA_LIMITS.maxCount) tooLarge(s, col, null, v);
  countValue = v;
  countExact = exact ? exactInteger(v) : null;
  countIsInteger = true;
  return next;
}

/**
 * Read a charge starting at `i` (`^…`, sign-first, or superscripts). Returns the charge and sets chargeNext.
 */
function readCharge(s: string, i: number, end: number): number {
  const col = i;
  let c = s.charCodeAt(i);
  let magnitude = 0;
  let sign = 0;
  if (c === 94 /* ^ */) {
    i++;
    let brace = false;
    if (i < end && s.charCodeAt(i) === 123) {
      brace = true;
      i++;
    }
    c = i < end ? s.charCodeAt(i) : 0;
    if (isDigit(c)) {
      if (c === 48) badCharge(s, i, "a charge of zero is written by leaving the charge out");
      while (i < end && isDigit((c = s.charCodeAt(i)))) {
        magnitude = magnitude * 10 + (c - 48);
        i++;
      }
      c = i < end ? s.charCodeAt(i) : 0;
      sign = signOf(c);
      if (sign === 0) badCharge(s, i, "a charge magnitude must be followed by + or - (as in ^2-)");
      i++;
    } else {
      sign = signOf(c);
      if (sign === 0) badCharge(s, i, "a charge after ^ is written like ^2-, ^-2, ^+ or ^{3+}");
      i = signRun(s, i, end, sign);
      magnitude = chargeMagnitude;
    }
    if (brace) {
      if (i >= end || s.charCodeAt(i) !== 125) badCharge(s, i, "a charge opened with ^{ must close with }");
      i++;
    }
  } else if (c === 0x207a || c === 0x207b || isSupDigit(c)) {
    while (i < end && isSupDigit((c = s.charCodeAt(i)))) {
      magnitude = magnitude * 10 + supDigit(c);
      i++;
    }
    c = i < end ? s.charCodeAt(i) : 0;
    if (c !== 0x207a && c !== 0x207b) badCharge(s, i, "superscript charge digits must be followed by ⁺ or ⁻");
    sign = c === 0x207a ? 1 : -1;
    const hadDigits = i > col;
    let k = 0;
    while (i < end && s.charCodeAt(i) === c) {
      k++;
      i++;
    }
    if (hadDigits) {
      if (k > 1) badCharge(s, i - 1, "a charge has either digits or repeated signs, not both");
      if (magnitude === 0) badCharge(s, col, "a charge of zero is written by leaving the charge out");
    } else magnitude = k;
  } else {
    sign = signOf(c);
    i = signRun(s, i, end, sign);
    magnitude = chargeMagnitude;
  }
  if (magnitude > FORMULA_LIMITS.maxCharge) {
    fail("INVALID_CHARGE", s, col,
      `parseFormula accepts charges up to ${FORMULA_LIMITS.maxCharge} in magnitude, got ${magnitude}`, { limit: FORMULA_LIMITS.maxCharge });
  }
  if (i < end) {
    const after = s.charCodeAt(i);
    if (signOf(after) !== 0 || after === 94 || isDigit(after) || after === 0x207a || after === 0x207b || isSupDigit(after)) {
      badCharge(s, i, "a charge is written once, with one kind of sign");
    }
  }
  chargeNext = i;
  return sign * magnitude;
}

let chargeMagnitude = 0;

/** Read `+`, `++`, `-2`...: repeated signs, or one sign followed by digits. Sets chargeMagnitude. */
function signRun(s: string, i: number, end: number, sign: number): number {
  const c0 = s.charCodeAt(i);
  let k = 0;
  while (i < end && signOf(s.charCodeAt(i)) === sign && (s.charCodeAt(i) === c0 || sign < 0)) {
    k++;
    i++;
  }
  if (k === 1 && i < end && isDigit(s.charCodeAt(i))) {
    if (s.charCodeAt(i) === 48) badCharge(s, i, "a charge of zero is written by leaving the charge out");
    let m = 0;
    let c = 0;
    while (i < end && isDigit((c = s.charCodeAt(i)))) {
      m = m * 10 + (c - 48);
      i++;
    }
    chargeMagnitude = m;
  } else chargeMagnitude = k;
  return i;
}

function signOf(c: number): number {
  return c === 43 ? 1 : c === 45 || c === 0x2212 ? -1 : 0;
}

function isChargeStart(c: number): boolean {
  return c === 43 || c === 45 || c === 94 || c === 0x2212 || c === 0x207a || c === 0x207b || isSupDigit(c);
}

function isDigit(c: number): boolean {
  return c >= 48 && c <= 57;
}

function isSubDigit(c: number): boolean {
  return c >= 0x2080 && c <= 0x2089;
}

function isSupDigit(c: number): boolean {
  return c === 0x2070 || c === 0xb9 || c === 0xb2 || c === 0xb3 || (c >= 0x2074 && c <= 0x2079);
}

function supDigit(c: number): number {
  return c === 0xb9 ? 1 : c === 0xb2 ? 2 : c === 0xb3 ? 3 : c - 0x2070;
}

function isUpper(c: number): boolean {
  return c >= 65 && c <= 90;
}

function isLower(c: number): boolean {
  return c >= 97 && c <= 122;
}

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13 || c === 11 || c === 12 || c === 0xa0;
}

function isSeparator(c: number): boolean {
  return c === 0xb7 || c === 42 || c === 46 || c === 0x2022 || c === 0x2219 || c === 0x22c5;
}

// ───────────────────────────── errors ─────────────────────────────

function fail(
  code: RxthermErrorCode, input: string, column: number, message: string, extra: Record<string, unknown>,
): never {
  throw new RxthermError(code, `${message} (column ${column})${excerpt(input, column)}`, { ...extra, column, input });
}

function excerpt(s: string, col: number): string {
  const from = Math.max(0, col - 30);
  const to = Math.min(s.length, Math.max(col + 30, from + 1));
  let line = "";
  for (let k = from; k < to; k++) {
    const c = s.charCodeAt(k);
    line += c < 32 || c === 127 ? " " : s.charAt(k);
  }
  const prefix = from > 0 ? "…" : "";
  const suffix = to < s.length ? "…" : "";
  return `\n  ${prefix}${line}${suffix}\n  ${" ".repeat(prefix.length + col - from)}^`;
}

function zeroCount(s: string, col: number, end: number): never {
  const next = col + 1 < end ? s.charCodeAt(col + 1) : 0;
  fail("INVALID_COUNT", s, col,
    isDigit(next) ? "parseFormula does not accept a count with a leading zero" : "parseFormula requires counts above zero", {});
}

function tooLarge(s: string, col: number, symbol: string | null, value: number): never {
  fail("COUNT_TOO_LARGE", s, col,
    `parseFormula accepts counts up to ${FORMULA_LIMITS.maxCount}` +
      (symbol !== null ? `, and ${symbol} would reach ${value}` : `, got ${value}`),
    symbol !== null ? { limit: FORMULA_LIMITS.maxCount, symbol } : { limit: FORMULA_LIMITS.maxCount });
}

function tooSmall(s: string, col: number, symbol: string | null, value: number): never {
  fail("INVALID_COUNT", s, col,
    `parseFormula accepts counts of at least ${FORMULA_LIMITS.minCount}` +
      (symbol !== null ? `, and ${symbol} would fall to ${value}` : `, got ${value}`),
    symbol !== null ? { limit: FORMULA_LIMITS.minCount, symbol } : { limit: FORMULA_LIMITS.minCount });
}

function badCharge(s: string, col: number, why: string): never {
  fail("INVALID_CHARGE", s, col, `parseFormula could not read the charge: ${why}`, {});
}

/** UNKNOWN_ELEMENT for the symbol of `len` letters at `col`, with a case-change suggestion when one exists. */
function unknownElement(s: string, col: number, len: number, end: number): never {
  let symbol = s.slice(col, col + len);
  const c = s.charCodeAt(col);
  let suggestion: string | undefined;
  if (isLower(c)) {
    // lowercase where a symbol should start: "co" → "Co", "h2o" → "H"
    const c2 = col + 1 < end ? s.charCodeAt(col + 1) : 0;
    if (isLower(c2)) {
      symbol = s.slice(col, col + 2);
      if (symbolIndex(c - 32, c2) >= 0) suggestion = String.fromCharCode(c - 32, c2);
    }
    if (suggestion === undefined && symbolIndex(c - 32, 0) >= 0) suggestion = String.fromCharCode(c - 32);
  } else if (len === 1) {
    // "CA" → "Ca", "AL" → "Al"
    const prev = col > 0 ? s.charCodeAt(col - 1) : 0;
    const next = col + 1 < end ? s.charCodeAt(col + 1) : 0;
    if (isUpper(prev) && symbolIndex(prev, c + 32) >= 0) suggestion = String.fromCharCode(prev, c + 32);
    else if (isUpper(next) && symbolIndex(c, next + 32) >= 0) suggestion = String.fromCharCode(c, next + 32);
  } else {
    // "XE"-like spellings are caught above; for two letters try a lone capital ("Cx" has no fix)
    const c2 = s.charCodeAt(col + 1);
    if (symbolIndex(c, 0) >= 0 && symbolIndex(c2 - 32, 0) >= 0) suggestion = String.fromCharCode(c, c2 - 32);
  }
  fail("UNKNOWN_ELEMENT", s, col,
    `parseFormula found an unknown element symbol "${symbol}"` +
      (suggestion !== undefined ? ` (did you mean "${suggestion}"?)` : " (symbols are case-sensitive: Co is cobalt, CO carbon monoxide)"),
    suggestion !== undefined ? { symbol, suggestion } : { symbol });
}

function describe(v: unknown): string {
  if (typeof v === "number" || typeof v === "boolean" || typeof v === "bigint") return `${typeof v} ${describeValue(v)}`;
  if (v === null) return "null";
  return typeof v;
}

/**
 * True when the `.` at `dot` (between two digits) joins a hydrate, `CuSO4.5H2O`: the digits after it
 * form a whole number followed by `H2O` or `D2O` that is not the start of a longer formula (`H2O2`, `H2Os`).
 * Water of hydration is by far the most common use of a dot after a count in plant and supplier
 * documents, and reading it as a decimal (O 4.5) would silently give a wrong molar mass. A hydrate count
 * never starts with 0, so `Fe1.05H2O` is Fe 1.05 (and the caller reads `H0.5H2O` as H 0.5: a count of 0
 * before a hydrate would be invalid anyway).
 */
function isHydrateDot(s: string, dot: number, end: number): boolean {
  if (s.charCodeAt(dot + 1) === 48 /* 0 */) return false;
  let j = dot + 1;
  while (j < end && isDigit(s.charCodeAt(j))) j++;
  if (j === dot + 1 || j + 3 > end) return false;
  const h = s.charCodeAt(j);
  if (!((h === 72 /* H */ || h === 68 /* D */) && s.charCodeAt(j + 1) === 50 /* 2 */ && s.charCodeAt(j + 2) === 79 /* O */)) return false;
  if (j + 3 === end) return true;
  const next = s.charCodeAt(j + 3);
  return !(isDigit(next) || isLower(next) || next === 46 /* . */);
}
