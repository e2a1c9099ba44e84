// Mooring build: two named configurations.
//
//   cli    addin/cli/main.ts            -> dist/cli/mooring.js   (Node, executable, dependencies bundled)
//   addin  functions/ and taskpane/     -> dist/                 (the Excel add-in, served as static files)
//
//   npm run build                       both, production, for the development server (https://localhost:3000/)
//   npm run build -- --env base=https://host.example/mooring/
//                                       the same for a real host: dist/manifest.xml and the help links in
//                                       dist/functions.json point at that base (README, "Hosting Mooring for a team")
//   ... --env outDir=/some/folder       write there instead of dist/ (the build tests use a folder of their own)
//   npm run build:cli                   cli only (--config-name cli)
//   npm run bench                       the benchmark runner (--env bench --config-name bench) -> dist/bench/
//   npm test                            typecheck, this build, then vitest (tests read dist/)
//   npm start                           webpack serve --config-name addin on https://localhost:3000
//
// The manifest (manifest/manifest.xml) names the add-in files by their built names
// (taskpane.html, functions.js, functions.json, assets/icon-*.png) under
// https://localhost:3000/; keep those names stable. The build moves those URLs, and the
// JSDoc help links, to the base it is given (scripts/webpack/base-url.cjs); the pages use
// relative paths. The help links open docs/functions.html, the function reference the build
// generates (scripts/webpack/function-reference-page.cjs). Type errors are reported by
// `npm run typecheck` (tsc --noEmit), not by the bundler: ts-loader only transpiles.

'use strict';

const path = require('node:path');
const fs = require('node:fs');
const webpack = require('webpack');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const { FunctionsMetadataPostProcessPlugin } = require('./scripts/webpack/functions-metadata.cjs');
const { FunctionReferencePagePlugin } = require('./scripts/webpack/function-reference-page.cjs');
const { DEV_BASE, checkBase, rewriteManifest } = require('./scripts/webpack/base-url.cjs');

const ROOT = __dirname;
const DIST = path.join(ROOT, 'dist');
const DEV_SERVER_PORT = 3000;

/**
 * Files whose JSDoc `@customfunction` tags make functions.json. Each is also part of
 * the functions bundle, and the metadata plugin appends the CustomFunctions.associate
 * calls for its functions to that same file (see functions/functions.ts).
 */
const FUNCTION_SOURCES = [path.join(ROOT, 'functions', 'functions.ts'), path.join(ROOT, 'functions', 'path-functions.ts'), path.join(ROOT, 'functions', 'gls-functions.ts'), path.join(ROOT, 'functions', 'long-run-functions.ts')];

/** Built file names the manifest points at. */
const ADDIN_FILES = {
  pane: 'taskpane.html',
  functionsPage: 'functions.html',
  functionsScript: 'functions.js',
  functionsMetadata: 'functions.json',
};

const typeScriptRule = {
  test: /\.ts$/,
  exclude: /node_modules/,
  use: {
    loader: 'ts-loader',
    options: {
      configFile: path.join(ROOT, 'tsconfig.json'),
      transpileOnly: true,
      compilerOptions: { noEmit: false, sourceMap: true },
    },
  },
};

const resolve = {
  extensions: ['.ts', '.js', '.json'],
  // Allow `import './x.js'` to find x.ts as well as the extensionless form.
  extensionAlias: { '.js': ['.ts', '.js'] },
};

/** Sets the executable bit on an emitted file (the CLI, run through its #! line). */
class ExecutableBitPlugin {
  constructor(filename) {
    this.filename = filename;
  }

  apply(compiler) {
    compiler.hooks.afterEmit.tapPromise('ExecutableBitPlugin', async (compilation) => {
      const file = path.join(compilation.outputOptions.path, this.filename);
      if (fs.existsSync(file)) await fs.promises.chmod(file, 0o755);
    });
  }
}

/**
 * The folder a build writes into: dist/, or --env outDir. A folder of one's own is cleaned by the
 * build, so it must be new, empty, or an earlier Mooring build (it holds manifest.xml).
 */
