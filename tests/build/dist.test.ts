// Checks of the built files in dist/. `npm test` runs the production build before vitest,
// so these read what was just built; they run no bundler themselves.

import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import packageJson from '../../package.json';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const DIST = join(ROOT, 'dist');
const read = (file: string) => readFileSync(join(DIST, file), 'utf8');

describe('the built add-in in dist/', () => {
  it('holds every file the manifest serves (npm test builds it first)', () => {
    for (const file of [
      'taskpane.html',
      'taskpane.js',
      'taskpane.css',
      'functions.html',
      'functions.js',
      'functions.json',
      'manifest.xml',
      'assets/icon-16.png',
      'assets/icon-32.png',
      'assets/icon-64.png',
      'assets/icon-80.png',
    ]) {
      expect(existsSync(join(DIST, file)), file).toBe(true);
    }
    expect(read('manifest.xml')).toBe(readFileSync(join(ROOT, 'manifest', 'manifest.xml'), 'utf8'));
  });

  it('functions.json allows errors for any-typed parameters and lists MOOR.VERSION', () => {
    const metadata = JSON.parse(read('functions.json')) as { allowErrorForDataTypeAny?: unknown; functions: { id: string }[] };
    expect(metadata.allowErrorForDataTypeAny).toBe(true);
    expect(metadata.functions.map((f) => f.id)).toContain('VERSION');
  });

  it('functions.js loads without Office and registers every function with it', () => {
    const code = read('functions.js');
    expect(() => runInNewContext(code, {})).not.toThrow();
    const registered = new Map<string, unknown>();
    runInNewContext(code, { CustomFunctions: { associate: (id: string, fn: () => unknown) => registered.set(id, fn) } });
    const ids = (JSON.parse(read('functions.json')) as { functions: { id: string }[] }).functions.map((f) => f.id);
    expect([...registered.keys()].sort()).toEqual([...ids].sort());
    expect((registered.get('VERSION') as () => string)()).toBe(packageJson.version);
  });

  it('the pane page loads Office.js, then the functions and pane bundles', () => {
    const html = read('taskpane.html');
    const scripts = [...html.matchAll(/<script\b[^>]*\bsrc="?([^" >]+)"?/g)].map((m) => m[1]);
    expect(scripts).toEqual(['https://appsforoffice.microsoft.com/lib/1/hosted/office.js', 'functions.js', 'taskpane.js']);
    expect(html).toContain('Content-Security-Policy');
  });
});

describe('the built command line dist/cli/mooring.js', () => {
  const cli = join(DIST, 'cli', 'mooring.js');

  it('is an executable script with a node #! line', () => {
    expect(readFileSync(cli, 'utf8').startsWith('#!/usr/bin/env node\n')).toBe(true);
    expect(statSync(cli).mode & 0o111).not.toBe(0);
  });

  it('runs on its own from outside the project, its dependencies bundled in', () => {
    expect(readFileSync(cli, 'utf8')).not.toMatch(/require\("(jstat|ml-matrix)"\)/);
    const result = spawnSync(cli, ['--help'], { cwd: '/', encoding: 'utf8' });
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/mooring/i);
  });
});
