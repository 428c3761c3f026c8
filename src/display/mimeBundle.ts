import { JUPYTER_DISPLAY } from "../view/displaySymbols.js";
import { viewMimeBundle } from "../view/renderView.js";
import type { MimeBundle } from "../view/types.js";
import { resolveView } from "./internal/resolveView.js";

/**
 * The notebook MIME bundle of a result: what a Jupyter kernel shows for it.
 *
 * Every rxtherm result carries its own rich-display method (`result[JUPYTER_DISPLAY]()`, found by the Deno
 * kernel on a bare last expression). `mimeBundle` calls it, or builds the bundle for a stream or bare flows,
 * for kernels and apps that take a bundle explicitly (a Node kernel's display function, a web page).
 * Tables give `text/plain`, `text/markdown` and `text/html`; charts give `application/vnd.vegalite.v5+json`
 * and `text/plain`.
 *
 * @param value - an rxtherm result, a chart, a stream `{ T, flows }` or flows (species → mol or mol/s)
 * @returns MIME type → content
 * @throws RxthermError `INVALID_ARGUMENT` for any other value
 * @category Display
 * @example
 * Object.keys(mimeBundle(species("CO2(g)"))) // => ["text/plain", "text/markdown", "text/html"]
 */
export function mimeBundle(value: unknown): MimeBundle {
  if (value !== null && typeof value === "object") {
    const method = (value as { [JUPYTER_DISPLAY]?: unknown })[JUPYTER_DISPLAY];
    if (typeof method === "function") return (method as () => MimeBundle).call(value);
  }
  return viewMimeBundle(resolveView(value, "mimeBundle"));
}
