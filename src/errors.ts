/**
 * The single error class of rxtherm and its machine-readable codes.
 *
 * Callers branch on {@link RxthermError.code}, never on the message text. Every code is
 * listed in {@link ERROR_CODES} with a one-line meaning, and in `docs/errors.md`.
 *
 * @module
 */

/**
 * Every error code rxtherm throws, with what it means. The keys form {@link RxthermErrorCode}.
 *
 * @category Errors
 * @example
 * ERROR_CODES.NOT_BALANCEABLE // => "no set of positive coefficients closes every element and the charge"
 */
export const ERROR_CODES = Object.freeze({
  // input text (formulas, equations)
  EMPTY_INPUT: "the text is empty or only whitespace",
  INPUT_TOO_LONG: "the text is longer than the documented limit",
  UNEXPECTED_CHARACTER: "a character that the grammar does not allow at this column",
  UNKNOWN_ELEMENT: "an element symbol that is not one of the 118 elements (or D, T)",
  UNCLOSED_GROUP: "an opening bracket without its closing bracket",
  UNMATCHED_CLOSE: "a closing bracket without its opening bracket, or of the wrong kind",
  INVALID_COUNT: "a count or coefficient that is zero, negative or malformed",
  COUNT_TOO_LARGE: "a count or coefficient above the documented limit",
  NESTING_TOO_DEEP: "brackets nested deeper than the documented limit",
  INVALID_CHARGE: "a charge written in a way the grammar does not accept",
  INVALID_PHASE: "a phase suffix other than (g), (l), (s), (aq), (cr)",
  INVALID_REACTION: "an equation without exactly one arrow, or with an empty side",
  // balancing
  NOT_BALANCEABLE: "no set of positive coefficients closes every element and the charge",
  WRONG_SIDE: "a species would need a negative coefficient: it belongs on the other side",
  AMBIGUOUS_BALANCE: "more than one independent balanced reaction exists among the species",
  UNBALANCED_REACTION: "a reaction given to a routine that requires balance does not balance",
  INCONSISTENT_CONSTRAINTS: "fixed coefficients that contradict the element balance or each other",
  // data and library
  INVALID_DATA: "species data that fail schema validation (issues listed with paths)",
  UNKNOWN_SPECIES: "no species with this key, formula or name in the library",
  AMBIGUOUS_PHASE: "a key without a phase that matches more than one phase",
  AMBIGUOUS_SPECIES: "a formula or name that matches more than one species (isomers): use the full key",
  MISSING_DATA: "the species lacks the data the computation needs",
  OUT_OF_RANGE: "a temperature outside the species' data range, without extrapolation",
  // extents, streams, balances
  INVALID_ARGUMENT: "an argument outside its documented domain",
  SPEC_COUNT_MISMATCH: "the number of specifications differs from the number of independent reactions",
  SINGULAR_SPECS: "the specifications do not determine the extents (a singular system)",
  CONFLICTING_SPECS: "specifications that contradict each other",
  NEGATIVE_FLOW: "an outlet or feed flow that would be negative",
  NOT_IN_SPAN: "a target reaction that is not a combination of the known reactions",
  ELEMENT_IMBALANCE: "streams whose elements do not balance",
  // solvers and flames
  NO_BRACKET: "a root finder could not bracket the solution inside the allowed interval",
  NO_CONVERGENCE: "an iterative solver did not converge within its iteration limit",
  NOTHING_TO_BURN: "a fuel with nothing oxidisable in it",
  NO_OXIDIZER: "an oxidizer with no oxygen in it",
  ELEMENTS_NOT_COVERED: "a product set that cannot hold every element of the feed",
  // command line
  INVALID_CASE: "a heat-duty case file that fails validation (issues listed with JSON paths)",
  // hardening
  TOO_LARGE: "user data with more rows, points or species than the documented limit",
} as const);

/**
 * Machine-readable error code; see {@link ERROR_CODES} for the meaning of each.
 *
 * @category Errors
 */
export type RxthermErrorCode = keyof typeof ERROR_CODES;

/**
 * Extra facts about an error: the column of a parse error, the species and range of a data
 * error, the issue list of a validation error, and so on. Which keys appear depends on the code.
 *
 * @category Errors
 */
export type RxthermErrorDetails = Readonly<Record<string, unknown>>;

/** The process-wide brand every build of rxtherm shares (`Symbol.for`, not a module-local symbol). */
const ERROR_BRAND: unique symbol = /* @__PURE__ */ Symbol.for("rxtherm.error") as never;

/**
 * The one error class rxtherm throws. `code` is stable and machine-readable, `details` holds
 * the facts (column, species, range, issues...), and the message starts with `[rxtherm]`.
 *
 * @category Errors
 * @example
 * try {
 *   parseFormula("Xy2");
 * } catch (e) {
 *   if (e instanceof RxthermError) e.code; // => "UNKNOWN_ELEMENT"
 * }
 */
export class RxthermError extends Error {
  /**
   * Recognises an rxtherm error from any copy of the library loaded in the same process (the
   * ESM and the CommonJS build, or two bundled copies): every RxthermError carries the
   * process-wide brand `Symbol.for("rxtherm.error")`, and `instanceof` checks that brand.
   *
   * @param value - any value
   * @returns true when `value` is an rxtherm error of any build
   */
  static override [Symbol.hasInstance](value: unknown): boolean {
    return typeof value === "object" && value !== null && (value as Record<symbol, unknown>)[ERROR_BRAND] === true;
  }

  /** Machine-readable code; see {@link ERROR_CODES}. */
  readonly code: RxthermErrorCode;
  /** Code-dependent facts about the failure. */
  readonly details: RxthermErrorDetails;

  /**
   * @param code - the error code
   * @param message - human-readable text, lowercase, naming the function and the requirement
   * @param details - code-dependent facts (column, species, range...)
   */
  constructor(code: RxthermErrorCode, message: string, details: RxthermErrorDetails = {}) {
    super(`[rxtherm] ${message}`);
    this.name = "RxthermError";
    this.code = code;
    this.details = Object.freeze({ ...details });
    Object.defineProperty(this, ERROR_BRAND, { value: true });
  }
}

/**
 * True when `value` is an {@link RxthermError}, optionally with the given code.
 *
 * @category Errors
 * @example
 * isRxthermError(new RxthermError("OUT_OF_RANGE", "x"), "OUT_OF_RANGE") // => true
 */
export function isRxthermError(value: unknown, code?: RxthermErrorCode): value is RxthermError {
  return value instanceof RxthermError && (code === undefined || value.code === code);
}
