/**
 * Windows and half-lives of `screen`, `rolling` and `spread --window` in the user's units: the
 * demo data (Mooring's own seeded generator, addin/demo/data/quennel-delta.csv) given weekly
 * dates say weeks in the words and carry a unit beside each number in JSON, while every number
 * stays the one the same rows give without dates (where the words say rows). Each check
 * compares two routes to the same rows; no statistic is hard-coded.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { runWith } from './cli-harness';

const demo = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trim().split('\n');
const header = demo[0].split(',');
const rows = demo.slice(1).map((l) => l.split(','));
const csvOf = (head: string[], body: string[][]): string => `${[head, ...body].map((r) => r.join(',')).join('\n')}\n`;

/** The same prices on Mondays a week apart from 2010-01-04, and with no dates at all. */
const monday = Date.UTC(2010, 0, 4);
const weekly = csvOf(header, rows.map((r, i) => [new Date(monday + i * 7 * 86_400_000).toISOString().slice(0, 10), ...r.slice(1)]));
const undated = csvOf(header.slice(1), rows.map((r) => r.slice(1)));
const files = { 'w.csv': weekly, 'u.csv': undated, 'd.csv': csvOf(header, rows) };

function run(...argv: string[]): string {
  const out = runWith(MOORING_COMMANDS, argv, files);
  expect(out.stderr).toBe('');
  expect(out.code).toBe(0);
  return out.stdout;
}
const json = (...argv: string[]): Record<string, any> => JSON.parse(run(...argv, '--json'));

/** Only the numbers: drop what names the file, its rows, dates and units. */
function numbers(object: Record<string, any>): Record<string, any> {
  const { file, warnings, sample, spacing, halfLifeUnit, windowUnit, endDate, startDate, ...rest } = object;
  void file; void warnings; void sample; void spacing; void halfLifeUnit; void windowUnit; void endDate; void startDate;
  return rest;
}

describe('rolling: windows and half-lives counted in the spacing of the dates', () => {
  const argv = ['--y', 'DockDiesel', '--x', 'GateGasoil', '--log', '--window', '104', '--step', '20'];

  it('weekly dates: the words say weeks, never rows, and JSON puts a unit beside the window and the half-lives', () => {
    const text = run('rolling', 'w.csv', ...argv);
    expect(text).toMatch(/Windows\s+\d+, each 104 weeks long, one ending every 20 weeks,\s+counting\s+back/);
    expect(text).toMatch(/rolling windows of 104 weeks/);
    expect(text).toMatch(/In the latest window \(104 weeks\)/);
    expect(text).toMatch(/window ends\s+weeks\s+p-value\s+beta\s+half-life \(weeks\)/);
    expect(text).not.toMatch(/\b\d+ rows\b/);
    const out = json('rolling', 'w.csv', ...argv);
    expect(out.windowUnit).toBe('weeks');
    expect(out.halfLifeUnit).toBe('weeks');
  });

  it('the numbers are those of the same rows without dates, where the words say rows', () => {
    const dated = json('rolling', 'w.csv', ...argv);
    const plain = json('rolling', 'u.csv', ...argv);
    expect(plain.windowUnit).toBe('rows');
    expect(plain.halfLifeUnit).toBe('rows');
    expect(numbers({ ...dated, summary: null, endLine: null })).toEqual(numbers({ ...plain, summary: null, endLine: null }));
    expect(dated.summary.map((s: string) => s.replace(/weeks/g, 'rows'))).toEqual(plain.summary);
    expect(run('rolling', 'u.csv', ...argv)).toMatch(/Windows\s+\d+, each 104 rows long, one ending every 20 rows,\s+counting\s+back/);
  });

  it('business-day data say days', () => {
    expect(run('rolling', 'd.csv', ...argv)).toMatch(/each 104 days long, one ending every 20 days,\s+counting\s+back/);
    expect(json('rolling', 'd.csv', ...argv).windowUnit).toBe('days');
  });
});

describe('screen: the half-life column and every pair carry the unit', () => {
  it('weekly dates: the table says weeks; JSON, JSON lines and CSV carry the unit; the numbers equal the undated ones', () => {
    const text = run('screen', 'w.csv', '--log', '--top', '3', '--threads', '1');
    expect(text).toMatch(/half-life \(weeks\)/);
    const dated = json('screen', 'w.csv', '--log', '--top', '50', '--threads', '1');
    const plain = json('screen', 'u.csv', '--log', '--top', '50', '--threads', '1');
    expect(dated.halfLifeUnit).toBe('weeks');
    expect(plain.halfLifeUnit).toBe('rows');
    expect(dated.pairs.length).toBeGreaterThan(0);
    for (const p of dated.pairs) expect(p.halfLifeUnit).toBe('weeks');
    const strip = (pairs: any[]) => pairs.map(({ halfLifeUnit, lastDate, lastLine, ...p }) => (void halfLifeUnit, void lastDate, void lastLine, p));
    expect(strip(dated.pairs)).toEqual(strip(plain.pairs));
    const lines = run('screen', 'w.csv', '--log', '--format', 'jsonl', '--threads', '1').trim().split('\n').map((l) => JSON.parse(l));
    expect(lines[0].halfLifeUnit).toBe('weeks');
    expect(lines.filter((l) => l.status === 'tested').every((l) => l.halfLifeUnit === 'weeks')).toBe(true);
    const csv = run('screen', 'w.csv', '--log', '--format', 'csv', '--threads', '1').trim().split('\n');
    const column = csv[0].split(',').indexOf('halfLifeUnit');
    expect(column).toBe(csv[0].split(',').indexOf('halfLife') + 1);
    expect(csv[1].split(',')[column]).toBe('weeks');
  });
});

describe('spread: the trailing window of the z-score', () => {
  it('reads in weeks for weekly dates and in rows without dates, with the same z-score', () => {
    const argv = ['--y', 'DockDiesel', '--x', 'GateGasoil', '--log', '--window', '30'];
    expect(run('spread', 'w.csv', ...argv)).toMatch(/over the last 30 weeks/);
    expect(run('spread', 'u.csv', ...argv)).toMatch(/over the last 30 rows/);
    const dated = json('spread', 'w.csv', ...argv);
    const plain = json('spread', 'u.csv', ...argv);
    expect(dated.windowUnit).toBe('weeks');
    expect(plain.windowUnit).toBe('rows');
    expect(dated.rollingZscore).toEqual(plain.rollingZscore);
    expect(dated.halfLife).toBe(plain.halfLife);
  });
});
