import { viewToHtml } from "../view/renderView.js";
import { resolveView } from "./internal/resolveView.js";

/**
 * A result as HTML: `<div class="rxtherm">` with a bold title and one `<table class="rxtherm-table">` per
 * table (header cells `label (unit)`, numbers right-aligned, all text escaped) — for web pages and notebooks.
 *
 * @param value - an rxtherm result, a chart (its data), a stream `{ T, flows }` or flows
 * @returns the HTML fragment
 * @throws RxthermError `INVALID_ARGUMENT` for any other value
 * @category Display
 * @example
 * toHtml(species("N2(g)")).startsWith('<div class="rxtherm">') // => true
 */
export function toHtml(value: unknown): string {
  return viewToHtml(resolveView(value, "toHtml"));
}
