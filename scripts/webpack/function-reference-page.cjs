'use strict';
// Emits docs/functions.html, the function reference as a page a browser shows, where the help
// links in functions.json point (base-url.cjs). It is made by scripts/make-function-docs.mjs from
// the functions.json of this very build, so the page, IntelliSense and docs/functions.md come from
// one source. The build fails if a help link's #anchor names no heading of the page.

const path = require('node:path');
const { pathToFileURL } = require('node:url');
const { Compilation, WebpackError, sources } = require('webpack');
const { REFERENCE_PAGE } = require('./base-url.cjs');

const GENERATOR = path.join(__dirname, '..', 'make-function-docs.mjs');

class FunctionReferencePagePlugin {
  /** @param {{ metadata?: string, filename?: string }} [options] */
  constructor(options = {}) {
    this.metadata = options.metadata ?? 'functions.json';
    this.filename = options.filename ?? REFERENCE_PAGE;
  }

  apply(compiler) {
    const name = 'FunctionReferencePagePlugin';
    compiler.hooks.thisCompilation.tap(name, (compilation) => {
      // After FunctionsMetadataPostProcessPlugin (same stage, registered before this plugin).
      compilation.hooks.processAssets.tapPromise({ name, stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONS }, async () => {
        const asset = compilation.getAsset(this.metadata);
        if (!asset) return; // the metadata plugins report that error
        try {
          const { manifestNamespace, renderFunctionDocsPage } = await import(pathToFileURL(GENERATOR).href);
          const metadata = JSON.parse(asset.source.source().toString());
          const { page, ids } = renderFunctionDocsPage(metadata, manifestNamespace());
          const missing = metadata.functions
            .map((fn) => ({ name: fn.name, anchor: String(fn.helpUrl ?? '').split('#')[1] }))
            .filter(({ anchor }) => !ids.includes(anchor));
          if (missing.length > 0) {
            throw new Error(`${this.filename} has no heading for the help link of ${missing.map((m) => m.name).join(', ')}`);
          }
          // Marked as minimized so the production minimizer leaves the page as written: readable source.
          compilation.emitAsset(this.filename, new sources.RawSource(page), { minimized: true });
        } catch (error) {
          compilation.errors.push(new WebpackError(`${this.filename}: ${error.message}`));
        }
      });
    });
  }
}

module.exports = { FunctionReferencePagePlugin };
