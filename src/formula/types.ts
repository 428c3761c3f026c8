/**
 * Phase labels of a species key: gas, liquid, solid, aqueous solution, crystal.
 *
 * @category Formula
 */
export type Phase = "g" | "l" | "s" | "aq" | "cr";

/**
 * A parsed chemical formula.
 *
 * `elements` maps element symbols (and the isotopes `D`, `T`) to their counts, which may be
 * exact decimals such as 0.947 in `Fe0.947O` (read exactly from the text; the number is the
 * nearest double, whose shortest decimal form is the text's decimal). The electron `e-` has
 * no elements and charge −1.
 *
 * @category Formula
 */
export interface Formula {
  /** The text as given (trimmed). */
  readonly text: string;
  /** Element symbol → count (atoms per formula unit). */
  readonly elements: Readonly<Record<string, number>>;
  /** Net charge in elementary charges (0 for neutral species). */
  readonly charge: number;
  /** Phase suffix, or null when the text has none. */
  readonly phase: Phase | null;
}
