/**
 * VECM forecasts against the reference library: statsmodels 0.13.5's VECM(...).fit().predict(steps,
 * alpha=0.05) in all five deterministic cases (fixture vecm-forecast.json, makers/forecast.py; the
 * case mapping is in tests/reference/README.md), on the seeded systems sys3 (K = 1, 2) and sys4
 * (rank 2) and the Danish money-demand data. Forecasts, the 95% bounds and the residual
 * covariance to 1e-9 (relative, or absolute below 1).
 */
import { describe, expect, it } from 'vitest';
import { vecmForecast } from '../../addin/forecast/vecm-forecast';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const fixture = loadFixture<Fixtures['vecm-forecast']>('vecm-forecast');
const TOL = 1e-9;
const off = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1);

describe('VECM forecast against statsmodels 0.13.5 VECM predict', () => {
  for (const c of fixture.cases) {
    it(`${c.series.join(', ')}: ${c.case} (statsmodels '${c.statsmodelsDeterministic}'), K = ${c.lags}, rank ${c.rank}, ${c.horizon} steps`, () => {
      const block = c.series.map((id) => fixtureSeries(fixture, id));
      const r = vecmForecast(block, c.series, { case: c.case, lags: c.lags, rank: c.rank, horizon: c.horizon });
      let worst = 0;
      for (let h = 0; h < c.horizon; h++) {
        for (let i = 0; i < block.length; i++) {
          worst = Math.max(worst, off(r.forecast[h][i], c.forecast[h][i]), off(r.lower[h][i], c.lower[h][i]), off(r.upper[h][i], c.upper[h][i]));
        }
      }
      expect(worst).toBeLessThan(TOL);
      for (let a = 0; a < block.length; a++) for (let b = 0; b < block.length; b++) expect(off(r.residualCovariance[a][b], c.sigmaU[a][b])).toBeLessThan(TOL);
    });
  }

  it('the spread\'s path is the first relation applied to the forecasts, its band inside the range the series\' bands allow', () => {
    const c = fixture.cases.find((k) => k.case === 'restricted-constant' && k.series[0] === 'sys3_y1' && k.lags === 1)!;
    const block = c.series.map((id) => fixtureSeries(fixture, id));
    const r = vecmForecast(block, c.series, { case: c.case, lags: c.lags, rank: c.rank, horizon: c.horizon });
    const s = r.spread!;
    expect(s.weights[0]).toBe(1);
    for (let h = 0; h < c.horizon; h++) {
      const value = s.weights.reduce((acc, w, i) => acc + w * r.forecast[h][i], 0) + (s.deterministic ?? 0);
      expect(Math.abs(s.path[h] - value)).toBeLessThan(1e-9);
      expect(s.lower[h]).toBeLessThan(s.path[h]);
    }
    // Error correction: the expected gap to the equilibrium shrinks along the path.
    const gap = s.path.map((v) => Math.abs(v - s.mean));
    expect(gap[c.horizon - 1]).toBeLessThan(Math.abs(s.history[s.history.length - 1] - s.mean) + 1e-12);
  });
});
