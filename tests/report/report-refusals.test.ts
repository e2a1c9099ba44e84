import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { prepareDiagnosticInput } from '../../addin/report/prepare-input';
import { cleanSeries } from '../../addin/series/clean-series';
import { SeededRandom } from '../../addin/random';
import { expectOneLineRefusal } from '../cli/cli-harness';
import { DEMO_CSV, runMooring } from './report-run';
import { walk } from './seeded-series';

const rng = new SeededRandom(9);
const a = Array.from(walk(rng, 60, 0.01, 1));
const b = Array.from(walk(rng, 60, 0.01, 1));

function csv(rows: number, edit?: (cells: string[], i: number) => void): string {
  const lines = ['Date,A,B'];
  for (let i = 0; i < rows; i++) {
    const cells = [new Date(Date.UTC(2024, 0, 1 + i)).toISOString().slice(0, 10), (100 * Math.exp(a[i % 60])).toFixed(3), (80 * Math.exp(b[i % 60])).toFixed(3)];
    edit?.(cells, i);
    lines.push(cells.join(','));
  }
  return `${lines.join('\n')}\n`;
}

function refusal(step: () => unknown): string {
  try {
    step();
  } catch (e) {
    expect(e).toBeInstanceOf(MooringInputError);
    return (e as Error).message;
  }
  throw new Error('no refusal');
}

describe('mooring report refuses bad input in one line (exit 2)', () => {
  const cases: [string, string[], Record<string, string>, RegExp][] = [
    ['one column of numbers', ['report', 'one.csv'], { 'one.csv': 'Date,A\n2024-01-01,1\n2024-01-02,2\n' }, /needs at least two columns of numbers; this file has only A/],
    ['one name in --series', ['report', 'p.csv', '--series', 'A'], { 'p.csv': csv(60) }, /name at least two with --series A,B/],
    ['an unknown series', ['report', 'p.csv', '--series', 'A,Nope'], { 'p.csv': csv(60) }, /No column is named 'Nope'; the series are: A, B/],
    ['a name given twice', ['report', 'p.csv', '--series', 'A,a'], { 'p.csv': csv(60) }, /named twice/],
    ['a text cell', ['report', 'p.csv'], { 'p.csv': csv(60, (c, i) => { if (i === 10) c[1] = 'n/a'; }) }, /A line 12 \(2024-01-11\) is text 'n\/a': clean it or give --skip-gaps/],
    ['too few rows', ['report', 'p.csv'], { 'p.csv': csv(25) }, /25 observations; the diagnostic needs at least 30/],
    ['logs of a negative price', ['report', 'p.csv', '--log'], { 'p.csv': csv(60, (c, i) => { if (i === 3) c[2] = '-1'; }) }, /B line 5 \(2024-01-04\) is -1: logs need positive values/],
    ['a level out of range', ['report', DEMO_CSV, '--alpha', '2'], {}, /--alpha must be a level between 0 and 0.5/],
    ['an unknown Johansen case', ['report', DEMO_CSV, '--johansen-case', 'loose'], {}, /--johansen-case must be one of auto, none, restricted-constant/],
    ['a rolling window too short', ['report', 'p.csv', '--rolling-window', '2'], { 'p.csv': csv(60) }, /rolling window must be a whole number of rows from 3 to 60/],
    ['an --out that is not .html', ['report', 'p.csv', '--out', 'report.txt'], { 'p.csv': csv(60) }, /should end in .html/],
    ['an --out folder that does not exist', ['report', 'p.csv', '--out', 'test-artifacts/report/no/such/folder/r.html'], { 'p.csv': csv(60) }, /Cannot write the HTML report to .*the folder does not exist/],
  ];
  for (const [label, argv, files, message] of cases) {
    it(label, () => {
      expect(expectOneLineRefusal(runMooring(argv, files))).toMatch(message);
    });
  }
});

describe('diagnose() refuses bad input with a MooringInputError naming what is wrong', () => {
  it('a value that is not a number, by series and row', () => {
    const bad = a.slice();
    bad[7] = Number.NaN;
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: bad }, { name: 'B', values: b }] }))).toBe(
      'A row 8 is not a number (NaN), not a number: clean the series (or allow gaps) before the diagnostic.',
    );
  });

  it('one series', () => {
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }] }))).toMatch(/needs at least two; got 1/);
  });

  it('series of different lengths', () => {
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }, { name: 'B', values: b.slice(1) }] }))).toMatch(/B has 59 values but A has 60/);
  });

  it('two series with one name', () => {
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }, { name: 'a', values: b }] }))).toMatch(/Two series are named 'a'/);
  });

  it('a window outside the data, or too short', () => {
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }, { name: 'B', values: b }] }, { window: { start: 10, end: 70 } }))).toMatch(/0 <= start < end <= 60/);
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }, { name: 'B', values: b }] }, { window: { start: 10, end: 30 } }))).toMatch(/window row 11 to row 30 holds 20 observations/);
  });

  it('a constant series', () => {
    expect(refusal(() => diagnose({ series: [{ name: 'A', values: a }, { name: 'Flat', values: a.map(() => 3) }] }))).toMatch(/Flat never changes/);
  });

  it('cleaned series whose rows do not line up', () => {
    const x = cleanSeries(a, { name: 'A' });
    const y = cleanSeries(['', ...b.slice(1)], { name: 'B' });
    expect(refusal(() => prepareDiagnosticInput([x, y]))).toMatch(/B and A do not cover the same rows/);
  });
});

describe('prepareDiagnosticInput carries the cleaner\'s dropped rows into the report', () => {
  it('lists each dropped cell with its series, row, date and reason', () => {
    const cellsA: unknown[] = a.slice();
    cellsA[5] = 'n/a';
    const cellsB: unknown[] = b.slice();
    cellsB[5] = '';
    const x = cleanSeries(cellsA, { name: 'A', skipGaps: true });
    const y = cleanSeries(cellsB, { name: 'B', skipGaps: true });
    const input = prepareDiagnosticInput([x, y], { dateOf: (i) => `2024-02-${String(i + 1).padStart(2, '0')}` });
    const report = diagnose(input);
    expect(report.data.observations).toBe(59);
    expect(report.data.dropped).toEqual([
      { series: 'A', row: 'row 6', date: '2024-02-06', reason: "text 'n/a'" },
      { series: 'B', row: 'row 6', date: '2024-02-06', reason: 'blank' },
    ]);
    expect(report.warnings).toContainEqual(expect.stringMatching(/^2 cells were dropped as gaps/));
    expect(report.data.rowLabels[5]).toBe('row 7');
  });
});