function outputFolder(outDir) {
  if (outDir === undefined) return DIST;
  if (typeof outDir !== 'string' || outDir.trim() === '') {
    throw new Error('--env outDir needs a folder, for example --env outDir=build/mooring');
  }
  const folder = path.resolve(outDir);
  if (fs.existsSync(folder)) {
    const entries = fs.readdirSync(folder);
    if (entries.length > 0 && !entries.includes('manifest.xml')) {
      throw new Error(`--env outDir=${outDir}: ${folder} is not empty and holds no earlier build (no manifest.xml); the build empties its folder, so give a new or empty one`);
    }
  }
  return folder;
}

function cliConfig(mode, out = DIST) {
  return {
    name: 'cli',
    mode,
    target: 'node20',
    context: ROOT,
    entry: { mooring: './addin/cli/main.ts' },
    output: {
      path: path.join(out, 'cli'),
      filename: 'mooring.js',
      // Worker threads load their own chunk by name (dist/cli/screen-worker.js for the pair screen).
      chunkFilename: '[name].js',
      clean: true,
    },
    resolve,
    module: { rules: [typeScriptRule] },
    // A command line gains nothing from minifying; readable stack traces matter more.
    optimization: { minimize: false },
    devtool: 'source-map',
    node: { __dirname: false, __filename: false },
    performance: { hints: false },
    plugins: [
      new webpack.BannerPlugin({ banner: '#!/usr/bin/env node', raw: true, entryOnly: true }),
      new ExecutableBitPlugin('mooring.js'),
    ],
  };
}

/** The benchmark runner (npm run bench): Node, like the CLI, built only on request. */
function benchConfig(mode, out = DIST) {
  return {
    name: 'bench',
    mode,
    target: 'node20',
    context: ROOT,
    entry: { 'run-bench': './tests/bench/run-bench.ts' },
    output: { path: path.join(out, 'bench'), filename: '[name].js', clean: true },
    resolve,
    module: { rules: [typeScriptRule] },
    optimization: { minimize: false },
    node: { __dirname: false, __filename: false },
    performance: { hints: false },
  };
}

async function devServerOptions() {
  // Only `webpack serve` gets here; a build never needs certificates.
  const devCerts = require('office-addin-dev-certs');
  let httpsOptions;
  try {
    httpsOptions = await devCerts.getHttpsServerOptions();
  } catch (error) {
    // Installing the CA into the system store needs sudo on Linux; the certificate files
    // are generated before that step, so serve with them and say how to trust them.
    const dir = path.join(require('node:os').homedir(), '.office-addin-dev-certs');
    const files = { ca: 'ca.crt', cert: 'localhost.crt', key: 'localhost.key' };
    if (!Object.values(files).every((f) => fs.existsSync(path.join(dir, f)))) throw error;
    httpsOptions = Object.fromEntries(Object.entries(files).map(([k, f]) => [k, fs.readFileSync(path.join(dir, f))]));
    console.warn(
      `The development CA could not be installed (${String(error.message).split('\n')[0]}).\n` +
        `Import ${path.join(dir, 'ca.crt')} into your browser's trusted authorities to load https://localhost:${DEV_SERVER_PORT}.`,
    );
  }
  return {
    port: DEV_SERVER_PORT,
    host: 'localhost',
    server: { type: 'https', options: httpsOptions },
    // Excel (including Excel on the web) fetches functions.json and the scripts from its own origin.
    headers: { 'Access-Control-Allow-Origin': '*' },
    static: false,
    client: { overlay: { errors: true, warnings: false } },
  };
}

