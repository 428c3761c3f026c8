/**
 * Private to the library: give a result its display methods without any import of the display layer.
 *
 * A module that makes a result writes a small `describe(result) => ResultView` function beside it and
 * builds, once at module level, the property descriptors with {@link viewDescriptors}. The result then gets
 * two non-enumerable symbol-keyed methods — {@link JUPYTER_DISPLAY} (the notebook MIME bundle) and
 * {@link RESULT_VIEW} (the view) — so it stays deep-equal to a plain object with the same fields and
 * `JSON.stringify` ignores them. The table is built only when a notebook (or `show`) asks for it.
 *
 * @module
 * @internal
 */
import { JUPYTER_DISPLAY, RESULT_VIEW } from "./displaySymbols.js";
import { viewMimeBundle } from "./renderView.js";
import type { MimeBundle, ResultView } from "./types.js";

/** Property descriptors of the two display methods of one kind of result. */
export type ViewDescriptors = PropertyDescriptorMap;

/** Build (once per kind of result, at module level) the descriptors of its display methods. */
export function viewDescriptors<T>(describe: (value: T) => ResultView): ViewDescriptors {
  return {
    [RESULT_VIEW]: {
      value: function view(this: T): ResultView { return describe(this); },
      enumerable: false, writable: false, configurable: true,
    },
    [JUPYTER_DISPLAY]: {
      value: function display(this: T): MimeBundle { return viewMimeBundle(describe(this)); },
      enumerable: false, writable: false, configurable: true,
    },
  };
}

/**
 * Attach the display methods to a freshly made result and return it. Call it before freezing; an object
 * that is already frozen (or not extensible) is returned unchanged, and `show` then finds no view on it.
 */
export function attachView<T extends object>(result: T, descriptors: ViewDescriptors): T {
  if (Object.isExtensible(result)) Object.defineProperties(result, descriptors);
  return result;
}

/**
 * A prototype that carries the display methods, for results made on a hot path: creating an object with
 * `Object.create(proto)` costs far less than defining two properties on every result.
 */
export function viewPrototype(descriptors: ViewDescriptors): object {
  return Object.create(Object.prototype, descriptors) as object;
}
