import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { johansenTest } from '../../addin/johansen/johansen';
import { screenPairs, type ScreenResult } from '../../addin/screen/screen-pairs';
import { halfLife } from '../../addin/spread/half-life';
import { spreadSeries } from '../../addin/spread/spread-series';
import { zScore } from '../../addin/spread/z-score';
import { generatedUniverse } from './generated-universe';

/**
 * The screen must not change the answer: every directed pair's p-value, tau, lag count, hedge
 * ratio, half-life and z-score equal what the single-pair functions give for the same two
 * series on their shared rows. Tolerances: p-value 1e-10 absolute (the brief's); tau 1e-10
 * relative; beta and intercept 1e-10 relative; half-life and z-score 1e-9 relative. The screen
 * fits step 1 from cross products and refits the chosen lag through its Cholesky factor
 * where the single test uses QR; the largest differences measured are about 1e-14.
 */
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

function sharedRows(y: ArrayLike<number | null>, x: ArrayLike<number | null>): { y: Float64Array; x: Float64Array } {
  const ys: number[] = [];
  const xs: number[] = [];
  for (let t = 0; t < y.length; t++) {
    const a = y[t];
    const b = x[t];
    if (a !== null && b !== null && !Number.isNaN(a) && !Number.isNaN(b)) {
      ys.push(a);
      xs.push(b);
    }
  }
  return { y: Float64Array.from(ys), x: Float64Array.from(xs) };
}

function compareWithSinglePair(result: ScreenResult, series: { name: string; values: ArrayLike<number | null> }[], options: { lags?: 'aic' | 'bic' | 'tstat' | number } = {}) {
  const byName = new Map(series.map((s) => [s.name, s.values] as const));
  let worstP = 0;
  for (const pair of result.pairs) {
    const { y, x } = sharedRows(byName.get(pair.y)!, byName.get(pair.x)!);
    const eg = engleGranger(y, [x], { lags: options.lags });
    expect(pair.nobs).toBe(y.length);
    expect(pair.lags).toBe(eg.test.lags);
    expect(Math.abs(pair.pValue - (eg.test.pValue as number))).toBeLessThan(1e-10);
    expect(relative(pair.statistic as number, eg.test.statistic)).toBeLessThan(1e-10);
    expect(relative(pair.beta, eg.beta[0])).toBeLessThan(1e-10);
    expect(relative(pair.intercept, eg.intercept as number)).toBeLessThan(1e-10);
    const spread = spreadSeries(y, x, eg.beta[0], eg.intercept as number);
    const life = halfLife(spread).halfLife;
    if (life === null) expect(pair.halfLife).toBeNull();
    else expect(relative(pair.halfLife as number, life)).toBeLessThan(1e-9);
    const z = zScore(spread).values;
    expect(relative(pair.zscore as number, z[z.length - 1])).toBeLessThan(1e-9);
    worstP = Math.max(worstP, Math.abs(pair.pValue - (eg.test.pValue as number)));
  }
  return worstP;
}

describe('screen equals single-pair Engle-Granger on every directed pair', () => {
  // Seed 11: 3 clusters of 3 plus 4 walks, T = 400, 156 directed pairs. The unit-root tests call
  // c0m0 and c0m1 settled (order 0), so the 46 directed pairs with either are set aside and 110 are ranked.
  const universe = generatedUniverse(11, { clusters: 3, perCluster: 3, walks: 4, T: 400 });

  it('with the defaults (AIC): every one of the 110 ranked directed pairs, p-values within 1e-10 (measured worst about 1e-14)', () => {
    const result = screenPairs(universe.series);
    expect(result.pairs).toHaveLength(110);
    expect(result.pairs.length + result.setAside.length).toBe(156);
    expect(compareWithSinglePair(result, universe.series)).toBeLessThan(1e-12);
  });

  it('with BIC, the t-rule and a fixed 3 lags', () => {
    for (const lags of ['bic', 'tstat', 3] as const) {
      const result = screenPairs(universe.series.slice(0, 7), { lags });
      expect(result.pairs.length + result.setAside.length).toBe(42);
      expect(result.pairs.length).toBe(20);
      compareWithSinglePair(result, universe.series.slice(0, 7), { lags });
    }
  });

  it('with gaps: each pair is tested on the rows both series have, and agrees with the test on those rows', () => {
    const gapped = universe.series.slice(0, 6).map((s, j) => ({
      name: s.name,
      values: Array.from(s.values, (v, t) => ((t + 7 * j) % (11 + j) === 0 || (j === 2 && t < 60) ? null : v)),
    }));
    const result = screenPairs(gapped);
    expect(result.pairs.length + result.setAside.length).toBe(30);
    expect(result.pairs.length).toBeGreaterThanOrEqual(12);
    expect(new Set(result.pairs.map((p) => p.nobs)).size).toBeGreaterThan(3);
    compareWithSinglePair(result, gapped);
  });

  it('the matrix holds the same p-values, row = y and column = x, null on the diagonal', () => {
    const result = screenPairs(universe.series.slice(0, 5));
    const index = new Map(result.names.map((n, i) => [n, i] as const));
    for (const p of result.pairs) expect(result.matrix[index.get(p.y)!][index.get(p.x)!]).toBe(p.pValue);
    result.matrix.forEach((row, i) => expect(row[i]).toBeNull());
    expect(result.matrix.flat().filter((v) => v !== null)).toHaveLength(result.pairs.length);
    for (const p of result.setAside) expect(result.matrix[index.get(p.y)!][index.get(p.x)!]).toBeNull();
  });

  it('with the Johansen option, each pair carries the trace rank that johansenTest gives the pair', () => {
    const series = universe.series.slice(2, 6);
    const result = screenPairs(series, { johansen: true });
    const byName = new Map(series.map((s) => [s.name, s.values] as const));
    for (const p of result.pairs) {
      const rank = johansenTest([byName.get(p.y)!, byName.get(p.x)!], { case: 'constant', lags: 1 }).rank.trace;
      expect(p.johansenRank).toBe(rank);
    }
    expect(screenPairs(series).pairs[0].johansenRank).toBeUndefined();
  });
});