async function addinConfig(mode, serving, base = DEV_BASE, out = DIST) {
  const htmlPage = (filename, template, chunks) =>
    new HtmlWebpackPlugin({
      filename,
      template,
      chunks,
      chunksSortMode: 'manual',
      scriptLoading: 'defer',
      inject: 'head',
    });

  return {
    name: 'addin',
    mode,
    target: ['web', 'es2022'],
    context: ROOT,
    entry: {
      functions: FUNCTION_SOURCES,
      taskpane: './taskpane/taskpane.ts',
      // The pane over the in-memory workbook with the demo data (npm run preview, end-to-end tests).
      preview: './taskpane/preview/preview.ts',
      // MOOR.SCREEN's Web Worker (functions/workers/screen-worker-pool.ts starts it by this name).
      'screen-cells-worker': './functions/workers/screen-cells-worker.ts',
    },
    output: {
      path: out,
      filename: '[name].js',
      publicPath: '',
      // The pane's diagnosis worker is an async chunk named by its chunk name: dist/diagnose-worker.js.
      chunkFilename: '[name].js',
      // dist/cli belongs to the cli configuration, which may be building at the same time.
      clean: { keep: /^cli(\/|\\|$)/ },
    },
    resolve,
    module: {
      rules: [
        typeScriptRule,
        {
          // Runs after the metadata plugin's own loader has appended the associate calls.
          test: /\.ts$/,
          include: FUNCTION_SOURCES,
          use: {
            loader: path.join(ROOT, 'scripts', 'webpack', 'guard-associations-loader.cjs'),
            options: { metadataInput: FUNCTION_SOURCES },
          },
        },
        // The preview page bundles the demo CSV as text.
        { test: /\.csv$/, include: path.join(ROOT, 'addin', 'demo', 'data'), type: 'asset/source' },
      ],
    },
    // No eval-based source maps: the pages' content security policy forbids eval.
    devtool: 'source-map',
    performance: { hints: false },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: FUNCTION_SOURCES, output: ADDIN_FILES.functionsMetadata }),
      new FunctionsMetadataPostProcessPlugin({ filename: ADDIN_FILES.functionsMetadata, base }),
      new FunctionReferencePagePlugin({ metadata: ADDIN_FILES.functionsMetadata }),
      // With the shared runtime the pane page hosts the custom functions too, so it loads both bundles.
      htmlPage(ADDIN_FILES.pane, './taskpane/taskpane.html', ['functions', 'taskpane']),
      htmlPage(ADDIN_FILES.functionsPage, './functions/functions.html', ['functions']),
      htmlPage('preview.html', './taskpane/preview/preview.html', ['preview']),
      new CopyWebpackPlugin({
        patterns: [
          {
            from: 'manifest/manifest.xml',
            to: 'manifest.xml',
            transform: { transformer: (content) => rewriteManifest(content.toString(), base), cache: { keys: { base } } },
          },
          { from: 'assets/icon-*.png', to: 'assets/[name][ext]' },
          { from: 'taskpane/taskpane.css', to: 'taskpane.css' },
          { from: 'node_modules/uplot/dist/uPlot.min.css', to: 'uPlot.min.css' },
          { from: 'docs/*.md', to: 'docs/[name][ext]', noErrorOnMissing: true },
        ],
      }),
    ],
    ...(serving ? { devServer: await devServerOptions() } : {}),
  };
}

/** An error webpack-cli prints as its message alone (it prints errors through util.inspect). */
function refusal(message) {
  const error = new Error(message);
  error[Symbol.for('nodejs.util.inspect.custom')] = () => message;
  return error;
}

module.exports = async (env = {}, argv = {}) => {
  const mode = argv.mode === 'development' ? 'development' : 'production';
  const serving = Boolean(env.WEBPACK_SERVE);
  if (serving && env.base !== undefined) {
    throw refusal(`npm start serves the add-in on ${DEV_BASE} only; --env base is for a build to copy to a host (npm run build -- --env base=...)`);
  }
  let base;
  let out;
  try {
    base = env.base === undefined ? DEV_BASE : checkBase(env.base);
    out = outputFolder(env.outDir);
  } catch (error) {
    throw refusal(error.message);
  }
  const configs = [cliConfig(mode, out), await addinConfig(mode, serving, base, out)];
  // `webpack --env bench --config-name bench` builds the benchmark runner; plain builds skip it.
  if (env.bench) configs.push(benchConfig(mode, out));
  return configs;
};

module.exports.FUNCTION_SOURCES = FUNCTION_SOURCES;
module.exports.ADDIN_FILES = ADDIN_FILES;
module.exports.DEV_SERVER_PORT = DEV_SERVER_PORT;
