import { describe, expect, it } from 'vitest';
import { rollingCommand } from '../../addin/cli/commands/rolling';
import { screenCommand } from '../../addin/cli/commands/screen';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { runWith } from './cli-harness';

/**
 * The terminal tables of rolling and screen keep their columns apart: a cell as wide as its
 * column or wider ('not available', 'none') ran into its neighbour ("20not available",
 * "nonenot available"). Each table row must split on runs of two or more spaces into exactly
 * as many cells as the header has. Data: seeded pairs (SeededRandom).
 */
function csv(T: number, seed: number, flatUntil = 0): string {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 50, sigma: 0.5 });
  const u = autoregressive1(rng, T, 0.7, 0.3);
  const w = randomWalk(rng, T, { start: 80 });
  // Z is an exact line in X: its pairs have no tau, half-life or z-score ('not available', 'none').
  const lines = ['Date,Y,X,W,Z'];
  for (let t = 0; t < T; t++) {
    const xt = t < flatUntil ? 50 : x[t];
    lines.push(`${new Date(Date.UTC(2022, 0, 3 + t)).toISOString().slice(0, 10)},${(10 + 2 * xt + u[t]).toFixed(6)},${xt.toFixed(6)},${w[t].toFixed(6)},${(3 + 2 * Number(xt.toFixed(6))).toFixed(6)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** The table lines: from the header line to the first blank line. */
function tableOf(stdout: string, headerStart: RegExp): string[] {
  const lines = stdout.split('\n');
  const from = lines.findIndex((l) => headerStart.test(l));
  expect(from).toBeGreaterThanOrEqual(0);
  const rows: string[] = [];
  for (let i = from; i < lines.length && lines[i].trim() !== '' && !lines[i].trim().startsWith('...'); i++) rows.push(lines[i]);
  return rows;
}

const cells = (line: string) => line.trim().split(/ {2,}/);

describe('rolling table', () => {
  it('keeps "not available" and "none" apart from their neighbours (x flat in the first windows)', () => {
    const out = runWith([rollingCommand], ['rolling', 'p.csv', '--y', 'Y', '--x', 'X', '--window', '21', '--step', '10'], { 'p.csv': csv(250, 7, 60) });
    expect(out.code).toBe(0);
    const table = tableOf(out.stdout, /^\s+window ends/);
    expect(table.length).toBeGreaterThan(2);
    expect(out.stdout).toContain('not available');
    expect(out.stdout).not.toMatch(/\S(not available|none)/);
    // The window-end label has single spaces inside ("line 23 (2022-01-23)"), so it is one cell.
    for (const line of table) expect(cells(line)).toHaveLength(5);
  });
});

describe('screen table', () => {
  it('splits every ranked row into the eight columns of its header, exact-fit pairs ("none", "not available") included', () => {
    const out = runWith([screenCommand], ['screen', 'p.csv', '--threads', '1'], { 'p.csv': csv(200, 8) });
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/ none /);
    expect(out.stdout).toContain('not available');
    const table = tableOf(out.stdout, /^\s+rank\s+pair \(y on x\)/);
    expect(table.length).toBeGreaterThan(1);
    for (const line of table) expect(cells(line)).toHaveLength(8);
    expect(out.stdout).not.toMatch(/\S(not available|none)/);
  });
});
