/**
 * KPSS takes its Bartlett long-run variance from window sums (O(n)) instead of lag-by-lag
 * autocovariances (O(n L)). The reference here is the lag-by-lag route the test used before,
 * rebuilt from its parts (the series brought to unit scale, residuals from the mean or the
 * fitted trend, the Newey-West (1994) bandwidth, bartlettLongRunVariance with n (L + 1) below
 * BARTLETT_WINDOW_WORK so it sums lag by lag): the statistic and the long-run variance must agree
 * to 1e-12 relative and the bandwidth exactly, on seeded walks, noise, AR(1) series, trending
 * series and over-differenced noise, with the automatic bandwidth and fixed ones up to n - 1.
 * Over-differenced noise is the exception: there the Bartlett sum is far below c0, so the
 * lag-by-lag sum cancels and is itself ~1e-12 off; both routes are compared instead with the
 * lag-by-lag sum taken in twice the working precision (Ogita, Rump & Oishi 2005, Dot2: every
 * product and every addition carries its rounding error), the window route to 1e-13 and the
 * lag-by-lag route to 1e-11.
 */
import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { toUnitScale } from '../../addin/linalg/power-of-two-scale';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { BARTLETT_WINDOW_WORK, bartlettLongRunVariance, neweyWestBandwidth } from '../../addin/regression/long-run-variance';
import { detrendedResiduals, kpssTest } from '../../addin/unitroot/kpss';

function lagByLagKpss(series: Float64Array, deterministic: 'const' | 'trend', requested: number | 'auto') {
  const unit = toUnitScale(series);
  const e = detrendedResiduals(unit.values, deterministic);
  const n = e.length;
  const bandwidth = requested === 'auto' ? neweyWestBandwidth(e) : requested;
  expect(n * (bandwidth + 1)).toBeLessThanOrEqual(BARTLETT_WINDOW_WORK);
  const lrv = bartlettLongRunVariance(e, bandwidth);
  let partial = 0;
  let sumSquares = 0;
  for (let t = 0; t < n; t++) {
    partial += e[t];
    sumSquares += partial * partial;
  }
  const accurate = accurateLongRunVariance(e, bandwidth);
  return {
    statistic: sumSquares / (n * n) / lrv,
    bandwidth,
    lrv: lrv / unit.factor / unit.factor,
    accurateStatistic: sumSquares / (n * n) / accurate,
  };
}

/** x = a + b exactly (Knuth's TwoSum). */
function twoSum(a: number, b: number): [number, number] {
  const x = a + b;
  const z = x - a;
  return [x, a - (x - z) + (b - z)];
}

/** x = a b exactly (Dekker's TwoProduct, with Veltkamp's split). */
function twoProduct(a: number, b: number): [number, number] {
  const x = a * b;
  const split = (v: number): [number, number] => {
    const c = 134217729 * v;
    const hi = c - (c - v);
    return [hi, v - hi];
  };
  const [a1, a2] = split(a);
  const [b1, b2] = split(b);
  return [x, a2 * b2 - (x - a1 * b1 - a2 * b1 - a1 * b2)];
}

/** The Bartlett-weighted sum c0 + 2 sum (1 - i/(L+1)) c_i / n, every c_i in twice the working precision. */
function accurateLongRunVariance(e: Float64Array, L: number): number {
  const n = e.length;
  let high = 0;
  let low = 0;
  for (let i = 0; i <= L; i++) {
    let s = 0;
    let err = 0;
    for (let t = i; t < n; t++) {
      const [p, pe] = twoProduct(e[t], e[t - i]);
      const [q, qe] = twoSum(s, p);
      s = q;
      err += pe + qe;
    }
    const weight = i === 0 ? 1 : 2 * (1 - i / (L + 1));
    const [wh, we] = twoProduct(weight, s);
    const [h, he] = twoSum(high, wh);
    high = h;
    low += he + we + weight * err;
  }
  return (high + low) / n;
}

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

const noise = new SeededRandom(1601).normals(10_001);
const cases: [string, Float64Array, 'plain' | 'cancelling'][] = [
  ['a random walk of 10,000', randomWalk(new SeededRandom(11), 10_000, { start: 100 }), 'plain'],
  ['a random walk of 2,500 with drift', randomWalk(new SeededRandom(1602), 2500, { start: 50, drift: 0.05 }), 'plain'],
  ['noise of 10,001', noise, 'plain'],
  ['an AR(1) with phi 0.9', autoregressive1(new SeededRandom(1603), 5000, 0.9), 'plain'],
  ['over-differenced noise', noise.slice(1).map((v, i) => v - noise[i]), 'cancelling'],
  ['prices of 1e6 (a walk times 1e4)', randomWalk(new SeededRandom(1604), 3000, { start: 100 }).map((v) => v * 1e4), 'plain'],
  ['a short series of 12', new SeededRandom(1605).normals(12), 'plain'],
];

describe('KPSS long-run variance from window sums equals the lag-by-lag route', () => {
  for (const [name, series, kind] of cases) {
    for (const deterministic of ['const', 'trend'] as const) {
      const n = series.length;
      const fixed = [0, 1, 8, Math.min(63, n - 1), n - 1].filter((L) => n * (L + 1) <= BARTLETT_WINDOW_WORK);
      for (const bandwidth of ['auto' as const, ...fixed]) {
        it(`${name}, ${deterministic}, bandwidth ${bandwidth}: statistic and long-run variance to 1e-12, same bandwidth`, () => {
          const expected = lagByLagKpss(series, deterministic, bandwidth);
          const r = kpssTest(series, { deterministic, bandwidth });
          expect(r.bandwidth).toBe(expected.bandwidth);
          if (kind === 'plain') {
            expect(relative(r.statistic, expected.statistic)).toBeLessThan(1e-12);
            const lrv = r.details?.find((d) => d.key === 'longRunVariance')?.value as number;
            expect(relative(lrv, expected.lrv)).toBeLessThan(1e-12);
          } else {
            expect(relative(r.statistic, expected.accurateStatistic)).toBeLessThan(1e-13);
            expect(relative(expected.statistic, expected.accurateStatistic)).toBeLessThan(1e-11);
          }
        });
      }
    }
  }

  it('a bandwidth that is not a whole number in 0..n-1 is still refused with the long-run variance message', () => {
    const series = new SeededRandom(1606).normals(50);
    for (const bad of [-1, 2.5, 50, 1000]) {
      expect(() => kpssTest(series, { bandwidth: bad })).toThrow(MooringInputError);
      expect(() => kpssTest(series, { bandwidth: bad })).toThrow(/bandwidth/);
    }
  });
});
