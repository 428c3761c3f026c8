import { RxthermError } from "../errors.js";
import { parseFormula } from "../formula/parseFormula.js";
import type { Formula } from "../formula/types.js";
import { rationalFromDecimalString, rationalToNumber, type Rational } from "../numeric/rational.js";
import { integerTerm, makeReaction, makeTerm } from "./internal/reactionTerms.js";
import { shareFormula, sharedFormula } from "./internal/formulaMemo.js";
import type { Reaction, Term } from "./types.js";

/**
 * Longest equation text {@link parseReaction} accepts, in UTF-16 code units (`INPUT_TOO_LONG` above).
 *
 * @example
 * MAX_REACTION_LENGTH // => 4096
 * @category Reaction
 */
export const MAX_REACTION_LENGTH = 4096;

/**
 * Largest stoichiometric coefficient {@link parseReaction} accepts (`COUNT_TOO_LARGE` above).
 *
 * @example
 * MAX_REACTION_COEFFICIENT // => 1e9
 * @category Reaction
 */
export const MAX_REACTION_COEFFICIENT = 1e9;

/**
 * Parse a chemical equation such as `"CH4 + 2 O2 -> CO2 + 2 H2O"` into a {@link Reaction}.
 *
 * **Grammar.**
 * - Exactly one separator between the sides: `->`, `→`, `=`, `<=>` or `⇌` (all mean the same
 *   here; direction and equilibrium are not recorded).
 * - Terms are joined by `+`. A `+` written directly after a species and followed by a space,
 *   another `+`, the end of the side or a phase suffix is that species' charge: in
 *   `Na+ + Cl- -> NaCl(s)` the first `+` is the charge of Na⁺ and the second joins the terms.
 *   Elsewhere (`H2+O2`) a `+` joins terms. A positive charge is best written digits first
 *   (`Fe3+`, `Fe^3+`, `Fe^{3+}`, `Fe³⁺`); sign-then-number (`Fe+2`) is read as a charge when the
 *   side's separators are spaced (`MnO4- + Fe+2 + H+`) or the species stands alone on its side,
 *   and otherwise (`Fe+2+e-`) as a separator, with a hint (`Fe2+`?) in the error it leads to. A `+`
 *   right after `^` or right before a closing bracket is never a separator.
 * - Each term is an optional coefficient and a species. The coefficient is an integer (`2`),
 *   a decimal (`6.5`) or a fraction (`13/2`), read exactly; it may be glued to the formula
 *   (`2H2O`, `1/2O2`) because no formula starts with a digit. Exponent notation is not
 *   accepted in coefficients (`2e-` is two electrons). A missing coefficient is 1. A leading
 *   number is always the coefficient, so an adduct with a leading multiplier is written with
 *   a bracket in an equation: `(CdSO4)3·8H2O`, not `3CdSO4·8H2O`.
 * - The species is any text {@link parseFormula} accepts (phases `(g)`, `(aq)`..., charges,
 *   the electron `e-`); `Term.species` is that text, trimmed.
 *
 * The same species may appear on both sides (a catalyst); the result keeps the terms as written.
 * Columns in error details are 0-based offsets into the whole equation text.
 *
 * @param text - the equation
 * @returns the reaction with exact coefficients (`Term.exact`, e.g. `"13/2"`) and their numbers
 * @throws RxthermError `EMPTY_INPUT` for empty or blank text; `INVALID_ARGUMENT` when `text` is not a string
 * @throws RxthermError `INPUT_TOO_LONG` above {@link MAX_REACTION_LENGTH} characters (details: `length`, `limit`)
 * @throws RxthermError `INVALID_REACTION` with no separator, more than one, an empty side, an
 *   empty term or a coefficient without a species (details: `column`, `reason`)
 * @throws RxthermError `INVALID_COUNT` for a zero or malformed coefficient (details: `column`, `coefficient`)
 * @throws RxthermError `COUNT_TOO_LARGE` for a coefficient above {@link MAX_REACTION_COEFFICIENT}
 * @throws RxthermError any code of {@link parseFormula} for a bad species, with `column`
 *   re-based to the whole equation and `species` set to the term's text
 * @example
 * const r = parseReaction("C3H8 + 5 O2 -> 3 CO2 + 4 H2O");
 * r.products[1].coefficient // => 4
 * parseReaction("MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O").reactants.map((t) => t.species) // => ["MnO4-", "H+", "e-"]
 * parseReaction("C2H6 + 7/2 O2 = 2 CO2 + 3 H2O").reactants[1].exact // => "7/2"
 * parseReaction("MnO4- + Fe+2 + H+ -> Mn+2 + Fe+3 + H2O").products[0].formula.charge // => 2
 * @category Reaction
 * @see IUPAC, Quantities, Units and Symbols in Physical Chemistry ("Green Book"), 3rd ed. (2007), §2.10.1 (chemical equations, stoichiometric numbers)
 */
