/**
 * `npm run data-quality`: write docs/species-data-quality.md from the built-in data.
 */
import { writeFileSync } from "node:fs";
import { renderSpeciesDataQuality } from "./speciesDataQuality.js";

const path = new URL("../species-data-quality.md", import.meta.url);
writeFileSync(path, renderSpeciesDataQuality());
console.log(`wrote ${path.pathname}`);
