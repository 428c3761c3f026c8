/**
 * Node entry of the `rxtherm` command (built to `dist/cli.js` with a `#!/usr/bin/env node` line). The only
 * file of the project that imports `node:` modules besides the tests.
 *
 * @module
 */
import { readFileSync } from "node:fs";
import { runCli } from "./runCli.js";

declare const RXTHERM_VERSION: string | undefined;

const version = typeof RXTHERM_VERSION === "string" ? RXTHERM_VERSION : undefined;

runCli(process.argv.slice(2), {
  stdout: (text) => void process.stdout.write(text),
  stderr: (text) => void process.stderr.write(text),
  readTextFile: (path) => readFileSync(path, "utf8"),
  // The opt-in species database is a separate entry built beside this file (dist/database.js); a
  // build without it makes --database fail with a clear message (exit code 3).
  loadDatabase: () => import(/* @vite-ignore */ new URL("./database.js", import.meta.url).href),
  ...(version ? { version } : {}),
}).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`rxtherm: internal error: ${String(e)}\n`);
    process.exitCode = 1;
  },
);
