'use strict';
// Webpack loader for the files that custom-functions-metadata-plugin scans.
//
// The plugin appends one line per custom function to the end of each scanned file:
//     CustomFunctions.associate("VERSION", version);
// Outside Office (a plain browser, a test page) CustomFunctions does not exist and
// that line would throw while the bundle loads. This loader runs after the plugin's
// own loader and wraps each such line in a typeof guard. It then checks that every
// function the plugin found in this file has a guarded association and that no
// unguarded call is left, so a change in the plugin's output fails the build
// instead of shipping a bundle that breaks without Office.

const path = require('node:path');

const ASSOCIATE_LINE = /^CustomFunctions\.associate\(("(?:[^"\\]|\\.)*"),\s*([A-Za-z_$][\w$]*)\);[ \t]*$/gm;
const UNGUARDED = /^[ \t]*CustomFunctions\.associate\(/m;

/**
 * Wraps each plugin-appended association in a guard.
 * @param {string} source
 * @returns {{ source: string, ids: string[] }}
 */
function guardAssociations(source) {
  const ids = [];
  const guarded = source.replace(ASSOCIATE_LINE, (_line, id, name) => {
    ids.push(JSON.parse(id));
    return `if (typeof CustomFunctions !== "undefined") { CustomFunctions.associate(${id}, ${name}); }`;
  });
  if (UNGUARDED.test(guarded)) {
    throw new Error('an unguarded CustomFunctions.associate call is left after guarding');
  }
  return { source: guarded, ids };
}

/**
 * Ids the metadata plugin expects to be associated in the given file.
 * @param {unknown} generateResult the plugin's result for one input list
 * @param {string} file absolute path
 */
function expectedIds(generateResult, file) {
  if (!generateResult || !Array.isArray(generateResult.associate)) return null;
  return generateResult.associate
    .filter((item) => path.resolve(item.sourceFileName) === path.resolve(file))
    .map((item) => item.id);
}

function guardAssociationsLoader(source) {
  const options = this.getOptions();
  const { source: guarded, ids } = guardAssociations(source);
  const MetadataPlugin = require('custom-functions-metadata-plugin');
  const expected = expectedIds(MetadataPlugin.generateResults[options.metadataInput], this.resourcePath);
  if (expected === null) {
    // The plugin reported errors for this input (it then adds none); its errors fail the build.
    return guarded;
  }
  const missing = expected.filter((id) => !ids.includes(id));
  if (missing.length > 0) {
    throw new Error(
      `${path.relative(process.cwd(), this.resourcePath)}: no guarded association for ${missing.join(', ')}; ` +
        'the format of the lines custom-functions-metadata-plugin appends may have changed',
    );
  }
  return guarded;
}

module.exports = guardAssociationsLoader;
module.exports.guardAssociations = guardAssociations;
module.exports.expectedIds = expectedIds;
