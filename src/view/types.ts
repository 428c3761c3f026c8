/**
 * Types of a result view: the small, plain description of a table (or a few tables) that a result
 * carries so that it can be shown as text, Markdown or HTML without the display layer.
 *
 * @module
 */

/**
 * One cell of a view table: text, a number (formatted when rendered) or empty.
 *
 * @category Display
 */
export type ViewCell = string | number | null;

/**
 * One column of a view table. The header reads `label (unit)`.
 *
 * @category Display
 */
export interface ViewColumn {
  /** Column name, e.g. `"T"` or `"species"`. */
  readonly label: string;
  /** Unit of every number in the column, e.g. `"K"` or `"kJ/mol"`; omitted for text columns. */
  readonly unit?: string;
  /** Significant digits for numbers in this column. @defaultValue 6 */
  readonly digits?: number;
}

/**
 * One table of a view: a caption, its columns and its rows (one cell per column).
 *
 * @category Display
 */
export interface ViewTable {
  /** Short caption above the table, e.g. `"outlet"`. */
  readonly caption?: string;
  /** Columns, in order. */
  readonly columns: readonly ViewColumn[];
  /** Rows; each row has one cell per column. */
  readonly rows: readonly (readonly ViewCell[])[];
}

/**
 * A result view: a title, one or more tables and optional notes (extrapolation, warnings).
 *
 * @category Display
 */
export interface ResultView {
  /** What the result is, e.g. `"species CO2(g)"`. */
  readonly title: string;
  /** The tables, in reading order. */
  readonly tables: readonly ViewTable[];
  /** Remarks printed under the tables. */
  readonly notes?: readonly string[];
}

/**
 * A MIME bundle as the Jupyter rich-display protocol expects it: MIME type → content.
 *
 * @category Display
 */
export type MimeBundle = Record<string, unknown>;
