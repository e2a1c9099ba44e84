/**
 * The moving hedge ratio against the reference library: statsmodels 0.13.5's linear Gaussian
 * state-space model with the design [1, x_t], identity transition, state covariance Q I,
 * observation variance R and exact diffuse initialisation (fixture kalman.json, made by
 * tests/reference/makers/state_space.py), on the macro data's log real consumption on log
 * real GDP, the Danish money demand (lrm on lry) and the seeded pair.
 *
 * With fixed variances: filtered and smoothed intercept and slope and their standard deviations,
 * the one-step-ahead errors and their variances, to 1e-7 (relative, or absolute below 1), and the
 * exact diffuse log-likelihood to 1e-9 relative. With estimated variances: our maximum is at
 * least the library's best maximum (several starts) minus 0.01.
 */
import { describe, expect, it } from 'vitest';
import { diffuseFilter } from '../../addin/kalman/diffuse-filter';
import { diffuseSmoother } from '../../addin/kalman/diffuse-smoother';
import { movingHedge } from '../../addin/kalman/moving-hedge';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const fixture = loadFixture<Fixtures['kalman']>('kalman');
const TOL = 1e-7;

/** Largest |ours - theirs| / max(|theirs|, 1) over rows from `from` on. */
function worst(ours: ArrayLike<number | null>, theirs: readonly (number | null)[], from = 0): number {
  let w = 0;
  for (let t = from; t < theirs.length; t++) {
    const a = ours[t] as number;
    const b = theirs[t] as number;
    w = Math.max(w, Math.abs(a - b) / Math.max(Math.abs(b), 1));
  }
  return w;
}

describe('moving hedge ratio: fixed variances against statsmodels 0.13.5 (exact diffuse state space)', () => {
  for (const c of fixture.cases.filter((k) => k.kind === 'fixed')) {
    it(`${c.y} on ${c.x}, Q = ${c.stateVar}, R = ${c.obsVar}`, () => {
      const y = fixtureSeries(fixture, c.y);
      const x = fixtureSeries(fixture, c.x);
      const path = diffuseFilter({ y, x, stateVar: c.stateVar, obsVar: c.obsVar });
      const smooth = diffuseSmoother(path, x);
      expect(path.diffuseRows).toBe(c.nobsDiffuse);
      expect(Math.abs(path.logLikelihood - c.logLikelihood) / Math.abs(c.logLikelihood)).toBeLessThan(1e-9);
      expect(worst(path.filteredA, c.filteredIntercept!)).toBeLessThan(TOL);
      expect(worst(path.filteredB, c.filteredSlope!)).toBeLessThan(TOL);
      // The library's filtered variance in the diffuse period is its finite part only; from the
      // period's last row on it is the whole variance, as ours.
      const d = path.diffuseRows - 1;
      const std = (p: Float64Array, k: number) => Array.from({ length: path.n }, (_, t) => Math.sqrt(Math.max(p[3 * t + k], 0)));
      expect(worst(std(path.filteredStar, 0), c.filteredInterceptStd!, d)).toBeLessThan(TOL);
      expect(worst(std(path.filteredStar, 2), c.filteredSlopeStd!, d)).toBeLessThan(TOL);
      expect(worst(smooth.intercept, c.smoothedIntercept!)).toBeLessThan(TOL);
      expect(worst(smooth.slope, c.smoothedSlope!)).toBeLessThan(TOL);
      expect(worst(Array.from(smooth.interceptVar, Math.sqrt), c.smoothedInterceptStd!)).toBeLessThan(TOL);
      expect(worst(Array.from(smooth.slopeVar, Math.sqrt), c.smoothedSlopeStd!)).toBeLessThan(TOL);
      expect(worst(path.v, c.forecastError!)).toBeLessThan(TOL);
      expect(worst(path.F, c.forecastErrorVar!, path.diffuseRows)).toBeLessThan(TOL);
    });
  }
});

describe('moving hedge ratio: maximum likelihood against the library\'s maximum', () => {
  for (const c of fixture.cases.filter((k) => k.kind === 'estimated')) {
    it(`${c.y} on ${c.x}: our log-likelihood >= statsmodels' ${c.logLikelihood.toFixed(3)} - 0.01`, () => {
      const got = movingHedge(fixtureSeries(fixture, c.y), fixtureSeries(fixture, c.x), { y: c.y, x: c.x });
      expect(got.variances).toBe('estimated');
      expect(got.logLikelihood).toBeGreaterThanOrEqual(c.logLikelihood - 0.01);
      // The same likelihood the filter gives at those variances (the concentration is exact).
      const again = diffuseFilter({ y: fixtureSeries(fixture, c.y), x: fixtureSeries(fixture, c.x), stateVar: got.stateVar, obsVar: got.obsVar });
      expect(Math.abs(again.logLikelihood - got.logLikelihood)).toBeLessThan(1e-8 * Math.abs(got.logLikelihood));
    });
  }
});
