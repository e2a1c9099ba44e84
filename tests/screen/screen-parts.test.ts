/**
 * A screen split into parts and merged is the screen run whole: four parts run at once as
 * child processes of the built command line (dist/cli/mooring.js; `npm test` builds before
 * vitest), then `mooring merge`, against the same screen on one machine. The stream of every
 * pair (--format jsonl) must match byte for byte, the JSON object field for field (apart from
 * how the work was spread), and the stream's adjusted p-values must be Benjamini-Hochberg over
 * every tested pair of the stream (checked against the reference implementation's numbers in
 * screen-set-aside.test.ts, fixture fdr-bh from statsmodels multipletests).
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { mergeCommand } from '../../addin/cli/commands/merge';
import { screenCommand } from '../../addin/cli/commands/screen';
import { requireScreenMemory } from '../../addin/cli/screen-memory';
import { benjaminiHochberg } from '../../addin/screen/benjamini-hochberg';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { expectOneLineRefusal, runWith } from '../cli/cli-harness';
import { generatedUniverse } from './generated-universe';

const CLI = fileURLToPath(new URL('../../dist/cli/mooring.js', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'mooring-parts-'));

// 3 clusters of 3, 12 walks and one settling AR(1) (coefficient 0.5, seed 77): 22 series, 231 pairs, some set aside.
const { series } = generatedUniverse(77, { clusters: 3, perCluster: 3, walks: 12, T: 260 });
const all = [...series, { name: 'settles', values: autoregressive1(new SeededRandom(77), 260, 0.5, 1).map((v) => 40 + v) }];
const lines = [['Date', ...all.map((s) => s.name)].join(',')];
for (let t = 0; t < 260; t++) lines.push([new Date(Date.UTC(2022, 0, 1 + t)).toISOString().slice(0, 10), ...all.map((s) => s.values[t].toFixed(5))].join(','));
const csv = join(dir, 'prices.csv');
writeFileSync(csv, `${lines.join('\n')}\n`);
const N = all.length;

function cli(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [CLI, ...args], { encoding: 'utf8', maxBuffer: 1 << 26 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** Runs the child processes at once; resolves with their exit codes. */
function together(commands: string[][]): Promise<(number | null)[]> {
  return Promise.all(commands.map((args) => new Promise<number | null>((done) => {
    const child = spawn(process.execPath, [CLI, ...args], { stdio: 'ignore' });
    child.on('close', (code) => done(code));
  })));
}

const partFiles = [1, 2, 3, 4].map((k) => join(dir, `part-${k}.bin`));

describe('screen --part k/4 run at once, then merge', async () => {
  const codes = await together(partFiles.map((file, k) => ['screen', csv, '--part', `${k + 1}/4`, '--out', file, '--threads', '1']));
  const whole = cli('screen', csv, '--format', 'jsonl', '--threads', '2');
  const merged = cli('merge', ...partFiles, '--format', 'jsonl');

  it('every part finishes, and the merged stream of every pair equals the one-machine stream byte for byte', () => {
    expect(codes).toEqual([0, 0, 0, 0]);
    expect(whole.code).toBe(0);
    expect(merged.code).toBe(0);
    expect(merged.stdout).toBe(whole.stdout);
  });

  it('the stream holds one line on the screen, then every directed pair once, tested, set aside or not', () => {
    const rows = whole.stdout.trim().split('\n').map((l) => JSON.parse(l));
    expect(rows[0].kind).toBe('screen');
    const pairs = rows.slice(1);
    expect(pairs).toHaveLength(N * (N - 1));
    expect(new Set(pairs.map((p) => `${p.y}|${p.x}`)).size).toBe(N * (N - 1));
    const tested = pairs.filter((p) => p.status === 'tested');
    expect(tested).toHaveLength(rows[0].family.size);
    const aside = pairs.filter((p) => p.status === 'set aside');
    expect(aside).toHaveLength(rows[0].setAsideCount);
    expect(aside.length).toBeGreaterThan(0);
    for (const p of aside) expect(p.reason).toMatch(/a pair needs two wandering series of the same order/);
    // The adjustment over the stream's tested pairs, by the in-memory routine, gives the stream's numbers.
    const q = benjaminiHochberg(tested.map((p) => p.pValue));
    tested.forEach((p, i) => expect(p.adjustedPValue).toBe(q[i]));
    expect(tested.filter((p) => p.adjustedPValue <= rows[0].alpha)).toHaveLength(rows[0].discoveries);
  });

  it('merge --json equals screen --json apart from the command name and how the work was spread; --top keeps the best pairs of the stream', () => {
    const one = JSON.parse(cli('screen', csv, '--json', '--top', '7', '--threads', '1').stdout);
    const many = JSON.parse(cli('merge', ...partFiles, '--json', '--top', '7').stdout);
    expect(many.threads).toEqual({ parts: 4 });
    for (const o of [one, many]) {
      delete o.command;
      delete o.threads;
    }
    expect(many).toEqual(one);
    expect(one.pairs).toHaveLength(7);
    const tested = whole.stdout.trim().split('\n').slice(1).map((l) => JSON.parse(l)).filter((p) => p.status === 'tested');
    tested.sort((a, b) => a.pValue - b.pValue || (a.statistic ?? -Infinity) - (b.statistic ?? -Infinity));
    expect(one.pairs.map((p: { y: string; x: string }) => `${p.y}|${p.x}`)).toEqual(tested.slice(0, 7).map((p) => `${p.y}|${p.x}`));
  });

  it('the terminal reports differ only in the line that says how the work was spread', () => {
    const strip = (s: string) => s.replace(/\n {2}(Threads|Parts) .*\n/, '\n');
    expect(strip(cli('merge', ...partFiles, '--top', '5').stdout)).toBe(strip(cli('screen', csv, '--top', '5', '--threads', '1').stdout));
  });

  it('--format csv writes a header and one row per directed pair, with the same numbers as the JSON lines', () => {
    const rows = cli('merge', ...partFiles, '--format', 'csv').stdout.trim().split('\n');
    expect(rows).toHaveLength(1 + N * (N - 1));
    const header = rows[0].split(',');
    const first = JSON.parse(whole.stdout.split('\n')[1]);
    const cells = rows[1].split(',');
    expect(cells[header.indexOf('y')]).toBe(first.y);
    expect(Number(cells[header.indexOf('pValue')])).toBe(first.pValue);
    expect(Number(cells[header.indexOf('adjustedPValue')])).toBe(first.adjustedPValue);
  });

  const merge = (...args: string[]) => runWith([mergeCommand, screenCommand], ['merge', ...args]);
  it.each([
    ['a missing part', () => merge(partFiles[0], partFiles[1], partFiles[3]), /Part 3 of 4 is missing/],
    ['a part given twice', () => merge(partFiles[0], partFiles[1], partFiles[1], partFiles[2], partFiles[3]), /both part 2 of 4/],
    ['a file that is not a part', () => merge(csv), /is not a part file/],
    ['no such file', () => merge(join(dir, 'nope.bin')), /no such file/],
  ])('refuses %s on one line with exit 2', (_, run, message) => {
    expect(expectOneLineRefusal(run())).toMatch(message);
  });

  it('refuses parts of another screen, and a part cut short', () => {
    const other = join(dir, 'other-1.bin');
    expect(cli('screen', csv, '--part', '1/4', '--out', other, '--alpha', '0.01', '--threads', '1').code).toBe(0);
    expect(expectOneLineRefusal(merge(other, partFiles[1], partFiles[2], partFiles[3]))).toMatch(/comes from another screen/);
    const cut = join(dir, 'cut-2.bin');
    writeFileSync(cut, readFileSync(partFiles[1]));
    truncateSync(cut, readFileSync(cut).length - 50);
    expect(expectOneLineRefusal(merge(partFiles[0], cut, partFiles[2], partFiles[3]))).toMatch(/did not finish; run that part again/);
  });

  it('refuses --part without --out, --out without --part, a bad k/n and --format on a part', () => {
    const screen = (...args: string[]) => runWith([screenCommand], ['screen', 'p.csv', '--threads', '1', ...args], { 'p.csv': readFileSync(csv, 'utf8') });
    expect(expectOneLineRefusal(screen('--part', '2/4'))).toMatch(/name it with --out/);
    expect(expectOneLineRefusal(screen('--out', join(dir, 'x.bin')))).toMatch(/use it with --part k\/n/);
    expect(expectOneLineRefusal(screen('--part', '5/4', '--out', join(dir, 'x.bin')))).toMatch(/1 <= k <= n/);
    expect(expectOneLineRefusal(screen('--part', '1/4', '--out', join(dir, 'x.bin'), '--format', 'csv'))).toMatch(/--format applies to a whole screen/);
  });
});

