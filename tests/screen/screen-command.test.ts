import { describe, expect, it } from 'vitest';
import { screenCommand } from '../../addin/cli/commands/screen';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { expectOneLineRefusal, runWith } from '../cli/cli-harness';
import { generatedUniverse } from './generated-universe';

/** A CSV of the generated universe with a date column, a text column, and a series that starts at row 61. */
function universeCsv(): { text: string } {
  const { series } = generatedUniverse(51, { clusters: 1, perCluster: 3, walks: 2, T: 200 });
  const lines = [['Date', ...series.map((s) => s.name), 'Ticker'].join(',')];
  for (let t = 0; t < 200; t++) {
    const day = new Date(Date.UTC(2021, 0, 1 + t)).toISOString().slice(0, 10);
    lines.push([day, ...series.map((s, j) => (j === 4 && t < 60 ? '' : s.values[t].toFixed(6))), 'XYZ'].join(','));
  }
  return { text: `${lines.join('\n')}\n` };
}

const { text } = universeCsv();
const files = { 'prices.csv': text };
const run = (...args: string[]) => runWith([screenCommand], ['screen', 'prices.csv', ...(args.includes('--threads') ? [] : ['--threads', '1']), ...args], files);
/** Column j of the CSV as written (six decimals), rows from..end. */
const column = (j: number, from: number) => Float64Array.from(text.trim().split('\n').slice(1 + from), (line) => Number(line.split(',')[1 + j]));

describe('mooring screen', () => {
  const json = JSON.parse(run('--json').stdout);

  it('screens every numeric column by default and leaves the text column out', () => {
    expect(json.series).toEqual(['c0m0', 'c0m1', 'c0m2', 'w0', 'w1']);
    expect(json.leftOut).toEqual(['Ticker']);
    // The unit-root tests call the walk w0 settled (order 0) on these 200 rows: its 8 directed pairs are set aside.
    expect(json.orders.map((o: { order: number }) => o.order)).toEqual([1, 1, 1, 0, 1]);
    expect(json.setAside).toHaveLength(8);
    expect(json.family.size).toBe(12);
    expect(json.pairs).toHaveLength(12);
  });

  it('gives each pair the fields y, x, statistic, pValue, adjustedPValue, beta, halfLife, zscore, and the chance sentence', () => {
    for (const p of json.pairs) {
      for (const key of ['y', 'x', 'orderY', 'orderX', 'statistic', 'pValue', 'adjustedPValue', 'beta', 'halfLife', 'zscore']) expect(p).toHaveProperty(key);
    }
    expect(json.chanceSentence).toMatch(/^Of 12 directed pairs tested at 5%, .* about 1 would pass by chance alone/);
    for (const p of json.setAside) for (const key of ['y', 'x', 'orderY', 'orderX', 'reason']) expect(p).toHaveProperty(key);
    expect(json.pairs.slice(0, 6).every((p: { y: string; x: string }) => p.y.startsWith('c0') && p.x.startsWith('c0'))).toBe(true);
  });

  it('tests the late series on the rows it shares, and its p-value is the single test on those rows', () => {
    const pair = json.pairs.find((p: { y: string; x: string }) => p.y === 'w1' && p.x === 'c0m0');
    expect(pair.nobs).toBe(140);
    const eg = engleGranger(column(4, 60), [column(0, 60)]);
    expect(Math.abs(pair.pValue - (eg.test.pValue as number))).toBeLessThan(1e-10);
    expect(pair.lastDate).toBe('2021-07-19');
  });

  it('takes --series, --alpha, the half-life range and --min-obs', () => {
    const some = JSON.parse(run('--series', 'c0m0,c0m1,w0', '--alpha', '1%', '--max-half-life', '5', '--min-obs', '150', '--json').stdout);
    expect(some.series).toEqual(['c0m0', 'c0m1', 'w0']);
    expect(some.alpha).toBe(0.01);
    expect(some.pairs.every((p: { halfLife: number | null }) => p.halfLife !== null && p.halfLife <= 5)).toBe(true);
    expect(some.chanceSentence).toContain('tested at 1%');
    const strict = JSON.parse(run('--min-obs', '150', '--json').stdout);
    // w1 shares 140 rows with each c0 series (6 directed pairs untested); its pairs with w0 are set aside already.
    expect(strict.untested).toHaveLength(6);
    expect(strict.setAside).toHaveLength(8);
    expect(strict.family.size).toBe(6);
  });

  it('with --johansen adds the trace rank of each pair', () => {
    const withRank = JSON.parse(run('--series', 'c0m0,c0m1', '--johansen', '--json').stdout);
    expect(withRank.pairs[0].johansenRank).toBe(1);
  });

  it('prints a ranked table with the chance sentence and the cautions', () => {
    const out = run('--top', '3');
    expect(out.code).toBe(0);
    expect(out.stdout).toContain('Pair screen of 5 series');
    expect(out.stdout).toContain('Of 12 directed pairs tested at 5%');
    expect(out.stdout).toMatch(/\n\s+1\s+c0m\d on c0m\d/);
    expect(out.stdout).toContain('... 9 more pairs');
    expect(out.stdout).toMatch(/Set aside\s+8 directed pairs, not ranked/);
    expect(out.stdout).toContain('Keep in mind');
  });

  it.each([
    [['--series', 'c0m0'], /at least two series; only 'c0m0'/],
    [['--series', 'c0m0,,w0'], /empty name/],
    [['--series', 'c0m0,Nope'], /No column is named 'Nope'/],
    [['--alpha', '0.9'], /--alpha must be a level between 0 and 0.5/],
    [['--max-half-life', 'soon'], /--max-half-life must be a number of rows/],
    [['--min-obs', '4'], /at least 10/],
    [['--threads', '0'], /--threads must be at least 1/],
  ])('refuses %j on one line with exit 2', (args, message) => {
    expect(expectOneLineRefusal(run(...(args as string[])))).toMatch(message);
  });
});
