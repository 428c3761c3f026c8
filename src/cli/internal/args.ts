/**
 * A small argument parser: positionals, `--name value`, `--name=value`, flags, and `--` to end options.
 *
 * @module
 */
import { UsageError } from "./usage.js";

/** One option a command accepts. */
export interface OptionSpec {
  /** Name without the dashes, e.g. `"excess-air"`. */
  readonly name: string;
  /** Placeholder of its value in the help text, e.g. `"PERCENT"`; absent for a flag. */
  readonly value?: string;
  /** One-line help. */
  readonly help: string;
}

/** The parsed command line of one command. */
export interface ParsedArgs {
  readonly positionals: readonly string[];
  /** Option name → its value (`true` for a flag). */
  readonly options: ReadonlyMap<string, string | true>;
}

/**
 * Parse `argv` (without the command name) against the options a command accepts.
 * `-h` is `--help`. A value may start with `-` (`--T -40C`). Each option may appear once.
 */
export function parseArgs(command: string, argv: readonly string[], specs: readonly OptionSpec[]): ParsedArgs {
  const byName = new Map(specs.map((s) => [s.name, s]));
  const positionals: string[] = [];
  const options = new Map<string, string | true>();
  let onlyPositionals = false;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (onlyPositionals || !arg.startsWith("-") || arg === "-" || /^-\d|^-\.\d/.test(arg)) {
      positionals.push(arg);
      continue;
    }
    if (arg === "--") {
      onlyPositionals = true;
      continue;
    }
    const eq = arg.indexOf("=");
    let name = arg.startsWith("--") ? arg.slice(2, eq > 0 ? eq : undefined) : arg.slice(1);
    if (name === "h") name = "help";
    const spec = byName.get(name);
    if (spec === undefined) {
      throw new UsageError(`unknown option ${arg.slice(0, eq > 0 ? eq : undefined)} (see rxtherm ${command} --help)`);
    }
    if (options.has(name)) throw new UsageError(`option --${name} is given twice`);
    if (spec.value === undefined) {
      if (eq > 0) throw new UsageError(`option --${name} takes no value`);
      options.set(name, true);
    } else if (eq > 0) {
      options.set(name, arg.slice(eq + 1));
    } else {
      const next = argv[i + 1];
      if (next === undefined) throw new UsageError(`option --${name} needs a value ${spec.value}`);
      options.set(name, next);
      i++;
    }
  }
  return { positionals, options };
}

/** The value of a value-taking option, or undefined when absent. */
export function optionValue(args: ParsedArgs, name: string): string | undefined {
  const v = args.options.get(name);
  return typeof v === "string" ? v : undefined;
}

/** True when a flag was given. */
export function flag(args: ParsedArgs, name: string): boolean {
  return args.options.get(name) === true;
}

/** Exactly `count` positionals, or a usage error naming what is missing or extra. */
export function positionals(command: string, args: ParsedArgs, names: readonly string[]): string[] {
  const p = args.positionals;
  if (p.length < names.length) {
    throw new UsageError(`missing ${names.slice(p.length).join(" and ")} (see rxtherm ${command} --help)`);
  }
  if (p.length > names.length) {
    throw new UsageError(`unexpected argument "${p[names.length]}" (quote an equation or mixture that contains spaces)`);
  }
  return [...p];
}
