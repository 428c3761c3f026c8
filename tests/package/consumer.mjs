// Node ESM consumer of the installed package (run by .ci/package.sh in a scratch project).
import * as rxtherm from "rxtherm";
import * as browser from "rxtherm/browser";
import { check } from "./checks.mjs";

console.log(check(rxtherm, "node esm"));
console.log(check(browser, "node esm, rxtherm/browser"));
const a = Object.keys(rxtherm).sort().join(), b = Object.keys(browser).sort().join();
if (a !== b) throw new Error("rxtherm/browser does not export the same names as rxtherm");

// The species-data schemas come from the zod mini copy inside the dist; a user's own zod (the package's
// dependency, installed beside it) composes them, reports our paths and reads our descriptions.
const { z } = await import("zod");
const mine = z.object({ ranges: z.array(rxtherm.cpRangeSchema) });
const bad = mine.safeParse({ ranges: [{ TminK: 300, TmaxK: 400, cp: { form: "constant", cpJPerMolK: "29" } }] });
if (bad.success || bad.error.issues[0].path.join(".") !== "ranges.0.cp.cpJPerMolK") throw new Error("a user's zod schema built from cpRangeSchema did not report our path");
if (!JSON.stringify(z.toJSONSchema(z.array(rxtherm.transitionSchema))).includes("transition enthalpy, kJ/mol")) {
  throw new Error("a user's z.toJSONSchema lost the description of transitionSchema");
}
console.log("node esm: the schemas compose with the user's zod");
