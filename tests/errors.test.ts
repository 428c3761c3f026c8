import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { ERROR_CODES, RxthermError, isRxthermError } from "../src/errors.js";

describe("RxthermError", () => {
  it("carries code, details and a tagged message", () => {
    const e = new RxthermError("OUT_OF_RANGE", "cp needs 298.15 <= T <= 6000 K, got 7000", { T: 7000 });
    expect(e).toBeInstanceOf(Error);
    expect(e.code).toBe("OUT_OF_RANGE");
    expect(e.details).toEqual({ T: 7000 });
    expect(e.message.startsWith("[rxtherm] ")).toBe(true);
    expect(Object.isFrozen(e.details)).toBe(true);
  });
  it("isRxthermError(value, code) checks class and code (the documented example)", () => {
    expect(isRxthermError(new RxthermError("OUT_OF_RANGE", "x"), "OUT_OF_RANGE")).toBe(true);
    expect(isRxthermError(new RxthermError("OUT_OF_RANGE", "x"), "NO_BRACKET")).toBe(false);
    expect(isRxthermError(new Error("x"))).toBe(false);
  });
  it("docs/errors.md lists every code in ERROR_CODES", () => {
    const doc = readFileSync(new URL("../docs/errors.md", import.meta.url), "utf8");
    for (const code of Object.keys(ERROR_CODES)) expect(doc, code).toContain(`\`${code}\``);
  });
});
