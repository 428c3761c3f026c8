// Deno consumer of the package through the npm: specifier (run by .ci/package.sh in a scratch project,
// where Deno resolves it from node_modules; elsewhere Deno fetches it from the npm registry).
// @ts-nocheck -- run by Deno in a scratch project, outside the project's tsc program
import * as rxtherm from "npm:rxtherm";
import { check } from "./checks.mjs";

console.log(check(rxtherm, `deno ${Deno.version.deno}, "npm:rxtherm"`));
