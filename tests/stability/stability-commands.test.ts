import { describe, expect, it } from 'vitest';
import { breaksCommand } from '../../addin/cli/commands/breaks';
import { rollingCommand } from '../../addin/cli/commands/rolling';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { zivotAndrewsTest } from '../../addin/breaks/zivot-andrews';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { expectOneLineRefusal, runWith } from '../cli/cli-harness';

/** A dated CSV of a pair (seed 13, T = 400): y = 10 + 1.3 x + AR(1), whose level jumps by 6 at row 250. */
function pairCsv(): { text: string; y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(13);
  const T = 400;
  const x0 = randomWalk(rng, T, { start: 50 });
  const u = autoregressive1(rng, T, 0.6, 0.5);
  const y0 = x0.map((v, t) => 10 + 1.3 * v + u[t] + (t >= 250 ? 6 : 0));
  const lines = ['Date,Y,X'];
  for (let t = 0; t < T; t++) lines.push(`${new Date(Date.UTC(2022, 0, 3 + t)).toISOString().slice(0, 10)},${y0[t].toFixed(6)},${x0[t].toFixed(6)}`);
  const y = Float64Array.from(lines.slice(1), (l) => Number(l.split(',')[1]));
  const x = Float64Array.from(lines.slice(1), (l) => Number(l.split(',')[2]));
  return { text: `${lines.join('\n')}\n`, y, x };
}
const { text, y, x } = pairCsv();
const files = { 'pair.csv': text };
const commands = [rollingCommand, breaksCommand];

describe('mooring rolling', () => {
  const json = JSON.parse(runWith(commands, ['rolling', 'pair.csv', '--y', 'Y', '--x', 'X', '--window', '100', '--step', '25', '--json'], files).stdout);

  it('gives one array per statistic, with the end row, line and date of each window', () => {
    expect(json.endRow).toEqual([99, 124, 149, 174, 199, 224, 249, 274, 299, 324, 349, 374, 399]);
    expect(json.endDate[12]).toBe('2023-02-06');
    expect(json.endLine[0]).toBe(101);
    for (const key of ['pValue', 'statistic', 'lags', 'beta', 'intercept', 'rSquared', 'halfLife', 'nobs', 'startDate']) expect(json[key]).toHaveLength(13);
  });

  it('each window p-value is engleGranger on the window rows', () => {
    const eg = engleGranger(y.subarray(300, 400), [x.subarray(300, 400)]);
    expect(Math.abs(json.pValue[12] - (eg.test.pValue as number))).toBeLessThan(1e-10);
  });

  it('with --expanding ends on the full-sample Engle-Granger result', () => {
    const ex = JSON.parse(runWith(commands, ['rolling', 'pair.csv', '--y', 'Y', '--x', 'X', '--window', '100', '--step', '50', '--expanding', '--json'], files).stdout);
    const eg = engleGranger(y, [x]);
    expect(ex.nobs[ex.nobs.length - 1]).toBe(400);
    expect(Math.abs(ex.pValue[ex.pValue.length - 1] - (eg.test.pValue as number))).toBeLessThan(1e-10);
    expect(ex.startDate.every((d: string) => d === '2022-01-03')).toBe(true);
  });

  it('prints the summary and a table of windows that ends with the latest', () => {
    const out = runWith(commands, ['rolling', 'pair.csv', '--y', 'Y', '--x', 'X', '--window', '100', '--step', '25'], files);
    expect(out.code).toBe(0);
    expect(out.stdout).toContain('Rolling relation of Y on X');
    expect(out.stdout).toMatch(/In \d+ of 13 rolling windows of 100 days/); // the dates run a calendar day apart
    expect(out.stdout).toMatch(/line 401 \(2023-02-06\)\s+100/);
  });

  it.each([
    [['--y', 'Y', '--x', 'X'], /needs --window N/],
    [['--y', 'Y', '--x', 'X', '--window', '5'], /at least 21 rows/],
    [['--y', 'Y', '--x', 'X', '--window', '500'], /longer than the series \(400 rows\)/],
    [['--y', 'Y', '--x', 'X', '--window', '100', '--step', '0'], /step must be a whole number of at least 1/],
    [['--y', 'Y', '--window', '100'], /needs --y NAME and --x NAME/],
  ])('refuses %j on one line', (args, message) => {
    expect(expectOneLineRefusal(runWith(commands, ['rolling', 'pair.csv', ...(args as string[])], files))).toMatch(message);
  });
});

describe('mooring breaks', () => {
  it('with --series runs Zivot-Andrews and names the break by line and date', () => {
    const json = JSON.parse(runWith(commands, ['breaks', 'pair.csv', '--series', 'Y', '--model', 'both', '--json'], files).stdout);
    const direct = zivotAndrewsTest(y, { model: 'both' }, 'Y');
    expect(json.test).toBe('Zivot-Andrews');
    expect(json.statistic).toBe(direct.statistic);
    expect(json.pValue).toBe(direct.pValue);
    expect(json.breakAt.firstAfter).toBe(direct.breakAt.firstAfter);
    expect(json.breakAt.label).toMatch(/^line \d+ \(\d{4}-\d\d-\d\d\)$/);
  });

  it('with --y and --x runs Gregory-Hansen and finds the level shift near row 250', () => {
    const json = JSON.parse(runWith(commands, ['breaks', 'pair.csv', '--y', 'Y', '--x', 'X', '--json'], files).stdout);
    const direct = gregoryHansenTest(y, [x], { model: 'level' }, { y: 'Y', xs: ['X'] });
    expect(json.test).toBe('Gregory-Hansen');
    expect(json.statistic).toBe(direct.statistic);
    expect(Math.abs(json.breakAt.firstAfter - 250)).toBeLessThanOrEqual(5);
    expect(json.breakAt.label).toBe(`line ${json.breakAt.firstAfter + 2} (${new Date(Date.UTC(2022, 0, 3 + json.breakAt.firstAfter)).toISOString().slice(0, 10)})`);
    expect(json.relation.interceptAfter - json.relation.interceptBefore).toBeGreaterThan(4);
  });

  it('prints the test block and its verdict', () => {
    const out = runWith(commands, ['breaks', 'pair.csv', '--y', 'Y', '--x', 'X', '--model', 'regime'], files);
    expect(out.code).toBe(0);
    expect(out.stdout).toContain('Cointegration test with one shift (Gregory-Hansen) of Y on X');
    expect(out.stdout).toContain('Verdict');
  });

  it.each([
    [['--series', 'Y', '--model', 'regime'], /--model regime is for a pair/],
    [['--y', 'Y', '--x', 'X', '--model', 'slope'], /--model slope is for one series/],
    [['--series', 'Y', '--trim', 'wide'], /--trim must be a share/],
    [['--series', 'Y', '--trim', '0.6'], /strictly between 0 and 0.5/],
    [['--series', 'Y', '--model', 'wave'], /--model must be one of/],
  ])('refuses %j on one line', (args, message) => {
    expect(expectOneLineRefusal(runWith(commands, ['breaks', 'pair.csv', ...(args as string[])], files))).toMatch(message);
  });
});
