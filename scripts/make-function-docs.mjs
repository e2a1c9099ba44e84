#!/usr/bin/env node
// Writes docs/functions.md, the reference page of Mooring's Excel functions, from the same
// metadata the build turns into functions.json: custom-functions-metadata reads the JSDoc of
// the files in FUNCTION_SOURCES (webpack.config.js), and the namespace comes from the manifest.
// So a description changed in functions/functions.ts changes IntelliSense and this page alike.
// The build serves the same page as HTML (docs/functions.html, through renderFunctionDocsPage),
// which is where the help links in functions.json point.
//
//   node scripts/make-function-docs.mjs           write docs/functions.md
//   node scripts/make-function-docs.mjs --check   exit 1 if the committed page is out of date
//
// tests/functions/function-docs.test.ts runs the check as part of npm test.

import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { markdownPage } from './markdown-page.mjs';

const require = createRequire(import.meta.url);
const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
export const DOCS_FILE = join(ROOT, 'docs', 'functions.md');

/** The custom-functions namespace the manifest declares (Mooring.Functions.Namespace). */
export function manifestNamespace(manifestXml = readFileSync(join(ROOT, 'manifest', 'manifest.xml'), 'utf8')) {
  const match = /<bt:String\s+id="Mooring\.Functions\.Namespace"\s+DefaultValue="([^"]+)"/.exec(manifestXml);
  if (!match) throw new Error('manifest/manifest.xml declares no Mooring.Functions.Namespace string');
  return match[1];
}

/** The metadata the build generates, as a parsed object. */
export async function generatedMetadata() {
  const { generateCustomFunctionsMetadata } = require('custom-functions-metadata');
  const { FUNCTION_SOURCES } = require(join(ROOT, 'webpack.config.js'));
  const result = await generateCustomFunctionsMetadata(FUNCTION_SOURCES, true);
  if (result.errors.length > 0) throw new Error(`custom-functions-metadata reported: ${result.errors.join('; ')}`);
  return JSON.parse(result.metadataJson);
}

const GENERAL = [
  'Every function reads its prices straight from the sheet. This page is generated from the same',
  'descriptions Excel shows while you type (`npm run docs:functions`); do not edit it by hand.',
  '',
  '## How the functions read your data',
  '',
  '- **A series** is one column or one row of numbers. Blank cells before the first number and after',
  '  the last are skipped, so a whole column (`B:B`) or a table column works. A blank, text, logical',
  '  value or error *inside* a series is refused, naming the cell: gaps are never filled silently.',
  '- **A zero is a price of zero.** If the last ten or more cells of a range are exactly 0, Mooring',
  '  refuses the range: some versions of Excel pass empty cells as 0.',
  '- **Numbers stored as text** are refused; convert the column to numbers first.',
  '- **Two series** (y and x, cause and effect) are lined up row by row. After the blank ends are',
  '  skipped they must cover the same rows; otherwise the message says which one is longer.',
  '- **A block** holds one series per column (Johansen, rank, VAR lags, the pair screen).',
  '- **Option words** are not case-sensitive. A wrong word gives an error listing the allowed ones.',
  '  Leave an optional argument out, or leave it empty (`=MOOR.ADF(B:B,,4)`), to take its default.',
  '',
  '## What a test returns: the `show` argument',
  '',
  '| show | the cell returns |',
  '|---|---|',
  '| `headline` (default) | the headline number: the p-value of a test, the value of an estimate |',
  '| `stat` | the test statistic |',
  '| `all` | a labelled two-column table that spills below the cell, ending with a caution |',
  '| `card` | the whole result as a card you can open from the cell; read a field with `=A1.pValue`. Needs a version of Excel with CustomFunctionsRuntime 1.4; elsewhere it returns the `all` table |',
  '',
  'MOOR.SCREEN and MOOR.ROLLING spill tables and take their own `show` words (a ranked list or a p-value grid; one column per statistic through time): see their sections below.',
  '',
  '## Errors',
  '',
  '- `#VALUE!`: the input cannot be used. Hover over the cell to read why and what would work.',
  '- `#N/A`: the input is fine but no number exists, for example no published p-value for that many',
  '  series, or a spread that does not revert. Hover over the cell for the reason.',
  '',
  'Results are statistical evidence about past prices, not advice to trade: relations break.',
];

function signature(namespace, fn) {
  const args = fn.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
  return `=${namespace}.${fn.name}(${args})`;
}

function anchorOf(fn) {
  const hash = (fn.helpUrl ?? '').split('#')[1];
  if (!hash) throw new Error(`${fn.name} has no help anchor in its @helpurl`);
  return hash;
}

function cell(text) {
  return String(text ?? '').replace(/\|/g, '\\|');
}

/** The reference page for the given metadata and namespace. */
export function renderFunctionDocs(metadata, namespace) {
  const functions = metadata.functions;
  const lines = [`# Mooring functions (${namespace})`, '', ...GENERAL, '', '## The functions', '', '| function | what it gives |', '|---|---|'];
  for (const fn of functions) lines.push(`| [${namespace}.${fn.name}](#${anchorOf(fn)}) | ${cell(fn.description)} |`);
  for (const fn of functions) {
    lines.push('', `<a id="${anchorOf(fn)}"></a>`, '', `### ${namespace}.${fn.name}`, '', '```', signature(namespace, fn), '```', '', fn.description ?? '');
    if (fn.parameters.length > 0) {
      lines.push('', '| argument | | meaning |', '|---|---|---|');
      for (const p of fn.parameters) {
        const kind = p.dimensionality === 'matrix' ? 'range' : 'value';
        lines.push(`| \`${p.name}\` | ${p.optional ? 'optional' : 'required'} ${kind} | ${cell(p.description)} |`);
      }
    }
    lines.push('', `Returns ${fn.result?.dimensionality === 'matrix' ? 'a block of cells (one cell for a single number; it spills when there are more)' : 'one value'}.`);
  }
  return `${lines.join('\n')}\n`;
}

/**
 * The reference as one self-contained HTML page, made from the very Markdown above; ids holds
 * the anchors of its headings (one per function, the #anchor of its help link).
 */
export function renderFunctionDocsPage(metadata, namespace) {
  return markdownPage(renderFunctionDocs(metadata, namespace));
}

async function main() {
  const text = renderFunctionDocs(await generatedMetadata(), manifestNamespace());
  if (process.argv.includes('--check')) {
    let committed = '';
    try {
      committed = readFileSync(DOCS_FILE, 'utf8');
    } catch {
      // a missing page is out of date
    }
    if (committed !== text) {
      process.stderr.write('docs/functions.md is out of date: run npm run docs:functions\n');
      process.exitCode = 1;
    }
    return;
  }
  writeFileSync(DOCS_FILE, text);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  await main();
}
