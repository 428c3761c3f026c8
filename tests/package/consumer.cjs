// Node CommonJS consumer of the installed package (run by .ci/package.sh in a scratch project).
const rxtherm = require("rxtherm");

import("./checks.mjs").then(({ check }) => console.log(check(rxtherm, "node commonjs")));
