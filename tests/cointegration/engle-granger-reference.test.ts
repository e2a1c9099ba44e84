import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { type Fixtures, fixtureSeries, loadFixture } from '../reference/fixtures';
import { relative } from '../reference/compare';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) coint, fixtures made by
 * tests/reference/make_fixtures.py (makers/cointegration.py) on seeded pairs and triples, two
 * independent random walks, the Danish money-demand data and the US macro data, each in
 * every deterministic option and lag rule. Statistic to 1e-8 relative, p-value to 1e-6,
 * lags and nobs exactly, beta / intercept / trend to 1e-8 relative, critical values to 1e-10.
 */
const fixture = loadFixture<Fixtures['coint']>('coint');

describe('Engle-Granger against the reference library (statsmodels coint)', () => {
  it(`covers every deterministic option and lag rule (${fixture.cases.length} cases)`, () => {
    expect(fixture.cases.length).toBe(84);
    const kinds = new Set(fixture.cases.map((c) => `${c.deterministic}/${typeof c.lags === 'number' ? 'fixed' : c.lags}`));
    expect(kinds.size).toBe(12);
  });
  for (const c of fixture.cases) {
    const label = `${c.y} on ${c.x.join('+')} ${c.deterministic} lags=${c.lags} max=${c.maxLags ?? 'default'}`;
    it(label, () => {
      const r = engleGranger(
        fixtureSeries(fixture, c.y),
        c.x.map((name) => fixtureSeries(fixture, name)),
        { deterministic: c.deterministic, lags: c.lags, maxLags: c.maxLags ?? undefined },
        { y: c.y, xs: c.x },
      );
      expect(r.test.lags).toBe(c.usedLags);
      expect(r.test.nobs).toBe(c.nobs);
      expect(r.nVariables).toBe(c.x.length + 1);
      expect(relative(r.test.statistic, c.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((r.test.pValue as number) - c.pValue)).toBeLessThan(1e-6);
      r.beta.forEach((b, i) => expect(relative(b, c.beta[i])).toBeLessThan(1e-8));
      if (c.intercept === null) expect(r.intercept).toBeNull();
      else expect(relative(r.intercept as number, c.intercept)).toBeLessThan(1e-8);
      if (c.trendCoefficient === null) expect(r.trendCoefficient).toBeNull();
      else expect(relative(r.trendCoefficient as number, c.trendCoefficient)).toBeLessThan(1e-8);
      const ssr = r.test.details.find((d) => d.key === 'residualSsr')?.value as number;
      expect(relative(ssr, c.residualSsr)).toBeLessThan(1e-8);
      if (c.deterministic === 'none') {
        // The reference library returns NaN here: no MacKinnon (2010) surface without a constant beyond N = 1.
        expect(c.critical['5%']).toBeNull();
        expect(r.test.critical).toEqual({});
        expect(r.test.warnings.some((w) => w.includes('No critical values are published'))).toBe(true);
      } else {
        for (const level of ['1%', '5%', '10%'] as const) expect(r.test.critical[level]).toBeCloseTo(c.critical[level] as number, 10);
      }
    });
  }
});
