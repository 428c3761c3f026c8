/**
 * Private: assemble a Vega-Lite v5 specification from inline data and its channels, and give it its
 * display methods (the Vega-Lite MIME bundle, and its data as a table for text, Markdown and HTML).
 *
 * @module
 * @internal
 */
import { RxthermError, describeValue } from "../../errors.js";
import { attachView, viewDescriptors } from "../../view/attachView.js";
import { JUPYTER_DISPLAY } from "../../view/displaySymbols.js";
import { viewToText } from "../../view/renderView.js";
import type { MimeBundle, ResultView } from "../../view/types.js";
import type { ChartChannel, ChartSpec } from "../types.js";

/** The Vega-Lite schema the charts follow. */
export const VEGA_LITE_SCHEMA = "https://vega.github.io/schema/vega-lite/v5.json";

/** The notebook MIME type of a Vega-Lite v5 specification. */
export const VEGA_LITE_MIME = "application/vnd.vegalite.v5+json";

/** What a chart needs: title, size, rows, mark and channels. */
export interface ChartParts {
  readonly title: string;
  readonly width?: number;
  readonly height?: number;
  readonly values: readonly Readonly<Record<string, number | string>>[];
  readonly mark: Readonly<Record<string, unknown>>;
  readonly x: ChartChannel;
  readonly y: ChartChannel;
  readonly color?: ChartChannel;
}

/** A chart specification (plain JSON) carrying its display methods. */
export function makeChart(p: ChartParts): ChartSpec {
  const spec: ChartSpec = {
    $schema: VEGA_LITE_SCHEMA,
    title: p.title,
    width: p.width ?? 480,
    height: p.height ?? 300,
    data: { values: p.values },
    mark: p.mark,
    encoding: { x: p.x, y: p.y, ...(p.color !== undefined ? { color: p.color } : {}) },
  };
  attachView(spec, CHART_VIEW);
  Object.defineProperty(spec, JUPYTER_DISPLAY, { value: chartBundle, enumerable: false, configurable: true });
  return spec;
}

/** The data of a chart as a table: one column per channel, headers are the axis titles. */
export function chartView(c: ChartSpec): ResultView {
  const channels = [c.encoding.color, c.encoding.x, c.encoding.y].filter((ch): ch is ChartChannel => ch !== undefined);
  return {
    title: `chart: ${c.title}`,
    tables: [{
      columns: channels.map((ch) => ({ label: ch.title })),
      rows: c.data.values.map((row) => channels.map((ch) => row[ch.field] ?? null)),
    }],
  };
}

/**
 * Most points per series of a species chart (`points` of {@link cpChart} and {@link enthalpyChart});
 * more is TOO_LARGE. A chart is drawn at a few hundred pixels: more points add nothing but memory.
 */
export const MAX_CHART_POINTS = 10_000;

/** Most series (species) in one species chart; more is TOO_LARGE. */
export const MAX_CHART_SERIES = 100;

/**
 * Check a sampling option at `options.<name>`: a positive finite number (an integer ≥ 2 for `points`,
 * at most `MAX_CHART_POINTS`, else TOO_LARGE).
 */
export function checkPositive(fn: string, name: string, v: unknown, integer = false): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0 || (integer && (!Number.isInteger(v) || v < 2))) {
    throw new RxthermError("INVALID_ARGUMENT", `${fn} requires ${name} to be ${integer ? "an integer ≥ 2" : "a finite number > 0"}, got ${describeValue(v)}`, {
      path: `options.${name}`,
      value: describeValue(v),
    });
  }
  if (integer && v > MAX_CHART_POINTS) {
    throw new RxthermError("TOO_LARGE", `${fn} draws at most ${MAX_CHART_POINTS} ${name} per series, got ${v}`, {
      path: `options.${name}`,
      limit: MAX_CHART_POINTS,
      size: v,
    });
  }
  return v;
}

const CHART_VIEW = /* @__PURE__ */ viewDescriptors(chartView);

function chartBundle(this: ChartSpec): MimeBundle {
  return { [VEGA_LITE_MIME]: JSON.parse(JSON.stringify(this)) as unknown, "text/plain": viewToText(chartView(this)) };
}