export function parseReaction(text: string): Reaction {
  const eq = scanEquation(text);
  const terms: Term[] = new Array<Term>(eq.species.length);
  for (let k = 0; k < terms.length; k++) {
    const species = eq.species[k] as string;
    const formula = eq.formulas[k] as Formula;
    const n = eq.integers[k] as number;
    terms[k] = n > 0 ? integerTerm(species, formula, n) : makeTerm({ species, formula }, eq.rationals[k] as Rational);
  }
  return makeReaction(terms.slice(0, eq.nReactants), terms.slice(eq.nReactants));
}

/**
 * An equation read term by term, before any term object is built: parallel lists over the terms
 * (reactants first), each term's species text, its parsed formula (shared, deeply frozen), its
 * coefficient as a positive integer below 10⁹ when it is one (else 0) and otherwise as an exact
 * rational.
 *
 * @internal
 */
export interface ScannedEquation {
  readonly species: string[];
  readonly formulas: Formula[];
  /** The coefficient when it is a positive integer written with fewer than 10 characters, else 0. */
  readonly integers: number[];
  /** The exact coefficient where `integers` is 0 (null elsewhere). */
  readonly rationals: (Rational | null)[];
  readonly nReactants: number;
}

/**
 * Read an equation as {@link parseReaction} does (same checks, same errors, in the same order)
 * without building its terms: the balancer reads only the species and their formulas.
 *
 * @internal
 */
export function scanEquation(text: string): ScannedEquation {
  if (typeof text !== "string") {
    throw new RxthermError("INVALID_ARGUMENT", `parseReaction requires a string, got ${typeof text}`, { type: typeof text });
  }
  if (isBlank(text, 0, text.length)) {
    throw new RxthermError("EMPTY_INPUT", "parseReaction requires a non-empty equation", { column: 0 });
  }
  if (text.length > MAX_REACTION_LENGTH) {
    throw new RxthermError("INPUT_TOO_LONG", `parseReaction accepts at most ${MAX_REACTION_LENGTH} characters, got ${text.length}`, {
      length: text.length,
      limit: MAX_REACTION_LENGTH,
    });
  }
  const arrows = findArrows(text);
  if (arrows.length === 0) {
    throw new RxthermError("INVALID_REACTION", "parseReaction requires one of ->, →, =, <=>, ⇌ between the sides, found none", {
      column: text.length,
      reason: "no separator",
    });
  }
  if (arrows.length > 1) {
    const second = arrows[1] as Arrow;
    throw new RxthermError("INVALID_REACTION", `parseReaction requires exactly one separator, found another "${second.token}" at column ${second.column}`, {
      column: second.column,
      reason: "more than one separator",
    });
  }
  const arrow = arrows[0] as Arrow;
  const out: ScannedEquation & { nReactants: number } = { species: [], formulas: [], integers: [], rationals: [], nReactants: 0 };
  parseSide(text, 0, arrow.column, "reactants", out);
  out.nReactants = out.species.length;
  parseSide(text, arrow.column + arrow.token.length, text.length, "products", out);
  return out;
}

// ── private helpers ──────────────────────────────────────────────────────────

interface Arrow {
  readonly token: string;
  readonly column: number;
}

const ARROW_TOKENS = ["<=>", "->", "→", "⇌", "="] as const;
const PHASE_AFTER_CHARGE = /^\((?:g|l|s|aq|cr|gr)\)/;
const COEFFICIENT = /^(\d+\s*\/\s*\d+|\d+\.\d+|\.\d+|\d+)/;

function findArrows(text: string): Arrow[] {
  const out: Arrow[] = [];
  for (let i = 0; i < text.length; ) {
    const c = text.charCodeAt(i);
    // only "<", "-", "=", "→", "⇌" can start a separator
    if (c !== 60 && c !== 45 && c !== 61 && c !== 0x2192 && c !== 0x21cc) {
      i++;
      continue;
    }
    const token = ARROW_TOKENS.find((t) => text.startsWith(t, i));
    if (token) {
      out.push({ token, column: i });
      i += token.length;
    } else i++;
  }
  return out;
}

function isSpace(ch: string | undefined): boolean {
  return ch === " " || ch === "\t" || ch === "\n" || ch === "\r" || ch === "\u00a0";
}

