import { describe, expect, it } from 'vitest';
import { breaksCommand } from '../../addin/cli/commands/breaks';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { lagMethodText } from '../../addin/breaks/gregory-hansen-wording';
import { zivotAndrewsTest } from '../../addin/breaks/zivot-andrews';
import { LABEL_WIDTH, labelled } from '../../addin/cli/render/format';
import { pValueText } from '../../addin/cli/render/test-terminal';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { runWith } from '../cli/cli-harness';

/**
 * What `mooring breaks` prints, read as a person reads it: the p-value line says once why there
 * is none, the verdict appears once, every label stands apart from its value, and break dates
 * are named by 1-based CSV line and date, as the other commands name rows.
 */

/** A dated pair (seed 29, T = 300): y = 5 + 0.9 x + AR(1) noise, whose level jumps by 4 from row index 180 on. */
function pairCsv(): string {
  const rng = new SeededRandom(29);
  const T = 300;
  const x = randomWalk(rng, T, { start: 40 });
  const u = autoregressive1(rng, T, 0.5, 0.4);
  const lines = ['Date,Y,X'];
  for (let t = 0; t < T; t++) {
    const y = 5 + 0.9 * x[t] + u[t] + (t >= 180 ? 4 : 0);
    lines.push(`${new Date(Date.UTC(2023, 0, 2 + t)).toISOString().slice(0, 10)},${y.toFixed(5)},${x[t].toFixed(5)}`);
  }
  return `${lines.join('\n')}\n`;
}
const files = { 'pair.csv': pairCsv() };
const run = (args: string[]) => runWith([breaksCommand], ['breaks', 'pair.csv', ...args], files);
/** The CSV line and date of the 0-based series index i (line 1 is the header; day 0 is 2023-01-02). */
const lineOf = (i: number) => `line ${i + 2} (${new Date(Date.UTC(2023, 0, 2 + i)).toISOString().slice(0, 10)})`;
/** The value printed under or beside a label: the rest of its line, or the next line when the label stands alone. */
function valueOf(out: string, label: string): string {
  const lines = out.split('\n');
  const i = lines.findIndex((l) => l.trimStart().startsWith(label));
  expect(i).toBeGreaterThanOrEqual(0);
  const rest = lines[i].trimStart().slice(label.length).trim();
  return rest !== '' ? rest : lines[i + 1].trim();
}

describe('mooring breaks --y --x (Gregory-Hansen), terminal output', () => {
  const out = run(['--y', 'Y', '--x', 'X']);
  const json = JSON.parse(run(['--y', 'Y', '--x', 'X', '--json']).stdout);

  it('runs', () => {
    expect(out.code).toBe(0);
    expect(out.stderr).toBe('');
  });

  it('the p-value line says once that there is none and why', () => {
    expect(out.stdout).toMatch(/\n {2}p-value {15}not available: only critical values are published\n/);
    expect(out.stdout).not.toContain('not available (not available');
  });

  it('prints the verdict once', () => {
    expect(out.stdout.match(/Verdict/g)).toHaveLength(1);
    expect(out.stdout.split(json.verdict.slice(0, 40)).length - 1).toBeLessThanOrEqual(1);
  });

  it('names the shift by 1-based CSV line and date, never by a 0-based index', () => {
    expect(out.stdout).not.toMatch(/0-based|index/i);
    expect(valueOf(out.stdout, 'First observation of the new regime')).toBe(lineOf(json.breakAt.firstAfter));
    expect(valueOf(out.stdout, 'Last observation before the shift')).toBe(lineOf(json.breakAt.lastBefore));
    expect(json.breakAt.firstAfter).toBe(json.breakAt.lastBefore + 1);
  });

  it('keeps every label apart from its value: at least two spaces, or the label on a line of its own', () => {
    expect(out.stdout).toMatch(/\n {2}How lags were set {5}once, by AIC on the residual without the shift,/);
    expect(out.stdout).not.toMatch(/chosen once by aic/);
    // every label the engine gives (the same data, read from the CSV), plus the block's own
    const [yValues, xValues] = [1, 2].map((c) => Float64Array.from(files['pair.csv'].trim().split('\n').slice(1), (l) => Number(l.split(',')[c])));
    const direct = gregoryHansenTest(yValues, [xValues], { model: 'level' }, { y: 'Y', xs: ['X'] });
    const labels = [...direct.details.filter((d) => d.value !== null).map((d) => d.label), 'Statistic (ADF*)', 'p-value', 'Reading', 'Critical values', 'Rejects when', 'Lagged differences', 'Observations', 'Deterministic terms', 'Null hypothesis', 'Alternative', 'Data', 'Sample'];
    const lines = out.stdout.split('\n');
    for (const label of labels) {
      const line = lines.find((l) => l.startsWith(`  ${label}`));
      expect(line, label).toBeDefined();
      const after = (line as string).slice(2 + label.length);
      expect(after === '' || after.startsWith('  '), `${label} | ${after}`).toBe(true);
    }
  });

  it('cites Gregory & Hansen (1996), Table 1 and says which points were compared', () => {
    expect(out.stdout).toContain('Gregory & Hansen (1996), Table 1');
    expect(out.stdout.replace(/\s+/g, ' ')).toContain('1%, 5% and 10% points were compared with an independent typed copy');
    expect(out.stdout).not.toMatch(/not checked against/);
  });
});

