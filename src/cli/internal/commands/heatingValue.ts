/**
 * `rxtherm heating-value <fuel>`: higher and lower heating values per mol, kg and Nm³.
 *
 * @module
 */
import { heatingValue, NORMAL_MOLAR_VOLUME_M3_PER_MOL } from "../../../enthalpy/heatingValue.js";
import { species as lookUp } from "../../../species/species.js";
import { fromJoulePerMol, type SpecificEnergyUnit } from "../../../units.js";
import { optionValue, positionals } from "../args.js";
import { DATABASE_OPTION, readMixture, type Command } from "../command.js";
import { SPECIFIC_ENERGY_UNITS, oneOf } from "../quantity.js";
import { num, short, table } from "../table.js";

const DEFAULT_UNITS: readonly SpecificEnergyUnit[] = ["kJ/mol", "MJ/kg", "MJ/Nm3"];

export const heatingValueCommand: Command = {
  name: "heating-value",
  summary: "higher and lower heating value of a fuel or fuel gas mixture",
  usage: "<fuel> [--unit UNIT]",
  description:
    "Heat of complete combustion at 25 °C with the sign made positive: product water liquid for the higher\n" +
    "(gross) value, vapour for the lower (net) value; C → CO2, S → SO2, N → N2. A mixture is written\n" +
    "key:amount,key:amount (mole fractions or mol; N2, CO2 and other inerts count as zero). Per Nm³ is per\n" +
    "normal cubic metre of ideal gas at 0 °C and 101.325 kPa, for gaseous fuels only.",
  options: [
    { name: "unit", value: "UNIT", help: `one result unit instead of kJ/mol, MJ/kg and MJ/Nm3: ${SPECIFIC_ENERGY_UNITS.join(", ")}` },
    DATABASE_OPTION,
  ],
  examples: ["heating-value CH4", "heating-value CH4:0.6,CO2:0.4 --unit MJ/Nm3", "heating-value n-C8H18(l) --unit Btu/lb"],
  async run(args, ctx) {
    const [text] = positionals("heating-value", args, ["FUEL"]);
    const library = await ctx.library(args);
    const fuel = readMixture(text!, "FUEL");
    const asked = optionValue(args, "unit");
    const units = asked === undefined ? DEFAULT_UNITS : [oneOf(asked, SPECIFIC_ENERGY_UNITS, "--unit")];
    const lib = library ? { library } : {};
    const components = typeof fuel === "string" ? [fuel] : Object.keys(fuel);
    const allGas = components.every((k) => lookUp(k, library).phase === "g");
    const values = (["higher", "lower"] as const).map((basis) => {
      const perMol = heatingValue(fuel, { basis, ...lib });
      const perKg = heatingValue(fuel, { basis, per: "kg", ...lib });
      const perNm3 = allGas ? heatingValue(fuel, { basis, per: "Nm3", ...lib }) : undefined;
      const inUnit = (unit: SpecificEnergyUnit): number | undefined => {
        if (/Nm/.test(unit)) return perNm3 === undefined ? undefined : fromJoulePerMol(perNm3 * NORMAL_MOLAR_VOLUME_M3_PER_MOL, unit);
        if (/\/(g|kg|lb)$/.test(unit)) return fromJoulePerMol(perKg / 1000, unit, { molarMassGPerMol: 1 });
        return fromJoulePerMol(perMol, unit);
      };
      return {
        basis,
        jPerMol: perMol,
        jPerKg: perKg,
        jPerNm3: perNm3 ?? null,
        values: Object.fromEntries(units.map((u) => [u, inUnit(u) ?? null])) as Record<string, number | null>,
      };
    });
    const rows = values.map((v) => [
      v.basis === "higher" ? "higher (HHV, water liquid)" : "lower (LHV, water vapour)",
      ...units.map((u) => {
        const x = v.values[u];
        return x === null || x === undefined ? "n/a (not a gas)" : num(x, 7);
      }),
    ]);
    return {
      text: [
        `fuel: ${typeof fuel === "string" ? fuel : components.map((k) => `${k} ${short((fuel as Record<string, number>)[k]!)}`).join(", ")}`,
        "",
        table(["heating value", ...units], rows, ["left", ...units.map(() => "right" as const)]),
        "",
        "at 25 °C and 1 bar; Nm³ at 0 °C and 101.325 kPa",
      ].join("\n"),
      json: { fuel, heatingValues: values },
    };
  },
};
