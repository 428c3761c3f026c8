// Node ESM consumer of the installed package (run by .ci/package.sh in a scratch project).
import * as rxtherm from "rxtherm";
import * as browser from "rxtherm/browser";
import { check } from "./checks.mjs";

console.log(check(rxtherm, "node esm"));
console.log(check(browser, "node esm, rxtherm/browser"));
const a = Object.keys(rxtherm).sort().join(), b = Object.keys(browser).sort().join();
if (a !== b) throw new Error("rxtherm/browser does not export the same names as rxtherm");
