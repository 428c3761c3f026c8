// Type-checked by `deno check` in a scratch project with the packed package installed (.ci/package.sh):
// Deno picks up the declarations from package.json "exports" → "types".
import { adiabaticFlameTemperature, molarMass, RxthermError, type AdiabaticFlameResult, type Formula } from "rxtherm";
import { parseFormula } from "rxtherm/browser";

const flame: AdiabaticFlameResult = adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 0.9 });
const f: Formula = parseFormula("CH4");
const m: number = molarMass(f);
const e: RxthermError | undefined = undefined;
console.log(flame.T.toFixed(0), m.toFixed(3), e);
