#!/usr/bin/env node
// npm stop: undo npm start.
//
// Windows and macOS: office-addin-debugging stops the dev server and removes the
// sideloaded add-in. Linux: ends the dev server that npm start recorded, by its
// process id; nothing else is touched.

import { spawn } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEBUGGING_PACKAGE, MANIFEST, PID_FILE, ROOT } from './start.mjs';

function stopDesktop() {
  const npx = process.platform === 'win32' ? 'npx.cmd' : 'npx';
  const child = spawn(npx, ['--yes', DEBUGGING_PACKAGE, 'stop', relative(ROOT, MANIFEST)], {
    cwd: ROOT,
    stdio: 'inherit',
    shell: process.platform === 'win32',
  });
  child.on('exit', (code) => {
    process.exitCode = code ?? 1;
  });
}

function stopWeb() {
  if (!existsSync(PID_FILE)) {
    console.log('No Mooring dev server recorded by npm start is running.');
    return;
  }
  const pid = Number.parseInt(readFileSync(PID_FILE, 'utf8'), 10);
  rmSync(PID_FILE, { force: true });
  if (!Number.isInteger(pid) || pid <= 0) {
    console.error(`Ignoring an unreadable process id in ${PID_FILE}.`);
    process.exitCode = 1;
    return;
  }
  try {
    process.kill(pid, 'SIGTERM');
    console.log(`Stopped the Mooring dev server (process ${pid}).`);
  } catch (error) {
    if (error.code === 'ESRCH') console.log(`The Mooring dev server (process ${pid}) had already stopped.`);
    else throw error;
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  if (process.platform === 'win32' || process.platform === 'darwin') stopDesktop();
  else stopWeb();
}
