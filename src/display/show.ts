import { JUPYTER_DISPLAY } from "../view/displaySymbols.js";
import { viewToHtml, viewToMarkdown, viewToText } from "../view/renderView.js";
import type { MimeBundle } from "../view/types.js";
import { resolveView } from "./internal/resolveView.js";
import { mimeBundle } from "./mimeBundle.js";
import type { Displayable } from "./types.js";

/**
 * Wrap a result for display: one object with the table view, `toString()` (plain text), `toMarkdown()`,
 * `toHtml()` and the notebook rich-display method.
 *
 * rxtherm results already display themselves as tables in a notebook; `show` is for values that do not
 * (a stream `{ T, flows }` or bare flows), for choosing a form explicitly (`${show(r)}` in a template is the
 * text form), and for several results in one cell (`await Deno.jupyter.display(show(a))`).
 *
 * @param value - an rxtherm result, a chart, a stream `{ T, flows }` or flows (species → mol or mol/s)
 * @returns a frozen {@link Displayable}
 * @throws RxthermError `INVALID_ARGUMENT` for any other value
 * @category Display
 * @example
 * show({ T: 500, flows: { "N2(g)": 3.76, "O2(g)": 1 } }).view.title // => "stream at 500 K"
 */
export function show(value: unknown): Displayable {
  const view = resolveView(value, "show");
  return Object.freeze({
    view,
    toString: (): string => viewToText(view),
    toMarkdown: (): string => viewToMarkdown(view),
    toHtml: (): string => viewToHtml(view),
    [JUPYTER_DISPLAY]: (): MimeBundle => mimeBundle(value),
  });
}