/** isSpace for a char code (NaN, for a position outside the text, is no space). */
function isSpaceCode(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13 || c === 0xa0;
}

/** ASCII white space that `String.prototype.trim` removes: tab, line feed, vertical tab, form feed, carriage return, space. */
function isAsciiTrimSpace(c: number): boolean {
  return c === 32 || (c >= 9 && c <= 13);
}

/** `text.slice(start, end).trim() === ""`, without the copy when an ASCII character decides it. */
function isBlank(text: string, start: number, end: number): boolean {
  for (let i = start; i < end; i++) {
    const c = text.charCodeAt(i);
    if (isAsciiTrimSpace(c)) continue;
    if (c < 127) return false;
    return text.slice(start, end).trim() === "";
  }
  return true;
}

/** Split text[start, end) into terms at separator `+` signs and parse each into `out`. */
function parseSide(text: string, start: number, end: number, side: "reactants" | "products", out: ScannedEquation): void {
  if (isBlank(text, start, end)) {
    throw new RxthermError("INVALID_REACTION", `parseReaction requires at least one species on the ${side} side`, {
      column: start,
      reason: `empty ${side} side`,
    });
  }
  let termStart = start;
  let hasContent = false; // the current term has non-space text before this point
  let hint: string | undefined; // set when the current term follows a "+digits" read as a separator
  // sign-then-number charges (Fe+2) are read as charges when the separators of this side are spaced
  const spacedSide = spacedSeparators(text, start, end);
  for (let i = start; i < end; i++) {
    const ch = text.charCodeAt(i);
    if (ch === 43 /* + */) {
      const prev = text.charCodeAt(i - 1);
      const next = i + 1 < end ? text.charCodeAt(i + 1) : -1;
      const glued = hasContent && !isSpaceCode(prev);
      const digitsEnd = glued ? signedChargeEnd(text, i + 1, end) : -1;
      const isCharge =
        glued &&
        (prev === 94 /* ^ */ ||
          next === -1 ||
          isSpaceCode(next) ||
          next === 43 /* + */ ||
          next === 41 /* ) */ ||
          next === 93 /* ] */ ||
          next === 125 /* } */ ||
          PHASE_AFTER_CHARGE.test(text.slice(i + 1, end)) ||
          (digitsEnd > 0 && spacedSide));
      if (!isCharge) {
        parseTerm(text, termStart, i, hint, out);
        hint = glued ? chargeHint(text, termStart, i, end) : undefined;
        termStart = i + 1;
        hasContent = false;
        continue;
      }
    }
    if (!isSpaceCode(ch)) hasContent = true;
  }
  parseTerm(text, termStart, end, hint, out);
}

/**
 * End of the digits after a glued "+" when they could be a sign-then-number charge (`Fe+2`): the
 * digits run to the end of the side, a space or a phase suffix. −1 otherwise.
 */
function signedChargeEnd(text: string, from: number, end: number): number {
  let j = from;
  while (j < end && text.charCodeAt(j) >= 48 && text.charCodeAt(j) <= 57) j++;
  if (j === from) return -1;
  if (j === end || isSpace(text[j]) || PHASE_AFTER_CHARGE.test(text.slice(j, end))) return j;
  return -1;
}

/** True when every separator-looking "+" of the side stands between spaces, or the side has one term. */
function spacedSeparators(text: string, start: number, end: number): boolean {
  let spaced = false;
  for (let i = start; i < end; i++) {
    if (text[i] !== "+") continue;
    const before = isSpace(text[i - 1]);
    const after = i + 1 >= end || isSpace(text[i + 1]);
    if (before && after) spaced = true;
    else if (before !== after && before) return false; // "A +B": a separator glued to the next term
  }
  // no spaced separator at all: only a single term such as "Mn+2" reads its digits as a charge
  return spaced || !/\s/.test(text.slice(start, end).trim());
}

/** The "Fe2+?" hint for a "+digits" glued to a species and read as a separator (undefined without digits). */
function chargeHint(text: string, termStart: number, plus: number, end: number): string | undefined {
  let j = plus + 1;
  while (j < end && text.charCodeAt(j) >= 48 && text.charCodeAt(j) <= 57) j++;
  if (j === plus + 1) return undefined;
  const species = text.slice(termStart, plus).trim().replace(/^[\d./\s]+/, "");
  const digits = text.slice(plus + 1, j);
  return `"${species}+${digits}" was read as ${species} + ${digits}…; if a charge was meant write ${species}${digits}+ (or space the separators: "${species}+${digits} + ...")`;
}

