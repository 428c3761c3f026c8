/**
 * The command lines whose whole output (stdout, stderr, exit code) is kept under tests/cli/golden/.
 * Regenerate after an intended change with `npm run golden:update`, then review the diff.
 *
 * Case files under tests/cli/cases/ are invented demo scenarios (the Hillside dairy biogas boiler,
 * a pilot methanol reactor).
 */
import { readFileSync } from "node:fs";
import { runCli } from "../../src/cli/runCli.js";
import type { CliIO } from "../../src/cli/types.js";

export interface GoldenCase {
  /** File name under golden/, without extension. */
  readonly name: string;
  readonly args: readonly string[];
}

export const GOLDEN_CASES: readonly GoldenCase[] = [
  { name: "help", args: ["--help"] },
  { name: "no-arguments", args: [] },
  { name: "balance-help", args: ["balance", "--help"] },
  { name: "balance-permanganate", args: ["balance", "KMnO4 + HCl -> KCl + MnCl2 + Cl2 + H2O"] },
  { name: "balance-octane-per-fuel", args: ["balance", "C8H18 + O2 -> CO2 + H2O", "--per", "C8H18"] },
  { name: "balance-ionic", args: ["balance", "MnO4- + H+ + e- -> Mn2+ + H2O"] },
  { name: "balance-json", args: ["balance", "C3H8 + O2 -> CO2 + H2O", "--json"] },
  { name: "balance-not-balanceable", args: ["balance", "H2 + O2 -> CO2"] },
  { name: "balance-missing-equation", args: ["balance"] },
  { name: "mass-hydrate", args: ["mass", "CuSO4.5H2O"] },
  { name: "mass-several", args: ["mass", "CH4", "C2H6", "Fe0.947O"] },
  { name: "mass-bad-formula", args: ["mass", "Ca(OH"] },
  { name: "enthalpy-methane-hhv", args: ["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"] },
  { name: "enthalpy-methanol-kirchhoff", args: ["enthalpy", "CO(g) + 2 H2(g) -> CH3OH(g)", "--T", "25C,250C", "--per", "CH3OH(g)"] },
  { name: "enthalpy-per-kg", args: ["enthalpy", "CO(g) + 2 H2(g) -> CH3OH(g)", "--T", "482F", "--unit", "kJ/kg", "--per", "CH3OH(g)"] },
  { name: "enthalpy-balance-first", args: ["enthalpy", "C3H8(g) + O2(g) -> CO2(g) + H2O(g)", "--balance", "--unit", "Btu/lbmol"] },
  { name: "enthalpy-unbalanced", args: ["enthalpy", "CH4(g) + O2(g) -> CO2(g) + H2O(l)"] },
  { name: "enthalpy-bad-unit", args: ["enthalpy", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "--T", "25 celsius"] },
  { name: "heating-value-methane", args: ["heating-value", "CH4"] },
  { name: "heating-value-biogas", args: ["heating-value", "CH4:0.6,CO2:0.4", "--unit", "MJ/Nm3"] },
  { name: "heating-value-octane", args: ["heating-value", "n-C8H18(l)", "--unit", "Btu/lb"] },
  { name: "air-methane", args: ["air", "CH4", "--excess-air", "15%"] },
  { name: "air-biogas-flow", args: ["air", "CH4:0.6,CO2:0.4", "--excess-air", "20%", "--fuel-flow", "120Nm3/h"] },
  { name: "air-ambiguous-percent", args: ["air", "CH4", "--excess-air", "15"] },
  { name: "flame-methane-equilibrium", args: ["flame", "CH4", "--excess-air", "15%"] },
  { name: "flame-biogas-complete-preheat", args: ["flame", "CH4:0.6,CO2:0.4", "--excess-air", "20%", "--air-T", "200C", "--mode", "complete"] },
  { name: "flame-unknown-option", args: ["flame", "CH4", "--excess", "15%"] },
  { name: "flame-no-bracket", args: ["flame", "C2H2", "--oxidizer", "oxygen", "--mode", "complete", "--T", "3000K"] },
  { name: "species-co2", args: ["species", "CO2", "--T", "25C,500C,1000C"] },
  { name: "species-search", args: ["species", "--search", "meth"] },
  { name: "species-water-ambiguous", args: ["species", "H2O"] },
  { name: "species-database-absent", args: ["species", "CO2", "--database"] },
  { name: "duty-biogas-boiler", args: ["duty", "tests/cli/cases/biogas-boiler.json"] },
  { name: "duty-methanol-reactor", args: ["duty", "tests/cli/cases/methanol-reactor.json", "--unit", "MMBtu/h"] },
  { name: "duty-bad-case", args: ["duty", "tests/cli/cases/bad-case.json"] },
  { name: "duty-missing-file", args: ["duty", "tests/cli/cases/no-such-file.json"] },
  { name: "unknown-command", args: ["burn", "CH4"] },
];

/** Run one case through runCli with captured output; the text kept in its golden file. */
export async function runGolden(c: GoldenCase): Promise<string> {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIO = {
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    readTextFile: (path) => readFileSync(new URL(`../../${path}`, import.meta.url), "utf8"),
    loadDatabase: () => Promise.reject(new Error("not installed")),
    version: "0.0.0-test",
  };
  const code = await runCli(c.args, io);
  return goldenText(c.args, code, out.join(""), err.join(""));
}

/** The golden-file text of one run: the command line, the exit code, stdout and stderr. */
export function goldenText(args: readonly string[], code: number, stdout: string, stderr: string): string {
  const quoted = args.map((a) => (/^[\w.,:%/=+()-]+$/.test(a) ? a : JSON.stringify(a))).join(" ");
  return `$ rxtherm ${quoted}\nexit ${code}\n--- stdout\n${stdout}--- stderr\n${stderr}`;
}

/**
 * Cases that depend on what the host provides rather than on rxtherm: the database is absent in the tests
 * but may be installed beside the built command, so the built-command check skips them.
 */
export const HOST_DEPENDENT = new Set(["species-database-absent"]);

/** The golden file of a case. */
export function goldenFile(c: GoldenCase): URL {
  return new URL(`./golden/${c.name}.txt`, import.meta.url);
}
