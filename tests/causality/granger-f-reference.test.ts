import { describe, expect, it } from 'vitest';
import { grangerF } from '../../addin/causality/granger-f';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { relative, detail } from '../reference/compare';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) grangercausalitytests(maxlag=4),
 * fixtures made by tests/reference/make_fixtures.py on a seeded stationary VAR(2) pair (x leads
 * y, y does not lead x) and the US macro growth rates of real GDP and consumption (macrodata),
 * each pair in both directions. Lags 1..4: F, chi-square and likelihood-ratio statistics to
 * 1e-8 relative, their p-values to 1e-8 absolute, degrees of freedom and rows exactly.
 */
const fixture = loadFixture<Fixtures['granger']>('granger');

describe('Granger F against the reference library (statsmodels grangercausalitytests)', () => {
  it('has four directions with lags 1..4 each', () => {
    expect(fixture.cases.length).toBe(4);
    for (const c of fixture.cases) expect(c.lags.map((l) => l.lag)).toEqual([1, 2, 3, 4]);
  });
  for (const c of fixture.cases) {
    for (const ref of c.lags) {
      it(`${c.cause} -> ${c.effect}, ${ref.lag} lags: F = ${ref.fStatistic.toPrecision(6)}, p = ${ref.pValue.toPrecision(3)}`, () => {
        const r = grangerF(fixtureSeries(fixture, c.cause), fixtureSeries(fixture, c.effect), { lags: ref.lag }, { cause: c.cause, effect: c.effect });
        expect(r.lags).toBe(ref.lag);
        expect(r.nobs).toBe(ref.nobs);
        expect(detail(r, 'dfNumerator')).toBe(ref.dfNum);
        expect(detail(r, 'dfDenominator')).toBe(ref.dfDenom);
        expect(relative(r.statistic, ref.fStatistic)).toBeLessThan(1e-8);
        expect(Math.abs((r.pValue as number) - ref.pValue)).toBeLessThan(1e-8);
        expect(relative(detail(r, 'chiSquare'), ref.chi2.statistic)).toBeLessThan(1e-8);
        expect(Math.abs(detail(r, 'chiSquarePValue') - ref.chi2.pValue)).toBeLessThan(1e-8);
        expect(relative(detail(r, 'likelihoodRatio'), ref.lr.statistic)).toBeLessThan(1e-8);
        expect(Math.abs(detail(r, 'likelihoodRatioPValue') - ref.lr.pValue)).toBeLessThan(1e-8);
        expect(relative(detail(r, 'ssrRestricted'), ref.ssrRestricted)).toBeLessThan(1e-10);
        expect(relative(detail(r, 'ssrUnrestricted'), ref.ssrUnrestricted)).toBeLessThan(1e-10);
      });
    }
  }
});
