import { viewToMarkdown } from "../view/renderView.js";
import { resolveView } from "./internal/resolveView.js";

/**
 * A result as Markdown: a bold title and pipe tables with units in every column header (numbers
 * right-aligned) — for notebooks' Markdown cells, reports and issue trackers.
 *
 * @param value - an rxtherm result, a chart (its data), a stream `{ T, flows }` or flows
 * @returns the Markdown text
 * @throws RxthermError `INVALID_ARGUMENT` for any other value
 * @category Display
 * @example
 * toMarkdown({ "CH4(g)": 1, "O2(g)": 2 }).split("\n")[2] // => "| species | amount (mol or mol/s) |"
 */
export function toMarkdown(value: unknown): string {
  return viewToMarkdown(resolveView(value, "toMarkdown"));
}