describe('mooring breaks --series (Zivot-Andrews), terminal output', () => {
  const out = run(['--series', 'Y', '--model', 'both']);
  const json = JSON.parse(run(['--series', 'Y', '--model', 'both', '--json']).stdout);

  it('prints the verdict once, and the dates by 1-based line', () => {
    expect(out.code).toBe(0);
    expect(out.stdout.match(/Verdict/g)).toHaveLength(1);
    expect(out.stdout).not.toMatch(/0-based|index/i);
    expect(valueOf(out.stdout, 'First observation after the break')).toBe(lineOf(json.breakAt.firstAfter));
    expect(valueOf(out.stdout, 'Last observation before the break')).toBe(lineOf(json.breakAt.lastBefore));
    expect(out.stdout).toMatch(/\n {2}How lags were set {5}once, by an ADF with constant and trend/);
  });

  it('the verdict names the date without parentheses inside parentheses', () => {
    expect(json.verdict).not.toMatch(/\([^()]*\(/);
  });
});

describe('the pieces', () => {
  it('labelled: a label of LABEL_WIDTH - 2 characters keeps two spaces; one character longer stands on its own line', () => {
    const fits = 'x'.repeat(LABEL_WIDTH - 2);
    expect(labelled(fits, 'value')).toBe(`  ${fits}  value`);
    const long = 'x'.repeat(LABEL_WIDTH - 1);
    expect(labelled(long, 'value')).toBe(`  ${long}\n${' '.repeat(2 + LABEL_WIDTH)}value`);
  });

  it('pValueText: a missing p-value shows its note alone; a number keeps its note in brackets', () => {
    const base = zivotAndrewsTest(randomWalk(new SeededRandom(31), 120), { model: 'level', lags: 0 });
    expect(pValueText({ ...base, pValue: null, pValueNote: 'not available: no published p-value surface above 6 variables' })).toBe('not available: no published p-value surface above 6 variables');
    expect(pValueText({ ...base, pValue: null, pValueNote: undefined })).toBe('not available');
    expect(pValueText({ ...base, pValue: 0.25, pValueNote: 'read off a table' })).toBe('0.2500 (read off a table)');
  });

  it('the engine without row labels names rows 1-based ("row N")', () => {
    const rng = new SeededRandom(33);
    const r = gregoryHansenTest(randomWalk(rng, 120), [randomWalk(rng, 120)], { model: 'level', lags: 0 });
    const detail = (key: string) => r.details.find((d) => d.key === key)?.value;
    expect(detail('breakLabel')).toBe(`row ${r.breakAt.firstAfter + 1}`);
    expect(detail('breakLastBeforeLabel')).toBe(`row ${r.breakAt.lastBefore + 1}`);
  });

  it('lagMethodText: trade names for the rules, and the timing in words', () => {
    expect(lagMethodText('aic', false)).toBe('once, by AIC on the residual without the shift, then used at every date');
    expect(lagMethodText('bic', true)).toBe('by BIC afresh at each candidate date');
    expect(lagMethodText('fixed', false)).toBe('fixed');
  });
});
