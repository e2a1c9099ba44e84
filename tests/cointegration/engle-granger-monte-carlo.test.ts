import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';

/**
 * Size and power of the Engle-Granger test at the 5% level (p-value below 0.05), T = 250.
 * Each test states its seed, replications and tolerance; the binomial standard error of a
 * rejection rate near 5% from 2,000 draws is sqrt(0.05 * 0.95 / 2000) = 0.49 points.
 */
const T = 250;

describe('Engle-Granger size: 2,000 seeded pairs of independent random walks, T = 250', () => {
  // Seed 20240601; the same 2,000 pairs feed both rules below.
  const rng = new SeededRandom(20240601);
  const pairs = Array.from({ length: 2000 }, () => [randomWalk(rng, T), randomWalk(rng, T)] as const);
  const rate = (lags: 'aic' | number): number => pairs.filter(([y, x]) => (engleGranger(y, [x], { lags }).test.pValue as number) < 0.05).length / pairs.length;

  it('with 0 lags (the true order: the walks have independent shocks) rejects 5% +/- 1.5 points (about 3 standard errors)', () => {
    const r = rate(0);
    expect(r).toBeGreaterThan(0.035);
    expect(r).toBeLessThan(0.065);
  });

  it('with the product default (AIC lag search) rejects 5% +/- 1.5 points (this seed: 5.6%)', () => {
    // The true AIC size is about 5.9% (a 20,000-pair run of the same design gave 5.94%): AIC adds
    // lags and the p-value is asymptotic. It lies inside the band, but close to its edge, so a
    // different seed could fail this check by chance; the seed is fixed, and the closing note says so.
    const r = rate('aic');
    expect(r).toBeGreaterThanOrEqual(0.035);
    expect(r).toBeLessThanOrEqual(0.065);
  });
});

describe('Engle-Granger power: 1,000 seeded cointegrated pairs, spread AR(1) with phi = 0.9, T = 250', () => {
  it('rejects no cointegration at least 80% of the time with the default AIC lags (measured 85%; binomial s.e. 1.1 points)', () => {
    // Seed 7; y = 1 + x + u, x a random walk, u AR(1) with phi = 0.9 started from its stationary law.
    const rng = new SeededRandom(7);
    let rejections = 0;
    const R = 1000;
    for (let r = 0; r < R; r++) {
      const x = randomWalk(rng, T);
      const u = autoregressive1(rng, T, 0.9);
      const y = x.map((v, i) => 1 + v + u[i]);
      if ((engleGranger(y, [x]).test.pValue as number) < 0.05) rejections++;
    }
    expect(rejections / R).toBeGreaterThanOrEqual(0.8);
  });
});
