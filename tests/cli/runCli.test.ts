import { describe, expect, it } from "vitest";
import { CLI_EXIT_CODES, runCli } from "../../src/cli/runCli.js";
import type { CliIO } from "../../src/cli/types.js";
import { createLibrary } from "../../src/species/createLibrary.js";
import { RxthermError } from "../../src/errors.js";

interface Run { code: number; out: string; err: string }

async function run(args: string[], extra: Partial<CliIO> = {}): Promise<Run> {
  let out = "";
  let err = "";
  const code = await runCli(args, {
    stdout: (t) => void (out += t),
    stderr: (t) => void (err += t),
    readTextFile: () => {
      throw Object.assign(new Error("nope"), { code: "ENOENT" });
    },
    ...extra,
  });
  return { code, out, err };
}

const COMMANDS = ["balance", "mass", "enthalpy", "heating-value", "air", "flame", "species", "duty"];

describe("runCli(argv, io)", () => {
  it("the @example: balance --json gives the balanced equation", async () => {
    const r = await run(["balance", "C3H8 + O2 -> CO2 + H2O", "--json"]);
    expect(r.code).toBe(0);
    // C3H8 + 5 O2 -> 3 CO2 + 4 H2O: propane combustion stoichiometry, common practice
    expect(JSON.parse(r.out).equation).toBe("C3H8 + 5 O2 -> 3 CO2 + 4 H2O");
    expect(CLI_EXIT_CODES.usage).toBe(2);
  });

  it("every command has --help (exit 0, usage line, options, examples) and is listed in rxtherm --help", async () => {
    const main = await run(["--help"]);
    expect(main.code).toBe(0);
    for (const name of COMMANDS) {
      expect(main.out).toContain(`  ${name} `);
      for (const flag of ["--help", "-h"]) {
        const r = await run([name, flag]);
        expect(r.code, `${name} ${flag}`).toBe(0);
        expect(r.out).toMatch(new RegExp(`^Usage: rxtherm ${name} `));
        expect(r.out).toContain("--json");
        expect(r.out).toContain(`Examples:\n  rxtherm ${name}`);
        expect(r.err).toBe("");
      }
    }
    expect((await run(["help", "flame"])).out).toMatch(/^Usage: rxtherm flame/);
  });

  it("exit codes: 2 usage, 3 input or data, 4 no convergence, 1 internal; nothing on stdout when failing", async () => {
    const usage = [["nonsense"], ["balance"], ["balance", "A -> B", "extra"], ["flame", "CH4", "--oops"], ["flame", "CH4", "--P", "3 furlongs"],
      ["air", "CH4", "--excess-air", "15%", "--equivalence-ratio", "0.9"], ["air", "CH4", "--excess-air"], ["mass", "--json", "--json"], []];
    for (const args of usage) {
      const r = await run(args);
      expect(r.code, args.join(" ")).toBe(2);
      expect(r.err).toMatch(/^rxtherm/);
    }
    for (const args of [["mass", "Xy2"], ["balance", "H2 + O2 -> CO2"], ["species", "unobtainium"], ["duty", "missing.json"]]) {
      const r = await run(args);
      expect(r.code, args.join(" ")).toBe(3);
      expect(r.out).toBe("");
      expect(r.err).toMatch(/^rxtherm \S+ \[[A-Z_]+\]: /);
    }
    // acetylene–oxygen from 3000 K burned completely cannot close its balance below the 6000 K data limit: NO_BRACKET
    const hot = await run(["flame", "C2H2", "--oxidizer", "oxygen", "--mode", "complete", "--T", "3000K"]);
    expect(hot.code).toBe(4);
    expect(hot.err).toMatch(/^rxtherm flame \[NO_BRACKET\]/);
    const heater = JSON.stringify({ inlet: [{ T: "25C", flows: { "N2(g)": 1 } }], outlet: [{ T: "200C", flows: { "N2(g)": 1 } }] });
    const internal = await run(["duty", "x.json"], { readTextFile: () => heater, stdout: () => { throw new TypeError("broken pipe"); } });
    expect(internal.code).toBe(CLI_EXIT_CODES.internal);
    expect(internal.err).toMatch(/internal error/);
  });

  it("NO_CONVERGENCE and NO_BRACKET from the library map to exit code 4", async () => {
    for (const code of ["NO_CONVERGENCE", "NO_BRACKET"] as const) {
      const failing = { get: () => { throw new RxthermError(code, "solver gave up", {}); } };
      const r = await run(["species", "CO2", "--database"], { loadDatabase: async () => ({ speciesDatabase: () => failing }) });
      expect(r.code).toBe(4);
      expect(r.err).toBe(`rxtherm species [${code}]: solver gave up\n`);
    }
  });

  it("--version prints the version given by the host", async () => {
    expect((await run(["--version"], { version: "9.9.9" })).out).toBe("rxtherm 9.9.9\n");
  });

  it("mass: CuSO4·5H2O is 249.68 g/mol, Cu 25.45 % by mass", async () => {
    const r = JSON.parse((await run(["mass", "CuSO4.5H2O", "--json"])).out);
    // 63.546 + 32.06 + 9·15.999 + 10·1.008 from the IUPAC 2013 standard atomic weights (Pure Appl. Chem. 88 (2016) 265)
    expect(r.molarMassGPerMol).toBeCloseTo(249.677, 3);
    expect(r.elements[0]).toMatchObject({ element: "Cu", atoms: 1 });
    expect(r.elements[0].massFraction).toBeCloseTo(63.546 / 249.677, 6);
  });

  it("enthalpy: methane HHV −890.3 kJ/mol at 25 °C, units converted", async () => {
    const r = JSON.parse((await run(["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "--json"])).out);
    // ΔcH°(CH4) = −890.3 kJ/mol from NIST-JANAF ΔfH° (CH4 −74.873, CO2 −393.522, H2O(l) −285.830 kJ/mol)
    expect(r.results[0].valueInUnit).toBeCloseTo(-890.31, 2);
    const k = JSON.parse((await run(["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "--unit", "kcal/mol", "--json"])).out);
    expect(k.results[0].valueInUnit).toBeCloseTo(-890310.1 / 4184, 4); // thermochemical calorie 4.184 J, NIST SP 811
    const f = JSON.parse((await run(["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "--T", "77F", "--json"])).out);
    expect(f.results[0].T).toBeCloseTo(298.15, 9); // 77 °F = 25 °C, common practice
    expect((await run(["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "--unit", "kJ/kg"])).code).toBe(2);
  });

  it("heating-value: methane HHV 55.5 MJ/kg, LHV 50.0 MJ/kg", async () => {
    const r = JSON.parse((await run(["heating-value", "CH4", "--json"])).out);
    // 890.3 and 802.3 kJ/mol over 16.043 g/mol (NIST-JANAF ΔfH°; IUPAC atomic weights)
    expect(r.heatingValues[0].values["MJ/kg"]).toBeCloseTo(55.495, 2);
    expect(r.heatingValues[1].values["MJ/kg"]).toBeCloseTo(50.009, 2);
  });

  it("air: methane needs 2 mol O2 and 9.52 mol of 21 % air per mol", async () => {
    const r = JSON.parse((await run(["air", "CH4", "--json"])).out);
    expect(r.theoreticalO2).toBeCloseTo(2, 12); // CH4 + 2 O2 -> CO2 + 2 H2O, common practice
    // the default air is 21 % O2 / 79 % N2 (common practice) → 2/0.21 = 9.5238 mol air per mol CH4
    expect(r.theoreticalAir).toBeCloseTo(2 / 0.21, 3);
    const flow = JSON.parse((await run(["air", "CH4", "--fuel-flow", "3.6kmol/h", "--json"])).out);
    expect(flow.flows.fuel.molPerS).toBeCloseTo(1, 12); // 3.6 kmol/h = 1 mol/s
    // a fuel name reads as in the flame command, flows included
    const named = JSON.parse((await run(["air", "methane", "--fuel-flow", "3.6kmol/h", "--json"])).out);
    expect(named.flows).toEqual(flow.flows);
    expect(named.theoreticalO2).toBe(r.theoreticalO2);
  });

  it("flame: methane–air at φ = 1 burns near 2225 K at equilibrium, complete combustion hotter", async () => {
    const eq = JSON.parse((await run(["flame", "CH4", "--json"])).out);
    // stoichiometric methane–air adiabatic flame ≈ 2226 K at 1 atm, 298 K (from memory; equilibrium with dissociation)
    expect(eq.T).toBeGreaterThan(2190);
    expect(eq.T).toBeLessThan(2260);
    const complete = JSON.parse((await run(["flame", "CH4", "--mode", "complete", "--json"])).out);
    expect(complete.T).toBeGreaterThan(eq.T); // dissociation absorbs heat: common practice
    const hot = JSON.parse((await run(["flame", "CH4", "--air-T", "200C", "--json"])).out);
    expect(hot.T).toBeGreaterThan(eq.T); // air preheat raises the flame temperature: common practice
  });

  it("species: CO2(g) ΔfH° −393.52 kJ/mol and Cp(1000 K) 54.3 J/(mol·K)", async () => {
    const r = JSON.parse((await run(["species", "CO2", "--T", "1000K", "--json"])).out);
    expect(r.key).toBe("CO2(g)");
    expect(r.hf298JPerMol / 1000).toBeCloseTo(-393.522, 3); // NIST-JANAF 4th ed. 1998
    expect(r.states[0].cp).toBeCloseTo(54.308, 1); // NIST-JANAF 4th ed. 1998, CO2 at 1000 K
  });

  it("--database loads the database module the host provides and looks species up in it", async () => {
    const lib = createLibrary({
      sources: { demo: "Pilot methanol plant lab notebook (invented demo scenario)" },
      species: [{
        key: "C9H20(l)", formula: "C9H20", phase: "l", name: "demo nonane", hf298KJPerMol: -275, hf298Source: "demo",
        s298JPerMolK: 394, s298Source: "demo",
        heatCapacity: { source: "demo", ranges: [{ TminK: 250, TmaxK: 400, cp: { form: "constant", cpJPerMolK: 284 } }] },
      }],
    });
    const withDb = await run(["species", "demo nonane", "--database", "--json"], { loadDatabase: async () => ({ speciesDatabase: () => lib }) });
    expect(withDb.code).toBe(0);
    expect(JSON.parse(withDb.out).key).toBe("C9H20(l)");
    expect((await run(["species", "demo nonane"])).code).toBe(3);
    const absent = await run(["species", "CO2", "--database"]);
    expect(absent.code).toBe(3);
    expect(absent.err).toMatch(/species database \(rxtherm\/database\) is not part of this installation/);
    const broken = await run(["species", "CO2", "--database"], { loadDatabase: async () => ({}) });
    expect(broken.code).toBe(3);
  });

  it("duty: reads the case file through the host and prints both methods", async () => {
    const text = JSON.stringify({
      inlet: [{ T: "25C", flows: { "N2(g)": 3.6 } }], outlet: [{ T: 500, flows: { "N2(g)": 3.6 } }], flowUnit: "kmol/h", dutyUnit: "W",
    });
    const r = await run(["duty", "heater.json", "--json"], { readTextFile: () => text });
    expect(r.code).toBe(0);
    // N2 H°(500 K) − H°(298.15 K) = 5.911 kJ/mol (NIST-JANAF 4th ed. 1998) at 1 mol/s
    expect(JSON.parse(r.out).dutyInUnit).toBeCloseTo(5911, -1);
    const schema = await run(["duty", "--schema"]);
    expect(JSON.parse(schema.out).title).toBe("rxtherm heat-duty case file");
  });
});
