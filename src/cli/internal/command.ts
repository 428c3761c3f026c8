/**
 * What every command provides, and the options and helpers they share.
 *
 * @module
 */
import type { Library } from "../../species/types.js";
import type { CliIO } from "../types.js";
import type { OptionSpec, ParsedArgs } from "./args.js";
import { flag } from "./args.js";
import { UsageError } from "./usage.js";
import { RxthermError } from "../../errors.js";
import type { Flows } from "../../extent/types.js";
import { readPositive } from "./quantity.js";

/** Output of a command: the readable text and the JSON value for `--json`. */
export interface CommandOutput {
  readonly text: string;
  readonly json: unknown;
}

/** Context given to a command. */
export interface CommandContext {
  readonly io: CliIO;
  /** The library to use: the database with `--database`, else undefined (the built-in set). */
  library(args: ParsedArgs): Promise<Library | undefined>;
}

/** One command of `rxtherm`. */
export interface Command {
  readonly name: string;
  /** One line for the command list. */
  readonly summary: string;
  /** Usage line after `rxtherm <name>`. */
  readonly usage: string;
  /** Paragraphs of help text. */
  readonly description: string;
  /** Options of this command (the shared `--json` and `--help` are added by {@link withCommonOptions}). */
  readonly options: readonly OptionSpec[];
  /** Example command lines (without `rxtherm `). */
  readonly examples: readonly string[];
  run(args: ParsedArgs, ctx: CommandContext): Promise<CommandOutput> | CommandOutput;
}

/** `--json` and `--help`, accepted by every command. */
export const COMMON_OPTIONS: readonly OptionSpec[] = [
  { name: "json", help: "print the result as JSON (SI units plus the units asked for) instead of a table" },
  { name: "help", help: "show this help" },
];

/** `--database`, for the commands that look species up. */
export const DATABASE_OPTION: OptionSpec = {
  name: "database", help: "look species up in the opt-in species database (rxtherm/database) instead of the built-in set",
};

/** The options a command accepts, its own plus the common ones. */
export function withCommonOptions(command: Command): readonly OptionSpec[] {
  return [...command.options, ...COMMON_OPTIONS];
}

/** The library for this command line: the database with `--database`. */
export async function libraryFor(io: CliIO, args: ParsedArgs): Promise<Library | undefined> {
  if (!flag(args, "database")) return undefined;
  let mod: unknown;
  try {
    if (io.loadDatabase === undefined) throw new Error("no loader");
    mod = await io.loadDatabase();
  } catch {
    mod = undefined;
  }
  const make = (mod as { speciesDatabase?: unknown } | undefined)?.speciesDatabase;
  if (typeof make !== "function") {
    throw new RxthermError(
      "MISSING_DATA",
      "--database: the species database (rxtherm/database) is not part of this installation; run without --database to use the built-in species",
      {},
    );
  }
  return (make as () => Library)();
}

/**
 * A fuel or mixture as typed: one species (`CH4`, `CH4(g)`, `methane`) or `key:amount` pairs separated by
 * commas (`CH4:0.9,C2H6:0.06,N2:0.04`; amounts are mole fractions or mol, normalised by the library where it
 * matters).
 */
export function readMixture(text: string, what: string): string | Flows {
  const t = text.trim();
  if (t === "") throw new UsageError(`${what} is empty`);
  if (!t.includes(":") && !t.includes(",")) return t;
  const flows: Flows = {};
  for (const part of t.split(",")) {
    const i = part.lastIndexOf(":");
    if (i <= 0) throw new UsageError(`${what}: write each component as key:amount (e.g. CH4:0.9,N2:0.1), got "${part.trim()}"`);
    const key = part.slice(0, i).trim();
    if (key === "__proto__" || key === "constructor" || key === "prototype") throw new UsageError(`${what}: "${key}" is not a species key`);
    if (Object.hasOwn(flows, key)) throw new UsageError(`${what}: ${key} is listed twice`);
    flows[key] = readPositive(part.slice(i + 1), `${what}: the amount of ${key}`);
  }
  return flows;
}
