#!/usr/bin/env node
// npm start: run the add-in in Excel for development.
//
// Windows and macOS: office-addin-debugging starts the dev server and sideloads
// manifest/manifest.xml into desktop Excel. It is fetched on demand with npx rather
// than kept in devDependencies, because its dependency tree builds a native keychain
// module that does not install on Linux, where CI runs.
//
// Linux: desktop Excel does not exist there, so this serves the add-in on
// https://localhost:3000 for Excel on the web and says how to upload the manifest.
// `npm stop` ends that server.

import { spawn } from 'node:child_process';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
export const MANIFEST = join(ROOT, 'manifest', 'manifest.xml');
export const PID_FILE = join(ROOT, 'node_modules', '.cache', 'mooring', 'dev-server.pid');
export const DEBUGGING_PACKAGE = 'office-addin-debugging@7.0.0';
export const SERVE_ARGS = ['serve', '--mode', 'development', '--config-name', 'addin'];
const WEBPACK_CLI = join(ROOT, 'node_modules', 'webpack-cli', 'bin', 'cli.js');

const npx = process.platform === 'win32' ? 'npx.cmd' : 'npx';

function run(command, args, options = {}) {
  const child = spawn(command, args, { cwd: ROOT, stdio: 'inherit', shell: process.platform === 'win32', ...options });
  child.on('error', (error) => {
    console.error(`could not run ${command}: ${error.message}`);
    process.exitCode = 1;
  });
  return child;
}

function startDesktop() {
  const devServer = ['npx', 'webpack', ...SERVE_ARGS].join(' ');
  const child = run(npx, [
    '--yes',
    DEBUGGING_PACKAGE,
    'start',
    relative(ROOT, MANIFEST),
    'desktop',
    '--app',
    'excel',
    '--dev-server',
    devServer,
    '--dev-server-port',
    '3000',
  ]);
  child.on('exit', (code) => {
    process.exitCode = code ?? 1;
  });
}

function startWeb() {
  console.log('Desktop sideloading is not supported on Linux; serving the add-in for Excel on the web instead.');
  console.log(
    [
      '',
      'When the server below is up (https://localhost:3000):',
      '  1. open a workbook in Excel on the web;',
      '  2. choose Home > Add-ins > More Settings (or Advanced) > Upload My Add-in;',
      `  3. upload ${relative(process.cwd(), MANIFEST) || MANIFEST}.`,
      'Your browser must trust the development certificate for https://localhost:3000.',
      'Stop the server with Ctrl+C or `npm stop`.',
      '',
    ].join('\n'),
  );
  // Node runs webpack-cli directly, so the recorded process id is the server itself.
  const child = run(process.execPath, [WEBPACK_CLI, ...SERVE_ARGS], { shell: false });
  if (child.pid !== undefined) {
    mkdirSync(dirname(PID_FILE), { recursive: true });
    writeFileSync(PID_FILE, `${child.pid}\n`);
  }
  const forget = () => rmSync(PID_FILE, { force: true });
  child.on('exit', (code, signal) => {
    forget();
    process.exitCode = signal === 'SIGTERM' || signal === 'SIGINT' ? 0 : (code ?? 1);
  });
  for (const signal of ['SIGINT', 'SIGTERM']) {
    process.on(signal, () => child.kill(signal));
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  if (process.platform === 'win32' || process.platform === 'darwin') startDesktop();
  else startWeb();
}
