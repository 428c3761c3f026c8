import { describe, expect, it } from "vitest";
import { JUPYTER_DISPLAY, RESULT_VIEW } from "../../src/view/displaySymbols.js";
import { attachView, viewDescriptors } from "../../src/view/attachView.js";

describe("display symbols", () => {
  it("JUPYTER_DISPLAY is the registered symbol the Deno kernel looks for (doc example)", () => {
    expect(JUPYTER_DISPLAY === Symbol.for("Jupyter.display")).toBe(true); // Deno Jupyter kernel protocol, common practice
    expect(RESULT_VIEW === Symbol.for("rxtherm.view")).toBe(true);
  });
});

describe("attachView(result, descriptors)", () => {
  const D = viewDescriptors((r: { x: number }) => ({ title: `x = ${r.x}`, tables: [] }));

  it("adds non-enumerable methods that read the result lazily", () => {
    const r = attachView({ x: 1 }, D);
    r.x = 2;
    expect(Object.keys(r)).toEqual(["x"]);
    expect(JSON.stringify(r)).toBe('{"x":2}');
    expect((r as unknown as Record<symbol, () => { title: string }>)[RESULT_VIEW]!().title).toBe("x = 2");
  });

  it("leaves a frozen result as it is", () => {
    const r = Object.freeze({ x: 1 });
    expect(attachView(r, D)).toBe(r);
    expect(Object.getOwnPropertySymbols(r)).toEqual([]);
  });
});
