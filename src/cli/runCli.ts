/**
 * The command line `rxtherm`, as a function: parse the arguments, run the command, print a table or
 * JSON, and return the exit code. `bin.ts` calls it with Node's streams; tests call it directly.
 *
 * @module
 */
import { RxthermError } from "../errors.js";
import { parseArgs, flag } from "./internal/args.js";
import { libraryFor, withCommonOptions, type Command, type CommandContext } from "./internal/command.js";
import { airCommand } from "./internal/commands/air.js";
import { balanceCommand } from "./internal/commands/balance.js";
import { dutyCommand } from "./internal/commands/duty.js";
import { enthalpyCommand } from "./internal/commands/enthalpy.js";
import { flameCommand } from "./internal/commands/flame.js";
import { heatingValueCommand } from "./internal/commands/heatingValue.js";
import { massCommand } from "./internal/commands/mass.js";
import { speciesCommand } from "./internal/commands/species.js";
import { EXIT, UsageError } from "./internal/usage.js";
import type { CliIO } from "./types.js";

const COMMANDS: readonly Command[] = [
  balanceCommand, massCommand, enthalpyCommand, heatingValueCommand, airCommand, flameCommand, speciesCommand, dutyCommand,
];

/**
 * Exit codes of {@link runCli}: `ok` 0, `internal` 1 (a bug), `usage` 2 (unknown command or option, missing
 * argument, a value or unit an option does not accept), `input` 3 (bad formula or equation, unknown species,
 * data out of range, invalid or unreadable case file, database not installed), `noConvergence` 4
 * (`NO_CONVERGENCE`, `NO_BRACKET`).
 *
 * @category Command line
 * @example
 * CLI_EXIT_CODES.usage // => 2
 */
export const CLI_EXIT_CODES = EXIT;

/**
 * Run the `rxtherm` command line on `argv` (the arguments after the program name) and return its exit code.
 *
 * Output goes through `io`: the result as an aligned table (or JSON with `--json`) on stdout, errors on
 * stderr as `rxtherm <command>: <message>`, or `rxtherm <command> [CODE]: <message>` for an error of the
 * library (its {@link RxthermError} code; for case files each bad field's JSON path on its own line). Nothing is printed to stdout when a command fails.
 *
 * @param argv - arguments, e.g. `["balance", "C3H8 + O2 -> CO2 + H2O"]`
 * @param io - standard output and error, file reading, the optional database loader and the version
 * @returns the exit code, see {@link CLI_EXIT_CODES}
 * @category Command line
 * @example
 * const out: string[] = [];
 * await runCli(["balance", "C3H8 + O2 -> CO2 + H2O", "--json"], { stdout: (t) => out.push(t), stderr: () => {}, readTextFile: () => "" });
 * // => 0, and JSON.parse(out.join("")).equation === "C3H8 + 5 O2 -> 3 CO2 + 4 H2O"
 */
export async function runCli(argv: readonly string[], io: CliIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === "--help" || name === "-h" || name === "help") {
    const topic = name === "help" ? rest[0] : undefined;
    const command = topic === undefined ? undefined : COMMANDS.find((c) => c.name === topic);
    if (topic !== undefined && command === undefined) return usageFailure(io, "rxtherm", `unknown command "${topic}"`);
    // no command at all is a usage error: the help goes to stderr with exit code 2
    if (name === undefined) {
      io.stderr(mainHelp());
      return EXIT.usage;
    }
    io.stdout(command ? commandHelp(command) : mainHelp());
    return EXIT.ok;
  }
  if (name === "--version" || name === "-V") {
    io.stdout(`rxtherm ${io.version ?? "(version unknown)"}\n`);
    return EXIT.ok;
  }
  const command = COMMANDS.find((c) => c.name === name);
  if (command === undefined) {
    return usageFailure(io, "rxtherm", `unknown command "${name}"; commands: ${COMMANDS.map((c) => c.name).join(", ")}`);
  }
  const label = `rxtherm ${command.name}`;
  try {
    const args = parseArgs(command.name, rest, withCommonOptions(command));
    if (flag(args, "help")) {
      io.stdout(commandHelp(command));
      return EXIT.ok;
    }
    const ctx: CommandContext = { io, library: (a) => libraryFor(io, a) };
    const out = await command.run(args, ctx);
    io.stdout(flag(args, "json") ? `${JSON.stringify(out.json, null, 2)}\n` : `${out.text}\n`);
    return EXIT.ok;
  } catch (e) {
    if (e instanceof UsageError) return usageFailure(io, label, e.message);
    if (e instanceof RxthermError) {
      const message = e.message.replace(/^\[rxtherm\] /, "");
      io.stderr(`${label} [${e.code}]: ${message}\n`);
      return e.code === "NO_CONVERGENCE" || e.code === "NO_BRACKET" ? EXIT.noConvergence : EXIT.input;
    }
    io.stderr(`${label}: internal error: ${e instanceof Error ? e.stack ?? e.message : String(e)}\nplease report this with the command line that caused it\n`);
    return EXIT.internal;
  }
}

function usageFailure(io: CliIO, label: string, message: string): number {
  io.stderr(`${label}: ${message}\n`);
  return EXIT.usage;
}

function mainHelp(): string {
  const w = Math.max(...COMMANDS.map((c) => c.name.length));
  return [
    "rxtherm — reaction thermochemistry on the command line",
    "",
    "Usage: rxtherm <command> [arguments] [options]",
    "",
    "Commands:",
    ...COMMANDS.map((c) => `  ${c.name.padEnd(w)}  ${c.summary}`),
    "",
    "Options of every command:",
    "  --json       print the result as JSON instead of a table",
    "  --help, -h   show the help of the command",
    "",
    "Temperatures and pressures take units: 25C, 77F, 298.15K, 2bar, 1atm, 30psi (a bare number is K or Pa);",
    "flows: 120Nm3/h, 2kmol/h, 80kg/h, 5lbmol/h; fractions: 15% or 0.15.",
    "",
    "Exit codes: 0 done, 2 usage error, 3 input or data error, 4 no convergence, 1 internal error.",
    "",
    "Examples:",
    '  rxtherm balance "C3H8 + O2 -> CO2 + H2O"',
    "  rxtherm mass CuSO4.5H2O",
    "  rxtherm flame CH4 --excess-air 15%",
    "",
    "rxtherm <command> --help shows a command's options; rxtherm --version the version.",
    "Screening values from ideal-gas standard-state data: follow local codes and licensed engineering practice.",
    "",
  ].join("\n");
}

function commandHelp(command: Command): string {
  const options = withCommonOptions(command);
  const left = options.map((o) => `--${o.name}${o.value ? ` ${o.value}` : ""}${o.name === "help" ? ", -h" : ""}`);
  const w = Math.max(...left.map((l) => l.length));
  return [
    `Usage: rxtherm ${command.name} ${command.usage}`.trimEnd(),
    "",
    command.summary.charAt(0).toUpperCase() + command.summary.slice(1) + ".",
    "",
    command.description,
    "",
    "Options:",
    ...options.map((o, i) => `  ${left[i]!.padEnd(w)}  ${o.help}`),
    "",
    "Examples:",
    ...command.examples.map((e) => `  rxtherm ${e}`),
    "",
  ].join("\n");
}
