import { describe, expect, it } from 'vitest';
import { johansenTest, type JohansenCase } from '../../addin/johansen/johansen';
import { SeededRandom, randomWalk } from '../../addin/random';
import { rejects } from '../../addin/result';

/**
 * Monte Carlo size of the trace test of "no long-run relation" (r = 0) for two independent
 * random walks: 2,000 replications of T = 250 rows, K = 1, one seed per design.
 * Rejection is counted against the 5% critical value the result reports (published,
 * MacKinnon, Haug & Michelis 1999, for 'none', 'constant' and 'trend'; Mooring's simulation
 * for the restricted cases) and, separately, by the simulated p-value below 0.05.
 *
 * Each case's critical values assume its own kind of data: 'none' driftless walks from 0,
 * 'restricted-constant' driftless walks at any level, 'constant' and 'restricted-trend'
 * drifting walks. Tolerance: within 2 percentage points of 5% (the Monte Carlo standard
 * error at 5% is 0.49 points). Rates with these seeds, by critical value / by p-value:
 * none 5.05% / 4.80%, constant 4.80% / 4.65%, restricted-constant 5.05% / 5.05%,
 * restricted-trend 6.60% / 6.60% (a finite-sample excess: 4.6% at T = 1,000, same seed).
 *
 * Driftless walks in the 'constant' case are the reason for its drift warning: they
 * over-reject (12.2% with seed 4103). Likewise merely drifting walks in the 'trend' case,
 * whose values assume quadratic trends (22.5% with seed 4106).
 */
const REPLICATIONS = 2000;
const ROWS = 250;

function rejectionRates(seed: number, caseName: JohansenCase, drifts: [number, number], starts: [number, number] = [0, 0]): { byCritical: number; byPValue: number } {
  const rng = new SeededRandom(seed);
  let byCritical = 0;
  let byPValue = 0;
  for (let i = 0; i < REPLICATIONS; i++) {
    const block = [randomWalk(rng, ROWS, { drift: drifts[0], start: starts[0] }), randomWalk(rng, ROWS, { drift: drifts[1], start: starts[1] })];
    const first = johansenTest(block, { case: caseName, lags: 1 }).trace[0];
    if (first.statistic > first.critical['5%']) byCritical++;
    if (rejects(first, 0.05)) byPValue++;
  }
  return { byCritical: byCritical / REPLICATIONS, byPValue: byPValue / REPLICATIONS };
}

describe('Johansen trace test size (seeded Monte Carlo, 2,000 replications, T = 250, K = 1)', () => {
  it("'none' on two driftless walks rejects within 2 points of 5% (seed 4101)", () => {
    const rate = rejectionRates(4101, 'none', [0, 0]);
    expect(Math.abs(rate.byCritical - 0.05)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rate.byPValue - 0.05)).toBeLessThanOrEqual(0.02);
  });

  it("'constant' on two drifting walks (drifts 0.5 and -0.3 per row) rejects within 2 points of 5% (seed 4102)", () => {
    const rate = rejectionRates(4102, 'constant', [0.5, -0.3]);
    expect(Math.abs(rate.byCritical - 0.05)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rate.byPValue - 0.05)).toBeLessThanOrEqual(0.02);
  });

  it("'constant' on two driftless walks over-rejects: at least 9% at the 5% level (seed 4103)", () => {
    const rate = rejectionRates(4103, 'constant', [0, 0]);
    expect(rate.byCritical).toBeGreaterThanOrEqual(0.09);
  });

  it("'trend' on two merely drifting walks over-rejects: at least 12% at the 5% level (seed 4106; the reason for its warning)", () => {
    const rate = rejectionRates(4106, 'trend', [0.5, -0.3]);
    expect(rate.byCritical).toBeGreaterThanOrEqual(0.12);
  });

  it("'restricted-constant' on two driftless walks away from zero (starts 10 and -5) rejects within 2 points of 5% (seed 4104)", () => {
    const rate = rejectionRates(4104, 'restricted-constant', [0, 0], [10, -5]);
    expect(Math.abs(rate.byCritical - 0.05)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rate.byPValue - 0.05)).toBeLessThanOrEqual(0.02);
  });

  it("'restricted-trend' on two drifting walks rejects within 2 points of 5% (seed 4105)", () => {
    const rate = rejectionRates(4105, 'restricted-trend', [0.5, -0.3], [10, -5]);
    expect(Math.abs(rate.byCritical - 0.05)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rate.byPValue - 0.05)).toBeLessThanOrEqual(0.02);
  });
});
