import { describe, expect, it } from 'vitest';
import { chooseVarLags, defaultVarMaxLags, largestVarLags } from '../../addin/var/choose-var-lags';
import { MooringInputError } from '../../addin/errors';
import { nestedVarResiduals } from '../../addin/var/nested-var-residuals';
import { checkedBlock } from '../../addin/var/var-design';
import { varLagGram } from '../../addin/var/var-lag-gram';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { relative } from '../reference/compare';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) VAR.select_order(maxlags, trend="c"),
 * fixtures made by tests/reference/make_fixtures.py: a seeded stationary VAR(2) pair, the two US
 * macro growth rates (macrodata) and the four Danish money-demand series in levels.
 * Chosen orders exactly; every criterion value for p = 0..maxLags to 1e-8 relative, by both
 * routes to the residual cross products (the Gram path, which these systems take, and QR).
 */
const fixture = loadFixture<Fixtures['var-select']>('var-select');

describe('VAR lag order against the reference library (statsmodels select_order)', () => {
  it(`has the three systems (${fixture.cases.length} cases)`, () => {
    expect(fixture.cases.length).toBe(3);
  });
  for (const c of fixture.cases) {
    for (const method of ['auto', 'qr'] as const) {
      it(`${c.series.join(', ')}, max ${c.maxLags}, ${method === 'auto' ? 'Gram path' : 'QR path'}: orders aic ${c.selected.aic}, bic ${c.selected.bic}, hq ${c.selected.hq}, fpe ${c.selected.fpe}`, () => {
        const block = c.series.map((id) => fixtureSeries(fixture, id));
        if (method === 'auto') {
          const series = checkedBlock(block);
          expect(nestedVarResiduals(varLagGram(series, c.maxLags), series.length, c.maxLags)).not.toBeNull();
        }
        const r = chooseVarLags(block, { maxLags: c.maxLags, names: c.series, method });
        expect(r.nobs).toBe(c.nobs);
        expect({ aic: r.aic, bic: r.bic, hq: r.hq, fpe: r.fpe }).toEqual(c.selected);
        expect(r.table.length).toBe(c.maxLags + 1);
        r.table.forEach((row, p) => {
          expect(row.lags).toBe(p);
          expect(relative(row.aic, c.ics.aic[p])).toBeLessThan(1e-8);
          expect(relative(row.bic, c.ics.bic[p])).toBeLessThan(1e-8);
          expect(relative(row.hq, c.ics.hqic[p])).toBeLessThan(1e-8);
          expect(relative(row.fpe, c.ics.fpe[p])).toBeLessThan(1e-8);
        });
      });
    }
  }
});

describe('VAR lag order: limits and defaults', () => {
  const danish = fixture.cases[2].series.map((id) => fixtureSeries(fixture, id));

  it('the largest allowed order is floor((T - K - 1) / (1 + K)): 10 for 55 rows and 4 series', () => {
    expect(largestVarLags(55, 4)).toBe(10);
    expect(() => chooseVarLags(danish, { maxLags: 10 })).not.toThrow();
  });

  it('one order beyond the largest is refused with the largest named', () => {
    expect(() => chooseVarLags(danish, { maxLags: 11 })).toThrow(MooringInputError);
    expect(() => chooseVarLags(danish, { maxLags: 11 })).toThrow(/largest allowed is 10/);
  });

  it('default ceiling round(12 (T/100)^(1/4)) (common practice): 17 for T = 400, 12 for T = 100, capped at 10 for the 55 Danish rows', () => {
    expect(defaultVarMaxLags(400, 2)).toBe(17);
    expect(defaultVarMaxLags(100, 2)).toBe(12);
    expect(defaultVarMaxLags(55, 4)).toBe(10);
    const r = chooseVarLags(danish);
    expect(r.maxLags).toBe(10);
    expect(r.table.length).toBe(11);
  });

  it('each chosen order is the first minimum of its criterion column', () => {
    const [x, y] = [fixtureSeries(fixture, 'var2_x'), fixtureSeries(fixture, 'var2_y')];
    const r = chooseVarLags([x, y], { maxLags: 3 });
    for (const key of ['aic', 'bic', 'hq', 'fpe'] as const) {
      const values = r.table.map((row) => row[key]);
      expect(values[r[key]]).toBe(Math.min(...values));
      expect(values.indexOf(Math.min(...values))).toBe(r[key]);
    }
  });

  it('refuses too short a history, a gap and unequal lengths with clear messages', () => {
    expect(() => chooseVarLags([[1, 2, 3, 4, 5], [2, 1, 3, 5, 4]])).toThrow(/needs at least 6 rows/);
    expect(() => chooseVarLags([[1, 2, Number.NaN, 4, 5, 6, 7], [1, 2, 3, 4, 5, 6, 7]], { names: ['A', 'B'] })).toThrow(/A, row 3, is not a finite number/);
    expect(() => chooseVarLags([[1, 2, 3, 4, 5, 6, 7], [1, 2, 3]], { names: ['A', 'B'] })).toThrow(/B has 3 values but A has 7/);
  });
});
