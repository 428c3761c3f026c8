/**
 * Types of the display layer: displayable wrappers and chart specifications.
 *
 * @module
 */
import type { JUPYTER_DISPLAY } from "../view/displaySymbols.js";
import type { MimeBundle, ResultView } from "../view/types.js";

/**
 * A result wrapped for display: its table view, its text, Markdown and HTML forms, and the notebook
 * rich-display method (`[JUPYTER_DISPLAY]()`, the MIME bundle a Jupyter kernel shows).
 *
 * @category Display
 */
export interface Displayable {
  /** The table description behind every form. */
  readonly view: ResultView;
  /** Aligned plain-text tables. */
  toString(): string;
  /** Markdown: a bold title and pipe tables. */
  toMarkdown(): string;
  /** HTML: a `<div class="rxtherm">` with one `<table>` per table. */
  toHtml(): string;
  /** The MIME bundle for notebook kernels (text/plain, text/markdown, text/html; a chart's Vega-Lite JSON). */
  [JUPYTER_DISPLAY](): MimeBundle;
}

/**
 * One encoding channel of a chart (a subset of the Vega-Lite field definition).
 *
 * @category Display
 */
export interface ChartChannel {
  /** Data field shown on this channel. */
  readonly field: string;
  /** Vega-Lite measurement type. */
  readonly type: "quantitative" | "nominal" | "ordinal";
  /** Axis or legend title, with the unit in brackets. */
  readonly title: string;
  /** Extra Vega-Lite properties (scale, sort, axis...). */
  readonly [property: string]: unknown;
}

/**
 * A Vega-Lite v5 specification as plain JSON (inline data, one mark, x/y/color encodings). It renders in
 * notebooks that understand the Vega-Lite MIME type, in the Vega-Lite web tools, and with the `vega` and
 * `vega-lite` packages. A chart made by rxtherm also carries (non-enumerable) display methods: its data as a
 * table in text, Markdown and HTML, and the MIME bundle `application/vnd.vegalite.v5+json` with a text fallback.
 *
 * @category Display
 */
export interface ChartSpec {
  /** The Vega-Lite v5 schema URL. */
  readonly $schema: string;
  /** Chart title. */
  readonly title: string;
  /** Width in pixels. */
  readonly width: number;
  /** Height in pixels. */
  readonly height: number;
  /** Inline data: one record per point. */
  readonly data: { readonly values: readonly Readonly<Record<string, number | string>>[] };
  /** The mark (line or bar) and its options. */
  readonly mark: Readonly<Record<string, unknown>>;
  /** Encodings: x and y, and color when there are several series. */
  readonly encoding: { readonly x: ChartChannel; readonly y: ChartChannel; readonly color?: ChartChannel };
}

/**
 * Options of the species property charts ({@link cpChart}, {@link enthalpyChart}).
 *
 * @category Display
 */
export interface SpeciesChartOptions {
  /** Lowest temperature, K (each species is drawn only inside its data range). @defaultValue 298.15 */
  TminK?: number;
  /** Highest temperature, K. @defaultValue 2000 */
  TmaxK?: number;
  /** Points per species, an integer from 2 to `MAX_CHART_POINTS` (10 000). @defaultValue 60 */
  points?: number;
  /** Chart width and height in pixels. @defaultValue 480 × 300 */
  width?: number;
  /** @defaultValue 300 */
  height?: number;
}
