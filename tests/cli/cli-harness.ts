/** In-process harness for the command line: captured output, the exit code, and CSV fixtures. */
import { expect } from 'vitest';
import { SeededRandom } from '../../addin/random';
import type { Command } from '../../addin/cli/command';
import { runCommandLine } from '../../addin/cli/run-command-line';

/** What one run printed and returned. */
export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs argv against a command table with files served from `files`. */
export function runWith(commands: readonly Command[], argv: string[], files: Record<string, string> = {}): CliRun {
  let stdout = '';
  let stderr = '';
  const code = runCommandLine(argv, {
    stdout: (s) => { stdout += s; },
    stderr: (s) => { stderr += s; },
    readFile: (path) => {
      if (path in files) return files[path];
      throw Object.assign(new Error(`ENOENT: no such file or directory, open '${path}'`), { code: 'ENOENT' });
    },
  }, commands);
  return { code, stdout, stderr };
}

/**
 * A price CSV with a date column and three series of n rows (seeded): Walk is a random walk
 * (a unit root), Calm a stationary AR(1) around 50, Drift a random walk with drift.
 */
export function pricesCsv(n: number, seed = 3, edit?: (row: string[], i: number) => void): string {
  const r = new SeededRandom(seed);
  const lines = ['Date,Walk,Calm,Drift'];
  let walk = 100;
  let calm = 50;
  let drift = 40;
  for (let i = 0; i < n; i++) {
    walk += r.normal();
    calm = 50 + 0.5 * (calm - 50) + r.normal();
    drift += 0.2 + r.normal();
    const day = new Date(Date.UTC(2020, 0, 1 + i)).toISOString().slice(0, 10);
    const row = [day, walk.toFixed(4), calm.toFixed(4), drift.toFixed(4)];
    edit?.(row, i);
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Asserts the shape every bad-input run must have: exit 2, nothing on stdout, one stderr line, no stack. */
export function expectOneLineRefusal(run: CliRun): string {
  expect(run.code).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr.endsWith('\n')).toBe(true);
  expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
  expect(run.stderr).not.toMatch(/\n\s+at /);
  expect(run.stderr).not.toMatch(/\.ts:\d+/);
  expect(run.stderr.startsWith('mooring: ')).toBe(true);
  return run.stderr.trimEnd();
}
