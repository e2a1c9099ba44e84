import { describe, expect, it } from 'vitest';
import { todaYamamoto } from '../../addin/causality/toda-yamamoto';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { relative, detail } from '../reference/compare';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels), fixtures made by
 * tests/reference/make_fixtures.py: VAR(levels).fit(p + dmax, trend="c"), then the Wald
 * statistic b' V^-1 b on the cause's lags 1..p in the effect's equation with V the matching
 * block of cov_params() (inv(Z'Z) kron Sigma_u); and, with dmax = 0, test_causality(kind="wald")
 * on a VAR(p). Pairs: two independent seeded walks, a seeded cointegrated pair and the Danish
 * money and income series in levels; both directions, p = 1, 2, dmax = 1.
 * Statistic and coefficients to 1e-8 relative, p-value to 1e-8 absolute, rows exactly.
 */
const fixture = loadFixture<Fixtures['var-wald']>('var-wald');

describe('Toda-Yamamoto against the reference library (statsmodels VAR cov_params and test_causality)', () => {
  it('has 12 cases: three pairs, both directions, p = 1 and 2', () => {
    expect(fixture.cases.length).toBe(12);
  });
  for (const c of fixture.cases) {
    const cause = fixtureSeries(fixture, c.cause);
    const effect = fixtureSeries(fixture, c.effect);
    const names = { cause: c.cause, effect: c.effect };
    it(`${c.cause} -> ${c.effect}, p = ${c.p}, dmax = ${c.dmax}: W = ${c.statistic.toPrecision(6)}`, () => {
      const r = todaYamamoto(cause, effect, { lags: c.p, extraLags: c.dmax }, names);
      expect(r.lags).toBe(c.p);
      expect(r.nobs).toBe(c.nobs);
      expect(detail(r, 'df')).toBe(c.df);
      expect(detail(r, 'lagsFitted')).toBe(c.lagsFitted);
      expect(relative(r.statistic, c.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((r.pValue as number) - c.pValue)).toBeLessThan(1e-8);
      c.coefficients.forEach((b, j) => expect(relative(detail(r, `causeLag${j + 1}`), b)).toBeLessThan(1e-8));
    });
    it(`${c.cause} -> ${c.effect}, p = ${c.p}, no extra lags = test_causality Wald on a VAR(${c.p})`, () => {
      const r = todaYamamoto(cause, effect, { lags: c.p, extraLags: 0 }, names);
      expect(r.nobs).toBe(c.allLagsCheck.nobs);
      expect(relative(r.statistic, c.allLagsCheck.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((r.pValue as number) - c.allLagsCheck.pValue)).toBeLessThan(1e-8);
      expect(r.warnings.join(' ')).toMatch(/plain Wald test/);
    });
  }
});
