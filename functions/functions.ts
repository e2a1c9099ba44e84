// The Excel-facing surface of Mooring: every custom function the add-in registers.
//
// How the metadata is made. At build time custom-functions-metadata-plugin reads the
// JSDoc of the files listed in FUNCTION_SOURCES (webpack.config.js; today only this
// file) and writes functions.json from it: each `@customfunction` becomes one entry,
// its id and name from the tag, its parameter and result types from the TypeScript
// signature. The plugin then appends `CustomFunctions.associate("ID", name)` for each
// entry to the end of the same file, naming the function as declared here, and the
// build wraps those calls in a guard so the bundle also loads where Office is absent.
//
// So the JSDoc and the declaration must sit in a scanned file, but the work need not:
// each function here is a thin, documented wrapper whose body calls into its own
// module (./version.ts for MOOR.VERSION; the engine in addin/ for the analyses).
// To add a function: write its implementation in a module, then declare a wrapper
// below with `@customfunction ID`, a description, `@param` lines, `@returns` and
// `@helpurl https://localhost:3000/docs/functions.md#<anchor>`. Only a new file
// holding `@customfunction` tags needs adding to FUNCTION_SOURCES.

// Types for CustomFunctions.Error, .Invocation and friends (tsconfig lists only node and office-js).
/// <reference types="custom-functions-runtime" />

import { addinVersion } from './version';

/**
 * Returns the version of the Mooring add-in that is running.
 * @customfunction VERSION
 * @helpurl https://localhost:3000/docs/functions.md#version
 * @returns The add-in version, such as 0.1.0.
 */
export function version(): string {
  return addinVersion();
}
