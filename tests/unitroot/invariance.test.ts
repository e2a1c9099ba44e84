import { describe, expect, it } from 'vitest';
import { adfTest } from '../../addin/unitroot/adf';
import { adfRegression } from '../../addin/unitroot/adf-regression';
import { phillipsPerronTest } from '../../addin/unitroot/phillips-perron';
import { kpssTest } from '../../addin/unitroot/kpss';
import { SeededRandom, randomWalk } from '../../addin/random';
import type { Deterministic } from '../../addin/result';

const rng = new SeededRandom(99);
const walk = randomWalk(rng, 300, { start: 50, sigma: 0.8 });

describe('invariances of the unit-root statistics', () => {
  for (const d of ['none', 'const', 'trend'] as Deterministic[]) {
    it(`ADF (${d}) is unchanged, lag choice included, when the series is scaled by 1,000 or by 0.001`, () => {
      const base = adfTest(walk, { deterministic: d });
      for (const scale of [1000, 0.001]) {
        const scaled = adfTest(walk.map((v) => v * scale), { deterministic: d });
        expect(scaled.lags).toBe(base.lags);
        expect(scaled.statistic).toBeCloseTo(base.statistic, 9);
      }
    });
  }
  for (const d of ['const', 'trend'] as Deterministic[]) {
    it(`ADF (${d}) is unchanged when the series is shifted by 10,000`, () => {
      const base = adfTest(walk, { deterministic: d });
      const shifted = adfTest(walk.map((v) => v + 10_000), { deterministic: d });
      expect(shifted.lags).toBe(base.lags);
      expect(shifted.statistic).toBeCloseTo(base.statistic, 8);
    });
  }
  it('KPSS is unchanged by scaling and shifting', () => {
    const base = kpssTest(walk);
    const moved = kpssTest(walk.map((v) => 3 * v - 7));
    expect(moved.bandwidth).toBe(base.bandwidth);
    expect(moved.statistic).toBeCloseTo(base.statistic, 10);
  });
});

describe('Phillips-Perron reduces to Dickey-Fuller without serial-correlation correction', () => {
  // With bandwidth 0 the long-run variance equals SSR/n, so Z-tau = tau * sqrt((SSR/n)/(SSR/n))
  // minus a zero correction (Phillips & Perron 1988): Z-tau is the lag-0 DF t-ratio and
  // Z-alpha = n * (rho - 1).
  for (const d of ['none', 'const', 'trend'] as Deterministic[]) {
    it(`bandwidth 0, ${d}: Z-tau = DF tau and Z-alpha = n (rho - 1)`, () => {
      const pp = phillipsPerronTest(walk, { deterministic: d, bandwidth: 0 });
      const df = adfRegression(walk, 0, d);
      expect(pp.statistic).toBeCloseTo(df.tau, 12);
      const zAlpha = pp.details.find((x) => x.key === 'zAlpha')?.value as number;
      expect(zAlpha).toBeCloseTo(df.nobs * df.gamma, 10);
    });
  }
  it('a positive correction for positively autocorrelated errors moves Z-tau away from tau', () => {
    const ar = new Float64Array(400);
    const r = new SeededRandom(5);
    let e = 0;
    for (let t = 1; t < 400; t++) {
      e = 0.6 * e + r.normal();
      ar[t] = ar[t - 1] + e; // unit root with AR(1) errors
    }
    const pp = phillipsPerronTest(ar, { bandwidth: 8 });
    const df = adfRegression(ar, 0, 'const');
    expect(Math.abs(pp.statistic - df.tau)).toBeGreaterThan(0.1);
  });
});
