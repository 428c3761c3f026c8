/**
 * `rxtherm air <fuel> [--excess-air 15%]`: combustion air and flue gas.
 *
 * @module
 */
import { combustion } from "../../../extent/combustion.js";
import type { Flows } from "../../../extent/types.js";
import { molarMass } from "../../../formula/molarMass.js";
import { fromMolPerSecond, toMolPerSecond } from "../../../units.js";
import { optionValue, positionals, type ParsedArgs } from "../args.js";
import { readMixture, type Command } from "../command.js";
import { readFlow, readFraction, readPositive } from "../quantity.js";
import { fields, fixed, num, short, table } from "../table.js";
import { UsageError } from "../usage.js";

export const airCommand: Command = {
  name: "air",
  summary: "combustion air and flue gas (wet and dry analysis) of a fuel at some excess air",
  usage: "<fuel> [--excess-air PERCENT | --equivalence-ratio PHI] [--fuel-flow FLOW]",
  description:
    "Complete combustion by element balance: theoretical O2 = C + H/4 + S - O/2, dry air taken as 21 % O2\n" +
    "and 79 % N2 by volume (as in the flame functions), fuel nitrogen to N2. Prints the air per mol of\n" +
    "fuel and the flue gas with its wet and dry analysis; with --fuel-flow also the flows of fuel, air and\n" +
    "flue gas. A mixture is written key:amount,key:amount. Lean or stoichiometric only (rich mixtures need a\n" +
    "flame calculation: rxtherm flame). Screening values: burner and furnace work follows local codes.",
  options: [
    { name: "excess-air", value: "PERCENT", help: "excess air, 15% or 0.15 (default 0)" },
    { name: "equivalence-ratio", value: "PHI", help: "fuel/air equivalence ratio, 0 < PHI <= 1 (instead of --excess-air)" },
    { name: "fuel-flow", value: "FLOW", help: "fuel flow with unit, e.g. 120Nm3/h, 2kmol/h, 80kg/h (a bare number is mol/s)" },
  ],
  examples: ["air CH4 --excess-air 15%", "air CH4:0.6,CO2:0.4 --excess-air 20% --fuel-flow 120Nm3/h"],
  run(args) {
    const [text] = positionals("air", args, ["FUEL"]);
    const fuel = normalised(readMixture(text!, "FUEL"));
    const r = combustion({ fuel, ...airOption(args) });
    const keys = Object.keys(r.flueGas).sort((a, b) => r.flueGas[b]! - r.flueGas[a]!);
    const lines = [
      fields([
        ["fuel", Object.entries(fuel).map(([k, x]) => (Object.keys(fuel).length === 1 ? k : `${k} ${short(x)}`)).join(", ")],
        ["excess air", `${fixed(100 * r.excessAir, 2)} %  (equivalence ratio ${num(r.equivalenceRatio, 6)})`],
        ["theoretical O2", `${num(r.theoreticalO2, 6)} mol/mol fuel`],
        ["theoretical air", `${num(r.theoreticalAir, 6)} mol/mol fuel  (${num(r.theoreticalAirToFuelMass, 6)} kg/kg)`],
        ["air fed", `${num(r.air, 6)} mol/mol fuel  (${num(r.airToFuelMass, 6)} kg/kg)`],
        ["flue gas", `${num(r.flueGasTotal, 6)} mol/mol fuel wet, ${num(r.dryFlueGasTotal, 6)} dry`],
      ]),
      "",
      table(
        ["flue gas", "mol/mol fuel", "wet mol %", "dry mol %"],
        keys.map((k) => [k, num(r.flueGas[k]!, 6), fixed(100 * r.wet[k]!, 3), r.dry[k] === undefined ? "" : fixed(100 * r.dry[k]!, 3)]),
        ["left", "right", "right", "right"],
      ),
    ];
    let flows: Record<string, Record<string, number>> | undefined;
    const flowText = optionValue(args, "fuel-flow");
    if (flowText !== undefined) {
      const f = readFlow(flowText, "--fuel-flow");
      // g per mol of fuel from combustion itself, which also reads fuel names ("methane")
      const fuelMolarMass = r.fuelMassKg * 1000;
      const fuelMolPerS = toMolPerSecond({ ...f, molarMassGPerMol: fuelMolarMass });
      const dryFlue = Object.fromEntries(keys.filter((k) => r.dry[k] !== undefined).map((k) => [k, r.flueGas[k]!]));
      const streams: [string, Flows][] = [
        ["fuel", fuel], ["air", r.airFlows], ["flue gas (wet)", r.flueGas], ["flue gas (dry)", dryFlue],
      ];
      flows = Object.fromEntries(streams.map(([name, perMolFuel]) => {
        const molPerS = Object.values(perMolFuel).reduce((s, x) => s + x, 0) * fuelMolPerS;
        const gPerMolFuel = name === "fuel" ? fuelMolarMass : Object.entries(perMolFuel).reduce((s, [k, x]) => s + x * molarMass(k), 0);
        const kgPerH = gPerMolFuel * fuelMolPerS * 3.6;
        return [name, { molPerS, kmolPerH: fromMolPerSecond(molPerS, "kmol/h"), nm3PerH: fromMolPerSecond(molPerS, "Nm3/h"), kgPerH }];
      }));
      lines.push(
        "",
        table(
          ["stream", "kmol/h", "Nm³/h", "kg/h"],
          Object.entries(flows).map(([name, v]) => [name, num(v.kmolPerH!, 6), num(v.nm3PerH!, 6), num(v.kgPerH!, 6)]),
          ["left", "right", "right", "right"],
        ),
        "Nm³ at 0 °C and 101.325 kPa (ideal gas)",
      );
    }
    return { text: lines.join("\n"), json: { fuel, ...r, ...(flows ? { flows } : {}) } };
  },
};

/** A fuel as mole fractions summing to 1 (a single key is 1 mol). */
export function normalised(fuel: string | Flows): Flows {
  if (typeof fuel === "string") return { [fuel]: 1 };
  const total = Object.values(fuel).reduce((s, x) => s + x, 0);
  return Object.fromEntries(Object.entries(fuel).map(([k, x]) => [k, x / total]));
}

/** `--excess-air` or `--equivalence-ratio` (not both). */
export function airOption(args: ParsedArgs): { excessAir?: number; equivalenceRatio?: number } {
  const ea = optionValue(args, "excess-air");
  const phi = optionValue(args, "equivalence-ratio");
  if (ea !== undefined && phi !== undefined) throw new UsageError("give --excess-air or --equivalence-ratio, not both");
  if (ea !== undefined) return { excessAir: readFraction(ea, "--excess-air") };
  if (phi !== undefined) return { equivalenceRatio: readPositive(phi, "--equivalence-ratio") };
  return {};
}
