/**
 * The two well-known symbols a displayable result carries.
 *
 * @module
 */

/**
 * The key of the rich-display method that notebook kernels call (Deno's Jupyter kernel looks for
 * `Symbol.for("Jupyter.display")`); the method returns a {@link MimeBundle}.
 *
 * Declared as a `unique symbol` so that the method stays in the published type definitions: index a
 * result with this constant (`result[JUPYTER_DISPLAY]()`), not with `Symbol.for(...)`.
 *
 * @category Display
 * @example
 * JUPYTER_DISPLAY === Symbol.for("Jupyter.display") // => true
 */
export const JUPYTER_DISPLAY: unique symbol = Symbol.for("Jupyter.display") as never;

/**
 * The key of the method that returns a result's {@link ResultView} (the table description behind
 * every display form).
 *
 * @category Display
 * @example
 * RESULT_VIEW === Symbol.for("rxtherm.view") // => true
 */
export const RESULT_VIEW: unique symbol = Symbol.for("rxtherm.view") as never;
