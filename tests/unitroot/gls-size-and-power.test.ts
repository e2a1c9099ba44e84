import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../addin/random';
import { adfTest } from '../../addin/unitroot/adf';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';

/**
 * Size and power by seeded Monte Carlo, DF-GLS and Ng-Perron against ADF (AIC lags) on the
 * same draws: y_t = 100 + u_t, u_t = phi u_{t-1} + e_t + theta e_{t-1}, e iid N(0, 1), u_0 = 0,
 * T = 200, 600 replications per design. At 5% the binomial standard error of a rate is 0.9
 * points, so sizes are checked within 2.7 points (three standard errors) and power gaps of at
 * least 10 points are asked for where the study below found 20 or more.
 */
const T = 200;
const REPS = 600;

function draws(seed: number, phi: number, theta: number): Float64Array[] {
  const rng = new SeededRandom(seed);
  return Array.from({ length: REPS }, () => {
    const y = new Float64Array(T);
    let u = 0;
    let previous = rng.normal();
    for (let t = 0; t < T; t++) {
      const e = rng.normal();
      u = phi * u + e + theta * previous;
      previous = e;
      y[t] = 100 + u;
    }
    return y;
  });
}

function rate(series: Float64Array[], pValue: (y: Float64Array) => number | null): number {
  return series.filter((y) => (pValue(y) ?? 1) < 0.05).length / series.length;
}

describe(`size and power at 5%, T = ${T}, ${REPS} replications`, () => {
  it('size, random walk, constant (seed 8101): DF-GLS (maic) and Ng-Perron MZa within 2.7 points of 5%', () => {
    const ys = draws(8101, 1, 0);
    expect(Math.abs(rate(ys, (y) => dfglsTest(y).pValue) - 0.05)).toBeLessThanOrEqual(0.027);
    expect(Math.abs(rate(ys, (y) => ngPerronTest(y).pValue) - 0.05)).toBeLessThanOrEqual(0.027);
  });

  it('power, phi = 0.95, constant (seed 8102): DF-GLS and MZa reject at least 10 points more often than ADF on the same series', () => {
    const ys = draws(8102, 0.95, 0);
    const adf = rate(ys, (y) => adfTest(y).pValue);
    expect(rate(ys, (y) => dfglsTest(y).pValue)).toBeGreaterThanOrEqual(adf + 0.1);
    expect(rate(ys, (y) => ngPerronTest(y).pValue)).toBeGreaterThanOrEqual(adf + 0.1);
  });

  it('power at the local alternative phi = 1 - 7/T, constant (seed 8103): DF-GLS rejects at least 10 points more often than ADF', () => {
    const ys = draws(8103, 1 - 7 / T, 0);
    expect(rate(ys, (y) => dfglsTest(y).pValue)).toBeGreaterThanOrEqual(rate(ys, (y) => adfTest(y).pValue) + 0.1);
  });

  it('why maic is the default: with a negative moving average (theta = -0.5), trend (seed 8104), DF-GLS with maic keeps its size within 2.7 points of 5%, with aic it rejects too often (above 9%), as does ADF', () => {
    const ys = draws(8104, 1, -0.5);
    expect(Math.abs(rate(ys, (y) => dfglsTest(y, { deterministic: 'trend' }).pValue) - 0.05)).toBeLessThanOrEqual(0.027);
    expect(Math.abs(rate(ys, (y) => ngPerronTest(y, { deterministic: 'trend' }).pValue) - 0.05)).toBeLessThanOrEqual(0.027);
    expect(rate(ys, (y) => dfglsTest(y, { deterministic: 'trend', lags: 'aic' }).pValue)).toBeGreaterThan(0.09);
    expect(rate(ys, (y) => adfTest(y, { deterministic: 'trend' }).pValue)).toBeGreaterThan(0.09);
  });
});

describe('integration order with DF-GLS on the levels (an option; ADF stays the default and tests the differences)', () => {
  it(`on 200 AR(1) series with phi = 0.95, T = ${T} (seed 8105), DF-GLS calls I(0) at least 10 points more often than ADF; both call a random walk I(1)`, async () => {
    const { integrationOrder } = await import('../../addin/unitroot/integration-order');
    const ys = draws(8105, 0.95, 0).slice(0, 200);
    const share = (test: 'adf' | 'dfgls') => ys.filter((y) => integrationOrder(y, { unitRootTest: test, highestDifference: 1 }).order === 0).length / ys.length;
    expect(share('dfgls')).toBeGreaterThanOrEqual(share('adf') + 0.1);
    const walk = draws(8106, 1, 0)[0];
    const byGls = integrationOrder(walk, { unitRootTest: 'dfgls' });
    expect(byGls.order).toBe(1);
    expect(byGls.steps.map((s) => [s.differences, s.adf.test])).toEqual([[2, 'ADF'], [1, 'ADF'], [0, 'DF-GLS']]);
    expect(byGls.verdict).toMatch(/DF-GLS on the levels/);
    expect(integrationOrder(walk).steps.every((s) => s.adf.test === 'ADF')).toBe(true);
    expect(() => integrationOrder(walk, { unitRootTest: 'dfgls', deterministic: 'none' })).toThrow(/DF-GLS always removes/);
  });
});
