import { RxthermError } from "../../src/errors.js";

/**
 * Run `f`, expecting it to throw an RxthermError, and return that error so a test can check
 * its `code` and `details`. Any other exception is rethrown; returning normally fails the test.
 */
export function caught(f: () => unknown): RxthermError {
  try {
    f();
  } catch (e) {
    if (e instanceof RxthermError) return e;
    throw e;
  }
  throw new Error("expected an RxthermError, but the call returned normally");
}
