import { describe, expect, it } from 'vitest';
import { adfTest } from '../../addin/unitroot/adf';
import { kpssTest } from '../../addin/unitroot/kpss';
import { phillipsPerronTest } from '../../addin/unitroot/phillips-perron';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

/**
 * Monte Carlo size and power. The tolerance of +/- 1.5 points for a 5% test on 2,000
 * replications is about three binomial standard errors (sqrt(0.05 * 0.95 / 2000) = 0.49 points).
 */
function rejectionRate(reps: number, draw: () => number | null, alpha = 0.05): number {
  let rejected = 0;
  for (let r = 0; r < reps; r++) {
    const p = draw();
    if (p !== null && p < alpha) rejected++;
  }
  return rejected / reps;
}

describe('size and power of the unit-root tests', () => {
  it('ADF (constant, AIC lags) at 5% on 2,000 random walks, T = 250, seed 2025: rejects 5% +/- 1.5 points', () => {
    const rng = new SeededRandom(2025);
    const rate = rejectionRate(2000, () => adfTest(randomWalk(rng, 250, { start: 100 })).pValue);
    expect(Math.abs(rate - 0.05)).toBeLessThanOrEqual(0.015);
  });
  it('KPSS (level, automatic bandwidth) at 5% on 2,000 white-noise series, T = 250, seed 2026: rejects 5% +/- 1.5 points', () => {
    const rng = new SeededRandom(2026);
    const rate = rejectionRate(2000, () => kpssTest(rng.normals(250)).pValue);
    expect(Math.abs(rate - 0.05)).toBeLessThanOrEqual(0.015);
  });
  it('Phillips-Perron Z-tau at 5% on 2,000 random walks, T = 250, seed 2027: rejects 5% +/- 1.5 points', () => {
    const rng = new SeededRandom(2027);
    const rate = rejectionRate(2000, () => phillipsPerronTest(randomWalk(rng, 250)).pValue);
    expect(Math.abs(rate - 0.05)).toBeLessThanOrEqual(0.015);
  });
  it('ADF power: rejects at least 90% of 1,000 AR(1) series with phi = 0.9, T = 500, seed 2028', () => {
    const rng = new SeededRandom(2028);
    const rate = rejectionRate(1000, () => adfTest(autoregressive1(rng, 500, 0.9)).pValue);
    expect(rate).toBeGreaterThanOrEqual(0.9);
  });
});
