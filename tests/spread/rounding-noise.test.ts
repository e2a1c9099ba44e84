import { describe, expect, it } from 'vitest';
import { hedgeCommand } from '../../addin/cli/commands/hedge';
import { spreadCommand } from '../../addin/cli/commands/spread';
import { hedgeRatios } from '../../addin/cointegration/hedge-ratio';
import { EXACT_FIT_R_SQUARED } from '../../addin/cointegration/cointegrating-regression';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { roundingNoiseOf } from '../../addin/spread/rounding-noise';
import { spreadSeries } from '../../addin/spread/spread-series';
import { halflife, zscore } from '../../functions/functions';
import { expectOneLineRefusal, runWith } from '../cli/cli-harness';
import { cellErrorOf, column } from '../functions/cell-shapes';

/**
 * A spread of rounding noise is answered as such on every surface, by one engine check
 * (addin/spread/rounding-noise.ts, the Engle-Granger exact-fit rule R^2 >= 1 - 100 sqrt(eps)):
 * two identical series gave a half-life of 1.82 periods and a z-score of -4.65 from a spread of
 * about 1e-14 on the command line, and hedge a dynamic-OLS standard error of 9e-31 (t = 1e30),
 * while the formulas already answered #N/A. Data: SeededRandom walks (seed 21).
 */
const T = 250;
const rng = new SeededRandom(21);
const walk = randomWalk(rng, T, { start: 50, sigma: 0.5 });
const noise = autoregressive1(rng, T, 0.7, 0.3);
const related = walk.map((v, t) => 10 + 2 * v + noise[t]);
/** Y equals X but for the last digit (a copied column that went through a formula). */
const copy = walk.map((v) => v * (1 + 1e-15) + 1e-13);

function csv(ys: Float64Array, xs: Float64Array): string {
  const lines = ['Date,Y,X'];
  for (let t = 0; t < T; t++) lines.push(`${new Date(Date.UTC(2022, 0, 3 + t)).toISOString().slice(0, 10)},${ys[t].toPrecision(17)},${xs[t].toPrecision(17)}`);
  return `${lines.join('\n')}\n`;
}
const copyFiles = { 'p.csv': csv(copy, walk) };
const realFiles = { 'p.csv': csv(related, walk) };

describe('the engine check', () => {
  it('finds a copied column (R^2 at the exact-fit rule) and names the series, and passes a real pair', () => {
    const line = hedgeRatios(copy, walk).ols;
    const found = roundingNoiseOf(copy, spreadSeries(copy, walk, line.beta, line.intercept), { y: 'Y', xs: ['X'] });
    expect(found?.rSquared).toBeGreaterThanOrEqual(EXACT_FIT_R_SQUARED);
    expect(found?.message).toMatch(/^Y is an exact combination of X \(R² = 1\.0000000\), so the spread is rounding noise/);
    const real = hedgeRatios(related, walk).ols;
    expect(roundingNoiseOf(related, spreadSeries(related, walk, real.beta, real.intercept), { y: 'Y', xs: ['X'] })).toBeNull();
  });

  it('asks the same of a given line: y - x of a copy is noise, y - 2 x - 10 of the related pair is not', () => {
    expect(roundingNoiseOf(copy, spreadSeries(copy, walk, 1, 0), { y: 'Y', xs: ['X'] })).not.toBeNull();
    expect(roundingNoiseOf(related, spreadSeries(related, walk, 2, 10), { y: 'Y', xs: ['X'] })).toBeNull();
  });
});

describe('every surface answers a copied column the same way', () => {
  const message = (() => {
    const line = hedgeRatios(copy, walk).ols;
    return roundingNoiseOf(copy, spreadSeries(copy, walk, line.beta, line.intercept), { y: 'Y', xs: ['X'] })?.message as string;
  })();

  it('mooring spread refuses on one line with the sentence, for the default line, another estimator and a given one', () => {
    for (const extra of [[], ['--hedge', 'tls'], ['--hedge', 'dols'], ['--beta', '1'], ['--json']]) {
      const out = runWith([spreadCommand], ['spread', 'p.csv', '--y', 'Y', '--x', 'X', '--window', '30', ...extra], copyFiles);
      const line = expectOneLineRefusal(out);
      expect(line).toContain('so the spread is rounding noise');
      expect(line).not.toMatch(/half-life|z-score/i);
    }
    const first = expectOneLineRefusal(runWith([spreadCommand], ['spread', 'p.csv', '--y', 'Y', '--x', 'X'], copyFiles));
    expect(first).toBe(`mooring: ${message}`);
  });

  it('mooring spread still answers a real pair, with the given line of the issue (beta 2, intercept 10)', () => {
    const out = runWith([spreadCommand], ['spread', 'p.csv', '--y', 'Y', '--x', 'X', '--beta', '2', '--intercept', '10', '--window', '30', '--json'], realFiles);
    expect(out.code).toBe(0);
    const json = JSON.parse(out.stdout);
    expect(json.rollingZscore.filter((z: number | null) => z === null)).toHaveLength(29);
  });

  it('mooring hedge leaves out the dynamic-OLS standard error, t and p with the sentence; the slopes stay', () => {
    const out = runWith([hedgeCommand], ['hedge', 'p.csv', '--y', 'Y', '--x', 'X', '--json'], copyFiles);
    expect(out.code).toBe(0);
    const text = out.stdout;
    expect(text).toContain('so the spread is rounding noise');
    expect(text).not.toMatch(/e-(2\d|3\d)\b/);
    expect(text).not.toMatch(/e\+(2\d|3\d)\b/);
    const terminal = runWith([hedgeCommand], ['hedge', 'p.csv', '--y', 'Y', '--x', 'X'], copyFiles).stdout;
    expect(terminal).toContain('rounding noise');
    expect(terminal).not.toMatch(/e-(2\d|3\d)\b|e\+(2\d|3\d)\b/);
    const real = hedgeRatios(related, walk);
    expect(real.dynamicOls.standardError).toBeGreaterThan(0);
    expect(real.dynamicOls.note).not.toContain('rounding noise');
  });

  it('the formulas answer #N/A with the same sentence', () => {
    expect(cellErrorOf(() => halflife(column(Array.from(copy)), column(Array.from(walk))), '#N/A')).toContain('so the spread is rounding noise');
    expect(cellErrorOf(() => zscore(column(Array.from(copy)), column(Array.from(walk)), 30), '#N/A')).toContain('so the spread is rounding noise');
  });

  it('the report gives no half-life or z-score for the pair', () => {
    const report = diagnose({ series: [{ name: 'Y', values: copy }, { name: 'X', values: walk }] });
    const text = JSON.stringify(report.pairs[0]);
    expect(text).not.toMatch(/"halfLife":\d/);
    expect(text).not.toMatch(/"latestZ":-?\d/);
  });
});
