/**
 * `rxtherm/database`: the opt-in species database, a separate entry point so that the main entry
 * (`rxtherm`) neither bundles nor loads its data.
 *
 * @module
 */
export { speciesDatabase } from "./speciesDatabase.js";
export type { SpeciesDatabaseOptions } from "./speciesDatabase.js";
