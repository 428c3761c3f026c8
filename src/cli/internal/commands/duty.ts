/**
 * `rxtherm duty <case.json>`: heat duty of a unit from a case file.
 *
 * @module
 */
import { heatDuty } from "../../../energy/heatDuty.js";
import { totalFlow } from "../../../extent/streams.js";
import { fromKelvin, fromMolPerSecond, fromWatt, type PowerUnit } from "../../../units.js";
import { caseFileJsonSchema, readCaseFile } from "../../caseFile.js";
import { flag, optionValue, positionals } from "../args.js";
import { DATABASE_OPTION, type Command } from "../command.js";
import { POWER_UNITS, oneOf } from "../quantity.js";
import { fields, fixed, num, table } from "../table.js";
import { RxthermError } from "../../../errors.js";

export const dutyCommand: Command = {
  name: "duty",
  summary: "heat duty of a reactor, heater or burner from a JSON case file",
  usage: "<case.json> [--unit UNIT] | --schema",
  description:
    "Reads a case file (streams in and out with temperatures, flows and units; optional reactions and\n" +
    "extents), checks it against the published JSON Schema (docs/case-file.schema.json) and the element\n" +
    "balance, and prints the duty by the heat-of-formation and heat-of-reaction methods with the breakdown:\n" +
    "sensible heat of the feed, heat of reaction and latent heat at 25 °C, sensible heat of the products.\n" +
    "Positive duty is heat added, negative heat removed. Errors name the JSON path of the bad field.\n" +
    "--schema prints the JSON Schema.",
  options: [
    { name: "unit", value: "UNIT", help: `duty unit: ${POWER_UNITS.join(", ")} (default: the file's dutyUnit, else kW)` },
    { name: "schema", help: "print the JSON Schema of case files and exit" },
    DATABASE_OPTION,
  ],
  examples: ["duty boiler.json", "duty boiler.json --unit MMBtu/h --json", "duty --schema > case-file.schema.json"],
  async run(args, ctx) {
    if (flag(args, "schema")) {
      positionals("duty", args, []);
      const schema = caseFileJsonSchema();
      return { text: JSON.stringify(schema, null, 2), json: schema };
    }
    const [file] = positionals("duty", args, ["CASE_FILE"]);
    const library = await ctx.library(args);
    let text: string;
    try {
      text = ctx.io.readTextFile(file!);
    } catch (e) {
      const code = (e as { code?: unknown }).code;
      const reason = code === "ENOENT" ? "no such file" : typeof code === "string" ? code : (e as Error).message;
      throw new RxthermError("INVALID_CASE", `cannot read the case file ${file} (${reason})`, {
        issues: [{ path: "$", message: "file not readable" }],
      });
    }
    const c = readCaseFile(text, library);
    const asked = optionValue(args, "unit");
    const unit: PowerUnit = asked === undefined ? c.dutyUnit : oneOf(asked, POWER_UNITS, "--unit");
    const r = heatDuty(c.input, c.options);
    const q = (w: number) => num(fromWatt(w, unit), 7);
    const streamRows = (side: "inlet" | "outlet") => {
      return c.input[side].map((s, i) => [
        side, c.names[side][i]!, fixed(fromKelvin(s.T, "C"), 2), num(fromMolPerSecond(totalFlow(s.flows), "kmol/h"), 6),
        q(r.streams[side][i]!.sensible),
      ]);
    };
    const lines = [
      ...(c.title ? [c.title, ""] : []),
      table(
        ["stream", "name", "T (°C)", "kmol/h", `sensible heat above 25 °C (${unit})`],
        [...streamRows("inlet"), ...streamRows("outlet")],
        ["left", "left", "right", "right", "right"],
      ),
      "",
      fields([
        ["feed to 25 °C", `${q(-r.sensibleIn)} ${unit}`],
        ["reaction at 25 °C", `${q(r.reactionHeat)} ${unit}`],
        ["latent heat at 25 °C", `${q(r.latentHeat)} ${unit}`],
        ["products to outlet T", `${q(r.sensibleOut)} ${unit}`],
        ["duty", `${q(r.duty)} ${unit}  (${r.duty >= 0 ? "heat added" : "heat removed"}; ${r.method} method)`],
        ["check", `formation method ${q(r.formation)}, reaction method ${q(r.reaction)} ${unit}`],
      ]),
    ];
    if (r.phaseChanges.length > 0) {
      lines.push("", table(
        ["phase change", "kmol/h", `latent heat (${unit})`],
        r.phaseChanges.map((p) => [`${p.from} → ${p.to}`, num(fromMolPerSecond(p.amount, "kmol/h"), 6), q(p.heat)]),
        ["left", "right", "right"],
      ));
    }
    return {
      text: lines.join("\n"),
      json: { title: c.title, unit, dutyInUnit: fromWatt(r.duty, unit), result: r, input: { inlet: c.input.inlet, outlet: c.input.outlet } },
    };
  },
};
