// Deno consumer of the installed package, by bare name (a project with package.json and node_modules;
// run by .ci/package.sh). No permission flags needed.
// @ts-nocheck -- run by Deno in a scratch project, outside the project's tsc program
import * as rxtherm from "rxtherm";
import { molarMass as fromBrowserBundle } from "rxtherm/browser";
import { check } from "./checks.mjs";

console.log(check(rxtherm, `deno ${Deno.version.deno}, "rxtherm"`));
if (fromBrowserBundle("CO2") !== rxtherm.molarMass("CO2")) throw new Error("deno: rxtherm/browser disagrees");