function parseTerm(text: string, start: number, end: number, hint: string | undefined, out: ScannedEquation): void {
  // the trimmed term [a, b): ASCII white space is stripped here; any other character at an end goes through trim()
  let a = start;
  let b = end;
  while (a < b && isAsciiTrimSpace(text.charCodeAt(a))) a++;
  while (b > a && isAsciiTrimSpace(text.charCodeAt(b - 1))) b--;
  if (a < b && (text.charCodeAt(a) >= 127 || text.charCodeAt(b - 1) >= 127)) {
    const raw = text.slice(start, end);
    a = start + (raw.length - raw.trimStart().length);
    b = a + raw.trim().length;
  }
  const body = text.slice(a, b);
  const column = a;
  if (body === "") {
    throw new RxthermError("INVALID_REACTION", `parseReaction found an empty term at column ${column} (a "+" with nothing on one side)`, {
      column,
      reason: "empty term",
    });
  }
  let coefficient: Rational | null = null;
  let integerCoefficient = 1; // the coefficient when it is a small integer, else 0
  let speciesOffset = 0;
  const first = body.charCodeAt(0);
  const m = (first >= 48 && first <= 57) || first === 46 ? COEFFICIENT.exec(body) : null;
  if (m) {
    const ctext = m[1] as string;
    if (ctext.length < 10 && isDigits(ctext)) {
      // a whole number of at most 9 digits: exact as a double, below the limit
      integerCoefficient = Number(ctext);
      if (integerCoefficient === 0) zeroCoefficient(ctext, column);
    } else {
      coefficient = rationalFromDecimalString(ctext.replace(/\s+/g, ""));
      if (coefficient.num === 0n) zeroCoefficient(ctext, column);
      if (rationalToNumber(coefficient) > MAX_REACTION_COEFFICIENT) {
        throw new RxthermError("COUNT_TOO_LARGE", `parseReaction accepts coefficients up to ${MAX_REACTION_COEFFICIENT}, got "${ctext}" at column ${column}`, {
          column,
          coefficient: ctext,
          limit: MAX_REACTION_COEFFICIENT,
        });
      }
      integerCoefficient = coefficient.den === 1n && ctext.length < 10 ? Number(coefficient.num) : 0;
    }
    speciesOffset = ctext.length;
    while (isSpace(body[speciesOffset])) speciesOffset++;
  }
  const species = speciesOffset === 0 ? body : body.slice(speciesOffset);
  const speciesColumn = column + speciesOffset;
  if (species === "") {
    throw new RxthermError("INVALID_REACTION", `parseReaction found a coefficient without a species at column ${column}${hint !== undefined ? `; ${hint}` : ""}`, {
      column,
      reason: "coefficient without a species",
      ...(hint !== undefined ? { hint } : {}),
    });
  }
  let formula = sharedFormula(species);
  if (formula === undefined) {
    try {
      formula = parseFormula(species);
    } catch (e) {
      if (e instanceof RxthermError) {
        const inner = positionOf(e.details);
        const where = speciesColumn + (inner ?? 0);
        throw new RxthermError(e.code, `parseReaction: bad species "${species}" (column ${speciesColumn} of the equation; error at column ${where}): ${e.message.replace(/^\[rxtherm\]\s*/, "")}`, {
          ...e.details,
          column: where,
          species,
          speciesColumn,
        });
      }
      throw e;
    }
    shareFormula(species, formula);
  }
  out.species.push(species);
  out.formulas.push(formula);
  out.integers.push(integerCoefficient > 0 ? integerCoefficient : 0);
  out.rationals.push(integerCoefficient > 0 ? null : (coefficient ?? ONE));
}

function isDigits(t: string): boolean {
  for (let i = 0; i < t.length; i++) {
    const c = t.charCodeAt(i);
    if (c < 48 || c > 57) return false;
  }
  return true;
}

function zeroCoefficient(ctext: string, column: number): never {
  throw new RxthermError("INVALID_COUNT", `parseReaction requires a positive coefficient, got "${ctext}" at column ${column}`, {
    column,
    coefficient: ctext,
  });
}

const ONE: Rational = /* @__PURE__ */ Object.freeze({ num: 1n, den: 1n });

function positionOf(details: Readonly<Record<string, unknown>>): number | undefined {
  for (const key of ["column", "index", "offset", "position"]) {
    const v = details[key];
    if (typeof v === "number" && Number.isInteger(v) && v >= 0) return v;
  }
  return undefined;
}
