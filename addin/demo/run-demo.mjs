#!/usr/bin/env node
// The Mooring demo (`npm run demo`, which builds the command line first): runs the built
// `mooring report` on the invented Quennel Delta market (addin/demo/data/quennel-delta.csv,
// every series, in natural logs), prints the readable diagnostic, and writes the
// self-contained HTML report under demo-output/, which git ignores. It stays outside dist/
// on purpose: `npm run build` empties dist/ (webpack's output.clean keeps only dist/cli), and
// a report a person just made must survive the next build. The structure the
// generator built into the file is described in addin/demo/README.md (DEMO_TRUTH).

import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const CLI = join('dist', 'cli', 'mooring.js');
const DATA = join('addin', 'demo', 'data', 'quennel-delta.csv');
const OUT_DIR = 'demo-output';
const OUT = join(OUT_DIR, 'mooring-demo-report.html');

if (!existsSync(join(ROOT, CLI))) {
  process.stderr.write(`mooring demo: ${CLI} is missing; build it with npm run build:cli (npm run demo does this first).\n`);
  process.exit(1);
}
mkdirSync(join(ROOT, OUT_DIR), { recursive: true });

process.stdout.write(
  'Mooring demo: the Quennel Delta, an invented fuel-and-freight market with a structure known in advance\n' +
    '(addin/demo/README.md). Running: mooring report ' + `${DATA} --log --out ${OUT}\n\n`,
);
const run = spawnSync(process.execPath, [CLI, 'report', DATA, '--log', '--out', OUT], {
  cwd: ROOT,
  encoding: 'utf8',
  maxBuffer: 256 * 1024 * 1024,
});
if (run.error) {
  process.stderr.write(`mooring demo: could not run the command line (${run.error.message}).\n`);
  process.exit(1);
}
process.stdout.write(run.stdout);
process.stderr.write(run.stderr);
if (run.status !== 0) process.exit(run.status ?? 1);

const page = join(ROOT, OUT);
process.stdout.write(`\nThe HTML report (charts of the series, each spread and its z-score) is at\n  ${page}\nOpen ${pathToFileURL(page).href} in a browser.\n`);
