// The browser page check (run by .ci/browser.sh with `node --test`, not by vitest: it needs the
// built dist/browser bundle and a Chromium). Headless Chromium loads docs/browser/index.html from a
// static server on 127.0.0.1; the page imports the self-contained bundle, balances an equation,
// computes a flame temperature and draws a chart, and this test reads the DOM.
import { test } from "node:test";
import assert from "node:assert/strict";
import { existsSync } from "node:fs";
import { chromium } from "playwright-core";
import { startServer } from "./server.mjs";

const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const BUNDLE = new URL("../../dist/browser/rxtherm.min.js", import.meta.url);

test("docs/browser/index.html runs the browser bundle in headless Chromium", async () => {
  assert.ok(existsSync(BUNDLE), "dist/browser/rxtherm.min.js is missing: run `npm run build` first");
  assert.ok(existsSync(CHROMIUM), `no Chromium at ${CHROMIUM} (apt-get install chromium, or set CHROMIUM_PATH)`);
  const server = await startServer();
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
      "--disable-component-update", "--disable-sync"],
  });
  try {
    const page = await browser.newPage();
    const problems = [];
    page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
    page.on("console", (m) => { if (m.type() === "error") problems.push(`console error: ${m.text()}`); });
    page.on("requestfailed", (r) => problems.push(`request failed: ${r.url()}`));
    const requests = [];
    page.on("request", (r) => requests.push(r.url()));

    await page.goto(`${server.url}/docs/browser/`);
    await page.waitForFunction(() => document.getElementById("status")?.dataset.status !== "running", null, { timeout: 30000 });
    assert.equal(await page.textContent("#status"), "done");
    assert.deepEqual(problems, []);
    // the page needs nothing but itself and the bundle (dependencies inlined, nothing fetched from elsewhere)
    assert.deepEqual(requests.map((u) => new URL(u).pathname).sort(), ["/dist/browser/rxtherm.min.js", "/docs/browser/"]);

    // C3H8 + 5 O2 -> 3 CO2 + 4 H2O: common practice (propane combustion stoichiometry)
    assert.equal(await page.textContent("#balanced"), "C3H8 + 5 O2 -> 3 CO2 + 4 H2O");

    // stoichiometric methane–air at 298.15 K, 1 atm, equilibrium products: about 2226 K (from memory of
    // the usual equilibrium flame tables); the built-in NIST-JANAF data give 2225 K in Node as well
    const kelvin = Number(await page.getAttribute("#flame-T", "data-kelvin"));
    assert.ok(Math.abs(kelvin - 2226) < 15, `flame T ${kelvin}`);
    assert.match(await page.textContent("#flame-T"), /^\d{4} K \(\d{4} °C\)$/);

    // the chart: one polyline of 19 points inside the drawing, peaking slightly rich of stoichiometric
    // (common practice: the hottest methane–air flame sits near φ ≈ 1.05)
    const chart = await page.$eval("#chart svg", (svg) => {
      const line = svg.querySelector("polyline");
      return {
        width: Number(svg.getAttribute("width")), height: Number(svg.getAttribute("height")),
        points: line.getAttribute("points").split(" ").map((p) => p.split(",").map(Number)),
        x: line.dataset.x.split(" ").map(Number), y: line.dataset.y.split(" ").map(Number),
        labels: [...svg.querySelectorAll("text")].map((t) => t.textContent),
      };
    });
    assert.equal(chart.points.length, 19);
    for (const [px, py] of chart.points) assert.ok(px >= 0 && px <= chart.width && py >= 0 && py <= chart.height, `point ${px},${py}`);
    const peak = chart.x[chart.y.indexOf(Math.max(...chart.y))];
    assert.ok(peak > 1 && peak < 1.15, `peak at φ = ${peak}`);
    assert.ok(Math.abs(chart.y[8] - kelvin) < 1e-6, "the sweep at φ = 1 matches the single flame temperature");
    assert.ok(chart.labels.includes("equivalence ratio φ") && chart.labels.includes("flame temperature, K"));
  } finally {
    await browser.close();
    await server.close();
  }
});
