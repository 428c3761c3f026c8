/**
 * Types of the command line: what {@link runCli} needs from its host.
 *
 * @module
 */

/**
 * What the command line needs from its host (Node in `bin.ts`; a test passes its own).
 *
 * @category Command line
 */
export interface CliIO {
  /** Write text to standard output. */
  stdout(text: string): void;
  /** Write text to standard error. */
  stderr(text: string): void;
  /** Read a text file (a case file), throwing when it cannot be read. */
  readTextFile(path: string): string;
  /**
   * Load the opt-in species database module (`rxtherm/database`, exporting `speciesDatabase()`), for
   * `--database`. Absent, or rejecting, when the database is not installed: the command then fails
   * with a clear message and exit code 3.
   */
  loadDatabase?(): Promise<unknown>;
  /** Version printed by `rxtherm --version`. */
  readonly version?: string;
}
