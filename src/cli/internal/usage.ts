/**
 * The command line's own failures (a wrong command, option or value) and its exit codes.
 *
 * @module
 */

/** Exit codes of `rxtherm`; documented in docs/cli.md. */
export const EXIT = Object.freeze({
  /** the command ran and printed its result */
  ok: 0,
  /** an unexpected failure inside rxtherm (a bug: please report it with the command line) */
  internal: 1,
  /** a usage error: unknown command or option, missing or extra argument, a value or unit the option does not accept */
  usage: 2,
  /** an input or data error: bad formula or equation, unknown species, data out of range, invalid case file, unreadable file */
  input: 3,
  /** a solver did not converge or could not bracket the solution */
  noConvergence: 4,
});

/** A command-line usage error: exit code 2, with the message printed after the command name. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "UsageError";
  }
}