describe('the report of a large universe', () => {
  it('names the first 8 of 42 series and counts the orders instead of listing 42 of each', () => {
    const { series: walks } = generatedUniverse(5, { clusters: 0, perCluster: 3, walks: 42, T: 60 });
    const text = [['Date', ...walks.map((w) => w.name)].join(','), ...Array.from({ length: 60 }, (_, t) =>
      [new Date(Date.UTC(2022, 0, 1 + t)).toISOString().slice(0, 10), ...walks.map((w) => w.values[t].toFixed(4))].join(','))].join('\n');
    const out = runWith([screenCommand], ['screen', 'w.csv', '--threads', '1', '--top', '3'], { 'w.csv': `${text}\n` });
    expect(out.code).toBe(0);
    const flat = out.stdout.replace(/\s+/g, ' ');
    expect(flat).toMatch(/\.\.\. \(42 in all; --json lists them\)/);
    expect(flat).toMatch(/Orders I\(\d\) \d+/);
    const counted = [...flat.replace(/.*Orders (.*?) series \(--json lists each\).*/, '$1').matchAll(/(I\(\d\)|undecided|above I\(2\)) (\d+)/g)].reduce((n, m) => n + Number(m[2]), 0);
    expect(counted).toBe(42);
  });
});

describe('a screen the machine cannot hold is refused up front, saying what would fit', () => {
  const machine = { bytes: 0.8 * 24 * 2 ** 30, heapBytes: 4 * 2 ** 30 }; // this project's machine: 24 GiB, a 4 GiB heap
  it('50,000 series (2.5 billion directed pairs) are refused with the series that fit and the way to split', () => {
    expect(() => requireScreenMemory({ series: 50_000, rows: 500, top: 20 }, machine)).toThrow(/About [\d,]+ series would fit here; or split the pairs with --part k\/n/);
  });
  it('2,000 and 10,000 series fit; a part of 50,000 series keeps no p-values and fits', () => {
    expect(() => requireScreenMemory({ series: 2_000, rows: 2_520, top: 20 }, machine)).not.toThrow();
    expect(() => requireScreenMemory({ series: 10_000, rows: 2_520, top: 20 }, machine)).not.toThrow();
    expect(() => requireScreenMemory({ series: 50_000, rows: 500, top: 20, part: true }, machine)).not.toThrow();
  });
  it('a --top larger than the heap can hold is refused, naming the stream', () => {
    expect(() => requireScreenMemory({ series: 10_000, rows: 500, top: 50_000_000 }, machine)).toThrow(/ask for at most [\d,]+, or list every pair with --format jsonl or csv/);
  });
});
