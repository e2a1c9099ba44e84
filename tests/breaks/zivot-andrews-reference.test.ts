import { describe, expect, it } from 'vitest';
import { zivotAndrewsTest } from '../../addin/breaks/zivot-andrews';
import { referenceBreakIndex } from '../../addin/breaks/zivot-andrews-design';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) zivot_andrews, fixtures made by
 * tests/reference/make_fixtures.py (tests/reference/fixtures/zivot-andrews.json, 27 cases:
 * a random walk, a planted level break and a planted slope break, T = 250, each with the
 * three break models and three lag settings). Statistic to 1e-8 relative, p-value to 1e-6,
 * lags and break index exactly, critical values to 1e-10.
 */
const fixture = loadFixture<Fixtures['zivot-andrews']>('zivot-andrews');

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

describe('Zivot-Andrews against the reference library (statsmodels zivot_andrews)', () => {
  it('covers every break model and lag setting (27 cases)', () => {
    expect(fixture.cases.length).toBe(27);
    expect(new Set(fixture.cases.map((c) => `${c.breakIn}/${c.lags}/${c.maxLags}`)).size).toBe(9);
  });
  for (const c of fixture.cases) {
    it(`${c.series} ${c.breakIn} lags=${c.lags} max=${c.maxLags ?? 'default'}`, () => {
      const x = fixtureSeries(fixture, c.series);
      const r = zivotAndrewsTest(x, { model: c.breakIn, trim: c.trim, lags: c.lags, maxLags: c.maxLags ?? undefined });
      expect(r.lags).toBe(c.usedLags);
      // the reference library's index: level, both = last observation before the break; slope = first after
      expect(referenceBreakIndex(c.breakIn, r.breakAt.lastBefore)).toBe(c.breakIndex);
      expect(relative(r.statistic, c.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((r.pValue as number) - c.pValue)).toBeLessThan(1e-6);
      for (const level of ['1%', '5%', '10%'] as const) expect(r.critical[level]).toBeCloseTo(c.critical[level], 10);
    });
  }
});
