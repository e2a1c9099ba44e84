/**
 * MOOR.AHEAD: the VECM forecast as cells, against statsmodels 0.13.5 VECM predict (fixture
 * vecm-forecast.json, all five deterministic cases on sys3 with K = 1): forecasts and 95% bounds to
 * 1e-9; the spread's path and the refusals.
 */
import { describe, expect, it } from 'vitest';
import { vecmForecast } from '../../addin/forecast/vecm-forecast';
import { ahead } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { cellErrorOf } from './cell-shapes';

const fixture = loadFixture<Fixtures['vecm-forecast']>('vecm-forecast');

describe('MOOR.AHEAD', () => {
  for (const c of fixture.cases.filter((k) => k.series[0] === 'sys3_y1' && k.lags === 1)) {
    it(`${c.case}: statsmodels' forecast and bounds (1e-9)`, () => {
      const block = c.series.map((id) => fixtureSeries(fixture, id));
      const cells = block[0].map((_, t) => block.map((s) => s[t]));
      const f = ahead(cells, c.horizon, c.rank, c.lags, c.case);
      const all = ahead(cells, c.horizon, c.rank, c.lags, c.case, 'all');
      expect(f).toHaveLength(c.horizon);
      for (let h = 0; h < c.horizon; h++) {
        for (let i = 0; i < 3; i++) {
          expect(Math.abs((f[h][i] as number) - c.forecast[h][i])).toBeLessThan(1e-9);
          expect(Math.abs((all[h][3 * i + 1] as number) - c.lower[h][i])).toBeLessThan(1e-9);
          expect(Math.abs((all[h][3 * i + 2] as number) - c.upper[h][i])).toBeLessThan(1e-9);
        }
      }
    });
  }

  it('spread: the engine\'s path with its band; the refusals name what works', () => {
    const c = fixture.cases[0];
    const block = c.series.map((id) => fixtureSeries(fixture, id));
    const cells = block[0].map((_, t) => block.map((s) => s[t]));
    const engine = vecmForecast(block, c.series, { horizon: 5, rank: 1, lags: 1, case: 'constant' });
    expect(ahead(cells, 5, 1, 1, 'constant', 'spread')).toEqual(engine.spread!.path.map((v, h) => [v, engine.spread!.lower[h], engine.spread!.upper[h]]));
    expect(cellErrorOf(() => ahead(cells, null), '#VALUE!')).toMatch(/horizon is needed/);
    expect(cellErrorOf(() => ahead(cells, 5, 3), '#VALUE!')).toMatch(/rank must be a whole number from 0 to 2/);
    expect(cellErrorOf(() => ahead(cells, 5, 0, 1, 'constant', 'spread'), '#N/A')).toMatch(/no long-run relation/);
  });
});
