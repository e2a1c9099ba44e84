import { describe, expect, it } from 'vitest';
import { coefficientRow, fitVar } from '../../addin/var/fit-var';
import { MooringInputError } from '../../addin/errors';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { relative } from '../reference/compare';

/**
 * fitVar's coefficient layout against the reference library (statsmodels 0.13.5 VAR params,
 * recorded in var-wald.json with their row numbers), and the invariances a VAR must have.
 */
const wald = loadFixture<Fixtures['var-wald']>('var-wald');

describe('fitVar', () => {
  it("coefficient rows follow the reference library's params rows (constant, lag 1 of each series, lag 2, ...): 12 cases to 1e-8", () => {
    for (const c of wald.cases) {
      const block = c.series.map((id) => fixtureSeries(wald, id));
      const fit = fitVar(block, c.lagsFitted, { names: c.series });
      expect(fit.nobs).toBe(c.nobs);
      const cause = c.series.indexOf(c.cause);
      const effect = c.series.indexOf(c.effect);
      c.restriction.lags.forEach((lag, j) => {
        const row = coefficientRow(fit, cause, lag);
        expect(row).toBe(c.restriction.paramsRows[j]);
        expect(relative(fit.coefficients[row][effect], c.coefficients[j])).toBeLessThan(1e-8);
      });
    }
  });

  it('residual covariance: E\'E over n - Kp - 1 and over n, with the diagonal equal to each equation\'s SSR', () => {
    const block = ['dk_lrm', 'dk_lry'].map((id) => fixtureSeries(wald, id));
    const fit = fitVar(block, 2);
    expect(fit.dfResid).toBe(fit.nobs - 2 * 2 - 1);
    fit.equations.forEach((eq, e) => {
      expect(fit.residualCovariance[e][e]).toBeCloseTo(eq.ssr / fit.dfResid, 14);
      expect(fit.residualCovarianceMl[e][e]).toBeCloseTo(eq.ssr / fit.nobs, 14);
    });
    expect(fit.residualCovariance[0][1]).toBe(fit.residualCovariance[1][0]);
  });

  it('with a constant and trend, adding 0.7 t to every series leaves the lag coefficients and residuals unchanged', () => {
    const block = ['pair_x', 'pair_y'].map((id) => fixtureSeries(wald, id));
    const tilted = block.map((s) => s.map((v, i) => v + 0.7 * (i + 1)));
    const a = fitVar(block, 2, { trend: 'const-trend' });
    const b = fitVar(tilted, 2, { trend: 'const-trend' });
    for (let r = 2; r < a.coefficients.length; r++) {
      for (let e = 0; e < 2; e++) expect(b.coefficients[r][e]).toBeCloseTo(a.coefficients[r][e], 9);
    }
    expect(relative(b.equations[1].ssr, a.equations[1].ssr)).toBeLessThan(1e-9);
  });

  it('a later sample start drops rows at the front: nobs = T - sampleStart', () => {
    const block = ['pair_x', 'pair_y'].map((id) => fixtureSeries(wald, id));
    expect(fitVar(block, 1, { sampleStart: 5 }).nobs).toBe(295);
    expect(fitVar(block, 0).nobs).toBe(300);
  });

  it('refuses too few rows, a start before the lags, a bad trend and non-numbers', () => {
    const short = [[1, 2, 4, 3, 5, 7, 6], [2, 1, 3, 5, 4, 6, 8]];
    expect(() => fitVar(short, 2)).toThrow(MooringInputError);
    expect(() => fitVar(short, 2)).toThrow(/needs at least 8 rows here; the series have 7/);
    expect(() => fitVar(short, 1, { sampleStart: 0 })).toThrow(/must start at row 2 or later/);
    expect(() => fitVar(short, 1, { trend: 'quadratic' as never })).toThrow(/Unknown deterministic terms/);
    expect(() => fitVar([[1, 2, 3, 'x' as never, 5, 6, 7]], 1, { names: ['Brent'] })).toThrow(/Brent, row 4, is not a finite number/);
    expect(() => coefficientRow(fitVar(short, 1), 0, 2)).toThrow(/has lags 1 to 1/);
  });
});
